package dev.skerry.compiler.solve.ortools;

/**
 * The engines reached through OR-Tools' {@code MPSolver}, with what was measured about each on our
 * formulation (SOLVERS.md and this package's tests).
 */
public enum Engine {
  /** SCIP: the default; honours time limits, can be interrupted, uses a hint well. */
  SCIP("scip", "SCIP", true, true, true),
  /**
   * CBC: exact; cannot be interrupted through MPSolver (measured: interruptSolve returns false).
   */
  CBC("cbc", "CBC", true, true, false),
  /**
   * HiGHS: exact; a hint crashed the JVM (native SIGSEGV), so none is passed; cannot be
   * interrupted; reports an unbounded model as INFEASIBLE, which the backend checks; ignores
   * MPSolver's gap parameter, so the gap goes as its own option; its best bound is not reported
   * (all measured).
   */
  HIGHS("highs", "HIGHS", false, true, false),
  /**
   * CP-SAT: solves a copy of the model scaled to integers, so its optimum is approximate; without
   * scaling it called a feasible trajectory model INFEASIBLE (measured).
   */
  CP_SAT("cpsat", "CP_SAT", true, false, true);

  private final String id;
  private final String solverName;
  private final boolean takesHint;
  private final boolean exact;
  private final boolean interruptible;

  Engine(String id, String solverName, boolean takesHint, boolean exact, boolean interruptible) {
    this.id = id;
    this.solverName = solverName;
    this.takesHint = takesHint;
    this.exact = exact;
    this.interruptible = interruptible;
  }

  /** The backend id a user types. */
  public String id() {
    return id;
  }

  /** The name {@code MPSolver.createSolver} knows it by. */
  String solverName() {
    return solverName;
  }

  boolean takesHint() {
    return takesHint;
  }

  /**
   * Whether {@code MPSolver.interruptSolve} stops this engine (measured: SCIP and CP-SAT within 0.1
   * s; CBC and HiGHS refuse and run on).
   */
  boolean interruptible() {
    return interruptible;
  }

  /** False when the engine solves a transformed model and its optimum is only near ours. */
  public boolean exact() {
    return exact;
  }
}
