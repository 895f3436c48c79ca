package dev.skerry.compiler.solve.ojalgo;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.IncumbentFixing;
import dev.skerry.compiler.milp.Reduction;
import dev.skerry.compiler.solve.CancelToken;
import dev.skerry.compiler.solve.Capability;
import dev.skerry.compiler.solve.ObjectiveBound;
import dev.skerry.compiler.solve.ProgressTicker;
import dev.skerry.compiler.solve.SolutionCheck;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.SolverBackend;
import dev.skerry.compiler.solve.StopReason;
import dev.skerry.compiler.solve.WarmStart;
import java.time.Duration;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.integer.IntegerStrategy;
import org.ojalgo.type.context.NumberContext;

/**
 * Solves with ojAlgo, pure Java: always available, much slower than the OR-Tools engines on models
 * with many binaries (see SOLVERS.md).
 *
 * <p>What it does about ojAlgo's traps, each measured on our formulation:
 *
 * <ul>
 *   <li>ojAlgo gets the model with its fixed columns and one-column rows taken out ({@link
 *       Reduction}, exact); the values it returns are expanded back. The zone-by-zone warm start
 *       fixes most face binaries, and ojAlgo's simplex pays for every column and row: the harbour
 *       example's zone-free LP took 0.65 s reduced against 1.41 s as lowered (one run each).
 *   <li>Its presolvers are cleared (once, JVM-wide: {@code clearPresolvers} is static). On the
 *       72-binary test hop the median of five runs was 5.8 s cleared against 7.7 s by default
 *       (single runs vary by half); and its exact presolve has called a feasible big-M model
 *       infeasible when an M equalled a bound exactly (SOLVERS.md).
 *   <li>A warm start is given by setting every variable's value; ojAlgo checks it and takes it as
 *       its first incumbent only if it is feasible. With the optimum as start, the hop took 3.1 to
 *       3.5 s instead of about 9. A start the model accepts also fixes, before the search, the
 *       integer columns that alone would cost more than it ({@link IncumbentFixing}): the arrival
 *       steps whose time exceeds the start's whole cost. The full ridge example went from 71 s to
 *       42 s to a proven optimum (one run each).
 *   <li>ojAlgo checks its time limit only between branch-and-bound nodes, so the solve runs on a
 *       worker thread and this class keeps its own deadline. At the time limit, or on cancel, the
 *       limit in ojAlgo's options is set to zero: ojAlgo then stops at its next node and returns
 *       its best incumbent itself (measured: within 0.1 s). If it has not returned a grace period
 *       later (a single long node), the worker is left to finish in the background and the result
 *       is NO_SOLUTION_FOUND. ojAlgo 56 offers no public way to read its incumbent while it runs
 *       (it is a private field of the solver the model creates internally), so none can be
 *       returned then, except the warm start (below).
 *   <li>Progress events carry each new incumbent's objective as ojAlgo finds it, and the root LP's
 *       objective as the bound, seen by wrapping ojAlgo's own branching strategy ({@link
 *       ProgressStrategy}).
 *   <li>Its INFEASIBLE is no proof once a limit has stopped it. ojAlgo 56.1.1's branch and bound
 *       prunes every node whose LP did not end OPTIMAL as if that LP were infeasible, and an LP cut
 *       short by the time limit (or by a cancel, which sets the limit to zero) ends FEASIBLE or
 *       UNEXPLORED. When that happens at the root, or to the last open node, no node is left, no
 *       incumbent exists, and the search ends normally: ojAlgo answers INFEASIBLE for a feasible
 *       model (measured: the full harbour example at a 9 s limit, the zone-free harbour model the
 *       warm-start heuristic solves at a 1 s limit). So an INFEASIBLE that comes back after the
 *       limit or a cancel is reported as no plan found, with a warning. No ojAlgo option avoids it:
 *       without a limit the trap is gone, but then the fallback could run for hours.
 *   <li>For the same reason its OPTIMAL is no proof once a limit or a cancel has stopped it: with
 *       an incumbent (a warm start) and every open node pruned that way, it ends OPTIMAL at a plan
 *       worse than the optimum (measured: the full harbour at 52.83, where 50.80 exists). Such an
 *       answer is reported as FEASIBLE, stopped by the limit, with a warning.
 *   <li>With a warm start that satisfies the model, a search that ends with nothing better (no
 *       plan, a wrong INFEASIBLE, a worse point) returns the warm start as FEASIBLE: a plan ojAlgo
 *       did not prove optimal is still a plan.
 * </ul>
 */
