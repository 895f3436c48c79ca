package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;

/** An arithmetic expression on quantities. */
public sealed interface Expr {
  SourceRange range();

  /** A number, with the unit written after it if any (null otherwise). */
  record Number(double value, Name unit, SourceRange range) implements Expr {}

  /** A reference to a named constant. */
  record Ref(Name name) implements Expr {
    @Override
    public SourceRange range() {
      return name.range();
    }
  }

  record Negate(Expr operand, SourceRange range) implements Expr {}

  record Binary(char op, Expr left, Expr right, SourceRange range) implements Expr {}
}
