package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * What {@link MpsReader} has gathered from the sections so far, and how it becomes a {@link Milp}
 * at ENDATA. Read rules (see FORMATS.md for what the outside readers do):
 *
 * <ul>
 *   <li>The objective is the N row named by OBJNAME, else the first N row; any other N row is kept
 *       as a free row.
 *   <li>A RHS on the objective row {@code b} gives the objective constant {@code -b} (cbc reads it
 *       so; glpsol reads {@code +b}, which is why our writers never use it).
 *   <li>RANGES: L row {@code [b-|R|, b]}, G row {@code [b, b+|R|]}, E row {@code [b, b+R]} when
 *       {@code R > 0}, else {@code [b+R, b]}. The far end is computed from the RHS as read and the
 *       width as written, in exact decimal arithmetic, and rounded once.
 *   <li>Bounds: a column without any gets {@code [0, +inf)}; an integer column from the markers
 *       without any gets {@code [0, 1]}; a negative UP (or UI) on a column whose lower bound was
 *       never given makes the lower bound {@code -inf}, as cbc does; a bound value of magnitude
 *       1e30 or more is infinite, as in cbc. BV makes a binary, LI/UI an integer.
 *   <li>Zero coefficients are dropped, like {@link dev.skerry.compiler.milp.MilpBuilder} does.
 * </ul>
 */
final class MpsModel {
  private static final double HUGE_BOUND = 1e30;

  String name = "";
  private boolean maximizeBySection;
  private boolean maximizeByComment;
  private String objectiveName;
  private int objectiveNameLine;
  private String constantColumn;
  private int constantColumnLine;

  private final List<String> rowNames = new ArrayList<>();
  private final Map<String, Integer> rowIndex = new HashMap<>();
  private char[] rowTypes = new char[16];
  private int[] rowLines = new int[16];
  private double[] rhs = new double[16];
  private final Map<Integer, BigDecimal> ranges = new HashMap<>();
  private final BitSet rhsSeen = new BitSet();

  /** For each row, the last column with an entry in it (columns are contiguous, so enough). */
  private int[] lastColumnOfRow = new int[16];

  private final List<String> columnNames = new ArrayList<>();
  private final Map<String, Integer> columnIndex = new HashMap<>();
  private Column[] columns = new Column[16];

  private int[] entryRow = new int[64];
  private int[] entryColumn = new int[64];
  private double[] entryValue = new double[64];
  private int entries;

  /** Per-column bound and type bookkeeping. */
  private static final class Column {
    final int line;
    boolean markedInteger;
    VarType declared;
    double lower = 0;
    double upper = Double.POSITIVE_INFINITY;
    boolean lowerGiven;
    boolean anyBound;

    Column(int line) {
      this.line = line;
    }
  }

  void maximizeBySection(boolean maximize) {
    maximizeBySection = maximize;
  }

  void maximizeByComment() {
    maximizeByComment = true;
  }

  void objectiveName(String rowName, int line) {
    objectiveName = rowName;
    objectiveNameLine = line;
  }

  void constantColumn(String column, int line) {
    constantColumn = column;
    constantColumnLine = line;
  }

  void addRow(char type, String rowName, int line) throws ModelFormatException {
    if (type != 'N' && type != 'L' && type != 'G' && type != 'E') {
      throw new ModelFormatException(line, "row type '" + type + "' is not one of N, L, G, E");
    }
    Integer earlier = rowIndex.putIfAbsent(rowName, rowNames.size());
    if (earlier != null) {
      throw new ModelFormatException(
          line, "row " + rowName + " is declared again (first on line " + rowLines[earlier] + ")");
    }
    int i = rowNames.size();
    if (i == rowTypes.length) {
      rowTypes = Arrays.copyOf(rowTypes, i * 2);
      rowLines = Arrays.copyOf(rowLines, i * 2);
      rhs = Arrays.copyOf(rhs, i * 2);
      lastColumnOfRow = Arrays.copyOf(lastColumnOfRow, i * 2);
    }
    lastColumnOfRow[i] = -1;
    rowNames.add(rowName);
    rowTypes[i] = type;
    rowLines[i] = line;
  }

  /** The column of this name, opened now if new; refuses a column that comes back later. */
  int openColumn(String column, boolean integer, int line) throws ModelFormatException {
    Integer j = columnIndex.get(column);
    if (j != null) {
      if (j != columnNames.size() - 1) {
        throw new ModelFormatException(
            line,
            "column "
                + column
                + " appears again after other columns (first on line "
                + columns[j].line
                + "); the entries of a column must be contiguous");
      }
      return j;
    }
    int k = columnNames.size();
    if (k == columns.length) {
      columns = Arrays.copyOf(columns, k * 2);
    }
    columns[k] = new Column(line);
    columns[k].markedInteger = integer;
    columnNames.add(column);
    columnIndex.put(column, k);
    return k;
  }

