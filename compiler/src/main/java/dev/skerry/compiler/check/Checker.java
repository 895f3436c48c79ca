package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.Name;
import dev.skerry.compiler.ast.Expr;
import dev.skerry.compiler.ast.PlanProp;
import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.ast.ShapeNode;
import dev.skerry.compiler.ast.VehicleProp;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.model.Area;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.compiler.units.Dim;
import dev.skerry.compiler.units.Quantity;
import dev.skerry.compiler.units.Unit;
import dev.skerry.compiler.units.Units;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The resolve/check stage: declares every name, evaluates constants and quantities in SI, builds
 * the immutable {@link Scenario}, and reports everything wrong on the way. The scenario is null
 * when an error leaves it incomplete.
 */
final class Checker {
  /** Longest horizon accepted: beyond this the MILP is far past what any solver finishes. */
  static final int MAX_HORIZON = 2000;

  private final Diagnostics sink;
  private final SymbolTable symbols = new SymbolTable();
  private final Evaluator eval;
  private final Shapes shapes;
  private final Map<SourceFile, Units> unitsByFile = new HashMap<>();

  Checker(Diagnostics sink) {
    this.sink = sink;
    this.eval = new Evaluator(symbols, sink);
    this.shapes = new Shapes(eval, sink);
  }

  SymbolTable symbols() {
    return symbols;
  }

  /** Where each plan option is written, so hints can point at the line to change. */
  private final Map<String, SourceRange> planRanges = new HashMap<>();

  Map<String, SourceRange> planRanges() {
    return planRanges;
  }

  /** 2 (plan view) or 3 (with altitude), from the plan's `dimensions` line, read before anything else. */
  private int dimensions = 2;

  /** Where each vehicle's `target NAME` line is written. */
  private final Map<String, SourceRange> targetLines = new HashMap<>();

  private boolean threeD() {
    return dimensions == 3;
  }

