package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.LimitPolygon;
import dev.skerry.compiler.analysis.MotionLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Bounds;

/**
 * States p_k, v_k (k = 0..N) and inputs u_k (k = 0..N−1) of the double integrator, with the
 * zero-order-hold rows p_{k+1} = p_k + Δt v_k + ½Δt² u_k and v_{k+1} = v_k + Δt u_k per axis
 * (coefficients from {@link ZeroOrderHold}). The start state is fixed by the bounds of p_0 and v_0;
 * p_k (k ≥ 1) is bounded by the keep-in box deflated by the radius, v_k and u_k by the bounding
 * boxes of the speed and acceleration polygons (implied by the polygon rows, stated for the solver).
 */
final class DynamicsLowering {
  private DynamicsLowering() {}

  static void lower(LoweringContext c) {
    MotionLayout m = c.motion();
    MilpBuilder b = c.builder;
    String t = c.vehicleTag;
    int n = m.horizon();
    Bounds area = m.positionBounds();
    LimitPolygon speed = m.speed();
    LimitPolygon accel = m.accel();
    for (int k = 0; k <= n; k++) {
      if (k == 0) {
        c.px[0] = b.newContinuous("px_" + t + "_0", m.start().x(), m.start().x(), origin(c, "px", 0));
        c.py[0] = b.newContinuous("py_" + t + "_0", m.start().y(), m.start().y(), origin(c, "py", 0));
        c.vx[0] = b.newContinuous("vx_" + t + "_0", m.startVelocity().x(), m.startVelocity().x(), origin(c, "vx", 0));
        c.vy[0] = b.newContinuous("vy_" + t + "_0", m.startVelocity().y(), m.startVelocity().y(), origin(c, "vy", 0));
      } else {
        c.px[k] = b.newContinuous("px_" + t + "_" + k, area.xmin(), area.xmax(), origin(c, "px", k));
        c.py[k] = b.newContinuous("py_" + t + "_" + k, area.ymin(), area.ymax(), origin(c, "py", k));
        c.vx[k] = b.newContinuous("vx_" + t + "_" + k, speed.xmin(), speed.xmax(), origin(c, "vx", k));
        c.vy[k] = b.newContinuous("vy_" + t + "_" + k, speed.ymin(), speed.ymax(), origin(c, "vy", k));
      }
      if (k < n) {
        c.ux[k] = b.newContinuous("ux_" + t + "_" + k, accel.xmin(), accel.xmax(), origin(c, "ux", k));
        c.uy[k] = b.newContinuous("uy_" + t + "_" + k, accel.ymin(), accel.ymax(), origin(c, "uy", k));
      }
    }
    ZeroOrderHold.Discrete zoh = ZeroOrderHold.doubleIntegrator(m.step());
    double[][] a = zoh.a();
    double[][] bu = zoh.b();
    for (int k = 0; k < n; k++) {
      Origin o = origin(c, "dynamics", k);
      b.addEquality("dynpx_" + t + "_" + k, step(c.px[k + 1], c.px[k], c.vx[k], c.ux[k], a[0], bu[0][0]), 0, o);
      b.addEquality("dynpy_" + t + "_" + k, step(c.py[k + 1], c.py[k], c.vy[k], c.uy[k], a[0], bu[0][0]), 0, o);
      b.addEquality("dynvx_" + t + "_" + k, step(c.vx[k + 1], c.px[k], c.vx[k], c.ux[k], a[1], bu[1][0]), 0, o);
      b.addEquality("dynvy_" + t + "_" + k, step(c.vy[k + 1], c.py[k], c.vy[k], c.uy[k], a[1], bu[1][0]), 0, o);
    }
    if (m.climb() != null) {
      altitude(c, m, a, bu);
    }
  }

  /**
   * The altitude channel of a 3-D scenario: z_k, ż_k, a_k with the same zero-order hold; ż and a
   * bounded by the climb limits, z by the keep-in floor and ceiling (shrunk by the radius).
   */
  private static void altitude(LoweringContext c, MotionLayout m, double[][] a, double[][] bu) {
    MilpBuilder b = c.builder;
    String t = c.vehicleTag;
    MotionLayout.Climb cl = m.climb();
    int n = m.horizon();
    for (int k = 0; k <= n; k++) {
      if (k == 0) {
        c.pz[0] = b.newContinuous("pz_" + t + "_0", cl.start(), cl.start(), origin(c, "pz", 0));
        c.vz[0] = b.newContinuous("vz_" + t + "_0", cl.startRate(), cl.startRate(), origin(c, "vz", 0));
      } else {
        c.pz[k] = b.newContinuous("pz_" + t + "_" + k, cl.altitudes().lo(), cl.altitudes().hi(), origin(c, "pz", k));
        c.vz[k] = b.newContinuous("vz_" + t + "_" + k, -cl.maxRate(), cl.maxRate(), origin(c, "vz", k));
      }
      if (k < n) {
        c.uz[k] = b.newContinuous("uz_" + t + "_" + k, -cl.maxAccel(), cl.maxAccel(), origin(c, "uz", k));
      }
    }
    for (int k = 0; k < n; k++) {
      Origin o = origin(c, "dynamics", k);
      b.addEquality("dynpz_" + t + "_" + k, step(c.pz[k + 1], c.pz[k], c.vz[k], c.uz[k], a[0], bu[0][0]), 0, o);
      b.addEquality("dynvz_" + t + "_" + k, step(c.vz[k + 1], c.pz[k], c.vz[k], c.uz[k], a[1], bu[1][0]), 0, o);
    }
  }

  /** {@code next − (a[0]·p + a[1]·v + bu·u)}; zero coefficients vanish when the row is merged. */
  private static LinearExpr step(Variable next, Variable p, Variable v, Variable u, double[] a, double bu) {
    return LinearExpr.of(next).add(p, -a[0]).add(v, -a[1]).add(u, -bu);
  }

  static Origin origin(LoweringContext c, String role, int k) {
    return c.origin(c.vehicle, role, k);
  }
}
