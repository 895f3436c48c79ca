package dev.skerry.compiler.solve;

import dev.skerry.compiler.milp.Variable;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What a solve returns.
 *
 * @param backendId the backend that produced it
 * @param status the outcome
 * @param stopReason why the solver stopped
 * @param objective the objective at {@code values}, in the model's own sense with its constant; NaN
 *     without values
 * @param bestBound the best proven bound on the objective, constant included; NaN when unknown
 * @param gap {@code |objective − bestBound| / |objective|}; NaN when either is unknown
 * @param values one value per column, by column index; null when the solve has no values. An ERROR
 *     result may keep the values a backend returned, for diagnosis only
 * @param wallTime wall-clock time of the whole call, model translation included
 * @param nodes branch-and-bound nodes, or -1 when the backend does not say
 * @param maxViolation the largest violation of a bound, row or integrality at {@code values} (see
 *     {@link dev.skerry.compiler.milp.Milp#maxViolation}); NaN without values
 * @param approximate true when the backend solved a transformed model (e.g. scaled to integers), so
 *     the values are not exact for this one
 * @param message one line for a person: what happened and, when it failed, why
 * @param warnings things a user should know about this result, possibly empty
 */
public record SolveResult(
    String backendId,
    SolveStatus status,
    StopReason stopReason,
    double objective,
    double bestBound,
    double gap,
    double[] values,
    Duration wallTime,
    long nodes,
    double maxViolation,
    boolean approximate,
    String message,
    List<String> warnings) {

  public SolveResult {
    if (backendId == null || status == null || stopReason == null || wallTime == null) {
      throw new IllegalArgumentException(
          "a solve result needs a backend id, status, stop reason and time");
    }
    if (status.hasSolution() && values == null) {
      throw new IllegalArgumentException("a " + status + " result must carry values");
    }
    values = values == null ? null : values.clone();
    message = message == null ? "" : message;
    warnings = List.copyOf(warnings);
  }

  @Override
  public double[] values() {
    return values == null ? null : values.clone();
  }

  public boolean hasValues() {
    return values != null;
  }

  /** The value of one column; only for a result with values. */
  public double value(Variable v) {
    if (values == null) {
      throw new IllegalStateException("a " + status + " result has no values");
    }
    return values[v.index()];
  }

  /** One line for the command line, e.g. {@code scip: OPTIMAL objective 3.0437 in 1.7 s}. */
  public String summary() {
    StringBuilder s = new StringBuilder();
    s.append(backendId).append(": ").append(status);
    if (stopReason != StopReason.FINISHED) {
      s.append(" (")
          .append(stopReason.name().toLowerCase(Locale.ROOT).replace('_', ' '))
          .append(')');
    }
    if (!Double.isNaN(objective)) {
      s.append(String.format(Locale.ROOT, " objective %.6g", objective));
    }
    if (!Double.isNaN(gap) && status == SolveStatus.FEASIBLE) {
      s.append(String.format(Locale.ROOT, " gap %.3g%%", 100 * gap));
    }
    s.append(String.format(Locale.ROOT, " in %.2f s", wallTime.toNanos() / 1e9));
    if (!message.isEmpty()) {
      s.append(" - ").append(message);
    }
    return s.toString();
  }

  public Builder toBuilder() {
    Builder b = new Builder(backendId, status);
    b.stopReason = stopReason;
    b.objective = objective;
    b.bestBound = bestBound;
    b.values = values;
    b.wallTime = wallTime;
    b.nodes = nodes;
    b.maxViolation = maxViolation;
    b.approximate = approximate;
    b.message = message;
    b.warnings.addAll(warnings);
    return b;
  }

  public static Builder builder(String backendId, SolveStatus status) {
    return new Builder(backendId, status);
  }

  /** Collects the parts of a result; {@link #build} derives the gap. */
  public static final class Builder {
    private final String backendId;
    private SolveStatus status;
    private StopReason stopReason = StopReason.FINISHED;
    private double objective = Double.NaN;
    private double bestBound = Double.NaN;
    private double[] values;
    private Duration wallTime = Duration.ZERO;
    private long nodes = -1;
    private double maxViolation = Double.NaN;
    private boolean approximate;
    private String message = "";
    private final List<String> warnings = new ArrayList<>();

    private Builder(String backendId, SolveStatus status) {
      this.backendId = backendId;
      this.status = status;
    }

    public Builder status(SolveStatus s) {
      status = s;
      return this;
    }

    public Builder stopReason(StopReason r) {
      stopReason = r;
      return this;
    }

    public Builder objective(double v) {
      objective = v;
      return this;
    }

    public Builder bestBound(double v) {
      bestBound = v;
      return this;
    }

    public Builder values(double[] v) {
      values = v;
      return this;
    }

    public Builder wallTime(Duration d) {
      wallTime = d;
      return this;
    }

    public Builder nodes(long n) {
      nodes = n;
      return this;
    }

    public Builder maxViolation(double v) {
      maxViolation = v;
      return this;
    }

    public Builder approximate(boolean a) {
      approximate = a;
      return this;
    }

    public Builder message(String m) {
      message = m;
      return this;
    }

    public Builder warning(String w) {
      warnings.add(w);
      return this;
    }

    /** The values set so far, or null. */
    public double[] values() {
      return values;
    }

    public SolveStatus status() {
      return status;
    }

    public SolveResult build() {
      return new SolveResult(
          backendId,
          status,
          stopReason,
          objective,
          bestBound,
          relativeGap(objective, bestBound),
          values,
          wallTime,
          nodes,
          maxViolation,
          approximate,
          message,
          warnings);
    }
  }

  /**
   * {@code |objective − bound| / |objective|}, the definition OR-Tools documents for its relative
   * MIP gap; 0 when both are equal, infinite for a zero objective with a different bound.
   */
  static double relativeGap(double objective, double bound) {
    if (Double.isNaN(objective) || Double.isNaN(bound) || Double.isInfinite(bound)) {
      return Double.NaN;
    }
    double diff = Math.abs(objective - bound);
    if (diff == 0) {
      return 0;
    }
    return Math.abs(objective) == 0 ? Double.POSITIVE_INFINITY : diff / Math.abs(objective);
  }
}