  Scenario check(ScenarioFile main, List<Includes.Placed> decls) {
    declareAll(decls);
    for (Includes.Placed p : decls) {
      if (p.decl() instanceof Decl.UnitsDecl u) {
        units(p.file().source(), u);
      }
    }
    boolean dimensionsOk = readDimensions(decls);
    String name = null;
    List<Vehicle> vehicles = new ArrayList<>();
    List<Area> areas = new ArrayList<>();
    List<Zone> zones = new ArrayList<>();
    List<Target> targets = new ArrayList<>();
    List<Waypoint> waypoints = new ArrayList<>();
    PlanOptions plan = null;
    Decl.PlanDecl planDecl = null;
    boolean complete = true;
    for (Includes.Placed p : decls) {
      Units units = unitsOf(p.file().source());
      Decl decl = p.decl();
      if (decl instanceof Decl.Header h) {
        if (name != null) {
          sink.report(Code.DUPLICATE_DECLARATION, h.range(), "the scenario is named twice");
        }
        name = h.name().text();
      } else if (decl instanceof Decl.ConstDecl c) {
        Quantity q = eval.eval(c.value(), units);
        if (q != null) {
          eval.defineConstant(c.name().text(), q);
        }
      } else if (decl instanceof Decl.VehicleDecl v) {
        complete &= add(vehicles, vehicle(v, units));
      } else if (decl instanceof Decl.AreaDecl a) {
        complete &= add(areas, area(a, units));
        if (areas.size() > 1) {
          sink.report(Code.DUPLICATE_DECLARATION, a.range(), "the scenario has one keep-in area; `"
              + areas.get(0).name() + "` is already declared", related("the first area", areas.get(0).range()));
        }
      } else if (decl instanceof Decl.ZoneDecl z) {
        Shapes.Solid solid = shapes.solid(z.shape(), units, "zone `" + z.name().text() + "`", dimensions);
        complete &= add(zones, solid == null ? null
            : new Zone(z.name().text(), solid.shape(), z.name().range(), solid.altitude()));
      } else if (decl instanceof Decl.TargetDecl t) {
        Shapes.Solid solid = shapes.solid(t.shape(), units, "target `" + t.name().text() + "`", dimensions);
        complete &= add(targets, solid == null ? null
            : new Target(t.name().text(), solid.shape(), t.atRest(), t.name().range(), solid.altitude()));
      } else if (decl instanceof Decl.WaypointDecl w) {
        complete &= add(waypoints, waypoint(w, units));
      } else if (decl instanceof Decl.PlanDecl pd) {
        if (planDecl != null) {
          sink.report(Code.DUPLICATE_DECLARATION, pd.range(), "the scenario has one plan block; merge the two",
              related("the first plan block", planDecl.range()));
        } else {
          planDecl = pd;
        }
      }
    }
    SourceRange top = new SourceRange(main.source(), 0, 0);
    // A declaration that is written but broken was reported already; only absent ones are missing.
    boolean unreadable = sink.hasCode(Code.FILE_TOO_LARGE) || sink.hasCode(Code.NESTING_TOO_DEEP);
    boolean hasVehicle = unreadable || decls.stream().anyMatch(p -> p.decl() instanceof Decl.VehicleDecl);
    boolean hasArea = unreadable || decls.stream().anyMatch(p -> p.decl() instanceof Decl.AreaDecl);
    boolean hasTarget = unreadable || decls.stream().anyMatch(p -> p.decl() instanceof Decl.TargetDecl);
    if (planDecl != null) {
      plan = plan(planDecl, unitsOf(main.source()), zones.size());
      complete &= plan != null;
    } else if (unreadable) {
      complete = false;
    } else {
      sink.report(Code.MISSING_DECLARATION, top, "the scenario has no `plan { ... }` block (it needs at least `step` and `horizon`)");
      complete = false;
    }
    complete &= !vehicles.isEmpty() && !areas.isEmpty() && !targets.isEmpty();
    require(!hasVehicle, top, "the scenario has no vehicle: add `vehicle name { start (x, y) ... }`");
    require(!hasArea, top, "the scenario has no keep-in area: add `area name box (x, y) to (x, y)`");
    require(!hasTarget, top, "the scenario has no target: add `target name box (x, y) to (x, y)`");
    complete &= dimensionsOk;
    if (complete) {
      complete = assignTargets(vehicles, targets);
    }
    if (plan != null && plan.separation() > 0 && vehicles.size() == 1 && planRanges.containsKey("separation")) {
      sink.report(Code.NO_EFFECT, planRanges.get("separation"), "`separation` keeps vehicles apart, and this"
          + " scenario has one vehicle; it has no effect");
    }
    if (!complete || sink.hasErrors()) {
      return null;
    }
    int sides = planSides;
    List<Vehicle> withSides = new ArrayList<>();
    for (Vehicle v : vehicles) {
      withSides.add(v.sides() > 0 ? v : v.withSides(sides));
    }
    return new Scenario(name == null ? fileStem(main.source()) : name, withSides, areas.get(0), zones, targets,
        waypoints, plan, dimensions);
  }

  /**
   * Reads `dimensions` from the first plan block before any other declaration is checked, since
   * points and shapes depend on it. It must be written as the number 2 or 3.
   */
  private boolean readDimensions(List<Includes.Placed> decls) {
    for (Includes.Placed p : decls) {
      if (!(p.decl() instanceof Decl.PlanDecl pd)) {
        continue;
      }
      for (PlanProp prop : pd.props()) {
        if (prop instanceof PlanProp.Dimensions d) {
          if (d.count() instanceof Expr.Number n && n.unit() == null && (n.value() == 2 || n.value() == 3)) {
            dimensions = (int) n.value();
            return true;
          }
          sink.report(Code.VALUE_OUT_OF_RANGE, d.count().range(), "`dimensions` is the number 2 (plan view) or 3"
              + " (with altitude)");
          return false;
        }
      }
      return true;
    }
    return true;
  }

