package dev.skerry.compiler.solve.ojalgo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.plan.ExampleScenarios;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;

/**
 * The ojAlgo behaviour behind the false INFEASIBLE, shown deterministically: a limit that stops the
 * root LP part way (here an iteration limit, so the test does not depend on the machine's speed;
 * a time limit or a cancel does the same at a moment that does) makes ojAlgo 56.1.1 answer
 * INFEASIBLE for the small harbour, a model it solves to optimality without the limit. If an
 * upgrade of ojAlgo makes this fail, revisit the INFEASIBLE mapping in {@link OjAlgoBackend}.
 */
class OjAlgoStoppedLpTest {
  @Test
  void ojAlgoCallsAFeasibleModelInfeasibleWhenItsRootLpIsStopped() {
    new OjAlgoBackend(); // clears ojAlgo's presolvers, as every solve of ours runs
    Milp m = Lowering.lower(ExampleScenarios.small("harbour_survey"));
    ExpressionsBasedModel lp = OjAlgoModels.of(m);
    lp.relax();
    lp.options.iterations_abort = 300;
    assertEquals(Optimisation.State.FEASIBLE, lp.minimise().getState(), "the LP is cut short after phase 1");
    ExpressionsBasedModel mip = OjAlgoModels.of(m);
    mip.options.iterations_abort = 300;
    assertEquals(Optimisation.State.INFEASIBLE, mip.minimise().getState(), "ojAlgo's answer for a feasible model");
  }
}
