package dev.skerry.compiler.analysis;

/**
 * Padding of computed big-M constants. A big-M equal to the exact bound it must cover has been seen
 * to make an exact presolve declare a feasible model infeasible, so every M is raised by a relative
 * {@value #RELATIVE} and an absolute {@value #ABSOLUTE}; a negative bound (the row is slack
 * everywhere anyway) is floored at 0 before padding.
 */
public final class BigM {
  public static final double RELATIVE = 1e-6;
  public static final double ABSOLUTE = 1e-6;

  private BigM() {}

  /** The padded constant covering a worst-case violation {@code raw}. */
  public static double pad(double raw) {
    double m = Math.max(raw, 0);
    return m + RELATIVE * m + ABSOLUTE;
  }
}
