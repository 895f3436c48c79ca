package dev.skerry.compiler.plan;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * A cheap feasible point of a lowered model, to hand a backend as its warm start. Zones are added
 * lazily, with the same backend, reading the MILP by the origins the lowering gave its columns and
 * rows:
 *
 * <ol>
 *   <li>solve the zone-free model: every big-M avoidance row and cover row dropped and the face
 *       binaries fixed to 0 (arrival, waypoint and cluster integers kept);
 *   <li>find the zones (or cluster boxes) whose cover rows the point breaks — no face of theirs
 *       holds at some step — and solve again with those zones' rows put back;
 *   <li>repeat until the point clears every zone, then set each face binary from the point (the
 *       face with the largest margin holds) and hand it back.
 * </ol>
 *
 * Each solve has the binaries of the few zones near the path only, far fewer than the model, so
 * it is quick even for ojAlgo. A start is returned only when the whole model accepts it ({@link
 * Milp#maxViolation} within {@link #TOLERANCE}); any failure gives an empty result and a reason,
 * never an exception, so a bad start cannot break a solve. When the last restricted solve was
 * optimal, the start is optimal for the model too (it is optimal for a relaxation and feasible).
 */
public final class WarmStarts {
  /** The largest violation of the full model a start may have. */
  public static final double TOLERANCE = 1e-6;

  /** Restricted solves at most: each round puts back at least one zone. */
  public static final int MAX_ROUNDS = 8;

  /**
   * A start found, or why none was.
   *
   * @param values one value per column of the model, or null
   * @param objective the model's objective at the start, NaN without one
   * @param wallTime time spent on all rounds
   * @param rounds restricted solves run
   * @param zonesUsed zones (or cluster boxes) put back in the last round
   * @param reason why there is no start; with one, empty or a remark on how it was found
   */
  public record Start(double[] values, double objective, Duration wallTime, int rounds, int zonesUsed,
      String reason) {
    public boolean found() {
      return values != null;
    }
  }

  private WarmStarts() {}

  /** A start for {@code model} found with {@code backend}, each restricted solve capped at {@code cap}. */
  public static Start find(Milp model, SolverBackend backend, SolveOptions options, Duration cap) {
    long t0 = System.nanoTime();
    Set<String> active = new TreeSet<>();
    try {
      SolveOptions sub = options.withWarmStart(null).withTimeLimit(capped(options, cap));
      for (int round = 1; round <= MAX_ROUNDS; round++) {
        if (options.cancel().isCancelled()) {
          return none(t0, round - 1, active, "cancelled");
        }
        SolveResult r = backend.solve(restricted(model, active), sub);
        if (!r.status().hasSolution()) {
          return none(t0, round, active, "restricted model: " + r.summary());
        }
        double[] x = r.values();
        Set<String> broken = brokenZones(model, x);
        if (broken.isEmpty()) {
          setFaces(model, x);
          double violation = model.maxViolation(x);
          if (!(violation <= TOLERANCE)) {
            return none(t0, round, active, "the start violates the model by " + violation);
          }
          return new Start(x, model.objective().value(x), since(t0), round, active.size(), "");
        }
        active.addAll(broken);
      }
      return none(t0, MAX_ROUNDS, active, "zones still broken after " + MAX_ROUNDS + " rounds");
    } catch (RuntimeException e) {
      return none(t0, 0, active, "heuristic failed: " + e);
    }
  }

  /**
   * The model with the avoidance and cover rows of every zone not in {@code active} dropped and
   * their face binaries fixed to 0. Columns keep their indices.
   */
  static Milp restricted(Milp model, Set<String> active) {
    List<Variable> vars = new ArrayList<>();
    for (Variable v : model.variables()) {
      if (isFace(v) && !active.contains(v.origin().entity())) {
        vars.add(new Variable(v.index(), v.name(), VarType.CONTINUOUS, 0, 0, v.origin()));
      } else {
        vars.add(v);
      }
    }
    List<Row> rows = new ArrayList<>();
    for (Row r : model.rows()) {
      String role = r.origin().role();
      boolean lazy = role.equals("avoid") || role.equals("cover");
      if (!lazy || active.contains(r.origin().entity())) {
        rows.add(new Row(rows.size(), r.name(), r.cols(), r.coefs(), r.lower(), r.upper(), r.origin()));
      }
    }
    return new Milp(model.name() + "_restricted", vars, rows, model.objective());
  }

  /** The zones with a cover row that no face, and no arrival, satisfies at {@code x}. */
  static Set<String> brokenZones(Milp model, double[] x) {
    return new TreeSet<>(brokenSlots(model, x).keySet());
  }

  /**
   * The slots (cover rows, by step) of each zone that {@code x} breaks: no face holds and the
   * arrival relaxation does not make up for it.
   */
  static Map<String, Set<Integer>> brokenSlots(Milp model, double[] x) {
    Map<Integer, Double> margin = margins(model, x);
    Map<String, Set<Integer>> broken = new TreeMap<>();
    for (Row r : model.rows()) {
      if (r.origin().role().equals("cover") && bestFace(model, r, margin) < 0 && rest(model, r, x) < r.lower() - TOLERANCE) {
        broken.computeIfAbsent(r.origin().entity(), k -> new TreeSet<>()).add(r.origin().step());
      }
    }
    return broken;
  }

  /** Sets every face binary: 1 for the face with the largest margin where one holds, else 0. */
  static void setFaces(Milp model, double[] x) {
    Map<Integer, Double> margin = margins(model, x);
    for (Row r : model.rows()) {
      if (!r.origin().role().equals("cover")) {
        continue;
      }
      for (int c : r.cols()) {
        if (isFace(model.variables().get(c))) {
          x[c] = 0;
        }
      }
      int best = bestFace(model, r, margin);
      if (best >= 0) {
        x[best] = 1;
      }
    }
  }

  /** The face column of a cover row with the largest non-negative margin, or -1. */
  static int bestFace(Milp model, Row cover, Map<Integer, Double> margin) {
    int best = -1;
    double top = -MARGIN_SLACK;
    for (int c : cover.cols()) {
      Double m = margin.get(c);
      if (isFace(model.variables().get(c)) && m != null && m >= top) {
        best = c;
        top = m;
      }
    }
    return best;
  }

  /** A face may hold this little short of its line: far below the model tolerance. */
  private static final double MARGIN_SLACK = 1e-9;

  /** The activity of a cover row's columns that are not faces (the arrival relaxation). */
  static double rest(Milp model, Row r, double[] x) {
    double sum = 0;
    for (int i = 0; i < r.cols().length; i++) {
      if (!isFace(model.variables().get(r.cols()[i]))) {
        sum += r.coefs()[i] * x[r.cols()[i]];
      }
    }
    return sum;
  }

  /** Each face column's smallest margin over its avoidance rows. */
  static Map<Integer, Double> margins(Milp model, double[] x) {
    Map<Integer, Double> margin = new HashMap<>();
    for (Row r : model.rows()) {
      if (r.origin().role().equals("avoid")) {
        for (int i = 0; i < r.cols().length; i++) {
          if (isFace(model.variables().get(r.cols()[i]))) {
            margin.merge(r.cols()[i], faceMargin(r, r.cols()[i], x), Math::min);
          }
        }
      }
    }
    return margin;
  }

  /**
   * How far a point lies on the safe side of the face of an avoidance row {@code e − M·b ≥ lower}:
   * the face holds when {@code e ≥ lower + M}, so the margin is {@code e − lower − M}.
   */
  private static double faceMargin(Row r, int face, double[] x) {
    double e = 0;
    double bigM = 0;
    for (int i = 0; i < r.cols().length; i++) {
      if (r.cols()[i] == face) {
        bigM = -r.coefs()[i];
      } else {
        e += r.coefs()[i] * x[r.cols()[i]];
      }
    }
    return e - r.lower() - bigM;
  }

  static boolean isFace(Variable v) {
    return v.origin().role().equals("avoid-binary");
  }

  static Duration capped(SolveOptions options, Duration cap) {
    Optional<Duration> limit = options.timeLimit();
    if (limit.isEmpty()) {
      return cap;
    }
    Duration fifth = limit.get().dividedBy(5);
    Duration d = fifth.compareTo(cap) < 0 ? fifth : cap;
    return d.isZero() ? Duration.ofMillis(1) : d;
  }

  static Duration since(long t0) {
    return Duration.ofNanos(System.nanoTime() - t0);
  }

  private static Start none(long t0, int rounds, Set<String> active, String reason) {
    return new Start(null, Double.NaN, since(t0), rounds, active.size(), reason);
  }
}
