package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.RowSense;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.util.List;
import java.util.Optional;

/**
 * Writes a {@link Milp} in the subset of the LP text format that cbc and glpsol read alike
 * (FORMATS.md): sections Minimize, Subject To, Bounds, Generals, Binaries, End.
 *
 * <ul>
 *   <li>Minimisation only: a maximisation is written negated, said in a comment and in {@link
 *       WriteSummary#objectiveNegated()}.
 *   <li>The objective constant is the cost of a column fixed at 1 (cbc drops a constant in the
 *       objective, glpsol refuses it).
 *   <li>A range {@code lo ≤ a·x ≤ up} becomes two rows, {@code NAME_lo} and {@code NAME_hi}; a free
 *       row (no bound at all) constrains nothing and is left out, with a comment. A model with no
 *       constraint gets a dummy row {@code 0 x >= -1}.
 *   <li>Every column gets a bounds line with an explicit lower bound; a binary with bounds other
 *       than [0, 1] goes under Generals, because Binaries resets bounds to [0, 1].
 *   <li>Terms are {@code coef name} with a space; lines stay under 255 characters, long rows
 *       continue on the next line. Names are sanitized as {@link FileNames} says.
 * </ul>
 */
public final class LpWriter {
  /** The outside readers take lines up to 255 characters; stay well below. */
  static final int LINE_LIMIT = 250;

  /**
   * Writes the model.
   *
   * @throws IllegalArgumentException before anything is written, when a number is NaN, infinite
   *     where it may not be or too large for cbc
   * @throws IOException when the target fails
   */
  public WriteSummary write(Milp milp, Appendable target) throws IOException {
    ModelCheck.writable(milp);
    Objective objective = milp.objective();
    boolean negate = !objective.minimize();
    double constant = negate ? NumberText.negate(objective.constant()) : objective.constant();
    FileNames names = FileNames.forLp(milp, constant != 0 || milp.columnCount() == 0);
    TextSink out = TextSink.to(target);
    List<Variable> variables = milp.variables();
    List<Row> rows = milp.rows();

    out.append("\\ Skerry MILP ")
        .append(FileNames.printable(milp.name()))
        .append(": ")
        .append(Long.toString(milp.rowCount()))
        .append(" rows, ")
        .append(Long.toString(milp.columnCount()))
        .append(" columns (")
        .append(Long.toString(milp.integerCount() + milp.binaryCount()))
        .append(" integer)")
        .endLine();
    if (negate) {
      out.append("\\ The model maximises; this file minimises the negated objective.").endLine();
      out.append("\\ Negate the optimum a solver reports to get the model's.").endLine();
    }
    if (names.constantColumn != null) {
      out.append("\\ Column ")
          .append(names.constantColumn)
          .append(" is fixed at 1; its cost is the objective constant.")
          .endLine();
    }
    if (!names.map.isEmpty()) {
      int count = names.map.size();
      out.append("\\ ")
          .append(Integer.toString(count))
          .append(count == 1 ? " name was" : " names were")
          .append(" changed to fit the format; the name map lists them.")
          .endLine();
    }

    out.append("Minimize").endLine();
    Expression objectiveLine = new Expression(out, names);
    objectiveLine.start(names.objectiveRow);
    for (int k = 0; k < objective.cols().length; k++) {
      double c = objective.coefs()[k];
      if (c != 0) {
        objectiveLine.term(negate ? -c : c, names.columns[objective.cols()[k]]);
      }
    }
    if (names.constantColumn != null) {
      objectiveLine.term(constant, names.constantColumn);
    }
    objectiveLine.finishEmpty();
    out.endLine();

    out.append("Subject To").endLine();
    long written = 0;
    long nonZeros = 0;
    for (int i = 0; i < rows.size(); i++) {
      Row r = rows.get(i);
      RowSense sense = r.sense();
      if (sense == RowSense.FREE) {
        out.append("\\ row ")
            .append(names.rows[i])
            .append(" has no bound and is left out")
            .endLine();
        continue;
      }
      switch (sense) {
        case LE -> constraint(out, names, r, names.rows[i], "<=", r.upper());
        case GE -> constraint(out, names, r, names.rows[i], ">=", r.lower());
        case EQ -> constraint(out, names, r, names.rows[i], "=", r.lower());
        default -> {
          constraint(out, names, r, names.rows[i], ">=", r.lower());
          constraint(out, names, r, names.rangeUpper[i], "<=", r.upper());
          written++;
          nonZeros += nonZeroCount(r);
        }
      }
      written++;
      nonZeros += nonZeroCount(r);
    }
    if (names.dummyRow != null) {
      out.append(' ')
          .append(names.dummyRow)
          .append(": 0 ")
          .append(firstColumn(names))
          .append(" >= -1")
          .endLine();
      written++;
    }

    out.append("Bounds").endLine();
    boolean anyGeneral = false;
    boolean anyBinary = false;
    for (int j = 0; j < variables.size(); j++) {
      Variable v = variables.get(j);
      bound(out, names.columns[j], v.lower(), v.upper());
      anyBinary |= isPlainBinary(v);
      anyGeneral |= v.isInteger() && !isPlainBinary(v);
    }
    if (names.constantColumn != null) {
      bound(out, names.constantColumn, 1, 1);
    }
    if (anyGeneral) {
      out.append("Generals").endLine();
      for (int j = 0; j < variables.size(); j++) {
        Variable v = variables.get(j);
        if (v.isInteger() && !isPlainBinary(v)) {
          out.append(' ').append(names.columns[j]).endLine();
        }
      }
    }
    if (anyBinary) {
      out.append("Binaries").endLine();
      for (int j = 0; j < variables.size(); j++) {
        if (isPlainBinary(variables.get(j))) {
          out.append(' ').append(names.columns[j]).endLine();
        }
      }
    }
    out.append("End").endLine();
    out.flush();
    return new WriteSummary(
        ModelFormat.LP,
        negate,
        names.objectiveRow,
        Optional.ofNullable(names.constantColumn),
        names.map,
        written,
        variables.size() + (names.constantColumn == null ? 0 : 1),
        nonZeros);
  }

