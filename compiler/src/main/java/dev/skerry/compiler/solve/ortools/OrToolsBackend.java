package dev.skerry.compiler.solve.ortools;

import com.google.ortools.init.CppBridge;
import com.google.ortools.linearsolver.MPSolver;
import dev.skerry.compiler.milp.Milp;
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
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

/**
 * Solves through OR-Tools' {@code MPSolver} with one {@link Engine}.
 *
 * <p>The native solve runs on a worker thread while the calling thread keeps the deadline and
 * watches the cancel token. The time limit is handed to the engine; should the engine overrun it by
 * {@link #GRACE}, or be cancelled, it is interrupted. SCIP and CP-SAT stop when interrupted; CBC
 * and HiGHS cannot be (measured), so then the call returns at once with NO_SOLUTION_FOUND and the
 * engine runs on in the background until its own time limit, or the JVM's end, then frees itself.
 */
public final class OrToolsBackend implements SolverBackend {
  /** How far past its time limit an engine may run before it is interrupted or left behind. */
  static final Duration GRACE = Duration.ofSeconds(1);

  private static final Duration POLL = Duration.ofMillis(20);

  private static final Map<Engine, Capability> ENGINES = new ConcurrentHashMap<>();
  private static boolean loggingReady;

  private final Engine engine;
  private final Duration tick;

  public OrToolsBackend(Engine engine) {
    this(engine, ProgressTicker.DEFAULT_PERIOD);
  }

  public OrToolsBackend(Engine engine, Duration tick) {
    this.engine = engine;
    this.tick = tick;
  }

  @Override
  public String id() {
    return engine.id();
  }

  @Override
  public boolean takesWarmStart() {
    return engine.takesHint();
  }

  @Override
  public boolean exact() {
    return engine.exact();
  }

  public Engine engine() {
    return engine;
  }

  @Override
  public Capability capableOf(Milp model) {
    OrToolsNatives.Status natives = loadNatives();
    if (!natives.loaded()) {
      return Capability.no(natives.failure());
    }
    return ENGINES.computeIfAbsent(engine, OrToolsBackend::probe);
  }

  /** Whether this OR-Tools build has the engine: asked once per engine and JVM. */
  private static Capability probe(Engine engine) {
    MPSolver solver = MPSolver.createSolver(engine.solverName());
    if (solver == null) {
      return Capability.no("OR-Tools has no " + engine.solverName() + " engine in this build");
    }
    solver.delete();
    return Capability.yes();
  }

  private static synchronized OrToolsNatives.Status loadNatives() {
    boolean first = !loggingReady;
    OrToolsNatives.Status status = OrToolsNatives.load();
    if (first && status.loaded()) {
      try {
        // Without it, OR-Tools' C++ logging prints a warning about itself on the first message.
        CppBridge.initLogging("skerry");
      } catch (RuntimeException | UnsatisfiedLinkError e) {
        // logging stays as it was: a cosmetic loss only
      }
      loggingReady = true;
    }
    return status;
  }

  @Override
  public SolveResult solve(Milp milp, SolveOptions options, SolveMonitor monitor) {
    long start = System.nanoTime();
    SolveResult.Builder result = SolveResult.builder(id(), SolveStatus.ERROR);
    Capability capability = capableOf(milp);
    if (!capability.capable()) {
      return result
          .message(capability.reason())
          .wallTime(Duration.ofNanos(System.nanoTime() - start))
          .build();
    }
    try (ProgressTicker ticker = new ProgressTicker(id(), monitor, tick)) {
      Optional<double[]> hint = WarmStart.prepare(milp, options, result);
      Attempt attempt =
          attempt(milp, options, options.timeLimit().orElse(null), hint, false, ticker, result);
      describe(attempt, options, result);
      if (engine == Engine.HIGHS
          && result.status() == SolveStatus.INFEASIBLE
          && attempt.raw() != null
          && attempt.raw().status() == MPSolver.ResultStatus.INFEASIBLE
          && ObjectiveBound.mayBeUnbounded(milp)) {
        tellInfeasibleFromUnbounded(milp, options, ticker, result);
      }
      if (!engine.exact() && result.status().hasSolution()) {
        result
            .approximate(true)
            .message(
                String.format(
                    Locale.ROOT,
                    "approximate: CP-SAT solved a copy with continuous columns scaled by %.0f and"
                        + " rounded, so its optimum may differ slightly from the exact one",
                    OrToolsRun.CP_SAT_SCALING));
      }
      if (ticker.monitorFailure() != null) {
        result.warning(ticker.monitorFailure());
      }
    } catch (RuntimeException e) {
      result.status(SolveStatus.ERROR).message(id() + " failed: " + e);
    }
    result.wallTime(Duration.ofNanos(System.nanoTime() - start));
    return SolutionCheck.apply(milp, result.build());
  }

