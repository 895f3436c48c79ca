package dev.skerry.compiler.fleet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.sim.ClosedLoop;
import dev.skerry.compiler.sim.Iteration;
import dev.skerry.compiler.sim.LoopResult;
import org.junit.jupiter.api.Test;

/** The closed loop with a fleet and in 3-D. */
class FleetLoopTest {

  /**
   * Two craft crossing head-on, no disturbance, every iteration solved to optimality: the cost flown
   * equals the first prediction and the prediction never rises (Bellman's principle of optimality;
   * recursive feasibility, e.g. Mayne et al., Automatica 36, 2000), and the flown paths keep the
   * separation between samples.
   */
  @Test
  void headOnFleetFliesItsFirstPredictionAndStaysApart() {
    Scenario base = FleetScenarios.headOn(3);
    Scenario s = base.withPlan(base.plan().withClosedLoopMax(30));
    LoopResult r = new ClosedLoop(Planner.standard(), Planner.optionsOf(s.plan()), 0, 1).run(s, "scip", it -> { });
    assertEquals(LoopResult.Stop.ARRIVED, r.stop());
    assertEquals(2, r.flownPaths().size());
    assertTrue(r.verify().ok(), r.verify().violations().toString());
    assertTrue(FleetPlanTest.closestApproach(r.flownPaths().get(0), r.flownPaths().get(1)) >= 3 - 1e-6);
    double first = r.iterations().get(0).predictedTotal();
    assertEquals(first, r.flownCost(), 1e-3 * first, "flown cost vs first prediction");
    double previous = first;
    for (Iteration it : r.iterations()) {
      assertTrue(it.predictedTotal() <= previous + 1e-3 * first,
          "iteration " + it.index() + " predicted " + it.predictedTotal() + " after " + previous);
      previous = it.predictedTotal();
    }
  }

  @Test
  void droneFliesOverTheRidgeClosedLoop() {
    Scenario base = FleetScenarios.ridge(null);
    Scenario s = base.withPlan(base.plan().withClosedLoopMax(30));
    LoopResult r = new ClosedLoop(Planner.standard(), Planner.optionsOf(s.plan()), 0, 1).run(s, "scip", it -> { });
    assertEquals(LoopResult.Stop.ARRIVED, r.stop());
    assertTrue(r.verify().ok(), r.verify().violations().toString());
    double first = r.iterations().get(0).predictedTotal();
    assertEquals(first, r.flownCost(), 1e-3 * first, "flown cost vs first prediction");
  }
}
