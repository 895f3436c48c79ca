package dev.skerry.compiler.check;

import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import dev.skerry.compiler.source.SourceRange;

/**
 * Feasibility and formulation hints computed from the scenario alone, before any MILP exists:
 * each names a reason a solve would fail or mislead, and what to change.
 */
public final class Hints {
  private final Scenario s;
  private final Diagnostics sink;
  private final Map<String, SourceRange> planRanges;

  private Hints(Scenario scenario, Diagnostics sink, Map<String, SourceRange> planRanges) {
    this.s = scenario;
    this.sink = sink;
    this.planRanges = planRanges;
  }

  /** Reports the hints; {@code planRanges} maps plan keywords to where they are written. */
  public static void report(Scenario scenario, Diagnostics sink, Map<String, SourceRange> planRanges) {
    Hints hints = new Hints(scenario, sink, planRanges);
    hints.start();
    hints.target();
    hints.waypoints();
    hints.zonesOutsideArea();
    hints.horizon();
    hints.singleCluster();
    hints.narrowGaps();
    hints.cornerCutting();
  }

  /** The keep-in area shrunk by the vehicle's radius: where the vehicle's centre may be. */
  static Shape freeArea(Scenario s, Vehicle v) {
    return s.area().shape().inflate(-v.radius());
  }

  private void start() {
    Vehicle v = s.vehicle();
    if (!freeArea(s, v).contains(v.start())) {
      sink.report(Code.START_OUTSIDE_AREA, v.range(), "vehicle `" + v.name() + "` starts outside the keep-in area `"
          + s.area().name() + "`" + (v.radius() > 0 ? " (less its radius " + Format.number(v.radius()) + " m)" : ""),
          related("the keep-in area", s.area().range()));
    }
    for (Zone z : s.zones()) {
      if (z.shape().inflate(v.radius()).containsStrictly(v.start())) {
        sink.report(Code.START_INSIDE_ZONE, v.range(), "vehicle `" + v.name() + "` starts inside zone `" + z.name()
            + "`" + (v.radius() > 0 ? " grown by its radius " + Format.number(v.radius()) + " m" : "")
            + "; move the start or the zone", related("zone `" + z.name() + "`", z.range()));
      }
    }
  }

  private void target() {
    Vehicle v = s.vehicle();
    Target t = s.target();
    Shape free = freeArea(s, v);
    if (!free.bounds().overlapsInterior(t.region().bounds()) && !overlapsTouching(free.bounds(), t.region().bounds())) {
      sink.report(Code.TARGET_OUTSIDE_AREA, t.range(), "target `" + t.name() + "` lies outside the keep-in area `"
          + s.area().name() + "`", related("the keep-in area", s.area().range()));
    }
    for (Zone z : s.zones()) {
      Shape inflated = z.shape().inflate(v.radius());
      if (t.region().corners().stream().allMatch(inflated::contains)) {
        sink.report(Code.TARGET_INSIDE_ZONE, t.range(), "target `" + t.name() + "` lies wholly inside zone `" + z.name()
            + "`" + (v.radius() > 0 ? " grown by the radius " + Format.number(v.radius()) + " m" : ""),
            related("zone `" + z.name() + "`", z.range()));
      }
    }
  }

  private static boolean overlapsTouching(Bounds a, Bounds b) {
    return a.distanceTo(b) == 0;
  }

  private void waypoints() {
    Vehicle v = s.vehicle();
    Bounds free = freeArea(s, v).bounds();
    for (Waypoint w : s.waypoints()) {
      Shape region = new Shape.Box(w.region());
      if (free.distanceTo(w.region()) > 0) {
        sink.report(Code.WAYPOINT_UNREACHABLE, w.range(), "waypoint `" + w.name() + "` lies outside the keep-in area");
        continue;
      }
      for (Zone z : s.zones()) {
        Shape inflated = z.shape().inflate(v.radius());
        if (region.corners().stream().allMatch(inflated::contains)) {
          sink.report(Code.WAYPOINT_UNREACHABLE, w.range(), "waypoint `" + w.name() + "` lies wholly inside zone `"
              + z.name() + "`", related("zone `" + z.name() + "`", z.range()));
        }
      }
    }
  }

