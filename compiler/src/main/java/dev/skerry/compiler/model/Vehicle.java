package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/**
 * One vehicle, SI units: a double integrator (point mass, zero-order hold) starting at {@code
 * start} with velocity {@code startVelocity}; 2-norm limits on speed and acceleration, each
 * approximated in the MILP by a polygon of {@code sides} faces; {@code radius} inflates every zone.
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
    SourceRange range) {

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
