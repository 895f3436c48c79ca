package dev.skerry.compiler.fleet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.FleetStarts;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.plan.WarmStarts;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import org.junit.jupiter.api.Test;

/** The fleet's warm start: vehicles planned one after another give a point of the whole model. */
class FleetStartsTest {
  private static final SolverBackend SCIP = Backends.standard().choose("scip", null).backend();

  @Test
  void vehiclesPlannedInTurnGiveAFeasiblePointNoBetterThanTheOptimum() {
    Scenario s = FleetScenarios.headOn(3);
    Milp model = Lowering.lower(s);
    WarmStarts.Start start = FleetStarts.find(s, model, SCIP, SolveOptions.defaults(), Duration.ofSeconds(30));
    assertTrue(start.found(), start.reason());
    assertTrue(model.maxViolation(start.values()) <= WarmStarts.TOLERANCE);
    PlanResult best = Planner.standard().withWarmStart(false).plan(s, "scip", Planner.optionsOf(s.plan()),
        SolveMonitor.NONE);
    assertTrue(start.objective() >= best.solve().objective() - 1e-6, start.objective() + " below the optimum "
        + best.solve().objective());
    assertEquals(2, start.rounds());
    // and the planner uses it: same optimum, the note says so.
    PlanResult warm = Planner.standard().plan(s, "scip", Planner.optionsOf(s.plan()), SolveMonitor.NONE);
    assertEquals(best.solve().objective(), warm.solve().objective(), 1e-6 * Math.max(1, best.solve().objective()));
    assertTrue(warm.solve().warnings().stream().anyMatch(w -> w.contains("one after another")),
        warm.solve().warnings().toString());
  }

  /**
   * With a backend whose branch and bound is slow (ojAlgo) each round runs the arrival scan (see
   * {@code ArrivalScanTest} for the round's model): the start is a point of the whole model, no
   * better than SCIP's optimum.
   */
  @Test
  void aSlowBackendGivesAFeasiblePointNoBetterThanTheOptimum() {
    Scenario s = dev.skerry.compiler.plan.ExampleScenarios.tiny("twin_skiffs");
    Milp model = Lowering.lower(s);
    SolverBackend ojalgo = Backends.standard().choose("ojalgo", null).backend();
    WarmStarts.Start start = FleetStarts.find(s, model, ojalgo, SolveOptions.defaults()
        .withTimeLimit(Duration.ofSeconds(60)), Duration.ofSeconds(30));
    assertTrue(start.found(), start.reason());
    assertTrue(model.maxViolation(start.values()) <= WarmStarts.TOLERANCE);
    PlanResult best = Planner.standard().plan(s, "scip", Planner.optionsOf(s.plan()), SolveMonitor.NONE);
    assertTrue(start.objective() >= best.solve().objective() - 1e-6, start.objective() + " below the optimum "
        + best.solve().objective());
  }

  @Test
  void aTargetNamedByALaterVehicleIsNotTakenByAnEarlierOne() {
    Scenario s = FleetScenarios.headOn(3);
    // The first craft names none; the second names the dock on the far side.
    Scenario mixed = s.withVehicles(java.util.List.of(s.vehicles().get(0).withTarget(null), s.vehicles().get(1)));
    Scenario firstOnly = FleetStarts.firstVehiclesForTest(mixed, 1);
    assertFalse(firstOnly.targets().stream().anyMatch(t -> t.name().equals("near")), firstOnly.targets().toString());
    WarmStarts.Start start = FleetStarts.find(mixed, Lowering.lower(mixed), SCIP, SolveOptions.defaults(),
        Duration.ofSeconds(30));
    assertTrue(start.found(), start.reason());
  }
}
