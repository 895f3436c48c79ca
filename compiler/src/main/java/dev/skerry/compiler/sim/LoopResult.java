package dev.skerry.compiler.sim;

import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.verify.VerifyReport;
import java.util.List;

/**
 * A closed-loop run: every iteration, the paths actually flown (one per vehicle, in the scenario's
 * order), why the loop stopped, the first iteration's predicted paths, and the verifier's report on
 * the flown paths.
 */
public record LoopResult(List<Iteration> iterations, List<Trajectory> flownPaths, List<Trajectory> firstPredictions,
    Stop stop, double flownTime, double flownFuel, double flownCost, VerifyReport verify) {

  public LoopResult {
    iterations = List.copyOf(iterations);
    flownPaths = List.copyOf(flownPaths);
    firstPredictions = firstPredictions == null ? List.of() : List.copyOf(firstPredictions);
  }

  /** The first vehicle's flown path. */
  public Trajectory flown() {
    return flownPaths.get(0);
  }

  /** The first vehicle's first predicted path, or null when no iteration found a plan. */
  public Trajectory firstPrediction() {
    return firstPredictions.isEmpty() ? null : firstPredictions.get(0);
  }

  /** Why the loop ended. */
  public enum Stop {
    ARRIVED("arrived at the target"),
    LIMIT("reached the closed-loop limit before arriving"),
    NO_PLAN("an iteration found no plan and the previous plan ran out");

    private final String words;

    Stop(String words) {
      this.words = words;
    }

    public String words() {
      return words;
    }
  }

  public double totalSeconds() {
    return iterations.stream().mapToDouble(Iteration::seconds).sum();
  }

  public double worstSeconds() {
    return iterations.stream().mapToDouble(Iteration::seconds).max().orElse(0);
  }

  public double meanSeconds() {
    return iterations.isEmpty() ? 0 : totalSeconds() / iterations.size();
  }

  public long largestBinaries() {
    return iterations.stream().mapToLong(Iteration::binaries).max().orElse(0);
  }
}
