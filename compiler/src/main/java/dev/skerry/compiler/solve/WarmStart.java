package dev.skerry.compiler.solve;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import java.util.Optional;

/** Prepares a caller's warm start for a backend: checked for shape, integer columns rounded. */
public final class WarmStart {
  private WarmStart() {}

  /**
   * The warm start of the options ready to hand to a solver, or empty when there is none or it does
   * not fit the model; in that case {@code warnings} receives why it was dropped.
   */
  public static Optional<double[]> prepare(
      Milp model, SolveOptions options, SolveResult.Builder warnings) {
    Optional<double[]> given = options.warmStart();
    if (given.isEmpty()) {
      return given;
    }
    double[] x = given.get();
    if (x.length != model.columnCount()) {
      warnings.warning(
          "warm start ignored: it has "
              + x.length
              + " values for "
              + model.columnCount()
              + " columns");
      return Optional.empty();
    }
    for (Variable v : model.variables()) {
      double value = x[v.index()];
      if (!Double.isFinite(value)) {
        warnings.warning("warm start ignored: column " + v.name() + " has value " + value);
        return Optional.empty();
      }
      if (v.isInteger()) {
        x[v.index()] = Math.rint(value);
      }
    }
    return Optional.of(x);
  }
}
