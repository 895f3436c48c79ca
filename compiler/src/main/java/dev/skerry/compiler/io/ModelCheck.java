package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.NameSet;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.RowSense;
import dev.skerry.compiler.milp.Variable;
import java.util.List;

/**
 * Checks, before a single character is written, that every number of a model can be written and
 * read back the same by both outside readers: no NaN or infinite coefficient, no bound on the wrong
 * side of infinity, nothing so large that cbc would read it as infinite, column indices that exist,
 * and unique names.
 */
final class ModelCheck {
  private ModelCheck() {}

  /**
   * @throws IllegalArgumentException naming the first offending row or column
   */
  static void writable(Milp milp) {
    List<Variable> columns = milp.variables();
    int n = columns.size();
    // A builder's model has had its names checked already; only other models are looked at here.
    NameSet names = milp.namesChecked() ? null : new NameSet(n);
    for (int j = 0; j < n; j++) {
      Variable v = columns.get(j);
      if (v.index() != j) {
        throw new IllegalArgumentException(
            "column " + v.name() + " has index " + v.index() + " but sits at position " + j);
      }
      if (names != null && !names.add(v.name())) {
        throw new IllegalArgumentException("two columns are named " + v.name());
      }
      bound(v.lower(), "lower bound of column ", v.name());
      bound(v.upper(), "upper bound of column ", v.name());
      if (v.lower() == Double.POSITIVE_INFINITY
          || v.upper() == Double.NEGATIVE_INFINITY
          || v.lower() > v.upper()) {
        throw new IllegalArgumentException(
            "column " + v.name() + " has bounds [" + v.lower() + ", " + v.upper() + "]");
      }
    }
    NameSet rowNames = milp.namesChecked() ? null : new NameSet(milp.rowCount());
    for (Row r : milp.rows()) {
      if (rowNames != null && !rowNames.add(r.name())) {
        throw new IllegalArgumentException("two rows are named " + r.name());
      }
      int[] cols = r.cols();
      double[] coefs = r.coefs();
      int previous = -1;
      for (int k = 0; k < cols.length; k++) {
        int col = cols[k];
        if (col <= previous || col >= n) {
          throw new IllegalArgumentException(
              "row " + r.name() + ": column index " + col + " is out of range or not ascending");
        }
        previous = col;
        if (!writableCoefficient(coefs[k])) {
          coefficient(coefs[k], "row " + r.name() + ", column " + columns.get(col).name());
        }
      }
      bound(r.lower(), "lower bound of row ", r.name());
      bound(r.upper(), "upper bound of row ", r.name());
      if (r.lower() == Double.POSITIVE_INFINITY
          || r.upper() == Double.NEGATIVE_INFINITY
          || r.lower() > r.upper()) {
        throw new IllegalArgumentException(
            "row " + r.name() + " has bounds [" + r.lower() + ", " + r.upper() + "]");
      }
      if (r.sense() == RowSense.RANGE && r.upper() - r.lower() >= NumberText.HUGE) {
        throw new IllegalArgumentException(
            "row "
                + r.name()
                + " spans "
                + (r.upper() - r.lower())
                + ", which cbc would read as unbounded");
      }
    }
    Objective objective = milp.objective();
    boolean[] seen = new boolean[n];
    for (int k = 0; k < objective.cols().length; k++) {
      int col = objective.cols()[k];
      if (col < 0 || col >= n) {
        throw new IllegalArgumentException(
            "objective refers to column index " + col + ", which does not exist");
      }
      if (seen[col]) {
        throw new IllegalArgumentException(
            "objective lists column " + columns.get(col).name() + " twice");
      }
      seen[col] = true;
      if (!writableCoefficient(objective.coefs()[k])) {
        coefficient(objective.coefs()[k], "objective, column " + columns.get(col).name());
      }
    }
    coefficient(objective.constant(), "objective constant");
  }

  /**
   * True for a finite coefficient below {@link NumberText#HUGE}: the common case, tested without
   * building the text that would name the place (that text is only made for an error).
   */
  private static boolean writableCoefficient(double value) {
    return Math.abs(value) < NumberText.HUGE;
  }

  private static void coefficient(double value, String where) {
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException(
          where + ": coefficient " + value + " is not a finite number");
    }
    huge(value, where);
  }

  /** Checks a bound; the place is named {@code what + name}, put together only for an error. */
  private static void bound(double value, String what, String name) {
    if (Double.isNaN(value)) {
      throw new IllegalArgumentException(what + name + " is NaN");
    }
    if (Double.isFinite(value) && Math.abs(value) >= NumberText.HUGE) {
      huge(value, what + name);
    }
  }

  private static void huge(double value, String where) {
    if (Math.abs(value) >= NumberText.HUGE) {
      throw new IllegalArgumentException(
          where + ": " + value + " is 1e30 or larger, which cbc reads as infinite");
    }
  }
}
