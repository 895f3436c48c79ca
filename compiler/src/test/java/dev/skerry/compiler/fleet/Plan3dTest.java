package dev.skerry.compiler.fleet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.OutsideSolvers;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveStatus;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Planning in altitude: over a zone when that is shorter, round it when a ceiling forbids. */
class Plan3dTest {
  private static PlanResult plan(Scenario s) {
    return Planner.standard().plan(s, "scip", Planner.optionsOf(s.plan()), SolveMonitor.NONE);
  }

  private static double highest(PlanResult r) {
    return r.trajectory().flown().stream().mapToDouble(Sample::altitude).max().orElseThrow();
  }

  private static double northmost(PlanResult r) {
    return r.trajectory().flown().stream().mapToDouble(s -> s.position().y()).max().orElseThrow();
  }

  @Test
  void climbsOverTheWallWhenThatIsShorter() {
    PlanResult r = plan(FleetScenarios.ridge(null));
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve().summary());
    assertTrue(r.verified(), () -> "verifier: " + r.verify().violations());
    // The wall rises to 12 m; the drone (radius 0.5 m) must pass above 12.5 m.
    assertTrue(highest(r) > 12.5, "highest altitude " + highest(r));
    assertTrue(northmost(r) < 26, "went round the wall's end: y up to " + northmost(r));
  }

  @Test
  void goesRoundWhenItsCeilingIsBelowTheWallTop() {
    PlanResult over = plan(FleetScenarios.ridge(null));
    PlanResult r = plan(FleetScenarios.ridge(new Span(0, 10)));
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve().summary());
    assertTrue(r.verified(), () -> "verifier: " + r.verify().violations());
    assertTrue(highest(r) <= 10 - 0.5 + 1e-6, "above its ceiling: " + highest(r));
    assertTrue(northmost(r) > 26, "did not go round the wall: y up to " + northmost(r));
    assertTrue(r.trajectory().arrivalTime() > over.trajectory().arrivalTime(),
        "round (" + r.trajectory().arrivalTime() + " s) should take longer than over ("
            + over.trajectory().arrivalTime() + " s)");
  }

  @Test
  void glpsolAndCbcAgreeWithTheInProcessOptimum(@TempDir Path dir) throws Exception {
    // Outside references: cbc 2.10 (coinor-cbc) on the free MPS file, glpsol 5.0 (glpk-utils) on
    // the LP file.
    Scenario s = FleetScenarios.ridge(null);
    double ours = plan(s).solve().objective();
    Path mps = dir.resolve("ridge.mps");
    ModelFiles.write(Lowering.lower(s), mps, ModelFormat.MPS);
    OutsideSolvers.Result cbc = OutsideSolvers.cbcObjective(mps);
    assertTrue(cbc.isOptimal(), cbc.detail());
    assertEquals(ours, cbc.objective(), 1e-5 * Math.max(1, Math.abs(ours)));
    Path lp = dir.resolve("ridge.lp");
    ModelFiles.write(Lowering.lower(s), lp, ModelFormat.LP);
    OutsideSolvers.Result glpsol = OutsideSolvers.glpsolObjective(lp, ModelFormat.LP);
    assertTrue(glpsol.isOptimal(), glpsol.detail());
    assertEquals(ours, glpsol.objective(), 1e-5 * Math.max(1, Math.abs(ours)));
  }
}
