package dev.skerry.compiler.io;

import java.io.Writer;

/** Counts characters and throws them away: measures what a writer produces without disk space. */
public final class CountingWriter extends Writer {
  private long chars;

  public long chars() {
    return chars;
  }

  @Override
  public void write(char[] buffer, int offset, int length) {
    chars += length;
  }

  @Override
  public void write(String text, int offset, int length) {
    chars += length;
  }

  @Override
  public Writer append(CharSequence text) {
    chars += text.length();
    return this;
  }

  @Override
  public void flush() {}

  @Override
  public void close() {}
}
