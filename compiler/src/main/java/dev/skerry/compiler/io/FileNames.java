package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.RowSense;
import dev.skerry.compiler.milp.Variable;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The name each row and column gets in a file. A model name the format can hold is kept as it is;
 * any other is replaced, deterministically (the same model always gets the same names), by a name
 * no kept name uses, and the pair goes into the {@link NameMap}. Replacement names are unique
 * across rows and columns, so the map needs no kind column.
 *
 * <ul>
 *   <li>MPS: printable ASCII without quotes, not starting with {@code $} or {@code *}, at most 64
 *       characters (free) or 8 (fixed). Others become {@code C0000001}, {@code R0000001}, …
 *   <li>LP: {@code [A-Za-z_][A-Za-z0-9_]*}, at most 64 characters, no keyword of the format and
 *       nothing a reader could take for a number's exponent ({@code e9}). Others are sanitized: bad
 *       characters become {@code _}, a {@code _} goes in front when needed, and {@code _2}, {@code
 *       _3}, … make them unique. A range becomes two rows, {@code NAME_lo} and {@code NAME_hi},
 *       both listed in the map.
 * </ul>
 */
final class FileNames {
  static final int FREE_MPS_LENGTH = 64;
  static final int FIXED_MPS_LENGTH = 8;
  static final int LP_LENGTH = 64;

  private static final Set<String> LP_KEYWORDS =
      Set.of(
          "min",
          "minimize",
          "minimise",
          "minimum",
          "max",
          "maximize",
          "maximise",
          "maximum",
          "subject",
          "to",
          "such",
          "that",
          "st",
          "bound",
          "bounds",
          "gen",
          "general",
          "generals",
          "int",
          "integer",
          "integers",
          "bin",
          "binary",
          "binaries",
          "semi",
          "semis",
          "semicontinuous",
          "sos",
          "end",
          "free",
          "inf",
          "infinity");

  /** Name of column j in the file. */
  final String[] columns;

  /** Name of row i in the file; for an LP range, the name of its lower half. */
  final String[] rows;

  /** LP only: name of the upper half of range row i, null for other rows (null array in MPS). */
  final String[] rangeUpper;

  final String objectiveRow;

  /** The column fixed at 1 that carries the objective constant, or null. */
  final String constantColumn;

  /** LP only: the row written when the model has no constraint, or null. */
  final String dummyRow;

  final NameMap map;

  private FileNames(
      String[] columns,
      String[] rows,
      String[] rangeUpper,
      String objectiveRow,
      String constantColumn,
      String dummyRow,
      NameMap map) {
    this.columns = columns;
    this.rows = rows;
    this.rangeUpper = rangeUpper;
    this.objectiveRow = objectiveRow;
    this.constantColumn = constantColumn;
    this.dummyRow = dummyRow;
    this.map = map;
  }

  /**
   * The model name for a NAME line: printable ASCII without spaces (others become {@code _}), at
   * most {@code maxLength} characters, {@code unnamed} when empty.
   */
  static String modelName(String name, int maxLength) {
    if (name == null || name.isEmpty()) {
      return "unnamed";
    }
    StringBuilder out = new StringBuilder(Math.min(name.length(), maxLength));
    for (int i = 0; i < name.length() && out.length() < maxLength; i++) {
      char c = name.charAt(i);
      out.append(c > ' ' && c <= '~' ? c : '_');
    }
    return out.toString();
  }

  /** A name made safe for a one-line ASCII comment: anything else becomes {@code ?}. */
  static String printable(String name) {
    if (name == null) {
      return "";
    }
    StringBuilder out = new StringBuilder(name.length());
    for (int i = 0; i < name.length(); i++) {
      char c = name.charAt(i);
      out.append(c < ' ' || c > '~' ? '?' : c);
    }
    return out.toString();
  }

  /** True when a name can go into an MPS file of the given name length unchanged. */
  static boolean validMps(String name, int maxLength) {
    if (name.isEmpty() || name.length() > maxLength) {
      return false;
    }
    char first = name.charAt(0);
    if (first == '$' || first == '*') {
      return false;
    }
    for (int i = 0; i < name.length(); i++) {
      char c = name.charAt(i);
      if (c <= ' ' || c > '~' || c == '\'' || c == '"') {
        return false;
      }
    }
    return true;
  }

