package dev.skerry.lsp.analysis;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.PlanProp;
import dev.skerry.compiler.ast.VehicleProp;
import dev.skerry.compiler.check.Symbol;
import dev.skerry.compiler.units.Units;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * What may be written at the cursor, from the text alone (so it works while the line is broken):
 * the keywords that start a line in the enclosing block, the words that may follow the line's
 * first keyword, constant names where a value may stand, and units after a number.
 */
public final class Completions {
  /** One proposal: the word, what kind of word it is, and a short description. */
  public record Item(String label, Kind kind, String detail) {}

  public enum Kind { KEYWORD, CONSTANT, UNIT, NAME }

  /** Where the cursor is: top level or inside a vehicle or plan block. */
  public enum Block { TOP, VEHICLE, PLAN, OTHER }

  public static final List<String> TOP_KEYWORDS = List.of("scenario", "units", "const", "include", "vehicle", "area",
      "zone", "target", "waypoint", "plan");
  public static final List<String> VEHICLE_KEYWORDS = List.of("dynamics", "start", "speed", "accel", "radius", "sides",
      "target", "climb", "altitude");
  public static final List<String> PLAN_KEYWORDS = List.of("step", "horizon", "minimize", "clusters", "closed_loop",
      "solver", "guard", "pruning", "sides", "dimensions", "separation");

  private static final Pattern AFTER_NUMBER = Pattern.compile("(?:^|[\\s(,=+\\-*/])[0-9]+(?:\\.[0-9]*)?(?:[eE][+-]?[0-9]+)?\\s*$");
  private static final Pattern WORD = Pattern.compile("[A-Za-z_][A-Za-z_0-9]*|\\)|[0-9.]+");
  /** Lines whose numbers are counts or weights, never quantities with a unit. */
  private static final Set<String> UNITLESS = Set.of("horizon", "sides", "clusters", "minimize", "dimensions");

  private Completions() {}

  /** The start of the word being typed at {@code offset} (letters, digits, `_`, and `/`, `^` inside units). */
  public static int wordStart(String text, int offset) {
    int i = Math.max(0, Math.min(offset, text.length()));
    while (i > 0) {
      char c = text.charAt(i - 1);
      if (Character.isLetterOrDigit(c) || c == '_' || c == '/' || c == '^') {
        i--;
      } else {
        break;
      }
    }
    return i;
  }

  public static Block blockAt(String text, List<Integer> openBraces) {
    if (openBraces.isEmpty()) {
      return Block.TOP;
    }
    int brace = openBraces.get(openBraces.size() - 1);
    int lineStart = text.lastIndexOf('\n', brace - 1) + 1;
    String head = text.substring(lineStart, brace).strip();
    if (head.startsWith("vehicle")) {
      return Block.VEHICLE;
    }
    return head.startsWith("plan") ? Block.PLAN : Block.OTHER;
  }

  /** The proposals at {@code offset}; {@code analysis} may be null (then no names are offered). */
  public static List<Item> at(String text, int offset, AnalysisResult analysis) {
    int clamped = Math.max(0, Math.min(offset, text.length()));
    TextScan.Context context = TextScan.at(text, clamped);
    if (context.inCommentOrString()) {
      return List.of();
    }
    int start = wordStart(text, clamped);
    int lineStart = text.lastIndexOf('\n', start - 1) + 1;
    String before = text.substring(lineStart, start);
    Block block = blockAt(text, context.openBraces());
    List<String> words = new ArrayList<>();
    Matcher m = WORD.matcher(before);
    while (m.find()) {
      words.add(m.group());
    }
    if (words.isEmpty() || (block != Block.TOP && before.strip().equals("{"))) {
      return keywords(block, text, context, analysis);
    }
    List<Item> out = new ArrayList<>();
    String first = words.get(0);
    if (AFTER_NUMBER.matcher(before).find() && !UNITLESS.contains(first)) {
      for (String u : units()) {
        out.add(new Item(u, Kind.UNIT, "unit"));
      }
      return out;
    }
    if (block == Block.VEHICLE && first.equals("target")) {
      // `target NAME` in a vehicle: the declared targets.
      if (words.size() == 1 && analysis != null) {
        for (Symbol s : analysis.check().symbols().symbols()) {
          if (s.kind() == Symbol.Kind.TARGET) {
            out.add(new Item(s.name().text(), Kind.NAME, "target"));
          }
        }
      }
      return out;
    }
    for (String w : follow(first, words)) {
      out.add(new Item(w, Kind.KEYWORD, "keyword"));
    }
    if (takesValue(first, words, before) && analysis != null) {
      for (Symbol s : analysis.check().symbols().symbols()) {
        if (s.kind() == Symbol.Kind.CONSTANT) {
          out.add(new Item(s.name().text(), Kind.CONSTANT, "const " + s.decl().range().text()
              .replaceFirst("^const\\s+\\S+\\s*=\\s*", "")));
        }
      }
    }
    if (first.equals("units")) {
      for (String u : Units.simpleSymbols()) {
        if (!u.equals("%") && !u.equals("kn") && !u.equals("deg") && !u.equals("rad")) {
          out.add(new Item(u, Kind.UNIT, "default unit"));
        }
      }
    }
    return out;
  }

