package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Small models for the writer tests, each with its optimum worked out by hand (in the comment) or
 * by enumeration in the test, never taken from our own output.
 */
final class SampleModels {
  private static final Origin O = Origin.NONE;

  private SampleModels() {}

  /** A model and its optimum, known independently of the code under test. */
  record Known(Milp milp, double optimum) {
    @Override
    public String toString() {
      return milp.name();
    }
  }

  static final double[] KNAPSACK_VALUES = {10, 13, 7, 8, 9, 4};
  static final double[] KNAPSACK_WEIGHTS = {5, 6, 3, 4, 4, 2};
  static final double KNAPSACK_CAPACITY = 13;

  /** Maximise value within the capacity; binaries. Optimum by enumeration of all 64 subsets. */
  static Known knapsack() {
    MilpBuilder b = new MilpBuilder("knapsack");
    LinearExpr weight = new LinearExpr();
    LinearExpr value = new LinearExpr();
    for (int i = 0; i < KNAPSACK_VALUES.length; i++) {
      Variable take = b.newBinary("take_" + i, O);
      weight.add(take, KNAPSACK_WEIGHTS[i]);
      value.add(take, KNAPSACK_VALUES[i]);
    }
    b.addLessOrEqual("capacity", weight, KNAPSACK_CAPACITY, O);
    b.maximize(value);
    double best = 0;
    for (int mask = 0; mask < 1 << KNAPSACK_VALUES.length; mask++) {
      double w = 0;
      double v = 0;
      for (int i = 0; i < KNAPSACK_VALUES.length; i++) {
        if ((mask >> i & 1) == 1) {
          w += KNAPSACK_WEIGHTS[i];
          v += KNAPSACK_VALUES[i];
        }
      }
      if (w <= KNAPSACK_CAPACITY) {
        best = Math.max(best, v);
      }
    }
    return new Known(b.build(), best);
  }

  /**
   * min x - y, 1 ≤ x + y ≤ 4, -2 ≤ x - 2y ≤ 3, -7.5 ≤ x - y ≤ 0.25, x, y in [0, 10]. With x = 0 the
   * second range gives y ≤ 1; for 0 ≤ x ≤ 2 the best is y = (x + 2)/2, objective x/2 - 1; for x ≥ 2
   * it is y = 4 - x, objective 2x - 4 ≥ 0. Optimum -1 at (0, 1), where the third range holds.
   */
  static Known ranges() {
    MilpBuilder b = new MilpBuilder("ranges");
    Variable x = b.newContinuous("x", 0, 10, O);
    Variable y = b.newContinuous("y", 0, 10, O);
    b.addRange("sum", 1, LinearExpr.of(x).add(y), 4, O);
    b.addRange("diff", -2, LinearExpr.of(x).add(y, -2), 3, O);
    b.addRange("wide", -7.5, LinearExpr.of(x).add(y, -1), 0.25, O);
    b.minimize(LinearExpr.of(x).add(y, -1));
    return new Known(b.build(), -1);
  }

  /**
   * min 2a + 3b + c, a + b + c = 10, a - b = 2, integers in [0, 10]. Then a = b + 2, c = 8 - 2b,
   * objective 3b + 12 with 0 ≤ b ≤ 4: optimum 12 at (2, 0, 8).
   */
  static Known equalities() {
    MilpBuilder b = new MilpBuilder("equalities");
    Variable a = b.newInteger("a", 0, 10, O);
    Variable bb = b.newInteger("b", 0, 10, O);
    Variable c = b.newInteger("c", 0, 10, O);
    b.addEquality("total", LinearExpr.of(a).add(bb).add(c), 10, O);
    b.addEquality("gap", LinearExpr.of(a).add(bb, -1), 2, O);
    b.minimize(LinearExpr.of(a, 2).add(bb, 3).add(c));
    return new Known(b.build(), 12);
  }

