package dev.skerry.compiler.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.solve.ojalgo.OjAlgoBackend;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A model none of the backends solves in well under a second (25 steps, 20 zones, 1920 binaries;
 * SCIP needs several seconds, the others longer): time limits and cancellation must bring every
 * backend back quickly, with a plan or with NO_SOLUTION_FOUND, and never hang.
 */
class LimitsAndCancelTest {
  static final Milp HARD = TrajectoryMilps.randomZones(25, 20, 7);

  static Stream<SolverBackend> all() {
    return Stream.concat(Stream.of(new OjAlgoBackend()), TestBackends.orTools());
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("all")
  void tenthOfASecondLimitReturnsQuickly(SolverBackend backend) {
    long start = System.nanoTime();
    SolveResult r =
        backend.solve(HARD, SolveOptions.defaults().withTimeLimit(Duration.ofMillis(100)));
    double seconds = (System.nanoTime() - start) / 1e9;
    System.out.println("0.1 s limit: " + r.summary());
    assertTrue(seconds < 5, "took " + seconds + " s: " + r.summary());
    assertTrue(
        Set.of(SolveStatus.FEASIBLE, SolveStatus.NO_SOLUTION_FOUND).contains(r.status()),
        r::summary);
    assertEquals(StopReason.TIME_LIMIT, r.stopReason(), r::summary);
  }

  /**
   * ojAlgo at its own deadline, on a model where it is branching by then (the one the cancel test
   * gives it; the 72-binary hop used before now ends within the half second on a warm JVM): asked
   * to stop, it returns by itself with its incumbent if it has one, not left behind.
   */
  @Test
  void ojAlgoStopsByItselfAtItsDeadlineWhileBranching() {
    long start = System.nanoTime();
    SolveResult r =
        new OjAlgoBackend()
            .solve(
                TrajectoryMilps.randomZones(16, 10, 7),
                SolveOptions.defaults().withTimeLimit(Duration.ofMillis(500)));
    double seconds = (System.nanoTime() - start) / 1e9;
    System.out.println("ojAlgo 0.5 s limit while branching: " + r.summary());
    assertTrue(seconds < 2, "took " + seconds + " s");
    assertEquals(StopReason.TIME_LIMIT, r.stopReason(), r::summary);
    assertTrue(!r.message().contains("background"), r::summary);
  }

  /**
   * Cancelled after 0.5 s with no time limit: SCIP, CP-SAT and ojAlgo are stopped; CBC and HiGHS
   * cannot be interrupted, so the call returns at once and they run on in the background: they get
   * a 4 s time limit here only so that they do not slow the tests after this one. ojAlgo gets the
   * smaller model, on which it is branching by then, so that its own stop is what is tested.
   */
  @ParameterizedTest(name = "{0}")
  @MethodSource("all")
  void cancellationStopsARunningSolve(SolverBackend backend) throws Exception {
    boolean interruptible =
        !(backend instanceof OrToolsBackend o)
            || o.engine() == Engine.SCIP
            || o.engine() == Engine.CP_SAT;
    CancelToken token = new CancelToken();
    SolveOptions options = SolveOptions.defaults().withCancel(token);
    if (!interruptible) {
      options = options.withTimeLimit(Duration.ofSeconds(4));
    }
    SolveOptions chosen = options;
    List<SolveProgress> events = new CopyOnWriteArrayList<>();
    SolverBackend ticking = withTick(backend, Duration.ofMillis(50));
    Milp model = backend instanceof OjAlgoBackend ? TrajectoryMilps.randomZones(16, 10, 7) : HARD;
    CompletableFuture<SolveResult> running =
        CompletableFuture.supplyAsync(() -> ticking.solve(model, chosen, events::add));
    Thread.sleep(500);
    long cancelledAt = System.nanoTime();
    token.cancel();
    SolveResult r = running.get(10, TimeUnit.SECONDS);
    double afterCancel = (System.nanoTime() - cancelledAt) / 1e9;
    System.out.printf(
        "cancelled: %s, returned %.2f s after cancel, %d progress events%n",
        r.summary(), afterCancel, events.size());
    assertTrue(afterCancel < 3, "returned " + afterCancel + " s after cancel");
    assertTrue(
        r.status() == SolveStatus.FEASIBLE || r.status() == SolveStatus.NO_SOLUTION_FOUND,
        r::summary);
    assertEquals(StopReason.CANCELLED, r.stopReason(), r::summary);
    if (interruptible) {
      assertTrue(!r.message().contains("background"), "should have stopped: " + r.summary());
    }
    assertTrue(events.size() >= 3, "expected ticks every 50 ms, got " + events.size());
    for (int i = 1; i < events.size(); i++) {
      assertTrue(
          events.get(i).elapsed().compareTo(events.get(i - 1).elapsed()) >= 0,
          "elapsed must not go back");
    }
  }

  /**
   * Cancelled 0.3 s into a solve that started from the optimum of the hop (SCIP needs over a second
   * to prove it, CP-SAT several, ojAlgo usually several): the backend holds that incumbent and
   * returns it, FEASIBLE and marked cancelled. ojAlgo's parallel search sometimes proves the
   * optimum within 0.3 s; OPTIMAL is then the right answer.
   */
  @ParameterizedTest(name = "{0}")
  @MethodSource("hintedAndInterruptible")
  void cancellationReturnsTheIncumbent(SolverBackend backend) throws Exception {
    Milp hop = TrajectoryMilps.shortHop();
    SolveResult optimum = new OrToolsBackend(Engine.SCIP).solve(hop, SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, optimum.status(), optimum::summary);
    CancelToken token = new CancelToken();
    SolveOptions options =
        SolveOptions.defaults().withWarmStart(optimum.values()).withCancel(token);
    CompletableFuture<SolveResult> running =
        CompletableFuture.supplyAsync(() -> backend.solve(hop, options));
    Thread.sleep(300);
    token.cancel();
    SolveResult r = running.get(10, TimeUnit.SECONDS);
    System.out.println("cancelled with an incumbent: " + r.summary());
    if (r.status() != SolveStatus.OPTIMAL) {
      assertEquals(SolveStatus.FEASIBLE, r.status(), r::summary);
      assertEquals(StopReason.CANCELLED, r.stopReason(), r::summary);
    }
    double tolerance = r.approximate() ? 1e-2 : 1e-6;
    assertEquals(optimum.objective(), r.objective(), tolerance * optimum.objective(), r::summary);
  }

  static Stream<SolverBackend> hintedAndInterruptible() {
    return Stream.of(new OjAlgoBackend(), new OrToolsBackend(Engine.SCIP), TestBackends.cpSat());
  }

  @Test
  void aMonitorThatThrowsDoesNotBreakTheSolve() {
    SolverBackend scip = new OrToolsBackend(Engine.SCIP, Duration.ofMillis(10));
    SolveResult r =
        scip.solve(
            TrajectoryMilps.shortHop(),
            SolveOptions.defaults(),
            p -> {
              throw new IllegalStateException("monitor broke");
            });
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertTrue(
        r.warnings().stream().anyMatch(w -> w.contains("monitor broke")),
        () -> r.warnings().toString());
  }

  static SolverBackend withTick(SolverBackend b, Duration tick) {
    if (b instanceof OrToolsBackend o) {
      return new OrToolsBackend(o.engine(), tick);
    }
    return new OjAlgoBackend(tick);
  }
}
