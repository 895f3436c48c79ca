package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import java.util.ArrayList;
import java.util.List;

/**
 * In-MILP clustering. NC cluster boxes with continuous bounds inside the world box (the keep-in
 * box, the start and every inflated zone's bounding box); assignment binaries a_{o,l} with Σ_l
 * a_{o,l} = 1; a_{o,l} = 1 forces box l around zone o's inflated bounding box (four big-M rows, M
 * from the world box). The vehicle then avoids the cluster boxes, not the zones (see {@link
 * AvoidanceLayout#cluster}).
 *
 * <p><b>Empty clusters</b> need no usage binary: nothing ties the bounds of a box with no zone, so
 * it can collapse to a degenerate box at the world's edge (e.g. xmin at the world's right end), which
 * every position satisfies "x ≤ xmin" against; it never blocks the path.
 *
 * <p><b>Symmetry rules.</b> ORDERED: a_{o,l} exists only for l ≤ o, and Σ_o a_{o,l} ≤
 * m_l·Σ_o a_{o,l−1} (m_l the number of zones that may join l) — cluster l is used only if l−1 is.
 * Both hold for some optimal solution: number the groups of any partition by their lowest zone index.
 * SORTED: xmin_l ≤ xmin_{l+1}. NONE: neither.
 */
public record ClusterLayout(int count, SymmetryRule rule, Bounds world, List<Assignment> assignments,
    List<String> zoneTags, List<String> zoneNames) {

  public ClusterLayout {
    assignments = List.copyOf(assignments);
    zoneTags = List.copyOf(zoneTags);
    zoneNames = List.copyOf(zoneNames);
  }

  /**
   * a_{zone,cluster}: box {@code zoneBox} inside cluster box l when 1. {@code bigM} for the rows
   * xmin_l ≤ zoneBox.xmin, xmax_l ≥ zoneBox.xmax, ymin_l ≤ zoneBox.ymin, ymax_l ≥ zoneBox.ymax.
   */
  public record Assignment(int zone, int cluster, Bounds zoneBox, double[] bigM) {}

  static ClusterLayout of(int count, SymmetryRule rule, Bounds world, List<Bounds> zoneBoxes, List<String> tags,
      List<String> names) {
    List<Assignment> list = new ArrayList<>();
    for (int o = 0; o < zoneBoxes.size(); o++) {
      Bounds b = zoneBoxes.get(o);
      for (int l = 0; l < count; l++) {
        if (rule == SymmetryRule.ORDERED && l > o) {
          continue;
        }
        double[] m = {
            BigM.pad(world.xmax() - b.xmin()), BigM.pad(b.xmax() - world.xmin()),
            BigM.pad(world.ymax() - b.ymin()), BigM.pad(b.ymax() - world.ymin())};
        list.add(new Assignment(o, l, b, m));
      }
    }
    return new ClusterLayout(count, rule, world, list, tags, names);
  }

  /** Zones that may join cluster l. */
  public int eligible(int l) {
    int n = 0;
    for (Assignment a : assignments) {
      n += a.cluster() == l ? 1 : 0;
    }
    return n;
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
        if (eligible(l) > 0) {
          c.row(eligible(l) + eligible(l - 1));
        }
      }
    } else if (rule == SymmetryRule.SORTED && count > 1) {
      c.rows(count - 1L, 2);
    }
  }
}
