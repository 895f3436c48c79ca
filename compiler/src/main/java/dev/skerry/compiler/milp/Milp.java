package dev.skerry.compiler.milp;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A solver-neutral mixed-integer linear program: columns, rows, objective. Immutable once built
 * (see {@link MilpBuilder}). Imports no solver.
 */
public final class Milp {
  private final String name;
  private final List<Variable> variables;
  private final List<Row> rows;
  private final Objective objective;
  private final boolean namesChecked;
  private Map<String, Variable> byName;

  public Milp(String name, List<Variable> variables, List<Row> rows, Objective objective) {
    this(name, variables, rows, objective, false);
  }

  Milp(String name, List<Variable> variables, List<Row> rows, Objective objective, boolean namesChecked) {
    this.name = name;
    this.variables = List.copyOf(variables);
    this.rows = List.copyOf(rows);
    this.objective = objective;
    this.namesChecked = namesChecked;
  }

  /**
   * True when the model comes from a {@link MilpBuilder}, which has checked as it went that column
   * names are unique and row names are unique; false for a model put together by other means,
   * whose writer must check that itself. (Numbers and column indices are not covered: writers
   * check those in every case.)
   */
  public boolean namesChecked() {
    return namesChecked;
  }

  public String name() {
    return name;
  }

  public List<Variable> variables() {
    return variables;
  }

  public List<Row> rows() {
    return rows;
  }

  public Objective objective() {
    return objective;
  }

  public int columnCount() {
    return variables.size();
  }

  public int rowCount() {
    return rows.size();
  }

  public long binaryCount() {
    return variables.stream().filter(v -> v.type() == VarType.BINARY).count();
  }

  public long integerCount() {
    return variables.stream().filter(v -> v.type() == VarType.INTEGER).count();
  }

  public long continuousCount() {
    return variables.stream().filter(v -> v.type() == VarType.CONTINUOUS).count();
  }

  /** Non-zeros in the constraint matrix (the objective not counted). */
  public long nonZeros() {
    long n = 0;
    for (Row r : rows) {
      n += r.size();
    }
    return n;
  }

  public boolean hasIntegers() {
    return variables.stream().anyMatch(Variable::isInteger);
  }

  /** A column by name, or null. */
  public synchronized Variable variable(String columnName) {
    if (byName == null) {
      byName = new HashMap<>();
      for (Variable v : variables) {
        byName.put(v.name(), v);
      }
    }
    return byName.get(columnName);
  }

  /**
   * The largest violation of any bound, row or integrality at a point: 0 for a feasible point.
   * Used by tests and by the solve layer to check a returned solution against the model itself.
   */
  public double maxViolation(double[] x) {
    double worst = 0;
    for (Variable v : variables) {
      double value = x[v.index()];
      worst = Math.max(worst, v.lower() - value);
      worst = Math.max(worst, value - v.upper());
      if (v.isInteger()) {
        worst = Math.max(worst, Math.abs(value - Math.rint(value)));
      }
    }
    for (Row r : rows) {
      double a = r.activity(x);
      worst = Math.max(worst, r.lower() - a);
      worst = Math.max(worst, a - r.upper());
    }
    return worst;
  }
}
