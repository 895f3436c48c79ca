package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.PointNode;
import dev.skerry.compiler.ast.ShapeNode;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.units.Dim;
import dev.skerry.compiler.units.Units;
import java.util.ArrayList;
import java.util.List;

/** Turns written shapes into model shapes: boxes in any corner order, convex polygons made counter-clockwise. */
final class Shapes {
  private final Evaluator eval;
  private final Diagnostics sink;

  Shapes(Evaluator eval, Diagnostics sink) {
    this.eval = eval;
    this.sink = sink;
  }

  /** A plan-view shape and its altitude range (null: none written, or a 2-D scenario). */
  record Solid(Shape shape, Span altitude) {}

  /** Advice after a third coordinate in a plan-view scenario. */
  static final String PLAN_VIEW_ADVICE = " (for an altitude, add `dimensions 3` to the plan)";

  /** A plan-view shape, or null after a report. */
  Shape shape(ShapeNode node, Units units, String what) {
    Solid solid = solid(node, units, what, 2);
    return solid == null ? null : solid.shape();
  }

  /**
   * A shape with its altitude range in a scenario of {@code dimensions} (2 or 3), or null after a
   * report. In 3-D a box may give its floor and ceiling as third corner coordinates, any shape as
   * {@code altitude LO to HI}, and a point target as a third coordinate (the tolerance applies to
   * the altitude too).
   */
  Solid solid(ShapeNode node, Units units, String what, int dimensions) {
    boolean threeD = dimensions == 3;
    if (node instanceof ShapeNode.BoxNode box) {
      return box(box, units, what, threeD);
    } else if (node instanceof ShapeNode.PolygonNode polygon) {
      Span altitude = null;
      if (polygon.altitude() != null) {
        altitude = altitude(polygon.altitude(), units, what, threeD);
        if (altitude == null) {
          return null;
        }
      }
      Shape shape = polygon(polygon, units, what, threeD);
      return shape == null ? null : new Solid(shape, altitude);
    }
    ShapeNode.PointWithin pw = (ShapeNode.PointWithin) node;
    double[] p = eval.coordinates(pw.point(), Dim.LENGTH, units, what, 2, threeD ? 3 : 2,
        threeD ? null : PLAN_VIEW_ADVICE);
    Double tolerance = eval.expect(pw.tolerance(), Dim.LENGTH, units, "the tolerance of " + what);
    if (p == null || tolerance == null) {
      return null;
    }
    if (!(tolerance > 0)) {
      sink.report(Code.VALUE_OUT_OF_RANGE, pw.tolerance().range(), "the tolerance must be greater than zero");
      return null;
    }
    Shape region = new Shape.Box(new Bounds(p[0] - tolerance, p[1] - tolerance, p[0] + tolerance, p[1] + tolerance));
    return new Solid(region, p.length == 3 ? new Span(p[2] - tolerance, p[2] + tolerance) : null);
  }

  /** {@code altitude LO to HI} as a span, or null after a report (also when the scenario is plan-view). */
  Span altitude(ShapeNode.AltitudeNode node, Units units, String what, boolean threeD) {
    if (!threeD) {
      sink.report(Code.DIMENSION_MISMATCH, node.range(), what + " has an altitude range, but the scenario is"
          + " plan-view; add `dimensions 3` to the plan or remove the range");
      return null;
    }
    Double low = eval.expect(node.low(), Dim.LENGTH, units, "the floor of " + what);
    Double high = eval.expect(node.high(), Dim.LENGTH, units, "the ceiling of " + what);
    if (low == null || high == null) {
      return null;
    }
    if (!(low < high)) {
      sink.report(Code.VALUE_OUT_OF_RANGE, node.range(), "the floor of " + what + " (" + Format.number(low)
          + " m) must be below its ceiling (" + Format.number(high) + " m)");
      return null;
    }
    return new Span(low, high);
  }

