package dev.skerry.compiler.diag;

/** How bad a diagnostic is. Errors stop lowering; warnings and hints do not. */
public enum Severity {
  ERROR("error"),
  WARNING("warning"),
  HINT("hint");

  private final String label;

  Severity(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }
}
