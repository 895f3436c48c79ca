package dev.skerry.compiler.verify;

import java.util.List;

/**
 * The verifier's findings. {@code minClearance} is the least zone clearance beyond the radius over
 * every vehicle. {@code speedExcess} and {@code accelExcess} are the largest ratio of the true
 * 2-norm to the limit minus one (negative when always below): the price of the polygon that stands
 * for the circle in the MILP; within tolerance they are not violations. {@code minSeparation} is
 * the least distance between two vehicles less their required separation, over every pair while
 * both fly (+∞ for a single vehicle).
 */
public record VerifyReport(List<Violation> violations, double minClearance, double speedExcess, double accelExcess,
    int segmentsChecked, double minSeparation) {
  public VerifyReport {
    violations = List.copyOf(violations);
  }

  /** A single vehicle's report: no pair to separate. */
  public VerifyReport(List<Violation> violations, double minClearance, double speedExcess, double accelExcess,
      int segmentsChecked) {
    this(violations, minClearance, speedExcess, accelExcess, segmentsChecked, Double.POSITIVE_INFINITY);
  }

  public boolean ok() {
    return violations.isEmpty();
  }

  /** True when the plan had at least two vehicles to keep apart. */
  public boolean hasPairs() {
    return Double.isFinite(minSeparation);
  }
}
