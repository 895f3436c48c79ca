package dev.skerry.compiler.semdiff;

import dev.skerry.compiler.model.Area;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.List;

/** Field-by-field differences of one vehicle, area, zone, target or waypoint, and summaries of new ones. */
final class EntityDetails {
  private EntityDetails() {}

  static List<Change.Detail> vehicle(Vehicle a, Vehicle b) {
    List<Change.Detail> out = new ArrayList<>();
    if (a.dynamics() != b.dynamics()) {
      out.add(new Change.Detail("dynamics", a.dynamics().keyword(), b.dynamics().keyword(),
          "dynamics " + a.dynamics().keyword() + " → " + b.dynamics().keyword()));
    }
    if (!Words.same(a.start(), b.start())) {
      out.add(new Change.Detail("start", Words.point(a.start(), "m"), Words.point(b.start(), "m"),
          "start moved " + Words.move(b.start().minus(a.start()))));
    }
    if (!Words.same(a.startVelocity(), b.startVelocity())) {
      String before = velocity(a.startVelocity());
      String after = velocity(b.startVelocity());
      String phrase = b.startVelocity().norm() < Words.NOISE ? "now starts at rest"
          : "start velocity " + before + " → " + after;
      out.add(new Change.Detail("start velocity", before, after, phrase));
    }
    scalar(out, "speed max", a.maxSpeed(), b.maxSpeed(), "m/s");
    scalar(out, "accel max", a.maxAccel(), b.maxAccel(), "m/s^2");
    scalar(out, "radius", a.radius(), b.radius(), "m");
    if (a.sides() != b.sides()) {
      out.add(new Change.Detail("sides", Integer.toString(a.sides()), Integer.toString(b.sides()),
          "sides " + a.sides() + " → " + b.sides() + " (limit polygon faces)"));
    }
    if (a.target() == null ? b.target() != null : !a.target().equals(b.target())) {
      String before = a.target() == null ? "any free target" : a.target();
      String after = b.target() == null ? "any free target" : b.target();
      out.add(new Change.Detail("target", before, after, "target " + before + " → " + after));
    }
    Vehicle.Vertical va = a.vertical();
    Vehicle.Vertical vb = b.vertical();
    if (va != null && vb != null) {
      scalar(out, "start altitude", va.start(), vb.start(), "m");
      scalar(out, "start climb rate", va.startRate(), vb.startRate(), "m/s");
      scalar(out, "climb max", va.maxClimb(), vb.maxClimb(), "m/s");
      scalar(out, "climb accel max", va.maxClimbAccel(), vb.maxClimbAccel(), "m/s^2");
      altitude(out, va.limits(), vb.limits());
    }
    return out;
  }

  /** A change of an altitude range; null is "every altitude". */
  private static void altitude(List<Change.Detail> out, Span a, Span b) {
    String before = span(a);
    String after = span(b);
    if (!before.equals(after)) {
      out.add(new Change.Detail("altitude", before, after, "altitude " + before + " → " + after));
    }
  }

  private static String span(Span s) {
    return s == null ? "any" : Words.quantity(s.lo(), "m") + " to " + Words.quantity(s.hi(), "m");
  }

  static List<Change.Detail> area(Area a, Area b) {
    List<Change.Detail> out = new ArrayList<>();
    if (!a.name().equals(b.name())) {
      out.add(new Change.Detail("name", a.name(), b.name(), "renamed to " + b.name()));
    }
    region(out, a.shape(), b.shape());
    altitude(out, a.altitude(), b.altitude());
    return out;
  }

  /** A zone's own changes; overlaps with other zones are added by the caller, who sees them all. */
  static List<Change.Detail> zone(Zone a, Zone b) {
    List<Change.Detail> out = new ArrayList<>();
    region(out, a.shape(), b.shape());
    altitude(out, a.altitude(), b.altitude());
    return out;
  }

  static List<Change.Detail> target(Target a, Target b) {
    List<Change.Detail> out = new ArrayList<>();
    region(out, a.region(), b.region());
    altitude(out, a.altitude(), b.altitude());
    if (a.atRest() != b.atRest()) {
      out.add(new Change.Detail("at rest", Boolean.toString(a.atRest()), Boolean.toString(b.atRest()),
          b.atRest() ? "now must be reached at rest" : "no longer needs to be reached at rest"));
    }
    return out;
  }

  static List<Change.Detail> waypoint(Waypoint a, Waypoint b) {
    List<Change.Detail> out = new ArrayList<>();
    if (!Words.same(a.point(), b.point())) {
      out.add(new Change.Detail("point", Words.point(a.point(), "m"), Words.point(b.point(), "m"),
          "moved " + Words.move(b.point().minus(a.point()))));
    }
    scalar(out, "within", a.tolerance(), b.tolerance(), "m");
    altitude(out, a.altitude(), b.altitude());
    return out;
  }

  static Change.Detail added(String field, String value) {
    return new Change.Detail(field, null, value, value);
  }

  static String summary(Object entity) {
    if (entity instanceof Vehicle v) {
      return "starts at " + Words.point(v.start(), "m") + ", speed max " + Words.quantity(v.maxSpeed(), "m/s")
          + ", accel max " + Words.quantity(v.maxAccel(), "m/s^2") + ", radius " + Words.quantity(v.radius(), "m");
    } else if (entity instanceof Zone z) {
      return ShapeChanges.summary(z.shape());
    } else if (entity instanceof Target t) {
      return ShapeChanges.summary(t.region()) + (t.atRest() ? ", reached at rest" : "");
    } else if (entity instanceof Waypoint w) {
      return "at " + Words.point(w.point(), "m") + " within " + Words.quantity(w.tolerance(), "m");
    } else if (entity instanceof Area a) {
      return ShapeChanges.summary(a.shape());
    }
    return String.valueOf(ModelView.of(entity));
  }

  private static void region(List<Change.Detail> out, Shape a, Shape b) {
    String phrase = ShapeChanges.phrase(a, b);
    if (phrase != null) {
      out.add(new Change.Detail("region", ShapeChanges.describe(a), ShapeChanges.describe(b), phrase));
    }
  }

  private static void scalar(List<Change.Detail> out, String field, double a, double b, String unit) {
    if (!Words.same(a, b)) {
      String before = Words.quantity(a, unit);
      String after = Words.quantity(b, unit);
      out.add(new Change.Detail(field, before, after, field + " " + before + " → " + after));
    }
  }

  private static String velocity(Vec2 v) {
    return v.norm() < Words.NOISE ? "at rest" : Words.point(v, "m/s");
  }
}
