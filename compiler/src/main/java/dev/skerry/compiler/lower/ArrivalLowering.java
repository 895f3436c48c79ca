package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.ArrivalLayout;
import dev.skerry.compiler.analysis.BoundRow;
import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.util.List;

/**
 * Variable horizon (minimum time), as laid out by {@link ArrivalLayout}: arrival binaries f_k with
 * Σ f_k = 1; when f_k = 1 the terminal rows put p_k in the target region and, for an at-rest
 * target, v_k = 0 (big-M rows on both signs of each axis); the "arrived by k" chain d_k = d_{k−1} +
 * f_k that relaxes later rows; time cost Σ k·Δt·f_k.
 */
final class ArrivalLowering {
  private ArrivalLowering() {}

  static void lower(LoweringContext c) {
    ArrivalLayout a = c.part.arrival();
    String sc = c.scope;
    boolean several = a.assigned();
    LinearExpr once = new LinearExpr();
    for (ArrivalLayout.ArrivalStep s : a.steps()) {
      int k = s.step();
      ArrivalLayout.Candidate t = a.candidates().get(s.target());
      String name = several ? "f_" + sc + t.tag() + "_" + k : "f_" + sc + k;
      c.arrive[s.target()][k] = c.builder.newBinary(name, c.origin(t.name(), "arrive", k));
      once.add(c.arrive[s.target()][k]);
    }
    String first = a.targetName();
    c.builder.addEquality(sc.isEmpty() ? "arrive_once" : "arrive_once_" + c.vehicleTag, once, 1,
        c.origin(first, "arrive-once", -1));
    for (int k = 1; k < a.horizon(); k++) {
      if (a.hasDone(k)) {
        c.done[k] = c.builder.newContinuous("done_" + sc + k, 0, 1, c.origin(first, "done", k));
        LinearExpr chain = LinearExpr.of(c.done[k]);
        if (c.done[k - 1] != null) {
          chain.add(c.done[k - 1], -1);
        }
        for (int t = 0; t < c.arrive.length; t++) {
          if (c.arrive[t][k] != null) {
            chain.add(c.arrive[t][k], -1);
          }
        }
        c.builder.addEquality("donedef_" + sc + k, chain, 0, c.origin(first, "done-def", k));
      }
    }
    for (ArrivalLayout.ArrivalStep s : a.steps()) {
      int k = s.step();
      ArrivalLayout.Candidate t = a.candidates().get(s.target());
      Variable f = c.arrive[s.target()][k];
      for (BoundRow r : s.region()) {
        indicator(c, "tgt_" + sc + t.tag() + "_" + r.label() + "_" + k, c.position(r.normal(), r.nz(), k), r, f,
            c.origin(t.name(), "terminal", k));
      }
      for (BoundRow r : s.rest()) {
        indicator(c, "rest_" + sc + t.tag() + "_" + r.label() + "_" + k, c.velocity(r.normal(), r.nz(), k), r, f,
            c.origin(t.name(), "at-rest", k));
      }
    }
  }

  /**
   * Fleet-wide rows: each target that several vehicles may be assigned takes at most one (Σ f ≤ 1
   * over those vehicles and steps), and with {@code latest} time the makespan column T ≥ Σ k·Δt·f
   * of every vehicle. Returns T, or null without a makespan.
   */
  static Variable lowerFleet(FormulationLayout layout, List<LoweringContext> parts, MilpBuilder b) {
    for (FormulationLayout.Capacity cap : layout.capacities()) {
      LinearExpr e = new LinearExpr();
      for (int i : cap.vehicles()) {
        LoweringContext c = parts.get(i);
        for (ArrivalLayout.ArrivalStep s : c.part.arrival().steps()) {
          if (c.part.arrival().candidates().get(s.target()).name().equals(cap.target())) {
            e.add(c.arrive[s.target()][s.step()]);
          }
        }
      }
      b.addLessOrEqual("takers_" + cap.tag(), e, 1, Origin.of(cap.target(), "one-vehicle"));
    }
    if (!layout.makespan()) {
      return null;
    }
    double horizonTime = layout.horizon() * layout.vehicles().get(0).motion().step();
    Variable latest = b.newContinuous("t_latest", 0, horizonTime, Origin.of("", "latest-arrival"));
    for (LoweringContext c : parts) {
      LinearExpr e = LinearExpr.of(latest);
      c.addArrivalTime(e, -1);
      b.addGreaterOrEqual("latest_" + c.vehicleTag, e, 0, c.origin(c.vehicle, "latest-arrival", -1));
    }
    return latest;
  }

  /** {@code expr ≤ offset + M(1 − z)}, written {@code expr + M z ≤ offset + M}. */
  static void indicator(LoweringContext c, String name, LinearExpr expr, BoundRow r, Variable z, Origin o) {
    c.builder.addLessOrEqual(name, expr.add(z, r.bigM()), r.offset() + r.bigM(), o);
  }

  static void addCost(LoweringContext c, LinearExpr objective, double weight) {
    c.addArrivalTime(objective, weight);
  }
}
