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
import dev.skerry.compiler.solve.SolveProgress;
import dev.skerry.compiler.solve.SolveStatus;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every example solved end to end, by each in-process backend, against {@code cbc} 2.10 (Debian
 * coinor-cbc, -preprocess off) reading our exported free MPS as the outside judge. SCIP solves
 * every full example (seconds each; cbc and glpsol judge the full examples in {@code
 * ExampleCrossCheckTest}) and ojAlgo comes within the plan's gap of it on every full example
 * but the fleet (below); in-process CBC and ojAlgo also solve versions derived from each example
 * ({@link ExampleScenarios}) to a proof: in-process CBC needed 28 s for the full warehouse and 54 s
 * for the twin skiffs and did not prove the harbour or the rock field within 60 s, and ojAlgo proves
 * none of the full 2-D examples within 60 s (the 3-D ridge in 41–57 s), so with them the default
 * suite would outgrow its budget. Their full-size timings are in BENCHMARKS.md. Two objectives agree when they
 * differ by at most the plan's relative gap (both solvers stop within it of the optimum).
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

  /** ojAlgo's time on each full example here: its start comes in seconds, its proof does not. */
  static final Duration OJALGO_FULL = Duration.ofSeconds(20);

  /**
   * ojAlgo's time on the fleet: its rounds plan one skiff after the other, in the given order and
   * in the reverse, then improve both plans, in three quarters of the limit ({@link FleetStarts}).
   * Measured with {@code skerry solve --time-limit 40}: SCIP's optimum in eight runs of eight, the
   * reverse order's moves reaching it 3–5 s before the start's time was out; 60 s here leaves room
   * for a slower machine.
   */
  static final Duration OJALGO_FLEET = Duration.ofSeconds(60);

  /**
   * ojAlgo on every full example, 20 s each (the fleet 60 s): a plan the verifier accepts, within
   * the plan's gap of SCIP's optimum of the same model (which {@code ExampleCrossCheckTest} checks
   * against cbc 2.10 on our free MPS file and glpsol 5.0 on our LP file). ojAlgo proves none of the
   * 2-D ones in that time; its plans come from the arrival scan's start (the shortest path round the
   * zones for its sides, {@link GuidePath}), the fleet's from planning the skiffs in turn and the
   * moves after ({@link FleetStarts}). The twin skiffs' plan has the default gap of 1e-6.
   */
  @ParameterizedTest(name = "{0}")
  @MethodSource("names")
  void ojAlgoComesWithinTheGapOfScipOnTheFullExample(String name) {
    Scenario s = ExampleScenarios.full(name);
    PlanResult scip = plan(s, "scip");
    assertSolvedAndVerified(scip);
    SolveOptions o = Planner.optionsOf(s.plan()).withTimeLimit(s.fleet() ? OJALGO_FLEET : OJALGO_FULL);
    List<SolveProgress> events = new CopyOnWriteArrayList<>();
    PlanResult ojalgo = PLANNER.plan(s, "ojalgo", o, events::add);
    System.out.println(s.name() + " ojalgo: " + ojalgo.solve().summary() + " " + ojalgo.solve().warnings());
    assertProgressCoversTheStart(ojalgo, events);
    assertTrue(ojalgo.solve().status().hasSolution(), ojalgo.solve()::summary);
    assertTrue(ojalgo.verified(), () -> String.valueOf(ojalgo.verify()));
    double x = scip.solve().objective();
    double y = ojalgo.solve().objective();
    assertTrue(y >= x - 1e-6 * Math.abs(x) - 1e-6, () -> "ojAlgo " + y + " below SCIP's optimum " + x);
    assertAgree(s, scip, ojalgo);
  }

  /**
   * ojAlgo's search for a start takes seconds (most of the limit on the fleet): it goes out as
   * progress labelled as such, and the solve's own events then count on from it, so the elapsed
   * time a user sees never goes back; the plan's time includes the start's. The start's time is
   * read from the plan's warm-start note.
   */
  private static void assertProgressCoversTheStart(PlanResult r, List<SolveProgress> events) {
    double startMs = r.solve().warnings().stream().filter(w -> w.startsWith("warm start:"))
        .map(w -> java.util.regex.Pattern.compile(" in ([0-9.]+) s").matcher(w))
        .filter(java.util.regex.Matcher::find).mapToDouble(m -> 1000 * Double.parseDouble(m.group(1)))
        .findFirst().orElse(0);
    List<SolveProgress> start = events.stream().filter(e -> e.backendId().endsWith("finding a start")).toList();
    List<SolveProgress> solve = events.stream().filter(e -> !e.backendId().endsWith("finding a start")).toList();
    if (startMs >= 1000) {
      assertTrue(!start.isEmpty(), "a start found in " + startMs + " ms, and no progress while it was sought");
    }
    assertTrue(r.solve().wallTime().toMillis() >= startMs - 10,
        "the plan's time " + r.solve().wallTime() + " leaves out the start's " + startMs + " ms");
    double lastStart = start.stream().mapToDouble(e -> e.elapsed().toMillis()).max().orElse(0);
    for (SolveProgress e : solve) {
      assertTrue(e.elapsed().toMillis() >= Math.max(lastStart, startMs) - 1,
          "the solve's event at " + e.elapsed().toMillis() + " ms, after a start that took " + startMs + " ms");
    }
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("names")
  void scipInProcessCbcAndTheCbcCommandAgreeOnTheSmallVersion(String name, @TempDir Path dir) throws Exception {
    Scenario s = ExampleScenarios.small(name);
    PlanResult scip = plan(s, "scip");
    PlanResult cbc = plan(s, "cbc");
    assertSolvedAndVerified(scip);
    assertSolvedAndVerified(cbc);
    assertAgree(s, scip, cbc);
    assertCbcCommandAgrees(s, scip, dir);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("names")
  void ojAlgoScipAndTheCbcCommandAgreeOnTheTinyVersion(String name, @TempDir Path dir) throws Exception {
    Scenario s = ExampleScenarios.tiny(name);
    PlanResult scip = plan(s, "scip");
    PlanResult ojalgo = plan(s, "ojalgo");
    assertSolvedAndVerified(scip);
    assertSolvedAndVerified(ojalgo);
    assertAgree(s, scip, ojalgo);
    assertCbcCommandAgrees(s, ojalgo, dir);
  }

  @Test
  void everyExampleInTheFolderIsCovered() throws Exception {
    try (Stream<Path> files = java.nio.file.Files.list(ExampleScenarios.EXAMPLES)) {
      assertEquals(files.map(p -> p.getFileName().toString()).filter(f -> f.endsWith(".skerry"))
          .map(f -> f.substring(0, f.length() - ".skerry".length())).sorted().toList(),
          ExampleScenarios.NAMES.stream().sorted().toList());
    }
  }

  /** {@code cbc} proves an optimum of the scenario's exported free MPS within the gap of {@code r}'s objective. */
  static void assertCbcCommandAgrees(Scenario s, PlanResult r, Path dir) throws Exception {
    Path mps = dir.resolve("model.mps");
    ModelFiles.write(Lowering.lower(s), mps, ModelFormat.MPS);
    OutsideSolvers.Result cbc = OutsideSolvers.cbcObjective(mps);
    assertTrue(cbc.isOptimal(), cbc::detail);
    double allowed = s.plan().relativeGap() * Math.abs(cbc.objective()) + 1e-6;
    assertTrue(Math.abs(r.solve().objective() - cbc.objective()) <= allowed,
        () -> "cbc " + cbc.objective() + " vs " + r.solve().summary());
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
