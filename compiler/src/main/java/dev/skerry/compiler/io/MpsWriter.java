package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.util.List;
import java.util.Optional;

/**
 * Writes a {@link Milp} as free or fixed MPS, streaming line by line, following the rules in
 * FORMATS.md that make cbc and glpsol read the same model:
 *
 * <ul>
 *   <li>Sections NAME, ROWS, COLUMNS, RHS (header always), RANGES, BOUNDS, ENDATA; the free NAME
 *       line carries the word {@code FREE}.
 *   <li>Minimisation only: a maximisation is written as the minimisation of the negated objective,
 *       said in a header comment and in {@link WriteSummary#objectiveNegated()}.
 *   <li>The objective constant is the cost of a column fixed at 1 (both readers disagree on the
 *       sign of an objective RHS); a header comment names that column so that {@link MpsReader}
 *       folds it back into the constant.
 *   <li>A binary with bounds [0, 1] is written as BV; one whose bounds were narrowed (say fixed
 *       at 0) is written as an integer column with those bounds and reads back as INTEGER.
 *   <li>Each run of integer columns sits between {@code INTORG}/{@code INTEND} markers; every
 *       column gets an explicit lower bound (LO, MI, FR, FX or BV), and every integer column an
 *       explicit upper one too. Entries of a column are contiguous.
 *   <li>A range row is written with its right-hand side at the end of smaller magnitude and a
 *       RANGES width chosen so that the other end reads back exactly (see {@link
 *       NumberText#rangeWidth}).
 *   <li>Names the format cannot hold are replaced by aliases listed in the summary's {@link
 *       NameMap}; fixed MPS also needs every number in 12 characters and refuses the model
 *       otherwise (free MPS has no such limit).
 * </ul>
 *
 * Nothing is written when the model cannot be: every check runs first.
 */
public final class MpsWriter {
  /** Header comment that marks a maximisation written negated. */
  static final String SENSE_COMMENT = "* skerry-objective-sense: maximize";

  /** Header comment that names the column carrying the objective constant. */
  static final String CONSTANT_COMMENT = "* skerry-objective-constant: ";

  static final String RHS_SET = "RHS";
  static final String RANGE_SET = "RNG";
  static final String BOUND_SET = "BND";
  private static final String MARKER = "MARKER";

  private final boolean fixed;

  private MpsWriter(boolean fixed) {
    this.fixed = fixed;
  }

  /** Free MPS: names up to 64 characters, numbers of any length. */
  public static MpsWriter free() {
    return new MpsWriter(false);
  }

  /** Fixed MPS: names up to 8 characters (longer ones aliased), numbers up to 12. */
  public static MpsWriter fixed() {
    return new MpsWriter(true);
  }

  public ModelFormat format() {
    return fixed ? ModelFormat.FIXED_MPS : ModelFormat.MPS;
  }

  /**
   * Writes the model.
   *
   * @throws IllegalArgumentException before anything is written, when a number is NaN, infinite
   *     where it may not be, too large for cbc, or (fixed MPS) too long for its field
   * @throws IOException when the target fails
   */
  public WriteSummary write(Milp milp, Appendable out) throws IOException {
    ModelCheck.writable(milp);
    Job job = new Job(milp, fixed);
    if (fixed) {
      job.emit(TextSink.discarding());
    }
    TextSink sink = TextSink.to(out);
    job.emit(sink);
    sink.flush();
    return job.summary();
  }

  /** One model on its way out. */
  private static final class Job {
    private final Milp milp;
    private final boolean fixed;
    private final boolean negate;
    private final double constant;
    private final FileNames names;
    private final ColumnMajor matrix;
    private final double[] cost;
    private final FreeNumbers numbers = new FreeNumbers();
    private TextSink out;
    private String openFirst;

    Job(Milp milp, boolean fixed) {
      this.milp = milp;
      this.fixed = fixed;
      Objective objective = milp.objective();
      this.negate = !objective.minimize();
      this.constant = negate ? NumberText.negate(objective.constant()) : objective.constant();
      boolean constantColumn = constant != 0 || milp.columnCount() == 0;
      this.names = FileNames.forMps(milp, fixed, constantColumn);
      this.matrix = ColumnMajor.of(milp);
      this.cost = new double[milp.columnCount()];
      for (int k = 0; k < objective.cols().length; k++) {
        double c = objective.coefs()[k];
        cost[objective.cols()[k]] = negate ? -c : c;
      }
    }

    WriteSummary summary() {
      return new WriteSummary(
          fixed ? ModelFormat.FIXED_MPS : ModelFormat.MPS,
          negate,
          names.objectiveRow,
          Optional.ofNullable(names.constantColumn),
          names.map,
          milp.rowCount(),
          milp.columnCount() + (names.constantColumn == null ? 0 : 1),
          matrix.nonZeros());
    }

    void emit(TextSink sink) throws IOException {
      this.out = sink;
      header();
      rows();
      columns();
      rhs();
      ranges();
      bounds();
      out.append("ENDATA").endLine();
    }

