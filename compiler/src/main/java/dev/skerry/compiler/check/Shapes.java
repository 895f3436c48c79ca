package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.PointNode;
import dev.skerry.compiler.ast.ShapeNode;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Shape;
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

  Shape shape(ShapeNode node, Units units, String what) {
    if (node instanceof ShapeNode.BoxNode box) {
      return box(box, units, what);
    } else if (node instanceof ShapeNode.PolygonNode polygon) {
      return polygon(polygon, units, what);
    }
    ShapeNode.PointWithin pw = (ShapeNode.PointWithin) node;
    Vec2 p = eval.point(pw.point(), Dim.LENGTH, units, what);
    Double tolerance = eval.expect(pw.tolerance(), Dim.LENGTH, units, "the tolerance of " + what);
    if (p == null || tolerance == null) {
      return null;
    }
    if (!(tolerance > 0)) {
      sink.report(Code.VALUE_OUT_OF_RANGE, pw.tolerance().range(), "the tolerance must be greater than zero");
      return null;
    }
    return new Shape.Box(new Bounds(p.x() - tolerance, p.y() - tolerance, p.x() + tolerance, p.y() + tolerance));
  }

  private Shape box(ShapeNode.BoxNode node, Units units, String what) {
    Vec2 a = eval.point(node.from(), Dim.LENGTH, units, what);
    Vec2 b = eval.point(node.to(), Dim.LENGTH, units, what);
    if (a == null || b == null) {
      return null;
    }
    Bounds bounds = Bounds.of(a, b);
    if (bounds.isEmpty()) {
      sink.report(Code.DEGENERATE_SHAPE, node.range(),
          what + " has no area: its corners share an x or a y coordinate");
      return null;
    }
    return new Shape.Box(bounds);
  }

  private Shape polygon(ShapeNode.PolygonNode node, Units units, String what) {
    List<Vec2> corners = new ArrayList<>();
    for (PointNode p : node.corners()) {
      Vec2 v = eval.point(p, Dim.LENGTH, units, what);
      if (v == null) {
        return null;
      }
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
