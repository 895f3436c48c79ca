package dev.skerry.compiler.plan;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A guide for the arrival scan of a plan-view vehicle: the shortest path from its start through its
 * waypoints to its target round the zones grown by its radius, found on the visibility graph of
 * their corners (common practice in robot path planning: the shortest path among polygonal
 * obstacles bends only at their corners), then timed by the fastest speed profile the vehicle's
 * limits allow along it (accelerate, cruise, brake).
 *
 * <p>Why: the scan's own first guess is the zone-free LP's path, which runs straight through the
 * zones; the side of a zone that path lies on is often the wrong one to go round by (on the
 * warehouse floor it crosses two shelf rows whose ends the plan must round, and ojAlgo needed more
 * than 11 s per small solve to find a way round from there). The guide already goes round: sampled
 * at an arrival step it gives, for every slot of every zone, the face to keep, and with those and
 * the arrival fixed what is left is a plain LP.
 *
 * <p>The guide ignores the turns' cost and the speed polygon, so it is a start, not a bound: the
 * scan still tries steps below the one it suggests.
 */
final class GuidePath {
  /** Corners are pushed this far out of their zone, so that a path round them does not touch it. */
  static final double CLEARANCE = 1e-3;

  /**
   * No guide past this many corners: the visibility graph tests every pair of corners against every
   * zone, so its cost grows with the cube of the zone count (600 corners, 150 boxes: about 27
   * million segment tests; the rock field's 40 rocks have 160).
   */
  static final int MAX_CORNERS = 600;

  /** Waypoint orders tried in full up to this many waypoints; above, nearest first. */
  static final int ALL_ORDERS_UP_TO = 6;

  private final Milp model;
  private final String owner;
  private final List<Vec2> points;
  private final double[] arc;
  private final double[] waypointArc;
  private final List<String> waypointNames;
  private final double step;
  private final Profile profile;

  private GuidePath(Milp model, String owner, List<Vec2> points, double[] waypointArc, List<String> waypointNames,
      double step, Profile profile) {
    this.model = model;
    this.owner = owner;
    this.points = points;
    this.arc = new double[points.size()];
    for (int i = 1; i < points.size(); i++) {
      arc[i] = arc[i - 1] + points.get(i).distanceTo(points.get(i - 1));
    }
    this.waypointArc = waypointArc;
    this.waypointNames = waypointNames;
    this.step = step;
    this.profile = profile;
  }

  /**
   * The guide for the vehicle of a plan-view scenario whose arrival binaries are the model's one
   * free set; empty for a 3-D scenario, or when no path round the zones exists.
   */
  static Optional<GuidePath> of(Scenario s, Milp model) {
    return of(s, model, null);
  }

  /**
   * As {@link #of(Scenario, Milp)}, round {@code obstacles} (already grown, in the space of the
   * vehicle's centre) instead of the scenario's zones grown by the radius; null: the zones.
   */
  static Optional<GuidePath> of(Scenario s, Milp model, List<Shape> obstacles) {
    // in a fleet, the vehicle whose arrival binaries are free (FleetStarts fixes the others')
    List<Variable> arrivals = ArrivalScan.arrivalColumns(model);
    if (s.threeD() || arrivals.isEmpty()) {
      return Optional.empty();
    }
    String owner = arrivals.get(0).origin().owner();
    // a lone vehicle's columns carry no name: the scenario must then be the one it was lowered from
    Vehicle v = owner.isEmpty() ? (s.fleet() ? null : s.vehicles().get(0))
        : s.vehicles().stream().filter(c -> c.name().equals(owner)).findFirst().orElse(null);
    if (v == null) {
      return Optional.empty();
    }
    Target target = s.targets().stream().filter(t -> t.name().equals(arrivals.get(0).origin().entity()))
        .findFirst().orElse(null);
    if (target == null || v.maxSpeed() <= 0 || v.maxAccel() <= 0) {
      return Optional.empty();
    }
    List<Shape> grown = new ArrayList<>();
    if (obstacles != null) {
      grown.addAll(obstacles);
    } else {
      for (Zone z : s.zones()) {
        grown.add(z.shape().inflate(v.radius()));
      }
    }
    int corners = grown.stream().mapToInt(z -> z.corners().size()).sum();
    if (corners > MAX_CORNERS) {
      return Optional.empty();
    }
    Graph g = new Graph(s, v, grown);
    // in a fleet any vehicle may pass a waypoint: the guide takes only those left to this vehicle
    List<Waypoint> wps = new ArrayList<>();
    for (Waypoint w : s.waypoints()) {
      if (leftTo(model, owner, w.name())) {
        wps.add(w);
      }
    }
    List<Vec2> route = null;
    List<Integer> order = null;
    double[] wpArc = new double[wps.size()];
    double shortest = Double.POSITIVE_INFINITY;
    for (List<Integer> o : orders(v.start(), wps)) {
      List<List<Vec2>> stops = new ArrayList<>();
      stops.add(List.of(v.start()));
      o.forEach(i -> stops.add(candidates(wps.get(i).region().center(), corners(wps.get(i).region()))));
      stops.add(candidates(target.region().bounds().center(), target.region().corners()));
      Route r = g.through(stops);
      if (r != null && r.length() < shortest) {
        shortest = r.length();
        route = r.points();
        order = o;
        wpArc = r.stopArcs();
      }
    }
    if (route == null) {
      return Optional.empty();
    }
    List<String> names = new ArrayList<>();
    order.forEach(i -> names.add(wps.get(i).name()));
    double v0 = v.startVelocity() == null ? 0 : Math.min(v.startVelocity().norm(), v.maxSpeed());
    Profile p = Profile.fastest(shortest, v0, target.atRest() ? 0 : v.maxSpeed(), v.maxSpeed(), v.maxAccel());
    return Optional.of(new GuidePath(model, owner, route, wpArc, names,
        s.plan().step(), p));
  }

