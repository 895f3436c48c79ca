package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Area;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import java.time.Duration;
import java.util.List;

/** Scenarios built by hand (the parser is written elsewhere), SI units, no source ranges. */
public final class TestScenarios {
  private TestScenarios() {}

  public static Vehicle vehicle(Vec2 start, double vmax, double amax, double radius, int sides) {
    return new Vehicle("skiff", Vehicle.Dynamics.DOUBLE_INTEGRATOR, start, Vec2.ZERO, vmax, amax, radius, sides, null);
  }

  public static PlanOptions plan(double step, int horizon, double timeWeight, double fuelWeight) {
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, 0, SymmetryRule.NONE, 0,
        PlanOptions.DEFAULT_SOLVER, Duration.ofSeconds(30), 0.005, 0, true, true, null);
  }

  public static Shape box(double x1, double y1, double x2, double y2) {
    return new Shape.Box(new Bounds(x1, y1, x2, y2));
  }

  public static Zone zone(String name, Shape shape) {
    return new Zone(name, shape, null);
  }

  public static Target target(Shape region, boolean atRest) {
    return new Target("berth", region, atRest, null);
  }

  public static Scenario scenario(Vehicle v, Shape area, List<Zone> zones, Target t, List<Waypoint> wps,
      PlanOptions plan) {
    return new Scenario("test", List.of(v), new Area("harbour", area, null), zones, List.of(t), wps, plan);
  }

  /**
   * A 20 m × 12 m harbour, start (1, 6) at rest, target box around (18, 6) at rest, one box zone in
   * the middle and one polygon zone off the line: small enough to solve in a test.
   */
  public static Scenario harbour(int horizon) {
    Vehicle v = vehicle(new Vec2(1, 6), 3, 1.5, 0.25, 8);
    List<Zone> zones = List.of(
        zone("hull", box(8, 3, 11, 9)),
        zone("reef", new Shape.Polygon(List.of(new Vec2(13, 9), new Vec2(16, 9.5), new Vec2(15, 11.5)))));
    return scenario(v, box(0, 0, 20, 12), zones, target(box(17.5, 5.5, 18.5, 6.5), true), List.of(),
        plan(1.0, horizon, 1, 0.1));
  }

  /**
   * A 12 m × 8 m inlet: start (1, 4) at rest, a box zone across the direct line, a polygon zone
   * near the target box around (10.5, 4), at rest. Tiny enough for ojAlgo in a unit test.
   */
  public static Scenario inlet(int horizon, double fuelWeight) {
    Vehicle v = vehicle(new Vec2(1, 4), 3, 1.5, 0.25, 8);
    List<Zone> zones = List.of(
        zone("hull", box(5, 2, 7, 6)),
        zone("reef", new Shape.Polygon(List.of(new Vec2(8, 5.5), new Vec2(10, 6), new Vec2(9, 7.5)))));
    return scenario(v, box(0, 0, 12, 8), zones, target(box(10, 3.5, 11, 4.5), true), List.of(),
        plan(1.0, horizon, 1, fuelWeight));
  }
}