public final class OjAlgoBackend implements SolverBackend {
  public static final String ID = "ojalgo";

  /** How long after its deadline or a cancel ojAlgo may take to stop by itself. */
  static final Duration GRACE = Duration.ofSeconds(1);

  private static final Duration POLL = Duration.ofMillis(20);

  /** The largest violation of the model a start may have to count as a feasible point. */
  static final double FEASIBLE_START = 1e-6;

  static {
    ExpressionsBasedModel.clearPresolvers();
  }

  private final Duration tick;

  public OjAlgoBackend() {
    this(ProgressTicker.DEFAULT_PERIOD);
  }

  public OjAlgoBackend(Duration tick) {
    this.tick = tick;
  }

  @Override
  public String id() {
    return ID;
  }

  @Override
  public boolean branchesSlowly() {
    return true;
  }

  @Override
  public Capability capableOf(Milp model) {
    return Capability.yes();
  }

  @Override
  public SolveResult solve(Milp milp, SolveOptions options, SolveMonitor monitor) {
    long start = System.nanoTime();
    SolveResult.Builder result = SolveResult.builder(ID, SolveStatus.ERROR);
    try (ProgressTicker ticker = new ProgressTicker(ID, monitor, tick)) {
      Optional<double[]> warm = WarmStart.prepare(milp, options, result);
      // With a feasible start, the columns that alone would cost more than it are fixed before the
      // search (a start the model rejects is only a hint: nothing is fixed by it).
      Milp fixed = warm.filter(x -> milp.maxViolation(x) <= FEASIBLE_START)
          .map(x -> IncumbentFixing.apply(milp, milp.objective().value(x))).orElse(milp);
      Reduction reduction = Reduction.of(fixed);
      if (reduction.infeasibleRow() != null) {
        result
            .status(SolveStatus.INFEASIBLE)
            .stopReason(StopReason.FINISHED)
            .message(
                "row "
                    + reduction.infeasibleRow()
                    + " cannot hold once the fixed columns and one-column rows are taken out");
      } else if (reduction.reduced().columnCount() == 0) {
        result
            .status(SolveStatus.OPTIMAL)
            .stopReason(StopReason.FINISHED)
            .values(reduction.expand(new double[0]));
      } else {
        Milp reduced = reduction.reduced();
        ExpressionsBasedModel model = OjAlgoModels.of(reduced);
        configure(model, options, reduced, ticker);
        warm.ifPresent(x -> OjAlgoModels.setStart(model, reduction.restrict(x)));
        Outcome outcome = run(reduced, model, options, ticker);
        describe(reduced, outcome, result);
        crossCheckWithRelaxation(reduced, outcome, result);
        if (result.status().hasSolution()) {
          result.values(reduction.expand(result.values()));
        }
      }
      warm.ifPresent(x -> fallBackToStart(milp, x, result));
      if (ticker.monitorFailure() != null) {
        result.warning(ticker.monitorFailure());
      }
    } catch (RuntimeException e) {
      result.status(SolveStatus.ERROR).message("ojAlgo failed: " + e);
    }
    result.wallTime(Duration.ofNanos(System.nanoTime() - start));
    return SolutionCheck.apply(milp, result.build());
  }

  private static void configure(
      ExpressionsBasedModel model, SolveOptions options, Milp milp, ProgressTicker ticker) {
    options
        .timeLimit()
        .ifPresent(limit -> model.options.time_abort = abortMillis(limit));
    if (!milp.hasIntegers()) {
      return;
    }
    IntegerStrategy.ConfigurableStrategy strategy = IntegerStrategy.DEFAULT;
    if (options.threads() > 0) {
      int threads = options.threads();
      strategy = strategy.withParallelism(() -> threads);
    }
    strategy = strategy.withGapTolerance(gapContext(options.relativeGap()));
    double constant = milp.objective().constant();
    boolean minimise = milp.objective().minimize();
    strategy =
        strategy.withModelStrategyFactory(
            (m, s) -> new ProgressStrategy(m, s, ticker, constant, minimise));
    model.options.integer(strategy);
  }

