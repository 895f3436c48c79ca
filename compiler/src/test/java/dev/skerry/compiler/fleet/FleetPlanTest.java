package dev.skerry.compiler.fleet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.OutsideSolvers;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveStatus;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Several vehicles planned in one MILP: separation at and between samples, and the cost it adds. */
class FleetPlanTest {
  private static final double SEPARATION = 3;

  private static PlanResult plan(Scenario s) {
    return Planner.standard().plan(s, "scip", Planner.optionsOf(s.plan()), SolveMonitor.NONE);
  }

  @Test
  void headOnCrossingKeepsApartAtAndBetweenSamplesAndCostsNoLessThanTheSoloOptima() {
    Scenario s = FleetScenarios.headOn(SEPARATION);
    PlanResult r = plan(s);
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve().summary());
    assertEquals(2, r.trajectories().size());
    assertTrue(r.verified(), () -> "verifier: " + r.verify().violations());
    Trajectory a = r.trajectories().get(0);
    Trajectory b = r.trajectories().get(1);
    double closest = closestApproach(a, b);
    assertTrue(closest >= SEPARATION - 1e-6, "closest approach " + closest + " m");
    // Adding a vehicle adds constraints and a non-negative cost term to each solo problem, so the
    // joint optimum is no less than the sum of the solo optima (common practice: a restriction of
    // a minimisation cannot lower its optimum).
    double solo = plan(FleetScenarios.solo(s, 0)).solve().objective() + plan(FleetScenarios.solo(s, 1)).solve().objective();
    assertTrue(r.solve().objective() >= solo - 1e-6 * Math.max(1, solo),
        "fleet " + r.solve().objective() + " < solo sum " + solo);
    // and on this head-on geometry the solo plans would collide, so it is strictly more.
    assertTrue(r.solve().objective() > solo + 1e-3, "separation cost nothing: " + r.solve().objective());
  }

  @Test
  void withoutSeparationRowsTheSameCraftWouldMeet() {
    // The solo optima flown together come closer than the separation: the rows above are what keeps
    // the pair apart, not the geometry.
    Scenario s = FleetScenarios.headOn(SEPARATION);
    Trajectory a = plan(FleetScenarios.solo(s, 0)).trajectory();
    Trajectory b = plan(FleetScenarios.solo(s, 1)).trajectory();
    assertTrue(closestApproach(a, b) < SEPARATION, "solo paths already apart: " + closestApproach(a, b));
  }

  @Test
  void cbcReadsTheFleetModelAndAgreesOnTheOptimum(@TempDir Path dir) throws Exception {
    // Outside reference: cbc 2.10 (Debian coinor-cbc) on our free MPS file.
    Scenario s = FleetScenarios.headOn(SEPARATION);
    Path mps = dir.resolve("head-on.mps");
    ModelFiles.write(Lowering.lower(s), mps, ModelFormat.MPS);
    assertTrue(Files.size(mps) > 0);
    OutsideSolvers.Result cbc = OutsideSolvers.cbcObjective(mps);
    assertTrue(cbc.isOptimal(), cbc.detail());
    double ours = plan(s).solve().objective();
    assertEquals(cbc.objective(), ours, 1e-5 * Math.max(1, Math.abs(ours)));
  }

  @Test
  void assignedTargetsGoOneVehicleEachAndMakespanIsTheLatestArrival() {
    Scenario fixed = FleetScenarios.headOn(SEPARATION);
    // Let the MILP choose: both docks free, each craft should take the dock on its own side.
    Scenario free = fixed.withVehicles(List.of(fixed.vehicles().get(0).withTarget(null),
        fixed.vehicles().get(1).withTarget(null)));
    PlanResult r = plan(free);
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve().summary());
    String ta = r.trajectories().get(0).target();
    String tb = r.trajectories().get(1).target();
    assertTrue(ta != null && tb != null && !ta.equals(tb), ta + " / " + tb);
    assertEquals("near", ta, "east starts next to the near dock");
    assertTrue(r.verified(), () -> "verifier: " + r.verify().violations());
    Scenario latest = fixed.withPlan(fixed.plan().withLatestArrival(true));
    PlanResult m = plan(latest);
    double makespan = Math.max(m.trajectories().get(0).arrivalTime(), m.trajectories().get(1).arrivalTime());
    assertEquals(makespan, m.timeCost(), 1e-9);
    PlanResult sum = plan(fixed);
    assertTrue(m.timeCost() <= Math.max(sum.trajectories().get(0).arrivalTime(),
        sum.trajectories().get(1).arrivalTime()) + 1e-9, "makespan plan is later than the sum plan's latest");
  }

  /**
   * Least distance between the two flown arcs while both fly, sampled finely along the true
   * zero-order-hold motion (an independent check of the MILP's rows, not the verifier's code).
   */
  static double closestApproach(Trajectory a, Trajectory b) {
    int last = Math.min(a.arrival(), b.arrival());
    double best = Double.POSITIVE_INFINITY;
    int pieces = 200;
    for (int k = 0; k < last; k++) {
      Sample sa = a.samples().get(k);
      Sample sb = b.samples().get(k);
      for (int i = 0; i <= pieces; i++) {
        double tau = a.step() * i / pieces;
        best = Math.min(best, at(sa, tau).distanceTo(at(sb, tau)));
      }
    }
    return best;
  }

  private static Vec2 at(Sample s, double tau) {
    return s.position().plus(s.velocity().times(tau)).plus(s.accel().times(0.5 * tau * tau));
  }
}