  void addEntry(int column, String rowName, double value, int line) throws ModelFormatException {
    int row = row(rowName, line);
    if (lastColumnOfRow[row] == column) {
      throw new ModelFormatException(
          line, "column " + columnNames.get(column) + " has a second entry in row " + rowName);
    }
    lastColumnOfRow[row] = column;
    if (value == 0) {
      return;
    }
    if (entries == entryRow.length) {
      entryRow = Arrays.copyOf(entryRow, entries * 2);
      entryColumn = Arrays.copyOf(entryColumn, entries * 2);
      entryValue = Arrays.copyOf(entryValue, entries * 2);
    }
    entryRow[entries] = row;
    entryColumn[entries] = column;
    entryValue[entries] = value;
    entries++;
  }

  void setRhs(String rowName, double value, int line) throws ModelFormatException {
    int row = row(rowName, line);
    if (rhsSeen.get(row)) {
      throw new ModelFormatException(line, "row " + rowName + " gets a second right-hand side");
    }
    rhsSeen.set(row);
    rhs[row] = value;
  }

  void setRange(String rowName, BigDecimal width, int line) throws ModelFormatException {
    int row = row(rowName, line);
    if (rowTypes[row] == 'N') {
      throw new ModelFormatException(
          line, "row " + rowName + " is an N row and cannot have a range");
    }
    if (ranges.put(row, width) != null) {
      throw new ModelFormatException(line, "row " + rowName + " gets a second range");
    }
  }

  void setBound(String type, String columnName, double value, int line)
      throws ModelFormatException {
    Integer j = columnIndex.get(columnName);
    if (j == null) {
      throw new ModelFormatException(
          line, "bound on column " + columnName + ", which COLUMNS does not list");
    }
    Column c = columns[j];
    c.anyBound = true;
    double v =
        value >= HUGE_BOUND
            ? Double.POSITIVE_INFINITY
            : value <= -HUGE_BOUND ? Double.NEGATIVE_INFINITY : value;
    switch (type) {
      case "UP" -> c.upper = v;
      case "UI" -> {
        c.upper = v;
        c.declared = VarType.INTEGER;
      }
      case "LO" -> {
        c.lower = v;
        c.lowerGiven = true;
      }
      case "LI" -> {
        c.lower = v;
        c.lowerGiven = true;
        c.declared = VarType.INTEGER;
      }
      case "FX" -> {
        c.lower = v;
        c.upper = v;
        c.lowerGiven = true;
      }
      case "FR" -> {
        c.lower = Double.NEGATIVE_INFINITY;
        c.upper = Double.POSITIVE_INFINITY;
        c.lowerGiven = true;
      }
      case "MI" -> {
        c.lower = Double.NEGATIVE_INFINITY;
        c.lowerGiven = true;
      }
      case "PL" -> c.upper = Double.POSITIVE_INFINITY;
      case "BV" -> {
        c.lower = 0;
        c.upper = 1;
        c.lowerGiven = true;
        c.declared = VarType.BINARY;
      }
      default ->
          throw new ModelFormatException(
              line,
              "bound type " + type + " is not supported (UP, LO, FX, FR, MI, PL, BV, LI, UI are)");
    }
  }

  boolean hasColumn(String columnName) {
    return columnIndex.containsKey(columnName);
  }

  private int row(String rowName, int line) throws ModelFormatException {
    Integer i = rowIndex.get(rowName);
    if (i == null) {
      throw new ModelFormatException(line, "row " + rowName + " is not declared in ROWS");
    }
    return i;
  }

