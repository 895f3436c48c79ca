package dev.skerry.compiler.semdiff;

import dev.skerry.compiler.model.PlanOptions;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

/** Differences between two sets of plan options, in the words of the plan block. */
final class PlanDetails {
  private PlanDetails() {}

  static List<Change.Detail> of(PlanOptions a, PlanOptions b) {
    List<Change.Detail> out = new ArrayList<>();
    field(out, "step", Words.quantity(a.step(), "s"), Words.quantity(b.step(), "s"));
    field(out, "horizon", a.horizon() + " steps", b.horizon() + " steps");
    field(out, "minimize", objective(a), objective(b));
    field(out, "clusters", clusters(a), clusters(b));
    field(out, "closed_loop max", Integer.toString(a.closedLoopMax()), Integer.toString(b.closedLoopMax()));
    field(out, "solver", a.solver(), b.solver());
    field(out, "time_limit", duration(a.timeLimit()), duration(b.timeLimit()));
    field(out, "gap", Words.quantity(a.relativeGap() * 100, "%"), Words.quantity(b.relativeGap() * 100, "%"));
    field(out, "threads", threads(a.threads()), threads(b.threads()));
    field(out, "guard", onOff(a.guard()), onOff(b.guard()));
    field(out, "pruning", onOff(a.pruning()), onOff(b.pruning()));
    field(out, "separation", Words.quantity(a.separation(), "m"), Words.quantity(b.separation(), "m"));
    return out;
  }

  private static void field(List<Change.Detail> out, String name, String before, String after) {
    if (!before.equals(after)) {
      out.add(new Change.Detail(name, before, after, name + " " + before + " → " + after));
    }
  }

  static String objective(PlanOptions p) {
    List<String> terms = new ArrayList<>();
    if (p.timeWeight() != 0) {
      terms.add(weighted(p.timeWeight(), p.latestArrival() ? "latest time" : "time"));
    }
    if (p.fuelWeight() != 0) {
      terms.add(weighted(p.fuelWeight(), "fuel"));
    }
    return terms.isEmpty() ? "nothing" : String.join(" + ", terms);
  }

  private static String weighted(double weight, String what) {
    return weight == 1 ? what : Words.number(weight) + " " + what;
  }

  private static String clusters(PlanOptions p) {
    if (!p.clustered()) {
      return "none";
    }
    String rule = p.symmetry() == null || p.symmetry() == PlanOptions.SymmetryRule.NONE ? "" : " " + p.symmetry().keyword();
    return p.clusters() + rule;
  }

  private static String duration(Duration d) {
    return d == null ? "none" : Words.quantity(d.toNanos() / 1e9, "s");
  }

  private static String threads(int n) {
    return n <= 0 ? "solver's choice" : Integer.toString(n);
  }

  private static String onOff(boolean on) {
    return on ? "on" : "off";
  }
}
