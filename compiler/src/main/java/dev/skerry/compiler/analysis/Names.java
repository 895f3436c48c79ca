package dev.skerry.compiler.analysis;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

/**
 * Deterministic, readable tags for the entities that appear in column and row names. A tag is the
 * entity's name with every character outside {@code [A-Za-z0-9_]} replaced by {@code _}, cut to
 * {@value #MAX_TAG} characters, and made unique by a numeric suffix when two entities would share
 * one. Every column and row name is a fixed prefix, a tag and a suffix of fixed shape (such as
 * {@code _f2_17}), so distinct tags give distinct names and every name stays within 64 characters.
 */
public final class Names {
  public static final int MAX_TAG = 40;
  private final Map<String, String> byKey = new HashMap<>();
  private final Set<String> used = new HashSet<>();

  /** The tag of an entity; {@code kind} keeps e.g. a zone and a waypoint of one name apart. */
  public String tag(String kind, String name) {
    return byKey.computeIfAbsent(kind + "\u0000" + name, key -> fresh(name));
  }

  private String fresh(String name) {
    String base = sanitise(name);
    String candidate = base;
    int i = 2;
    while (!used.add(candidate)) {
      String suffix = "_" + i++;
      candidate = base.substring(0, Math.min(base.length(), MAX_TAG - suffix.length())) + suffix;
    }
    return candidate;
  }

  public static String sanitise(String name) {
    StringBuilder sb = new StringBuilder();
    for (int i = 0; i < name.length() && sb.length() < MAX_TAG; i++) {
      char c = name.charAt(i);
      boolean ok = (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '_';
      sb.append(ok ? c : '_');
    }
    return sb.length() == 0 ? "_" : sb.toString();
  }
}
