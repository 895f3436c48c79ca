package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.SolverBackend;

/**
 * A scenario lowered and solved to optimality by SCIP, the reference the fleet moves' tests compare
 * with (SCIP's optimum of each full example is checked against cbc and glpsol in {@code
 * ExampleCrossCheckTest}).
 */
record ScipOptimum(Scenario scenario, Milp model, double[] values) {
  static final SolverBackend SCIP = Backends.standard().choose("scip", null).backend();

  static ScipOptimum of(Scenario s) {
    Milp model = Lowering.lower(s);
    SolveResult r = SCIP.solve(model, SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    return new ScipOptimum(s, model, r.values());
  }
}
