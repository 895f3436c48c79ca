package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;
import java.util.List;

/**
 * A region as written: {@code box P to P}, {@code polygon P P P ...}, or {@code point P within e}.
 * A box or polygon may carry {@code altitude LO to HI} (null when not written).
 */
public sealed interface ShapeNode {
  SourceRange range();

  record BoxNode(PointNode from, PointNode to, AltitudeNode altitude, SourceRange range) implements ShapeNode {
    public BoxNode(PointNode from, PointNode to, SourceRange range) {
      this(from, to, null, range);
    }
  }

  record PolygonNode(List<PointNode> corners, AltitudeNode altitude, SourceRange range) implements ShapeNode {
    public PolygonNode {
      corners = List.copyOf(corners);
    }

    public PolygonNode(List<PointNode> corners, SourceRange range) {
      this(corners, null, range);
    }
  }

  /** {@code altitude LO to HI}: a floor and a ceiling. */
  record AltitudeNode(Expr low, Expr high, SourceRange range) {}

  record PointWithin(PointNode point, Expr tolerance, SourceRange range) implements ShapeNode {}
}
