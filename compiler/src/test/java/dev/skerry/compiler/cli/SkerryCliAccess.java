package dev.skerry.compiler.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Lets tests in other packages run the command line and get its exit code and standard output. */
public final class SkerryCliAccess {
  private static final ThreadLocal<String> LAST_OUT = ThreadLocal.withInitial(() -> "");

  private SkerryCliAccess() {}

  public static int run(String... args) {
    StringWriter out = new StringWriter();
    int code = SkerryCli.run(new PrintWriter(out), new PrintWriter(new StringWriter()), args);
    LAST_OUT.set(out.toString());
    return code;
  }

  /** What the last {@link #run} on this thread printed on standard output. */
  public static String lastOut() {
    return LAST_OUT.get();
  }
}
