package dev.skerry.compiler.verify;

import dev.skerry.compiler.model.Area;
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
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

/**
 * Invented fleets built directly as model objects (the lowering for them is written elsewhere):
 * two vehicles `gull` and `tern`, radius 1 m, 5 m/s and 2 m/s², in a 110 m square; zone `block`
 * (20..30, 20..30), in 3-D from 0 to 50 m altitude; zone `mast` (60..62, 60..62), a column in 3-D;
 * targets `north_pad` around (80, 80) and `east_pad` around (80, 10); in 3-D the keep-in volume
 * reaches from 0 to 120 m and each vehicle climbs at most 3 m/s with 1 m/s².
 */
public final class FleetScenarios {
  private FleetScenarios() {}

  public static final double SEPARATION = 5;

  public static Scenario fleet(int dimensions) {
    boolean d3 = dimensions == 3;
    Vehicle.Vertical vert = d3 ? new Vehicle.Vertical(60, 0, 3, 1, new Span(5, 110)) : null;
    Vehicle gull = new Vehicle("gull", Vehicle.Dynamics.DOUBLE_INTEGRATOR, new Vec2(0, 40), Vec2.ZERO, 5, 2, 1, 16,
        null, vert, null);
    Vehicle tern = new Vehicle("tern", Vehicle.Dynamics.DOUBLE_INTEGRATOR, new Vec2(8, 32), Vec2.ZERO, 5, 2, 1, 16,
        null, d3 ? new Vehicle.Vertical(60, 0, 3, 1, null) : null, null);
    Area area = new Area("bay", new Shape.Box(new Bounds(-10, -10, 100, 100)), null, d3 ? new Span(0, 120) : null);
    List<Zone> zones = List.of(
        new Zone("block", new Shape.Box(new Bounds(20, 20, 30, 30)), null, d3 ? new Span(0, 50) : null),
        new Zone("mast", new Shape.Box(new Bounds(60, 60, 62, 62)), null, null));
    List<Target> targets = List.of(
        new Target("north_pad", new Shape.Box(new Bounds(79, 79, 81, 81)), false, null, d3 ? new Span(0, 20) : null),
        new Target("east_pad", new Shape.Box(new Bounds(79, 9, 81, 11)), false, null, null));
    PlanOptions plan = new PlanOptions(1, 40, 1, 0.1, 0, PlanOptions.SymmetryRule.NONE, 10, PlanOptions.DEFAULT_SOLVER,
        Duration.ofSeconds(10), 1e-4, 0, true, true, null).withSeparation(SEPARATION);
    return new Scenario(d3 ? "fleet_3d" : "fleet_2d", List.of(gull, tern), area, zones, targets, List.<Waypoint>of(),
        plan, dimensions);
  }

  /** A scenario with one more waypoint. */
  public static Scenario withWaypoint(Scenario s, Waypoint w) {
    List<Waypoint> ws = new ArrayList<>(s.waypoints());
    ws.add(w);
    return new Scenario(s.name(), s.vehicles(), s.area(), s.zones(), s.targets(), ws, s.plan(), s.dimensions());
  }

  /**
   * Straight legs at constant velocity between the given points (x, y) or (x, y, z), one sample per
   * {@code dt}; the velocity of the last sample is zero. Arrival is the last sample.
   */
  public static Trajectory legs(String vehicle, String target, double dt, double[]... points) {
    List<Sample> samples = new ArrayList<>();
    for (int k = 0; k < points.length; k++) {
      double[] p = points[k];
      double[] q = k + 1 < points.length ? points[k + 1] : p;
      double z = p.length > 2 ? p[2] : 0;
      double w = p.length > 2 ? (q[2] - p[2]) / dt : 0;
      samples.add(new Sample(k, k * dt, new Vec2(p[0], p[1]), new Vec2((q[0] - p[0]) / dt, (q[1] - p[1]) / dt),
          Vec2.ZERO, z, w, 0));
    }
    return new Trajectory(vehicle, dt, samples, points.length - 1, target);
  }

  public static double[] p(double... xyz) {
    return xyz;
  }
}
