package dev.skerry.compiler.solve;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Variable;

/** What the column bounds alone say about how far the objective can improve. */
public final class ObjectiveBound {
  private ObjectiveBound() {}

  /**
   * Whether the objective might be unbounded at all: false when every column with a cost is bounded
   * in the direction that improves the objective (then the objective is bounded by the column
   * bounds alone, whatever the rows say).
   */
  public static boolean mayBeUnbounded(Milp milp) {
    Objective objective = milp.objective();
    double sense = objective.minimize() ? 1 : -1;
    for (int i = 0; i < objective.cols().length; i++) {
      Variable v = milp.variables().get(objective.cols()[i]);
      double cost = sense * objective.coefs()[i];
      if ((cost > 0 && v.lower() == Double.NEGATIVE_INFINITY)
          || (cost < 0 && v.upper() == Double.POSITIVE_INFINITY)) {
        return true;
      }
    }
    return false;
  }
}
