package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.check.Hints;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.Lookup;
import dev.skerry.lsp.protocol.Ranges;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.MarkupContent;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.Position;

/**
 * Hover: a vehicle's limits and a zone's bounds grown by the vehicle's radius, in SI units; a
 * constant's declaration; the plan's step, horizon and the fewest steps that reach the target.
 */
public final class HoverHandler {
  private static final String NOT_CHECKED = "SI values appear once the scenario checks without errors.";

  public Hover hover(AnalysisResult result, Position position) {
    int offset = Ranges.offset(result.main(), position);
    if (offset < 0) {
      return null;
    }
    Lookup.Hit hit = Lookup.symbolAt(result, offset);
    Decl decl = hit != null ? hit.symbol().decl() : Lookup.declAt(result, offset);
    if (decl == null) {
      return null;
    }
    String text = describe(decl, result.check().scenario(), result.sizes());
    if (text != null && decl instanceof Decl.PlanDecl && result.sizes() != null) {
      text = text + "\n" + String.join("\n", SizeHandler.hoverLines(result.sizes()));
    }
    if (text == null) {
      return null;
    }
    Hover hover = new Hover(new MarkupContent(MarkupKind.MARKDOWN, text));
    SourceRange at = hit != null ? hit.at() : decl.name() != null ? decl.name().range() : null;
    if (at != null && result.isMain(at.source())) {
      hover.setRange(Ranges.of(at));
    }
    return hover;
  }

  static String describe(Decl decl, Scenario scenario) {
    return describe(decl, scenario, null);
  }

  static String describe(Decl decl, Scenario scenario, dev.skerry.lsp.analysis.SizeEstimator.PlanSizes sizes) {
    if (decl instanceof Decl.VehicleDecl v) {
      return vehicle(v, scenario);
    } else if (decl instanceof Decl.ZoneDecl z) {
      return zone(z, scenario, sizes);
    } else if (decl instanceof Decl.ConstDecl c) {
      return "constant `" + c.name().text() + "`\n\n```\n" + c.range().text() + "\n```";
    } else if (decl instanceof Decl.AreaDecl a) {
      return scenario == null ? "keep-in area `" + a.name().text() + "`\n\n" + NOT_CHECKED
          : "keep-in area `" + a.name().text() + "`, in SI units:\n- " + bounds(scenario.area().bounds());
    } else if (decl instanceof Decl.TargetDecl t) {
      return target(t, scenario);
    } else if (decl instanceof Decl.WaypointDecl w) {
      return waypoint(w, scenario);
    } else if (decl instanceof Decl.PlanDecl) {
      return plan(scenario);
    }
    return null;
  }

  private static String vehicle(Decl.VehicleDecl decl, Scenario scenario) {
    String title = "vehicle `" + decl.name().text() + "`";
    Vehicle v = scenario == null ? null
        : scenario.vehicles().stream().filter(x -> x.name().equals(decl.name().text())).findFirst().orElse(null);
    if (v == null) {
      return title + "\n\n" + NOT_CHECKED;
    }
    List<String> lines = new ArrayList<>();
    lines.add(title + " (" + v.dynamics().keyword() + "), in SI units:");
    lines.add("- start: " + point(v.start()) + " m, " + (v.startVelocity().norm() == 0 ? "at rest"
        : "velocity " + point(v.startVelocity()) + " m/s"));
    lines.add("- speed limit: " + Format.number(v.maxSpeed()) + " m/s");
    lines.add("- acceleration limit: " + Format.number(v.maxAccel()) + " m/s²");
    lines.add("- radius: " + Format.number(v.radius()) + " m (every zone grows by it)");
    lines.add("- limits approximated by polygons of " + v.sides() + " sides");
    if (v.vertical() != null) {
      Vehicle.Vertical vt = v.vertical();
      lines.add("- start altitude: " + Format.number(vt.start()) + " m, climb rate " + Format.number(vt.startRate())
          + " m/s");
      lines.add("- climb limit: " + Format.number(vt.maxClimb()) + " m/s, vertical acceleration limit "
          + Format.number(vt.maxClimbAccel()) + " m/s²");
      if (vt.limits() != null) {
        lines.add("- altitude limits: " + span(vt.limits()));
      }
    }
    if (scenario.vehicles().size() > 1 || scenario.targets().size() > 1) {
      lines.add(v.target() != null ? "- target: `" + v.target() + "`"
          : "- target: assigned by the plan among " + names(scenario.candidateTargets(v)));
    }
    return String.join("\n", lines);
  }

  private static String names(List<dev.skerry.compiler.model.Target> targets) {
    List<String> out = new ArrayList<>();
    for (dev.skerry.compiler.model.Target t : targets) {
      out.add("`" + t.name() + "`");
    }
    return String.join(", ", out);
  }

  private static String span(dev.skerry.compiler.model.Span s) {
    return Format.number(s.lo()) + " … " + Format.number(s.hi()) + " m";
  }

