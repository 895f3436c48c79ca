package dev.skerry.compiler.milp;

import java.util.ArrayList;
import java.util.List;

/**
 * Integer columns fixed at their bound because moving them off it alone would make the objective
 * worse than a known feasible point (the incumbent): objective-bound fixing, common practice in
 * branch and bound. With the arrival binaries of a minimum-time plan, every step whose time cost
 * alone exceeds the incumbent's whole cost is fixed at 0 before the search starts.
 *
 * <p>For a minimisation, column j at its lower bound l_j is fixed there when
 *
 * <pre>  constant + Σ_{i≠j} min(c_i·l_i, c_i·u_i) + c_j·(l_j + 1) &gt; incumbent</pre>
 *
 * (moving an integer column off its lower bound adds at least c_j·1), and symmetrically at its upper
 * bound for a negative c_j; the same with max and &lt; for a maximisation. Every point the fixing
 * removes is worse than the incumbent, so the fixed model still holds every point at least as good
 * (the incumbent among them): its optimum is the original's. When some column of the objective has
 * an infinite bound the sum is unbounded and nothing is fixed.
 */
public final class IncumbentFixing {
  /** The objective must pass the incumbent by this much (relative, at least 1e-9) to fix a column. */
  public static final double MARGIN = 1e-9;

  private IncumbentFixing() {}

  /** {@code model} with the columns fixed that cannot move without beating {@code incumbent} the wrong way. */
  public static Milp apply(Milp model, double incumbent) {
    Objective o = model.objective();
    double sign = o.minimize() ? 1 : -1;
    double best = sign * o.constant();
    for (int i = 0; i < o.cols().length; i++) {
      Variable v = model.variables().get(o.cols()[i]);
      double c = sign * o.coefs()[i];
      best += c > 0 ? c * v.lower() : c < 0 ? c * v.upper() : 0;
    }
    if (!Double.isFinite(best) || !Double.isFinite(incumbent)) {
      return model;
    }
    double limit = sign * incumbent + MARGIN * Math.max(1, Math.abs(incumbent));
    List<Variable> vars = new ArrayList<>(model.variables());
    boolean changed = false;
    for (int i = 0; i < o.cols().length; i++) {
      Variable v = vars.get(o.cols()[i]);
      double c = sign * o.coefs()[i];
      double at = c > 0 ? v.lower() : v.upper();
      if (!v.isInteger() || v.lower() == v.upper() || c == 0 || at != Math.rint(at) || best + Math.abs(c) <= limit) {
        continue;
      }
      vars.set(v.index(), new Variable(v.index(), v.name(), v.type(), at, at, v.origin()));
      changed = true;
    }
    return changed ? new Milp(model.name(), vars, model.rows(), model.objective()) : model;
  }
}
