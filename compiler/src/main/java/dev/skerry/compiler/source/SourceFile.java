package dev.skerry.compiler.source;

import java.nio.file.Path;
import java.util.Arrays;

/**
 * The text of one scenario file and its line index. {@code path} is null for text that has no
 * file yet (an unsaved editor buffer, standard input); {@code displayName} is what messages show.
 */
public final class SourceFile {
  private final Path path;
  private final String displayName;
  private final String text;
  private final int[] lineStarts;

  public SourceFile(Path path, String displayName, String text) {
    this.path = path;
    this.displayName = displayName;
    this.text = text;
    this.lineStarts = indexLines(text);
  }

  public static SourceFile of(Path path, String text) {
    return new SourceFile(path, path.toString(), text);
  }

  public static SourceFile anonymous(String displayName, String text) {
    return new SourceFile(null, displayName, text);
  }

  private static int[] indexLines(String text) {
    int[] starts = new int[16];
    int count = 1;
    for (int i = 0; i < text.length(); i++) {
      if (text.charAt(i) == '\n') {
        if (count == starts.length) {
          starts = Arrays.copyOf(starts, count * 2);
        }
        starts[count++] = i + 1;
      }
    }
    return Arrays.copyOf(starts, count);
  }

  public Path path() {
    return path;
  }

  public String displayName() {
    return displayName;
  }

  public String text() {
    return text;
  }

  public int length() {
    return text.length();
  }

  public int lineCount() {
    return lineStarts.length;
  }

  /** 0-based line of a character offset (clamped to the text). */
  public int lineOf(int offset) {
    int clamped = Math.max(0, Math.min(offset, text.length()));
    int found = Arrays.binarySearch(lineStarts, clamped);
    return found >= 0 ? found : -found - 2;
  }

  /** 0-based column (in UTF-16 units, as LSP counts) of a character offset. */
  public int columnOf(int offset) {
    int clamped = Math.max(0, Math.min(offset, text.length()));
    return clamped - lineStarts[lineOf(clamped)];
  }

  /** Offset of a 0-based line and column, clamped to the line and the text. */
  public int offsetOf(int line, int column) {
    if (line < 0) {
      return 0;
    }
    if (line >= lineStarts.length) {
      return text.length();
    }
    int lineEnd = line + 1 < lineStarts.length ? lineStarts[line + 1] - 1 : text.length();
    return Math.max(lineStarts[line], Math.min(lineStarts[line] + Math.max(0, column), lineEnd));
  }

  public int lineStart(int line) {
    return lineStarts[Math.max(0, Math.min(line, lineStarts.length - 1))];
  }

  @Override
  public String toString() {
    return displayName;
  }
}
