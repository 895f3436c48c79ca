package dev.skerry.compiler.plan;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.ProgressTicker;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveProgress;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.verify.Verifier;
import dev.skerry.compiler.verify.VerifyReport;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Lower → solve → extract → verify, in one call. The verifier runs on every plan found. Used by
 * {@code skerry solve}, the closed loop and the tests.
 */
public final class Planner {
  /** The most time one restricted solve of the warm-start heuristic may take. */
  public static final Duration WARM_START_CAP = Duration.ofSeconds(10);

  private final Backends backends;
  private final boolean warmStart;

  /** A planner that finds a warm start ({@link WarmStarts}) for backends that take one. */
  public Planner(Backends backends) {
    this(backends, true);
  }

  public Planner(Backends backends, boolean warmStart) {
    this.backends = backends;
    this.warmStart = warmStart;
  }

  /** The same backends, with the warm-start heuristic on or off. */
  public Planner withWarmStart(boolean on) {
    return new Planner(backends, on);
  }

  public static Planner standard() {
    return new Planner(Backends.standard());
  }

  /** {@code run} with the time the warm-start search took taken off the limit, so the limit holds. */
  private static SolveOptions lessTime(SolveOptions run, SolveOptions options, WarmStarts.Start start) {
    Duration left = options.timeLimit().map(l -> l.minus(start.wallTime())).orElse(null);
    return left == null ? run : run.withTimeLimit(left.compareTo(MIN_TIME_LEFT) > 0 ? left : MIN_TIME_LEFT);
  }

  /**
   * The time the arrival scan may take: three quarters of the time limit, as the slow backend's own
   * search of the whole model seldom finds a plan that the scan did not (BENCHMARKS.md), or {@link
   * #SCAN_CAP} without a limit.
   */
  static Duration scanBudget(SolveOptions options) {
    return options.timeLimit().map(l -> l.multipliedBy(3).dividedBy(4)).orElse(SCAN_CAP);
  }

  /** The arrival scan's time when the solve has no time limit. */
  public static final Duration SCAN_CAP = Duration.ofSeconds(60);

  /** The least time the solve proper is left after a warm start that used up the limit. */
  private static final Duration MIN_TIME_LEFT = Duration.ofMillis(100);

  private static SolveResult withNotes(SolveResult r, List<String> notes) {
    if (notes.isEmpty()) {
      return r;
    }
    SolveResult.Builder b = r.toBuilder();
    notes.forEach(b::warning);
    return b.build();
  }

  /** {@code monitor} with {@code before} added to each event's elapsed time. */
  private static SolveMonitor after(Duration before, SolveMonitor monitor) {
    return p -> monitor.onProgress(new SolveProgress(p.backendId(), p.elapsed().plus(before), p.incumbent(),
        p.bound()));
  }

  /** Solver options from the plan block: time limit, gap and threads. */
  public static SolveOptions optionsOf(PlanOptions plan) {
    SolveOptions o = SolveOptions.defaults().withRelativeGap(plan.relativeGap());
    if (plan.timeLimit() != null) {
      o = o.withTimeLimit(plan.timeLimit());
    }
    if (plan.threads() > 0) {
      o = o.withThreads(plan.threads());
    }
    return o;
  }

  /**
   * Plans a checked scenario (it must have no errors) with the backend {@code solverId} (null for
   * the plan's own choice).
   *
   * @throws IllegalArgumentException for an unknown solver id
   * @throws IllegalStateException when no backend can run here
   */
  public PlanResult plan(Scenario s, String solverId, SolveOptions options, SolveMonitor monitor) {
    return plan(s, solverId, options, monitor, null);
  }

