package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.List;

/**
 * The one place that decides what a scenario's MILP contains: every column, every row, every
 * binary and every big-M. Lowering walks this layout to build rows; {@link #sizes()} counts the
 * same layout; so the predicted and the lowered sizes cannot drift apart.
 *
 * <p>Domain boxes: with pruning, the reach box of step k ({@link Reachability}); without, the
 * keep-in box (deflated by the radius) for k ≥ 1 and the start point for k = 0. Every big-M is the
 * padded ({@link BigM}) worst case of its row over the domain box of its step.
 */
public record FormulationLayout(
    Scenario scenario,
    boolean pruning,
    boolean guard,
    Reachability reach,
    MotionLayout motion,
    ArrivalLayout arrival,
    AvoidanceLayout avoidance,
    ClusterLayout clusters,
    List<WaypointLayout> waypoints,
    List<Fact> facts) {

  public FormulationLayout {
    waypoints = List.copyOf(waypoints);
    facts = List.copyOf(facts);
  }

  /** The boxes that bound the state at each step, as the big-M and pruning see them. */
  record Domains(Reachability reach, boolean pruning, boolean guard, int horizon) {
    Bounds position(int k) {
      if (pruning || k == 0) {
        return reach.position(k);
      }
      return reach.keepIn();
    }

    Bounds velocity(int k) {
      return reach.velocity(k);
    }
  }

  public static FormulationLayout of(Scenario s) {
    if (s.vehicles().isEmpty() || s.targets().isEmpty()) {
      throw new IllegalArgumentException("scenario " + s.name() + " needs a vehicle and a target to be lowered");
    }
    if (s.plan().horizon() < 1 || !(s.plan().step() > 0)) {
      throw new IllegalArgumentException("scenario " + s.name() + " needs a horizon ≥ 1 and a positive step");
    }
    boolean pruning = s.plan().pruning();
    boolean guard = s.plan().guard();
    Names names = new Names();
    Reachability reach = pruning ? Reachability.of(s) : unprunedReach(s);
    List<Fact> facts = new ArrayList<>(reach.facts());
    Domains d = new Domains(reach, pruning, guard, s.plan().horizon());
    MotionLayout motion = MotionLayout.of(s, names, reach, pruning);
    ArrivalLayout arrival = ArrivalLayout.of(s.target(), names.tag("target", s.target().name()), d, facts);
    double radius = margin(s);
    List<AvoidanceLayout.Obstacle> obstacles = new ArrayList<>();
    long[] tally = new long[3];
    ClusterLayout clusters = null;
    if (s.plan().clustered()) {
      Bounds world = reach.keepIn().union(Reachability.point(s.vehicle().start()));
      List<Bounds> boxes = new ArrayList<>();
      List<String> tags = new ArrayList<>();
      List<String> zoneNames = new ArrayList<>();
      for (Zone z : s.zones()) {
        Bounds b = z.shape().inflate(radius).bounds();
        boxes.add(b);
        world = world.union(b);
        tags.add(names.tag("zone", z.name()));
        zoneNames.add(z.name());
      }
      clusters = ClusterLayout.of(s.plan().clusters(), s.plan().symmetry(), world, boxes, tags, zoneNames);
      for (int l = 0; l < s.plan().clusters(); l++) {
        obstacles.add(AvoidanceLayout.cluster(l, "c" + l, clusters.sides(), d, arrival));
      }
    } else {
      for (Zone z : s.zones()) {
        obstacles.add(AvoidanceLayout.zone(z, names.tag("zone", z.name()), radius, d, arrival, facts, tally));
      }
    }
    List<WaypointLayout> waypoints = new ArrayList<>();
    for (Waypoint w : s.waypoints()) {
      waypoints.add(WaypointLayout.of(w, names.tag("waypoint", w.name()), d, arrival, facts));
    }
    AvoidanceLayout avoidance = new AvoidanceLayout(obstacles, tally[0], tally[1], tally[2]);
    return new FormulationLayout(s, pruning, guard, reach, motion, arrival, avoidance, clusters, waypoints, facts);
  }

  /**
   * How far zones are grown for avoidance: the vehicle's radius, plus, with the guard on, the
   * largest bulge of the true zero-order-hold arc from its chord, |u|·Δt²/8 ≤ a_max·Δt²/8 (the arc
   * p_k + v_k·τ + ½·u_k·τ² departs from the straight segment by ½·|u|·τ·(Δt − τ), largest at
   * τ = Δt/2). The guard keeps each chord out of the grown zone, so the flown arc keeps the radius.
   */
  public static double margin(Scenario s) {
    double sag = s.plan().guard() ? s.vehicle().maxAccel() * s.plan().step() * s.plan().step() / 8 : 0;
    return s.vehicle().radius() + sag;
  }

  /**
   * Without pruning the velocity domain is the speed polygon's bounding box at every step k ≥ 1
   * (the start velocity at k = 0); positions use the keep-in box (see {@link Domains}).
   */
  private static Reachability unprunedReach(Scenario s) {
    Reachability r = Reachability.of(s);
    LimitPolygon speed = LimitPolygon.inscribed(s.vehicle().maxSpeed(), s.vehicle().sides());
    Bounds v = new Bounds(speed.xmin(), speed.ymin(), speed.xmax(), speed.ymax());
    List<Bounds> velocities = new ArrayList<>(r.velocities());
    for (int k = 1; k < velocities.size(); k++) {
      velocities.set(k, v);
    }
    return new Reachability(r.keepIn(), r.positions(), velocities, r.facts());
  }

  public int horizon() {
    return motion.horizon();
  }

  public boolean clustered() {
    return clusters != null;
  }

  /** Sizes counted from this layout. */
  public Sizes sizes() {
    Sizes.Counter c = new Sizes.Counter();
    motion.count(c, arrival);
    arrival.count(c);
    avoidance.count(c);
    if (clusters != null) {
      clusters.count(c);
    }
    for (WaypointLayout w : waypoints) {
      w.count(c);
    }
    return c.toSizes();
  }
}
