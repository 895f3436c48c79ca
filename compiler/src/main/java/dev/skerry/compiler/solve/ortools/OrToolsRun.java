package dev.skerry.compiler.solve.ortools;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPSolverParameters;
import com.google.ortools.linearsolver.MPVariable;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import java.time.Duration;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One native solve: the model written into an {@code MPSolver}, solved on the calling thread, its
 * answer copied into plain Java ({@link Raw}) and the native solver freed. Another thread may
 * {@link #interrupt} it at any time, also before or after the solve, safely: interrupting and
 * freeing share a lock.
 */
final class OrToolsRun {
  /** CP-SAT scales continuous columns by this factor and rounds them to integers. */
  static final double CP_SAT_SCALING = 1e4;

  /**
   * CP-SAT gets each equality row as a range this wide on both sides: rounded to integers, an
   * equality with a fractional right-hand side became an empty domain and the whole model was
   * rejected as invalid (measured on every example). Half a unit of the scaled columns: the range
   * then holds one integer, and the values stay within the solution check's error tolerance.
   */
  static final double CP_SAT_EQUALITY_SLACK = 0.5 / CP_SAT_SCALING;

  private static final Pattern UNKNOWN_STATUS = Pattern.compile("No enum .* value (-?\\d+)");

  private final Engine engine;
  private final MPSolver solver;
  private final MPVariable[] vars;
  private final MPSolverParameters params = new MPSolverParameters();
  private final Object lock = new Object();
  private boolean freed;

  /**
   * What the solve left behind. {@code status} is null when MPSolver answered with a code its Java
   * enum lacks ({@code unknownCode}, e.g. 99 from HiGHS at a time limit without incumbent).
   */
  record Raw(
      MPSolver.ResultStatus status,
      int unknownCode,
      double bound,
      long nodes,
      double[] values,
      Duration solveTime) {}

  private OrToolsRun(Engine engine, MPSolver solver, MPVariable[] vars) {
    this.engine = engine;
    this.solver = solver;
    this.vars = vars;
  }

  /**
   * Writes the model into a new native solver, its objective replaced when {@code feasibilityOnly}.
   */
  static OrToolsRun create(Engine engine, Milp milp, boolean feasibilityOnly) {
    MPSolver solver = MPSolver.createSolver(engine.solverName());
    if (solver == null) {
      throw new IllegalStateException(
          "OR-Tools has no " + engine.solverName() + " engine in this build");
    }
    solver.suppressOutput();
    MPVariable[] vars = new MPVariable[milp.columnCount()];
    for (Variable v : milp.variables()) {
      vars[v.index()] = solver.makeVar(v.lower(), v.upper(), v.isInteger(), v.name());
    }
    for (Row r : milp.rows()) {
      boolean widen = engine == Engine.CP_SAT && r.lower() == r.upper();
      double slack = widen ? CP_SAT_EQUALITY_SLACK : 0;
      MPConstraint c = solver.makeConstraint(r.lower() - slack, r.upper() + slack, r.name());
      int[] cols = r.cols();
      double[] coefs = r.coefs();
      for (int i = 0; i < cols.length; i++) {
        c.setCoefficient(vars[cols[i]], coefs[i]);
      }
    }
    Objective objective = milp.objective();
    MPObjective target = solver.objective();
    if (!feasibilityOnly) {
      for (int i = 0; i < objective.cols().length; i++) {
        target.setCoefficient(vars[objective.cols()[i]], objective.coefs()[i]);
      }
      target.setOffset(objective.constant());
    }
    target.setOptimizationDirection(!objective.minimize());
    return new OrToolsRun(engine, solver, vars);
  }

  /** Applies the caller's options; what cannot be applied becomes a warning. */
  void configure(
      SolveOptions options,
      Duration timeLimit,
      Optional<double[]> hint,
      SolveResult.Builder warnings) {
    if (timeLimit != null) {
      solver.setTimeLimit(Math.max(1, timeLimit.toMillis()));
    }
    params.setDoubleParam(MPSolverParameters.DoubleParam.RELATIVE_MIP_GAP, options.relativeGap());
    if (options.threads() > 0 && !solver.setNumThreads(options.threads())) {
      warnings.warning(engine.id() + " does not accept a thread count; it uses its default");
    }
    switch (engine) {
      case HIGHS ->
          // Silences the banner HiGHS prints to standard output, and passes the gap, which HiGHS
          // ignores when it comes as an MPSolver parameter (measured: a 30% gap ran to the
          // optimum). MPSolver answers false to this string but applies it (measured); a
          // malformed one made the next solve fail, so it is kept to HiGHS's own option syntax.
          solver.setSolverSpecificParametersAsString(
              String.format(
                  Locale.ROOT, "output_flag=false\nmip_rel_gap=%.17g", options.relativeGap()));
      case CP_SAT -> {
        if (!solver.setSolverSpecificParametersAsString("mip_var_scaling: " + CP_SAT_SCALING)) {
          warnings.warning(
              "CP-SAT refused its scaling parameter; it may call feasible models infeasible");
        }
      }
      case SCIP ->
          // SCIP installs its own Ctrl-C handler, which swallowed the signal before the JVM saw it
          // (measured: `skerry solve` printed SCIP's "pressed CTRL-C" and ran on). Ours cancels
          // through interruptSolve instead, and keeps the best plan.
          solver.setSolverSpecificParametersAsString("misc/catchctrlc = FALSE");
      default -> {}
    }
    if (hint.isPresent()) {
      if (engine.takesHint()) {
        solver.setHint(vars, hint.get());
      } else {
        warnings.warning(
            engine.id() + " is never given a warm start: a hint crashed the JVM (measured)");
      }
    }
  }

  /** Solves, copies the answer out and frees the native solver. */
  Raw solve() {
    try {
      MPSolver.ResultStatus status;
      int unknown = -1;
      long start = System.nanoTime();
      try {
        status = solver.solve(params);
      } catch (IllegalArgumentException e) {
        Matcher m = UNKNOWN_STATUS.matcher(String.valueOf(e.getMessage()));
        if (!m.find()) {
          throw e;
        }
        status = null;
        unknown = Integer.parseInt(m.group(1));
      }
      boolean hasPoint =
          status == MPSolver.ResultStatus.OPTIMAL || status == MPSolver.ResultStatus.FEASIBLE;
      double[] values = null;
      double bound = Double.NaN;
      if (hasPoint) {
        values = new double[vars.length];
        for (int i = 0; i < vars.length; i++) {
          values[i] = vars[i].solutionValue();
        }
        // HiGHS's bound through MPSolver equals its objective even when it stopped at a 30% gap
        // (measured), so it is not reported.
        if (solver.isMip() && engine != Engine.HIGHS) {
          bound = solver.objective().bestBound();
        }
      }
      return new Raw(
          status, unknown, bound, nodes(), values, Duration.ofNanos(System.nanoTime() - start));
    } finally {
      free();
    }
  }

  private long nodes() {
    try {
      long n = solver.nodes();
      return n >= 0 ? n : -1;
    } catch (RuntimeException e) {
      return -1;
    }
  }

  /**
   * Asks the native solver to stop. Returns false when the engine cannot be interrupted (CBC and
   * HiGHS, measured) or the run has already ended.
   */
  boolean interrupt() {
    synchronized (lock) {
      return !freed && solver.interruptSolve();
    }
  }

  /** Frees the native solver of a run that will not be solved. */
  void close() {
    free();
  }

  private void free() {
    synchronized (lock) {
      if (!freed) {
        freed = true;
        solver.delete();
      }
    }
  }
}
