package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Vec2;
import java.util.ArrayList;
import java.util.List;

/**
 * The S-face polygon that stands in for a 2-norm limit {@code |x| ≤ r}: faces {@code n_j·x ≤
 * r·cos(π/S)} with {@code n_j = (cos 2πj/S, sin 2πj/S)}, j = 0..S−1.
 *
 * <p>This is the INSCRIBED polygon: its corners lie on the circle of radius r, so every vector it
 * admits has norm at most r and the true limit is never exceeded. The price is conservatism: along a
 * face normal the admitted magnitude is only {@code r·cos(π/S)} (the factor {@link
 * #conservatism()}, 0.981 for S = 16). The circumscribed polygon (offsets r) would instead admit
 * vectors up to {@code r/cos(π/S)} in its corners, an overshoot bound of {@code 1/cos(π/S)} (1.020
 * for S = 16) that the plan could then really fly. Normal components that are zero in exact
 * arithmetic (multiples of π/2) are stored as exact zeros so rows carry no 1e-17 coefficients.
 */
public record LimitPolygon(double radius, int sides, List<Vec2> normals, double offset,
    double xmin, double xmax, double ymin, double ymax) {

  public LimitPolygon {
    normals = List.copyOf(normals);
  }

  public static LimitPolygon inscribed(double radius, int sides) {
    if (sides < 3) {
      throw new IllegalArgumentException("a limit polygon needs at least 3 sides, got " + sides);
    }
    List<Vec2> normals = new ArrayList<>(sides);
    for (int j = 0; j < sides; j++) {
      normals.add(direction(2 * j, 2 * sides));
    }
    double xmin = Double.POSITIVE_INFINITY;
    double xmax = Double.NEGATIVE_INFINITY;
    double ymin = Double.POSITIVE_INFINITY;
    double ymax = Double.NEGATIVE_INFINITY;
    for (int j = 0; j < sides; j++) {
      Vec2 corner = direction(2 * j + 1, 2 * sides).times(radius);
      xmin = Math.min(xmin, corner.x());
      xmax = Math.max(xmax, corner.x());
      ymin = Math.min(ymin, corner.y());
      ymax = Math.max(ymax, corner.y());
    }
    return new LimitPolygon(radius, sides, normals, radius * Math.cos(Math.PI / sides), xmin, xmax, ymin, ymax);
  }

  /** The unit vector at angle 2π·i/n, with exact zeros and ones on the axes. */
  static Vec2 direction(int i, int n) {
    int r = Math.floorMod(4 * i, 4 * n);
    if (r == 0) {
      return new Vec2(1, 0);
    }
    if (r == n) {
      return new Vec2(0, 1);
    }
    if (r == 2 * n) {
      return new Vec2(-1, 0);
    }
    if (r == 3 * n) {
      return new Vec2(0, -1);
    }
    double angle = 2 * Math.PI * i / n;
    return new Vec2(Math.cos(angle), Math.sin(angle));
  }

  /** cos(π/S): the fraction of the true limit the polygon guarantees in every direction. */
  public double conservatism() {
    return Math.cos(Math.PI / sides);
  }

  /** 1/cos(π/S): how far the circumscribed polygon would overshoot the true limit in its corners. */
  public double outerOvershoot() {
    return 1 / Math.cos(Math.PI / sides);
  }

  /** Non-zero coefficients all faces put into rows over (x, y). */
  public int termCount() {
    int n = 0;
    for (Vec2 v : normals) {
      n += Geometry.termCount(v);
    }
    return n;
  }
}