  /**
   * ojAlgo's time limit in whole milliseconds, rounded up: ojAlgo's clock starts after ours, so when
   * ojAlgo stops on its own limit our elapsed time has reached the limit too, and {@link #run} knows
   * the answer came from a stopped search.
   */
  static long abortMillis(Duration limit) {
    long ms = limit.toMillis();
    return Math.max(1, limit.minusMillis(ms).isZero() ? ms : ms + 1);
  }

  /**
   * ojAlgo states its gap tolerance as a number of significant digits p, allowing a relative error
   * of 10^(1−p) (measured: p = 7 allows 1e-4 at 100). The p chosen allows at most the gap asked
   * for, down to 1e-15; the default gap 1e-6 gives ojAlgo's own default, p = 7.
   */
  static NumberContext gapContext(double gap) {
    int digits = gap <= 1e-15 ? 16 : 1 + (int) Math.ceil(-Math.log10(gap) - 1e-9);
    return NumberContext.of(Math.max(2, digits), 8);
  }

  /** What came back from the worker, or why nothing did. */
  record Outcome(
      Optimisation.Result result, Throwable failure, StopReason stopped, boolean abandoned) {}

  private Outcome run(
      Milp milp, ExpressionsBasedModel model, SolveOptions options, ProgressTicker ticker) {
    CompletableFuture<Optimisation.Result> future = new CompletableFuture<>();
    Thread worker =
        new Thread(
            () -> {
              try {
                future.complete(milp.objective().minimize() ? model.minimise() : model.maximise());
              } catch (RuntimeException | Error e) {
                future.completeExceptionally(e);
              }
            },
            "skerry-ojalgo-solve");
    worker.setDaemon(true);
    CancelToken cancel = options.cancel();
    long[] stopAskedAt = {-1};
    // a point suffices: stopped by this class once the time has passed and ojAlgo has an incumbent
    // (ojAlgo's own time_suffice also cuts short the node LPs of a search that has none yet, which
    // then ends INFEASIBLE: OjAlgoStoppedLpTest)
    boolean sufficed = false;
    boolean started = options.warmStart().isPresent();
    try (CancelToken.Registration ignored = cancel.onCancel(() -> model.options.time_abort = 0)) {
      worker.start();
      while (true) {
        try {
          Optimisation.Result r = future.get(POLL.toMillis(), TimeUnit.MILLISECONDS);
          boolean asked =
              stopAskedAt[0] >= 0 || cancel.isCancelled() || reached(options, ticker.elapsed());
          return new Outcome(r, null, asked ? stopReason(options, sufficed) : StopReason.FINISHED, false);
        } catch (ExecutionException e) {
          return new Outcome(null, e.getCause(), StopReason.FINISHED, false);
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
          cancel.cancel();
        } catch (TimeoutException stillRunning) {
          Duration elapsed = ticker.elapsed();
          boolean enough = (ticker.hasIncumbent() || started)
              && options.pointSufficesAfter().map(d -> elapsed.compareTo(d) >= 0).orElse(false);
          if ((reached(options, elapsed) || cancel.isCancelled() || enough) && stopAskedAt[0] < 0) {
            sufficed = enough && !reached(options, elapsed) && !cancel.isCancelled();
            model.options.time_abort = 0;
            stopAskedAt[0] = elapsed.toNanos();
          }
          if (stopAskedAt[0] >= 0 && elapsed.toNanos() - stopAskedAt[0] > GRACE.toNanos()) {
            return new Outcome(null, null, stopReason(options, sufficed), true);
          }
        }
      }
    }
  }

  /** Why a search this class stopped ended: its point sufficed, or the limit or a cancel. */
  private static StopReason stopReason(SolveOptions options, boolean sufficed) {
    return sufficed && !options.cancel().isCancelled() ? StopReason.SOLVER_LIMIT : StopReason.ofEarlyStop(options);
  }

