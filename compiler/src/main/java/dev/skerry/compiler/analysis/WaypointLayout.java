package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Waypoint;
import java.util.ArrayList;
import java.util.List;

/**
 * One waypoint: a visit binary per step k = 1..N (with pruning only where the reach box meets the
 * waypoint's box; if none does, the plain form and a {@code waypoint-unreachable} fact), indicator
 * rows putting p_k in the box (and, in 3-D, the altitude in its band) when the binary is 1, Σ visits
 * ≥ 1, and "a visit only at or before arrival": visit_k + d_{k−1} ≤ 1 wherever d_{k−1} exists. In a
 * fleet every vehicle gets visit binaries and one visit by any vehicle suffices.
 */
public record WaypointLayout(String entity, String tag, List<Visit> visits) {

  public WaypointLayout {
    visits = List.copyOf(visits);
  }

  /**
   * A possible visit by vehicle {@code vehicle} (index in the scenario) at {@code step}; {@code
   * beforeArrival} when the visit_k + d_{k−1} ≤ 1 row exists.
   */
  public record Visit(int vehicle, int step, List<BoundRow> rows, boolean beforeArrival) {
    public Visit {
      rows = List.copyOf(rows);
    }
  }

  static WaypointLayout of(Waypoint w, String tag, List<FormulationLayout.Domains> ds, List<ArrivalLayout> arrivals,
      List<Fact> facts) {
    Shape box = new Shape.Box(w.region());
    List<Visit> visits = new ArrayList<>();
    for (int i = 0; i < ds.size(); i++) {
      FormulationLayout.Domains d = ds.get(i);
      for (int k = 1; k <= d.horizon(); k++) {
        if (!d.pruning() || reachable(w, box, d, k)) {
          visits.add(visit(w, box, d, arrivals.get(i), i, k, d.pruning()));
        }
      }
    }
    if (visits.isEmpty()) {
      facts.add(new Fact("waypoint-unreachable", w.name(), -1,
          "no step of the horizon can reach waypoint " + w.name() + " within the limits"));
      for (int i = 0; i < ds.size(); i++) {
        for (int k = 1; k <= ds.get(i).horizon(); k++) {
          visits.add(visit(w, box, ds.get(i), arrivals.get(i), i, k, false));
        }
      }
    }
    return new WaypointLayout(w.name(), tag, visits);
  }

  private static boolean reachable(Waypoint w, Shape box, FormulationLayout.Domains d, int k) {
    if (!Geometry.mayIntersect(box, d.position(k))) {
      return false;
    }
    if (d.threeD() && w.altitude() != null) {
      Span a = d.altitude(k);
      return w.altitude().hi() >= a.lo() && w.altitude().lo() <= a.hi();
    }
    return true;
  }

  private static Visit visit(Waypoint w, Shape box, FormulationLayout.Domains d, ArrivalLayout arrival, int vehicle,
      int k, boolean skip) {
    List<BoundRow> rows = new ArrayList<>(ArrivalLayout.indicatorRows(box, d.position(k), skip));
    if (d.threeD() && w.altitude() != null) {
      rows.addAll(ArrivalLayout.altitudeRows(w.altitude(), d.position(k), d.altitude(k), skip));
    }
    return new Visit(vehicle, k, rows, arrival.hasDone(k - 1));
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
