package dev.skerry.compiler.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Lets tests in other packages run the command line and get its exit code. */
public final class SkerryCliAccess {
  private SkerryCliAccess() {}

  public static int run(String... args) {
    return SkerryCli.run(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()), args);
  }
}