  /** True when a name can go into an LP file unchanged. */
  static boolean validLp(String name) {
    if (name.isEmpty() || name.length() > LP_LENGTH) {
      return false;
    }
    for (int i = 0; i < name.length(); i++) {
      char c = name.charAt(i);
      boolean letter = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || c == '_';
      if (!letter && !(i > 0 && c >= '0' && c <= '9')) {
        return false;
      }
    }
    return !looksLikeExponent(name) && !LP_KEYWORDS.contains(name.toLowerCase(Locale.ROOT));
  }

  private static boolean looksLikeExponent(String name) {
    char first = name.charAt(0);
    return (first == 'e' || first == 'E')
        && (name.length() == 1 || Character.isDigit(name.charAt(1)));
  }

  static FileNames forMps(Milp milp, boolean fixed, boolean constantColumn) {
    int maxLength = fixed ? FIXED_MPS_LENGTH : FREE_MPS_LENGTH;
    java.util.function.Predicate<String> valid = name -> validMps(name, maxLength);
    // Only kept names that a made-up name could equal need a look-up; a name is kept when it is
    // valid, which needs no set at all.
    Kept kept = Kept.of(milp, valid, FileNames::couldBeMadeUpForMps);
    NameMap.Builder map = new NameMap.Builder();
    List<Variable> variables = milp.variables();
    String[] columns = new String[variables.size()];
    int columnAliases = 0;
    for (int j = 0; j < columns.length; j++) {
      String name = variables.get(j).name();
      if (valid.test(name)) {
        columns[j] = name;
      } else {
        columnAliases = nextAlias('C', columnAliases, kept, maxLength);
        columns[j] = alias('C', columnAliases);
        map.add(columns[j], name);
      }
    }
    List<Row> rowList = milp.rows();
    String[] rows = new String[rowList.size()];
    int rowAliases = 0;
    for (int i = 0; i < rows.length; i++) {
      String name = rowList.get(i).name();
      if (valid.test(name)) {
        rows[i] = name;
      } else {
        rowAliases = nextAlias('R', rowAliases, kept, maxLength);
        rows[i] = alias('R', rowAliases);
        map.add(rows[i], name);
      }
    }
    String objective = firstFree("OBJ", kept.rows, Set.of());
    String constant = constantColumn ? firstFree("OBJCONST", kept.columns, Set.of()) : null;
    return new FileNames(columns, rows, null, objective, constant, null, map.build());
  }

  /**
   * True when {@code name} has the shape of a name {@link #forMps} makes up: an alias ({@code C} or
   * {@code R} and at least seven digits) or an objective row or constant column name (at most 8
   * characters, see {@link #firstFree}).
   */
  private static boolean couldBeMadeUpForMps(String name) {
    int length = name.length();
    if (length <= 8) {
      return true;
    }
    char first = name.charAt(0);
    if (first != 'C' && first != 'R') {
      return false;
    }
    for (int i = 1; i < length; i++) {
      char c = name.charAt(i);
      if (c < '0' || c > '9') {
        return false;
      }
    }
    return true;
  }

  private static int nextAlias(char prefix, int last, Kept kept, int maxLength) {
    int k = last + 1;
    while (kept.columns.contains(alias(prefix, k)) || kept.rows.contains(alias(prefix, k))) {
      k++;
    }
    if (alias(prefix, k).length() > maxLength) {
      throw new IllegalArgumentException(
          "too many names to replace: alias "
              + alias(prefix, k)
              + " is longer than "
              + maxLength
              + " characters; write free MPS instead");
    }
    return k;
  }

  private static String alias(char prefix, int k) {
    String digits = Integer.toString(k);
    StringBuilder out = new StringBuilder(8).append(prefix);
    for (int pad = digits.length(); pad < 7; pad++) {
      out.append('0');
    }
    return out.append(digits).toString();
  }

  /** The first of {@code base}, {@code base1}, {@code base2}, … not in either set (8 chars max). */
  private static String firstFree(String base, Set<String> taken, Set<String> alsoTaken) {
    if (!taken.contains(base) && !alsoTaken.contains(base)) {
      return base;
    }
    for (int k = 1; ; k++) {
      String suffix = Integer.toString(k);
      String candidate = base.substring(0, Math.min(base.length(), 8 - suffix.length())) + suffix;
      if (!taken.contains(candidate) && !alsoTaken.contains(candidate)) {
        return candidate;
      }
    }
  }

