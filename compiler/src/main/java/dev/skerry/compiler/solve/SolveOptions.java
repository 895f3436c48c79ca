package dev.skerry.compiler.solve;

import java.time.Duration;
import java.util.Optional;

/**
 * What a caller asks of a solve: a time limit, a relative gap, a thread count, a warm start and a
 * cancel token. Immutable; each {@code with...} returns a copy.
 */
public final class SolveOptions {
  /**
   * The relative gap every backend is given unless the caller says otherwise, so that backends
   * agree on an optimum: ojAlgo's own default, 100 times tighter than MPSolver's (1e-4).
   */
  public static final double DEFAULT_RELATIVE_GAP = 1e-6;

  private final Duration timeLimit;
  private final double relativeGap;
  private final int threads;
  private final double[] warmStart;
  private final CancelToken cancel;
  private final Duration pointSuffices;

  private SolveOptions(
      Duration timeLimit, double relativeGap, int threads, double[] warmStart, CancelToken cancel) {
    this(timeLimit, relativeGap, threads, warmStart, cancel, null);
  }

  private SolveOptions(Duration timeLimit, double relativeGap, int threads, double[] warmStart, CancelToken cancel,
      Duration pointSuffices) {
    this.timeLimit = timeLimit;
    this.relativeGap = relativeGap;
    this.threads = threads;
    this.warmStart = warmStart;
    this.cancel = cancel;
    this.pointSuffices = pointSuffices;
  }

  /** No time limit, the default gap, the backend's threads, no warm start, a fresh cancel token. */
  public static SolveOptions defaults() {
    return new SolveOptions(null, DEFAULT_RELATIVE_GAP, 0, null, new CancelToken());
  }

  public SolveOptions withTimeLimit(Duration limit) {
    if (limit != null && (limit.isNegative() || limit.isZero())) {
      throw new IllegalArgumentException("time limit must be positive, got " + limit);
    }
    return new SolveOptions(limit, relativeGap, threads, warmStart, cancel, pointSuffices);
  }

  /** A relative gap {@code |incumbent − bound| / |incumbent|} at which the search may stop. */
  public SolveOptions withRelativeGap(double gap) {
    if (!(gap >= 0 && gap < 1)) {
      throw new IllegalArgumentException("relative gap must lie in [0, 1), got " + gap);
    }
    return new SolveOptions(timeLimit, gap, threads, warmStart, cancel, pointSuffices);
  }

  /** Threads the solver may use; 0 leaves the backend's default. */
  public SolveOptions withThreads(int count) {
    if (count < 0) {
      throw new IllegalArgumentException("thread count must not be negative, got " + count);
    }
    return new SolveOptions(timeLimit, relativeGap, count, warmStart, cancel, pointSuffices);
  }

  /**
   * A starting point by column index, or null for none. It need not be feasible: backends that
   * check it drop an infeasible one, others use it as a hint only.
   */
  public SolveOptions withWarmStart(double[] values) {
    return new SolveOptions(
        timeLimit, relativeGap, threads, values == null ? null : values.clone(), cancel, pointSuffices);
  }

  public SolveOptions withCancel(CancelToken token) {
    if (token == null) {
      throw new IllegalArgumentException("cancel token must not be null");
    }
    return new SolveOptions(timeLimit, relativeGap, threads, warmStart, token, pointSuffices);
  }

  /**
   * After {@code after} a feasible point is enough: the search may stop with the best it has, its
   * proof unfinished (null: search to the gap or the time limit). For a heuristic that needs points
   * more than proofs. The ojAlgo backend stops its search once the time has passed and it has a point
   * (a search with none goes on); OR-Tools' backends, which reach the gap quickly, ignore it.
   */
  public SolveOptions withPointSufficingAfter(Duration after) {
    return new SolveOptions(timeLimit, relativeGap, threads, warmStart, cancel, after);
  }

  /** See {@link #withPointSufficingAfter(Duration)}. */
  public Optional<Duration> pointSufficesAfter() {
    return Optional.ofNullable(pointSuffices);
  }

  public Optional<Duration> timeLimit() {
    return Optional.ofNullable(timeLimit);
  }

  public double relativeGap() {
    return relativeGap;
  }

  public int threads() {
    return threads;
  }

  public Optional<double[]> warmStart() {
    return Optional.ofNullable(warmStart).map(double[]::clone);
  }

  public CancelToken cancel() {
    return cancel;
  }
}