  /**
   * Whether vehicle {@code owner} must pass waypoint {@code name} in {@code model}: it may (a free
   * visit binary) and no other vehicle does or may (another's visit binaries all fixed at 0). A
   * fleet's first round, or a later one whose earlier vehicles passed elsewhere, leaves a waypoint
   * to the vehicle planned; where another vehicle may pass it the MILP decides.
   */
  private static boolean leftTo(Milp model, String owner, String name) {
    boolean mine = false;
    for (Variable v : model.variables()) {
      if (!v.origin().role().equals("visit") || !v.origin().entity().equals(name)) {
        continue;
      }
      if (!v.origin().owner().equals(owner)) {
        if (v.upper() > 0.5) {
          return false;
        }
      } else {
        mine |= v.lower() < v.upper();
      }
    }
    return mine;
  }

  /** The first arrival step at which the guide's profile has reached the target. */
  int fastestStep() {
    return (int) Math.ceil(profile.duration() / step - 1e-9);
  }

  /**
   * A point of the model's columns for arrival at step {@code k}: the positions along the guide,
   * slowed evenly to arrive at k (the target's position after k), the arrival binary at k and each
   * waypoint's visit binary at the step nearest its passing; fixed columns at their value, others 0:
   * the point is for choosing faces and visits, not a solution.
   */
  double[] at(int k) {
    double[] x = new double[model.columnCount()];
    double total = k * step;
    double scale = total <= 0 ? 1 : profile.duration() / total;
    for (Variable c : model.variables()) {
      if (c.lower() == c.upper()) {
        x[c.index()] = c.lower(); // in a fleet, the other vehicles' paths where they are fixed
      }
      if (!c.origin().owner().equals(owner)) {
        continue;
      }
      String role = c.origin().role();
      int t = c.origin().step();
      if (role.equals("px") || role.equals("py")) {
        Vec2 p = position(t >= k ? arc[arc.length - 1] : profile.distance(t * step * scale));
        x[c.index()] = role.equals("px") ? p.x() : p.y();
      } else if (role.equals("arrive")) {
        x[c.index()] = t == k ? 1 : 0;
      } else if (role.equals("visit")) {
        int w = waypointNames.indexOf(c.origin().entity());
        x[c.index()] = w >= 0 && t == visitStep(w, k, scale) ? 1 : 0;
      }
    }
    return x;
  }

  private int visitStep(int w, int k, double scale) {
    double t = profile.timeAt(waypointArc[w]) / scale;
    return (int) Math.min(k, Math.max(1, Math.round(t / step)));
  }

  /** The point at arc length {@code s} along the guide. */
  Vec2 position(double s) {
    if (s <= 0) {
      return points.get(0);
    }
    for (int i = 1; i < points.size(); i++) {
      if (s <= arc[i] || i == points.size() - 1) {
        double span = arc[i] - arc[i - 1];
        double f = span <= 0 ? 1 : Math.min(1, (s - arc[i - 1]) / span);
        return points.get(i - 1).plus(points.get(i).minus(points.get(i - 1)).times(f));
      }
    }
    return points.get(points.size() - 1);
  }

  /** Whether the guide passes the waypoint {@code name} (and so fixes its visit). */
  boolean passes(String name) {
    return waypointNames.contains(name);
  }

