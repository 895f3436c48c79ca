package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;
import java.util.List;

/** One line of the plan block. */
public sealed interface PlanProp {
  SourceRange range();

  String keyword();

  record Step(Expr value, SourceRange range) implements PlanProp {
    public String keyword() {
      return "step";
    }
  }

  record Horizon(Expr value, SourceRange range) implements PlanProp {
    public String keyword() {
      return "horizon";
    }
  }

  record Minimize(List<Term> terms, SourceRange range) implements PlanProp {
    public Minimize {
      terms = List.copyOf(terms);
    }

    public String keyword() {
      return "minimize";
    }
  }

  /** {@code weight? latest? time|fuel}; weight null means 1; {@code latest} asks for the latest arrival. */
  record Term(Expr weight, String what, boolean latest, SourceRange range) {
    public Term(Expr weight, String what, SourceRange range) {
      this(weight, what, false, range);
    }
  }

  record Clusters(Expr count, Name rule, SourceRange range) implements PlanProp {
    public String keyword() {
      return "clusters";
    }
  }

  record ClosedLoop(Expr max, SourceRange range) implements PlanProp {
    public String keyword() {
      return "closed_loop";
    }
  }

  record Solver(Name engine, Expr timeLimit, Expr gap, Expr threads, SourceRange range) implements PlanProp {
    public String keyword() {
      return "solver";
    }
  }

  record Guard(boolean on, SourceRange range) implements PlanProp {
    public String keyword() {
      return "guard";
    }
  }

  record Pruning(boolean on, SourceRange range) implements PlanProp {
    public String keyword() {
      return "pruning";
    }
  }

  record Sides(Expr count, SourceRange range) implements PlanProp {
    public String keyword() {
      return "sides";
    }
  }

  /** {@code dimensions 2|3}. */
  record Dimensions(Expr count, SourceRange range) implements PlanProp {
    public String keyword() {
      return "dimensions";
    }
  }

  /** {@code separation LENGTH}: least centre distance between two vehicles. */
  record Separation(Expr value, SourceRange range) implements PlanProp {
    public String keyword() {
      return "separation";
    }
  }
}
