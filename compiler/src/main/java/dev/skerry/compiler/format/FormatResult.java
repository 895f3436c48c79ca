package dev.skerry.compiler.format;

import dev.skerry.compiler.diag.Diagnostic;
import java.util.List;

/**
 * What formatting one file gives. When the file cannot be read (syntax errors, too large, nested
 * too deeply) {@code text} is the original text, {@code formatted} is false and {@code
 * diagnostics} says why; otherwise {@code text} is the canonical layout and diagnostics is empty.
 */
public record FormatResult(String original, String text, boolean formatted, List<Diagnostic> diagnostics) {
  public FormatResult {
    diagnostics = List.copyOf(diagnostics);
  }

  /** True when the canonical layout differs from the original text. */
  public boolean changed() {
    return !original.equals(text);
  }
}
