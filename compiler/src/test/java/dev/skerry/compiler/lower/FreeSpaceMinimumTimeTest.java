package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Rest-to-rest move of distance d along x in free space.
 *
 * <p>Outside check: the continuous-time minimum time under |a| ≤ a is T* = 2√(d/a), bang-bang
 * (Kirk, <i>Optimal Control Theory</i>, the minimum-time double integrator). We compare with the
 * bound for the limit the MILP really has along x: the inscribed 16-gon's face with normal (1, 0)
 * admits a_eff = a_max·cos(π/16), and the target box's near edge is d_eff = d − tol away, so T* =
 * 2√(d_eff/a_eff). Piecewise-constant inputs are a subset of all inputs, so kΔt ≥ T* always.
 *
 * <p>Derived here (not from a source): rest to rest in k zero-order-hold steps the largest distance
 * is a·Δt²·g(k) with g(2m) = m² and g(2m+1) = m(m+1) (v_i ≤ aΔt·min(i, k−i), p_k = Δt Σ v_i). So
 * the discrete optimum is the least k with a·Δt²·g(k) ≥ d, which lies in [T*, T* + 2Δt): within one
 * step of T* when that k is even, up to nearly two steps when it is odd (e.g. T* = 2.9Δt needs k =
 * 4). The test asserts the exact discrete optimum and the bracket.
 */
class FreeSpaceMinimumTimeTest {

  @ParameterizedTest(name = "d = {0} m")
  @ValueSource(doubles = {2.0, 4.5, 7.0, 10.5})
  void arrivalTimeMatchesBangBang(double d) {
    double amax = 1;
    double dt = 1;
    double tol = 1e-3;
    int n = 10;
    Scenario s = TestScenarios.scenario(
        TestScenarios.vehicle(new Vec2(0, 0), 20, amax, 0, 16),
        TestScenarios.box(-5, -5, 30, 5), List.of(),
        TestScenarios.target(TestScenarios.box(d - tol, -tol, d + tol, tol), true), List.of(),
        TestScenarios.plan(dt, n, 1, 0));
    Milp m = Lowering.lower(s);
    OjAlgoSolve.Result r = OjAlgoSolve.solve(m);
    assertTrue(r.optimal(), "free-space move not solved: " + r.state());
    int k = 0;
    for (int j = 1; j <= n; j++) {
      var f = m.variable("f_" + j);
      if (f != null && r.x()[f.index()] > 0.5) {
        k = j;
      }
    }
    double aEff = amax * Math.cos(Math.PI / 16);
    double dEff = d - tol;
    double tStar = 2 * Math.sqrt(dEff / aEff);
    assertTrue(k * dt >= tStar - 1e-9, "arrival " + k + " beats the continuous minimum " + tStar);
    assertTrue(k * dt < tStar + 2 * dt, "arrival " + k + " too late against " + tStar);
    int discrete = 1;
    while (aEff * dt * dt * g(discrete) < dEff) {
      discrete++;
    }
    assertEquals(discrete, k);
    assertEquals(k * dt, r.objective(), 1e-6);
  }

  private static double g(int k) {
    int m = k / 2;
    return k % 2 == 0 ? (double) m * m : (double) m * (m + 1);
  }
}
