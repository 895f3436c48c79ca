package dev.skerry.compiler.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The names a writer had to replace: each entry pairs the name written in the file (the alias) with
 * the model's full name. Aliases are unique across rows and columns of one file, so one look-up
 * serves both. Written as a small text file, one {@code alias<TAB>fullname} per line, in the order
 * the writer met the names; a backslash, tab, carriage return or line feed inside a full name is
 * escaped as {@code \\}, {@code \t}, {@code \r}, {@code \n}.
 */
public final class NameMap {
  /** A map with no entries: no name was changed. */
  public static final NameMap EMPTY = new NameMap(List.of(), List.of());

  private final List<String> aliases;
  private final List<String> fullNames;
  private Map<String, String> byAlias;

  private NameMap(List<String> aliases, List<String> fullNames) {
    this.aliases = aliases;
    this.fullNames = fullNames;
  }

  public int size() {
    return aliases.size();
  }

  public boolean isEmpty() {
    return aliases.isEmpty();
  }

  /** The alias of entry {@code i}, in writing order. */
  public String alias(int i) {
    return aliases.get(i);
  }

  /** The full name of entry {@code i}, in writing order. */
  public String fullName(int i) {
    return fullNames.get(i);
  }

  /** The full name an alias stands for, if the alias is in this map. */
  public synchronized Optional<String> lookup(String alias) {
    if (byAlias == null) {
      byAlias = new HashMap<>(Math.max(16, aliases.size() * 2));
      for (int i = 0; i < aliases.size(); i++) {
        byAlias.put(aliases.get(i), fullNames.get(i));
      }
    }
    return Optional.ofNullable(byAlias.get(alias));
  }

  /** The full name behind a name read from a file: the name itself when it is not an alias. */
  public String restore(String name) {
    return isEmpty() ? name : lookup(name).orElse(name);
  }

  /** Writes the map as text, one {@code alias<TAB>fullname} per line. */
  public void write(Appendable out) throws IOException {
    StringBuilder line = new StringBuilder();
    for (int i = 0; i < aliases.size(); i++) {
      line.setLength(0);
      line.append(aliases.get(i)).append('\t');
      escape(fullNames.get(i), line);
      line.append('\n');
      out.append(line);
    }
  }

  /** Writes the map to a file (UTF-8), replacing what was there. */
  public void writeTo(Path file) throws IOException {
    try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      write(out);
    }
  }

  /** Reads a map written by {@link #write(Appendable)}. */
  public static NameMap read(Reader in) throws IOException {
    BufferedReader lines = in instanceof BufferedReader b ? b : new BufferedReader(in);
    Builder builder = new Builder();
    Map<String, Integer> seen = new HashMap<>();
    String text;
    int lineNo = 0;
    while ((text = lines.readLine()) != null) {
      lineNo++;
      if (text.isEmpty()) {
        continue;
      }
      int tab = text.indexOf('\t');
      if (tab <= 0) {
        throw new ModelFormatException(
            lineNo, "expected 'alias<TAB>full name', found '" + text + "'");
      }
      String alias = text.substring(0, tab);
      Integer earlier = seen.put(alias, lineNo);
      if (earlier != null) {
        throw new ModelFormatException(
            lineNo, "alias '" + alias + "' is listed again (first on line " + earlier + ")");
      }
      builder.add(alias, unescape(text.substring(tab + 1), lineNo));
    }
    return builder.build();
  }

  /** Reads a map file written by {@link #writeTo(Path)}. */
  public static NameMap readFrom(Path file) throws IOException {
    try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
      return read(in);
    }
  }

  private static void escape(String name, StringBuilder out) {
    for (int i = 0; i < name.length(); i++) {
      char c = name.charAt(i);
      switch (c) {
        case '\\' -> out.append("\\\\");
        case '\t' -> out.append("\\t");
        case '\n' -> out.append("\\n");
        case '\r' -> out.append("\\r");
        default -> out.append(c);
      }
    }
  }

  private static String unescape(String text, int lineNo) throws ModelFormatException {
    if (text.indexOf('\\') < 0) {
      return text;
    }
    StringBuilder out = new StringBuilder(text.length());
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c != '\\') {
        out.append(c);
        continue;
      }
      if (i + 1 == text.length()) {
        throw new ModelFormatException(lineNo, "full name ends in a lone backslash");
      }
      char next = text.charAt(++i);
      switch (next) {
        case '\\' -> out.append('\\');
        case 't' -> out.append('\t');
        case 'n' -> out.append('\n');
        case 'r' -> out.append('\r');
        default ->
            throw new ModelFormatException(lineNo, "unknown escape \\" + next + " in full name");
      }
    }
    return out.toString();
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof NameMap m && aliases.equals(m.aliases) && fullNames.equals(m.fullNames);
  }

  @Override
  public int hashCode() {
    return aliases.hashCode() * 31 + fullNames.hashCode();
  }

  @Override
  public String toString() {
    return "NameMap[" + aliases.size() + " entries]";
  }

  /** Collects entries in writing order. */
  public static final class Builder {
    private final List<String> aliases = new ArrayList<>();
    private final List<String> fullNames = new ArrayList<>();

    public Builder add(String alias, String fullName) {
      if (alias.isEmpty() || alias.indexOf('\t') >= 0 || alias.indexOf('\n') >= 0) {
        throw new IllegalArgumentException("alias '" + alias + "' cannot be written in a name map");
      }
      aliases.add(alias);
      fullNames.add(fullName);
      return this;
    }

    public NameMap build() {
      return aliases.isEmpty() ? EMPTY : new NameMap(List.copyOf(aliases), List.copyOf(fullNames));
    }
  }
}