  /**
   * Two answers of ojAlgo's branch and bound are wrong or vague on small models (measured): it ends
   * in state FAILED on a model whose LP relaxation is infeasible, and reports OPTIMAL at a finite
   * point of a model whose objective is unbounded. Both are settled by solving the LP relaxation:
   * if it is infeasible, so is the model; if it is unbounded and the model has a feasible point,
   * the model is unbounded too (for rational data: R. R. Meyer, On the existence of optimal
   * solutions to integer and mixed-integer programming problems, Mathematical Programming 7, 1974;
   * from memory).
   */
  private static void crossCheckWithRelaxation(
      Milp milp, Outcome outcome, SolveResult.Builder result) {
    if (!milp.hasIntegers() || outcome.result() == null) {
      return;
    }
    boolean unexplainedFailure =
        result.status() == SolveStatus.ERROR && outcome.stopped() == StopReason.FINISHED;
    boolean mayBeUnbounded = result.status().hasSolution() && ObjectiveBound.mayBeUnbounded(milp);
    // ojAlgo's own INFEASIBLE, even from a search no limit stopped, is not proof: it prunes every
    // node whose LP did not end OPTIMAL, failed ones included. On the full rock field it answered
    // INFEASIBLE in under 3 s (LP relaxation optimal, SCIP and cbc find plans): its model
    // simplification had fixed assignment binaries at 0 over a containment row 1e-14 short in exact
    // arithmetic (fixed in ClusterLowering). Only an infeasible LP relaxation confirms it.
    boolean unconfirmedInfeasible = result.status() == SolveStatus.INFEASIBLE;
    if (!unexplainedFailure && !mayBeUnbounded && !unconfirmedInfeasible) {
      return;
    }
    ExpressionsBasedModel relaxed = OjAlgoModels.of(milp);
    relaxed.relax();
    Optimisation.State lp =
        (milp.objective().minimize() ? relaxed.minimise() : relaxed.maximise()).getState();
    if (unconfirmedInfeasible) {
      if (lp != Optimisation.State.INFEASIBLE) {
        result
            .status(SolveStatus.NO_SOLUTION_FOUND)
            .stopReason(StopReason.SOLVER_LIMIT)
            .warning(
                "ojAlgo answered INFEASIBLE, but its LP relaxation is not infeasible ("
                    + lp
                    + ") and ojAlgo's search counts a node whose LP failed as infeasible: not"
                    + " taken as proof, reported as no plan found (another solver can confirm)");
      }
    } else if (unexplainedFailure && lp == Optimisation.State.INFEASIBLE) {
      result
          .status(SolveStatus.INFEASIBLE)
          .message("ojAlgo's search failed; its LP relaxation is infeasible, so the model is too");
    } else if (mayBeUnbounded && lp == Optimisation.State.UNBOUNDED) {
      result
          .status(SolveStatus.UNBOUNDED)
          .values(null)
          .message(
              "ojAlgo stopped at a feasible point, but the LP relaxation is unbounded: so is the"
                  + " model");
    }
  }

  /**
   * Returns the warm start {@code x} as a FEASIBLE plan when the model accepts it and ojAlgo's
   * answer is no better: no values (time limit, failure, or an INFEASIBLE the start refutes), or
   * values with a worse objective. An UNBOUNDED answer is kept (the start does not refute it).
   */
  static void fallBackToStart(Milp milp, double[] x, SolveResult.Builder result) {
    SolveStatus status = result.status();
    if (status == SolveStatus.UNBOUNDED || status == SolveStatus.OPTIMAL) {
      return;
    }
    if (!(milp.maxViolation(x) <= START_TOLERANCE)) {
      return;
    }
    double start = milp.objective().value(x);
    if (status.hasSolution()) {
      double found = milp.objective().value(result.values());
      boolean better = milp.objective().minimize() ? start < found : start > found;
      if (!better) {
        return;
      }
    }
    String was = status.name();
    result
        .status(SolveStatus.FEASIBLE)
        .values(x.clone())
        .warning(
            status == SolveStatus.INFEASIBLE
                ? "ojAlgo answered INFEASIBLE, but the warm start satisfies the model: returning"
                    + " the warm start (feasible, not proven optimal)"
                : "ojAlgo found nothing better than the warm start (its answer: "
                    + was
                    + "): returning the warm start (feasible, not proven optimal)");
    if (status == SolveStatus.INFEASIBLE || status == SolveStatus.ERROR) {
      result.stopReason(StopReason.SOLVER_LIMIT);
    }
  }

