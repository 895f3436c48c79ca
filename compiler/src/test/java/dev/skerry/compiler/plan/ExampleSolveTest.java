package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.OutsideSolvers;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveStatus;
import java.nio.file.Path;
import java.time.Duration;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The examples solved end to end. SCIP solves every full example (seconds each); CBC in-process
 * and ojAlgo only solve reduced versions derived from them: in-process CBC needed 28 s for the
 * warehouse and did not prove the other two within 60 s, and ojAlgo found no plan for any full
 * example in 60 s (it needs minutes on this formulation with about a thousand binaries, SOLVERS.md;
 * the full examples have 488 to 1,179), so with them the default suite would outgrow its budget. Their full-size timings are in BENCHMARKS.md. Two objectives agree when
 * they differ by at most the plan's relative gap (both solvers stop within it of the optimum).
 */
class ExampleSolveTest {
  static final Duration CAP = Duration.ofSeconds(120);
  static final Planner PLANNER = Planner.standard();

  static Stream<String> names() {
    return ExampleScenarios.NAMES.stream();
  }

  static PlanResult plan(Scenario s, String solver) {
    return plan(PLANNER, s, solver);
  }

  static PlanResult plan(Planner planner, Scenario s, String solver) {
    SolveOptions o = Planner.optionsOf(s.plan()).withTimeLimit(CAP);
    PlanResult r = planner.plan(s, solver, o, SolveMonitor.NONE);
    System.out.println(s.name() + " " + solver + ": " + r.solve().summary() + " " + r.solve().warnings());
    return r;
  }

  /** Both within the plan's gap of one optimum, so within that gap of each other. */
  static void assertAgree(Scenario s, PlanResult a, PlanResult b) {
    double x = a.solve().objective();
    double y = b.solve().objective();
    double allowed = s.plan().relativeGap() * Math.max(Math.abs(x), Math.abs(y)) + 1e-6;
    assertTrue(Math.abs(x - y) <= allowed, () -> a.solve().summary() + " vs " + b.solve().summary()
        + ": differ by " + Math.abs(x - y) + ", more than the gap allows (" + allowed + ")");
  }

  static void assertSolvedAndVerified(PlanResult r) {
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve()::summary);
    assertTrue(r.verified(), () -> String.valueOf(r.verify()));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("names")
  void everyExampleSolvesWithScipAndTheVerifierAcceptsIt(String name) {
    assertSolvedAndVerified(plan(ExampleScenarios.full(name), "scip"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("names")
  void scipAndInProcessCbcAgreeOnTheSmallVersion(String name) {
    Scenario s = ExampleScenarios.small(name);
    PlanResult scip = plan(s, "scip");
    PlanResult cbc = plan(s, "cbc");
    assertSolvedAndVerified(scip);
    assertSolvedAndVerified(cbc);
    assertAgree(s, scip, cbc);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("names")
  void ojAlgoAgreesWithScipOnTheTinyVersion(String name) {
    Scenario s = ExampleScenarios.tiny(name);
    PlanResult scip = plan(s, "scip");
    PlanResult ojalgo = plan(s, "ojalgo");
    assertSolvedAndVerified(scip);
    assertSolvedAndVerified(ojalgo);
    assertAgree(s, scip, ojalgo);
  }

  /** Outside judge: {@code cbc} 2.10 (Debian coinor-cbc, -preprocess off) on our exported free MPS. */
  @Test
  void cbcOnTheExportedMpsAgreesWithScip(@TempDir Path dir) throws Exception {
    Scenario s = ExampleScenarios.small("warehouse_floor");
    Milp m = Lowering.lower(s);
    Path mps = dir.resolve("warehouse_small.mps");
    ModelFiles.write(m, mps, ModelFormat.MPS);
    OutsideSolvers.Result cbc = OutsideSolvers.cbcObjective(mps);
    assertTrue(cbc.isOptimal(), cbc::detail);
    PlanResult scip = plan(s, "scip");
    assertSolvedAndVerified(scip);
    double allowed = s.plan().relativeGap() * Math.abs(cbc.objective()) + 1e-6;
    assertTrue(Math.abs(scip.solve().objective() - cbc.objective()) <= allowed,
        () -> "cbc " + cbc.objective() + " vs " + scip.solve().summary());
  }

  /**
   * CP-SAT solves a copy scaled to integers, so it may miss the optimum by a little: within 1 % of
   * SCIP's here, and the choice of it comes with a notice saying so.
   */
  @Test
  void cpSatIsCloseToScipAndSaysItIsApproximate() {
    Scenario s = ExampleScenarios.tiny("warehouse_floor");
    PlanResult scip = plan(s, "scip");
    PlanResult cpsat = plan(s, "cpsat");
    assertTrue(cpsat.solve().status().hasSolution(), cpsat.solve()::summary);
    assertTrue(cpsat.solve().approximate(), cpsat.solve()::summary);
    assertTrue(cpsat.notice().orElse("").contains("approximate"), cpsat.notice()::toString);
    double x = scip.solve().objective();
    double y = cpsat.solve().objective();
    assertTrue(Math.abs(x - y) <= 0.01 * Math.abs(x), () -> "scip " + x + " vs cpsat " + y);
    assertTrue(y >= x - 1e-3 * Math.abs(x), () -> "cpsat " + y + " well below the optimum " + x);
  }

  @Test
  void theChoiceOfCpSatComesWithTheNotice() {
    Milp m = Lowering.lower(ExampleScenarios.tiny("warehouse_floor"));
    assertTrue(Backends.standard().choose("cpsat", m).notice().orElse("").contains("approximate"));
  }
}
