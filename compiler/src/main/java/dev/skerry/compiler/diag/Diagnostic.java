package dev.skerry.compiler.diag;

import dev.skerry.compiler.source.SourceRange;
import java.util.List;

/**
 * One finding about a scenario: a stable code, a severity, a message a user can act on, the
 * range it is about, and related places (e.g. the zone that contains the start).
 */
public record Diagnostic(Severity severity, Code code, String message, SourceRange range, List<Related> related) {

  public Diagnostic {
    related = related == null ? List.of() : List.copyOf(related);
  }

  /** Another place that explains this diagnostic. */
  public record Related(String message, SourceRange range) {}

  public boolean isError() {
    return severity == Severity.ERROR;
  }

  /** {@code file:line:col: severity: message [code]}, as the command line prints it. */
  public String format() {
    return range + ": " + severity.label() + ": " + message + " [" + code.id() + "]";
  }
}
