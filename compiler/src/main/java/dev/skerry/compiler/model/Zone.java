package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/**
 * A no-go zone as written (not yet inflated by any vehicle's radius). In a 3-D scenario {@code
 * altitude} is its floor and ceiling (a box with an altitude range, or a prism over a polygon);
 * null means it reaches every altitude.
 */
public record Zone(String name, Shape shape, SourceRange range, Span altitude) {

  public Zone(String name, Shape shape, SourceRange range) {
    this(name, shape, range, null);
  }

  /** True when the zone has a floor and a ceiling one can fly under or over. */
  public boolean hasAltitude() {
    return altitude != null;
  }

  public boolean isBox() {
    return shape instanceof Shape.Box;
  }

  /** Binaries one step of avoidance costs: one per face (4 for a box, 6 for a box with an altitude range). */
  public int faceCount() {
    return shape.faces().size() + (altitude != null ? 2 : 0);
  }
}
