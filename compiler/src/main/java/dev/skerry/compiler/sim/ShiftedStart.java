package dev.skerry.compiler.sim;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import java.util.HashMap;
import java.util.Map;

/**
 * The previous iteration's plan moved one step earlier, as a warm start for the next MILP: a column
 * of step k takes the value its namesake had at step k + 1 (the last step repeats), a column with
 * no step keeps its value. Columns are matched by name, since lowering names them by entity and
 * step. Without disturbance this point is feasible for the new model (the tail of a plan is a plan);
 * the caller checks that before using it.
 */
public final class ShiftedStart {
  private ShiftedStart() {}

  /** The shifted point, or null when a column of the new model has no counterpart. */
  public static double[] of(Milp previous, double[] values, Milp next, double dt) {
    Map<String, Double> old = new HashMap<>();
    Map<String, Integer> lastStep = new HashMap<>();
    for (Variable v : previous.variables()) {
      old.put(v.name(), values[v.index()]);
      int k = v.origin().step();
      if (k >= 0) {
        lastStep.merge(stem(v.name(), k), k, Math::max);
      }
    }
    double[] x = new double[next.columnCount()];
    for (Variable v : next.variables()) {
      int k = v.origin().step();
      Double value;
      if (k < 0) {
        value = old.get(v.name());
      } else {
        String stem = stem(v.name(), k);
        Integer last = lastStep.get(stem);
        value = last == null ? null : k + 1 <= last ? old.get(stem + (k + 1)) : beyondTheEnd(v, stem, last, old, dt);
      }
      if (value == null) {
        return null;
      }
      x[v.index()] = Math.max(v.lower(), Math.min(v.upper(), value));
    }
    return x;
  }

  /**
   * A column one step past the old horizon: the vehicle coasts one step with no input (position
   * advanced by Δt·v, velocity kept), no new arrival or visit, and every other column (binaries,
   * the arrived-by chain) keeps its last value.
   */
  private static Double beyondTheEnd(Variable v, String stem, int last, Map<String, Double> old, double dt) {
    String role = v.origin().role();
    Double lastValue = old.get(stem + last);
    switch (role) {
      case "ux", "uy", "uz", "wx", "wy", "wz", "arrive", "visit":
        return 0.0;
      case "px", "py", "pz":
        Double velocity = old.get("v" + stem.substring(1) + last);
        return lastValue == null || velocity == null ? null : lastValue + dt * velocity;
      default:
        return lastValue;
    }
  }

  /** The name without its step suffix: {@code px_skiff_12} → {@code px_skiff_}. */
  private static String stem(String name, int step) {
    String suffix = Integer.toString(step);
    return name.endsWith(suffix) ? name.substring(0, name.length() - suffix.length()) : name + "#";
  }
}