  /** The model, its names put back through {@code names}. */
  Milp build(NameMap names, int endLine) throws ModelFormatException {
    if (maximizeBySection && maximizeByComment) {
      throw new ModelFormatException(
          endLine,
          "the file has both an OBJSENSE section and the comment '"
              + MpsWriter.SENSE_COMMENT
              + "'");
    }
    int objectiveRow = objectiveRow();
    int constantCol = constantColumnIndex(objectiveRow);

    int m = rowNames.size();
    int[] rowOf = new int[m];
    int kept = 0;
    for (int i = 0; i < m; i++) {
      rowOf[i] = i == objectiveRow ? -1 : kept++;
    }
    int n = columnNames.size();
    int[] columnOf = new int[n];
    int keptColumns = 0;
    for (int j = 0; j < n; j++) {
      columnOf[j] = j == constantCol ? -1 : keptColumns++;
    }

    List<Variable> variables = new ArrayList<>(keptColumns);
    Set<String> seen = new HashSet<>();
    for (int j = 0; j < n; j++) {
      if (columnOf[j] < 0) {
        continue;
      }
      String full = names.restore(columnNames.get(j));
      if (!seen.add(full)) {
        throw new ModelFormatException(
            columns[j].line, "two columns are named " + full + " after the name map");
      }
      variables.add(variable(columnOf[j], full, columns[j]));
    }

    int[] count = new int[m];
    for (int e = 0; e < entries; e++) {
      count[entryRow[e]]++;
    }
    int[][] rowCols = new int[m][];
    double[][] rowCoefs = new double[m][];
    for (int i = 0; i < m; i++) {
      rowCols[i] = new int[count[i]];
      rowCoefs[i] = new double[count[i]];
      count[i] = 0;
    }
    double constant = objectiveRow >= 0 ? NumberText.negate(rhs[objectiveRow]) : 0;
    for (int e = 0; e < entries; e++) {
      int i = entryRow[e];
      int j = entryColumn[e];
      if (columnOf[j] < 0) {
        constant += entryValue[e];
        continue;
      }
      rowCols[i][count[i]] = columnOf[j];
      rowCoefs[i][count[i]] = entryValue[e];
      count[i]++;
    }

    List<Row> rows = new ArrayList<>(kept);
    seen.clear();
    for (int i = 0; i < m; i++) {
      if (rowOf[i] < 0) {
        continue;
      }
      String full = names.restore(rowNames.get(i));
      if (!seen.add(full)) {
        throw new ModelFormatException(
            rowLines[i], "two rows are named " + full + " after the name map");
      }
      int[] cols = Arrays.copyOf(rowCols[i], count[i]);
      double[] coefs = Arrays.copyOf(rowCoefs[i], count[i]);
      double[] bounds = rowBounds(i);
      rows.add(new Row(rowOf[i], full, cols, coefs, bounds[0], bounds[1], Origin.NONE));
    }

    Objective objective;
    if (objectiveRow < 0) {
      objective = new Objective(!maximizeBySection, new int[0], new double[0], constant);
    } else {
      int size = count[objectiveRow];
      int[] cols = Arrays.copyOf(rowCols[objectiveRow], size);
      double[] coefs = Arrays.copyOf(rowCoefs[objectiveRow], size);
      if (maximizeByComment) {
        for (int k = 0; k < size; k++) {
          coefs[k] = -coefs[k];
        }
        constant = NumberText.negate(constant);
      }
      objective = new Objective(!(maximizeBySection || maximizeByComment), cols, coefs, constant);
    }
    return new Milp(name, variables, rows, objective);
  }

  private int objectiveRow() throws ModelFormatException {
    if (objectiveName != null) {
      Integer i = rowIndex.get(objectiveName);
      if (i == null || rowTypes[i] != 'N') {
        throw new ModelFormatException(
            objectiveNameLine, "OBJNAME names " + objectiveName + ", which is not an N row");
      }
      return i;
    }
    for (int i = 0; i < rowNames.size(); i++) {
      if (rowTypes[i] == 'N') {
        return i;
      }
    }
    return -1;
  }

  /** The column our writer used for the objective constant, checked, or -1. */
  private int constantColumnIndex(int objectiveRow) throws ModelFormatException {
    if (constantColumn == null) {
      return -1;
    }
    Integer j = columnIndex.get(constantColumn);
    if (j == null) {
      throw new ModelFormatException(
          constantColumnLine,
          "the comment names column "
              + constantColumn
              + " for the objective constant, but COLUMNS does not list it");
    }
    Column c = columns[j];
    boolean onlyObjective = true;
    for (int e = 0; e < entries && onlyObjective; e++) {
      onlyObjective = entryColumn[e] != j || entryRow[e] == objectiveRow;
    }
    if (!onlyObjective || c.markedInteger || c.declared != null || c.lower != 1 || c.upper != 1) {
      throw new ModelFormatException(
          constantColumnLine,
          "column "
              + constantColumn
              + " should carry the objective constant, but it is not a"
              + " continuous column fixed at 1 that appears in the objective only");
    }
    return j;
  }

  private static Variable variable(int index, String full, Column c) {
    double lower = c.lowerGiven ? c.lower : 0;
    double upper = c.upper;
    if (c.markedInteger && !c.anyBound) {
      upper = 1;
    }
    if (!c.lowerGiven && upper < 0) {
      lower = Double.NEGATIVE_INFINITY;
    }
    VarType type =
        c.declared != null ? c.declared : c.markedInteger ? VarType.INTEGER : VarType.CONTINUOUS;
    if (type == VarType.BINARY && (lower < 0 || upper > 1)) {
      type = VarType.INTEGER;
    }
    return new Variable(index, full, type, lower, upper, Origin.NONE);
  }

  /** {lower, upper} of a row from its type, right-hand side and range. */
  private double[] rowBounds(int i) {
    double b = rhs[i];
    BigDecimal r = ranges.get(i);
    return switch (rowTypes[i]) {
      case 'N' -> new double[] {Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY};
      case 'L' ->
          new double[] {r == null ? Double.NEGATIVE_INFINITY : shifted(b, r.abs().negate()), b};
      case 'G' -> new double[] {b, r == null ? Double.POSITIVE_INFINITY : shifted(b, r.abs())};
      default -> {
        if (r == null || r.signum() == 0) {
          yield new double[] {b, b};
        }
        yield r.signum() > 0 ? new double[] {b, shifted(b, r)} : new double[] {shifted(b, r), b};
      }
    };
  }

  private static double shifted(double b, BigDecimal by) {
    return new BigDecimal(b).add(by).doubleValue();
  }
}
