package dev.skerry.compiler.milp;

import java.util.Arrays;

/**
 * A growing linear expression {@code Σ coef·x + constant}, used while building rows. Repeated
 * terms of one column are merged when the row is added.
 */
public final class LinearExpr {
  private int[] cols = new int[4];
  private double[] coefs = new double[4];
  private int size;
  private double constant;

  public static LinearExpr of(Variable v, double coef) {
    return new LinearExpr().add(v, coef);
  }

  public static LinearExpr of(Variable v) {
    return of(v, 1);
  }

  public LinearExpr add(Variable v, double coef) {
    return add(v.index(), coef);
  }

  public LinearExpr add(Variable v) {
    return add(v.index(), 1);
  }

  public LinearExpr add(int col, double coef) {
    if (!Double.isFinite(coef)) {
      throw new IllegalArgumentException("coefficient of column " + col + " is not finite: " + coef);
    }
    if (size == cols.length) {
      cols = Arrays.copyOf(cols, size * 2);
      coefs = Arrays.copyOf(coefs, size * 2);
    }
    cols[size] = col;
    coefs[size] = coef;
    size++;
    return this;
  }

  public LinearExpr addConstant(double c) {
    if (!Double.isFinite(c)) {
      throw new IllegalArgumentException("constant is not finite: " + c);
    }
    constant += c;
    return this;
  }

  public double constant() {
    return constant;
  }

  public int termCount() {
    return size;
  }

  /** Terms of a row or objective: distinct ascending columns, no zero coefficient. */
  record Terms(int[] cols, double[] coefs) {}

  /**
   * The merged terms, sorted by column, zero coefficients kept out. Repeated terms of one column
   * are summed in the order they were added. Most rows are built in column order without repeats
   * and take the first branch, which only copies the two arrays.
   */
  Terms merged() {
    int n = size;
    boolean plain = true;
    for (int i = 0; i < n && plain; i++) {
      plain = coefs[i] != 0 && (i == 0 || cols[i] > cols[i - 1]);
    }
    if (plain) {
      return new Terms(Arrays.copyOf(cols, n), Arrays.copyOf(coefs, n));
    }
    // Sort (column, position) pairs packed in longs: the position breaks ties, so terms of one
    // column stay in the order they were added and their sum does not depend on the sort.
    long[] order = new long[n];
    for (int i = 0; i < n; i++) {
      order[i] = ((long) cols[i] << 32) | i;
    }
    Arrays.sort(order);
    int[] outCols = new int[n];
    double[] outCoefs = new double[n];
    int m = 0;
    for (int k = 0; k < n; k++) {
      int i = (int) order[k];
      if (m > 0 && outCols[m - 1] == cols[i]) {
        outCoefs[m - 1] += coefs[i];
      } else {
        outCols[m] = cols[i];
        outCoefs[m] = coefs[i];
        m++;
      }
    }
    int kept = 0;
    for (int i = 0; i < m; i++) {
      if (outCoefs[i] != 0) {
        outCols[kept] = outCols[i];
        outCoefs[kept] = outCoefs[i];
        kept++;
      }
    }
    return new Terms(Arrays.copyOf(outCols, kept), Arrays.copyOf(outCoefs, kept));
  }
}
