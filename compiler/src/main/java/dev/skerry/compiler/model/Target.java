package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/**
 * Where a vehicle must end: its position inside {@code region} at the arrival step (a point with
 * a tolerance is the box of that half-width), and its velocity zero when {@code atRest}. In 3-D
 * {@code altitude} bounds the arrival altitude (null: any), and at rest includes the climb rate.
 */
public record Target(String name, Shape region, boolean atRest, SourceRange range, Span altitude) {
  public Target(String name, Shape region, boolean atRest, SourceRange range) {
    this(name, region, atRest, range, null);
  }
}