  /**
   * min -x - 2y + z + w, x in [-5, -2], y integer in [-3, -1], z in [-4, 6], w ≤ -1 (no lower
   * bound), x + y + z ≥ -6, w ≥ -9. At x = -2, y = -1 the row needs z ≥ -3: objective 2 + 2 - 3;
   * lowering x frees z one for one (no gain), lowering y costs 2 to gain 1. w = -9. Optimum 1 - 9 =
   * -8.
   */
  static Known negativeBounds() {
    MilpBuilder b = new MilpBuilder("negative");
    Variable x = b.newContinuous("x", -5, -2, O);
    Variable y = b.newInteger("y", -3, -1, O);
    Variable z = b.newContinuous("z", -4, 6, O);
    Variable w = b.newContinuous("w", Double.NEGATIVE_INFINITY, -1, O);
    b.addGreaterOrEqual("floor", LinearExpr.of(x).add(y).add(z), -6, O);
    b.addGreaterOrEqual("wfloor", LinearExpr.of(w), -9, O);
    b.minimize(LinearExpr.of(x, -1).add(y, -2).add(z).add(w));
    return new Known(b.build(), -8);
  }

  /**
   * min t + k, t - u ≥ 3, t + u ≥ -1, k ≥ -2.5, t and u free, k a free integer. t ≥ max(3 + u, -1 -
   * u) is least at u = -2, t = 1; k = -2. Optimum -1.
   */
  static Known freeVariables() {
    MilpBuilder b = new MilpBuilder("free");
    Variable t = b.newContinuous("t", Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, O);
    Variable u = b.newContinuous("u", Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, O);
    Variable k = b.newInteger("k", Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, O);
    b.addGreaterOrEqual("above", LinearExpr.of(t).add(u, -1), 3, O);
    b.addGreaterOrEqual("below", LinearExpr.of(t).add(u), -1, O);
    b.addGreaterOrEqual("kfloor", LinearExpr.of(k), -2.5, O);
    b.minimize(LinearExpr.of(t).add(k));
    return new Known(b.build(), -1);
  }

  /** min x + y + 100.5, x + y ≥ 2, x, y ≥ 0: optimum 102.5. */
  static Known objectiveConstant() {
    MilpBuilder b = new MilpBuilder("constant");
    Variable x = b.newContinuous("x", 0, Double.POSITIVE_INFINITY, O);
    Variable y = b.newContinuous("y", 0, Double.POSITIVE_INFINITY, O);
    b.addGreaterOrEqual("need", LinearExpr.of(x).add(y), 2, O);
    b.minimize(LinearExpr.of(x).add(y).addConstant(100.5));
    return new Known(b.build(), 102.5);
  }

  /**
   * max 3x + 2y - 1.25, x + y ≤ 4, x + 3y ≤ 6, x in [0, 3], y ≥ 0. Vertices (3, 1): 11, (3, 0): 9,
   * (0, 2): 4, (0, 0): 0. Optimum 11 - 1.25 = 9.75.
   */
  static Known maximisation() {
    MilpBuilder b = new MilpBuilder("maximise");
    Variable x = b.newContinuous("x", 0, 3, O);
    Variable y = b.newContinuous("y", 0, Double.POSITIVE_INFINITY, O);
    b.addLessOrEqual("first", LinearExpr.of(x).add(y), 4, O);
    b.addLessOrEqual("second", LinearExpr.of(x).add(y, 3), 6, O);
    b.maximize(LinearExpr.of(x, 3).add(y, 2).addConstant(-1.25));
    return new Known(b.build(), 9.75);
  }

  /**
   * min -x - y - z, x integer in [2, 7], y integer in [-3, 5], z integer ≥ 0 without upper bound,
   * 2x + 3y ≤ 17.5, z ≤ 4.7. x + y is largest at x = 7, y = 1 (8; x = 6 allows y = 1 too, x = 2
   * allows y = 4); z = 4. Optimum -12.
   */
  static Known generalIntegers() {
    MilpBuilder b = new MilpBuilder("integers");
    Variable x = b.newInteger("x", 2, 7, O);
    Variable y = b.newInteger("y", -3, 5, O);
    Variable z = b.newInteger("z", 0, Double.POSITIVE_INFINITY, O);
    b.addLessOrEqual("mix", LinearExpr.of(x, 2).add(y, 3), 17.5, O);
    b.addLessOrEqual("zcap", LinearExpr.of(z), 4.7, O);
    b.minimize(LinearExpr.of(x, -1).add(y, -1).add(z, -1));
    return new Known(b.build(), -12);
  }

