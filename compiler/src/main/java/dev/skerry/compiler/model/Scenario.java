package dev.skerry.compiler.model;

import java.util.List;

/**
 * A checked scenario, all quantities in SI units. Immutable: lowering and the closed loop derive
 * new scenarios (e.g. {@link #withStart}) instead of changing this one.
 */
public record Scenario(
    String name,
    List<Vehicle> vehicles,
    Area area,
    List<Zone> zones,
    List<Target> targets,
    List<Waypoint> waypoints,
    PlanOptions plan) {

  public Scenario {
    vehicles = List.copyOf(vehicles);
    zones = List.copyOf(zones);
    targets = List.copyOf(targets);
    waypoints = List.copyOf(waypoints);
  }

  /** The first vehicle (the single-vehicle formulation plans for it). */
  public Vehicle vehicle() {
    return vehicles.get(0);
  }

  /** The target of the first vehicle. */
  public Target target() {
    return targets.get(0);
  }

  public Scenario withPlan(PlanOptions newPlan) {
    return new Scenario(name, vehicles, area, zones, targets, waypoints, newPlan);
  }

  /** The same scenario with the first vehicle starting from another state. */
  public Scenario withStart(Vec2 position, Vec2 velocity) {
    Vehicle v = vehicle();
    Vehicle moved = new Vehicle(v.name(), v.dynamics(), position, velocity, v.maxSpeed(), v.maxAccel(),
        v.radius(), v.sides(), v.range());
    List<Vehicle> all = new java.util.ArrayList<>(vehicles);
    all.set(0, moved);
    return new Scenario(name, all, area, zones, targets, waypoints, plan);
  }
}
