package dev.skerry.compiler.model;

/** A point or vector in the plane, SI units. */
public record Vec2(double x, double y) {
  public static final Vec2 ZERO = new Vec2(0, 0);

  public Vec2 plus(Vec2 o) {
    return new Vec2(x + o.x, y + o.y);
  }

  public Vec2 minus(Vec2 o) {
    return new Vec2(x - o.x, y - o.y);
  }

  public Vec2 times(double k) {
    return new Vec2(x * k, y * k);
  }

  public double dot(Vec2 o) {
    return x * o.x + y * o.y;
  }

  /** z-component of the cross product: positive when {@code o} lies to the left of this. */
  public double cross(Vec2 o) {
    return x * o.y - y * o.x;
  }

  public double norm() {
    return Math.hypot(x, y);
  }

  public double distanceTo(Vec2 o) {
    return Math.hypot(x - o.x, y - o.y);
  }

  /** Euclidean distance from this point to the segment a–b. */
  public double distanceToSegment(Vec2 a, Vec2 b) {
    Vec2 ab = b.minus(a);
    double len2 = ab.dot(ab);
    double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, minus(a).dot(ab) / len2));
    return distanceTo(a.plus(ab.times(t)));
  }
}
