package dev.skerry.compiler.plan;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.verify.VerifyReport;
import java.util.List;
import java.util.Optional;

/**
 * One planning run: the model solved, the solver's result, and — when it found a plan — one
 * trajectory per vehicle (in the scenario's order), the cluster boxes and the verifier's report on
 * the plan.
 */
public record PlanResult(Scenario scenario, Milp milp, SolveResult solve, List<Trajectory> trajectories,
    List<ClusterBox> clusters, VerifyReport verify, Optional<String> notice) {

  public PlanResult {
    trajectories = trajectories == null ? List.of() : List.copyOf(trajectories);
    clusters = clusters == null ? List.of() : List.copyOf(clusters);
  }

  public boolean hasPlan() {
    return !trajectories.isEmpty();
  }

  /** The first vehicle's trajectory, or null without a plan. */
  public Trajectory trajectory() {
    return trajectories.isEmpty() ? null : trajectories.get(0);
  }

  /**
   * The time term of the objective, unweighted, in seconds: the arrival time of a single vehicle;
   * for a fleet the sum of arrival times, or the latest arrival when the plan asks for it.
   */
  public double timeCost() {
    if (trajectories.isEmpty()) {
      return Double.NaN;
    }
    double sum = 0;
    double latest = 0;
    for (Trajectory t : trajectories) {
      sum += t.arrivalTime();
      latest = Math.max(latest, t.arrivalTime());
    }
    return scenario != null && scenario.plan().latestArrival() ? latest : sum;
  }

  /** 1-norm fuel Σ(|ax| + |ay| + |az|)·Δt up to arrival, summed over vehicles (unweighted). */
  public double fuelCost() {
    if (trajectories.isEmpty()) {
      return Double.NaN;
    }
    double sum = 0;
    for (Trajectory t : trajectories) {
      sum += t.fuel();
    }
    return sum;
  }

  /** True when a plan exists and the verifier found nothing wrong. */
  public boolean verified() {
    return verify != null && verify.ok();
  }
}
