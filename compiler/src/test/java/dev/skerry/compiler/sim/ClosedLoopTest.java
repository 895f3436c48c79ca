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
}
