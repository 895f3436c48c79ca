package dev.skerry.compiler.model;

import dev.skerry.compiler.source.SourceRange;

/**
 * Where a vehicle must end: its position inside {@code region} at the arrival step (a point with
 * a tolerance is the box of that half-width), and its velocity zero when {@code atRest}.
 */
public record Target(String name, Shape region, boolean atRest, SourceRange range) {}
