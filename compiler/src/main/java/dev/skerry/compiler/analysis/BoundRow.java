package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Vec2;

/**
 * An indicator row {@code n·x ≤ offset + bigM·(1 − z)}: it holds as written when the binary z is 1
 * and is slack over the whole domain box when z is 0. {@code x} is a position or, for at-rest rows,
 * a velocity. {@code label} goes into the row name.
 */
public record BoundRow(String label, Vec2 normal, double offset, double bigM) {
  /** Non-zeros of the row: the state terms plus the binary. */
  public int terms() {
    return Geometry.termCount(normal) + 1;
  }
}
