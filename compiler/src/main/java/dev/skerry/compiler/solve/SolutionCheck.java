package dev.skerry.compiler.solve;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import java.util.Locale;

/**
 * Checks the values a backend returned against the model itself, never trusting the backend's own
 * word. Each bound and row is measured relative to its own magnitude (the largest of 1, its finite
 * bound and its largest term), integrality absolutely. A violation above {@link #TOLERANCE} adds a
 * warning; one above {@link #ERROR_TOLERANCE} turns the result into {@link SolveStatus#ERROR}: the
 * point is then not a plan for this model. Tolerances as solvers use them by default (about 1e-6):
 * common practice.
 */
public final class SolutionCheck {
  public static final double TOLERANCE = 1e-6;
  public static final double ERROR_TOLERANCE = 1e-4;

  private SolutionCheck() {}

  /** The worst scaled violation at a point, and where it is. */
  public record Violation(double scaled, double absolute, String where) {
    public static final Violation NONE = new Violation(0, 0, "");
  }

  /**
   * Returns the result with its objective recomputed from the values, its max violation filled in
   * and, if the values violate the model, a warning or an ERROR status. A result without values, or
   * with the wrong number of them, is handled too.
   */
  public static SolveResult apply(Milp model, SolveResult result) {
    if (!result.hasValues()) {
      return result;
    }
    double[] x = result.values();
    SolveResult.Builder b = result.toBuilder();
    if (x.length != model.columnCount()) {
      return b.status(SolveStatus.ERROR)
          .values(null)
          .objective(Double.NaN)
          .message(
              "backend returned "
                  + x.length
                  + " values for "
                  + model.columnCount()
                  + " columns (was "
                  + result.status()
                  + ")")
          .build();
    }
    for (int i = 0; i < x.length; i++) {
      if (!Double.isFinite(x[i])) {
        return b.status(SolveStatus.ERROR)
            .objective(Double.NaN)
            .message(
                "backend returned "
                    + x[i]
                    + " for column "
                    + model.variables().get(i).name()
                    + " (was "
                    + result.status()
                    + ")")
            .build();
      }
    }
    b.objective(model.objective().value(x)).maxViolation(model.maxViolation(x));
    Violation worst = worst(model, x);
    if (worst.scaled() > ERROR_TOLERANCE && result.status().hasSolution()) {
      b.status(SolveStatus.ERROR)
          .message(
              "backend reported "
                  + result.status()
                  + " but its values violate the model: "
                  + describe(worst));
    } else if (worst.scaled() > TOLERANCE) {
      b.warning("values slightly violate the model: " + describe(worst));
    }
    return b.build();
  }

  /** The worst violation at a point, each item scaled by its own magnitude. */
  public static Violation worst(Milp model, double[] x) {
    Violation worst = Violation.NONE;
    for (Variable v : model.variables()) {
      double value = x[v.index()];
      double over = Math.max(v.lower() - value, value - v.upper());
      if (over > 0) {
        double bound = value < v.lower() ? v.lower() : v.upper();
        worst = worse(worst, over, Math.max(1, Math.abs(bound)), "bound of column " + v.name());
      }
      if (v.isInteger()) {
        worst =
            worse(
                worst, Math.abs(value - Math.rint(value)), 1, "integrality of column " + v.name());
      }
    }
    for (Row r : model.rows()) {
      double a = r.activity(x);
      double over = Math.max(r.lower() - a, a - r.upper());
      if (over > 0) {
        worst = worse(worst, over, rowScale(r, x), "row " + r.name());
      }
    }
    return worst;
  }

  private static double rowScale(Row r, double[] x) {
    double scale = 1;
    if (Double.isFinite(r.lower())) {
      scale = Math.max(scale, Math.abs(r.lower()));
    }
    if (Double.isFinite(r.upper())) {
      scale = Math.max(scale, Math.abs(r.upper()));
    }
    int[] cols = r.cols();
    double[] coefs = r.coefs();
    for (int i = 0; i < cols.length; i++) {
      scale = Math.max(scale, Math.abs(coefs[i] * x[cols[i]]));
    }
    return scale;
  }

  private static Violation worse(Violation current, double absolute, double scale, String where) {
    double scaled = absolute / scale;
    return scaled > current.scaled() ? new Violation(scaled, absolute, where) : current;
  }

  private static String describe(Violation v) {
    return String.format(
        Locale.ROOT,
        "%s off by %.3g (%.3g relative to its size)",
        v.where(),
        v.absolute(),
        v.scaled());
  }
}
