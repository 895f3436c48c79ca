package dev.skerry.compiler.check;

import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
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

  /** The altitudes a zone blocks for a vehicle of radius r (every altitude in 2-D or without a range). */
  static Span blocked(Scenario s, Zone z, double r) {
    return !s.threeD() || z.altitude() == null ? Span.ALL : z.altitude().expand(r);
  }

  /** The altitudes the keep-in volume leaves a vehicle of radius r (every altitude in 2-D). */
  static Span freeAltitudes(Scenario s, double r) {
    return !s.threeD() || s.area().altitude() == null ? Span.ALL : s.area().altitude().expand(-r);
  }

  /** True when the closed span {@code inner} lies inside {@code outer}. */
  private static boolean within(Span inner, Span outer) {
    return inner.lo() >= outer.lo() && inner.hi() <= outer.hi();
  }

  /** The vehicles that may end at target t. */
  private List<Vehicle> vehiclesFor(Target t) {
    List<Vehicle> out = new ArrayList<>();
    for (Vehicle v : s.vehicles()) {
      if (s.candidateTargets(v).contains(t)) {
        out.add(v);
      }
    }
    return out;
  }

  private static double smallestRadius(List<Vehicle> vehicles) {
    double r = Double.POSITIVE_INFINITY;
    for (Vehicle v : vehicles) {
      r = Math.min(r, v.radius());
    }
    return r;
  }

  private void start() {
    for (Vehicle v : s.vehicles()) {
      start(v);
    }
  }

  private void start(Vehicle v) {
    if (!freeArea(s, v).contains(v.start())) {
      sink.report(Code.START_OUTSIDE_AREA, v.range(), "vehicle `" + v.name() + "` starts outside the keep-in area `"
          + s.area().name() + "`" + (v.radius() > 0 ? " (less its radius " + Format.number(v.radius()) + " m)" : ""),
          related("the keep-in area", s.area().range()));
    }
    double z = v.vertical() == null ? 0 : v.vertical().start();
    if (s.threeD() && v.vertical() != null) {
      Span free = freeAltitudes(s, v.radius());
      if (!free.contains(z)) {
        sink.report(Code.START_OUTSIDE_AREA, v.range(), "vehicle `" + v.name() + "` starts at altitude "
            + Format.number(z) + " m, outside the keep-in volume `" + s.area().name() + "` (" + Format.number(free.lo())
            + " to " + Format.number(free.hi()) + " m" + (v.radius() > 0 ? " less its radius" : "") + ")",
            related("the keep-in area", s.area().range()));
      }
      Span limits = v.vertical().limits();
      if (limits != null && !limits.contains(z)) {
        sink.report(Code.START_OUTSIDE_AREA, v.range(), "vehicle `" + v.name() + "` starts at altitude "
            + Format.number(z) + " m, outside its own altitude limits (" + Format.number(limits.lo()) + " to "
            + Format.number(limits.hi()) + " m)");
      }
    }
    for (Zone zone : s.zones()) {
      Span span = blocked(s, zone, v.radius());
      if (zone.shape().inflate(v.radius()).containsStrictly(v.start()) && z > span.lo() && z < span.hi()) {
        sink.report(Code.START_INSIDE_ZONE, v.range(), "vehicle `" + v.name() + "` starts inside zone `" + zone.name()
            + "`" + (v.radius() > 0 ? " grown by its radius " + Format.number(v.radius()) + " m" : "")
            + "; move the start or the zone", related("zone `" + zone.name() + "`", zone.range()));
      }
    }
  }

  private void target() {
    for (Target t : s.targets()) {
      List<Vehicle> reaching = vehiclesFor(t);
      if (!reaching.isEmpty()) {
        target(t, reaching.size() == 1 ? reaching.get(0) : null, smallestRadius(reaching));
      }
    }
  }

  /** Target checks for the vehicles that may end there: {@code only} when one may, {@code r} their smallest radius. */
  private void target(Target t, Vehicle only, double r) {
    Shape free = s.area().shape().inflate(-r);
    Span altitudes = Span.orAll(t.altitude()).intersect(freeAltitudes(s, r));
    if (!free.bounds().overlapsInterior(t.region().bounds()) && !overlapsTouching(free.bounds(), t.region().bounds())) {
      sink.report(Code.TARGET_OUTSIDE_AREA, t.range(), "target `" + t.name() + "` lies outside the keep-in area `"
          + s.area().name() + "`", related("the keep-in area", s.area().range()));
    } else if (altitudes.lo() > altitudes.hi()) {
      sink.report(Code.TARGET_OUTSIDE_AREA, t.range(), "target `" + t.name() + "` lies above or below the keep-in"
          + " volume `" + s.area().name() + "`", related("the keep-in area", s.area().range()));
      return;
    }
    for (Zone z : s.zones()) {
      Shape inflated = z.shape().inflate(r);
      if (t.region().corners().stream().allMatch(inflated::contains) && within(altitudes, blocked(s, z, r))) {
        sink.report(Code.TARGET_INSIDE_ZONE, t.range(), "target `" + t.name() + "` lies wholly inside zone `" + z.name()
            + "`" + (r > 0 ? " grown by the radius " + Format.number(r) + " m" : ""),
            related("zone `" + z.name() + "`", z.range()));
      }
    }
  }

  private static boolean overlapsTouching(Bounds a, Bounds b) {
    return a.distanceTo(b) == 0;
  }

  /** A waypoint may be passed by any vehicle, so it is unreachable only for the smallest one. */
  private void waypoints() {
    double r = smallestRadius(s.vehicles());
    Bounds free = s.area().shape().inflate(-r).bounds();
    for (Waypoint w : s.waypoints()) {
      Shape region = new Shape.Box(w.region());
      Span altitudes = Span.orAll(w.altitude()).intersect(freeAltitudes(s, r));
      if (free.distanceTo(w.region()) > 0 || altitudes.lo() > altitudes.hi()) {
        sink.report(Code.WAYPOINT_UNREACHABLE, w.range(), "waypoint `" + w.name() + "` lies outside the keep-in "
            + (free.distanceTo(w.region()) > 0 ? "area" : "volume"));
        continue;
      }
      for (Zone z : s.zones()) {
        Shape inflated = z.shape().inflate(r);
        if (region.corners().stream().allMatch(inflated::contains) && within(altitudes, blocked(s, z, r))) {
          sink.report(Code.WAYPOINT_UNREACHABLE, w.range(), "waypoint `" + w.name() + "` lies wholly inside zone `"
              + z.name() + "`", related("zone `" + z.name() + "`", z.range()));
        }
      }
    }
  }

  private void zonesOutsideArea() {
    Bounds area = s.area().bounds();
    Span volume = freeAltitudes(s, 0);
    for (Zone z : s.zones()) {
      if (!area.overlapsInterior(z.shape().bounds()) || !volume.overlapsInterior(blocked(s, z, 0))) {
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
    int worst = 1;
    for (Vehicle v : s.vehicles()) {
      int best = Integer.MAX_VALUE;
      for (Target t : s.candidateTargets(v)) {
        best = Math.min(best, minimumSteps(s, v, t));
      }
      worst = Math.max(worst, best == Integer.MAX_VALUE ? 1 : best);
    }
    return worst;
  }

  /** The fewest steps vehicle v needs to reach target t; in 3-D the climb is bounded the same way. */
  public static int minimumSteps(Scenario s, Vehicle v, Target t) {
    double d = t.region().bounds().distanceTo(v.start());
    if (t.region() instanceof Shape.Polygon && t.region().contains(v.start())) {
      d = 0;
    }
    double time = minimumTime(d, v.startVelocity().norm(), v.maxSpeed(), v.maxAccel(), t.atRest());
    Vehicle.Vertical vert = v.vertical();
    if (s.threeD() && vert != null && t.altitude() != null) {
      Span band = t.altitude();
      double dz = Math.max(0, Math.max(band.lo() - vert.start(), vert.start() - band.hi()));
      double toward = dz == 0 ? Math.abs(vert.startRate())
          : Math.max(0, Math.signum(band.lo() - vert.start()) * vert.startRate());
      time = Math.max(time, minimumTime(dz, toward, vert.maxClimb(), vert.maxClimbAccel(), t.atRest()));
    }
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
    Vehicle slowest = null;
    Target nearest = null;
    int needed = 0;
    for (Vehicle v : s.vehicles()) {
      Target best = null;
      int steps = Integer.MAX_VALUE;
      for (Target t : s.candidateTargets(v)) {
        int n = minimumSteps(s, v, t);
        if (n < steps) {
          steps = n;
          best = t;
        }
      }
      if (best != null && steps > needed) {
        needed = steps;
        slowest = v;
        nearest = best;
      }
    }
    if (nearest != null && plan.horizon() < needed) {
      String who = s.fleet() ? "vehicle `" + slowest.name() + "`" : "the vehicle";
      sink.report(Code.HORIZON_TOO_SHORT, planRanges.getOrDefault("horizon", plan.range()), "the horizon of " + plan.horizon() + " steps ("
          + Format.number(plan.horizon() * plan.step()) + " s) cannot reach target `" + nearest.name()
          + "`: even in open water " + who + " needs at least " + needed + " steps; raise the horizon to " + needed
          + " or more", related("target `" + nearest.name() + "`", nearest.range()));
    }
  }

  private void singleCluster() {
    if (s.plan().clusters() != 1 || s.zones().isEmpty()) {
      return;
    }
    for (Vehicle v : s.vehicles()) {
      Bounds all = null;
      for (Zone z : s.zones()) {
        Bounds b = z.shape().bounds().expand(v.radius());
        all = all == null ? b : all.union(b);
      }
      if (all.containsStrictly(v.start())) {
        sink.report(Code.SINGLE_CLUSTER_COVERS, planRanges.getOrDefault("clusters", s.plan().range()), "with one cluster the box around all zones covers the"
            + " start of `" + v.name() + "`, so no plan exists; use 2 or more clusters or none");
        return;
      }
      for (Target t : s.candidateTargets(v)) {
        if (all.contains(t.region().bounds())) {
          sink.report(Code.SINGLE_CLUSTER_COVERS, planRanges.getOrDefault("clusters", s.plan().range()), "with one cluster the box around all zones covers"
              + " target `" + t.name() + "`; use 2 or more clusters or none");
          return;
        }
      }
    }
  }

  private void narrowGaps() {
    Vehicle v = s.vehicle();
    for (Vehicle o : s.vehicles()) {
      v = o.radius() > v.radius() ? o : v;
    }
    double diameter = 2 * v.radius();
    if (diameter <= 0) {
      return;
    }
    String vehicle = s.fleet() ? "vehicle `" + v.name() + "`" : "the vehicle";
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
        if (gap > 0 && gap < diameter && blocked(s, zones.get(i), 0).overlapsInterior(blocked(s, zones.get(j), 0))) {
          Zone first = zones.get(i);
          Zone second = zones.get(j);
          Zone later = first.range().start() > second.range().start() ? first : second;
          Zone earlier = later == first ? second : first;
          sink.report(Code.NARROW_GAP, later.range(), "the gap between zones `" + earlier.name() + "` and `" + later.name()
              + "` is " + Format.number(gap) + " m, narrower than " + vehicle + " (diameter " + Format.number(diameter)
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
    double stride = 0;
    Zone thinnest = null;
    double thinnestWidth = Double.POSITIVE_INFINITY;
    for (Vehicle v : s.vehicles()) {
      double vStride = v.maxSpeed() * s.plan().step();
      for (Zone z : s.zones()) {
        double w = width(z.shape().inflate(v.radius()));
        if (vStride - w > stride - thinnestWidth) {
          thinnestWidth = w;
          thinnest = z;
          stride = vStride;
        }
      }
    }
    if (thinnest != null && stride > thinnestWidth) {
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