  private void zonesOutsideArea() {
    Bounds area = s.area().bounds();
    for (Zone z : s.zones()) {
      if (!area.overlapsInterior(z.shape().bounds())) {
        sink.report(Code.ZONE_OUTSIDE_AREA, z.range(), "zone `" + z.name() + "` lies outside the keep-in area `"
            + s.area().name() + "` and has no effect");
      }
    }
  }

  /**
   * The fewest steps that can reach the target. A lower bound on the continuous-time minimum with
   * the true (circular) limits, which the MILP's inscribed polygons and zero-order hold can only
   * make longer. Rest to rest over distance d with |a| ≤ a and |v| ≤ v: 2·√(d/a) when d ≤ v²/a,
   * else d/v + v/a (bang-bang and bang-off-bang; Kirk, Optimal Control Theory, §5). From a moving
   * start, the distance coverable in time t is at most min(v·t, |v0|·t + a·t²/2).
   */
  public static int minimumSteps(Scenario s) {
    Vehicle v = s.vehicle();
    Target t = s.target();
    double d = t.region().bounds().distanceTo(v.start());
    if (t.region() instanceof Shape.Polygon && t.region().contains(v.start())) {
      d = 0;
    }
    double time = minimumTime(d, v.startVelocity().norm(), v.maxSpeed(), v.maxAccel(), t.atRest());
    return Math.max(1, (int) Math.ceil(time / s.plan().step() - 1e-9));
  }

  static double minimumTime(double d, double v0, double vmax, double amax, boolean atRest) {
    if (d <= 0) {
      return 0;
    }
    if (v0 == 0 && atRest) {
      return d <= vmax * vmax / amax ? 2 * Math.sqrt(d / amax) : d / vmax + vmax / amax;
    }
    if (v0 == 0) {
      return d <= vmax * vmax / (2 * amax) ? Math.sqrt(2 * d / amax) : d / vmax + vmax / (2 * amax);
    }
    double accelerating = (-v0 + Math.sqrt(v0 * v0 + 2 * amax * d)) / amax;
    return Math.max(d / vmax, accelerating);
  }

  private void horizon() {
    PlanOptions plan = s.plan();
    int needed = minimumSteps(s);
    if (plan.horizon() < needed) {
      sink.report(Code.HORIZON_TOO_SHORT, planRanges.getOrDefault("horizon", plan.range()), "the horizon of " + plan.horizon() + " steps ("
          + Format.number(plan.horizon() * plan.step()) + " s) cannot reach target `" + s.target().name()
          + "`: even in open water the vehicle needs at least " + needed + " steps; raise the horizon to " + needed
          + " or more", related("target `" + s.target().name() + "`", s.target().range()));
    }
  }

  private void singleCluster() {
    if (s.plan().clusters() != 1 || s.zones().isEmpty()) {
      return;
    }
    Vehicle v = s.vehicle();
    Bounds all = null;
    for (Zone z : s.zones()) {
      Bounds b = z.shape().bounds().expand(v.radius());
      all = all == null ? b : all.union(b);
    }
    if (all.containsStrictly(v.start())) {
      sink.report(Code.SINGLE_CLUSTER_COVERS, planRanges.getOrDefault("clusters", s.plan().range()), "with one cluster the box around all zones covers the"
          + " start of `" + v.name() + "`, so no plan exists; use 2 or more clusters or none");
    } else if (all.contains(s.target().region().bounds())) {
      sink.report(Code.SINGLE_CLUSTER_COVERS, planRanges.getOrDefault("clusters", s.plan().range()), "with one cluster the box around all zones covers"
          + " target `" + s.target().name() + "`; use 2 or more clusters or none");
    }
  }