  /** One native solve as seen from the caller: its answer, or how it was left. */
  private record Attempt(
      OrToolsRun.Raw raw,
      StopReason leftBehind,
      Throwable failure,
      boolean interrupted,
      boolean started) {
    static Attempt finished(OrToolsRun.Raw raw, boolean interrupted) {
      return new Attempt(raw, null, null, interrupted, true);
    }

    static Attempt failed(Throwable failure) {
      return new Attempt(null, null, failure, false, true);
    }

    static Attempt leftBehind(StopReason why) {
      return new Attempt(null, why, null, false, true);
    }

    static Attempt cancelledBeforeStart() {
      return new Attempt(null, StopReason.CANCELLED, null, false, false);
    }
  }

  private Attempt attempt(
      Milp milp,
      SolveOptions options,
      Duration limit,
      Optional<double[]> hint,
      boolean feasibilityOnly,
      ProgressTicker ticker,
      SolveResult.Builder warnings) {
    OrToolsRun run = OrToolsRun.create(engine, milp, feasibilityOnly);
    try {
      run.configure(options, limit, hint, warnings);
    } catch (RuntimeException e) {
      run.close();
      throw e;
    }
    CompletableFuture<OrToolsRun.Raw> future = new CompletableFuture<>();
    Thread worker =
        new Thread(
            () -> {
              try {
                future.complete(run.solve());
              } catch (RuntimeException | Error e) {
                future.completeExceptionally(e);
              }
            },
            "skerry-" + id() + "-solve");
    worker.setDaemon(true);
    CancelToken cancel = options.cancel();
    if (cancel.isCancelled()) {
      run.close();
      return Attempt.cancelledBeforeStart();
    }
    Duration started = ticker.elapsed();
    boolean interrupted = false;
    long stopAskedAt = -1;
    try (CancelToken.Registration ignored = cancel.onCancel(run::interrupt)) {
      worker.start();
      while (true) {
        try {
          return Attempt.finished(future.get(POLL.toMillis(), TimeUnit.MILLISECONDS), interrupted);
        } catch (ExecutionException e) {
          return Attempt.failed(e.getCause());
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
          cancel.cancel();
        } catch (TimeoutException stillRunning) {
          Duration running = ticker.elapsed().minus(started);
          boolean overran = limit != null && running.compareTo(limit.plus(GRACE)) > 0;
          if (!cancel.isCancelled() && !overran) {
            continue;
          }
          // Asked on every poll: an engine may refuse an interrupt until its search has begun.
          interrupted |= run.interrupt();
          if (stopAskedAt < 0) {
            stopAskedAt = System.nanoTime();
          }
          boolean waitedEnough = System.nanoTime() - stopAskedAt > GRACE.toNanos();
          boolean giveUp =
              engine.interruptible() ? waitedEnough : cancel.isCancelled() || waitedEnough;
          if (giveUp) {
            StopReason why = cancel.isCancelled() ? StopReason.CANCELLED : StopReason.TIME_LIMIT;
            return Attempt.leftBehind(why);
          }
        }
      }
    }
  }

