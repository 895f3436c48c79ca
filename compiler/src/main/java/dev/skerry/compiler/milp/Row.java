package dev.skerry.compiler.milp;

import java.util.Arrays;

/**
 * One linear row {@code lower ≤ Σ coefs[i]·x[cols[i]] ≤ upper}. Column indices are distinct and
 * ascending (the builder merges repeated terms). A bound may be infinite.
 */
public record Row(int index, String name, int[] cols, double[] coefs, double lower, double upper, Origin origin) {
  public Row {
    if (name == null || name.isEmpty()) {
      throw new IllegalArgumentException("a row needs a name");
    }
    if (cols.length != coefs.length) {
      throw new IllegalArgumentException("row " + name + ": columns and coefficients differ in length");
    }
    if (Double.isNaN(lower) || Double.isNaN(upper)) {
      throw new IllegalArgumentException("row " + name + " has a NaN bound");
    }
    origin = origin == null ? Origin.NONE : origin;
  }

  public RowSense sense() {
    boolean lo = Double.isFinite(lower);
    boolean hi = Double.isFinite(upper);
    if (lo && hi) {
      return lower == upper ? RowSense.EQ : RowSense.RANGE;
    }
    if (hi) {
      return RowSense.LE;
    }
    if (lo) {
      return RowSense.GE;
    }
    return RowSense.FREE;
  }

  public int size() {
    return cols.length;
  }

  /** The value of the row's expression at a point. */
  public double activity(double[] x) {
    double sum = 0;
    for (int i = 0; i < cols.length; i++) {
      sum += coefs[i] * x[cols[i]];
    }
    return sum;
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof Row r
        && index == r.index
        && name.equals(r.name)
        && Arrays.equals(cols, r.cols)
        && Arrays.equals(coefs, r.coefs)
        && Double.compare(lower, r.lower) == 0
        && Double.compare(upper, r.upper) == 0
        && origin.equals(r.origin);
  }

  @Override
  public int hashCode() {
    return 31 * name.hashCode() + Arrays.hashCode(cols);
  }

  @Override
  public String toString() {
    return "Row[" + name + ", " + cols.length + " terms, " + lower + " .. " + upper + "]";
  }
}
