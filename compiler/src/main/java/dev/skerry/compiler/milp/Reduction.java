package dev.skerry.compiler.milp;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A model with its fixed columns taken out and its one-column rows turned into bounds: the exact
 * part of a presolve, for a backend that has none of its own worth using (ojAlgo's presolvers are
 * switched off, see the ojAlgo backend). Nothing is approximated, so a point of the reduced model
 * expands to a point of the original with the same objective, and the reduced model has a
 * feasible point exactly when the original has.
 *
 * <p>What it takes out, repeated until nothing changes:
 *
 * <ul>
 *   <li>a column whose bounds meet (an integer column: whose bounds, rounded inward, meet) is
 *       replaced by its value in every row and in the objective constant;
 *   <li>a row left with one column becomes a bound on that column (rounded inward for an integer
 *       column); a row left with none is dropped, or, when its constant breaks its bounds by more
 *       than {@link #TOLERANCE}, makes the model infeasible ({@link #infeasibleRow}).
 * </ul>
 *
 * Then a row that no point within the final bounds can break is dropped: its least and greatest
 * activity over the bounds lie within its own bounds. Such rows are not harmless to ojAlgo: a
 * cluster-containment row of the rock field, {@code -cymax + 1e-6·a ≤ -14.05} with {@code cymax ≥
 * 23.55}, led its model simplification to fix the binary {@code a} at 0, which made the root LP
 * infeasible where SCIP and cbc find plans with {@code a = 1} (measured; the reason inside ojAlgo
 * was not traced further).
 *
 * The zone-by-zone warm start fixes most face binaries of the model it solves; without them the
 * harbour example's zone-free model has 389 columns instead of 1,524 (common practice in MILP
 * presolve; ojAlgo measured in BENCHMARKS.md).
 */
public final class Reduction {
  /** How far an emptied row's constant may lie outside its bounds and still count as kept. */
  public static final double TOLERANCE = 1e-9;

  private final Milp original;
  private final Milp reduced;
  private final int[] kept;
  private final double[] fixed;
  private final String infeasibleRow;

  private Reduction(Milp original, Milp reduced, int[] kept, double[] fixed, String infeasibleRow) {
    this.original = original;
    this.reduced = reduced;
    this.kept = kept;
    this.fixed = fixed;
    this.infeasibleRow = infeasibleRow;
  }

  /** The reduction of {@code model}; the model itself is left as it is. */
  public static Reduction of(Milp model) {
    int n = model.columnCount();
    double[] lo = new double[n];
    double[] hi = new double[n];
    for (Variable v : model.variables()) {
      lo[v.index()] = v.isInteger() ? Math.ceil(v.lower() - TOLERANCE) : v.lower();
      hi[v.index()] = v.isInteger() ? Math.floor(v.upper() + TOLERANCE) : v.upper();
    }
    boolean[] dropped = new boolean[model.rowCount()];
    String infeasible = null;
    boolean changed = true;
    while (changed && infeasible == null) {
      changed = false;
      for (Row r : model.rows()) {
        if (dropped[r.index()]) {
          continue;
        }
        double constant = 0;
        int free = -1;
        int freeCount = 0;
        double freeCoef = 0;
        for (int i = 0; i < r.cols().length; i++) {
          int c = r.cols()[i];
          if (lo[c] == hi[c]) {
            constant += r.coefs()[i] * lo[c];
          } else if (r.coefs()[i] != 0) {
            freeCount++;
            free = c;
            freeCoef += r.coefs()[i];
          }
        }
        if (freeCount == 0) {
          dropped[r.index()] = true;
          if (constant < r.lower() - TOLERANCE || constant > r.upper() + TOLERANCE) {
            infeasible = r.name();
            break;
          }
        } else if (freeCount == 1 && freeCoef != 0) {
          dropped[r.index()] = true;
          changed = true;
          tighten(model.variables().get(free), freeCoef, r.lower() - constant, r.upper() - constant, lo, hi);
          if (lo[free] > hi[free]) {
            infeasible = r.name();
            break;
          }
        }
      }
    }
    if (infeasible == null) {
      for (Row r : model.rows()) {
        dropped[r.index()] |= redundant(r, lo, hi);
      }
    }
    return build(model, lo, hi, dropped, infeasible);
  }

  /**
   * Whether no point within the bounds can break {@code r}: its least and greatest activity over
   * the bounds lie within its own bounds (no tolerance, so dropping it changes nothing).
   */
  private static boolean redundant(Row r, double[] lo, double[] hi) {
    double least = 0;
    double most = 0;
    for (int i = 0; i < r.cols().length; i++) {
      double a = r.coefs()[i];
      int c = r.cols()[i];
      least += a > 0 ? a * lo[c] : a * hi[c];
      most += a > 0 ? a * hi[c] : a * lo[c];
    }
    return least >= r.lower() && most <= r.upper();
  }

