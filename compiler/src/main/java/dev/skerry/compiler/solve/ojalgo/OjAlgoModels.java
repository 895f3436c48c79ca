package dev.skerry.compiler.solve.ojalgo;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import java.math.BigDecimal;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;

/**
 * Writes a {@link Milp} as an ojAlgo {@link ExpressionsBasedModel}: one ojAlgo variable per column
 * in the same order (so result index i is column i), one expression per row, the objective as
 * variable weights. The objective constant stays out; the solve layer adds it back by evaluating
 * the model's own objective. Infinite bounds are left unset, which ojAlgo reads as unbounded.
 */
final class OjAlgoModels {
  private OjAlgoModels() {}

  static ExpressionsBasedModel of(Milp milp) {
    ExpressionsBasedModel model = new ExpressionsBasedModel();
    org.ojalgo.optimisation.Variable[] vars =
        new org.ojalgo.optimisation.Variable[milp.columnCount()];
    for (Variable v : milp.variables()) {
      org.ojalgo.optimisation.Variable x = model.addVariable(v.name());
      if (Double.isFinite(v.lower())) {
        x.lower(v.lower());
      }
      if (Double.isFinite(v.upper())) {
        x.upper(v.upper());
      }
      if (v.isInteger()) {
        x.integer(true);
      }
      vars[v.index()] = x;
    }
    for (Row r : milp.rows()) {
      Expression e = model.addExpression(r.name());
      int[] cols = r.cols();
      double[] coefs = r.coefs();
      for (int i = 0; i < cols.length; i++) {
        e.set(vars[cols[i]], coefs[i]);
      }
      if (Double.isFinite(r.lower())) {
        e.lower(r.lower());
      }
      if (Double.isFinite(r.upper())) {
        e.upper(r.upper());
      }
    }
    Objective objective = milp.objective();
    for (int i = 0; i < objective.cols().length; i++) {
      vars[objective.cols()[i]].weight(objective.coefs()[i]);
    }
    return model;
  }

  /** Sets every variable's value to the warm start, which ojAlgo takes as its first incumbent. */
  static void setStart(ExpressionsBasedModel model, double[] start) {
    for (int i = 0; i < start.length; i++) {
      model.getVariable(i).setValue(BigDecimal.valueOf(start[i]));
    }
  }
}
