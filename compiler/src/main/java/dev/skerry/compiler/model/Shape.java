package dev.skerry.compiler.model;

import java.util.List;

/**
 * A 2-D region: an axis-aligned box or a convex polygon (vertices counter-clockwise, as the
 * checker normalises them). Faces are the outward half-planes {@code n·p ≤ c} whose intersection
 * is the region.
 */
public sealed interface Shape permits Shape.Box, Shape.Polygon {

  Bounds bounds();

  /** The outward faces: the region is {p : n_j·p ≤ c_j for every j}. */
  List<Face> faces();

  /** The corners, counter-clockwise (a box from its lower-left corner). */
  default List<Vec2> corners() {
    if (this instanceof Polygon p) {
      return p.vertices();
    }
    Bounds b = bounds();
    return List.of(new Vec2(b.xmin(), b.ymin()), new Vec2(b.xmax(), b.ymin()), new Vec2(b.xmax(), b.ymax()),
        new Vec2(b.xmin(), b.ymax()));
  }

  /** The region grown by {@code r} on every face (Minkowski sum with a disc, outer polygon). */
  Shape inflate(double r);

  /** Signed distance-like test: true when {@code p} lies in the open interior. */
  default boolean containsStrictly(Vec2 p) {
    for (Face f : faces()) {
      if (f.normal().dot(p) >= f.offset()) {
        return false;
      }
    }
    return true;
  }

  default boolean contains(Vec2 p) {
    for (Face f : faces()) {
      if (f.normal().dot(p) > f.offset() + 1e-12 * Math.max(1, Math.abs(f.offset()))) {
        return false;
      }
    }
    return true;
  }

  /** A half-plane {@code normal·p ≤ offset} with a unit normal. */
  record Face(Vec2 normal, double offset) {}

  record Box(Bounds box) implements Shape {
    @Override
    public Bounds bounds() {
      return box;
    }

    /** Faces in the order x ≤ xmin side, x ≥ xmax side, y ≤ ymin side, y ≥ ymax side are the
     * four ways to stay out; as faces of the region they are: −x ≤ −xmin, x ≤ xmax, −y ≤ −ymin, y ≤ ymax. */
    @Override
    public List<Face> faces() {
      return List.of(
          new Face(new Vec2(-1, 0), -box.xmin()),
          new Face(new Vec2(1, 0), box.xmax()),
          new Face(new Vec2(0, -1), -box.ymin()),
          new Face(new Vec2(0, 1), box.ymax()));
    }

    @Override
    public Box inflate(double r) {
      return new Box(box.expand(r));
    }
  }

  /** A convex polygon, vertices counter-clockwise, no three consecutive collinear. */
  record Polygon(List<Vec2> vertices) implements Shape {
    public Polygon {
      vertices = List.copyOf(vertices);
    }

    @Override
    public Bounds bounds() {
      double xmin = Double.POSITIVE_INFINITY;
      double ymin = Double.POSITIVE_INFINITY;
      double xmax = Double.NEGATIVE_INFINITY;
      double ymax = Double.NEGATIVE_INFINITY;
      for (Vec2 v : vertices) {
        xmin = Math.min(xmin, v.x());
        ymin = Math.min(ymin, v.y());
        xmax = Math.max(xmax, v.x());
        ymax = Math.max(ymax, v.y());
      }
      return new Bounds(xmin, ymin, xmax, ymax);
    }

    @Override
    public List<Face> faces() {
      Face[] faces = new Face[vertices.size()];
      for (int i = 0; i < vertices.size(); i++) {
        Vec2 a = vertices.get(i);
        Vec2 b = vertices.get((i + 1) % vertices.size());
        Vec2 edge = b.minus(a);
        double len = edge.norm();
        Vec2 n = new Vec2(edge.y() / len, -edge.x() / len);
        faces[i] = new Face(n, n.dot(a));
      }
      return List.of(faces);
    }

    /**
     * Every face pushed out by {@code r}: the polygon that circumscribes the exact inflated
     * region (its corners reach a little further than the rounded ones, which is the safe side).
     */
    @Override
    public Polygon inflate(double r) {
      if (r == 0) {
        return this;
      }
      List<Face> faces = faces();
      int n = faces.size();
      Vec2[] out = new Vec2[n];
      for (int i = 0; i < n; i++) {
        Face prev = faces.get((i + n - 1) % n);
        Face next = faces.get(i);
        out[i] = intersect(prev.normal(), prev.offset() + r, next.normal(), next.offset() + r);
      }
      return new Polygon(List.of(out));
    }

    private static Vec2 intersect(Vec2 n1, double c1, Vec2 n2, double c2) {
      double det = n1.x() * n2.y() - n1.y() * n2.x();
      return new Vec2((c1 * n2.y() - n1.y() * c2) / det, (n1.x() * c2 - c1 * n2.x()) / det);
    }

    /** Twice the signed area: positive for counter-clockwise vertices. */
    public static double signedArea2(List<Vec2> vs) {
      double sum = 0;
      for (int i = 0; i < vs.size(); i++) {
        sum += vs.get(i).cross(vs.get((i + 1) % vs.size()));
      }
      return sum;
    }
  }
}
