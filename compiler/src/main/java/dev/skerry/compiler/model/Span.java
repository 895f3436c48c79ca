package dev.skerry.compiler.model;

/**
 * A closed altitude interval {@code [lo, hi]}, metres: a zone's floor and ceiling, the keep-in
 * volume's or a vehicle's altitude limits, a target's or waypoint's altitude band. Only 3-D
 * scenarios have them; in a 3-D scenario a missing span means "every altitude".
 */
public record Span(double lo, double hi) {

  /** Every altitude. */
  public static final Span ALL = new Span(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);

  public static Span of(double a, double b) {
    return new Span(Math.min(a, b), Math.max(a, b));
  }

  public boolean bounded() {
    return Double.isFinite(lo) && Double.isFinite(hi);
  }

  public boolean contains(double z) {
    return z >= lo && z <= hi;
  }

  /** Grown by {@code d} at both ends (shrunk when negative). */
  public Span expand(double d) {
    return new Span(lo - d, hi + d);
  }

  public Span intersect(Span o) {
    return new Span(Math.max(lo, o.lo), Math.min(hi, o.hi));
  }

  public Span union(Span o) {
    return new Span(Math.min(lo, o.lo), Math.max(hi, o.hi));
  }

  /** True when the open interiors overlap. */
  public boolean overlapsInterior(Span o) {
    return o.lo < hi && o.hi > lo;
  }

  public double length() {
    return hi - lo;
  }

  /** {@code s} when non-null, else {@link #ALL}. */
  public static Span orAll(Span s) {
    return s == null ? ALL : s;
  }
}
