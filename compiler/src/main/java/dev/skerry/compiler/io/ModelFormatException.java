package dev.skerry.compiler.io;

import java.io.IOException;

/** A model file that cannot be read: says which line (1-based) and what is wrong with it. */
public final class ModelFormatException extends IOException {
  private static final long serialVersionUID = 1L;

  private final int line;
  private final String problem;

  public ModelFormatException(int line, String problem) {
    super("line " + line + ": " + problem);
    this.line = line;
    this.problem = problem;
  }

  /** The 1-based line the problem was found on. */
  public int line() {
    return line;
  }

  /** The message without the line prefix. */
  public String problem() {
    return problem;
  }
}
