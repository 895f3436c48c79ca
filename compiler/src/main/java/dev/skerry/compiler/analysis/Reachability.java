package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import java.util.ArrayList;
import java.util.List;

/**
 * Boxes that hold every state the vehicle can reach at step k = 0..N, whatever the zones.
 *
 * <p>Method: per axis, the speed and acceleration polygons are replaced by their bounding
 * intervals (the per-axis extents of the inscribed polygons, which contain the polygons, so the
 * boxes over-approximate the true reachable set). Per axis the fastest velocity profile is
 * {@code v̄_{i+1} = min(v̄max, v̄_i + Δt·āmax)} and, since under zero-order hold {@code p_{k+1} = p_k
 * + Δt(v_k + v_{k+1})/2}, the largest position is the trapezoid sum of that profile; the smallest
 * likewise. Position boxes for k ≥ 1 are then intersected with the keep-in area's bounding box
 * deflated by the radius (positions outside it are infeasible anyway); box 0 is the start point.
 *
 * @param keepIn bounding box of the deflated keep-in area
 * @param positions position box per step, index k = 0..N
 * @param velocities velocity box per step (x interval as x, y interval as y), index k = 0..N
 * @param facts what the bounds alone prove infeasible
 */
public record Reachability(Bounds keepIn, List<Bounds> positions, List<Bounds> velocities, List<Fact> facts) {

  public Reachability {
    positions = List.copyOf(positions);
    velocities = List.copyOf(velocities);
    facts = List.copyOf(facts);
  }

  public static Reachability of(Scenario scenario) {
    return of(scenario, scenario.vehicle());
  }

  /** The reach boxes of vehicle {@code v} of the scenario (plan view). */
  public static Reachability of(Scenario scenario, Vehicle v) {
    int n = scenario.plan().horizon();
    double dt = scenario.plan().step();
    LimitPolygon speed = LimitPolygon.inscribed(v.maxSpeed(), v.sides());
    LimitPolygon accel = LimitPolygon.inscribed(v.maxAccel(), v.sides());
    Bounds keepIn = deflatedArea(scenario, v).bounds();
    List<Fact> facts = new ArrayList<>();
    double[][] x = axis(v.start().x(), v.startVelocity().x(), speed.xmin(), speed.xmax(), accel.xmin(),
        accel.xmax(), dt, n);
    double[][] y = axis(v.start().y(), v.startVelocity().y(), speed.ymin(), speed.ymax(), accel.ymin(),
        accel.ymax(), dt, n);
    List<Bounds> positions = new ArrayList<>(n + 1);
    List<Bounds> velocities = new ArrayList<>(n + 1);
    boolean reported = false;
    // Boxes grow by the solvers' feasibility tolerance: a plan that runs exactly along the limits
    // (bang-bang) sits on the box's edge, and a state read back from a solver is off by ~1e-9, so
    // without this margin re-planning from it (closed loop) could prune away its own tail.
    double eps = 1e-6 * Math.max(1, Math.hypot(keepIn.width(), keepIn.height()));
    for (int k = 0; k <= n; k++) {
      double pad = k == 0 ? 0 : eps;
      Bounds raw = new Bounds(x[0][k] - pad, y[0][k] - pad, x[1][k] + pad, y[1][k] + pad);
      Bounds box = raw;
      if (k > 0) {
        Bounds cut = raw.intersect(keepIn);
        if (cut.xmin() <= cut.xmax() && cut.ymin() <= cut.ymax()) {
          box = cut;
        } else if (!reported) {
          facts.add(new Fact("area-unreachable", v.name(), k,
              "no position reachable at step " + k + " lies inside the keep-in area"));
          reported = true;
        }
      }
      positions.add(box);
      double vpad = k == 0 ? 0 : eps / Math.max(dt, 1e-9);
      velocities.add(new Bounds(x[2][k] - vpad, y[2][k] - vpad, x[3][k] + vpad, y[3][k] + vpad));
    }
    if (!keepIn.contains(v.start())) {
      facts.add(new Fact("start-outside-area", v.name(), 0,
          "the start lies outside the keep-in area deflated by the radius " + v.radius() + " m"));
    }
    if (x[4][0] > 0 || y[4][0] > 0) {
      facts.add(new Fact("start-speed-over-limit", v.name(), 0,
          "the start velocity cannot be brought within the speed limit at the available acceleration"));
    }
    return new Reachability(keepIn, positions, velocities, facts);
  }

  /** The keep-in area shrunk by the vehicle's radius: the region its centre must stay in. */
  public static Shape deflatedArea(Scenario scenario) {
    return deflatedArea(scenario, scenario.vehicle());
  }

  /** The keep-in area shrunk by vehicle {@code v}'s radius. */
  public static Shape deflatedArea(Scenario scenario, Vehicle v) {
    return scenario.area().shape().inflate(-v.radius());
  }

  /**
   * Per-axis envelopes: rows 0/1 the position min/max, rows 2/3 the velocity min/max, row 4 element
   * 0 positive when the velocity interval ever became empty.
   */
  static double[][] axis(double p0, double v0, double vlo, double vhi, double alo, double ahi,
      double dt, int n) {
    double[][] out = new double[5][n + 1];
    out[0][0] = p0;
    out[1][0] = p0;
    out[2][0] = v0;
    out[3][0] = v0;
    for (int k = 1; k <= n; k++) {
      double hi = Math.min(vhi, out[3][k - 1] + dt * ahi);
      double lo = Math.max(vlo, out[2][k - 1] + dt * alo);
      if (lo > hi) {
        out[4][0] = 1;
        double mid = (lo + hi) / 2;
        lo = mid;
        hi = mid;
      }
      out[2][k] = lo;
      out[3][k] = hi;
      out[0][k] = out[0][k - 1] + dt * (out[2][k - 1] + lo) / 2;
      out[1][k] = out[1][k - 1] + dt * (out[3][k - 1] + hi) / 2;
    }
    return out;
  }

  public Bounds position(int k) {
    return positions.get(k);
  }

  public Bounds velocity(int k) {
    return velocities.get(k);
  }

  /** The point box of the start. */
  static Bounds point(Vec2 p) {
    return new Bounds(p.x(), p.y(), p.x(), p.y());
  }
}
