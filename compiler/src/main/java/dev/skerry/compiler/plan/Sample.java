package dev.skerry.compiler.plan;

import dev.skerry.compiler.model.Vec2;

/**
 * The state at step k of a plan, SI units: time k·Δt, position, velocity, and the acceleration
 * held from this step to the next (zero-order hold; zero at the last step).
 */
public record Sample(int step, double time, Vec2 position, Vec2 velocity, Vec2 accel) {}
