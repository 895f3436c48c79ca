package dev.skerry.compiler.analysis;

/**
 * Something the analysis proved about a scenario that a checker can report: a stable code, the
 * entity concerned, the step (−1 when none) and a message a user can act on.
 */
public record Fact(String code, String entity, int step, String message) {
  public Fact {
    if (code == null || code.isEmpty()) {
      throw new IllegalArgumentException("a fact needs a code");
    }
  }
}
