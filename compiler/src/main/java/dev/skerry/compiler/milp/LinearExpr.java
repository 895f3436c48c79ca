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

  /**
   * The merged terms, sorted by column, zero coefficients kept out: element 0 the columns,
   * element 1 the coefficients.
   */
  Object[] merged() {
    Integer[] order = new Integer[size];
    for (int i = 0; i < size; i++) {
      order[i] = i;
    }
    Arrays.sort(order, (a, b) -> Integer.compare(cols[a], cols[b]));
    int[] outCols = new int[size];
    double[] outCoefs = new double[size];
    int n = 0;
    for (int k = 0; k < size; k++) {
      int i = order[k];
      if (n > 0 && outCols[n - 1] == cols[i]) {
        outCoefs[n - 1] += coefs[i];
      } else {
        outCols[n] = cols[i];
        outCoefs[n] = coefs[i];
        n++;
      }
    }
    int m = 0;
    for (int i = 0; i < n; i++) {
      if (outCoefs[i] != 0) {
        outCols[m] = outCols[i];
        outCoefs[m] = outCoefs[i];
        m++;
      }
    }
    return new Object[] {Arrays.copyOf(outCols, m), Arrays.copyOf(outCoefs, m)};
  }
}