  static List<Known> handMade() {
    return List.of(
        knapsack(),
        ranges(),
        equalities(),
        negativeBounds(),
        freeVariables(),
        objectiveConstant(),
        maximisation(),
        generalIntegers());
  }

  /**
   * A random model that is feasible (built around a point that satisfies every row) and bounded
   * (every column has finite bounds). With {@code integersOnly}, every column is integer so that
   * {@link #enumerate} can find the optimum without a solver.
   */
  static Milp random(long seed, boolean integersOnly) {
    Random rnd = new Random(seed);
    MilpBuilder b = new MilpBuilder("random_" + seed);
    int n = 2 + rnd.nextInt(4);
    List<Variable> vars = new ArrayList<>();
    double[] point = new double[n];
    for (int j = 0; j < n; j++) {
      int kind = integersOnly ? 1 + rnd.nextInt(2) : rnd.nextInt(3);
      Variable v;
      if (kind == 2) {
        v = b.newBinary("b" + j, O);
        point[j] = rnd.nextInt(2);
      } else {
        int lo = -5 + rnd.nextInt(8);
        int width = 1 + rnd.nextInt(5);
        if (kind == 1) {
          v = b.newInteger("i" + j, lo, lo + width, O);
          point[j] = lo + rnd.nextInt(width + 1);
        } else {
          double low = lo + 0.25 * rnd.nextInt(4);
          v = b.newContinuous("x" + j, low, low + width, O);
          point[j] = low + 0.25 * rnd.nextInt(4 * width + 1);
        }
      }
      vars.add(v);
    }
    int m = 1 + rnd.nextInt(5);
    for (int i = 0; i < m; i++) {
      LinearExpr e = new LinearExpr();
      double activity = 0;
      for (int j = 0; j < n; j++) {
        if (rnd.nextInt(3) > 0) {
          int c = rnd.nextInt(9) - 4;
          if (c != 0) {
            e.add(vars.get(j), c);
            activity += c * point[j];
          }
        }
      }
      double slack = 0.5 * rnd.nextInt(5);
      switch (rnd.nextInt(4)) {
        case 0 -> b.addLessOrEqual("r" + i, e, activity + slack, O);
        case 1 -> b.addGreaterOrEqual("r" + i, e, activity - slack, O);
        case 2 -> b.addEquality("r" + i, e, activity, O);
        default -> b.addRange("r" + i, activity - slack, e, activity + 0.5 * rnd.nextInt(5), O);
      }
    }
    LinearExpr objective = new LinearExpr();
    for (Variable v : vars) {
      objective.add(v, 0.5 * (rnd.nextInt(21) - 10));
    }
    objective.addConstant(0.25 * (rnd.nextInt(41) - 20));
    if (rnd.nextBoolean()) {
      b.minimize(objective);
    } else {
      b.maximize(objective);
    }
    return b.build();
  }

  /**
   * The optimum of a model whose columns are all integer with finite bounds, by trying every point;
   * uses only the model's own {@code maxViolation} and objective value.
   */
  static double enumerate(Milp milp) {
    int n = milp.columnCount();
    long[] low = new long[n];
    long[] high = new long[n];
    for (int j = 0; j < n; j++) {
      Variable v = milp.variables().get(j);
      if (!v.isInteger() || !Double.isFinite(v.lower()) || !Double.isFinite(v.upper())) {
        throw new IllegalArgumentException(
            "enumeration needs bounded integer columns: " + v.name());
      }
      low[j] = (long) Math.ceil(v.lower());
      high[j] = (long) Math.floor(v.upper());
    }
    double[] x = new double[n];
    for (int j = 0; j < n; j++) {
      x[j] = low[j];
    }
    boolean min = milp.objective().minimize();
    double best = Double.NaN;
    while (true) {
      if (milp.maxViolation(x) <= 1e-9) {
        double value = milp.objective().value(x);
        if (Double.isNaN(best) || (min ? value < best : value > best)) {
          best = value;
        }
      }
      int j = 0;
      while (j < n && x[j] == high[j]) {
        x[j] = low[j];
        j++;
      }
      if (j == n) {
        return best;
      }
      x[j]++;
    }
  }
}