  private Area area(Decl.AreaDecl a, Units units) {
    String what = "area `" + a.name().text() + "`";
    Shapes.Solid solid = shapes.solid(a.shape(), units, what, dimensions);
    if (solid == null) {
      return null;
    }
    if (threeD() && solid.altitude() == null) {
      sink.report(Code.MISSING_ALTITUDE, a.name().range(), "in a 3-D scenario the keep-in " + what + " needs a floor"
          + " and a ceiling: give its corners an altitude, `box (x1, y1, z1) to (x2, y2, z2)`, or add `altitude LO to HI`");
      return null;
    }
    return new Area(a.name().text(), solid.shape(), a.name().range(), solid.altitude());
  }

  /**
   * Checks that every vehicle can get its own target: a vehicle's `target` names a target no other
   * vehicle names, and the vehicles that name none share at least as many of the remaining targets.
   * A target no vehicle can end at is a warning. False after an error.
   */
  private boolean assignTargets(List<Vehicle> vehicles, List<Target> targets) {
    boolean ok = true;
    Map<String, Vehicle> claimed = new LinkedHashMap<>();
    List<Vehicle> free = new ArrayList<>();
    for (Vehicle v : vehicles) {
      if (v.target() == null) {
        free.add(v);
        continue;
      }
      Vehicle earlier = claimed.putIfAbsent(v.target(), v);
      if (earlier != null) {
        sink.report(Code.TARGET_CONFLICT, targetLines.getOrDefault(v.name(), v.range()), "target `" + v.target()
            + "` is already the target of vehicle `" + earlier.name() + "`; each target takes one vehicle",
            related("vehicle `" + earlier.name() + "`", targetLines.getOrDefault(earlier.name(), earlier.range())));
        ok = false;
      }
    }
    List<Target> open = new ArrayList<>();
    for (Target t : targets) {
      if (!claimed.containsKey(t.name())) {
        open.add(t);
      }
    }
    if (free.size() > open.size() && vehicles.size() > 1) {
      Vehicle v = free.get(open.size());
      sink.report(Code.TARGET_CONFLICT, v.range(), free.size() + " vehicles name no target and share the "
          + open.size() + (open.size() == 1 ? " target" : " targets") + " no vehicle names, so vehicle `" + v.name()
          + "` is left without one; add a target or give it `target NAME`");
      return false;
    }
    if (!ok) {
      return false;
    }
    if (free.isEmpty()) {
      for (Target t : open) {
        sink.report(Code.TARGET_UNUSED, t.range(), "no vehicle can end at target `" + t.name()
            + "`: every vehicle names another target; remove it or name it with `target " + t.name()
            + "` in a vehicle");
      }
    }
    return true;
  }

  private int planSides = Vehicle.DEFAULT_SIDES;

  private static String fileStem(SourceFile source) {
    String n = source.path() == null ? source.displayName() : source.path().getFileName().toString();
    int dot = n.lastIndexOf('.');
    return dot > 0 ? n.substring(0, dot) : n;
  }

  private boolean require(boolean missing, SourceRange at, String message) {
    if (missing) {
      sink.report(Code.MISSING_DECLARATION, at, message);
    }
    return !missing;
  }

  private static <T> boolean add(List<T> list, T item) {
    if (item == null) {
      return false;
    }
    list.add(item);
    return true;
  }

  static Diagnostic.Related related(String message, SourceRange range) {
    return new Diagnostic.Related(message, range);
  }

  private void declareAll(List<Includes.Placed> decls) {
    for (Includes.Placed p : decls) {
      Symbol.Kind kind = kindOf(p.decl());
      if (kind == null) {
        continue;
      }
      Name name = p.decl().name();
      Symbol earlier = symbols.declare(new Symbol(kind, name, p.decl()));
      if (earlier != null) {
        sink.report(Code.DUPLICATE_NAME, name.range(), "`" + name.text() + "` is already declared as a "
            + earlier.kind().word() + "; every name is declared once", related("the first declaration", earlier.name().range()));
      }
    }
  }