  /** The vehicle the guide is for, as the model's columns name it (empty for a lone vehicle). */
  String owner() {
    return owner;
  }

  List<Vec2> points() {
    return points;
  }

  /** A path through the stops, its length and the arc length at which it passes each waypoint. */
  record Route(List<Vec2> points, double length, double[] stopArcs) {}

  /** Where a path may pass a stop's region: its centre and its corners drawn a tenth of the way in. */
  private static List<Vec2> candidates(Vec2 centre, List<Vec2> corners) {
    List<Vec2> out = new ArrayList<>();
    out.add(centre);
    for (Vec2 c : corners) {
      out.add(c.plus(centre.minus(c).times(0.1)));
    }
    return out;
  }

  private static List<Vec2> corners(Bounds b) {
    return new Shape.Box(b).corners();
  }

  /** The length of a polyline; infinite for an empty one (no path). */
  private static double length(List<Vec2> path) {
    if (path.isEmpty()) {
      return Double.POSITIVE_INFINITY;
    }
    double sum = 0;
    for (int i = 1; i < path.size(); i++) {
      sum += path.get(i).distanceTo(path.get(i - 1));
    }
    return sum;
  }

  /** Waypoint orders to try: every one for a few waypoints, else the nearest next each time. */
  private static List<List<Integer>> orders(Vec2 start, List<Waypoint> wps) {
    List<List<Integer>> out = new ArrayList<>();
    if (wps.size() <= ALL_ORDERS_UP_TO) {
      permute(new ArrayList<>(), new boolean[wps.size()], out);
      return out;
    }
    List<Integer> greedy = new ArrayList<>();
    boolean[] used = new boolean[wps.size()];
    Vec2 here = start;
    for (int n = 0; n < wps.size(); n++) {
      int best = -1;
      for (int i = 0; i < wps.size(); i++) {
        if (!used[i] && (best < 0 || here.distanceTo(wps.get(i).point()) < here.distanceTo(wps.get(best).point()))) {
          best = i;
        }
      }
      used[best] = true;
      greedy.add(best);
      here = wps.get(best).point();
    }
    out.add(greedy);
    return out;
  }

  private static void permute(List<Integer> prefix, boolean[] used, List<List<Integer>> out) {
    if (prefix.size() == used.length) {
      out.add(List.copyOf(prefix));
      return;
    }
    for (int i = 0; i < used.length; i++) {
      if (!used[i]) {
        used[i] = true;
        prefix.add(i);
        permute(prefix, used, out);
        prefix.remove(prefix.size() - 1);
        used[i] = false;
      }
    }
  }

  /** The visibility graph: the grown zones' corners, pushed out a little, that lie in the keep-in area. */
  private static final class Graph {
    private final Scenario scenario;
    private final Vehicle vehicle;
    private final List<Shape> zones;
    private final List<Bounds> boxes = new ArrayList<>();
    private final List<List<Shape.Face>> faces = new ArrayList<>();
    private final List<Vec2> corners = new ArrayList<>();
    private final double[][] between;

    Graph(Scenario s, Vehicle v, List<Shape> zones) {
      this.scenario = s;
      this.vehicle = v;
      this.zones = zones;
      for (Shape z : zones) {
        boxes.add(z.bounds());
        faces.add(z.faces());
      }
      for (Shape z : zones) {
        List<Vec2> cs = z.corners();
        Vec2 centre = z.bounds().center();
        for (Vec2 c : cs) {
          Vec2 out = c.minus(centre);
          double n = out.norm();
          Vec2 pushed = n == 0 ? c : c.plus(out.times(CLEARANCE / n));
          if (inArea(pushed) && zones.stream().noneMatch(o -> o.containsStrictly(pushed))) {
            corners.add(pushed);
          }
        }
      }
      int n = corners.size();
      between = new double[n][n];
      for (int i = 0; i < n; i++) {
        for (int j = i + 1; j < n; j++) {
          double d = clear(corners.get(i), corners.get(j)) ? corners.get(i).distanceTo(corners.get(j))
              : Double.POSITIVE_INFINITY;
          between[i][j] = d;
          between[j][i] = d;
        }
      }
    }

    private final Map<List<Vec2>, List<Vec2>> legs = new HashMap<>();

