package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/**
 * A point to pass within {@code tolerance} (per axis: a box) at some step before arrival; in 3-D
 * {@code altitude} is the band to pass it in (null: any). In a fleet one vehicle, any of them, passes it.
 */
public record Waypoint(String name, Vec2 point, double tolerance, SourceRange range, Span altitude) {
  public Waypoint(String name, Vec2 point, double tolerance, SourceRange range) {
    this(name, point, tolerance, range, null);
  }

  public Bounds region() {
    return new Bounds(point.x() - tolerance, point.y() - tolerance, point.x() + tolerance, point.y() + tolerance);
  }
}
