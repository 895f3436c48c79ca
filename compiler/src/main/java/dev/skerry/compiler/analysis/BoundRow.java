package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Vec2;

/**
 * An indicator row {@code n·x + nz·x_z ≤ offset + bigM·(1 − z)}: it holds as written when the
 * binary z is 1 and is slack over the whole domain when z is 0. {@code x} is a position or, for
 * at-rest rows, a velocity; {@code nz} weighs its altitude component (altitude or climb rate; 0 in
 * plan view). {@code label} goes into the row name.
 */
public record BoundRow(String label, Vec2 normal, double offset, double bigM, double nz) {
  public BoundRow(String label, Vec2 normal, double offset, double bigM) {
    this(label, normal, offset, bigM, 0);
  }

  /** Non-zeros of the row: the state terms plus the binary. */
  public int terms() {
    return Geometry.termCount(normal, nz) + 1;
  }
}
