package dev.skerry.compiler.solve;

/** Why the solver stopped. */
public enum StopReason {
  /** It finished: proved optimality, infeasibility or unboundedness, or failed. */
  FINISHED,
  /** The time limit of the {@link SolveOptions} was reached. */
  TIME_LIMIT,
  /** The {@link CancelToken} was cancelled. */
  CANCELLED,
  /** A limit inside the solver other than time (nodes, solutions, memory) stopped it. */
  SOLVER_LIMIT;

  /**
   * Why a solve that did not finish stopped: cancelled if its token says so, else its time limit if
   * it had one (the only limit a caller sets), else a limit of the solver's own.
   */
  public static StopReason ofEarlyStop(SolveOptions options) {
    if (options.cancel().isCancelled()) {
      return CANCELLED;
    }
    return options.timeLimit().isPresent() ? TIME_LIMIT : SOLVER_LIMIT;
  }
}