    /**
     * The shortest path through one point of each stop in order (a layered shortest path over the
     * stops' candidate points), or null if there is none.
     */
    Route through(List<List<Vec2>> stops) {
      List<double[]> cost = new ArrayList<>();
      List<int[]> from = new ArrayList<>();
      cost.add(new double[] {0});
      from.add(new int[] {-1});
      for (int i = 1; i < stops.size(); i++) {
        List<Vec2> here = stops.get(i);
        List<Vec2> there = stops.get(i - 1);
        double[] c = new double[here.size()];
        int[] f = new int[here.size()];
        Arrays.fill(c, Double.POSITIVE_INFINITY);
        for (int h = 0; h < here.size(); h++) {
          for (int t = 0; t < there.size(); t++) {
            double d = cost.get(i - 1)[t] + length(leg(there.get(t), here.get(h)));
            if (d < c[h]) {
              c[h] = d;
              f[h] = t;
            }
          }
        }
        cost.add(c);
        from.add(f);
      }
      int last = stops.size() - 1;
      int pick = 0;
      for (int h = 0; h < stops.get(last).size(); h++) {
        pick = cost.get(last)[h] < cost.get(last)[pick] ? h : pick;
      }
      if (cost.get(last)[pick] == Double.POSITIVE_INFINITY) {
        return null;
      }
      int[] chosen = new int[stops.size()];
      for (int i = last; i >= 0; i--) {
        chosen[i] = pick;
        pick = from.get(i)[pick];
      }
      List<Vec2> out = new ArrayList<>();
      out.add(stops.get(0).get(0));
      double[] arcs = new double[stops.size() - 2];
      double run = 0;
      for (int i = 1; i < stops.size(); i++) {
        List<Vec2> leg = leg(stops.get(i - 1).get(chosen[i - 1]), stops.get(i).get(chosen[i]));
        run += length(leg);
        out.addAll(leg.subList(1, leg.size()));
        if (i < stops.size() - 1) {
          arcs[i - 1] = run;
        }
      }
      return new Route(out, run, arcs);
    }

    private List<Vec2> leg(Vec2 a, Vec2 b) {
      return legs.computeIfAbsent(List.of(a, b), k -> {
        List<Vec2> p = shortest(a, b);
        return p == null ? List.of() : p;
      });
    }

    /** Shortest distances from a point over the corners, and each corner's predecessor (-1: the point). */
    private record Tree(double[] dist, int[] prev) {}

    private final Map<Vec2, double[]> sight = new HashMap<>();
    private final Map<Vec2, Tree> trees = new HashMap<>();

    /** The distance from {@code p} to each corner it sees, infinite to the others (kept per point). */
    private double[] sight(Vec2 p) {
      return sight.computeIfAbsent(p, q -> {
        double[] d = new double[corners.size()];
        for (int i = 0; i < d.length; i++) {
          d[i] = clear(q, corners.get(i)) ? q.distanceTo(corners.get(i)) : Double.POSITIVE_INFINITY;
        }
        return d;
      });
    }

    /** Dijkstra from {@code a} over the corners (a dense graph of at most {@link #MAX_CORNERS} nodes). */
    private Tree tree(Vec2 a) {
      return trees.computeIfAbsent(a, q -> {
        int n = corners.size();
        double[] dist = sight(q).clone();
        int[] prev = new int[n];
        boolean[] done = new boolean[n];
        Arrays.fill(prev, -1);
        while (true) {
          int u = -1;
          for (int i = 0; i < n; i++) {
            if (!done[i] && dist[i] < Double.POSITIVE_INFINITY && (u < 0 || dist[i] < dist[u])) {
              u = i;
            }
          }
          if (u < 0) {
            return new Tree(dist, prev);
          }
          done[u] = true;
          for (int w = 0; w < n; w++) {
            if (!done[w] && dist[u] + between[u][w] < dist[w]) {
              dist[w] = dist[u] + between[u][w];
              prev[w] = u;
            }
          }
        }
      });
    }

    /** The shortest path from a to b round the zones, or null if there is none. */
    private List<Vec2> shortest(Vec2 a, Vec2 b) {
      if (clear(a, b)) {
        return List.of(a, b);
      }
      Tree t = tree(a);
      double[] toB = sight(b);
      int last = -1;
      for (int u = 0; u < toB.length; u++) {
        if (t.dist()[u] + toB[u] < Double.POSITIVE_INFINITY
            && (last < 0 || t.dist()[u] + toB[u] < t.dist()[last] + toB[last])) {
          last = u;
        }
      }
      if (last < 0) {
        return null;
      }
      List<Vec2> path = new ArrayList<>();
      path.add(b);
      for (int u = last; u >= 0; u = t.prev()[u]) {
        path.add(corners.get(u));
      }
      path.add(a);
      Collections.reverse(path);
      return path;
    }