  private static List<String> units() {
    Set<String> all = new LinkedHashSet<>(Units.simpleSymbols());
    all.addAll(new java.util.TreeSet<>(Units.commonCompounds()));
    return List.copyOf(all);
  }

  /** Line keywords of the block, leaving out vehicle and plan properties the block already has. */
  private static List<Item> keywords(Block block, String text, TextScan.Context context, AnalysisResult analysis) {
    List<String> candidates = block == Block.TOP ? TOP_KEYWORDS : block == Block.VEHICLE ? VEHICLE_KEYWORDS
        : block == Block.PLAN ? PLAN_KEYWORDS : List.of();
    Set<String> present = analysis == null || context.openBraces().isEmpty() ? Set.of()
        : presentIn(analysis, context.openBraces().get(context.openBraces().size() - 1));
    List<Item> out = new ArrayList<>();
    for (String k : candidates) {
      if (!present.contains(k)) {
        out.add(new Item(k, Kind.KEYWORD, block == Block.TOP ? "declaration" : block.name().toLowerCase() + " property"));
      }
    }
    return out;
  }

  private static Set<String> presentIn(AnalysisResult analysis, int braceOffset) {
    Set<String> present = new java.util.HashSet<>();
    for (Decl d : analysis.check().main().decls()) {
      if (!d.range().contains(braceOffset)) {
        continue;
      }
      if (d instanceof Decl.VehicleDecl v) {
        for (VehicleProp p : v.props()) {
          present.add(p.keyword());
        }
      } else if (d instanceof Decl.PlanDecl p) {
        for (PlanProp prop : p.props()) {
          present.add(prop.keyword());
        }
      }
    }
    return present;
  }

  /** Words that may come next on a line that starts with {@code first}; {@code words} are those before the cursor. */
  static List<String> follow(String first, List<String> words) {
    String last = words.get(words.size() - 1);
    int n = words.size();
    boolean afterPoint = last.equals(")") || (n >= 2 && words.get(n - 2).equals(")"));
    switch (first) {
      case "speed", "accel", "closed_loop":
        return n == 1 ? List.of("max") : List.of();
      case "climb":
        return n == 1 ? List.of("max", "accel") : n == 2 && last.equals("accel") ? List.of("max") : List.of();
      case "altitude":
        return n >= 2 && !words.contains("to") ? List.of("to") : List.of();
      case "dimensions":
        return n == 1 ? List.of("2", "3") : List.of();
      case "dynamics":
        return n == 1 ? List.of("double_integrator") : List.of();
      case "start":
        if (last.equals("at")) {
          return List.of("rest");
        }
        if (words.contains("moving") && !last.equals("moving")) {
          return List.of("heading");
        }
        return afterPoint && !words.contains("velocity") ? List.of("at", "velocity", "moving") : List.of();
      case "zone", "area":
        if (n == 2) {
          return List.of("box", "polygon");
        }
        if (words.contains("altitude")) {
          return words.indexOf("altitude") < n - 1 && !last.equals("to") && count(words, "to") < (words.contains("box") ? 2 : 1)
              ? List.of("to") : List.of();
        }
        if (words.contains("box") && afterPoint) {
          return words.contains("to") ? List.of("altitude") : List.of("to");
        }
        return words.contains("polygon") && afterPoint ? List.of("altitude") : List.of();
      case "target":
        if (n == 2) {
          return List.of("box", "polygon", "point");
        }
        if (last.equals("at")) {
          return List.of("rest");
        }
        if (words.contains("point")) {
          return afterPoint && !words.contains("within") ? List.of("within") : List.of("at");
        }
        if (words.contains("altitude")) {
          int needed = words.contains("box") ? 2 : 1;
          if (last.equals("altitude") || last.equals("to") || last.equals("at")) {
            return last.equals("at") ? List.of("rest") : List.of();
          }
          return count(words, "to") < needed ? List.of("to") : List.of("at");
        }
        return afterPoint && (words.contains("to") || words.contains("polygon")) ? List.of("at", "altitude") : List.of();
      case "waypoint":
        return afterPoint && !words.contains("within") ? List.of("within") : List.of();
      case "guard", "pruning":
        return n == 1 ? List.of("on", "off") : List.of();
      case "clusters":
        return n == 2 ? List.of("none", "ordered", "sorted") : List.of();
      case "solver":
        return n == 1 ? List.of("default") : List.of("time_limit", "gap", "threads");
      case "minimize":
        return last.equals("latest") ? List.of("time") : List.of("time", "fuel", "latest");
      default:
        return List.of();
    }
  }

  /** True where a value (and so a constant's name) may stand. */
  static boolean takesValue(String first, List<String> words, String before) {
    String last = words.get(words.size() - 1);
    return switch (first) {
      case "speed", "accel", "closed_loop" -> last.equals("max") || words.size() > 2;
      case "climb" -> last.equals("max") || (words.size() > 2 && words.contains("max"));
      case "radius", "sides", "step", "horizon", "minimize", "separation", "altitude" -> true;
      case "clusters" -> words.size() == 1;
      case "const" -> before.contains("=");
      case "solver" -> words.size() > 2;
      case "start", "zone", "area", "target", "waypoint" -> before.contains("(") || last.equals("within");
      default -> false;
    };
  }

  private static int count(List<String> words, String word) {
    int n = 0;
    for (String w : words) {
      n += w.equals(word) ? 1 : 0;
    }
    return n;
  }
}
