package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.List;

/**
 * The one place that decides what a scenario's MILP contains: every column, every row, every
 * binary and every big-M. Lowering walks this layout to build rows; {@link #sizes()} counts the
 * same layout; so the predicted and the lowered sizes cannot drift apart.
 *
 * <p>Domain boxes: with pruning, the reach box of step k ({@link Reachability}, and {@link
 * VerticalReach} for the altitude in 3-D); without, the keep-in box (deflated by the radius) for
 * k ≥ 1 and the start point for k = 0. Every big-M is the padded ({@link BigM}) worst case of its
 * row over the domain box of its step.
 *
 * <p>A fleet has one {@link VehicleLayout} per vehicle; the cluster boxes (shared: every vehicle
 * avoids every box), the waypoints (one visit by any vehicle), the pairwise {@link
 * SeparationLayout}s, the target capacities (a target assigned to several candidates takes at most
 * one vehicle: Σ f ≤ 1) and, with {@code latest} time, the makespan column T ≥ each arrival time
 * belong to the whole fleet.
 */
public record FormulationLayout(
    Scenario scenario,
    boolean pruning,
    boolean guard,
    List<VehicleLayout> vehicles,
    ClusterLayout clusters,
    List<WaypointLayout> waypoints,
    List<SeparationLayout> separations,
    List<Capacity> capacities,
    boolean makespan,
    List<Fact> facts,
    long[] separationTally) {

  public FormulationLayout {
    vehicles = List.copyOf(vehicles);
    waypoints = List.copyOf(waypoints);
    separations = List.copyOf(separations);
    capacities = List.copyOf(capacities);
    facts = List.copyOf(facts);
  }

  /** Target {@code target} may take at most one of the listed vehicles (indices into {@link #vehicles}). */
  public record Capacity(String target, String tag, List<Integer> vehicles) {
    public Capacity {
      vehicles = List.copyOf(vehicles);
    }
  }

  /** The boxes that bound a vehicle's state at each step, as the big-M and pruning see them. */
  public record Domains(Reachability reach, VerticalReach vertical, boolean pruning, boolean guard, int horizon) {
    Bounds position(int k) {
      if (pruning || k == 0) {
        return reach.position(k);
      }
      return reach.keepIn();
    }

    Bounds velocity(int k) {
      return reach.velocity(k);
    }

    boolean threeD() {
      return vertical != null;
    }

    /** The altitude interval at step k; null in 2-D. */
    Span altitude(int k) {
      return vertical == null ? null : vertical.altitude(k);
    }

    /** The climb-rate interval at step k; null in 2-D. */
    Span rate(int k) {
      return vertical == null ? null : vertical.rate(k);
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
    boolean fleet = s.fleet();
    Names names = new Names();
    List<Fact> facts = new ArrayList<>();
    List<Domains> domains = new ArrayList<>();
    List<MotionLayout> motions = new ArrayList<>();
    List<ArrivalLayout> arrivals = new ArrayList<>();
    List<String> tags = new ArrayList<>();
    for (Vehicle v : s.vehicles()) {
      if (s.threeD() && v.vertical() == null) {
        throw new IllegalArgumentException("vehicle " + v.name() + " of a 3-D scenario has no altitude");
      }
      Reachability reach = pruning ? Reachability.of(s, v) : unprunedReach(s, v);
      VerticalReach vreach = s.threeD() ? VerticalReach.of(s, v, pruning) : null;
      facts.addAll(reach.facts());
      if (vreach != null) {
        facts.addAll(vreach.facts());
      }
      Domains d = new Domains(reach, vreach, pruning, guard, s.plan().horizon());
      String tag = names.tag("vehicle", v.name());
      MotionLayout motion = MotionLayout.of(s, v, tag, names, reach, pruning);
      List<Target> candidates = s.candidateTargets(v);
      if (candidates.isEmpty()) {
        throw new IllegalArgumentException("vehicle " + v.name() + " has no target to reach");
      }
      List<String> targetTags = new ArrayList<>();
      for (Target t : candidates) {
        targetTags.add(names.tag("target", t.name()));
      }
      domains.add(d);
      motions.add(motion);
      arrivals.add(ArrivalLayout.of(candidates, targetTags, d, facts));
      tags.add(tag);
    }
    double clusterMargin = 0;
    for (Vehicle v : s.vehicles()) {
      clusterMargin = Math.max(clusterMargin, margin(s, v));
    }
    ClusterLayout clusters = null;
    if (s.plan().clustered()) {
      Bounds world = null;
      for (int i = 0; i < s.vehicles().size(); i++) {
        Bounds own = domains.get(i).reach().keepIn().union(Reachability.point(s.vehicles().get(i).start()));
        world = world == null ? own : world.union(own);
      }
      List<Bounds> boxes = new ArrayList<>();
      List<String> zoneTags = new ArrayList<>();
      List<String> zoneNames = new ArrayList<>();
      for (Zone z : s.zones()) {
        Bounds b = z.shape().inflate(clusterMargin).bounds();
        boxes.add(b);
        world = world.union(b);
        zoneTags.add(names.tag("zone", z.name()));
        zoneNames.add(z.name());
      }
      clusters = ClusterLayout.of(s.plan().clusters(), s.plan().symmetry(), world, boxes, zoneTags, zoneNames);
    }
    List<VehicleLayout> vehicles = new ArrayList<>();
    for (int i = 0; i < s.vehicles().size(); i++) {
      Vehicle v = s.vehicles().get(i);
      Domains d = domains.get(i);
      ArrivalLayout arrival = arrivals.get(i);
      double planMargin = margin(s, v);
      double verticalMargin = verticalMargin(s, v);
      List<AvoidanceLayout.Obstacle> obstacles = new ArrayList<>();
      long[] tally = new long[3];
      if (clusters != null) {
        for (int l = 0; l < s.plan().clusters(); l++) {
          obstacles.add(AvoidanceLayout.cluster(l, "c" + l, clusters.sides(), d, arrival));
        }
      } else {
        for (Zone z : s.zones()) {
          obstacles.add(AvoidanceLayout.zone(z, names.tag("zone", z.name()), planMargin, verticalMargin, d, arrival,
              facts, tally));
        }
      }
      AvoidanceLayout avoidance = new AvoidanceLayout(obstacles, tally[0], tally[1], tally[2]);
      String scope = fleet ? tags.get(i) + "_" : "";
      vehicles.add(new VehicleLayout(i, v.name(), tags.get(i), scope, d, motions.get(i), arrival, avoidance,
          planMargin, verticalMargin));
    }
    List<WaypointLayout> waypoints = new ArrayList<>();
    for (Waypoint w : s.waypoints()) {
      waypoints.add(WaypointLayout.of(w, names.tag("waypoint", w.name()), domains, arrivals, facts));
    }
    List<SeparationLayout> separations = new ArrayList<>();
    long[] sepTally = new long[3];
    double dt = s.plan().step();
    double sag = guard ? dt * dt / 8 : 0;
    for (int a = 0; a < s.vehicles().size(); a++) {
      for (int b = a + 1; b < s.vehicles().size(); b++) {
        Vehicle va = s.vehicles().get(a);
        Vehicle vb = s.vehicles().get(b);
        double planGrow = sag * (va.maxAccel() + vb.maxAccel());
        double verticalGrow = s.threeD() ? sag * (va.vertical().maxClimbAccel() + vb.vertical().maxClimbAccel()) : 0;
        separations.add(SeparationLayout.of(a, b, va.name(), vb.name(), tags.get(a), tags.get(b),
            s.separation(va, vb), planGrow, verticalGrow, domains.get(a), domains.get(b), arrivals.get(a),
            arrivals.get(b), facts, sepTally));
      }
    }
    List<Capacity> capacities = new ArrayList<>();
    for (Target t : s.targets()) {
      List<Integer> takers = new ArrayList<>();
      for (int i = 0; i < arrivals.size(); i++) {
        for (ArrivalLayout.Candidate c : arrivals.get(i).candidates()) {
          if (c.name().equals(t.name())) {
            takers.add(i);
          }
        }
      }
      if (takers.size() > 1) {
        capacities.add(new Capacity(t.name(), names.tag("target", t.name()), takers));
      }
    }
    boolean makespan = fleet && s.plan().latestArrival();
    return new FormulationLayout(s, pruning, guard, vehicles, clusters, waypoints, separations, capacities, makespan,
        facts, sepTally);
  }

  /** Plan-view margin of the first vehicle (see {@link #margin(Scenario, Vehicle)}). */
  public static double margin(Scenario s) {
    return margin(s, s.vehicle());
  }

  /**
   * How far zones are grown in plan view for avoidance by vehicle {@code v}: its radius, plus, with
   * the guard on, the largest bulge of the true zero-order-hold arc from its chord, |u|·Δt²/8 ≤
   * a_max·Δt²/8 (the arc p_k + v_k·τ + ½·u_k·τ² departs from the straight segment by ½·|u|·τ·(Δt −
   * τ), largest at τ = Δt/2). The guard keeps each chord out of the grown zone, so the flown arc
   * keeps the radius.
   */
  public static double margin(Scenario s, Vehicle v) {
    double sag = s.plan().guard() ? v.maxAccel() * s.plan().step() * s.plan().step() / 8 : 0;
    return v.radius() + sag;
  }

  /** How far a zone's floor and ceiling are pushed out for vehicle {@code v}: radius plus the vertical bulge. */
  public static double verticalMargin(Scenario s, Vehicle v) {
    if (v.vertical() == null) {
      return v.radius();
    }
    double sag = s.plan().guard() ? v.vertical().maxClimbAccel() * s.plan().step() * s.plan().step() / 8 : 0;
    return v.radius() + sag;
  }

  /**
   * Without pruning the velocity domain is the speed polygon's bounding box at every step k ≥ 1
   * (the start velocity at k = 0); positions use the keep-in box (see {@link Domains}).
   */
  private static Reachability unprunedReach(Scenario s, Vehicle vehicle) {
    Reachability r = Reachability.of(s, vehicle);
    LimitPolygon speed = LimitPolygon.inscribed(vehicle.maxSpeed(), vehicle.sides());
    Bounds v = new Bounds(speed.xmin(), speed.ymin(), speed.xmax(), speed.ymax());
    List<Bounds> velocities = new ArrayList<>(r.velocities());
    for (int k = 1; k < velocities.size(); k++) {
      velocities.set(k, v);
    }
    return new Reachability(r.keepIn(), r.positions(), velocities, r.facts());
  }

  public int horizon() {
    return vehicles.get(0).motion().horizon();
  }

  public boolean clustered() {
    return clusters != null;
  }

  /** The first vehicle's reach boxes. */
  public Reachability reach() {
    return vehicles.get(0).reach();
  }

  /** The first vehicle's states and limits. */
  public MotionLayout motion() {
    return vehicles.get(0).motion();
  }

  /** The first vehicle's variable horizon. */
  public ArrivalLayout arrival() {
    return vehicles.get(0).arrival();
  }

  /** Avoidance of every vehicle together (one vehicle: its own), for counts and reports. */
  public AvoidanceLayout avoidance() {
    if (vehicles.size() == 1) {
      return vehicles.get(0).avoidance();
    }
    List<AvoidanceLayout.Obstacle> all = new ArrayList<>();
    long skipped = 0;
    long hard = 0;
    long blocked = 0;
    for (VehicleLayout v : vehicles) {
      all.addAll(v.avoidance().obstacles());
      skipped += v.avoidance().skippedSlots();
      hard += v.avoidance().hardSlots();
      blocked += v.avoidance().blockedSlots();
    }
    return new AvoidanceLayout(all, skipped, hard, blocked);
  }

  /** Sizes counted from this layout. */
  public Sizes sizes() {
    Sizes.Counter c = new Sizes.Counter();
    for (VehicleLayout v : vehicles) {
      v.motion().count(c, v.arrival());
      v.arrival().count(c);
      v.avoidance().count(c);
    }
    if (clusters != null) {
      clusters.count(c);
    }
    for (WaypointLayout w : waypoints) {
      w.count(c);
    }
    for (SeparationLayout p : separations) {
      p.count(c);
    }
    for (Capacity cap : capacities) {
      long terms = 0;
      for (int i : cap.vehicles()) {
        for (ArrivalLayout.ArrivalStep st : vehicles.get(i).arrival().steps()) {
          ArrivalLayout.Candidate cand = vehicles.get(i).arrival().candidates().get(st.target());
          terms += cand.name().equals(cap.target()) ? 1 : 0;
        }
      }
      c.row(terms);
    }
    if (makespan) {
      c.continuous++;
      for (VehicleLayout v : vehicles) {
        c.row(1 + v.arrival().steps().size());
      }
    }
    return c.toSizes();
  }
}
