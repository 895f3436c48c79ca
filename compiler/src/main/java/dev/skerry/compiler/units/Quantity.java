package dev.skerry.compiler.units;

/**
 * The value of an expression. A {@code bare} quantity is a number written without a unit: it takes
 * the scenario's default units of whatever dimension the place that uses it expects. Otherwise
 * {@code value} is in SI units of {@code dim}.
 */
public record Quantity(double value, Dim dim, boolean bare) {

  public static Quantity bare(double value) {
    return new Quantity(value, Dim.NONE, true);
  }

  public static Quantity si(double value, Dim dim) {
    return new Quantity(value, dim, false);
  }

  /**
   * The SI value as a quantity of {@code expected}; null when the dimensions differ. A bare
   * number is scaled by the default units.
   */
  public Double as(Dim expected, Units units) {
    if (bare) {
      return value * units.defaultFactor(expected);
    }
    return dim.equals(expected) ? value : null;
  }
}
