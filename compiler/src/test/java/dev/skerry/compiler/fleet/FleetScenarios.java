package dev.skerry.compiler.fleet;

import dev.skerry.compiler.model.Area;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Zone;
import java.time.Duration;
import java.util.List;

/** Fleet and 3-D scenarios built by hand, SI units, invented for the tests. */
final class FleetScenarios {
  private FleetScenarios() {}

  static Vehicle craft(String name, Vec2 start, String target) {
    return new Vehicle(name, Vehicle.Dynamics.DOUBLE_INTEGRATOR, start, Vec2.ZERO, 3, 1, 0.5, 8, null, null, target);
  }

  static Vehicle drone(String name, Vec2 start, double altitude, Span limits) {
    return new Vehicle(name, Vehicle.Dynamics.DOUBLE_INTEGRATOR, start, Vec2.ZERO, 4, 1.5, 0.5, 8, null,
        new Vehicle.Vertical(altitude, 0, 2, 1, limits), null);
  }

  static PlanOptions plan(double step, int horizon, double fuelWeight) {
    return new PlanOptions(step, horizon, 1, fuelWeight, 0, SymmetryRule.ORDERED, 0, PlanOptions.DEFAULT_SOLVER,
        Duration.ofSeconds(60), 1e-6, 1, true, true, null);
  }

  static Shape box(double x1, double y1, double x2, double y2) {
    return new Shape.Box(new Bounds(x1, y1, x2, y2));
  }

  static Target dock(String name, double x, double y) {
    return new Target(name, box(x - 0.5, y - 0.5, x + 0.5, y + 0.5), true, null);
  }

  /**
   * Two craft crossing head-on in an empty 30 m × 14 m basin: east starts at (2, 7) for the west
   * end's far dock, west at (28, 7) for the near one; their straight paths meet in the middle.
   */
  static Scenario headOn(double separation) {
    List<Vehicle> craft = List.of(craft("east", new Vec2(2, 7), "far"), craft("west", new Vec2(28, 7), "near"));
    return new Scenario("head-on", craft, new Area("basin", box(0, 0, 30, 14), null), List.of(),
        List.of(dock("far", 28, 7), dock("near", 2, 7)), List.of(), plan(1, 16, 0.1).withSeparation(separation));
  }

  /** The same basin with one craft alone (its own dock), for the solo optimum. */
  static Scenario solo(Scenario fleet, int i) {
    Vehicle v = fleet.vehicles().get(i);
    Target t = fleet.target(v.target());
    return new Scenario(fleet.name() + "-" + v.name(), List.of(v.withTarget(null)), fleet.area(), fleet.zones(),
        List.of(t), List.of(), fleet.plan(), fleet.dimensions());
  }

  /**
   * A 3-D ridge: a 40 m × 30 m survey block, keep-in volume 0–40 m, and a wall 8–12 m in x that
   * runs from y = 0 to y = 26 m and rises to 12 m; the drone starts at (2, 5) at 4 m altitude and
   * must reach (38, 5) at 4 m. Over the wall is shorter than round its end at y = 26.
   */
  static Scenario ridge(Span droneLimits) {
    Zone wall = new Zone("wall", box(8, 0, 12, 26), null, new Span(0, 12));
    Target pad = new Target("pad", box(37, 4, 39, 6), true, null, new Span(3, 5));
    return new Scenario("ridge", List.of(drone("kite", new Vec2(2, 5), 4, droneLimits)),
        new Area("block", box(0, 0, 40, 30), null, new Span(0, 40)), List.of(wall), List.of(pad), List.of(),
        plan(1, 24, 0.05), 3);
  }
}