  static FileNames forLp(Milp milp, boolean constantColumn) {
    Kept kept = Kept.of(milp, FileNames::validLp);
    Set<String> assigned = new HashSet<>();
    NameMap.Builder map = new NameMap.Builder();
    List<Variable> variables = milp.variables();
    String[] columns = new String[variables.size()];
    for (int j = 0; j < columns.length; j++) {
      String name = variables.get(j).name();
      if (kept.columns.contains(name)) {
        columns[j] = name;
      } else {
        columns[j] = unique(sanitize(name), kept, assigned);
        map.add(columns[j], name);
      }
    }
    List<Row> rowList = milp.rows();
    String[] rows = new String[rowList.size()];
    String[] rangeUpper = new String[rowList.size()];
    boolean anyConstraint = false;
    for (int i = 0; i < rows.length; i++) {
      Row row = rowList.get(i);
      String name = row.name();
      boolean keep = kept.rows.contains(name);
      String base = keep ? name : sanitize(name);
      if (row.sense() == RowSense.RANGE) {
        rows[i] = unique(trimmedWith(base, "_lo"), kept, assigned);
        rangeUpper[i] = unique(trimmedWith(base, "_hi"), kept, assigned);
        map.add(rows[i], name);
        map.add(rangeUpper[i], name);
      } else if (keep) {
        rows[i] = name;
      } else {
        rows[i] = unique(base, kept, assigned);
        map.add(rows[i], name);
      }
      anyConstraint |= row.sense() != RowSense.FREE;
    }
    String objective = unique("obj", kept, assigned);
    String dummy = anyConstraint ? null : unique("dummy", kept, assigned);
    String constant = constantColumn ? unique("OBJCONST", kept, assigned) : null;
    return new FileNames(columns, rows, rangeUpper, objective, constant, dummy, map.build());
  }

  /** A valid LP name close to {@code name}. */
  static String sanitize(String name) {
    StringBuilder out = new StringBuilder(Math.min(name.length(), LP_LENGTH) + 1);
    for (int i = 0; i < name.length() && out.length() < LP_LENGTH; i++) {
      char c = name.charAt(i);
      boolean ok =
          (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '_';
      out.append(ok ? c : '_');
    }
    if (out.length() == 0
        || Character.isDigit(out.charAt(0))
        || looksLikeExponent(out.toString())
        || LP_KEYWORDS.contains(out.toString().toLowerCase(Locale.ROOT))) {
      out.insert(0, '_');
    }
    if (out.length() > LP_LENGTH) {
      out.setLength(LP_LENGTH);
    }
    return out.toString();
  }

  private static String trimmedWith(String base, String suffix) {
    return base.substring(0, Math.min(base.length(), LP_LENGTH - suffix.length())) + suffix;
  }

  /** {@code candidate}, or {@code candidate_2}, {@code _3}, … : the first no other name uses. */
  private static String unique(String candidate, Kept kept, Set<String> assigned) {
    String name = candidate;
    for (int k = 2; kept.uses(name) || assigned.contains(name); k++) {
      String suffix = "_" + k;
      name = trimmedWith(candidate, suffix);
    }
    assigned.add(name);
    return name;
  }

  /**
   * The model names a format keeps as they are; or, when made with a filter, those of them the
   * filter accepts (enough to tell whether a made-up name is taken, if the filter accepts every
   * name that could be made up).
   */
  private record Kept(Set<String> columns, Set<String> rows) {
    static Kept of(Milp milp, java.util.function.Predicate<String> valid) {
      Set<String> columns = new HashSet<>(Math.max(16, milp.columnCount() * 2));
      for (Variable v : milp.variables()) {
        if (valid.test(v.name())) {
          columns.add(v.name());
        }
      }
      Set<String> rows = new HashSet<>(Math.max(16, milp.rowCount() * 2));
      for (Row r : milp.rows()) {
        if (valid.test(r.name())) {
          rows.add(r.name());
        }
      }
      return new Kept(columns, rows);
    }

    /** The kept names that {@code filter} accepts. */
    static Kept of(
        Milp milp,
        java.util.function.Predicate<String> valid,
        java.util.function.Predicate<String> filter) {
      Set<String> columns = new HashSet<>();
      for (Variable v : milp.variables()) {
        if (filter.test(v.name()) && valid.test(v.name())) {
          columns.add(v.name());
        }
      }
      Set<String> rows = new HashSet<>();
      for (Row r : milp.rows()) {
        if (filter.test(r.name()) && valid.test(r.name())) {
          rows.add(r.name());
        }
      }
      return new Kept(columns, rows);
    }

    boolean uses(String name) {
      return columns.contains(name) || rows.contains(name);
    }
  }
}
