package dev.skerry.compiler.sim;

import dev.skerry.compiler.plan.ClusterBox;
import dev.skerry.compiler.solve.SolveStatus;
import java.util.List;

/**
 * One receding-horizon iteration: what was solved, how long it took, and the costs. {@code
 * predictedTotal} is the cost already flown plus the plan's remaining cost (NaN when the iteration
 * found no plan); {@code flownCost} is the cost flown after applying this iteration's input.
 */
public record Iteration(int index, SolveStatus status, double seconds, long binaries, double predictedTotal,
    double flownCost, boolean fallback, List<ClusterBox> clusters) {
  public Iteration {
    clusters = List.copyOf(clusters);
  }
}
