package dev.skerry.compiler.plan;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.verify.VerifyReport;
import java.util.List;
import java.util.Optional;

/**
 * One planning run: the model solved, the solver's result, and — when it found a plan — the
 * trajectory, the cluster boxes and the verifier's report on the plan.
 */
public record PlanResult(Scenario scenario, Milp milp, SolveResult solve, Trajectory trajectory,
    List<ClusterBox> clusters, VerifyReport verify, Optional<String> notice) {

  public PlanResult {
    clusters = clusters == null ? List.of() : List.copyOf(clusters);
  }

  public boolean hasPlan() {
    return trajectory != null;
  }

  /** Arrival time in seconds (the time term of the objective, unweighted). */
  public double timeCost() {
    return trajectory == null ? Double.NaN : trajectory.arrivalTime();
  }

  /** 1-norm fuel Σ(|ax| + |ay|)·Δt up to arrival (unweighted). */
  public double fuelCost() {
    return trajectory == null ? Double.NaN : trajectory.fuel();
  }

  /** True when a plan exists and the verifier found nothing wrong. */
  public boolean verified() {
    return verify != null && verify.ok();
  }
}
