package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.ArrivalLayout;
import dev.skerry.compiler.analysis.BoundRow;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;

/**
 * Variable horizon (minimum time), as laid out by {@link ArrivalLayout}: arrival binaries f_k with
 * Σ f_k = 1; when f_k = 1 the terminal rows put p_k in the target region and, for an at-rest
 * target, v_k = 0 (big-M rows on both signs of each axis); the "arrived by k" chain d_k = d_{k−1} +
 * f_k that relaxes later rows; time cost Σ k·Δt·f_k.
 */
final class ArrivalLowering {
  private ArrivalLowering() {}

  static void lower(LoweringContext c) {
    ArrivalLayout a = c.layout.arrival();
    String target = a.targetName();
    String t = a.targetTag();
    LinearExpr once = new LinearExpr();
    for (ArrivalLayout.ArrivalStep s : a.steps()) {
      int k = s.step();
      c.arrive[k] = c.builder.newBinary("f_" + k, Origin.of(target, "arrive", k));
      once.add(c.arrive[k]);
    }
    c.builder.addEquality("arrive_once", once, 1, Origin.of(target, "arrive-once"));
    for (int k = 1; k < a.horizon(); k++) {
      if (a.hasDone(k)) {
        c.done[k] = c.builder.newContinuous("done_" + k, 0, 1, Origin.of(target, "done", k));
        LinearExpr chain = LinearExpr.of(c.done[k]);
        if (c.done[k - 1] != null) {
          chain.add(c.done[k - 1], -1);
        }
        if (c.arrive[k] != null) {
          chain.add(c.arrive[k], -1);
        }
        c.builder.addEquality("donedef_" + k, chain, 0, Origin.of(target, "done-def", k));
      }
    }
    for (ArrivalLayout.ArrivalStep s : a.steps()) {
      int k = s.step();
      Variable f = c.arrive[k];
      for (BoundRow r : s.region()) {
        indicator(c, "tgt_" + t + "_" + r.label() + "_" + k, c.position(r.normal(), k), r, f,
            Origin.of(target, "terminal", k));
      }
      for (BoundRow r : s.rest()) {
        indicator(c, "rest_" + t + "_" + r.label() + "_" + k, c.velocity(r.normal(), k), r, f,
            Origin.of(target, "at-rest", k));
      }
    }
  }

  /** {@code expr ≤ offset + M(1 − z)}, written {@code expr + M z ≤ offset + M}. */
  static void indicator(LoweringContext c, String name, LinearExpr expr, BoundRow r, Variable z, Origin o) {
    c.builder.addLessOrEqual(name, expr.add(z, r.bigM()), r.offset() + r.bigM(), o);
  }

  static void addCost(LoweringContext c, LinearExpr objective, double weight) {
    double dt = c.layout.motion().step();
    for (ArrivalLayout.ArrivalStep s : c.layout.arrival().steps()) {
      objective.add(c.arrive[s.step()], weight * s.step() * dt);
    }
  }
}
