package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Waypoint;
import java.util.ArrayList;
import java.util.List;

/**
 * One waypoint: a visit binary per step k = 1..N (with pruning only where the reach box meets the
 * waypoint's box; if none does, the plain form and a {@code waypoint-unreachable} fact), indicator
 * rows putting p_k in the box when the binary is 1, Σ visits ≥ 1, and "a visit only at or before
 * arrival": visit_k + d_{k−1} ≤ 1 wherever d_{k−1} exists.
 */
public record WaypointLayout(String entity, String tag, List<Visit> visits) {

  public WaypointLayout {
    visits = List.copyOf(visits);
  }

  /** A possible visit at {@code step}; {@code beforeArrival} when the visit_k + d_{k−1} ≤ 1 row exists. */
  public record Visit(int step, List<BoundRow> rows, boolean beforeArrival) {
    public Visit {
      rows = List.copyOf(rows);
    }
  }

  static WaypointLayout of(Waypoint w, String tag, FormulationLayout.Domains d, ArrivalLayout arrival,
      List<Fact> facts) {
    Shape box = new Shape.Box(w.region());
    List<Visit> visits = new ArrayList<>();
    for (int k = 1; k <= d.horizon(); k++) {
      if (!d.pruning() || Geometry.mayIntersect(box, d.position(k))) {
        visits.add(visit(box, d, arrival, k, d.pruning()));
      }
    }
    if (visits.isEmpty()) {
      facts.add(new Fact("waypoint-unreachable", w.name(), -1,
          "no step of the horizon can reach waypoint " + w.name() + " within the limits"));
      for (int k = 1; k <= d.horizon(); k++) {
        visits.add(visit(box, d, arrival, k, false));
      }
    }
    return new WaypointLayout(w.name(), tag, visits);
  }

  private static Visit visit(Shape box, FormulationLayout.Domains d, ArrivalLayout arrival, int k, boolean skip) {
    return new Visit(k, ArrivalLayout.indicatorRows(box, d.position(k), skip), arrival.hasDone(k - 1));
  }

  void count(Sizes.Counter c) {
    c.waypoint += visits.size();
    c.row(visits.size());
    for (Visit v : visits) {
      for (BoundRow r : v.rows()) {
        c.row(r.terms());
      }
      if (v.beforeArrival()) {
        c.row(2);
      }
    }
  }
}
