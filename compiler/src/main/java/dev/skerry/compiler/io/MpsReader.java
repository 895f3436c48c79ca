package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Reads free or fixed MPS into a {@link Milp}. Sections NAME, ROWS, COLUMNS, RHS, RANGES, BOUNDS,
 * ENDATA in this order, with OBJSENSE and OBJNAME tolerated anywhere before ENDATA; integer
 * markers; bound types UP, LO, FX, FR, MI, PL, BV, LI, UI. How values turn into bounds is
 * documented on {@link MpsModel}.
 *
 * <p>Free MPS splits lines at blanks; a RHS or RANGES line may leave out its set name. Fixed MPS
 * reads fields by column (2-3, 5-12, 15-22, 25-36, 40-47, 50-61; GLPK reference manual, appendix
 * B), so names may hold blanks; a blank column name continues the previous column, and a {@code $}
 * at the start of field 3 or 5 makes the rest of the line a comment.
 *
 * <p>The two header comments {@link MpsWriter} writes are understood: a maximisation written
 * negated is read back as the maximisation, and the column carrying the objective constant is
 * folded back into the constant. A {@link NameMap} turns aliases back into full names.
 *
 * <p>Every problem is a {@link ModelFormatException} with its line number.
 */
public final class MpsReader {
  private enum Section {
    NONE,
    NAME,
    ROWS,
    COLUMNS,
    RHS,
    RANGES,
    BOUNDS,
    ENDATA
  }

  private static final String MARKER = "'MARKER'";

  private final boolean fixed;
  private final MpsModel model = new MpsModel();
  private Section section = Section.NONE;
  private boolean expectSense;
  private boolean expectObjectiveName;
  private boolean inIntegers;
  private int currentColumn = -1;
  private String currentColumnName;
  private final String[] sets = new String[Section.values().length];
  private int lineNo;

  private MpsReader(boolean fixed) {
    this.fixed = fixed;
  }

  /** Reads a model written in {@code format} (MPS or FIXED_MPS). */
  public static Milp read(Reader in, ModelFormat format) throws IOException {
    return read(in, format, NameMap.EMPTY);
  }

  /** Reads a model and restores the full names of the aliases in {@code names}. */
  public static Milp read(Reader in, ModelFormat format, NameMap names) throws IOException {
    if (!format.isMps()) {
      throw new IllegalArgumentException("MpsReader reads MPS, not " + format);
    }
    BufferedReader lines = in instanceof BufferedReader b ? b : new BufferedReader(in, 1 << 16);
    return new MpsReader(format == ModelFormat.FIXED_MPS).run(lines, names);
  }

  /** Reads a file whose format follows from its name (see {@link ModelFormat#fromPath}). */
  public static Milp read(Path file) throws IOException {
    return read(file, ModelFormat.fromPath(file), NameMap.EMPTY);
  }

  /** Reads a file in the given format. */
  public static Milp read(Path file, ModelFormat format, NameMap names) throws IOException {
    try (Reader in = Files.newBufferedReader(file, StandardCharsets.ISO_8859_1)) {
      return read(in, format, names);
    }
  }

  private Milp run(BufferedReader lines, NameMap names) throws IOException {
    String text;
    while ((text = lines.readLine()) != null) {
      lineNo++;
      if (section == Section.ENDATA) {
        continue;
      }
      if (text.isBlank()) {
        continue;
      }
      if (text.charAt(0) == '*') {
        comment(text);
        continue;
      }
      if (text.charAt(0) != ' ' && text.charAt(0) != '\t') {
        header(text);
      } else {
        data(text);
      }
    }
    if (section != Section.ENDATA) {
      throw new ModelFormatException(lineNo + 1, "the file ends without ENDATA (is it cut short?)");
    }
    return model.build(names, lineNo);
  }

  private void comment(String text) throws ModelFormatException {
    if (text.startsWith(MpsWriter.SENSE_COMMENT)) {
      model.maximizeByComment();
    } else if (text.startsWith(MpsWriter.CONSTANT_COMMENT)) {
      String column = text.substring(MpsWriter.CONSTANT_COMMENT.length()).trim();
      if (column.isEmpty()) {
        throw new ModelFormatException(lineNo, "the objective-constant comment names no column");
      }
      model.constantColumn(column, lineNo);
    }
  }