  private static boolean isPlainBinary(Variable v) {
    return v.type() == VarType.BINARY && Double.compare(v.lower(), 0.0) == 0 && v.upper() == 1;
  }

  private static long nonZeroCount(Row r) {
    long n = 0;
    for (double c : r.coefs()) {
      if (c != 0) {
        n++;
      }
    }
    return n;
  }

  private static String firstColumn(FileNames names) {
    return names.columns.length > 0 ? names.columns[0] : names.constantColumn;
  }

  private static void constraint(
      TextSink out, FileNames names, Row r, String label, String relation, double rhs)
      throws IOException {
    Expression line = new Expression(out, names);
    line.start(label);
    for (int k = 0; k < r.cols().length; k++) {
      if (r.coefs()[k] != 0) {
        line.term(r.coefs()[k], names.columns[r.cols()[k]]);
      }
    }
    line.finishEmpty();
    line.piece(" " + relation + " " + NumberText.free(rhs));
    out.endLine();
  }

  private static void bound(TextSink out, String column, double lo, double up) throws IOException {
    out.append(' ');
    if (Double.compare(lo, up) == 0) {
      out.append(column).append(" = ").append(NumberText.free(lo));
    } else if (lo == Double.NEGATIVE_INFINITY && up == Double.POSITIVE_INFINITY) {
      out.append(column).append(" free");
    } else if (up == Double.POSITIVE_INFINITY) {
      out.append(column).append(" >= ").append(NumberText.free(lo));
    } else {
      out.append(lo == Double.NEGATIVE_INFINITY ? "-inf" : NumberText.free(lo))
          .append(" <= ")
          .append(column)
          .append(" <= ")
          .append(NumberText.free(up));
    }
    out.endLine();
  }

  /** One labelled linear expression, wrapped over several lines when long. */
  private static final class Expression {
    private final TextSink out;
    private final FileNames names;
    private boolean empty = true;

    Expression(TextSink out, FileNames names) {
      this.out = out;
      this.names = names;
    }

    void start(String label) {
      out.append(' ').append(label).append(':');
    }

    void term(double coef, String column) throws IOException {
      StringBuilder piece = new StringBuilder(32);
      piece.append(' ');
      if (coef < 0) {
        piece.append("- ");
      } else if (!empty) {
        piece.append("+ ");
      }
      double magnitude = Math.abs(coef);
      if (magnitude != 1) {
        NumberText.appendFree(magnitude, piece);
        piece.append(' ');
      }
      piece.append(column);
      piece(piece.toString());
      empty = false;
    }

    /** An expression needs a term: {@code 0 x} stands in for none. */
    void finishEmpty() throws IOException {
      if (empty) {
        piece(" 0 " + firstColumn(names));
        empty = false;
      }
    }

    void piece(String text) throws IOException {
      if (out.column() + text.length() > LINE_LIMIT) {
        out.endLine();
      }
      out.append(text);
    }
  }
}
