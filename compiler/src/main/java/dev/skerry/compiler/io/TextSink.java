package dev.skerry.compiler.io;

import java.io.IOException;
import java.io.Writer;

/**
 * Lines of text collected in a small buffer and handed to an {@link Appendable} in chunks, so a
 * file of any size streams out in constant memory. A sink without a target discards the text:
 * writers run once through it to check every number before writing anything for real.
 */
final class TextSink {
  private static final int CHUNK = 1 << 16;

  private final Appendable out;
  private final StringBuilder buffer = new StringBuilder(256);
  /** For a {@link Writer} target: the chunk copied out once, not turned into a string first. */
  private char[] chars;
  private int lineStart;

  private TextSink(Appendable out) {
    this.out = out;
  }

  static TextSink to(Appendable out) {
    return new TextSink(out);
  }

  static TextSink discarding() {
    return new TextSink(null);
  }

  /** The buffer to append the current line to. */
  StringBuilder text() {
    return buffer;
  }

  TextSink append(String s) {
    buffer.append(s);
    return this;
  }

  TextSink append(char c) {
    buffer.append(c);
    return this;
  }

  /** Length of the current line so far. */
  int column() {
    return buffer.length() - lineStart;
  }

  /** Pads the current line with spaces until it is {@code width} characters long. */
  TextSink padTo(int width) {
    while (column() < width) {
      buffer.append(' ');
    }
    return this;
  }

  /** Appends {@code s} right-aligned so that the line ends at {@code width} characters. */
  TextSink rightAligned(String s, int width) {
    return padTo(width - s.length()).append(s);
  }

  void endLine() throws IOException {
    buffer.append('\n');
    lineStart = buffer.length();
    if (buffer.length() >= CHUNK || out == null) {
      flush();
    }
  }

  void flush() throws IOException {
    if (out instanceof Writer writer) {
      int length = buffer.length();
      if (chars == null || chars.length < length) {
        chars = new char[Math.max(length, CHUNK + 256)];
      }
      buffer.getChars(0, length, chars, 0);
      writer.write(chars, 0, length);
    } else if (out != null) {
      out.append(buffer);
    }
    buffer.setLength(0);
    lineStart = 0;
  }
}
