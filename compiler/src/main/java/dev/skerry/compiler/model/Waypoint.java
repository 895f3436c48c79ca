package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/** A point to pass within {@code tolerance} (per axis: a box) at some step before arrival. */
public record Waypoint(String name, Vec2 point, double tolerance, SourceRange range) {
  public Bounds region() {
    return new Bounds(point.x() - tolerance, point.y() - tolerance, point.x() + tolerance, point.y() + tolerance);
  }
}
