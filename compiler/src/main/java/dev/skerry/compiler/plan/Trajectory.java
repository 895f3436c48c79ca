package dev.skerry.compiler.plan;

import java.util.List;

/**
 * A vehicle's path as samples 0..n at a fixed step. {@code arrival} is the step at which the
 * vehicle is in its target (the last sample when the plan ends there); {@code target} names the
 * target it reached (null when the scenario has one target).
 */
public record Trajectory(String vehicle, double step, List<Sample> samples, int arrival, String target) {
  public Trajectory {
    samples = List.copyOf(samples);
  }

  /** A trajectory whose target is the scenario's only one. */
  public Trajectory(String vehicle, double step, List<Sample> samples, int arrival) {
    this(vehicle, step, samples, arrival, null);
  }

  /** Arrival time in seconds. */
  public double arrivalTime() {
    return arrival * step;
  }

  /** 1-norm fuel Σ (|ax| + |ay| + |az|)·Δt over the steps before arrival (az = 0 in 2-D). */
  public double fuel() {
    double sum = 0;
    for (int k = 0; k < Math.min(arrival, samples.size() - 1); k++) {
      Sample s = samples.get(k);
      sum += (Math.abs(s.accel().x()) + Math.abs(s.accel().y()) + Math.abs(s.climbAccel())) * step;
    }
    return sum;
  }

  /** The samples up to and including arrival. */
  public List<Sample> flown() {
    return samples.subList(0, Math.min(samples.size(), arrival + 1));
  }
}
