package dev.skerry.compiler.model;

import java.util.ArrayList;
import java.util.List;

/**
 * A checked scenario, all quantities in SI units. Immutable: lowering and the closed loop derive
 * new scenarios (e.g. {@link #withStart}) instead of changing this one. {@code dimensions} is 2
 * (plan view) or 3 (plan view and altitude; every vehicle then has a {@link Vehicle.Vertical}).
 */
public record Scenario(
    String name,
    List<Vehicle> vehicles,
    Area area,
    List<Zone> zones,
    List<Target> targets,
    List<Waypoint> waypoints,
    PlanOptions plan,
    int dimensions) {

  public Scenario {
    vehicles = List.copyOf(vehicles);
    zones = List.copyOf(zones);
    targets = List.copyOf(targets);
    waypoints = List.copyOf(waypoints);
    if (dimensions != 2 && dimensions != 3) {
      throw new IllegalArgumentException("a scenario has 2 or 3 dimensions, not " + dimensions);
    }
  }

  /** A plan-view (2-D) scenario. */
  public Scenario(String name, List<Vehicle> vehicles, Area area, List<Zone> zones, List<Target> targets,
      List<Waypoint> waypoints, PlanOptions plan) {
    this(name, vehicles, area, zones, targets, waypoints, plan, 2);
  }

  public boolean threeD() {
    return dimensions == 3;
  }

  /** True when more than one vehicle is planned together. */
  public boolean fleet() {
    return vehicles.size() > 1;
  }

  /** The first vehicle (the one a single-vehicle scenario plans for). */
  public Vehicle vehicle() {
    return vehicles.get(0);
  }

  /** The first target (the one a single-vehicle scenario plans to). */
  public Target target() {
    return targets.get(0);
  }

  public Target target(String targetName) {
    for (Target t : targets) {
      if (t.name().equals(targetName)) {
        return t;
      }
    }
    return null;
  }

  /**
   * The targets vehicle {@code v} may end in: its own when it names one, else every target no
   * vehicle names (the MILP assigns one per vehicle).
   */
  public List<Target> candidateTargets(Vehicle v) {
    if (v.target() != null) {
      Target t = target(v.target());
      return t == null ? List.of() : List.of(t);
    }
    List<Target> free = new ArrayList<>();
    for (Target t : targets) {
      boolean named = false;
      for (Vehicle o : vehicles) {
        named |= t.name().equals(o.target());
      }
      if (!named) {
        free.add(t);
      }
    }
    return free;
  }

  /** Least centre distance between vehicles a and b: the plan's separation, at least their radii summed. */
  public double separation(Vehicle a, Vehicle b) {
    return Math.max(plan.separation(), a.radius() + b.radius());
  }

  public Scenario withPlan(PlanOptions newPlan) {
    return new Scenario(name, vehicles, area, zones, targets, waypoints, newPlan, dimensions);
  }

  public Scenario withVehicles(List<Vehicle> newVehicles) {
    return new Scenario(name, newVehicles, area, zones, targets, waypoints, plan, dimensions);
  }

  public Scenario withVehiclesAndTargets(List<Vehicle> newVehicles, List<Target> newTargets) {
    return new Scenario(name, newVehicles, area, zones, newTargets, waypoints, plan, dimensions);
  }

  /** The same scenario with the first vehicle starting from another plan-view state. */
  public Scenario withStart(Vec2 position, Vec2 velocity) {
    Vehicle v = vehicle();
    double z = v.vertical() == null ? 0 : v.vertical().start();
    double w = v.vertical() == null ? 0 : v.vertical().startRate();
    return withStart(0, position, velocity, z, w);
  }

  /** The same scenario with vehicle {@code i} starting from another state. */
  public Scenario withStart(int i, Vec2 position, Vec2 velocity, double altitude, double climbRate) {
    List<Vehicle> all = new ArrayList<>(vehicles);
    all.set(i, vehicles.get(i).withStart(position, velocity, altitude, climbRate));
    return withVehicles(all);
  }
}
