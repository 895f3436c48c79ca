package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import java.util.ArrayList;
import java.util.List;

/**
 * Fixed MPS holds numbers in 12-character fields, so most coefficients of a lowered model (Δt²/2,
 * cos(π/16), padded big-M) cannot be written exactly. This rounds every finite number of a model to
 * the nearest value that fits, and says how many changed and by how much at most, so the caller can
 * tell the user before handing the file on. Free MPS and LP never need it.
 */
public final class FixedPrecision {
  private FixedPrecision() {}

  /** The rounded model, the count of values changed and the largest relative change. */
  public record Rounded(Milp milp, int changed, double maxRelativeChange) {}

  public static Rounded round(Milp m) {
    Tally t = new Tally();
    List<Variable> vars = new ArrayList<>();
    for (Variable v : m.variables()) {
      double lo = t.round(v.lower());
      double up = t.round(v.upper());
      vars.add(new Variable(v.index(), v.name(), v.type(), Math.min(lo, up), Math.max(lo, up), v.origin()));
    }
    List<Row> rows = new ArrayList<>();
    for (Row r : m.rows()) {
      double[] coefs = new double[r.coefs().length];
      for (int i = 0; i < coefs.length; i++) {
        coefs[i] = t.round(r.coefs()[i]);
      }
      rows.add(new Row(r.index(), r.name(), r.cols(), coefs, t.round(r.lower()), t.round(r.upper()), r.origin()));
    }
    Objective o = m.objective();
    double[] oc = new double[o.coefs().length];
    for (int i = 0; i < oc.length; i++) {
      oc[i] = t.round(o.coefs()[i]);
    }
    Objective objective = new Objective(o.minimize(), o.cols(), oc, t.round(o.constant()));
    return new Rounded(new Milp(m.name(), vars, rows, objective), t.changed, t.worst);
  }

  private static final class Tally {
    int changed;
    double worst;

    double round(double v) {
      if (!Double.isFinite(v) || v == 0) {
        return v;
      }
      double r = Double.parseDouble(NumberText.nearestFixed(v));
      if (r != v) {
        changed++;
        worst = Math.max(worst, Math.abs(r - v) / Math.abs(v));
      }
      return r;
    }
  }
}
