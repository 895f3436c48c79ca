package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.OutsideSolvers;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolverBackend;
import dev.skerry.compiler.solve.ojalgo.OjAlgoBackend;
import dev.skerry.compiler.verify.Verifier;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The arrival scan: ojAlgo's way to a start, checked against cbc's optimum of the same model. */
class ArrivalScanTest {
  static final SolverBackend OJALGO = new OjAlgoBackend();
  static final Duration BUDGET = Duration.ofSeconds(40);

  /**
   * On the small harbour and warehouse (90 and 89 binaries) ojAlgo alone finds a start that the
   * model and the verifier accept, no better than the optimum that {@code cbc} (Debian coinor-cbc
   * 2.10, -preprocess off) proves for the same model read from our free MPS file, and within 5 % of
   * it (measured: equal to it, 26.74092 and 9).
   */
  @ParameterizedTest(name = "{0}")
  @ValueSource(strings = {"harbour_survey", "warehouse_floor"})
  void ojAlgoFindsAVerifiedStartNearCbcsOptimum(String name, @TempDir Path dir) throws Exception {
    Scenario s = ExampleScenarios.small(name);
    Milp m = Lowering.lower(s);
    WarmStarts.Start start = ArrivalScan.find(m, OJALGO, SolveOptions.defaults(), BUDGET);
    assertVerifiedNearCbcsOptimum(s, m, start, dir.resolve(name + ".mps"));
  }

  /**
   * A start that the model and the verifier accept, no better than the optimum {@code cbc} proves
   * for the model read from our free MPS file (written to {@code mps}), and within 5 % of it.
   */
  private static void assertVerifiedNearCbcsOptimum(Scenario s, Milp m, WarmStarts.Start start, Path mps)
      throws Exception {
    assertTrue(start.found(), start::reason);
    assertTrue(m.maxViolation(start.values()) <= WarmStarts.TOLERANCE);
    assertTrue(Verifier.verify(s, PlanExtractor.trajectory(s, m, start.values())).ok());
    ModelFiles.write(m, mps, ModelFormat.MPS);
    OutsideSolvers.Result cbc = OutsideSolvers.cbcObjective(mps);
    assertTrue(cbc.isOptimal(), cbc::detail);
    double optimum = cbc.objective();
    assertTrue(start.objective() >= optimum - 1e-6 * Math.abs(optimum),
        () -> "start " + start.objective() + " beats cbc's optimum " + optimum);
    assertTrue(start.objective() <= 1.05 * optimum, () -> "start " + start.objective() + ", cbc " + optimum);
  }

  /** The planner gives ojAlgo the scan (and says so); the plan it returns is verified. */
  @Test
  void thePlannerUsesTheScanForOjAlgo() {
    Scenario s = ExampleScenarios.small("warehouse_floor");
    PlanResult r = Planner.standard().plan(s, "ojalgo", Planner.optionsOf(s.plan()), SolveMonitor.NONE);
    assertTrue(r.solve().status().hasSolution(), r.solve()::summary);
    assertTrue(r.verified(), () -> String.valueOf(r.verify()));
    assertTrue(r.solve().warnings().stream().anyMatch(w -> w.startsWith("warm start: arrival scan")),
        r.solve().warnings()::toString);
  }

  /** A fleet has one set of arrival binaries per vehicle and target: the scan does not apply. */
  @Test
  void aFleetIsNotScanned() {
    Milp m = Lowering.lower(ExampleScenarios.full("twin_skiffs"));
    assertFalse(ArrivalScan.applies(m));
    WarmStarts.Start start = ArrivalScan.find(m, OJALGO, SolveOptions.defaults(), BUDGET);
    assertFalse(start.found());
    assertTrue(start.reason().contains("arrival binaries"), start::reason);
  }

  /** No time: no start and a reason, never an exception. */
  @Test
  void anExhaustedBudgetGivesNoStart() {
    Milp m = Lowering.lower(ExampleScenarios.small("harbour_survey"));
    WarmStarts.Start start = ArrivalScan.find(m, OJALGO, SolveOptions.defaults(), Duration.ofMillis(1));
    assertFalse(start.found());
    assertFalse(start.reason().isEmpty());
  }

  /**
   * An infeasible scenario: no start, no exception. (Every arrival step fails, at every window, so
   * the scan spends its whole budget: 5 s here.)
   */
  @Test
  void anInfeasibleScenarioGivesNoStart() {
    Milp m = Lowering.lower(BadInputScenarios.walledOff());
    WarmStarts.Start start = ArrivalScan.find(m, OJALGO, SolveOptions.defaults(), Duration.ofSeconds(5));
    assertFalse(start.found());
    assertEquals(Double.NaN, start.objective());
  }

  /**
   * A fleet's second round, the first skiff held to its plan: the scan applies only once that
   * skiff's arrival binaries are fixed too (matched by target and step, as the one-vehicle round
   * names them without the vehicle), leaving the second skiff's as the one free set. Without that
   * the full twin skiffs got no start from ojAlgo within its share of a 60 s limit (measured).
   */
  @Test
  void aFleetRoundWithTheEarlierArrivalFixedLeavesOneSetToScan() {
    Scenario s = ExampleScenarios.tiny("twin_skiffs");
    Milp first = FleetStarts.round(s, 1, null, null, Set.of(), true);
    SolveResult r = dev.skerry.compiler.solve.Backends.standard().choose("scip", first).backend()
        .solve(first, SolveOptions.defaults());
    assertTrue(r.status().hasSolution(), r::summary);
    String lead = s.vehicles().get(0).name();
    Milp pathOnly = FleetStarts.round(s, 2, first, r.values(), Set.of(lead), false);
    Milp withArrival = FleetStarts.round(s, 2, first, r.values(), Set.of(lead), true);
    assertFalse(ArrivalScan.applies(pathOnly));
    assertTrue(ArrivalScan.applies(withArrival));
    String second = s.vehicles().get(1).name();
    assertTrue(ArrivalScan.arrivalColumns(withArrival).stream().allMatch(v -> v.origin().owner().equals(second)));
  }

  /**
   * A vehicle that may take either of two berths (the MILP assigns it): the scan runs per berth and
   * keeps the cheaper, a start the verifier accepts, no better than cbc's optimum of the same model
   * (Debian coinor-cbc 2.10 on our free MPS file) and within 5 % of it.
   */
  @Test
  void aVehicleWithTwoBerthsToChooseFromGetsAScanPerBerth(@TempDir Path dir) throws Exception {
    Scenario one = dev.skerry.compiler.analysis.TestScenarios.harbour(16);
    Scenario s = one.withVehiclesAndTargets(one.vehicles(), java.util.List.of(one.target(),
        new dev.skerry.compiler.model.Target("cove", dev.skerry.compiler.analysis.TestScenarios.box(17.5, 1, 18.5, 2),
            true, null)));
    Milp m = Lowering.lower(s);
    assertFalse(ArrivalScan.applies(m));
    assertTrue(ArrivalScan.appliesToSomeTarget(m));
    WarmStarts.Start start = ArrivalScan.find(s, m, OJALGO, SolveOptions.defaults(), BUDGET);
    assertVerifiedNearCbcsOptimum(s, m, start, dir.resolve("two_berths.mps"));
  }
}
