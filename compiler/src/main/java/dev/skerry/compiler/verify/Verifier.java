package dev.skerry.compiler.verify;

import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Checks a plan against the scenario knowing nothing of the MILP. Between samples a vehicle
 * follows the true zero-order-hold arc p(τ) = p_k + v_k·τ + ½·u_k·τ² (in 3-D also z(τ) = z_k +
 * ż_k·τ + ½·a_k·τ²), which bulges up to |u|·Δt²/8 from the straight chord; the verifier walks each
 * arc in {@value #PIECES} chords and subtracts each chord's own bulge bound, so every clearance it
 * reports is a guaranteed lower bound. A zone is violated when the path comes closer to the zone
 * as written than the vehicle's radius (the exact rounded inflation, not the MILP's polygon).
 *
 * <p>Each vehicle is checked against its own limits, radius and target (the one its trajectory
 * names, else the first of {@link Scenario#candidateTargets}). In 3-D a zone with an altitude span
 * is the prism polygon × [floor, ceiling], whose distance from a point is √(d_plan² + d_alt²); a
 * zone without a span is a column (plan-view distance only). Plan-view speed and acceleration are
 * the norms of (x, y); the climb rate and vertical acceleration have their own limits. The keep-in
 * area and the altitude limits (the keep-in volume's floor and ceiling deflated by the radius, and
 * the vehicle's own limits) are checked at the samples: the area is convex and an altitude band an
 * interval, so the chord between two samples inside stays inside, and the arc may bulge past by at
 * most a_max·Δt²/8 plan-view and |a_z|max·Δt²/8 in altitude, as docs/language.md documents.
 *
 * <p>In a fleet a waypoint is passed when any vehicle passes it, and every pair of vehicles keeps
 * {@link Scenario#separation} apart over the steps both are still flying, 0..min(arrival_a,
 * arrival_b): a vehicle that has arrived has left the shared space (it lands, docks or holds
 * outside the planned volume), so its samples after arrival are not compared. The relative motion
 * of two zero-order-hold arcs is itself such an arc, Δp + Δv·τ + ½·Δu·τ², walked the same way.
 */
public final class Verifier {
  static final int PIECES = 16;

  private final Scenario scenario;
  private final double tol;

  private Verifier(Scenario scenario) {
    this.scenario = scenario;
    var b = scenario.area().bounds();
    this.tol = 1e-5 * Math.max(1, Math.hypot(b.width(), b.height()));
  }

  /** One vehicle's path: the scenario's vehicle of that name (else its first vehicle). */
  public static VerifyReport verify(Scenario scenario, Trajectory path) {
    return verify(scenario, List.of(path));
  }

  /** Every vehicle's path (in the scenario's vehicle order), with the separation of every pair. */
  public static VerifyReport verify(Scenario scenario, List<Trajectory> paths) {
    return new Verifier(scenario).run(paths);
  }

  /** The scenario's vehicle that flies {@code path}: the one of its name, else the first. */
  public static Vehicle vehicleOf(Scenario scenario, Trajectory path) {
    for (Vehicle v : scenario.vehicles()) {
      if (v.name().equals(path.vehicle())) {
        return v;
      }
    }
    return scenario.vehicle();
  }

  /**
   * The target {@code path} ends in: the one it names, else the first the vehicle may end in; null
   * when it names an unknown one or there is none.
   */
  public static Target targetOf(Scenario scenario, Trajectory path) {
    if (path.target() != null) {
      return scenario.target(path.target());
    }
    List<Target> candidates = scenario.candidateTargets(vehicleOf(scenario, path));
    return candidates.isEmpty() ? null : candidates.get(0);
  }

  private VerifyReport run(List<Trajectory> paths) {
    List<Violation> out = new ArrayList<>();
    double minClearance = Double.POSITIVE_INFINITY;
    double speedExcess = -1;
    double accelExcess = -1;
    int segments = 0;
    for (Trajectory path : paths) {
      Vehicle v = vehicleOf(scenario, path);
      String who = paths.size() > 1 ? "vehicle `" + v.name() + "`: " : "";
      One one = new One(v, path, who, out);
      one.check();
      minClearance = Math.min(minClearance, one.minClearance);
      speedExcess = Math.max(speedExcess, one.speedExcess);
      accelExcess = Math.max(accelExcess, one.accelExcess);
      segments += one.segments;
    }
    waypoints(paths, out);
    assignment(paths, out);
    double minSeparation = separation(paths, out);
    return new VerifyReport(out, minClearance, speedExcess, accelExcess, segments, minSeparation);
  }

  private boolean flies3d(Vehicle v) {
    return scenario.threeD() && v.vertical() != null;
  }

  /** The checks of one vehicle's path. */
  private final class One {
    final Vehicle v;
    final Trajectory path;
    final String who;
    final List<Violation> out;
    final boolean threeD;
    double minClearance = Double.POSITIVE_INFINITY;
    double speedExcess = -1;
    double accelExcess = -1;
    int segments;

    One(Vehicle v, Trajectory path, String who, List<Violation> out) {
      this.v = v;
      this.path = path;
      this.who = who;
      this.out = out;
      this.threeD = flies3d(v);
    }

    void check() {
      List<Sample> flown = path.flown();
      double dt = path.step();
      Shape free = scenario.area().shape().inflate(-v.radius());
      for (int k = 0; k + 1 < flown.size(); k++) {
        Sample s = flown.get(k);
        Sample next = flown.get(k + 1);
        segments++;
        dynamics(s, next, dt);
        for (Zone z : scenario.zones()) {
          double clearance = threeD && z.hasAltitude() ? arcClearance3(s, dt, z.shape(), z.altitude())
              : arcClearance(s, dt, z.shape());
          minClearance = Math.min(minClearance, clearance - v.radius());
          if (clearance < v.radius() - tol) {
            out.add(new Violation(Violation.Kind.ZONE, k, z.name(), v.radius() - clearance,
                who + "between steps " + k + " and " + (k + 1) + " the path comes within " + Format.number(clearance)
                    + " m of zone `" + z.name() + "` (radius " + Format.number(v.radius()) + " m): "
                    + Format.number(v.radius() - clearance) + " m too close"));
          }
        }
        // The area is convex, so the chord lies inside when both samples do; the arc may bulge past
        // it by up to a_max·Δt²/8 between samples (documented in docs/language.md).
        double outside = Math.max(Geometry.outside(s.position(), free), Geometry.outside(next.position(), free));
        if (outside > tol) {
          out.add(new Violation(Violation.Kind.AREA, k, scenario.area().name(), outside,
              who + "between steps " + k + " and " + (k + 1) + " the path leaves the keep-in area by "
                  + Format.number(outside) + " m"));
        }
      }
      if (flown.size() == 1) {
        Sample s0 = flown.get(0);
        for (Zone z : scenario.zones()) {
          double d = threeD && z.hasAltitude() ? Geometry.prismDistance(s0.position(), s0.altitude(), z.shape(), z.altitude())
              : Geometry.segmentDistance(s0.position(), s0.position(), z.shape());
          minClearance = Math.min(minClearance, d - v.radius());
          if (d < v.radius() - tol) {
            out.add(new Violation(Violation.Kind.ZONE, 0, z.name(), v.radius() - d, who + "the start is inside zone `"
                + z.name() + "`"));
          }
        }
      }
      for (Sample s : flown) {
        boolean accelerating = s.step() < path.arrival();
        speedExcess = Math.max(speedExcess, s.velocity().norm() / v.maxSpeed() - 1);
        if (accelerating) {
          accelExcess = Math.max(accelExcess, s.accel().norm() / v.maxAccel() - 1);
        }
        if (s.velocity().norm() > v.maxSpeed() * (1 + 1e-6) + tol) {
          out.add(new Violation(Violation.Kind.SPEED, s.step(), v.name(), s.velocity().norm() - v.maxSpeed(),
              who + "at step " + s.step() + " the speed is " + Format.number(s.velocity().norm())
                  + " m/s, over the limit " + Format.number(v.maxSpeed()) + " m/s"));
        }
        if (accelerating && s.accel().norm() > v.maxAccel() * (1 + 1e-6) + tol) {
          out.add(new Violation(Violation.Kind.ACCEL, s.step(), v.name(), s.accel().norm() - v.maxAccel(),
              who + "at step " + s.step() + " the acceleration is " + Format.number(s.accel().norm())
                  + " m/s², over the limit " + Format.number(v.maxAccel()) + " m/s²"));
        }
        if (threeD) {
          vertical(s, accelerating);
        }
      }
      target(flown);
    }

    /** Altitude band and climb limits at one sample. */
    private void vertical(Sample s, boolean accelerating) {
      Vehicle.Vertical vert = v.vertical();
      Span band = allowedAltitude();
      double below = band.lo() - s.altitude();
      double above = s.altitude() - band.hi();
      if (below > tol || above > tol) {
        boolean low = below > above;
        out.add(new Violation(Violation.Kind.ALTITUDE, s.step(), v.name(), Math.max(below, above),
            who + "at step " + s.step() + " the altitude " + Format.number(s.altitude()) + " m is "
                + Format.number(Math.max(below, above)) + " m " + (low ? "below the floor " + Format.number(band.lo())
                : "above the ceiling " + Format.number(band.hi())) + " m (radius and limits included)"));
      }
      if (Math.abs(s.climb()) > vert.maxClimb() * (1 + 1e-6) + tol) {
        out.add(new Violation(Violation.Kind.CLIMB, s.step(), v.name(), Math.abs(s.climb()) - vert.maxClimb(),
            who + "at step " + s.step() + " the climb rate is " + Format.number(s.climb()) + " m/s, over the limit ±"
                + Format.number(vert.maxClimb()) + " m/s"));
      }
      if (accelerating && Math.abs(s.climbAccel()) > vert.maxClimbAccel() * (1 + 1e-6) + tol) {
        out.add(new Violation(Violation.Kind.CLIMB, s.step(), v.name(), Math.abs(s.climbAccel()) - vert.maxClimbAccel(),
            who + "at step " + s.step() + " the vertical acceleration is " + Format.number(s.climbAccel())
                + " m/s², over the limit ±" + Format.number(vert.maxClimbAccel()) + " m/s²"));
      }
    }

    /** Where the centre may be in altitude: the keep-in volume deflated by the radius, within the vehicle's limits. */
    private Span allowedAltitude() {
      Span band = scenario.area().altitude() == null ? Span.ALL : scenario.area().altitude().expand(-v.radius());
      return v.vertical().limits() == null ? band : band.intersect(v.vertical().limits());
    }

    /** A lower bound on the plan-view distance from the arc of step k to the shape. */
    private double arcClearance(Sample s, double dt, Shape shape) {
      double h = dt / PIECES;
      double bulge = s.accel().norm() * h * h / 8;
      double best = Double.POSITIVE_INFINITY;
      Vec2 a = s.position();
      for (int i = 1; i <= PIECES; i++) {
        Vec2 b = arcPoint(s, h * i);
        best = Math.min(best, Math.max(0, Geometry.segmentDistance(a, b, shape) - bulge));
        a = b;
      }
      return best;
    }

    /** A lower bound on the 3-D distance from the arc of step k to the prism shape × span. */
    private double arcClearance3(Sample s, double dt, Shape shape, Span span) {
      double h = dt / PIECES;
      double bulge = Math.hypot(s.accel().norm(), s.climbAccel()) * h * h / 8;
      double best = Double.POSITIVE_INFINITY;
      Vec2 a = s.position();
      double za = s.altitude();
      for (int i = 1; i <= PIECES; i++) {
        Vec2 b = arcPoint(s, h * i);
        double zb = arcAltitude(s, h * i);
        best = Math.min(best, Math.max(0, Geometry.segmentPrismDistance(a, za, b, zb, shape, span) - bulge));
        a = b;
        za = zb;
      }
      return best;
    }

    private void dynamics(Sample s, Sample next, double dt) {
      Vec2 p = arcPoint(s, dt);
      Vec2 vNext = s.velocity().plus(s.accel().times(dt));
      double err = Math.max(p.distanceTo(next.position()), vNext.distanceTo(next.velocity()) * dt);
      if (threeD) {
        double zErr = Math.abs(arcAltitude(s, dt) - next.altitude());
        double wErr = Math.abs(s.climb() + s.climbAccel() * dt - next.climb()) * dt;
        err = Math.max(err, Math.max(zErr, wErr));
      }
      if (err > tol) {
        out.add(new Violation(Violation.Kind.DYNAMICS, s.step(), v.name(), err,
            who + "step " + s.step() + " → " + next.step() + " does not follow the double-integrator dynamics (off by "
                + Format.number(err) + " m)"));
      }
    }

    private void target(List<Sample> flown) {
      Target t = targetOf(scenario, path);
      if (t == null) {
        if (path.target() != null) {
          out.add(new Violation(Violation.Kind.TARGET, path.arrival(), path.target(), 0,
              who + "the plan names target `" + path.target() + "`, which the scenario does not have"));
        }
        return;
      }
      if (!scenario.candidateTargets(v).contains(t)) {
        out.add(new Violation(Violation.Kind.TARGET, path.arrival(), t.name(), 0,
            who + "the vehicle ends in target `" + t.name() + "`, which is not one it may end in"));
      }
      Sample last = flown.get(flown.size() - 1);
      double outside = Geometry.outside(last.position(), t.region());
      if (outside > tol) {
        out.add(new Violation(Violation.Kind.TARGET, last.step(), t.name(), outside,
            who + "at arrival (step " + last.step() + ") the vehicle is " + Format.number(outside)
                + " m outside target `" + t.name() + "`"));
      }
      if (t.atRest() && last.velocity().norm() > 1e-5 * Math.max(1, v.maxSpeed())) {
        out.add(new Violation(Violation.Kind.TARGET, last.step(), t.name(), last.velocity().norm(),
            who + "at arrival the vehicle still moves at " + Format.number(last.velocity().norm())
                + " m/s; the target asks for rest"));
      }
      if (threeD) {
        if (t.altitude() != null) {
          double gap = Geometry.altitudeGap(last.altitude(), t.altitude());
          if (gap > tol) {
            out.add(new Violation(Violation.Kind.TARGET, last.step(), t.name(), gap,
                who + "at arrival the altitude " + Format.number(last.altitude()) + " m is " + Format.number(gap)
                    + " m outside target `" + t.name() + "`'s band " + Format.number(t.altitude().lo()) + " to "
                    + Format.number(t.altitude().hi()) + " m"));
          }
        }
        if (t.atRest() && Math.abs(last.climb()) > 1e-5 * Math.max(1, v.vertical().maxClimb())) {
          out.add(new Violation(Violation.Kind.TARGET, last.step(), t.name(), Math.abs(last.climb()),
              who + "at arrival the vehicle still climbs at " + Format.number(last.climb())
                  + " m/s; the target asks for rest"));
        }
      }
    }
  }

  /** Every waypoint is passed by some vehicle (in its altitude band in 3-D). */
  private void waypoints(List<Trajectory> paths, List<Violation> out) {
    for (Waypoint w : scenario.waypoints()) {
      Shape box = new Shape.Box(w.region());
      boolean visited = false;
      for (Trajectory path : paths) {
        boolean band = flies3d(vehicleOf(scenario, path)) && w.altitude() != null;
        visited |= path.flown().stream().anyMatch(s -> Geometry.outside(s.position(), box) <= tol
            && (!band || Geometry.altitudeGap(s.altitude(), w.altitude()) <= tol));
      }
      if (!visited) {
        String band = scenario.threeD() && w.altitude() != null ? " between " + Format.number(w.altitude().lo()) + " and "
            + Format.number(w.altitude().hi()) + " m altitude" : "";
        out.add(new Violation(Violation.Kind.WAYPOINT, -1, w.name(), 0,
            (paths.size() > 1 ? "no vehicle passes" : "the path never passes") + " within "
                + Format.number(w.tolerance()) + " m of waypoint `" + w.name() + "`" + band));
      }
    }
  }

  /** Two vehicles the MILP assigns a target to do not end in the same one. */
  private void assignment(List<Trajectory> paths, List<Violation> out) {
    if (paths.size() < 2) {
      return;
    }
    Map<String, String> taken = new HashMap<>();
    for (Trajectory path : paths) {
      Vehicle v = vehicleOf(scenario, path);
      Target t = targetOf(scenario, path);
      if (v.target() != null || t == null) {
        continue;
      }
      String other = taken.putIfAbsent(t.name(), v.name());
      if (other != null) {
        out.add(new Violation(Violation.Kind.TARGET, path.arrival(), t.name(), 0, "vehicles `" + other + "` and `"
            + v.name() + "` both end in target `" + t.name() + "`; each target takes one vehicle"));
      }
    }
  }

  /**
   * Every pair's separation over the steps both fly; returns the least margin (distance less the
   * required separation, a lower bound), +∞ for a single vehicle.
   */
  private double separation(List<Trajectory> paths, List<Violation> out) {
    double least = Double.POSITIVE_INFINITY;
    for (int i = 0; i < paths.size(); i++) {
      for (int j = i + 1; j < paths.size(); j++) {
        Trajectory a = paths.get(i);
        Trajectory b = paths.get(j);
        Vehicle va = vehicleOf(scenario, a);
        Vehicle vb = vehicleOf(scenario, b);
        double need = scenario.separation(va, vb);
        boolean threeD = flies3d(va) && flies3d(vb);
        int last = Math.min(Math.min(a.arrival(), b.arrival()), Math.min(a.samples().size(), b.samples().size()) - 1);
        double dt = a.step();
        for (int k = 0; k <= Math.max(0, last - 1); k++) {
          Sample sa = a.samples().get(k);
          Sample sb = b.samples().get(k);
          double d = last == 0 ? Math.sqrt(sq(relative(sa, sb, 0, threeD))) : relativeClearance(sa, sb, dt, threeD);
          least = Math.min(least, d - need);
          if (d < need - tol) {
            String where = last == 0 ? "at the start" : "between steps " + k + " and " + (k + 1);
            out.add(new Violation(Violation.Kind.SEPARATION, k, va.name() + "," + vb.name(), need - d,
                where + " vehicles `" + va.name() + "` and `" + vb.name() + "` come within " + Format.number(d)
                    + " m of each other (separation " + Format.number(need) + " m): " + Format.number(need - d)
                    + " m too close"));
          }
        }
      }
    }
    return least;
  }

  /**
   * A lower bound on the least distance between two vehicles over one step: the relative arc
   * Δp + Δv·τ + ½·Δu·τ² walked in chords, each less its bulge |Δu|·h²/8.
   */
  private static double relativeClearance(Sample a, Sample b, double dt, boolean threeD) {
    double h = dt / PIECES;
    Vec2 du = a.accel().minus(b.accel());
    double dua = threeD ? a.climbAccel() - b.climbAccel() : 0;
    double bulge = Math.hypot(du.norm(), dua) * h * h / 8;
    double best = Double.POSITIVE_INFINITY;
    double[] p = relative(a, b, 0, threeD);
    for (int i = 1; i <= PIECES; i++) {
      double[] q = relative(a, b, h * i, threeD);
      best = Math.min(best, Math.max(0, Geometry.originToSegment(p, q) - bulge));
      p = q;
    }
    return best;
  }

  /** Position of a less that of b, τ seconds into the step (altitude 0 unless 3-D). */
  private static double[] relative(Sample a, Sample b, double tau, boolean threeD) {
    Vec2 d = arcPoint(a, tau).minus(arcPoint(b, tau));
    double dz = threeD ? arcAltitude(a, tau) - arcAltitude(b, tau) : 0;
    return new double[] {d.x(), d.y(), dz};
  }

  private static double sq(double[] v) {
    return v[0] * v[0] + v[1] * v[1] + v[2] * v[2];
  }

  /** Plan-view position τ seconds after sample s under its held acceleration. */
  static Vec2 arcPoint(Sample s, double tau) {
    return s.position().plus(s.velocity().times(tau)).plus(s.accel().times(0.5 * tau * tau));
  }

  /** Altitude τ seconds after sample s under its held vertical acceleration. */
  static double arcAltitude(Sample s, double tau) {
    return s.altitude() + s.climb() * tau + 0.5 * s.climbAccel() * tau * tau;
  }
}
