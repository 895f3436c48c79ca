package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;
import java.util.List;

/** A region as written: {@code box P to P}, {@code polygon P P P ...}, or {@code point P within e}. */
public sealed interface ShapeNode {
  SourceRange range();

  record BoxNode(PointNode from, PointNode to, SourceRange range) implements ShapeNode {}

  record PolygonNode(List<PointNode> corners, SourceRange range) implements ShapeNode {
    public PolygonNode {
      corners = List.copyOf(corners);
    }
  }

  record PointWithin(PointNode point, Expr tolerance, SourceRange range) implements ShapeNode {}
}
