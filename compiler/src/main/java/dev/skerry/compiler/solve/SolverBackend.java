package dev.skerry.compiler.solve;

import dev.skerry.compiler.milp.Milp;

/**
 * One way of solving a {@link Milp}: says whether it can take a model, then solves it. A backend
 * never throws for a model it declared itself capable of; every outcome, failures included, comes
 * back as a {@link SolveResult} with a status.
 */
public interface SolverBackend {
  /** The id a user types to choose this backend, e.g. {@code scip}. */
  String id();

  /** Whether this backend can solve the model here and now, and if not, why. */
  Capability capableOf(Milp model);

  /**
   * Whether a warm start given in the options reaches the solver; false for a backend that drops
   * every one (e.g. where a hint is unsafe), so callers need not spend time finding one.
   */
  default boolean takesWarmStart() {
    return true;
  }

  /**
   * True for a backend whose branch and bound is too slow for the zone-by-zone warm start's MILPs
   * on models of a realistic size (ojAlgo): the planner looks for its start with the arrival scan,
   * whose MILPs have the arrival fixed and a few dozen face binaries.
   */
  default boolean branchesSlowly() {
    return false;
  }

  /** False for a backend that solves a transformed copy, so its values are only nearly feasible. */
  default boolean exact() {
    return true;
  }

  /**
   * Solves the model. Progress goes to the monitor from the backend's own threads; the monitor must
   * return quickly. The values of a result are checked against the model before it is returned (see
   * {@link SolutionCheck}).
   */
  SolveResult solve(Milp model, SolveOptions options, SolveMonitor monitor);

  default SolveResult solve(Milp model, SolveOptions options) {
    return solve(model, options, SolveMonitor.NONE);
  }
}
