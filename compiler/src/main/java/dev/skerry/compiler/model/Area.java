package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/**
 * The keep-in area: every vehicle's centre stays inside it, deflated by the vehicle's radius. In a
 * 3-D scenario {@code altitude} is the keep-in volume's floor and ceiling (null in 2-D).
 */
public record Area(String name, Shape shape, SourceRange range, Span altitude) {
  public Area(String name, Shape shape, SourceRange range) {
    this(name, shape, range, null);
  }

  public Bounds bounds() {
    return shape.bounds();
  }
}
