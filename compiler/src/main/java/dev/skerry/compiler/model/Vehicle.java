package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/**
 * One vehicle, SI units: a double integrator (point mass, zero-order hold) starting at {@code
 * start} with velocity {@code startVelocity}; 2-norm limits on plan-view speed and acceleration,
 * each approximated in the MILP by a polygon of {@code sides} faces; {@code radius} inflates every
 * zone (a sphere in 3-D). {@code vertical} is the altitude channel of a 3-D scenario (null in 2-D).
 * {@code target} names the target this vehicle must reach; null lets the MILP assign one of the
 * scenario's targets (one vehicle per target).
 */
public record Vehicle(
    String name,
    Dynamics dynamics,
    Vec2 start,
    Vec2 startVelocity,
    double maxSpeed,
    double maxAccel,
    double radius,
    int sides,
    SourceRange range,
    Vertical vertical,
    String target) {

  /** A 2-D vehicle with no fixed target. */
  public Vehicle(String name, Dynamics dynamics, Vec2 start, Vec2 startVelocity, double maxSpeed, double maxAccel,
      double radius, int sides, SourceRange range) {
    this(name, dynamics, start, startVelocity, maxSpeed, maxAccel, radius, sides, range, null, null);
  }

  /**
   * The altitude channel, SI units: a separate double integrator z'' = a_z with |ż| ≤ {@code
   * maxClimb} and |a_z| ≤ {@code maxClimbAccel} (climb limits distinct from plan-view speed),
   * starting at {@code start} altitude with climb rate {@code startRate}; {@code limits} are the
   * vehicle's own altitude limits (null: only the keep-in volume's).
   */
  public record Vertical(double start, double startRate, double maxClimb, double maxClimbAccel, Span limits) {
    public Vertical withStart(double altitude, double rate) {
      return new Vertical(altitude, rate, maxClimb, maxClimbAccel, limits);
    }
  }

  public boolean threeD() {
    return vertical != null;
  }

  /** The same vehicle starting from another state (altitude and climb rate ignored in 2-D). */
  public Vehicle withStart(Vec2 position, Vec2 velocity, double altitude, double climbRate) {
    Vertical vert = vertical == null ? null : vertical.withStart(altitude, climbRate);
    return new Vehicle(name, dynamics, position, velocity, maxSpeed, maxAccel, radius, sides, range, vert, target);
  }

  public Vehicle withSides(int n) {
    return new Vehicle(name, dynamics, start, startVelocity, maxSpeed, maxAccel, radius, n, range, vertical, target);
  }

  public Vehicle withName(String newName) {
    return new Vehicle(newName, dynamics, start, startVelocity, maxSpeed, maxAccel, radius, sides, range, vertical,
        target);
  }

  public Vehicle withTarget(String targetName) {
    return new Vehicle(name, dynamics, start, startVelocity, maxSpeed, maxAccel, radius, sides, range, vertical,
        targetName);
  }

  /** Default number of faces of the norm polygon: worst-case error 1/cos(π/16) − 1 ≈ 2 %. */
  public static final int DEFAULT_SIDES = 16;

  public enum Dynamics {
    DOUBLE_INTEGRATOR("double_integrator");

    private final String keyword;

    Dynamics(String keyword) {
      this.keyword = keyword;
    }

    public String keyword() {
      return keyword;
    }
  }
}
