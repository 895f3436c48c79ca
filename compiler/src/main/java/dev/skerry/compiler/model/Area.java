package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/** The keep-in area: every vehicle's centre stays inside it, deflated by the vehicle's radius. */
public record Area(String name, Shape shape, SourceRange range) {
  public Bounds bounds() {
    return shape.bounds();
  }
}
