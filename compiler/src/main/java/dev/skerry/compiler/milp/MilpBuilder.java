package dev.skerry.compiler.milp;

import java.util.ArrayList;
import java.util.List;

/**
 * Builds a {@link Milp} the way one writes the maths: {@code newContinuous}, {@code newBinary},
 * {@code addLessOrEqual}, {@code minimize}. Names must be unique; constants in an expression are
 * moved to the right-hand side.
 */
public final class MilpBuilder {
  private final String name;
  private final List<Variable> variables = new ArrayList<>();
  private final List<Row> rows = new ArrayList<>();
  private final NameSet names = new NameSet();
  private final NameSet rowNames = new NameSet();
  private Objective objective = Objective.zero();

  public MilpBuilder(String name) {
    this.name = name;
  }

  public Variable newContinuous(String varName, double lower, double upper, Origin origin) {
    return add(varName, VarType.CONTINUOUS, lower, upper, origin);
  }

  public Variable newInteger(String varName, double lower, double upper, Origin origin) {
    return add(varName, VarType.INTEGER, lower, upper, origin);
  }

  public Variable newBinary(String varName, Origin origin) {
    return add(varName, VarType.BINARY, 0, 1, origin);
  }

  private Variable add(String varName, VarType type, double lower, double upper, Origin origin) {
    if (!names.add(varName)) {
      throw new IllegalArgumentException("duplicate column name " + varName);
    }
    if (lower > upper) {
      throw new IllegalArgumentException(
          "column " + varName + " has lower bound " + lower + " above upper bound " + upper);
    }
    Variable v = new Variable(variables.size(), varName, type, lower, upper, origin);
    variables.add(v);
    return v;
  }

  public Row addLessOrEqual(String rowName, LinearExpr expr, double rhs, Origin origin) {
    return addRange(rowName, Double.NEGATIVE_INFINITY, expr, rhs, origin);
  }

  public Row addGreaterOrEqual(String rowName, LinearExpr expr, double rhs, Origin origin) {
    return addRange(rowName, rhs, expr, Double.POSITIVE_INFINITY, origin);
  }

  public Row addEquality(String rowName, LinearExpr expr, double rhs, Origin origin) {
    return addRange(rowName, rhs, expr, rhs, origin);
  }

  /** {@code lower ≤ expr ≤ upper}; the expression's constant moves to both sides. */
  public Row addRange(String rowName, double lower, LinearExpr expr, double upper, Origin origin) {
    if (!rowNames.add(rowName)) {
      throw new IllegalArgumentException("duplicate row name " + rowName);
    }
    if (Double.isNaN(lower) || Double.isNaN(upper)) {
      throw new IllegalArgumentException("row " + rowName + " has a NaN bound");
    }
    LinearExpr.Terms terms = expr.merged();
    double c = expr.constant();
    Row row = new Row(rows.size(), rowName, terms.cols(), terms.coefs(), lower - c, upper - c, origin);
    rows.add(row);
    return row;
  }

  public void minimize(LinearExpr expr) {
    LinearExpr.Terms terms = expr.merged();
    objective = new Objective(true, terms.cols(), terms.coefs(), expr.constant());
  }

  public void maximize(LinearExpr expr) {
    LinearExpr.Terms terms = expr.merged();
    objective = new Objective(false, terms.cols(), terms.coefs(), expr.constant());
  }

  public int columnCount() {
    return variables.size();
  }

  public int rowCount() {
    return rows.size();
  }

  /**
   * The model, marked as {@link Milp#namesChecked() names checked}: this builder has already refused
   * repeated names, so writers need not look for them again.
   */
  public Milp build() {
    return new Milp(name, variables, rows, objective, true);
  }
}