  private void describe(Attempt attempt, SolveOptions options, SolveResult.Builder result) {
    if (attempt.failure() != null) {
      result.status(SolveStatus.ERROR).message(id() + " failed: " + attempt.failure());
      return;
    }
    if (!attempt.started()) {
      result
          .status(SolveStatus.NO_SOLUTION_FOUND)
          .stopReason(StopReason.CANCELLED)
          .message("cancelled before " + id() + " started");
      return;
    }
    if (attempt.leftBehind() != null) {
      String why =
          engine.interruptible()
              ? " did not stop within " + GRACE.toMillis() + " ms of being interrupted"
              : " cannot be interrupted";
      result
          .status(SolveStatus.NO_SOLUTION_FOUND)
          .stopReason(attempt.leftBehind())
          .message(id() + why + "; it was left to finish in the background and its answer is lost");
      return;
    }
    OrToolsRun.Raw raw = attempt.raw();
    boolean stopped =
        attempt.interrupted() || options.cancel().isCancelled() || options.timeLimit().isPresent();
    result.nodes(raw.nodes());
    if (raw.status() == null) {
      if (stopped) {
        result.status(SolveStatus.NO_SOLUTION_FOUND).stopReason(StopReason.ofEarlyStop(options));
      } else {
        result
            .status(SolveStatus.ERROR)
            .message(
                id()
                    + " ended with a status MPSolver does not know (code "
                    + raw.unknownCode()
                    + ")");
      }
      return;
    }
    switch (raw.status()) {
      case OPTIMAL -> result.status(SolveStatus.OPTIMAL);
      case FEASIBLE ->
          result.status(SolveStatus.FEASIBLE).stopReason(StopReason.ofEarlyStop(options));
      case INFEASIBLE -> {
        // CBC under any time limit has answered INFEASIBLE of feasible models, at the limit and
        // (measured in a 0.1 s test) well before it; only an unlimited CBC run is believed.
        boolean limitedCbc = engine == Engine.CBC && options.timeLimit().isPresent();
        if (atTimeLimit(raw, options) || limitedCbc) {
          result
              .status(SolveStatus.NO_SOLUTION_FOUND)
              .stopReason(StopReason.ofEarlyStop(options))
              .warning(
                  id()
                      + " said infeasible under a time limit; not trusted, since CBC has said so of"
                      + " feasible models (measured)");
        } else {
          result.status(SolveStatus.INFEASIBLE);
        }
      }
      case UNBOUNDED -> result.status(SolveStatus.UNBOUNDED);
      case NOT_SOLVED, ABNORMAL -> {
        if (stopped) {
          result.status(SolveStatus.NO_SOLUTION_FOUND).stopReason(StopReason.ofEarlyStop(options));
        } else {
          result
              .status(SolveStatus.ERROR)
              .message(id() + " ended abnormally (" + raw.status() + ")");
        }
      }
      case MODEL_INVALID ->
          result.status(SolveStatus.ERROR).message(id() + " rejected the model as invalid");
    }
    if (raw.values() != null) {
      result.values(raw.values()).bestBound(raw.bound());
    }
  }

  /** Whether the native solve ran up to its time limit (within 10%), or was interrupted. */
  private static boolean atTimeLimit(OrToolsRun.Raw raw, SolveOptions options) {
    return options.cancel().isCancelled()
        || options
            .timeLimit()
            .map(limit -> raw.solveTime().toNanos() >= 0.9 * limit.toNanos())
            .orElse(false);
  }

  /**
   * HiGHS reports infeasible-or-unbounded as INFEASIBLE (measured). When the objective may be
   * unbounded, the model is solved again without an objective: a feasible point then means
   * unbounded.
   */
  private void tellInfeasibleFromUnbounded(
      Milp milp, SolveOptions options, ProgressTicker ticker, SolveResult.Builder result) {
    Duration limit = options.timeLimit().map(l -> l.minus(ticker.elapsed())).orElse(null);
    if (limit != null && (limit.isNegative() || limit.isZero())) {
      result.warning("HiGHS said infeasible; no time was left to rule out an unbounded objective");
      return;
    }
    Attempt check = attempt(milp, options, limit, Optional.empty(), true, ticker, result);
    MPSolver.ResultStatus status = check.raw() == null ? null : check.raw().status();
    if (status == MPSolver.ResultStatus.OPTIMAL || status == MPSolver.ResultStatus.FEASIBLE) {
      result
          .status(SolveStatus.UNBOUNDED)
          .message(
              "HiGHS said infeasible, but the model has a feasible point: the objective is"
                  + " unbounded");
    } else if (status != MPSolver.ResultStatus.INFEASIBLE) {
      result.warning(
          "HiGHS said infeasible; the check for an unbounded objective was inconclusive");
    }
  }
}