  static Symbol.Kind kindOf(Decl decl) {
    if (decl instanceof Decl.ConstDecl) {
      return Symbol.Kind.CONSTANT;
    } else if (decl instanceof Decl.VehicleDecl) {
      return Symbol.Kind.VEHICLE;
    } else if (decl instanceof Decl.AreaDecl) {
      return Symbol.Kind.AREA;
    } else if (decl instanceof Decl.ZoneDecl) {
      return Symbol.Kind.ZONE;
    } else if (decl instanceof Decl.TargetDecl) {
      return Symbol.Kind.TARGET;
    } else if (decl instanceof Decl.WaypointDecl) {
      return Symbol.Kind.WAYPOINT;
    }
    return null;
  }

  private final Map<SourceFile, Decl.UnitsDecl> unitsDecls = new HashMap<>();

  private void units(SourceFile file, Decl.UnitsDecl decl) {
    Decl.UnitsDecl earlier = unitsDecls.putIfAbsent(file, decl);
    if (earlier != null) {
      sink.report(Code.DUPLICATE_DECLARATION, decl.range(), "this file already sets its units",
          related("the first `units` line", earlier.range()));
      return;
    }
    Units units = Units.si();
    for (Name n : decl.units()) {
      Unit unit = Units.lookup(n.text());
      if (unit == null) {
        sink.report(Code.UNKNOWN_UNIT, n.range(), "unknown unit `" + n.text() + "`");
        continue;
      }
      Units changed = units.withDefault(unit);
      if (changed == null) {
        sink.report(Code.UNIT_MISMATCH, n.range(), "`units` sets the length and time units for bare numbers; `"
            + n.text() + "` is " + unit.dim().describe());
        continue;
      }
      units = changed;
    }
    unitsByFile.put(file, units);
  }

  private Units unitsOf(SourceFile file) {
    return unitsByFile.getOrDefault(file, Units.si());
  }

