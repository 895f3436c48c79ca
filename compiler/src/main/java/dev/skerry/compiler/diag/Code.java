package dev.skerry.compiler.diag;

/**
 * Every diagnostic code Skerry reports. The id is stable: the command line, the language server's
 * {@code code} field, docs/diagnostics.md and the golden tests all use it.
 */
public enum Code {
  // Reading the text
  SYNTAX_ERROR("syntax-error", Severity.ERROR, "The text does not follow the grammar."),
  NESTING_TOO_DEEP("nesting-too-deep", Severity.ERROR, "Brackets nest deeper than the reader allows."),
  FILE_TOO_LARGE("file-too-large", Severity.ERROR, "The file is larger than the reader accepts."),
  // Units and arithmetic
  UNKNOWN_UNIT("unknown-unit", Severity.ERROR, "A unit that Skerry does not know."),
  UNIT_MISMATCH("unit-mismatch", Severity.ERROR, "A quantity of the wrong kind, e.g. a time where a length is expected."),
  DIVISION_BY_ZERO("division-by-zero", Severity.ERROR, "An expression divides by zero or overflows."),
  // Names and structure
  UNKNOWN_NAME("unknown-name", Severity.ERROR, "A reference to a constant that is not declared."),
  DUPLICATE_NAME("duplicate-name", Severity.ERROR, "Two declarations share a name."),
  DUPLICATE_PROPERTY("duplicate-property", Severity.ERROR, "A property is given twice in one block."),
  MISSING_PROPERTY("missing-property", Severity.ERROR, "A block lacks a property it needs."),
  MISSING_DECLARATION("missing-declaration", Severity.ERROR,
      "The scenario lacks a vehicle, a target, a keep-in area or a plan."),
  DUPLICATE_DECLARATION("duplicate-declaration", Severity.ERROR,
      "A declaration that may appear once appears again (area, plan, scenario header, units)."),
  UNSUPPORTED("unsupported", Severity.ERROR, "A construct the language accepts but this version cannot plan yet."),
  TARGET_CONFLICT("target-conflict", Severity.ERROR,
      "Vehicles cannot each get their own target: two name the same one, or too few are left to share."),
  TARGET_UNUSED("target-unused", Severity.WARNING, "A target no vehicle can end at."),
  NO_EFFECT("no-effect", Severity.WARNING, "A plan option that changes nothing here, e.g. `separation` with one vehicle."),
  UNKNOWN_OPTION("unknown-option", Severity.ERROR, "An unknown dynamics model, solver or symmetry rule."),
  NOT_ALLOWED_IN_INCLUDE("not-allowed-in-include", Severity.ERROR,
      "An included file may hold only zones, constants and units."),
  // Values and shapes
  VALUE_OUT_OF_RANGE("value-out-of-range", Severity.ERROR, "A value outside its allowed range."),
  MODEL_TOO_LARGE("model-too-large", Severity.ERROR, "The plan could have more binaries than Skerry builds."),
  WRONG_DIMENSION("wrong-dimension", Severity.ERROR, "A point with the wrong number of coordinates."),
  DIMENSION_MISMATCH("dimension-mismatch", Severity.ERROR,
      "An altitude or climb item in a plan-view scenario, or an altitude given twice."),
  MISSING_ALTITUDE("missing-altitude", Severity.ERROR,
      "A 3-D scenario whose keep-in area has no floor and ceiling."),
  DEGENERATE_SHAPE("degenerate-shape", Severity.ERROR,
      "A box with no area or a polygon with fewer than three distinct corners."),
  POLYGON_NOT_CONVEX("polygon-not-convex", Severity.ERROR, "A polygon that is not convex."),
  POLYGON_CLOCKWISE("polygon-clockwise", Severity.HINT,
      "A polygon given clockwise; Skerry reverses it (no change to meaning)."),
  CLUSTERS_OUT_OF_RANGE("clusters-out-of-range", Severity.ERROR,
      "More clusters than zones (or fewer than one)."),
  // Includes
  INCLUDE_NOT_FOUND("include-not-found", Severity.ERROR, "An included file is missing or unreadable."),
  INCLUDE_CYCLE("include-cycle", Severity.ERROR, "Files include each other in a cycle."),
  INCLUDE_OUTSIDE_WORKSPACE("include-outside-workspace", Severity.ERROR,
      "An include that points outside the workspace root."),
  // Hints about feasibility and formulation, before any solve
  START_INSIDE_ZONE("start-inside-zone", Severity.ERROR, "The start lies inside a zone inflated by the vehicle's radius."),
  START_OUTSIDE_AREA("start-outside-area", Severity.ERROR, "The start lies outside the keep-in area (deflated by the radius)."),
  START_TOO_FAST("start-too-fast", Severity.ERROR, "The start velocity exceeds the speed limit."),
  TARGET_INSIDE_ZONE("target-inside-zone", Severity.ERROR, "The whole target lies inside an inflated zone."),
  TARGET_OUTSIDE_AREA("target-outside-area", Severity.ERROR, "The target lies wholly outside the keep-in area."),
  WAYPOINT_UNREACHABLE("waypoint-unreachable", Severity.ERROR,
      "A waypoint lies inside an inflated zone or outside the keep-in area."),
  HORIZON_TOO_SHORT("horizon-too-short", Severity.ERROR,
      "The horizon has fewer steps than the fastest possible move to the target needs."),
  SINGLE_CLUSTER_COVERS("single-cluster-covers", Severity.ERROR,
      "With one cluster, the box around all zones covers the start or the whole target."),
  NARROW_GAP("narrow-gap", Severity.WARNING, "Two zones leave a gap narrower than the vehicle's diameter."),
  CORNER_CUTTING("corner-cutting", Severity.WARNING,
      "One step at full speed is longer than the thinnest zone; with the guard off the path may cut corners."),
  ZONE_OUTSIDE_AREA("zone-outside-area", Severity.WARNING, "A zone lies wholly outside the keep-in area and has no effect.");

  private final String id;
  private final Severity severity;
  private final String summary;

  Code(String id, Severity severity, String summary) {
    this.id = id;
    this.severity = severity;
    this.summary = summary;
  }

  public String id() {
    return id;
  }

  public Severity severity() {
    return severity;
  }

  public String summary() {
    return summary;
  }

  public static Code fromId(String id) {
    for (Code c : values()) {
      if (c.id.equals(id)) {
        return c;
      }
    }
    return null;
  }
}
