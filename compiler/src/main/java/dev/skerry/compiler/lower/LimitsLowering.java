package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.LimitPolygon;
import dev.skerry.compiler.analysis.MotionLayout;
import dev.skerry.compiler.model.Vec2;

/**
 * Speed (k = 1..N) and acceleration (k = 0..N−1) limits by the inscribed polygon of {@link
 * LimitPolygon}: {@code n_j·v_k ≤ v_max·cos(π/S)} and {@code n_j·u_k ≤ a_max·cos(π/S)}. The true
 * 2-norm limit is never exceeded; at worst cos(π/S) of it is usable.
 */
final class LimitsLowering {
  private LimitsLowering() {}

  static void lower(LoweringContext c) {
    MotionLayout m = c.motion();
    LimitPolygon speed = m.speed();
    LimitPolygon accel = m.accel();
    String t = c.vehicleTag;
    for (int k = 1; k <= m.horizon(); k++) {
      for (int j = 0; j < speed.sides(); j++) {
        Vec2 n = speed.normals().get(j);
        c.builder.addLessOrEqual("spd_" + t + "_j" + j + "_" + k, c.velocity(n, k), speed.offset(),
            DynamicsLowering.origin(c, "speed", k));
      }
    }
    for (int k = 0; k < m.horizon(); k++) {
      for (int j = 0; j < accel.sides(); j++) {
        Vec2 n = accel.normals().get(j);
        c.builder.addLessOrEqual("acc_" + t + "_j" + j + "_" + k, LoweringContext.along(n, c.ux[k], c.uy[k]),
            accel.offset(), DynamicsLowering.origin(c, "accel", k));
      }
    }
  }
}