  private Vehicle vehicle(Decl.VehicleDecl decl, Units units) {
    Map<String, VehicleProp> seen = new HashMap<>();
    for (VehicleProp prop : decl.props()) {
      VehicleProp earlier = seen.putIfAbsent(prop.keyword(), prop);
      if (earlier != null) {
        sink.report(Code.DUPLICATE_PROPERTY, prop.range(), "`" + prop.keyword() + "` is given twice for vehicle `"
            + decl.name().text() + "`", related("the first one", earlier.range()));
      }
    }
    String what = "vehicle `" + decl.name().text() + "`";
    boolean ok = true;
    boolean brokenText = sink.hasWithin(Code.SYNTAX_ERROR, decl.range());
    List<String> required = threeD() ? List.of("start", "speed", "accel", "climb max") : List.of("start", "speed", "accel");
    for (String needed : required) {
      if (seen.containsKey(needed)) {
        continue;
      }
      ok = false;
      if (!brokenText) {
        String example = needed.equals("start") ? (threeD() ? "start (0, 0, 10) at rest" : "start (0, 0) at rest")
            : needed.equals("speed") ? "speed max 3 m/s" : needed.equals("accel") ? "accel max 1 m/s^2"
            : "climb max 2 m/s";
        sink.report(Code.MISSING_PROPERTY, decl.name().range(), what + " needs `" + needed + "` (e.g. `" + example + "`)");
      }
    }
    Vehicle.Dynamics dynamics = Vehicle.Dynamics.DOUBLE_INTEGRATOR;
    Vec2 start = null;
    Vec2 velocity = Vec2.ZERO;
    Double speed = null;
    Double accel = null;
    double radius = 0;
    int sides = 0;
    double startZ = 0;
    double startRate = 0;
    Double climb = null;
    Double climbAccel = null;
    Span limits = null;
    String target = null;
    for (VehicleProp prop : seen.values()) {
      if (prop instanceof VehicleProp.Dynamics d) {
        if (!d.model().text().equals(Vehicle.Dynamics.DOUBLE_INTEGRATOR.keyword())) {
          sink.report(Code.UNKNOWN_OPTION, d.model().range(), "unknown dynamics `" + d.model().text()
              + "`; this version knows `double_integrator`");
          ok = false;
        }
      } else if (prop instanceof VehicleProp.Start s) {
        int n = dimensions;
        double[] p = eval.coordinates(s.position(), Dim.LENGTH, units, "the start of " + what, n, n,
            threeD() ? " (a 3-D scenario needs the start altitude)" : Shapes.PLAN_VIEW_ADVICE);
        start = p == null ? null : new Vec2(p[0], p[1]);
        startZ = p == null ? 0 : p[n - 1];
        ok &= start != null;
        if (s.motion() instanceof VehicleProp.Motion.VelocityVector vv) {
          double[] u = eval.coordinates(vv.velocity(), Dim.SPEED, units, "the start velocity of " + what, 2, n,
              threeD() ? null : Shapes.PLAN_VIEW_ADVICE);
          velocity = u == null ? null : new Vec2(u[0], u[1]);
          startRate = u != null && u.length == 3 ? u[2] : 0;
          ok &= velocity != null;
        } else if (s.motion() instanceof VehicleProp.Motion.SpeedHeading sh) {
          Double v = eval.expect(sh.speed(), Dim.SPEED, units, "the start speed");
          Double heading = eval.expect(sh.heading(), Dim.ANGLE, units, "the heading");
          if (v == null || heading == null) {
            ok = false;
          } else {
            // Heading as a compass bearing: 0 = +y (north), 90 deg = +x (east).
            velocity = new Vec2(v * Math.sin(heading), v * Math.cos(heading));
          }
        }
      } else if (prop instanceof VehicleProp.Speed s) {
        speed = positive(eval.expect(s.max(), Dim.SPEED, units, "the speed limit"), s.max().range(), "the speed limit");
        ok &= speed != null;
      } else if (prop instanceof VehicleProp.Accel a) {
        accel = positive(eval.expect(a.max(), Dim.ACCEL, units, "the acceleration limit"), a.max().range(),
            "the acceleration limit");
        ok &= accel != null;
      } else if (prop instanceof VehicleProp.Radius r) {
        Double value = eval.expect(r.value(), Dim.LENGTH, units, "the radius");
        if (value != null && value < 0) {
          sink.report(Code.VALUE_OUT_OF_RANGE, r.value().range(), "the radius cannot be negative");
          value = null;
        }
        ok &= value != null;
        radius = value == null ? 0 : value;
      } else if (prop instanceof VehicleProp.Sides s) {
        Integer count = eval.expectCount(s.count(), units, "the number of sides", 3, 64);
        ok &= count != null;
        sides = count == null ? 0 : count;
      } else if (prop instanceof VehicleProp.Climb c) {
        if (planViewOnly(c.range(), "`climb max`")) {
          ok = false;
        } else {
          climb = positive(eval.expect(c.max(), Dim.SPEED, units, "the climb limit"), c.max().range(), "the climb limit");
          ok &= climb != null;
        }
      } else if (prop instanceof VehicleProp.ClimbAccel c) {
        if (planViewOnly(c.range(), "`climb accel max`")) {
          ok = false;
        } else {
          climbAccel = positive(eval.expect(c.max(), Dim.ACCEL, units, "the climb acceleration limit"), c.max().range(),
              "the climb acceleration limit");
          ok &= climbAccel != null;
        }
      } else if (prop instanceof VehicleProp.Altitude a) {
        limits = shapes.altitude(a.span(), units, what, threeD());
        ok &= limits != null;
      } else if (prop instanceof VehicleProp.TargetRef t) {
        Symbol symbol = symbols.lookup(t.target().text());
        if (symbol != null) {
          symbols.reference(t.target(), symbol);
        }
        if (symbol == null || symbol.kind() != Symbol.Kind.TARGET) {
          sink.report(Code.UNKNOWN_NAME, t.target().range(), symbol == null
              ? "no target named `" + t.target().text() + "` is declared"
              : "`" + t.target().text() + "` is a " + symbol.kind().word() + ", not a target");
          ok = false;
        } else {
          target = t.target().text();
          targetLines.put(decl.name().text(), t.range());
        }
      }
    }
    if (!ok) {
      return null;
    }
    Vehicle.Vertical vertical = null;
    if (threeD()) {
      if (Math.abs(startRate) > climb * (1 + 1e-9)) {
        sink.report(Code.START_TOO_FAST, seen.get("start").range(), what + " starts climbing at "
            + Format.number(startRate) + " m/s, above its climb limit of " + Format.number(climb) + " m/s");
      }
      vertical = new Vehicle.Vertical(startZ, startRate, climb, climbAccel == null ? accel : climbAccel, limits);
    }
    if (velocity.norm() > speed * (1 + 1e-9)) {
      VehicleProp s = seen.get("start");
      sink.report(Code.START_TOO_FAST, s.range(), what + " starts at " + Format.number(velocity.norm())
          + " m/s, above its speed limit of " + Format.number(speed) + " m/s");
    }
    return new Vehicle(decl.name().text(), dynamics, start, velocity, speed, accel, radius, sides, decl.name().range(),
        vertical, target);
  }

