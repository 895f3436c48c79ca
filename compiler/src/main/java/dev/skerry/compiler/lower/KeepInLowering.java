package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.MotionLayout;
import dev.skerry.compiler.milp.Origin;

/**
 * Keep-in area. A box area is already the bounds of p_k (see {@link DynamicsLowering}); a polygon
 * area deflated by the radius adds {@code n_j·p_k ≤ c_j} for the faces and steps the layout lists.
 * Convexity makes whole segments stay inside when their end points do, so no guard is needed.
 */
final class KeepInLowering {
  private KeepInLowering() {}

  static void lower(LoweringContext c) {
    MotionLayout m = c.motion();
    for (MotionLayout.KeepInRow r : m.keepIn()) {
      c.builder.addLessOrEqual("in_" + m.areaTag() + "_f" + r.face() + "_" + r.step(), c.position(r.normal(), r.step()),
          r.offset(), c.origin(m.areaName(), "keep-in", r.step()));
    }
  }
}
