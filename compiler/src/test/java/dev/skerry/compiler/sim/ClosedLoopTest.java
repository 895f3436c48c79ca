package dev.skerry.compiler.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class ClosedLoopTest {
  static Scenario scenario(String text) {
    Path root = Path.of(".").toAbsolutePath();
    CheckResult r = ScenarioChecker.check(SourceFile.of(root.resolve("loop.skerry"), text), new DiskLoader(root));
    assertTrue(!r.hasErrors(), r.diagnostics().toString());
    return r.scenario();
  }

  static final String AROUND_A_BLOCK = """
      vehicle v { start (0, 0) at rest speed max 3 m/s accel max 2 m/s^2 radius 0.5 m }
      area a box (-5, -5) to (25, 15)
      zone block box (6, -5) to (9, 5)
      target t point (16, 0) within 1 m at rest
      plan { step 1 s horizon 12 minimize time + 0.2 fuel closed_loop max 20 solver scip gap 0.0001 % }
      """;

  /**
   * Without disturbance, with a horizon that reaches the target and every iteration solved to
   * optimality, the tail of an optimal plan is optimal from where it leads (Bellman's principle of
   * optimality, Dynamic Programming, 1957), so the cost flown equals the first prediction and the
   * predicted total never rises: the shifted previous plan stays feasible (recursive feasibility of
   * receding horizon control with a terminal constraint; e.g. Mayne et al., Automatica 36, 2000).
   */
  @Test
  void flownCostEqualsTheFirstPredictionAndPredictionsNeverRise() {
    Scenario s = scenario(AROUND_A_BLOCK);
    LoopResult r = new ClosedLoop(Planner.standard(), Planner.optionsOf(s.plan()), 0, 1).run(s, "scip", it -> { });
    assertEquals(LoopResult.Stop.ARRIVED, r.stop());
    assertTrue(r.verify().ok(), r.verify().violations().toString());
    double first = r.iterations().get(0).predictedTotal();
    double tolerance = 1e-5 * Math.max(1, Math.abs(first));
    assertEquals(first, r.flownCost(), 1e-3 * first, "flown cost vs first prediction");
    double previous = first;
    for (Iteration it : r.iterations()) {
      assertTrue(it.predictedTotal() <= previous + 1e-3 * first, "iteration " + it.index() + " predicted "
          + it.predictedTotal() + " after " + previous);
      previous = it.predictedTotal();
    }
    assertTrue(tolerance > 0);
  }

  @Test
  void aDisturbedRunStillArrivesAndIsVerified() {
    Scenario s = scenario(AROUND_A_BLOCK);
    LoopResult r = new ClosedLoop(Planner.standard(), Planner.optionsOf(s.plan()), 0.05, 7).run(s, "scip", it -> { });
    assertEquals(LoopResult.Stop.ARRIVED, r.stop());
    assertTrue(r.verify().violations().stream().noneMatch(v -> v.kind() == dev.skerry.compiler.verify.Violation.Kind.ZONE),
        r.verify().violations().toString());
  }

  @Test
  void theLoopStopsAtItsLimit() {
    Scenario s = scenario(AROUND_A_BLOCK.replace("closed_loop max 20", "closed_loop max 3"));
    LoopResult r = new ClosedLoop(Planner.standard(), SolveOptions.defaults(), 0, 1).run(s, "scip", it -> { });
    assertEquals(LoopResult.Stop.LIMIT, r.stop());
    assertEquals(3, r.iterations().size());
  }

  /**
   * Recursive feasibility (e.g. Mayne et al., Constrained model predictive control: stability and
   * optimality, Automatica 36, 2000): after the first input is applied, the previous plan shifted by
   * one step satisfies every row of the next iteration's MILP — which is why the closed loop can
   * hand it to the solver as a warm start.
   */
  @Test
  void thePreviousPlanShiftedByOneStepIsFeasibleForTheNextModel() {
    Scenario s = scenario(AROUND_A_BLOCK);
    var first = Planner.standard().withWarmStart(false).plan(s, "scip", Planner.optionsOf(s.plan()),
        dev.skerry.compiler.solve.SolveMonitor.NONE);
    var p0 = first.trajectory().samples().get(0);
    double dt = s.plan().step();
    var p1 = p0.position().plus(p0.velocity().times(dt)).plus(p0.accel().times(0.5 * dt * dt));
    var v1 = p0.velocity().plus(p0.accel().times(dt));
    var next = dev.skerry.compiler.lower.Lowering.lower(s.withStart(p1, v1));
    double[] shifted = ShiftedStart.of(first.milp(), first.solve().values(), next, dt);
    assertTrue(shifted != null, "every column of the next model has a counterpart");
    StringBuilder worst = new StringBuilder();
    for (var row : next.rows()) {
      double a = row.activity(shifted);
      if (a > row.upper() + 1e-6 || a < row.lower() - 1e-6) {
        worst.append(row.name()).append(' ');
      }
    }
    for (var v : next.variables()) {
      if (shifted[v.index()] > v.upper() + 1e-6 || shifted[v.index()] < v.lower() - 1e-6) {
        worst.append(v.name()).append(' ');
      }
    }
    assertTrue(next.maxViolation(shifted) <= 1e-6, "violation " + next.maxViolation(shifted) + " in " + worst);
    assertEquals(first.solve().objective() - (s.plan().timeWeight() * dt + s.plan().fuelWeight()
        * (Math.abs(p0.accel().x()) + Math.abs(p0.accel().y())) * dt), next.objective().value(shifted), 1e-4);
  }
}
