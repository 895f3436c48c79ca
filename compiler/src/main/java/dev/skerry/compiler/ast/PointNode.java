package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;
import java.util.List;

/** {@code (x, y)} with an optional unit for every coordinate, e.g. {@code (4, 5) km}. */
public record PointNode(List<Expr> coordinates, Name unit, SourceRange range) {
  public PointNode {
    coordinates = List.copyOf(coordinates);
  }
}