    /**
     * Whether the segment a→b stays out of every grown zone's open interior (zones whose box the
     * segment's box misses are skipped; each zone's faces are read once).
     */
    private boolean clear(Vec2 a, Vec2 b) {
      double xlo = Math.min(a.x(), b.x());
      double xhi = Math.max(a.x(), b.x());
      double ylo = Math.min(a.y(), b.y());
      double yhi = Math.max(a.y(), b.y());
      for (int i = 0; i < zones.size(); i++) {
        Bounds z = boxes.get(i);
        if (xhi <= z.xmin() || xlo >= z.xmax() || yhi <= z.ymin() || ylo >= z.ymax()) {
          continue;
        }
        if (crossesInterior(a, b, faces.get(i))) {
          return false;
        }
      }
      return true;
    }

    /** Inside the keep-in area shrunk by the vehicle's radius (convex, so segments between such points are too). */
    private boolean inArea(Vec2 p) {
      for (Shape.Face f : scenario.area().shape().faces()) {
        if (f.normal().dot(p) > f.offset() - vehicle.radius()) {
          return false;
        }
      }
      return true;
    }
  }

  /**
   * Whether the segment a→b passes through the open interior of the convex shape: the part of the
   * segment on the inner side of every face (Cyrus–Beck clipping) is longer than a point, by a
   * margin far below the clearance so that a segment along a face or through a corner is clear.
   */
  static boolean crossesInterior(Vec2 a, Vec2 b, Shape shape) {
    return crossesInterior(a, b, shape.faces());
  }

  private static boolean crossesInterior(Vec2 a, Vec2 b, List<Shape.Face> faces) {
    double enter = 0;
    double leave = 1;
    Vec2 d = b.minus(a);
    double tol = CLEARANCE * 1e-3;
    for (Shape.Face f : faces) {
      double slack = f.offset() - tol - f.normal().dot(a);
      double rate = f.normal().dot(d);
      if (Math.abs(rate) < 1e-15) {
        if (slack <= 0) {
          return false;
        }
        continue;
      }
      double t = slack / rate;
      if (rate > 0) {
        leave = Math.min(leave, t);
      } else {
        enter = Math.max(enter, t);
      }
      if (enter >= leave) {
        return false;
      }
    }
    return true;
  }

  /**
   * The fastest way along a length L from speed v0 to speed v1 with speed at most vmax and
   * acceleration at most amax: accelerate, cruise, brake (a triangle when L is too short to cruise).
   */
  record Profile(double length, double v0, double peak, double v1, double accel, double tAccel, double tCruise,
      double tBrake) {
    static Profile fastest(double length, double v0, double v1, double vmax, double amax) {
      double dAccel = (vmax * vmax - v0 * v0) / (2 * amax);
      double dBrake = (vmax * vmax - v1 * v1) / (2 * amax);
      double peak = vmax;
      if (dAccel + dBrake > length) {
        peak = Math.sqrt(Math.max(0, (2 * amax * length + v0 * v0 + v1 * v1) / 2));
        peak = Math.max(peak, Math.max(v0, v1));
        dAccel = Math.max(0, (peak * peak - v0 * v0) / (2 * amax));
        dBrake = Math.max(0, (peak * peak - v1 * v1) / (2 * amax));
      }
      double cruise = Math.max(0, length - dAccel - dBrake);
      return new Profile(length, v0, peak, v1, amax, Math.max(0, (peak - v0) / amax), peak > 0 ? cruise / peak : 0,
          Math.max(0, (peak - v1) / amax));
    }

    double duration() {
      return tAccel + tCruise + tBrake;
    }

    /** Distance covered after time t (the whole length once the profile ends). */
    double distance(double t) {
      if (t <= 0) {
        return 0;
      }
      if (t < tAccel) {
        return v0 * t + accel * t * t / 2;
      }
      double s = v0 * tAccel + accel * tAccel * tAccel / 2;
      if (t < tAccel + tCruise) {
        return s + peak * (t - tAccel);
      }
      s += peak * tCruise;
      double u = Math.min(t - tAccel - tCruise, tBrake);
      return Math.min(length, s + peak * u - accel * u * u / 2);
    }

    /** The first time the distance reaches s (by bisection: distance is non-decreasing). */
    double timeAt(double s) {
      double lo = 0;
      double hi = duration();
      for (int i = 0; i < 60; i++) {
        double mid = (lo + hi) / 2;
        if (distance(mid) < s) {
          lo = mid;
        } else {
          hi = mid;
        }
      }
      return hi;
    }
  }
}
