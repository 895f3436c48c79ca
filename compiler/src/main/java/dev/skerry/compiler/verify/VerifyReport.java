package dev.skerry.compiler.verify;

import java.util.List;

/**
 * The verifier's findings. {@code speedExcess} and {@code accelExcess} are the largest ratio of
 * the true 2-norm to the limit minus one (negative when always below): the price of the polygon
 * that stands for the circle in the MILP; within tolerance they are not violations.
 */
public record VerifyReport(List<Violation> violations, double minClearance, double speedExcess, double accelExcess,
    int segmentsChecked) {
  public VerifyReport {
    violations = List.copyOf(violations);
  }

  public boolean ok() {
    return violations.isEmpty();
  }
}
