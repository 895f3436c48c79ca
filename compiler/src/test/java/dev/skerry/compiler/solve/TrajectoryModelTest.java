package dev.skerry.compiler.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Models shaped like Skerry's own (see {@link TrajectoryMilps}). */
class TrajectoryModelTest {
  /**
   * Rest-to-rest in free space with 1-norm fuel. Derived here: with v_{k+1} = v_k + u_k and p_{k+1}
   * = p_k + v_k + u_k/2, the distance is d = Σ_{k=1}^{N−1} v_k ≤ (N−1)·V for the peak speed V, and
   * the speed must rise from 0 to V and fall back, so fuel ≥ 2V ≥ 2d/(N−1) per axis; one impulse of
   * V at the start and one of −V at the end reach it when V ≤ u_max and V ≤ v_max. From (1, 1) to
   * (19, 19): d = 18 per axis.
   */
  @ParameterizedTest(name = "{0} steps")
  @ValueSource(ints = {19, 25})
  void freeSpaceFuelMatchesClosedForm(int steps) {
    double perAxis = 2 * 18.0 / (steps - 1);
    assertTrue(18.0 / (steps - 1) <= TrajectoryMilps.U_MAX, "closed form needs V ≤ u_max");
    Milp m = TrajectoryMilps.build("free_" + steps, steps, List.of());
    for (SolverBackend b : TestBackends.exact()) {
      SolveResult r = b.solve(m, SolveOptions.defaults());
      assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
      assertEquals(2 * perAxis, r.objective(), 1e-6 * 2 * perAxis, r::summary);
    }
  }

  /**
   * All exact backends reach the same optimum on a model with 72 big-M binaries; the plan they
   * return keeps every sampled position out of every zone (checked from the positions alone, not
   * the binaries), and costs more than the same hop without zones.
   */
  @Test
  void exactBackendsAgreeOnZoneAvoidance() {
    Milp m = TrajectoryMilps.shortHop();
    assertEquals(72, m.binaryCount(), "4 binaries per zone per inner step: 4·2·9");
    SolveResult free =
        TestBackends.exact().get(1).solve(TrajectoryMilps.shortHopFree(), SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, free.status(), free::summary);
    List<SolveResult> results = new ArrayList<>();
    for (SolverBackend b : TestBackends.exact()) {
      SolveResult r = b.solve(m, SolveOptions.defaults());
      System.out.println("short hop: " + r.summary());
      assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
      assertOutsideZones(m, r);
      assertTrue(r.objective() > free.objective() + 1e-3, "zones force a detour: " + r.summary());
      results.add(r);
    }
    double reference = results.get(0).objective();
    for (SolveResult r : results) {
      assertEquals(
          reference,
          r.objective(),
          1e-6 * Math.abs(reference),
          r.summary() + " vs " + results.get(0).summary());
    }
  }

  /** CP-SAT on the same hop, with its difference from the exact optimum reported. */
  @Test
  void cpSatIsNearTheExactOptimum() {
    Milp m = TrajectoryMilps.shortHop();
    SolveResult exact = TestBackends.exact().get(1).solve(m, SolveOptions.defaults());
    SolveResult approx =
        TestBackends.cpSat()
            .solve(m, SolveOptions.defaults().withTimeLimit(java.time.Duration.ofSeconds(20)));
    assertTrue(approx.status().hasSolution(), approx::summary);
    assertTrue(approx.approximate(), approx::summary);
    assertOutsideZones(m, approx);
    double diff = (approx.objective() - exact.objective()) / exact.objective();
    System.out.printf(
        Locale.ROOT,
        "cpsat short hop: %.9g vs exact %.9g, relative difference %.2e (%s)%n",
        approx.objective(),
        exact.objective(),
        diff,
        approx.status());
    // CP-SAT gets equality rows widened by OrToolsRun.CP_SAT_EQUALITY_SLACK, so its point may break
    // them by that much and undercut the optimum by about as little, never by more.
    assertTrue(
        diff >= -1e-4, "a nearly feasible point cannot beat the proven optimum by more: " + approx.summary());
    assertTrue(diff <= 1e-2, approx::summary);
  }

  static void assertOutsideZones(Milp m, SolveResult r) {
    for (int z = 0; z < TrajectoryMilps.SHORT_HOP_ZONES.size(); z++) {
      TrajectoryMilps.Box box = TrajectoryMilps.SHORT_HOP_ZONES.get(z);
      for (int k = 1; k < 10; k++) {
        double x = r.value(m.variable("px_" + k));
        double y = r.value(m.variable("py_" + k));
        double tol = 1e-6;
        boolean outside =
            x <= box.x1() + tol
                || x >= box.x2() - tol
                || y <= box.y1() + tol
                || y >= box.y2() - tol;
        int zone = z;
        int step = k;
        assertTrue(
            outside,
            () ->
                String.format(
                    Locale.ROOT,
                    "%s: step %d at (%.6f, %.6f) is inside zone %d",
                    r.backendId(),
                    step,
                    x,
                    y,
                    zone));
      }
    }
  }
}
