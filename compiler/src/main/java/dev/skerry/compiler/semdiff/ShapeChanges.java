package dev.skerry.compiler.semdiff;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import java.util.List;

/** Describes regions and how a region changed: moved, grew, shrank, reshaped. */
final class ShapeChanges {
  private ShapeChanges() {}

  /** The region as the language writes it, in metres. */
  static String describe(Shape shape) {
    if (shape instanceof Shape.Box box) {
      Bounds b = box.box();
      return "box (" + Words.number(b.xmin()) + ", " + Words.number(b.ymin()) + ") to (" + Words.number(b.xmax())
          + ", " + Words.number(b.ymax()) + ") m";
    }
    return "polygon " + Words.points(((Shape.Polygon) shape).vertices());
  }

  /** A short summary for an added entity: {@code box 6 m × 4 m at (3, 2) m}. */
  static String summary(Shape shape) {
    Bounds b = shape.bounds();
    String size = Words.number(b.width()) + " m × " + Words.number(b.height()) + " m";
    if (shape instanceof Shape.Box) {
      return "box " + size + " centred at " + Words.point(b.center(), "m");
    }
    int corners = ((Shape.Polygon) shape).vertices().size();
    return "polygon of " + corners + " corners within " + size + " around " + Words.point(b.center(), "m");
  }

  /** The phrase for a changed region, or null when the regions are the same. */
  static String phrase(Shape before, Shape after) {
    if (ModelView.sameMeaning(before, after)) {
      return null;
    }
    Vec2 shift = translation(before, after);
    if (shift != null) {
      return "moved " + Words.move(shift);
    }
    if (before instanceof Shape.Box && after instanceof Shape.Polygon p) {
      return "now a polygon of " + p.vertices().size() + " corners (was a box)";
    }
    if (before instanceof Shape.Polygon && after instanceof Shape.Box) {
      return "now a box (was a polygon)";
    }
    double was = area(before);
    double now = area(after);
    String verb = Words.same(was, now) ? "reshaped" : now > was ? "grew" : "shrank";
    if (before instanceof Shape.Box) {
      return verb + " from " + dimensions(before) + " to " + dimensions(after);
    }
    return verb + " from " + Words.quantity(was, "m²") + " to " + Words.quantity(now, "m²");
  }

  private static String dimensions(Shape box) {
    Bounds b = box.bounds();
    return Words.number(b.width()) + " m × " + Words.number(b.height()) + " m";
  }

  /** The vector that carries {@code before} onto {@code after}, or null when no translation does. */
  static Vec2 translation(Shape before, Shape after) {
    List<Vec2> a = corners(before);
    List<Vec2> b = corners(after);
    if (before.getClass() != after.getClass() || a.size() != b.size() || a.isEmpty()) {
      return null;
    }
    Vec2 shift = b.get(0).minus(a.get(0));
    for (int i = 1; i < a.size(); i++) {
      if (!Words.same(b.get(i).minus(a.get(i)), shift)) {
        return null;
      }
    }
    return shift;
  }

  static List<Vec2> corners(Shape shape) {
    if (shape instanceof Shape.Box box) {
      Bounds b = box.box();
      return List.of(new Vec2(b.xmin(), b.ymin()), new Vec2(b.xmax(), b.ymin()), new Vec2(b.xmax(), b.ymax()),
          new Vec2(b.xmin(), b.ymax()));
    }
    return ((Shape.Polygon) shape).vertices();
  }

  static double area(Shape shape) {
    if (shape instanceof Shape.Box box) {
      return box.box().width() * box.box().height();
    }
    return Math.abs(Shape.Polygon.signedArea2(((Shape.Polygon) shape).vertices())) / 2;
  }

  /** True when the open interiors of two convex regions meet (no face of either separates them). */
  static boolean overlap(Shape a, Shape b) {
    if (!a.bounds().overlapsInterior(b.bounds())) {
      return false;
    }
    return !separated(a, b) && !separated(b, a);
  }

  private static boolean separated(Shape by, Shape other) {
    List<Vec2> corners = corners(other);
    for (Shape.Face face : by.faces()) {
      boolean allOutside = true;
      for (Vec2 c : corners) {
        if (face.normal().dot(c) < face.offset() - Words.NOISE * Math.max(1, Math.abs(face.offset()))) {
          allOutside = false;
          break;
        }
      }
      if (allOutside) {
        return true;
      }
    }
    return false;
  }
}
