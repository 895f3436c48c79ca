package dev.skerry.compiler.plan;

import dev.skerry.compiler.model.Vec2;

/**
 * The state at step k of a plan, SI units: time k·Δt, position, velocity, and the acceleration
 * held from this step to the next (zero-order hold; zero at the last step). In 3-D also the
 * altitude, the climb rate and the vertical acceleration held to the next step (all 0 in 2-D).
 */
public record Sample(int step, double time, Vec2 position, Vec2 velocity, Vec2 accel, double altitude,
    double climb, double climbAccel) {

  /** A plan-view sample. */
  public Sample(int step, double time, Vec2 position, Vec2 velocity, Vec2 accel) {
    this(step, time, position, velocity, accel, 0, 0, 0);
  }
}
