package dev.skerry.compiler.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class OptionsTest {
  static java.util.stream.Stream<SolverBackend> exactOrTools() {
    return TestBackends.exactStream().filter(b -> !b.id().equals("ojalgo"));
  }

  @Test
  void badOptionsAreRefusedWithAReason() {
    SolveOptions o = SolveOptions.defaults();
    assertThrows(IllegalArgumentException.class, () -> o.withTimeLimit(Duration.ZERO));
    assertThrows(IllegalArgumentException.class, () -> o.withTimeLimit(Duration.ofSeconds(-1)));
    assertThrows(IllegalArgumentException.class, () -> o.withRelativeGap(-0.1));
    assertThrows(IllegalArgumentException.class, () -> o.withRelativeGap(Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> o.withThreads(-2));
    assertThrows(IllegalArgumentException.class, () -> o.withCancel(null));
    assertEquals(SolveOptions.DEFAULT_RELATIVE_GAP, o.relativeGap());
    assertTrue(o.timeLimit().isEmpty());
  }

  @Test
  void warmStartIsCopiedBothWays() {
    double[] start = {1, 2};
    SolveOptions o = SolveOptions.defaults().withWarmStart(start);
    start[0] = 99;
    o.warmStart().orElseThrow()[1] = 99;
    assertEquals(1, o.warmStart().orElseThrow()[0]);
    assertEquals(2, o.warmStart().orElseThrow()[1]);
  }

  /** One thread and no gap at all are accepted by every backend and change no answer. */
  @ParameterizedTest(name = "{0}")
  @MethodSource("dev.skerry.compiler.solve.TestBackends#exactStream")
  void oneThreadAndZeroGapAreAccepted(SolverBackend backend) {
    Milp m = KnownOptimaTest.smallIp();
    SolveResult r = backend.solve(m, SolveOptions.defaults().withThreads(1).withRelativeGap(0));
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertEquals(KnownOptimaTest.smallIpByEnumeration(), r.objective(), 1e-9, r::summary);
    assertTrue(r.warnings().isEmpty(), () -> r.warnings().toString());
  }

  /**
   * With a 20% gap a backend may stop early, but never worse than the gap allows: for a
   * minimisation, gap ≤ g means objective ≤ bound / (1 − g) ≤ optimum / (1 − g). ojAlgo's gap
   * mapping is tested on its own (OjAlgoBackendTest): a looser gap barely speeds it up here.
   */
  @ParameterizedTest(name = "{0}")
  @MethodSource("exactOrTools")
  void aLooseGapIsHonoured(SolverBackend backend) {
    Milp hop = TrajectoryMilps.shortHop();
    double optimum = TestBackends.exact().get(1).solve(hop, SolveOptions.defaults()).objective();
    SolveResult r = backend.solve(hop, SolveOptions.defaults().withRelativeGap(0.2));
    System.out.println("gap 0.2: " + r.summary());
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertTrue(r.objective() >= optimum - 1e-6, r::summary);
    assertTrue(r.objective() <= optimum / (1 - 0.2) + 1e-6, r::summary);
    if (!Double.isNaN(r.bestBound())) {
      assertTrue(r.bestBound() <= optimum + 1e-6, "a bound above the optimum: " + r.bestBound());
      assertTrue(r.gap() <= 0.2 + 1e-9, r::summary);
    }
  }
}
