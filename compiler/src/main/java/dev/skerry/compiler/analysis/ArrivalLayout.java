package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
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
public record ArrivalLayout(String targetTag, String targetName, int horizon, List<ArrivalStep> steps,
    List<Candidate> candidates) {

  public ArrivalLayout {
    steps = List.copyOf(steps);
    candidates = List.copyOf(candidates);
  }

  /**
   * A target the vehicle may end in. With several candidates (targets assigned by the MILP) there
   * is one arrival binary per candidate and step, Σ over both = 1, and each target takes at most one
   * vehicle ({@link FormulationLayout#capacities}).
   */
  public record Candidate(String name, String tag) {}

  /**
   * Arrival at step k in candidate {@code target}: the binary f with its terminal rows on p_k (and
   * the altitude in 3-D) and at-rest rows on v_k (and the climb rate in 3-D).
   */
  public record ArrivalStep(int step, int target, List<BoundRow> region, List<BoundRow> rest) {
    public ArrivalStep {
      region = List.copyOf(region);
      rest = List.copyOf(rest);
    }
  }

  static ArrivalLayout of(List<Target> targets, List<String> tags, FormulationLayout.Domains d, List<Fact> facts) {
    int n = d.horizon();
    List<ArrivalStep> steps = new ArrayList<>();
    List<Candidate> candidates = new ArrayList<>();
    for (int t = 0; t < targets.size(); t++) {
      candidates.add(new Candidate(targets.get(t).name(), tags.get(t)));
    }
    for (int k = 1; k <= n; k++) {
      for (int t = 0; t < targets.size(); t++) {
        if (!d.pruning() || reachable(targets.get(t), d, k)) {
          steps.add(step(targets.get(t), t, d, k, d.pruning()));
        }
      }
    }
    if (steps.isEmpty()) {
      String names = String.join(", ", targets.stream().map(Target::name).toList());
      facts.add(new Fact("target-unreachable", targets.get(0).name(), -1,
          "no step of the horizon can reach target " + names + (targets.get(0).atRest() ? " at rest" : "")
              + " within the speed and acceleration limits"));
      for (int k = 1; k <= n; k++) {
        for (int t = 0; t < targets.size(); t++) {
          steps.add(step(targets.get(t), t, d, k, false));
        }
      }
    }
    return new ArrivalLayout(tags.get(0), targets.get(0).name(), n, steps, candidates);
  }

  private static boolean reachable(Target target, FormulationLayout.Domains d, int k) {
    if (!Geometry.mayIntersect(target.region(), d.position(k))) {
      return false;
    }
    if (d.threeD() && target.altitude() != null) {
      Span a = d.altitude(k);
      double tol = 1e-9 * Math.max(1, Math.max(Math.abs(a.lo()), Math.abs(a.hi())));
      if (target.altitude().hi() < a.lo() - tol || target.altitude().lo() > a.hi() + tol) {
        return false;
      }
    }
    Bounds v = d.velocity(k);
    boolean still = v.xmin() <= 0 && v.xmax() >= 0 && v.ymin() <= 0 && v.ymax() >= 0;
    if (d.threeD()) {
      still &= d.rate(k).contains(0);
    }
    return !target.atRest() || still;
  }

  private static ArrivalStep step(Target target, int index, FormulationLayout.Domains d, int k, boolean skipSlack) {
    List<BoundRow> region = new ArrayList<>(indicatorRows(target.region(), d.position(k), skipSlack));
    if (d.threeD() && target.altitude() != null) {
      region.addAll(altitudeRows(target.altitude(), d.position(k), d.altitude(k), skipSlack));
    }
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
      if (d.threeD()) {
        Span w = d.rate(k);
        if (!skipSlack || w.hi() > 0) {
          rest.add(new BoundRow("vzp", Vec2.ZERO, 0, BigM.pad(w.hi()), 1));
        }
        if (!skipSlack || w.lo() < 0) {
          rest.add(new BoundRow("vzn", Vec2.ZERO, 0, BigM.pad(-w.lo()), -1));
        }
      }
    }
    return new ArrivalStep(k, index, region, rest);
  }

  /** Indicator rows z ≤ hi and −z ≤ −lo for an altitude band, M from the altitude domain. */
  static List<BoundRow> altitudeRows(Span band, Bounds plan, Span domain, boolean skipSlack) {
    List<BoundRow> rows = new ArrayList<>(2);
    double up = domain.hi() - band.hi();
    if (!skipSlack || up > 0) {
      rows.add(new BoundRow("zp", Vec2.ZERO, band.hi(), BigM.pad(up), 1));
    }
    double down = band.lo() - domain.lo();
    if (!skipSlack || down > 0) {
      rows.add(new BoundRow("zn", Vec2.ZERO, -band.lo(), BigM.pad(down), -1));
    }
    return rows;
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

  /** True when the MILP chooses among several targets. */
  public boolean assigned() {
    return candidates.size() > 1;
  }

  /** Arrival binaries at step k (one per candidate target that can be reached then). */
  public int arrivalsAt(int k) {
    int n = 0;
    for (ArrivalStep s : steps) {
      n += s.step() == k ? 1 : 0;
    }
    return n;
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
        c.row(1 + (hasDone(k - 1) ? 1 : 0) + arrivalsAt(k));
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
