package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import java.util.ArrayList;
import java.util.List;

/**
 * The variable horizon. Arrival binaries f_k (Σ f_k = 1) exist for the steps k = 1..N at which the
 * target can be reached; with pruning, steps whose reach box misses the target region (or, for an
 * at-rest target, whose velocity box excludes 0) get none. If no step is left the plain form is
 * kept and a {@code target-unreachable} fact recorded, so the model stays faithful and the solver
 * proves the infeasibility.
 *
 * <p>"Arrived by step k" is the continuous d_k = Σ_{j ≤ k} f_j, defined by the chain d_k = d_{k−1}
 * + f_k for k = first arrival step..N−1 (it is integral because the f are). Rows after arrival are
 * relaxed with one d term each: the avoidance cover rows, hard avoidance rows and the fuel rows
 * (so fuel counts the inputs up to arrival only). Dynamics, speed and acceleration limits and the
 * keep-in area stay in force over the whole horizon: the plan must remain flyable after arrival.
 */
public record ArrivalLayout(String targetTag, String targetName, int horizon, List<ArrivalStep> steps) {

  public ArrivalLayout {
    steps = List.copyOf(steps);
  }

  /** Arrival at step k: the binary f_k with its terminal rows on p_k and at-rest rows on v_k. */
  public record ArrivalStep(int step, List<BoundRow> region, List<BoundRow> rest) {
    public ArrivalStep {
      region = List.copyOf(region);
      rest = List.copyOf(rest);
    }
  }

  static ArrivalLayout of(Target target, String tag, FormulationLayout.Domains d, List<Fact> facts) {
    int n = d.horizon();
    List<ArrivalStep> steps = new ArrayList<>();
    for (int k = 1; k <= n; k++) {
      if (!d.pruning() || reachable(target, d, k)) {
        steps.add(step(target, d, k, d.pruning()));
      }
    }
    if (steps.isEmpty()) {
      facts.add(new Fact("target-unreachable", target.name(), -1,
          "no step of the horizon can reach target " + target.name() + (target.atRest() ? " at rest" : "")
              + " within the speed and acceleration limits"));
      for (int k = 1; k <= n; k++) {
        steps.add(step(target, d, k, false));
      }
    }
    return new ArrivalLayout(tag, target.name(), n, steps);
  }

  private static boolean reachable(Target target, FormulationLayout.Domains d, int k) {
    if (!Geometry.mayIntersect(target.region(), d.position(k))) {
      return false;
    }
    Bounds v = d.velocity(k);
    return !target.atRest() || (v.xmin() <= 0 && v.xmax() >= 0 && v.ymin() <= 0 && v.ymax() >= 0);
  }

  private static ArrivalStep step(Target target, FormulationLayout.Domains d, int k, boolean skipSlack) {
    List<BoundRow> region = indicatorRows(target.region(), d.position(k), skipSlack);
    List<BoundRow> rest = new ArrayList<>();
    if (target.atRest()) {
      Bounds v = d.velocity(k);
      String[] labels = {"vxp", "vxn", "vyp", "vyn"};
      Vec2[] normals = {new Vec2(1, 0), new Vec2(-1, 0), new Vec2(0, 1), new Vec2(0, -1)};
      for (int i = 0; i < 4; i++) {
        double raw = Geometry.maxOver(v, normals[i]);
        if (!skipSlack || raw > 0) {
          rest.add(new BoundRow(labels[i], normals[i], 0, BigM.pad(raw)));
        }
      }
    }
    return new ArrivalStep(k, region, rest);
  }

  /**
   * Rows {@code n_j·p ≤ c_j + M_j(1 − z)} that put p in a region when z = 1; M_j is the padded
   * largest violation over the domain box. With {@code skipSlack}, faces the whole box already
   * satisfies get no row.
   */
  static List<BoundRow> indicatorRows(Shape region, Bounds domain, boolean skipSlack) {
    List<BoundRow> rows = new ArrayList<>();
    List<Shape.Face> faces = region.faces();
    for (int j = 0; j < faces.size(); j++) {
      Shape.Face f = faces.get(j);
      double raw = Geometry.maxOver(domain, f.normal()) - f.offset();
      if (!skipSlack || raw > 0) {
        rows.add(new BoundRow("f" + j, f.normal(), f.offset(), BigM.pad(raw)));
      }
    }
    return rows;
  }

  /** The first step with an arrival binary. */
  public int firstStep() {
    return steps.get(0).step();
  }

  /** True when d_k exists: an arrival at or before k is possible and k ≤ N−1. */
  public boolean hasDone(int k) {
    return k >= 1 && k <= horizon - 1 && k >= firstStep();
  }

  public boolean hasArrivalAt(int k) {
    for (ArrivalStep s : steps) {
      if (s.step() == k) {
        return true;
      }
    }
    return false;
  }

  void count(Sizes.Counter c) {
    c.arrival += steps.size();
    c.row(steps.size());
    for (int k = 1; k < horizon; k++) {
      if (hasDone(k)) {
        c.continuous++;
        c.row(1 + (hasDone(k - 1) ? 1 : 0) + (hasArrivalAt(k) ? 1 : 0));
      }
    }
    for (ArrivalStep s : steps) {
      for (BoundRow r : s.region()) {
        c.row(r.terms());
      }
      for (BoundRow r : s.rest()) {
        c.row(r.terms());
      }
    }
  }
}
