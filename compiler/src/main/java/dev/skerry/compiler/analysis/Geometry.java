package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Vec2;

/** Extremes of linear functions over boxes and box-versus-convex-shape tests used by the layout. */
public final class Geometry {
  /** Relative tolerance below which a face is not yet called impossible. */
  static final double TOLERANCE = 1e-9;

  private Geometry() {}

  /** max of {@code n·p} over the box. */
  public static double maxOver(Bounds b, Vec2 n) {
    return n.x() * (n.x() > 0 ? b.xmax() : b.xmin()) + n.y() * (n.y() > 0 ? b.ymax() : b.ymin());
  }

  /** min of {@code n·p} over the box. */
  public static double minOver(Bounds b, Vec2 n) {
    return n.x() * (n.x() > 0 ? b.xmin() : b.xmax()) + n.y() * (n.y() > 0 ? b.ymin() : b.ymax());
  }

  /**
   * True when the box and the convex shape share no interior point: some face of the shape has the
   * whole box on its closed outer side, or the bounding boxes are apart along x or y. For a convex
   * polygon and a box these axes are all the separating-axis test needs, so the answer is exact.
   */
  public static boolean interiorsDisjoint(Shape shape, Bounds b) {
    Bounds s = shape.bounds();
    if (s.xmax() <= b.xmin() || s.xmin() >= b.xmax() || s.ymax() <= b.ymin() || s.ymin() >= b.ymax()) {
      return true;
    }
    for (Shape.Face f : shape.faces()) {
      if (minOver(b, f.normal()) >= f.offset()) {
        return true;
      }
    }
    return false;
  }

  /**
   * True when the closed box and the closed convex shape may share a point: not separated by more
   * than a relative {@link #TOLERANCE} along any axis. Errs towards "may share".
   */
  public static boolean mayIntersect(Shape shape, Bounds b) {
    Bounds s = shape.bounds();
    double tol = TOLERANCE * Math.max(1, scale(s, b));
    if (s.xmax() < b.xmin() - tol || s.xmin() > b.xmax() + tol || s.ymax() < b.ymin() - tol
        || s.ymin() > b.ymax() + tol) {
      return false;
    }
    for (Shape.Face f : shape.faces()) {
      if (minOver(b, f.normal()) > f.offset() + tol) {
        return false;
      }
    }
    return true;
  }

  /** True when no point of the box satisfies {@code n·p ≥ c}, by more than the tolerance. */
  public static boolean impossibleWithin(Bounds b, Vec2 n, double c) {
    return maxOver(b, n) < c - TOLERANCE * Math.max(1, Math.abs(c));
  }


  /** max of {@code n·p + nz·z} over the box and the altitude span ({@code nz = 0}: the span is not used). */
  public static double maxOver(Bounds b, Span alt, Vec2 n, double nz) {
    return maxOver(b, n) + (nz == 0 ? 0 : nz * (nz > 0 ? alt.hi() : alt.lo()));
  }

  /** min of {@code n·p + nz·z} over the box and the altitude span. */
  public static double minOver(Bounds b, Span alt, Vec2 n, double nz) {
    return minOver(b, n) + (nz == 0 ? 0 : nz * (nz > 0 ? alt.lo() : alt.hi()));
  }

  /** True when no point of the box and span satisfies {@code n·p + nz·z ≥ c}, by more than the tolerance. */
  public static boolean impossibleWithin(Bounds b, Span alt, Vec2 n, double nz, double c) {
    return maxOver(b, alt, n, nz) < c - TOLERANCE * Math.max(1, Math.abs(c));
  }

  /** Non-zero coefficients of {@code n·p + nz·z}. */
  public static int termCount(Vec2 n, double nz) {
    return termCount(n) + (nz != 0 ? 1 : 0);
  }

  /** The 1 or 2 non-zero coefficients a normal puts into a row. */
  public static int termCount(Vec2 n) {
    return (n.x() != 0 ? 1 : 0) + (n.y() != 0 ? 1 : 0);
  }

  private static double scale(Bounds a, Bounds b) {
    return Math.max(
        Math.max(Math.abs(a.xmin()), Math.abs(a.xmax())) + Math.max(Math.abs(a.ymin()), Math.abs(a.ymax())),
        Math.max(Math.abs(b.xmin()), Math.abs(b.xmax())) + Math.max(Math.abs(b.ymin()), Math.abs(b.ymax())));
  }
}
