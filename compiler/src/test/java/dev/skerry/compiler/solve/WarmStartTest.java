package dev.skerry.compiler.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.solve.ojalgo.OjAlgoBackend;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import java.time.Duration;
import java.util.Arrays;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Warm starts, on the 72-binary hop for the fast engines and on the knapsack where a backend would
 * need many seconds for the hop (ojAlgo without a good start, CP-SAT).
 */
class WarmStartTest {
  static final Milp HOP = TrajectoryMilps.shortHop();
  static final Milp KNAPSACK = KnownOptimaTest.knapsack();
  static double[] hopOptimum;
  static double hopObjective;

  @BeforeAll
  static void solveOnce() {
    SolveResult r = new OrToolsBackend(Engine.SCIP).solve(HOP, SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    hopOptimum = r.values();
    hopObjective = r.objective();
  }

  static Stream<SolverBackend> all() {
    return Stream.concat(TestBackends.exactStream(), Stream.of(TestBackends.cpSat()));
  }

  static boolean slowOnHop(SolverBackend b) {
    return b instanceof OjAlgoBackend
        || b instanceof OrToolsBackend o && o.engine() == Engine.CP_SAT;
  }

  /** Every binary 0: all four sides of each zone enforced at once, which no point satisfies. */
  static double[] infeasibleHopHint() {
    double[] x = hopOptimum.clone();
    for (Variable v : HOP.variables()) {
      if (v.isInteger()) {
        x[v.index()] = 0;
      }
    }
    assertTrue(HOP.maxViolation(x) > 1, "the hint must really be infeasible");
    return x;
  }

  /** Every item taken: far over capacity. */
  static double[] infeasibleKnapsackHint() {
    double[] x = new double[KNAPSACK.columnCount()];
    Arrays.fill(x, 1);
    assertTrue(KNAPSACK.maxViolation(x) > 1, "the hint must really be infeasible");
    return x;
  }

  static double[] knapsackOptimum() {
    SolveResult r = new OrToolsBackend(Engine.SCIP).solve(KNAPSACK, SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    return r.values();
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("all")
  void optimalHintStillGivesTheOptimum(SolverBackend backend) {
    boolean cpSat = backend instanceof OrToolsBackend o && o.engine() == Engine.CP_SAT;
    Milp m = cpSat ? KNAPSACK : HOP;
    double[] hint = cpSat ? knapsackOptimum() : hopOptimum;
    double expected = m.objective().value(hint);
    SolveResult r = backend.solve(m, SolveOptions.defaults().withWarmStart(hint));
    System.out.println("optimal hint: " + r.summary());
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertEquals(expected, r.objective(), 1e-6 * Math.abs(expected), r::summary);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("all")
  void infeasibleHintBreaksNothing(SolverBackend backend) {
    Milp m = slowOnHop(backend) ? KNAPSACK : HOP;
    double[] hint = slowOnHop(backend) ? infeasibleKnapsackHint() : infeasibleHopHint();
    double expected = slowOnHop(backend) ? KnownOptimaTest.knapsackByEnumeration() : hopObjective;
    SolveResult r = backend.solve(m, SolveOptions.defaults().withWarmStart(hint));
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertEquals(expected, r.objective(), 1e-6 * Math.abs(expected), r::summary);
  }

  @Test
  void highsIsNeverHintedAndSaysSo() {
    SolveResult r =
        new OrToolsBackend(Engine.HIGHS)
            .solve(HOP, SolveOptions.defaults().withWarmStart(hopOptimum));
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertTrue(
        r.warnings().stream().anyMatch(w -> w.contains("never given a warm start")),
        () -> r.warnings().toString());
  }

  /**
   * The hint is used: ojAlgo needs about 9 s to prove this optimum and finds no plan in 0.5 s alone
   * (see LimitsAndCancelTest); with the optimum as its start it returns it at its deadline.
   */
  @Test
  void ojAlgoReturnsTheHintWhenStoppedEarly() {
    SolveResult r =
        new OjAlgoBackend()
            .solve(
                HOP,
                SolveOptions.defaults()
                    .withWarmStart(hopOptimum)
                    .withTimeLimit(Duration.ofMillis(300)));
    assertTrue(r.status().hasSolution(), r::summary);
    assertEquals(hopObjective, r.objective(), 1e-6 * hopObjective, r::summary);
  }

  @Test
  void hintsOfTheWrongShapeAreDroppedWithAWarning() {
    SolverBackend scip = new OrToolsBackend(Engine.SCIP);
    double[] withNan = hopOptimum.clone();
    withNan[3] = Double.NaN;
    for (double[] hint : new double[][] {Arrays.copyOf(hopOptimum, 5), withNan}) {
      SolveResult r = scip.solve(HOP, SolveOptions.defaults().withWarmStart(hint));
      assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
      assertTrue(
          r.warnings().stream().anyMatch(w -> w.startsWith("warm start ignored")),
          () -> r.warnings().toString());
    }
  }
}