  private Solid box(ShapeNode.BoxNode node, Units units, String what, boolean threeD) {
    String advice = threeD ? null : PLAN_VIEW_ADVICE;
    double[] a = eval.coordinates(node.from(), Dim.LENGTH, units, what, 2, threeD ? 3 : 2, advice);
    double[] b = eval.coordinates(node.to(), Dim.LENGTH, units, what, 2, threeD ? 3 : 2, advice);
    if (a == null || b == null) {
      return null;
    }
    if (a.length != b.length) {
      sink.report(Code.WRONG_DIMENSION, (a.length == 2 ? node.from() : node.to()).range(), "one corner of " + what
          + " has an altitude and this one has not; give both corners (x, y, z) or neither");
      return null;
    }
    Span altitude = null;
    if (a.length == 3) {
      if (node.altitude() != null) {
        sink.report(Code.DIMENSION_MISMATCH, node.altitude().range(), what + " gives its altitude twice: in the"
            + " corners and in `altitude`; keep one");
        return null;
      }
      if (a[2] == b[2]) {
        sink.report(Code.DEGENERATE_SHAPE, node.range(), what + " has no height: its corners share the altitude "
            + Format.number(a[2]) + " m");
        return null;
      }
      altitude = Span.of(a[2], b[2]);
    } else if (node.altitude() != null) {
      altitude = altitude(node.altitude(), units, what, threeD);
      if (altitude == null) {
        return null;
      }
    }
    Bounds bounds = Bounds.of(new Vec2(a[0], a[1]), new Vec2(b[0], b[1]));
    if (bounds.isEmpty()) {
      sink.report(Code.DEGENERATE_SHAPE, node.range(),
          what + " has no area: its corners share an x or a y coordinate");
      return null;
    }
    return new Solid(new Shape.Box(bounds), altitude);
  }

  private Shape polygon(ShapeNode.PolygonNode node, Units units, String what, boolean threeD) {
    List<Vec2> corners = new ArrayList<>();
    for (PointNode p : node.corners()) {
      double[] xy = eval.coordinates(p, Dim.LENGTH, units, what, 2, 2, threeD
          ? " (a polygon's corners are plan-view; give its floor and ceiling with `altitude LO to HI`)"
          : PLAN_VIEW_ADVICE);
      if (xy == null) {
        return null;
      }
      Vec2 v = new Vec2(xy[0], xy[1]);
      if (corners.isEmpty() || !corners.get(corners.size() - 1).equals(v)) {
        corners.add(v);
      }
    }
    while (corners.size() > 1 && corners.get(0).equals(corners.get(corners.size() - 1))) {
      corners.remove(corners.size() - 1);
    }
    double scale = 0;
    for (Vec2 v : corners) {
      scale = Math.max(scale, Math.max(Math.abs(v.x()), Math.abs(v.y())));
    }
    double eps = 1e-12 * Math.max(1, scale * scale);
    List<Vec2> kept = dropCollinear(corners, eps);
    if (kept.size() < 3) {
      sink.report(Code.DEGENERATE_SHAPE, node.range(),
          what + " needs at least three corners that are not on one line");
      return null;
    }
    double area2 = Shape.Polygon.signedArea2(kept);
    int sign = area2 > 0 ? 1 : -1;
    int n = kept.size();
    for (int i = 0; i < n; i++) {
      Vec2 a = kept.get(i);
      Vec2 b = kept.get((i + 1) % n);
      Vec2 c = kept.get((i + 2) % n);
      if (b.minus(a).cross(c.minus(b)) * sign <= 0) {
        sink.report(Code.POLYGON_NOT_CONVEX, node.corners().get(Math.min((i + 1) % n, node.corners().size() - 1)).range(),
            what + " is not convex at this corner; split it into convex zones");
        return null;
      }
    }
    if (windingTurns(kept) != 1) {
      sink.report(Code.POLYGON_NOT_CONVEX, node.range(), what + " crosses itself; list its corners in order around it");
      return null;
    }
    if (sign < 0) {
      sink.report(Code.POLYGON_CLOCKWISE, node.range(),
          what + " is listed clockwise; Skerry reads it counter-clockwise (same region)");
      kept = new ArrayList<>(kept);
      java.util.Collections.reverse(kept);
    }
    return new Shape.Polygon(kept);
  }

  private static List<Vec2> dropCollinear(List<Vec2> corners, double eps) {
    List<Vec2> out = new ArrayList<>(corners);
    boolean changed = true;
    while (changed && out.size() >= 3) {
      changed = false;
      for (int i = 0; i < out.size(); i++) {
        Vec2 a = out.get((i + out.size() - 1) % out.size());
        Vec2 b = out.get(i);
        Vec2 c = out.get((i + 1) % out.size());
        if (Math.abs(b.minus(a).cross(c.minus(b))) <= eps && b.minus(a).dot(c.minus(b)) >= 0) {
          out.remove(i);
          changed = true;
          break;
        }
      }
    }
    return out;
  }

  /** How many times the boundary turns around: 1 for a simple convex polygon, more when it crosses itself. */
  private static int windingTurns(List<Vec2> vs) {
    double total = 0;
    int n = vs.size();
    for (int i = 0; i < n; i++) {
      Vec2 e1 = vs.get((i + 1) % n).minus(vs.get(i));
      Vec2 e2 = vs.get((i + 2) % n).minus(vs.get((i + 1) % n));
      total += Math.atan2(e1.cross(e2), e1.dot(e2));
    }
    return (int) Math.round(Math.abs(total) / (2 * Math.PI));
  }
}