    private void header() throws IOException {
      out.append("* Skerry MILP ")
          .append(FileNames.printable(milp.name()))
          .append(": ")
          .append(Long.toString(milp.rowCount()))
          .append(" rows, ")
          .append(Long.toString(milp.columnCount()))
          .append(" columns (")
          .append(Long.toString(milp.integerCount() + milp.binaryCount()))
          .append(" integer), ")
          .append(Long.toString(matrix.nonZeros()))
          .append(" non-zeros")
          .endLine();
      if (negate) {
        out.append(SENSE_COMMENT).endLine();
        out.append("* The model maximises; this file minimises the negated objective.").endLine();
        out.append("* Negate the optimum a solver reports to get the model's.").endLine();
      }
      if (names.constantColumn != null) {
        out.append(CONSTANT_COMMENT).append(names.constantColumn).endLine();
        out.append("* That column is fixed at 1; its cost is the objective constant.").endLine();
      }
      if (!names.map.isEmpty()) {
        int count = names.map.size();
        out.append("* ")
            .append(Integer.toString(count))
            .append(count == 1 ? " name" : " names")
            .append(
                fixed
                    ? " that fixed MPS cannot hold (over 8 characters,"
                    : " that free MPS cannot hold (over 64 characters,")
            .append(" blanks or unusual characters) ")
            .append(count == 1 ? "was replaced by an alias" : "were replaced by aliases")
            .append("; the name map lists them.")
            .endLine();
      }
      // Both readers take a long name here too (glpsol shows its first 8 characters only).
      String name = FileNames.modelName(milp.name(), FileNames.FREE_MPS_LENGTH);
      if (fixed) {
        out.append("NAME").padTo(14).append(name).endLine();
      } else {
        out.append("NAME  ").append(name).append("  FREE").endLine();
      }
    }

    private void rows() throws IOException {
      out.append("ROWS").endLine();
      rowLine('N', names.objectiveRow);
      List<Row> rows = milp.rows();
      for (int i = 0; i < rows.size(); i++) {
        rowLine(RowForm.of(rows.get(i)).type, names.rows[i]);
      }
    }

    private void rowLine(char type, String name) throws IOException {
      out.append(' ').append(type).append("  ").append(name).endLine();
    }

    private void columns() throws IOException {
      out.append("COLUMNS").endLine();
      List<Variable> variables = milp.variables();
      boolean inIntegers = false;
      for (int j = 0; j < variables.size(); j++) {
        Variable v = variables.get(j);
        if (v.isInteger() != inIntegers) {
          marker(inIntegers ? "'INTEND'" : "'INTORG'");
          inIntegers = v.isInteger();
        }
        String column = names.columns[j];
        boolean any = false;
        if (cost[j] != 0) {
          entry(column, names.objectiveRow, cost[j], "objective coefficient of column", v, -1);
          any = true;
        }
        for (int k = matrix.start[j]; k < matrix.start[j + 1]; k++) {
          int row = matrix.rows[k];
          entry(column, names.rows[row], matrix.values[k], "coefficient of column", v, row);
          any = true;
        }
        if (!any) {
          entry(column, names.objectiveRow, "0");
        }
        closeEntries();
      }
      if (inIntegers) {
        marker("'INTEND'");
      }
      if (names.constantColumn != null) {
        entry(names.constantColumn, names.objectiveRow, constant, "objective constant", null, -1);
        closeEntries();
      }
    }

    private void marker(String kind) throws IOException {
      closeEntries();
      if (fixed) {
        out.append("    ")
            .append(MARKER)
            .padTo(14)
            .append("'MARKER'")
            .padTo(39)
            .append(kind)
            .endLine();
      } else {
        out.append("    ").append(MARKER).append("  'MARKER'  ").append(kind).endLine();
      }
    }

    private void rhs() throws IOException {
      out.append("RHS").endLine();
      List<Row> rows = milp.rows();
      for (int i = 0; i < rows.size(); i++) {
        Row r = rows.get(i);
        RowForm form = RowForm.of(r);
        if (form.type == 'N') {
          continue;
        }
        double value = form.rhs(r);
        if (Double.compare(value, 0.0) != 0) {
          entry(RHS_SET, names.rows[i], value, "right-hand side", null, i);
        }
      }
      closeEntries();
    }

    private void ranges() throws IOException {
      List<Row> rows = milp.rows();
      boolean headed = false;
      for (int i = 0; i < rows.size(); i++) {
        Row r = rows.get(i);
        RowForm form = RowForm.of(r);
        if (!form.range) {
          continue;
        }
        if (!headed) {
          out.append("RANGES").endLine();
          headed = true;
        }
        double near = form.rhs(r);
        double far = form == RowForm.RANGE_FROM_LOWER ? r.upper() : r.lower();
        String width =
            NumberText.rangeWidth(near, far, fixed ? NumberText.FIXED_WIDTH : Integer.MAX_VALUE);
        if (width == null) {
          throw new IllegalArgumentException(
              "row "
                  + r.name()
                  + ": the range ["
                  + r.lower()
                  + ", "
                  + r.upper()
                  + "] needs a RANGES entry longer than 12 characters to read back exactly;"
                  + " write free MPS instead");
        }
        entry(RANGE_SET, names.rows[i], width);
      }
      closeEntries();
    }