  private static String zone(Decl.ZoneDecl decl, Scenario scenario, dev.skerry.lsp.analysis.SizeEstimator.PlanSizes sizes) {
    Zone zone = scenario == null ? null
        : scenario.zones().stream().filter(z -> z.name().equals(decl.name().text())).findFirst().orElse(null);
    String kind = decl.shape() instanceof dev.skerry.compiler.ast.ShapeNode.BoxNode ? "box" : "polygon";
    String title = "zone `" + decl.name().text() + "` (" + kind + ")";
    if (zone == null) {
      return title + "\n\n" + NOT_CHECKED;
    }
    Vehicle v = scenario.vehicle();
    for (Vehicle other : scenario.vehicles()) {
      v = other.radius() > v.radius() ? other : v;
    }
    Shape grown = zone.shape().inflate(v.radius());
    List<String> lines = new ArrayList<>();
    lines.add(title + ", in SI units:");
    lines.add("- as written: " + bounds(zone.shape().bounds()));
    if (scenario.threeD()) {
      lines.add(zone.altitude() == null ? "- altitude: every altitude (a column)"
          : "- altitude: " + span(zone.altitude()) + " (floor and ceiling)");
    }
    lines.add("- grown by the radius of `" + v.name() + "` (" + Format.number(v.radius()) + " m): "
        + bounds(grown.bounds()));
    if (grown instanceof Shape.Polygon p) {
      List<String> corners = new ArrayList<>();
      for (Vec2 c : p.vertices()) {
        corners.add(point(c));
      }
      lines.add("- grown corners (counter-clockwise): " + String.join(" ", corners));
    }
    lines.add("- faces: " + zone.faceCount());
    Long binaries = sizes == null ? null : sizes.zoneBinaries().get(zone.name());
    if (binaries != null) {
      lines.add(String.format(java.util.Locale.ROOT, "- binaries it adds: %,d (after reachability pruning)", binaries));
    } else if (sizes != null && scenario.plan().clustered()) {
      lines.add("- binaries it adds: none of its own; it is avoided through its cluster");
    }
    return String.join("\n", lines);
  }

  private static String target(Decl.TargetDecl decl, Scenario scenario) {
    String title = "target `" + decl.name().text() + "`";
    if (scenario == null) {
      return title + "\n\n" + NOT_CHECKED;
    }
    dev.skerry.compiler.model.Target t = scenario.target(decl.name().text());
    if (t == null) {
      return title + "\n\n" + NOT_CHECKED;
    }
    return title + (t.atRest() ? ", arrive at rest" : "") + ", in SI units:\n- " + bounds(t.region().bounds())
        + (t.altitude() != null ? "\n- altitude: " + span(t.altitude()) : "");
  }

  private static String waypoint(Decl.WaypointDecl decl, Scenario scenario) {
    String title = "waypoint `" + decl.name().text() + "`";
    Waypoint w = scenario == null ? null
        : scenario.waypoints().stream().filter(x -> x.name().equals(decl.name().text())).findFirst().orElse(null);
    if (w == null) {
      return title + "\n\n" + NOT_CHECKED;
    }
    return title + ", in SI units:\n- at " + point(w.point()) + " m, within " + Format.number(w.tolerance())
        + " m on each axis\n- region: " + bounds(w.region());
  }

  private static String plan(Scenario scenario) {
    if (scenario == null) {
      return "plan\n\n" + NOT_CHECKED;
    }
    PlanOptions p = scenario.plan();
    List<String> lines = new ArrayList<>();
    lines.add("plan, in SI units:");
    lines.add("- step: " + Format.number(p.step()) + " s");
    lines.add("- horizon: " + p.horizon() + " steps (" + Format.number(p.horizon() * p.step()) + " s)");
    lines.add("- fewest steps that can reach `" + scenario.target().name() + "`: " + Hints.minimumSteps(scenario));
    lines.add("- clusters: " + (p.clustered() ? p.clusters() + " (" + p.symmetry().keyword() + ")" : "none, zones avoided one by one"));
    lines.add("- guard " + (p.guard() ? "on" : "off") + ", pruning " + (p.pruning() ? "on" : "off"));
    if (scenario.threeD()) {
      lines.add("- 3-D: altitude planned with the plan view");
    }
    if (scenario.fleet()) {
      lines.add("- fleet of " + scenario.vehicles().size() + " vehicles, " + (p.separation() > 0
          ? "at least " + Format.number(p.separation()) + " m apart" : "kept apart by the sum of their radii")
          + "; time is " + (p.latestArrival() ? "the latest arrival" : "the sum of arrival times"));
    }
    return String.join("\n", lines);
  }

  private static String bounds(Bounds b) {
    return "x " + Format.number(b.xmin()) + " … " + Format.number(b.xmax()) + " m, y " + Format.number(b.ymin())
        + " … " + Format.number(b.ymax()) + " m";
  }

  private static String point(Vec2 p) {
    return "(" + Format.number(p.x()) + ", " + Format.number(p.y()) + ")";
  }
}