  private void header(String text) throws ModelFormatException {
    List<String> words = MpsFields.split(text);
    String keyword = words.get(0).toUpperCase(Locale.ROOT);
    expectSense = false;
    expectObjectiveName = false;
    switch (keyword) {
      case "NAME" -> {
        enter(Section.NAME, text);
        model.name = modelName(text, words);
      }
      case "ROWS" -> enter(Section.ROWS, text);
      case "COLUMNS" -> enter(Section.COLUMNS, text);
      case "RHS" -> enter(Section.RHS, text);
      case "RANGES" -> enter(Section.RANGES, text);
      case "BOUNDS" -> enter(Section.BOUNDS, text);
      case "ENDATA" -> {
        if (inIntegers) {
          throw new ModelFormatException(lineNo, "an INTORG marker is never closed by INTEND");
        }
        section = Section.ENDATA;
      }
      case "OBJSENSE" -> {
        if (words.size() > 1) {
          sense(words.get(1));
        } else {
          expectSense = true;
        }
      }
      case "OBJNAME" -> {
        if (words.size() > 1) {
          model.objectiveName(words.get(1), lineNo);
        } else {
          expectObjectiveName = true;
        }
      }
      default ->
          throw new ModelFormatException(
              lineNo,
              "unknown section '"
                  + words.get(0)
                  + "' (expected NAME, ROWS, COLUMNS, RHS, RANGES,"
                  + " BOUNDS, OBJSENSE, OBJNAME or ENDATA)");
    }
  }

  private void enter(Section next, String text) throws ModelFormatException {
    if (next.ordinal() <= section.ordinal()) {
      throw new ModelFormatException(
          lineNo,
          "section "
              + text.trim()
              + " comes after "
              + section
              + "; the order is NAME,"
              + " ROWS, COLUMNS, RHS, RANGES, BOUNDS, ENDATA");
    }
    section = next;
  }

  private String modelName(String text, List<String> words) {
    if (fixed && text.length() > 14 && text.substring(4, 14).isBlank()) {
      return text.substring(14).trim();
    }
    int last = words.size();
    if (last > 2 && words.get(last - 1).equalsIgnoreCase("FREE")) {
      last--;
    }
    return String.join(" ", words.subList(1, last));
  }

  private void sense(String word) throws ModelFormatException {
    switch (word.toUpperCase(Locale.ROOT)) {
      case "MAX", "MAXIMIZE", "MAXIMISE" -> model.maximizeBySection(true);
      case "MIN", "MINIMIZE", "MINIMISE" -> model.maximizeBySection(false);
      default -> throw new ModelFormatException(lineNo, "OBJSENSE must be MIN or MAX, not " + word);
    }
  }

  private void data(String text) throws ModelFormatException {
    if (expectSense) {
      expectSense = false;
      sense(text.trim());
      return;
    }
    if (expectObjectiveName) {
      expectObjectiveName = false;
      model.objectiveName(text.trim(), lineNo);
      return;
    }
    switch (section) {
      case ROWS -> rowsLine(text);
      case COLUMNS -> columnsLine(text);
      case RHS -> valuesLine(text, Section.RHS);
      case RANGES -> valuesLine(text, Section.RANGES);
      case BOUNDS -> boundsLine(text);
      default ->
          throw new ModelFormatException(
              lineNo, "data line outside a section (section headers start in column 1)");
    }
  }

  private void rowsLine(String text) throws ModelFormatException {
    String type;
    String name;
    if (fixed) {
      String[] f = MpsFields.fixed(text, lineNo);
      type = f[0];
      name = f[1];
    } else {
      List<String> t = MpsFields.split(text);
      expectCount(t, 2, 2, "a row type and a row name");
      type = t.get(0);
      name = t.get(1);
    }
    if (type.length() != 1 || name.isEmpty()) {
      throw new ModelFormatException(lineNo, "expected a row type (N, L, G, E) and a row name");
    }
    model.addRow(Character.toUpperCase(type.charAt(0)), name, lineNo);
  }

  private void columnsLine(String text) throws ModelFormatException {
    String column;
    String[] pairs;
    if (fixed) {
      String[] f = MpsFields.fixed(text, lineNo);
      if (MARKER.equals(f[2])) {
        marker(f[4]);
        return;
      }
      column = f[1].isEmpty() ? currentColumnName : f[1];
      if (column == null) {
        throw new ModelFormatException(
            lineNo, "this COLUMNS line needs a column name (there is none to continue)");
      }
      pairs = new String[] {f[2], f[3], f[4], f[5]};
    } else {
      List<String> t = MpsFields.split(text);
      if (t.size() == 3 && MARKER.equals(t.get(1))) {
        marker(t.get(2));
        return;
      }
      expectCount(t, 3, 5, "a column name and one or two (row, value) pairs");
      if (t.size() == 4) {
        throw new ModelFormatException(lineNo, "a row name without a value");
      }
      column = t.get(0);
      pairs =
          new String[] {
            t.get(1), t.get(2), t.size() > 3 ? t.get(3) : "", t.size() > 4 ? t.get(4) : ""
          };
    }
    if (!column.equals(currentColumnName)) {
      currentColumn = model.openColumn(column, inIntegers, lineNo);
      currentColumnName = column;
    }
    for (int p = 0; p < 4; p += 2) {
      if (p > 0 && pairs[p].isEmpty() && pairs[p + 1].isEmpty()) {
        continue;
      }
      if (pairs[p].isEmpty() || pairs[p + 1].isEmpty()) {
        throw new ModelFormatException(lineNo, "expected a row name and a value");
      }
      model.addEntry(currentColumn, pairs[p], MpsFields.number(pairs[p + 1], lineNo), lineNo);
    }
  }

