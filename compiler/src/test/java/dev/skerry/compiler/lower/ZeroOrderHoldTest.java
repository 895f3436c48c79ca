package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The generic zero-order-hold discretisation against closed forms from Franklin, Powell &
 * Workman, <i>Digital Control of Dynamic Systems</i> (ch. 4, discrete equivalents): for the double
 * integrator Φ = [[1, T], [0, 1]], Γ = [T²/2, T]; for the first-order lag ẋ = −a·x + u, Φ = e^{−aT}
 * and Γ = (1 − e^{−aT})/a.
 */
class ZeroOrderHoldTest {

  @ParameterizedTest
  @ValueSource(doubles = {0.05, 0.5, 1, 2.5, 10})
  void doubleIntegratorMatchesTextbook(double t) {
    ZeroOrderHold.Discrete d = ZeroOrderHold.doubleIntegrator(t);
    assertArrayEquals(new double[] {1, t}, d.a()[0], 1e-12 * Math.max(1, t));
    assertArrayEquals(new double[] {0, 1}, d.a()[1], 1e-12);
    assertEquals(t * t / 2, d.b()[0][0], 1e-12 * Math.max(1, t * t));
    assertEquals(t, d.b()[1][0], 1e-12 * Math.max(1, t));
  }

  @ParameterizedTest
  @ValueSource(doubles = {0.1, 1, 3, 20})
  void firstOrderLagMatchesTextbook(double at) {
    double a = 0.7;
    double t = at / a;
    ZeroOrderHold.Discrete d = ZeroOrderHold.discretise(new double[][] {{-a}}, new double[][] {{1}}, t);
    assertEquals(Math.exp(-a * t), d.a()[0][0], 1e-12);
    assertEquals((1 - Math.exp(-a * t)) / a, d.b()[0][0], 1e-12);
  }

  /** The lowered dynamics rows carry exactly those coefficients: p⁺ − p − T v − T²/2 u = 0, v⁺ − v − T u = 0. */
  @ParameterizedTest
  @ValueSource(doubles = {0.5, 1, 2})
  void loweredRowsUseTheDiscreteMatrices(double t) {
    var s = TestScenarios.inlet(3, 0.1);
    s = s.withPlan(
        new PlanOptions(t, 3, 1, 0.1, 0, SymmetryRule.NONE, 0, "default", null, 0, 0, true, true, null));
    Milp m = Lowering.lower(s);
    Row px = row(m, "dynpx_skiff_1");
    assertEquals(1, coef(m, px, "px_skiff_2"));
    assertEquals(-1, coef(m, px, "px_skiff_1"));
    assertEquals(-t, coef(m, px, "vx_skiff_1"), 1e-12);
    assertEquals(-t * t / 2, coef(m, px, "ux_skiff_1"), 1e-12);
    assertEquals(4, px.size());
    Row vx = row(m, "dynvx_skiff_1");
    assertEquals(1, coef(m, vx, "vx_skiff_2"));
    assertEquals(-1, coef(m, vx, "vx_skiff_1"));
    assertEquals(-t, coef(m, vx, "ux_skiff_1"), 1e-12);
    assertEquals(3, vx.size());
  }

  private static Row row(Milp m, String name) {
    return m.rows().stream().filter(r -> r.name().equals(name)).findFirst()
        .orElseThrow(() -> new AssertionError("no row " + name));
  }

  private static double coef(Milp m, Row r, String column) {
    int col = m.variable(column).index();
    for (int i = 0; i < r.size(); i++) {
      if (r.cols()[i] == col) {
        return r.coefs()[i];
      }
    }
    return 0;
  }
}
