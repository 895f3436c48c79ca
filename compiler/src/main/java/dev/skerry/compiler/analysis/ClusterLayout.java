package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import java.util.ArrayList;
import java.util.List;

/**
 * In-MILP clustering. NC cluster boxes with continuous bounds; assignment binaries a_{o,l} with Σ_l
 * a_{o,l} = 1; a_{o,l} = 1 forces box l around zone o's inflated bounding box (four big-M rows). The
 * vehicle then avoids the cluster boxes, not the zones (see {@link AvoidanceLayout#cluster}).
 *
 * <p><b>Bound ranges.</b> Each bound of each box lives in the range that bound takes over the
 * zones' inflated boxes ({@link #sides}): xmin_l ∈ [min_o xmin_o, max_o xmin_o], xmax_l ∈ [min_o
 * xmax_o, max_o xmax_o], likewise in y. No optimum is lost: a used box can shrink to the bounding box
 * of its zones (every half-plane the path keeps to only grows), which lies in these ranges. The
 * ranges keep every big-M of the containment and avoidance rows to the spread of the zones rather
 * than the whole world box.
 *
 * <p><b>Empty clusters</b> need no usage binary: a box with no zone may take xmin = max_o xmin_o,
 * xmax = min_o xmax_o, ymin = max_o ymin_o, ymax = min_o ymax_o. Either that box is inverted on some
 * axis (xmin ≥ xmax: every position satisfies one of its faces), or it is the common part of all
 * inflated zone boxes, which lies inside any used cluster's box, so every face the path keeps to for
 * that cluster also clears it. Either way it never blocks the path.
 *
 * <p><b>Symmetry rules.</b> ORDERED: a_{o,l} exists only for l ≤ o, and a_{o,l} ≤ Σ_{o'<o}
 * a_{o',l−1} for l ≥ 1 — zone o may open cluster l only when a lower-numbered zone sits in l−1, so
 * cluster l is used only if l−1 is. Both hold for some optimal solution: number the groups of any
 * partition by their lowest zone index (group l's lowest zone is above group l−1's, which therefore
 * lies below every zone of group l). This per-zone form is stronger in the LP relaxation than the
 * one-row-per-cluster count Σ_o a_{o,l} ≤ m·Σ_o a_{o,l−1}. SORTED: xmin_l ≤ xmin_{l+1} (any
 * optimum sorted by xmin; empty boxes take the largest xmin). NONE: neither.
 */
public record ClusterLayout(int count, SymmetryRule rule, List<Range> sides, List<Assignment> assignments,
    List<String> zoneTags, List<String> zoneNames) {

  public ClusterLayout {
    sides = List.copyOf(sides);
    assignments = List.copyOf(assignments);
    zoneTags = List.copyOf(zoneTags);
    zoneNames = List.copyOf(zoneNames);
  }

  /** The values one bound of a cluster box may take. */
  public record Range(double lo, double hi) {}

  /** Side indices into {@link #sides}, in the order of {@code Shape.Box#faces()}. */
  public static final int XMIN = 0;
  public static final int XMAX = 1;
  public static final int YMIN = 2;
  public static final int YMAX = 3;

  /**
   * a_{zone,cluster}: box {@code zoneBox} inside cluster box l when 1. {@code bigM} for the rows
   * xmin_l ≤ zoneBox.xmin, xmax_l ≥ zoneBox.xmax, ymin_l ≤ zoneBox.ymin, ymax_l ≥ zoneBox.ymax.
   */
  public record Assignment(int zone, int cluster, Bounds zoneBox, double[] bigM) {}

  static ClusterLayout of(int count, SymmetryRule rule, Bounds world, List<Bounds> zoneBoxes, List<String> tags,
      List<String> names) {
    List<Range> sides = ranges(world, zoneBoxes);
    List<Assignment> list = new ArrayList<>();
    for (int o = 0; o < zoneBoxes.size(); o++) {
      Bounds b = zoneBoxes.get(o);
      for (int l = 0; l < count; l++) {
        if (rule == SymmetryRule.ORDERED && l > o) {
          continue;
        }
        double[] m = {
            BigM.pad(sides.get(XMIN).hi() - b.xmin()), BigM.pad(b.xmax() - sides.get(XMAX).lo()),
            BigM.pad(sides.get(YMIN).hi() - b.ymin()), BigM.pad(b.ymax() - sides.get(YMAX).lo())};
        list.add(new Assignment(o, l, b, m));
      }
    }
    return new ClusterLayout(count, rule, sides, list, tags, names);
  }

  /** The bound ranges of the class comment; the world box's when there is no zone. */
  private static List<Range> ranges(Bounds world, List<Bounds> zoneBoxes) {
    if (zoneBoxes.isEmpty()) {
      return List.of(new Range(world.xmin(), world.xmax()), new Range(world.xmin(), world.xmax()),
          new Range(world.ymin(), world.ymax()), new Range(world.ymin(), world.ymax()));
    }
    double[] lo = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
        Double.POSITIVE_INFINITY};
    double[] hi = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY,
        Double.NEGATIVE_INFINITY};
    for (Bounds b : zoneBoxes) {
      double[] v = {b.xmin(), b.xmax(), b.ymin(), b.ymax()};
      for (int i = 0; i < 4; i++) {
        lo[i] = Math.min(lo[i], v[i]);
        hi[i] = Math.max(hi[i], v[i]);
      }
    }
    List<Range> out = new ArrayList<>(4);
    for (int i = 0; i < 4; i++) {
      out.add(new Range(lo[i], hi[i]));
    }
    return out;
  }

  public int zoneCount() {
    return zoneTags.size();
  }

  void count(Sizes.Counter c) {
    c.continuous += 4L * count;
    c.clusterAssignment += assignments.size();
    c.rows(assignments.size() * 4L, 2);
    int[] perZone = new int[zoneCount()];
    for (Assignment a : assignments) {
      perZone[a.zone()]++;
    }
    for (int n : perZone) {
      c.row(n);
    }
    if (rule == SymmetryRule.ORDERED) {
      for (int l = 1; l < count; l++) {
        for (int o = l; o < zoneCount(); o++) {
          c.row(1 + (o - (l - 1)));
        }
      }
    } else if (rule == SymmetryRule.SORTED && count > 1) {
      c.rows(count - 1L, 2);
    }
  }
}
