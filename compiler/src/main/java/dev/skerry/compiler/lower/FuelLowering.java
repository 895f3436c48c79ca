package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.BigM;
import dev.skerry.compiler.analysis.MotionLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;

/**
 * 1-norm fuel: per axis w_k ≥ u_k and w_k ≥ −u_k (k = 0..N−1; the vertical axis too in 3-D), so at
 * the optimum w = |u| and fuel = Σ_k Σ_axis Δt·w. After arrival the rows are relaxed by M·d_k (M the largest |u|), so fuel
 * counts the inputs up to arrival only. Present only when fuel has a weight in the objective.
 */
final class FuelLowering {
  private FuelLowering() {}

  static void lower(LoweringContext c) {
    MotionLayout m = c.motion();
    if (!m.fuel()) {
      return;
    }
    String t = c.vehicleTag;
    double bound = m.fuelBound();
    double relax = BigM.pad(bound);
    for (int k = 0; k < m.horizon(); k++) {
      c.wx[k] = c.builder.newContinuous("wx_" + t + "_" + k, 0, bound, DynamicsLowering.origin(c, "wx", k));
      c.wy[k] = c.builder.newContinuous("wy_" + t + "_" + k, 0, bound, DynamicsLowering.origin(c, "wy", k));
      Variable d = c.doneBy(k);
      Origin o = DynamicsLowering.origin(c, "fuel", k);
      absolute(c, "fuelx", c.wx[k], c.ux[k], d, relax, k, o);
      absolute(c, "fuely", c.wy[k], c.uy[k], d, relax, k, o);
      if (m.climb() != null) {
        double zb = m.climb().maxAccel();
        c.wz[k] = c.builder.newContinuous("wz_" + t + "_" + k, 0, zb, DynamicsLowering.origin(c, "wz", k));
        absolute(c, "fuelz", c.wz[k], c.uz[k], d, BigM.pad(zb), k, o);
      }
    }
  }

  private static void absolute(LoweringContext c, String name, Variable w, Variable u, Variable d, double relax,
      int k, Origin o) {
    for (int sign : new int[] {1, -1}) {
      LinearExpr e = LinearExpr.of(w).add(u, -sign);
      if (d != null) {
        e.add(d, relax);
      }
      c.builder.addGreaterOrEqual(name + (sign > 0 ? "p_" : "n_") + c.vehicleTag + "_" + k, e, 0, o);
    }
  }

  /** Σ Δt·(wx + wy) added to an objective with weight {@code weight}. */
  static void addCost(LoweringContext c, LinearExpr objective, double weight) {
    MotionLayout m = c.motion();
    if (!m.fuel()) {
      return;
    }
    for (int k = 0; k < m.horizon(); k++) {
      objective.add(c.wx[k], weight * m.step());
      objective.add(c.wy[k], weight * m.step());
      if (m.climb() != null) {
        objective.add(c.wz[k], weight * m.step());
      }
    }
  }
}
