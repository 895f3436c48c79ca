package dev.skerry.lsp.protocol;

import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;

/** The one place where source offsets become LSP positions (0-based lines, UTF-16 columns) and back. */
public final class Ranges {
  private Ranges() {}

  public static Range of(SourceRange range) {
    return new Range(position(range.source(), range.start()), position(range.source(), range.end()));
  }

  public static Position position(SourceFile file, int offset) {
    return new Position(file.lineOf(offset), file.columnOf(offset));
  }

  /** The offset of a client position, clamped to the text; -1 when the position is missing. */
  public static int offset(SourceFile file, Position position) {
    if (position == null) {
      return -1;
    }
    return file.offsetOf(position.getLine(), position.getCharacter());
  }

  /** The offsets a client range covers, clamped to the text; null when the range is missing. */
  public static SourceRange toSource(SourceFile file, Range range) {
    if (range == null || range.getStart() == null || range.getEnd() == null) {
      return null;
    }
    int start = offset(file, range.getStart());
    int end = offset(file, range.getEnd());
    return new SourceRange(file, Math.min(start, end), Math.max(start, end));
  }

  /** True when two ranges of the same file overlap or touch. */
  public static boolean touches(SourceRange a, SourceRange b) {
    return a.source() == b.source() && a.start() <= b.end() && b.start() <= a.end();
  }
}
