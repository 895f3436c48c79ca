package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/** A no-go zone as written (not yet inflated by any vehicle's radius). */
public record Zone(String name, Shape shape, SourceRange range) {

  public boolean isBox() {
    return shape instanceof Shape.Box;
  }

  /** Binaries one step of avoidance costs: one per face (4 for a box). */
  public int faceCount() {
    return shape.faces().size();
  }
}