    private void bounds() throws IOException {
      out.append("BOUNDS").endLine();
      List<Variable> variables = milp.variables();
      for (int j = 0; j < variables.size(); j++) {
        Variable v = variables.get(j);
        String column = names.columns[j];
        double lo = v.lower();
        double up = v.upper();
        if (v.type() == VarType.BINARY && Double.compare(lo, 0.0) == 0 && up == 1) {
          bound("BV", column, null);
        } else if (Double.compare(lo, up) == 0) {
          bound("FX", column, number(lo, "fixed value of column", v, -1));
        } else if (lo == Double.NEGATIVE_INFINITY && up == Double.POSITIVE_INFINITY) {
          bound("FR", column, null);
        } else {
          if (lo == Double.NEGATIVE_INFINITY) {
            bound("MI", column, null);
          } else {
            bound("LO", column, number(lo, "lower bound of column", v, -1));
          }
          if (up != Double.POSITIVE_INFINITY) {
            bound("UP", column, number(up, "upper bound of column", v, -1));
          } else if (v.isInteger()) {
            bound("PL", column, null);
          }
        }
      }
      if (names.constantColumn != null) {
        bound("FX", names.constantColumn, "1");
      }
    }

    private void bound(String type, String column, String value) throws IOException {
      out.append(' ').append(type).append(' ').append(BOUND_SET);
      if (fixed) {
        out.padTo(14).append(column);
        if (value != null) {
          out.rightAligned(value, 36);
        }
      } else {
        out.append("  ").append(column);
        if (value != null) {
          out.append("  ").append(value);
        }
      }
      out.endLine();
    }

    /**
     * One (row, number) pair: in free MPS the number goes straight into the line, with no string
     * of its own; in fixed MPS, as {@link #number} spells it (the other arguments say where it is,
     * for that method's error).
     */
    private void entry(String first, String row, double value, String what, Variable column, int rowIndex)
        throws IOException {
      if (fixed) {
        entry(first, row, number(value, what, column, rowIndex));
        return;
      }
      boolean second = openFirst != null && openFirst.equals(first);
      if (!second) {
        closeEntries();
        out.append("    ").append(first);
      }
      out.append("  ").append(row).append("  ");
      numbers.append(value, out.text());
      if (second) {
        out.endLine();
        openFirst = null;
      } else {
        openFirst = first;
      }
    }

    /** One (row, value) pair of a COLUMNS, RHS or RANGES line; two pairs share a line. */
    private void entry(String first, String row, String value) throws IOException {
      if (openFirst != null && openFirst.equals(first)) {
        if (fixed) {
          out.padTo(39).append(row).rightAligned(value, 61);
        } else {
          out.append("  ").append(row).append("  ").append(value);
        }
        out.endLine();
        openFirst = null;
        return;
      }
      closeEntries();
      if (fixed) {
        out.append("    ").append(first).padTo(14).append(row).rightAligned(value, 36);
      } else {
        out.append("    ").append(first).append("  ").append(row).append("  ").append(value);
      }
      openFirst = first;
    }

    private void closeEntries() throws IOException {
      if (openFirst != null) {
        out.endLine();
        openFirst = null;
      }
    }

    /** A number as text; in fixed MPS, refuses one that cannot fit, naming where it is. */
    private String number(double v, String what, Variable column, int row) {
      if (!fixed) {
        return numbers.text(v);
      }
      String text = NumberText.fixed(v);
      if (text == null) {
        throw new IllegalArgumentException(
            what
                + (column == null ? "" : " " + column.name())
                + (row < 0
                    ? ""
                    : (column == null ? " of row " : " in row ") + milp.rows().get(row).name())
                + ": "
                + v
                + " needs more than 12 characters to read back exactly; write free MPS instead");
      }
      return text;
    }
  }

  /** How a row goes into the ROWS, RHS and RANGES sections. */
  private enum RowForm {
    FREE('N', false),
    LESS('L', false),
    GREATER('G', false),
    EQUAL('E', false),
    RANGE_FROM_LOWER('G', true),
    RANGE_FROM_UPPER('L', true);

    final char type;
    final boolean range;

    RowForm(char type, boolean range) {
      this.type = type;
      this.range = range;
    }

    static RowForm of(Row r) {
      return switch (r.sense()) {
        case FREE -> FREE;
        case LE -> LESS;
        case GE -> GREATER;
          // -0.0 and 0.0 compare equal but are kept apart: write such a row as a range of width 0.
        case EQ -> Double.compare(r.lower(), r.upper()) == 0 ? EQUAL : RANGE_FROM_LOWER;
        case RANGE ->
            Math.abs(r.lower()) <= Math.abs(r.upper()) ? RANGE_FROM_LOWER : RANGE_FROM_UPPER;
      };
    }

    /** The right-hand side written for a row of this form. */
    double rhs(Row r) {
      return switch (this) {
        case LESS, RANGE_FROM_UPPER -> r.upper();
        case GREATER, EQUAL, RANGE_FROM_LOWER -> r.lower();
        case FREE -> 0;
      };
    }
  }
}
