package dev.skerry.compiler.diag;

import dev.skerry.compiler.source.SourceRange;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** The diagnostics of one compilation, collected in order. Never static, never thrown. */
public final class Diagnostics {
  /** A bound on what one compilation reports, so garbage input cannot flood a client. */
  public static final int LIMIT = 500;

  private final List<Diagnostic> items = new ArrayList<>();
  private boolean truncated;

  public void report(Code code, SourceRange range, String message, Diagnostic.Related... related) {
    report(code.severity(), code, range, message, related);
  }

  public void report(Severity severity, Code code, SourceRange range, String message, Diagnostic.Related... related) {
    if (items.size() >= LIMIT) {
      truncated = true;
      return;
    }
    items.add(new Diagnostic(severity, code, message, range, List.of(related)));
  }

  public boolean hasErrors() {
    return items.stream().anyMatch(Diagnostic::isError);
  }

  /** True when an error with this code was reported inside {@code range} (used to avoid cascades). */
  public boolean hasWithin(Code code, SourceRange range) {
    return items.stream().anyMatch(d -> d.code() == code && d.range().source() == range.source()
        && d.range().start() >= range.start() && d.range().start() <= range.end());
  }

  public boolean hasCode(Code code) {
    return items.stream().anyMatch(d -> d.code() == code);
  }

  public boolean truncated() {
    return truncated;
  }

  public int size() {
    return items.size();
  }

  /** In source order: by file name, then offset. */
  public List<Diagnostic> sorted() {
    List<Diagnostic> copy = new ArrayList<>(items);
    copy.sort(Comparator.comparing((Diagnostic d) -> d.range().source().displayName())
        .thenComparingInt(d -> d.range().start()));
    return copy;
  }

  public List<Diagnostic> all() {
    return List.copyOf(items);
  }
}