  private void narrowGaps() {
    Vehicle v = s.vehicle();
    double diameter = 2 * v.radius();
    if (diameter <= 0) {
      return;
    }
    List<Zone> zones = new ArrayList<>(s.zones());
    zones.sort((a, b) -> Double.compare(a.shape().bounds().xmin(), b.shape().bounds().xmin()));
    int reported = 0;
    for (int i = 0; i < zones.size() && reported < 20; i++) {
      Bounds a = zones.get(i).shape().bounds();
      for (int j = i + 1; j < zones.size(); j++) {
        Bounds b = zones.get(j).shape().bounds();
        if (b.xmin() - a.xmax() >= diameter) {
          break;
        }
        double gap = distance(zones.get(i).shape(), zones.get(j).shape());
        if (gap > 0 && gap < diameter) {
          Zone first = zones.get(i);
          Zone second = zones.get(j);
          Zone later = first.range().start() > second.range().start() ? first : second;
          Zone earlier = later == first ? second : first;
          sink.report(Code.NARROW_GAP, later.range(), "the gap between zones `" + earlier.name() + "` and `" + later.name()
              + "` is " + Format.number(gap) + " m, narrower than the vehicle (diameter " + Format.number(diameter)
              + " m): the plan must go around both", new Diagnostic.Related("zone `" + earlier.name() + "`", earlier.range()));
          reported++;
        }
      }
    }
  }

  /** Distance between two convex shapes (0 when they touch or overlap). */
  static double distance(Shape a, Shape b) {
    if (a instanceof Shape.Box && b instanceof Shape.Box) {
      return a.bounds().distanceTo(b.bounds());
    }
    List<Vec2> ca = a.corners();
    List<Vec2> cb = b.corners();
    if (separatingAxisGap(a, b) <= 0 && separatingAxisGap(b, a) <= 0) {
      return 0;
    }
    double best = Double.POSITIVE_INFINITY;
    for (Vec2 p : ca) {
      best = Math.min(best, pointToPolygon(p, cb));
    }
    for (Vec2 p : cb) {
      best = Math.min(best, pointToPolygon(p, ca));
    }
    return best;
  }

  /** The largest gap along a face normal of {@code a} between a and b; ≤ 0 means no separation by a's faces. */
  private static double separatingAxisGap(Shape a, Shape b) {
    double best = Double.NEGATIVE_INFINITY;
    for (Shape.Face f : a.faces()) {
      double minB = Double.POSITIVE_INFINITY;
      for (Vec2 p : b.corners()) {
        minB = Math.min(minB, f.normal().dot(p));
      }
      best = Math.max(best, minB - f.offset());
    }
    return best;
  }

  private static double pointToPolygon(Vec2 p, List<Vec2> poly) {
    double best = Double.POSITIVE_INFINITY;
    for (int i = 0; i < poly.size(); i++) {
      best = Math.min(best, p.distanceToSegment(poly.get(i), poly.get((i + 1) % poly.size())));
    }
    return best;
  }

  private void cornerCutting() {
    if (s.plan().guard() || s.zones().isEmpty()) {
      return;
    }
    Vehicle v = s.vehicle();
    double stride = v.maxSpeed() * s.plan().step();
    Zone thinnest = null;
    double thinnestWidth = Double.POSITIVE_INFINITY;
    for (Zone z : s.zones()) {
      double w = width(z.shape().inflate(v.radius()));
      if (w < thinnestWidth) {
        thinnestWidth = w;
        thinnest = z;
      }
    }
    if (stride > thinnestWidth) {
      sink.report(Code.CORNER_CUTTING, planRanges.getOrDefault("guard", s.plan().range()), "with the guard off, one step at full speed ("
          + Format.number(stride) + " m) is longer than zone `" + thinnest.name() + "` is thick ("
          + Format.number(thinnestWidth) + " m): the path may cross it between samples; turn `guard on` or shorten"
          + " the step", new Diagnostic.Related("zone `" + thinnest.name() + "`", thinnest.range()));
    }
  }

  /** The smallest width of a convex shape over its face normals. */
  static double width(Shape shape) {
    double best = Double.POSITIVE_INFINITY;
    for (Shape.Face f : shape.faces()) {
      double min = Double.POSITIVE_INFINITY;
      for (Vec2 p : shape.corners()) {
        min = Math.min(min, f.normal().dot(p));
      }
      best = Math.min(best, f.offset() - min);
    }
    return best;
  }

  private static Diagnostic.Related related(String message, SourceRange range) {
    return new Diagnostic.Related(message, range);
  }
}
