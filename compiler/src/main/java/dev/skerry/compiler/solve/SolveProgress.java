package dev.skerry.compiler.solve;

import java.time.Duration;

/**
 * A progress event during a solve. {@code incumbent} (the objective of the best plan so far,
 * constant included) and {@code bound} are {@link Double#NaN} when the backend does not know them.
 */
public record SolveProgress(String backendId, Duration elapsed, double incumbent, double bound) {
  public boolean hasIncumbent() {
    return !Double.isNaN(incumbent);
  }

  public boolean hasBound() {
    return !Double.isNaN(bound);
  }
}
