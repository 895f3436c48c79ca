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
}
