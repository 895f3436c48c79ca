package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.BoundRow;
import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.analysis.WaypointLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.util.List;

/**
 * Waypoints as laid out by {@link WaypointLayout}: visit binaries, indicator rows putting p_k in
 * the waypoint's box, Σ visits ≥ 1, and visit_k + d_{k−1} ≤ 1 (no visit after arrival). In a fleet
 * each vehicle has its own visit binaries and one Σ over all of them asks for a visit by any.
 */
final class WaypointLowering {
  private WaypointLowering() {}

  static void lower(FormulationLayout layout, List<LoweringContext> parts, MilpBuilder b) {
    for (WaypointLayout w : layout.waypoints()) {
      LinearExpr any = new LinearExpr();
      for (WaypointLayout.Visit v : w.visits()) {
        LoweringContext c = parts.get(v.vehicle());
        int k = v.step();
        Variable z = b.newBinary("visit_" + c.scope + w.tag() + "_" + k, c.origin(w.entity(), "visit", k));
        any.add(z);
        for (BoundRow r : v.rows()) {
          ArrivalLowering.indicator(c, "wp_" + c.scope + w.tag() + "_" + r.label() + "_" + k,
              c.position(r.normal(), r.nz(), k), r, z, c.origin(w.entity(), "visit-row", k));
        }
        if (v.beforeArrival()) {
          b.addLessOrEqual("wpby_" + c.scope + w.tag() + "_" + k, LinearExpr.of(z).add(c.done[k - 1]), 1,
              c.origin(w.entity(), "visit-by", k));
        }
      }
      b.addGreaterOrEqual("wpany_" + w.tag(), any, 1, Origin.of(w.entity(), "visit-any"));
    }
  }
}