  private void marker(String kind) throws ModelFormatException {
    switch (kind) {
      case "'INTORG'" -> {
        if (inIntegers) {
          throw new ModelFormatException(lineNo, "INTORG marker inside an integer block");
        }
        inIntegers = true;
      }
      case "'INTEND'" -> {
        if (!inIntegers) {
          throw new ModelFormatException(lineNo, "INTEND marker without INTORG");
        }
        inIntegers = false;
      }
      default ->
          throw new ModelFormatException(
              lineNo, "unknown marker " + kind + " ('INTORG' and 'INTEND' are known)");
    }
    currentColumnName = null;
  }

  /** A RHS or RANGES line: optional set name, then one or two (row, value) pairs. */
  private void valuesLine(String text, Section which) throws ModelFormatException {
    String set;
    String[] pairs;
    if (fixed) {
      String[] f = MpsFields.fixed(text, lineNo);
      set = f[1];
      pairs = new String[] {f[2], f[3], f[4], f[5]};
    } else {
      List<String> t = MpsFields.split(text);
      expectCount(t, 2, 5, "an optional set name and one or two (row, value) pairs");
      int first = t.size() % 2;
      set = first == 1 ? t.get(0) : "";
      pairs = new String[4];
      for (int k = 0; k < 4; k++) {
        pairs[k] = first + k < t.size() ? t.get(first + k) : "";
      }
    }
    oneSet(which, set);
    for (int p = 0; p < 4; p += 2) {
      if (p > 0 && pairs[p].isEmpty() && pairs[p + 1].isEmpty()) {
        continue;
      }
      if (pairs[p].isEmpty() || pairs[p + 1].isEmpty()) {
        throw new ModelFormatException(lineNo, "expected a row name and a value");
      }
      if (which == Section.RHS) {
        model.setRhs(pairs[p], MpsFields.number(pairs[p + 1], lineNo), lineNo);
      } else {
        model.setRange(pairs[p], MpsFields.decimal(pairs[p + 1], lineNo), lineNo);
      }
    }
  }

  private void boundsLine(String text) throws ModelFormatException {
    String type;
    String set;
    String column;
    String value;
    if (fixed) {
      String[] f = MpsFields.fixed(text, lineNo);
      type = f[0];
      set = f[1];
      column = f[2];
      value = f[3];
    } else {
      List<String> t = MpsFields.split(text);
      expectCount(t, 2, 4, "a bound type, an optional set name, a column and maybe a value");
      type = t.get(0);
      boolean needsValue = BoundType.needsValue(type);
      if (t.size() == 4) {
        set = t.get(1);
        column = t.get(2);
        value = t.get(3);
      } else if (t.size() == 2) {
        set = "";
        column = t.get(1);
        value = "";
      } else if (needsValue
          || (type.equalsIgnoreCase("BV")
              && model.hasColumn(t.get(1))
              && !model.hasColumn(t.get(2)))) {
        set = "";
        column = t.get(1);
        value = t.get(2);
      } else {
        set = t.get(1);
        column = t.get(2);
        value = "";
      }
    }
    type = type.toUpperCase(Locale.ROOT);
    if (column.isEmpty()) {
      throw new ModelFormatException(lineNo, "bound of type " + type + " names no column");
    }
    oneSet(Section.BOUNDS, set);
    double v = 0;
    if (BoundType.needsValue(type)) {
      if (value.isEmpty()) {
        throw new ModelFormatException(
            lineNo, "bound " + type + " on column " + column + " needs a value");
      }
      v = MpsFields.number(value, lineNo);
    } else if (!value.isEmpty()) {
      MpsFields.number(value, lineNo);
    }
    model.setBound(type, column, v, lineNo);
  }

  /**
   * Only one RHS, RANGES and BOUNDS set is read. A blank set name (fixed MPS) or a left-out one
   * (free MPS) belongs to the set in use, as in GLPK's own examples.
   */
  private void oneSet(Section which, String set) throws ModelFormatException {
    if (set.isEmpty()) {
      return;
    }
    String first = sets[which.ordinal()];
    if (first == null) {
      sets[which.ordinal()] = set;
    } else if (!first.equals(set)) {
      throw new ModelFormatException(
          lineNo,
          which
              + " set '"
              + set
              + "' differs from the first set '"
              + first
              + "'; only one set is read");
    }
  }

  private void expectCount(List<String> t, int min, int max, String what)
      throws ModelFormatException {
    if (t.size() < min || t.size() > max) {
      throw new ModelFormatException(
          lineNo, "expected " + what + ", found " + t.size() + " fields");
    }
  }

  /** Which bound types carry a value. */
  private static final class BoundType {
    static boolean needsValue(String type) {
      return switch (type.toUpperCase(Locale.ROOT)) {
        case "UP", "LO", "FX", "LI", "UI" -> true;
        default -> false;
      };
    }
  }
}
