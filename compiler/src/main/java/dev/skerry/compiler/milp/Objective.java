package dev.skerry.compiler.milp;

import java.util.Arrays;

/**
 * The objective {@code constant + Σ coefs[i]·x[cols[i]]}, minimised or maximised. Writers emit
 * minimisation only (see FORMATS.md); a maximisation is negated on the way out.
 */
public record Objective(boolean minimize, int[] cols, double[] coefs, double constant) {
  public Objective {
    if (cols.length != coefs.length) {
      throw new IllegalArgumentException("objective: columns and coefficients differ in length");
    }
    if (!Double.isFinite(constant)) {
      throw new IllegalArgumentException("objective constant must be finite");
    }
  }

  public static Objective zero() {
    return new Objective(true, new int[0], new double[0], 0);
  }

  public double value(double[] x) {
    double sum = constant;
    for (int i = 0; i < cols.length; i++) {
      sum += coefs[i] * x[cols[i]];
    }
    return sum;
  }

  /** Coefficient of a column, 0 when it is absent. */
  public double coefficientOf(int col) {
    for (int i = 0; i < cols.length; i++) {
      if (cols[i] == col) {
        return coefs[i];
      }
    }
    return 0;
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof Objective o
        && minimize == o.minimize
        && Arrays.equals(cols, o.cols)
        && Arrays.equals(coefs, o.coefs)
        && Double.compare(constant, o.constant) == 0;
  }

  @Override
  public int hashCode() {
    return Arrays.hashCode(cols) * 31 + Boolean.hashCode(minimize);
  }
}