  /** Reports a 3-D-only vehicle item in a plan-view scenario; true when it did. */
  private boolean planViewOnly(SourceRange at, String item) {
    if (threeD()) {
      return false;
    }
    sink.report(Code.DIMENSION_MISMATCH, at, item + " is for 3-D scenarios; add `dimensions 3` to the plan or"
        + " remove this line");
    return true;
  }

  private Double positive(Double value, SourceRange range, String what) {
    if (value != null && !(value > 0)) {
      sink.report(Code.VALUE_OUT_OF_RANGE, range, what + " must be greater than zero");
      return null;
    }
    return value;
  }

  private Waypoint waypoint(Decl.WaypointDecl w, Units units) {
    String what = "waypoint `" + w.name().text() + "`";
    double[] p = eval.coordinates(w.point(), Dim.LENGTH, units, what, 2, dimensions,
        threeD() ? null : Shapes.PLAN_VIEW_ADVICE);
    Double tolerance = positive(eval.expect(w.tolerance(), Dim.LENGTH, units, "the tolerance"), w.tolerance().range(),
        "the tolerance");
    if (p == null || tolerance == null) {
      return null;
    }
    Span band = p.length == 3 ? new Span(p[2] - tolerance, p[2] + tolerance) : null;
    return new Waypoint(w.name().text(), new Vec2(p[0], p[1]), tolerance, w.name().range(), band);
  }

