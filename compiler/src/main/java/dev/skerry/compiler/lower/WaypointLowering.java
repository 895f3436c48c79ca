package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.BoundRow;
import dev.skerry.compiler.analysis.WaypointLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;

/**
 * Waypoints as laid out by {@link WaypointLayout}: visit binaries, indicator rows putting p_k in
 * the waypoint's box, Σ visits ≥ 1, and visit_k + d_{k−1} ≤ 1 (no visit after arrival).
 */
final class WaypointLowering {
  private WaypointLowering() {}

  static void lower(LoweringContext c) {
    for (WaypointLayout w : c.layout.waypoints()) {
      LinearExpr any = new LinearExpr();
      for (WaypointLayout.Visit v : w.visits()) {
        int k = v.step();
        Variable z = c.builder.newBinary("visit_" + w.tag() + "_" + k, Origin.of(w.entity(), "visit", k));
        any.add(z);
        for (BoundRow r : v.rows()) {
          ArrivalLowering.indicator(c, "wp_" + w.tag() + "_" + r.label() + "_" + k, c.position(r.normal(), k), r, z,
              Origin.of(w.entity(), "visit-row", k));
        }
        if (v.beforeArrival()) {
          c.builder.addLessOrEqual("wpby_" + w.tag() + "_" + k, LinearExpr.of(z).add(c.done[k - 1]), 1,
              Origin.of(w.entity(), "visit-by", k));
        }
      }
      c.builder.addGreaterOrEqual("wpany_" + w.tag(), any, 1, Origin.of(w.entity(), "visit-any"));
    }
  }
}