  /** Narrows {@code lo/hi} of column {@code v} to {@code lower ≤ a·x ≤ upper}. */
  private static void tighten(Variable v, double a, double lower, double upper, double[] lo, double[] hi) {
    double from = a > 0 ? lower / a : upper / a;
    double to = a > 0 ? upper / a : lower / a;
    if (v.isInteger()) {
      from = Math.ceil(from - TOLERANCE);
      to = Math.floor(to + TOLERANCE);
    }
    int c = v.index();
    lo[c] = Math.max(lo[c], from);
    hi[c] = Math.min(hi[c], to);
    if (!v.isInteger() && lo[c] > hi[c] && lo[c] - hi[c] <= TOLERANCE * Math.max(1, Math.abs(lo[c]))) {
      hi[c] = lo[c];
    }
  }

  private static Reduction build(Milp model, double[] lo, double[] hi, boolean[] dropped, String infeasible) {
    int n = model.columnCount();
    int[] newIndex = new int[n];
    List<Integer> keptCols = new ArrayList<>();
    double[] fixed = new double[n];
    List<Variable> vars = new ArrayList<>();
    for (Variable v : model.variables()) {
      int c = v.index();
      if (lo[c] == hi[c] && infeasible == null) {
        newIndex[c] = -1;
        fixed[c] = lo[c];
      } else {
        newIndex[c] = vars.size();
        keptCols.add(c);
        double l = Math.min(lo[c], hi[c]);
        vars.add(new Variable(vars.size(), v.name(), v.type(), l, Math.max(l, hi[c]), v.origin()));
      }
    }
    List<Row> rows = new ArrayList<>();
    for (Row r : model.rows()) {
      if (dropped[r.index()] && infeasible == null) {
        continue;
      }
      Terms t = Terms.of(r.cols(), r.coefs(), newIndex, fixed);
      rows.add(new Row(rows.size(), r.name(), t.cols(), t.coefs(), r.lower() - t.constant(), r.upper() - t.constant(),
          r.origin()));
    }
    Objective o = model.objective();
    Terms t = Terms.of(o.cols(), o.coefs(), newIndex, fixed);
    Objective objective = new Objective(o.minimize(), t.cols(), t.coefs(), o.constant() + t.constant());
    Milp reduced = new Milp(model.name(), vars, rows, objective);
    return new Reduction(model, reduced, keptCols.stream().mapToInt(Integer::intValue).toArray(), fixed, infeasible);
  }

  /** A row's or the objective's terms in the reduced columns, and what the fixed columns add up to. */
  private record Terms(int[] cols, double[] coefs, double constant) {
    static Terms of(int[] cols, double[] coefs, int[] newIndex, double[] fixed) {
      double constant = 0;
      int[] kept = new int[cols.length];
      double[] keptCoefs = new double[cols.length];
      int k = 0;
      for (int i = 0; i < cols.length; i++) {
        int c = cols[i];
        if (newIndex[c] < 0) {
          constant += coefs[i] * fixed[c];
        } else {
          kept[k] = newIndex[c];
          keptCoefs[k++] = coefs[i];
        }
      }
      return new Terms(Arrays.copyOf(kept, k), Arrays.copyOf(keptCoefs, k), constant);
    }
  }

  /** The original model. */
  public Milp original() {
    return original;
  }

  /** The reduced model: its column i is the original's column {@code keptColumn(i)}. */
  public Milp reduced() {
    return reduced;
  }

  /** The original index of the reduced model's column {@code i}. */
  public int keptColumn(int i) {
    return kept[i];
  }

  /** The name of a row that shows the model infeasible, or null when the reduction found none. */
  public String infeasibleRow() {
    return infeasibleRow;
  }

  /** Columns taken out. */
  public int removedColumns() {
    return original.columnCount() - reduced.columnCount();
  }

  /** Rows taken out. */
  public int removedRows() {
    return original.rowCount() - reduced.rowCount();
  }

  /** A point of the original model from a point of the reduced one: fixed columns at their value. */
  public double[] expand(double[] reducedValues) {
    double[] x = fixed.clone();
    for (int i = 0; i < kept.length; i++) {
      x[kept[i]] = reducedValues[i];
    }
    return x;
  }

  /** The reduced model's part of a point of the original (for a warm start). */
  public double[] restrict(double[] originalValues) {
    double[] x = new double[kept.length];
    for (int i = 0; i < kept.length; i++) {
      x[i] = originalValues[kept[i]];
    }
    return x;
  }
}