  private PlanOptions plan(Decl.PlanDecl decl, Units units, int zoneCount) {
    Map<String, PlanProp> seen = new HashMap<>();
    for (PlanProp prop : decl.props()) {
      PlanProp earlier = seen.putIfAbsent(prop.keyword(), prop);
      planRanges.putIfAbsent(prop.keyword(), prop.range());
      if (earlier != null) {
        sink.report(Code.DUPLICATE_PROPERTY, prop.range(), "`" + prop.keyword() + "` is given twice in the plan",
            related("the first one", earlier.range()));
      }
    }
    SourceRange planKeyword = new SourceRange(decl.range().source(), decl.range().start(), decl.range().start() + 4);
    boolean ok = !sink.hasWithin(Code.SYNTAX_ERROR, decl.range());
    if (!seen.containsKey("step") && ok) {
      sink.report(Code.MISSING_PROPERTY, planKeyword, "the plan needs `step` (the time step, e.g. `step 1 s`)");
      ok = false;
    }
    if (!seen.containsKey("horizon") && !sink.hasWithin(Code.SYNTAX_ERROR, decl.range())) {
      sink.report(Code.MISSING_PROPERTY, planKeyword, "the plan needs `horizon` (a number of steps, e.g. `horizon 40`)");
      ok = false;
    }
    Double step = null;
    if (seen.get("step") instanceof PlanProp.Step s) {
      step = positive(eval.expect(s.value(), Dim.TIME, units, "the step"), s.value().range(), "the step");
      ok &= step != null;
    }
    int horizon = 0;
    if (seen.get("horizon") instanceof PlanProp.Horizon h && step != null) {
      Quantity q = eval.eval(h.value(), units);
      if (q == null) {
        ok = false;
      } else if (!q.bare() && q.dim().equals(Dim.TIME)) {
        horizon = (int) Math.min(Integer.MAX_VALUE, Math.ceil(q.value() / step - 1e-9));
        if (horizon < 1 || horizon > MAX_HORIZON) {
          sink.report(Code.VALUE_OUT_OF_RANGE, h.value().range(), "the horizon must be from 1 to " + MAX_HORIZON
              + " steps; this is " + horizon);
          ok = false;
        }
      } else {
        Integer n = eval.expectCount(h.value(), units, "the horizon (a number of steps, or a time)", 1, MAX_HORIZON);
        ok &= n != null;
        horizon = n == null ? 0 : n;
      }
    }
    double timeWeight = 1;
    double fuelWeight = 0;
    boolean latest = false;
    if (seen.get("minimize") instanceof PlanProp.Minimize m) {
      timeWeight = 0;
      PlanProp.Term plainTime = null;
      PlanProp.Term latestTime = null;
      for (PlanProp.Term t : m.terms()) {
        if (t.latest() && t.what().equals("fuel") && t.weight() == null
            && symbols.lookup("latest") != null && symbols.lookup("latest").kind() == Symbol.Kind.CONSTANT) {
          // `latest fuel` with a constant named `latest`: the constant is the weight.
          SourceRange at = new SourceRange(t.range().source(), t.range().start(), t.range().start() + "latest".length());
          t = new PlanProp.Term(new Expr.Ref(new Name("latest", at)), "fuel", false, t.range());
        }
        if (t.latest() && t.what().equals("fuel")) {
          sink.report(Code.UNKNOWN_OPTION, t.range(), "`latest` goes with `time` only (the latest arrival of the"
              + " fleet); fuel is always summed over the vehicles");
          ok = false;
          continue;
        }
        if (t.what().equals("time")) {
          if (t.latest()) {
            latestTime = latestTime == null ? t : latestTime;
          } else {
            plainTime = plainTime == null ? t : plainTime;
          }
          if (latestTime != null && plainTime != null) {
            sink.report(Code.DUPLICATE_PROPERTY, t.range(), "the objective counts time one way: the sum of arrival"
                + " times (`time`) or the latest arrival (`latest time`), not both");
            ok = false;
            continue;
          }
          latest |= t.latest();
        }
        double w = 1;
        if (t.weight() != null) {
          Double value = eval.expect(t.weight(), Dim.NONE, units, "a weight");
          if (value == null || value < 0) {
            if (value != null) {
              sink.report(Code.VALUE_OUT_OF_RANGE, t.weight().range(), "weights cannot be negative");
            }
            ok = false;
            continue;
          }
          w = value;
        }
        if (t.what().equals("time")) {
          timeWeight += w;
        } else {
          fuelWeight += w;
        }
      }
      if (ok && timeWeight == 0 && fuelWeight == 0) {
        sink.report(Code.VALUE_OUT_OF_RANGE, m.range(), "the objective has only zero weights; give time or fuel a weight");
        ok = false;
      }
    }
    int clusters = 0;
    PlanOptions.SymmetryRule rule = PlanOptions.SymmetryRule.ORDERED;
    if (seen.get("clusters") instanceof PlanProp.Clusters c) {
      Integer n = eval.expectCount(c.count(), units, "the number of clusters", 0, 1_000_000);
      if (n == null) {
        ok = false;
      } else if (n > 0 && (n > zoneCount || zoneCount == 0)) {
        sink.report(Code.CLUSTERS_OUT_OF_RANGE, c.count().range(), zoneCount == 0
            ? "there are no zones to cluster; remove `clusters`"
            : "the scenario has " + zoneCount + (zoneCount == 1 ? " zone, so at most 1 cluster" : " zones, so at most "
                + zoneCount + " clusters") + " (" + n + " asked)");
        ok = false;
      } else {
        clusters = n;
      }
      if (c.rule() != null) {
        rule = PlanOptions.SymmetryRule.fromKeyword(c.rule().text());
        if (rule == null) {
          sink.report(Code.UNKNOWN_OPTION, c.rule().range(), "unknown symmetry rule `" + c.rule().text()
              + "`; choose `none`, `ordered` or `sorted`");
          ok = false;
        }
      }
    }
    int closedLoop = horizon * 4;
    if (seen.get("closed_loop") instanceof PlanProp.ClosedLoop cl) {
      Integer n = eval.expectCount(cl.max(), units, "the closed-loop limit", 1, 100_000);
      ok &= n != null;
      closedLoop = n == null ? 0 : n;
    }
    String solver = PlanOptions.DEFAULT_SOLVER;
    Duration timeLimit = null;
    double gap = 1e-4;
    int threads = 0;
    if (seen.get("solver") instanceof PlanProp.Solver s) {
      solver = s.engine().text();
      if (!SOLVERS.contains(solver)) {
        sink.report(Code.UNKNOWN_OPTION, s.engine().range(), "unknown solver `" + solver + "`; choose one of "
            + String.join(", ", SOLVERS));
        ok = false;
      }
      if (s.timeLimit() != null) {
        Double t = positive(eval.expect(s.timeLimit(), Dim.TIME, units, "the time limit"), s.timeLimit().range(),
            "the time limit");
        ok &= t != null;
        timeLimit = t == null ? null : Duration.ofNanos((long) Math.min(Long.MAX_VALUE, t * 1e9));
      }
      if (s.gap() != null) {
        Double g = eval.expect(s.gap(), Dim.NONE, units, "the gap");
        if (g != null && (g < 0 || g >= 1)) {
          sink.report(Code.VALUE_OUT_OF_RANGE, s.gap().range(), "the gap is a fraction from 0 to 1, e.g. `0.5 %` or `0.005`");
          g = null;
        }
        ok &= g != null;
        gap = g == null ? gap : g;
      }
      if (s.threads() != null) {
        Integer n = eval.expectCount(s.threads(), units, "the number of threads", 0, 256);
        ok &= n != null;
        threads = n == null ? 0 : n;
      }
    }
    double separation = 0;
    if (seen.get("separation") instanceof PlanProp.Separation sep) {
      Double d = eval.expect(sep.value(), Dim.LENGTH, units, "the separation");
      if (d != null && d < 0) {
        sink.report(Code.VALUE_OUT_OF_RANGE, sep.value().range(), "the separation cannot be negative");
        d = null;
      }
      ok &= d != null;
      separation = d == null ? 0 : d;
    }
    if (clusters > 0 && threeD()) {
      sink.report(Code.UNSUPPORTED, planRanges.getOrDefault("clusters", decl.range()), "clusters group zones into"
          + " plan-view boxes; in a 3-D scenario this version avoids zones one by one, so remove `clusters`");
      ok = false;
    }
    boolean guard = !(seen.get("guard") instanceof PlanProp.Guard g) || g.on();
    boolean pruning = !(seen.get("pruning") instanceof PlanProp.Pruning p) || p.on();
    if (seen.get("sides") instanceof PlanProp.Sides s) {
      Integer n = eval.expectCount(s.count(), units, "the number of sides", 3, 64);
      ok &= n != null;
      planSides = n == null ? planSides : n;
    }
    if (!ok) {
      return null;
    }
    return new PlanOptions(step, horizon, timeWeight, fuelWeight, clusters, rule, closedLoop, solver, timeLimit, gap,
        threads, guard, pruning, decl.range(), separation, latest);
  }

  /** Solver names the plan block accepts (the solve stage maps them to backends). */
  static final List<String> SOLVERS = List.of("default", "ojalgo", "scip", "cbc", "highs", "cpsat");
}
