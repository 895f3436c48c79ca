package dev.skerry.compiler.source;

/**
 * A half-open range of characters {@code [start, end)} in one source file. The only type that
 * carries positions; the command line turns it into {@code file:line:col} and the language server
 * into an LSP range, each in one place.
 */
public record SourceRange(SourceFile source, int start, int end) {
  public SourceRange {
    if (source == null) {
      throw new IllegalArgumentException("a source range needs its file");
    }
    start = Math.max(0, Math.min(start, source.length()));
    end = Math.max(start, Math.min(end, source.length()));
  }

  public static SourceRange of(SourceFile source, int start, int end) {
    return new SourceRange(source, start, end);
  }

  /** The range covering both. */
  public SourceRange to(SourceRange other) {
    if (other == null || other.source != source) {
      return this;
    }
    return new SourceRange(source, Math.min(start, other.start), Math.max(end, other.end));
  }

  public String text() {
    return source.text().substring(start, end);
  }

  /** 1-based line of the start, as the command line prints it. */
  public int line() {
    return source.lineOf(start) + 1;
  }

  /** 1-based column of the start, as the command line prints it. */
  public int column() {
    return source.columnOf(start) + 1;
  }

  public int endLine() {
    return source.lineOf(end) + 1;
  }

  public int endColumn() {
    return source.columnOf(end) + 1;
  }

  public boolean contains(int offset) {
    return offset >= start && offset <= end;
  }

  @Override
  public String toString() {
    return source.displayName() + ":" + line() + ":" + column();
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof SourceRange r && r.source == source && r.start == start && r.end == end;
  }

  @Override
  public int hashCode() {
    return System.identityHashCode(source) * 31 + start * 17 + end;
  }
}
