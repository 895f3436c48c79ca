package dev.skerry.compiler.verify;

import dev.skerry.compiler.model.Shape;
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
}
