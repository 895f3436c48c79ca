package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;
import java.time.Duration;

/**
 * Planning options, SI units. {@code horizon} is a number of steps N (the vehicle's states are
 * p_0..p_N); {@code clusters} is 0 when zones are avoided one by one. For a fleet: {@code
 * separation} is the least centre-to-centre distance between two vehicles (0: the sum of their
 * radii), and {@code latestArrival} makes the time term the latest arrival (makespan) instead of
 * the sum of the vehicles' arrival times.
 */
public record PlanOptions(
    double step,
    int horizon,
    double timeWeight,
    double fuelWeight,
    int clusters,
    SymmetryRule symmetry,
    int closedLoopMax,
    String solver,
    Duration timeLimit,
    double relativeGap,
    int threads,
    boolean guard,
    boolean pruning,
    SourceRange range,
    double separation,
    boolean latestArrival) {

  /** Options of a single-vehicle plan: no separation distance, time summed over vehicles. */
  public PlanOptions(double step, int horizon, double timeWeight, double fuelWeight, int clusters,
      SymmetryRule symmetry, int closedLoopMax, String solver, Duration timeLimit, double relativeGap, int threads,
      boolean guard, boolean pruning, SourceRange range) {
    this(step, horizon, timeWeight, fuelWeight, clusters, symmetry, closedLoopMax, solver, timeLimit, relativeGap,
        threads, guard, pruning, range, 0, false);
  }

  public static final String DEFAULT_SOLVER = "default";

  /** How interchangeable clusters are told apart (see docs/language.md). */
  public enum SymmetryRule {
    /** No rule: any zone may join any cluster. */
    NONE("none"),
    /** Zone o (0-based) may join only clusters l ≤ o, and cluster l is used only if l−1 is. */
    ORDERED("ordered"),
    /** Cluster boxes are sorted by their lower x bound. */
    SORTED("sorted");

    private final String keyword;

    SymmetryRule(String keyword) {
      this.keyword = keyword;
    }

    public String keyword() {
      return keyword;
    }

    public static SymmetryRule fromKeyword(String word) {
      for (SymmetryRule r : values()) {
        if (r.keyword.equals(word)) {
          return r;
        }
      }
      return null;
    }
  }

  public boolean clustered() {
    return clusters > 0;
  }

  public PlanOptions withClusters(int count, SymmetryRule rule) {
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, count, rule, closedLoopMax, solver,
        timeLimit, relativeGap, threads, guard, pruning, range, separation, latestArrival);
  }

  public PlanOptions withHorizon(int steps) {
    return new PlanOptions(step, steps, timeWeight, fuelWeight, clusters, symmetry, closedLoopMax, solver,
        timeLimit, relativeGap, threads, guard, pruning, range, separation, latestArrival);
  }

  public PlanOptions withPruning(boolean on) {
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, clusters, symmetry, closedLoopMax, solver,
        timeLimit, relativeGap, threads, guard, on, range, separation, latestArrival);
  }

  public PlanOptions withClosedLoopMax(int iterations) {
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, clusters, symmetry, iterations, solver,
        timeLimit, relativeGap, threads, guard, pruning, range, separation, latestArrival);
  }

  public PlanOptions withGuard(boolean on) {
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, clusters, symmetry, closedLoopMax, solver,
        timeLimit, relativeGap, threads, on, pruning, range, separation, latestArrival);
  }

  public PlanOptions withSeparation(double distance) {
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, clusters, symmetry, closedLoopMax, solver,
        timeLimit, relativeGap, threads, guard, pruning, range, distance, latestArrival);
  }

  public PlanOptions withLatestArrival(boolean latest) {
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, clusters, symmetry, closedLoopMax, solver,
        timeLimit, relativeGap, threads, guard, pruning, range, separation, latest);
  }
}
