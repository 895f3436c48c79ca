package dev.skerry.compiler.solve;

/** The outcome of a solve, in words a user of the planner understands. */
public enum SolveStatus {
  OPTIMAL("optimal: no better plan exists (within the gap tolerance)"),
  FEASIBLE("feasible: a plan was found, but the solver stopped before proving it the best"),
  INFEASIBLE("infeasible: no plan satisfies every constraint"),
  UNBOUNDED("unbounded: the objective can be improved without limit"),
  NO_SOLUTION_FOUND("no plan found before the solver stopped"),
  ERROR("error: the solver failed");

  private final String description;

  SolveStatus(String description) {
    this.description = description;
  }

  public String description() {
    return description;
  }

  /** True for the statuses that come with values for every column. */
  public boolean hasSolution() {
    return this == OPTIMAL || this == FEASIBLE;
  }
}
