package dev.skerry.compiler.verify;

import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Vec2;
import java.util.List;

/** Exact distances between segments and convex shapes, written apart from the MILP on purpose. */
final class Geometry {
  private Geometry() {}

  /** Does the segment a→b meet the closed convex shape? (Clips the segment against every face.) */
  static boolean segmentMeets(Vec2 a, Vec2 b, Shape shape) {
    double t0 = 0;
    double t1 = 1;
    Vec2 d = b.minus(a);
    for (Shape.Face f : shape.faces()) {
      double num = f.offset() - f.normal().dot(a);
      double den = f.normal().dot(d);
      if (den == 0) {
        if (num < 0) {
          return false;
        }
      } else if (den > 0) {
        t1 = Math.min(t1, num / den);
      } else {
        t0 = Math.max(t0, num / den);
      }
      if (t0 > t1) {
        return false;
      }
    }
    return true;
  }

  /** Euclidean distance from the segment a→b to the convex shape; 0 when they meet. */
  static double segmentDistance(Vec2 a, Vec2 b, Shape shape) {
    if (segmentMeets(a, b, shape)) {
      return 0;
    }
    List<Vec2> cs = shape.corners();
    double best = Double.POSITIVE_INFINITY;
    for (int i = 0; i < cs.size(); i++) {
      Vec2 c = cs.get(i);
      Vec2 e = cs.get((i + 1) % cs.size());
      best = Math.min(best, a.distanceToSegment(c, e));
      best = Math.min(best, b.distanceToSegment(c, e));
      best = Math.min(best, c.distanceToSegment(a, b));
    }
    return best;
  }

  /** How far the point lies outside the convex shape (0 inside), by the worst face. */
  static double outside(Vec2 p, Shape shape) {
    double worst = 0;
    for (Shape.Face f : shape.faces()) {
      worst = Math.max(worst, f.normal().dot(p) - f.offset());
    }
    return worst;
  }

  /** Distance from altitude z to the closed interval {@code span} (0 inside). */
  static double altitudeGap(double z, Span span) {
    return Math.max(0, Math.max(span.lo() - z, z - span.hi()));
  }

  /** Distance from the point (p, z) to the prism {@code shape × span}. */
  static double prismDistance(Vec2 p, double z, Shape shape, Span span) {
    return Math.hypot(segmentDistance(p, p, shape), altitudeGap(z, span));
  }

  static final int GOLDEN_STEPS = 64;

  /**
   * A lower bound on the distance from the 3-D segment (a, za)→(b, zb) to the prism {@code shape ×
   * span}. The distance to a Cartesian product of convex sets is √(d_plan² + d_alt²), a convex
   * function of the point, hence convex along the segment: golden-section search brackets its
   * minimum, and since it is Lipschitz with the segment's length L per unit of the parameter, the
   * best value found less L·(final bracket width) cannot exceed the true minimum.
   */
  static double segmentPrismDistance(Vec2 a, double za, Vec2 b, double zb, Shape shape, Span span) {
    Vec2 d = b.minus(a);
    double dz = zb - za;
    double lo = 0;
    double hi = 1;
    final double g = (Math.sqrt(5) - 1) / 2;
    double t1 = hi - g * (hi - lo);
    double t2 = lo + g * (hi - lo);
    double f1 = prismDistance(a.plus(d.times(t1)), za + dz * t1, shape, span);
    double f2 = prismDistance(a.plus(d.times(t2)), za + dz * t2, shape, span);
    double best = Math.min(Math.min(f1, f2), Math.min(prismDistance(a, za, shape, span), prismDistance(b, zb, shape, span)));
    for (int i = 0; i < GOLDEN_STEPS && best > 0; i++) {
      if (f1 <= f2) {
        hi = t2;
        t2 = t1;
        f2 = f1;
        t1 = hi - g * (hi - lo);
        f1 = prismDistance(a.plus(d.times(t1)), za + dz * t1, shape, span);
        best = Math.min(best, f1);
      } else {
        lo = t1;
        t1 = t2;
        f1 = f2;
        t2 = lo + g * (hi - lo);
        f2 = prismDistance(a.plus(d.times(t2)), za + dz * t2, shape, span);
        best = Math.min(best, f2);
      }
    }
    double length = Math.hypot(d.norm(), dz);
    return Math.max(0, best - length * (hi - lo));
  }

  /** Distance from the origin to the 3-D segment a→b (coordinates as arrays of length 3). */
  static double originToSegment(double[] a, double[] b) {
    double[] d = {b[0] - a[0], b[1] - a[1], b[2] - a[2]};
    double len2 = d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
    double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, -(a[0] * d[0] + a[1] * d[1] + a[2] * d[2]) / len2));
    return Math.sqrt(sq(a[0] + t * d[0]) + sq(a[1] + t * d[1]) + sq(a[2] + t * d[2]));
  }

  private static double sq(double v) {
    return v * v;
  }
}