  /**
   * As {@link #plan(Scenario, String, SolveOptions, SolveMonitor)}, offering {@code hint} (may be
   * null) a first look at the lowered model: a point it returns that the model accepts is the warm
   * start (the closed loop hands in its previous plan shifted by one step); otherwise the
   * heuristic of {@link WarmStarts} runs as usual. The result's wall time includes the search for
   * a start (its own time is in the warm-start note).
   */
  public PlanResult plan(Scenario s, String solverId, SolveOptions options, SolveMonitor monitor,
      java.util.function.Function<Milp, double[]> hint) {
    Lowering.Lowered lowered = Lowering.lowerWithLayout(s);
    Milp milp = lowered.milp();
    Backends.Choice choice = backends.choose(solverId == null ? s.plan().solver() : solverId, milp);
    SolverBackend backend = choice.backend();
    SolveOptions run = options;
    List<String> notes = new ArrayList<>();
    Duration searched = Duration.ZERO;
    if (hint != null && backend.takesWarmStart() && backend.exact() && options.warmStart().isEmpty()) {
      double[] given = hint.apply(milp);
      if (given != null && milp.maxViolation(given) <= 1e-6) {
        run = options.withWarmStart(given);
        notes.add("warm start: the previous plan shifted by one step");
      }
    }
    if (warmStart && backend.takesWarmStart() && backend.exact() && run.warmStart().isEmpty()) {
      // For a fleet the zone-by-zone heuristic keeps every separation binary in each restricted
      // solve and cost more than it saved (twin_skiffs: 12.2 s with it, 5.5 s without); planning the
      // vehicles one after another costs about one single-vehicle solve per vehicle instead.
      boolean scan = !s.fleet() && backend.branchesSlowly() && ArrivalScan.appliesToSomeTarget(milp);
      boolean grouped = scan && ClusterStarts.applies(s, lowered.layout().clusters(), milp);
      WarmStarts.Start start;
      // the search for a start can take most of the limit (ojAlgo): its time goes out as progress too
      try (ProgressTicker ticker = monitor == SolveMonitor.NONE ? null
          : new ProgressTicker(backend.id() + ", finding a start", monitor, ProgressTicker.DEFAULT_PERIOD)) {
        start = s.fleet() ? FleetStarts.find(s, milp, backend, options, WARM_START_CAP)
            : grouped ? ClusterStarts.find(s, lowered.layout().clusters(), milp, backend, options, scanBudget(options))
            : scan ? ArrivalScan.find(s, milp, backend, options, scanBudget(options))
            : WarmStarts.find(milp, backend, options, WARM_START_CAP);
      }
      searched = start.wallTime();
      monitor = after(searched, monitor);
      run = lessTime(start.found() ? options.withWarmStart(start.values()) : run, options, start);
      if (!start.found()) {
        notes.add("no warm start: " + start.reason());
      } else if (scan) {
        String how = !grouped ? "" : start.reason().isEmpty() ? " with the zones grouped into clusters first"
            : " (" + start.reason() + ")";
        notes.add(String.format(Locale.ROOT, "warm start: arrival scan%s, objective %.6g found in %.2f s"
            + " (%d small solves)", how, start.objective(), start.wallTime().toNanos() / 1e9, start.rounds()));
      } else if (s.fleet()) {
        notes.add(String.format(Locale.ROOT, "warm start: vehicles planned one after another, objective %.6g"
            + " in %.2f s", start.objective(), start.wallTime().toNanos() / 1e9));
      } else {
        notes.add(String.format(Locale.ROOT, "warm start: objective %.6g found in %.2f s (%d zones needed)",
            start.objective(), start.wallTime().toNanos() / 1e9, start.zonesUsed()));
      }
    }
    SolveResult result = withNotes(backend.solve(milp, run, monitor), notes);
    if (!searched.isZero()) {
      // the time a user waited (and the closed loop's compute time per step) includes the start's
      result = result.toBuilder().wallTime(result.wallTime().plus(searched)).build();
    }
    if (!result.status().hasSolution()) {
      return new PlanResult(s, milp, result, List.of(), List.of(), null, choice.notice());
    }
    double[] x = result.values();
    List<Trajectory> paths = PlanExtractor.trajectories(s, milp, x);
    List<ClusterBox> clusters = PlanExtractor.clusters(s, milp, x);
    VerifyReport report = Verifier.verify(s, paths);
    return new PlanResult(s, milp, result, paths, clusters, report, choice.notice());
  }
}
