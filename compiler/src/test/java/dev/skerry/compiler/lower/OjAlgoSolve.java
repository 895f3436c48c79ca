package dev.skerry.compiler.lower;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;

/**
 * Test-scope bridge from our {@link Milp} to ojAlgo's ExpressionsBasedModel, so lowering tests can
 * solve tiny instances without waiting for the solver backends. ojAlgo's presolvers are cleared
 * for the solve (a registry-wide setting, restored afterwards): on this formulation that is several
 * times faster.
 */
final class OjAlgoSolve {
  private OjAlgoSolve() {}

  record Result(Optimisation.State state, double objective, double[] x) {
    boolean optimal() {
      return state == Optimisation.State.OPTIMAL;
    }

    boolean infeasible() {
      return state == Optimisation.State.INFEASIBLE;
    }
  }

  static Result solve(Milp milp) {
    ExpressionsBasedModel model = new ExpressionsBasedModel();
    org.ojalgo.optimisation.Variable[] cols = new org.ojalgo.optimisation.Variable[milp.columnCount()];
    for (Variable v : milp.variables()) {
      org.ojalgo.optimisation.Variable col = model.addVariable(v.name());
      if (Double.isFinite(v.lower())) {
        col.lower(v.lower());
      }
      if (Double.isFinite(v.upper())) {
        col.upper(v.upper());
      }
      col.integer(v.isInteger());
      double w = milp.objective().coefficientOf(v.index());
      if (w != 0) {
        col.weight(w);
      }
      cols[v.index()] = col;
    }
    for (Row r : milp.rows()) {
      Expression e = model.addExpression(r.name());
      for (int i = 0; i < r.size(); i++) {
        e.set(cols[r.cols()[i]], r.coefs()[i]);
      }
      if (Double.isFinite(r.lower())) {
        e.lower(r.lower());
      }
      if (Double.isFinite(r.upper())) {
        e.upper(r.upper());
      }
    }
    Optimisation.Result res;
    ExpressionsBasedModel.clearPresolvers();
    try {
      res = model.minimise();
    } finally {
      ExpressionsBasedModel.resetPresolvers();
    }
    double[] x = new double[cols.length];
    for (int i = 0; i < x.length; i++) {
      x[i] = res.doubleValue(i);
    }
    return new Result(res.getState(), milp.objective().value(x), x);
  }
}