  /** The largest violation of the model a warm start may have to be returned as a plan. */
  static final double START_TOLERANCE = 1e-6;

  private static boolean reached(SolveOptions options, Duration elapsed) {
    return options.timeLimit().map(limit -> elapsed.compareTo(limit) >= 0).orElse(false);
  }

  /**
   * An answer of ojAlgo's that a stop makes no proof of (see the class comment): reported as {@code
   * status}, stopped for the stop's reason, with a warning saying why.
   */
  private static void noProofAfterStop(
      SolveResult.Builder result, Outcome outcome, String answered, SolveStatus status, String reportedAs) {
    result
        .status(status)
        .stopReason(outcome.stopped())
        .warning(
            "ojAlgo answered "
                + answered
                + " after it was stopped ("
                + outcome.stopped().name().toLowerCase(java.util.Locale.ROOT)
                + "); it drops a node whose LP the stop cut short as if infeasible, so that is no"
                + " proof: reported as "
                + reportedAs);
  }

  static void describe(Milp milp, Outcome outcome, SolveResult.Builder result) {
    if (outcome.abandoned()) {
      result
          .status(SolveStatus.NO_SOLUTION_FOUND)
          .stopReason(outcome.stopped())
          .message(
              "ojAlgo did not stop within "
                  + GRACE.toMillis()
                  + " ms of being asked; it finishes its current node in the background");
      return;
    }
    if (outcome.failure() != null) {
      result.status(SolveStatus.ERROR).message("ojAlgo failed: " + outcome.failure());
      return;
    }
    Optimisation.Result r = outcome.result();
    Optimisation.State state = r.getState();
    boolean stopped = outcome.stopped() != StopReason.FINISHED;
    switch (state) {
      case OPTIMAL, DISTINCT -> {
        if (stopped && milp.hasIntegers()) {
          // the same pruning as for INFEASIBLE below: nodes whose LP the stop cut short are dropped,
          // the tree empties, and ojAlgo calls its incumbent optimal (measured: the full harbour
          // with the arrival scan's start, "optimal" at 52.83 where 50.80 exists)
          noProofAfterStop(result, outcome, "OPTIMAL", SolveStatus.FEASIBLE, "feasible");
        } else {
          result.status(SolveStatus.OPTIMAL).stopReason(StopReason.FINISHED);
        }
      }
      case FEASIBLE, VALID, APPROXIMATE ->
          result
              .status(SolveStatus.FEASIBLE)
              .stopReason(stopped ? outcome.stopped() : StopReason.SOLVER_LIMIT);
      case INFEASIBLE -> {
        if (stopped) {
          // ojAlgo prunes nodes whose LP the limit cut short as infeasible: see the class comment
          noProofAfterStop(result, outcome, "INFEASIBLE", SolveStatus.NO_SOLUTION_FOUND, "no plan found");
        } else {
          result.status(SolveStatus.INFEASIBLE).stopReason(StopReason.FINISHED);
        }
      }
      case UNBOUNDED -> result.status(SolveStatus.UNBOUNDED).stopReason(StopReason.FINISHED);
      default -> {
        if (stopped) {
          result.status(SolveStatus.NO_SOLUTION_FOUND).stopReason(outcome.stopped());
        } else {
          result.status(SolveStatus.ERROR).message("ojAlgo ended in state " + state);
        }
      }
    }
    if (state == Optimisation.State.APPROXIMATE) {
      result.warning("ojAlgo reports its solution as approximate");
    }
    if (result.status().hasSolution()) {
      if (r.size() != milp.columnCount()) {
        result
            .status(SolveStatus.ERROR)
            .message(
                "ojAlgo returned " + r.size() + " values for " + milp.columnCount() + " columns");
        return;
      }
      double[] x = new double[milp.columnCount()];
      for (int i = 0; i < x.length; i++) {
        x[i] = r.doubleValue(i);
      }
      result.values(x);
    }
  }
}
