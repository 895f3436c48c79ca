package dev.skerry.compiler.model;

/** An axis-aligned box {@code [xmin, xmax] × [ymin, ymax]}, SI units. May be empty. */
public record Bounds(double xmin, double ymin, double xmax, double ymax) {

  public static Bounds of(Vec2 a, Vec2 b) {
    return new Bounds(Math.min(a.x(), b.x()), Math.min(a.y(), b.y()), Math.max(a.x(), b.x()), Math.max(a.y(), b.y()));
  }

  public double width() {
    return xmax - xmin;
  }

  public double height() {
    return ymax - ymin;
  }

  public boolean isEmpty() {
    return !(xmax > xmin) || !(ymax > ymin);
  }

  public Vec2 center() {
    return new Vec2((xmin + xmax) / 2, (ymin + ymax) / 2);
  }

  /** Grown by {@code d} on every side (shrunk when negative). */
  public Bounds expand(double d) {
    return new Bounds(xmin - d, ymin - d, xmax + d, ymax + d);
  }

  /** Closed containment. */
  public boolean contains(Vec2 p) {
    return p.x() >= xmin && p.x() <= xmax && p.y() >= ymin && p.y() <= ymax;
  }

  /** Strict containment: the open interior. */
  public boolean containsStrictly(Vec2 p) {
    return p.x() > xmin && p.x() < xmax && p.y() > ymin && p.y() < ymax;
  }

  public boolean contains(Bounds b) {
    return b.xmin >= xmin && b.xmax <= xmax && b.ymin >= ymin && b.ymax <= ymax;
  }

  /** True when the open interiors overlap. */
  public boolean overlapsInterior(Bounds b) {
    return b.xmin < xmax && b.xmax > xmin && b.ymin < ymax && b.ymax > ymin;
  }

  public Bounds union(Bounds b) {
    return new Bounds(
        Math.min(xmin, b.xmin), Math.min(ymin, b.ymin), Math.max(xmax, b.xmax), Math.max(ymax, b.ymax));
  }

  public Bounds intersect(Bounds b) {
    return new Bounds(
        Math.max(xmin, b.xmin), Math.max(ymin, b.ymin), Math.min(xmax, b.xmax), Math.min(ymax, b.ymax));
  }

  /** Euclidean distance between two boxes, 0 when they touch or overlap. */
  public double distanceTo(Bounds b) {
    double dx = Math.max(0, Math.max(b.xmin - xmax, xmin - b.xmax));
    double dy = Math.max(0, Math.max(b.ymin - ymax, ymin - b.ymax));
    return Math.hypot(dx, dy);
  }

  /** Euclidean distance from a point to the box, 0 inside. */
  public double distanceTo(Vec2 p) {
    double dx = Math.max(0, Math.max(xmin - p.x(), p.x() - xmax));
    double dy = Math.max(0, Math.max(ymin - p.y(), p.y() - ymax));
    return Math.hypot(dx, dy);
  }
}
