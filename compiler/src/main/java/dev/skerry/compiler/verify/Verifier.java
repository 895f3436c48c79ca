package dev.skerry.compiler.verify;

import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import java.util.ArrayList;
import java.util.List;

/**
 * Checks a plan against the scenario knowing nothing of the MILP. Between samples the vehicle
 * follows the true zero-order-hold arc p(τ) = p_k + v_k·τ + ½·u_k·τ², which bulges up to
 * |u|·Δt²/8 from the straight chord; the verifier walks each arc in {@value #PIECES} chords and
 * subtracts each chord's own bulge bound, so the clearance it reports is a guaranteed lower bound.
 * A zone is violated when the path comes closer to the zone as written than the vehicle's radius
 * (the exact rounded inflation, not the MILP's polygon).
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

  public static VerifyReport verify(Scenario scenario, Trajectory path) {
    return new Verifier(scenario).run(path);
  }

  /** Every vehicle's path (in the scenario's vehicle order). */
  public static VerifyReport verify(Scenario scenario, List<Trajectory> paths) {
    if (paths.size() == 1) {
      return verify(scenario, paths.get(0));
    }
    throw new UnsupportedOperationException("fleet verification is not written yet");
  }

  private VerifyReport run(Trajectory path) {
    Vehicle v = scenario.vehicle();
    List<Violation> out = new ArrayList<>();
    List<Sample> flown = path.flown();
    double dt = path.step();
    double minClearance = Double.POSITIVE_INFINITY;
    int segments = 0;
    Shape free = scenario.area().shape().inflate(-v.radius());
    for (int k = 0; k + 1 < flown.size(); k++) {
      Sample s = flown.get(k);
      Sample next = flown.get(k + 1);
      segments++;
      dynamics(s, next, dt, out);
      for (Zone z : scenario.zones()) {
        double clearance = arcClearance(s, dt, z.shape());
        minClearance = Math.min(minClearance, clearance - v.radius());
        if (clearance < v.radius() - tol) {
          out.add(new Violation(Violation.Kind.ZONE, k, z.name(), v.radius() - clearance,
              "between steps " + k + " and " + (k + 1) + " the path comes within " + Format.number(clearance)
                  + " m of zone `" + z.name() + "` (radius " + Format.number(v.radius()) + " m): "
                  + Format.number(v.radius() - clearance) + " m too close"));
        }
      }
      // The area is convex, so the chord lies inside when both samples do; the arc may bulge past
      // it by up to a_max·Δt²/8 between samples (documented in docs/language.md).
      double outside = Math.max(Geometry.outside(s.position(), free), Geometry.outside(next.position(), free));
      if (outside > tol) {
        out.add(new Violation(Violation.Kind.AREA, k, scenario.area().name(), outside,
            "between steps " + k + " and " + (k + 1) + " the path leaves the keep-in area by " + Format.number(outside) + " m"));
      }
    }
    if (flown.size() == 1 && scenario.zones().stream().anyMatch(z ->
        Geometry.segmentDistance(flown.get(0).position(), flown.get(0).position(), z.shape()) < v.radius() - tol)) {
      out.add(new Violation(Violation.Kind.ZONE, 0, "", 0, "the start is inside a zone"));
    }
    double speedExcess = -1;
    double accelExcess = -1;
    for (Sample s : flown) {
      speedExcess = Math.max(speedExcess, s.velocity().norm() / v.maxSpeed() - 1);
      if (s.step() < path.arrival()) {
        accelExcess = Math.max(accelExcess, s.accel().norm() / v.maxAccel() - 1);
      }
      if (s.velocity().norm() > v.maxSpeed() * (1 + 1e-6) + tol) {
        out.add(new Violation(Violation.Kind.SPEED, s.step(), v.name(), s.velocity().norm() - v.maxSpeed(),
            "at step " + s.step() + " the speed is " + Format.number(s.velocity().norm()) + " m/s, over the limit "
                + Format.number(v.maxSpeed()) + " m/s"));
      }
      if (s.step() < path.arrival() && s.accel().norm() > v.maxAccel() * (1 + 1e-6) + tol) {
        out.add(new Violation(Violation.Kind.ACCEL, s.step(), v.name(), s.accel().norm() - v.maxAccel(),
            "at step " + s.step() + " the acceleration is " + Format.number(s.accel().norm()) + " m/s², over the limit "
                + Format.number(v.maxAccel()) + " m/s²"));
      }
    }
    target(flown, out);
    waypoints(flown, out);
    return new VerifyReport(out, minClearance, speedExcess, accelExcess, segments);
  }

  /** A lower bound on the distance from the arc of step k to the shape. */
  private static double arcClearance(Sample s, double dt, Shape shape) {
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

  static Vec2 arcPoint(Sample s, double tau) {
    return s.position().plus(s.velocity().times(tau)).plus(s.accel().times(0.5 * tau * tau));
  }

  private void dynamics(Sample s, Sample next, double dt, List<Violation> out) {
    Vec2 p = arcPoint(s, dt);
    Vec2 vNext = s.velocity().plus(s.accel().times(dt));
    double err = Math.max(p.distanceTo(next.position()), vNext.distanceTo(next.velocity()) * dt);
    if (err > tol) {
      out.add(new Violation(Violation.Kind.DYNAMICS, s.step(), scenario.vehicle().name(), err,
          "step " + s.step() + " → " + next.step() + " does not follow the double-integrator dynamics (off by "
              + Format.number(err) + " m)"));
    }
  }

  private void target(List<Sample> flown, List<Violation> out) {
    var t = scenario.target();
    Sample last = flown.get(flown.size() - 1);
    double outside = Geometry.outside(last.position(), t.region());
    if (outside > tol) {
      out.add(new Violation(Violation.Kind.TARGET, last.step(), t.name(), outside,
          "at arrival (step " + last.step() + ") the vehicle is " + Format.number(outside) + " m outside target `"
              + t.name() + "`"));
    }
    if (t.atRest() && last.velocity().norm() > 1e-5 * Math.max(1, scenario.vehicle().maxSpeed())) {
      out.add(new Violation(Violation.Kind.TARGET, last.step(), t.name(), last.velocity().norm(),
          "at arrival the vehicle still moves at " + Format.number(last.velocity().norm()) + " m/s; the target asks for rest"));
    }
  }

  private void waypoints(List<Sample> flown, List<Violation> out) {
    for (Waypoint w : scenario.waypoints()) {
      Shape box = new Shape.Box(w.region());
      boolean visited = flown.stream().anyMatch(s -> Geometry.outside(s.position(), box) <= tol);
      if (!visited) {
        out.add(new Violation(Violation.Kind.WAYPOINT, -1, w.name(), 0,
            "the path never passes within " + Format.number(w.tolerance()) + " m of waypoint `" + w.name() + "`"));
      }
    }
  }
}
