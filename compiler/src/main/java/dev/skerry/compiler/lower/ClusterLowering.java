package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.ClusterLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import java.math.BigDecimal;
import java.util.List;

/**
 * In-MILP clustering as laid out by {@link ClusterLayout}: cluster bound columns, assignment
 * binaries a_{o,l} with Σ_l a_{o,l} = 1, containment rows (a_{o,l} = 1 ⇒ box l ⊇ zone o's inflated
 * bounding box) and the symmetry rows of the plan's rule. Avoidance of the boxes is lowered by
 * {@link ZoneAvoidanceLowering}. Run before it: the avoidance rows use the bound columns.
 */
final class ClusterLowering {
  private static final String[] SIDES = {"xmin", "xmax", "ymin", "ymax"};

  private ClusterLowering() {}

  /** Lowers the fleet's cluster boxes once and hands their bound columns to every vehicle's context. */
  static void lower(List<LoweringContext> parts) {
    LoweringContext c = parts.get(0);
    ClusterLayout cl = c.layout.clusters();
    if (cl == null) {
      return;
    }
    c.clusterBounds = new Variable[cl.count()][4];
    for (LoweringContext other : parts) {
      other.clusterBounds = c.clusterBounds;
    }
    for (int l = 0; l < cl.count(); l++) {
      String e = "c" + l;
      for (int side = 0; side < 4; side++) {
        ClusterLayout.Range r = cl.sides().get(side);
        c.clusterBounds[l][side] = c.builder.newContinuous("c" + SIDES[side] + "_" + e, r.lo(), r.hi(),
            Origin.of(e, "cluster-bound"));
      }
    }
    Variable[][] a = new Variable[cl.zoneCount()][cl.count()];
    LinearExpr[] once = new LinearExpr[cl.zoneCount()];
    for (ClusterLayout.Assignment as : cl.assignments()) {
      int o = as.zone();
      int l = as.cluster();
      String zone = cl.zoneNames().get(o);
      String tag = cl.zoneTags().get(o) + "_c" + l;
      a[o][l] = c.builder.newBinary("a_" + tag, Origin.of(zone, "assign"));
      once[o] = once[o] == null ? new LinearExpr() : once[o];
      once[o].add(a[o][l]);
      Bounds z = as.zoneBox();
      double[] m = as.bigM();
      Variable[] cb = c.clusterBounds[l];
      Origin origin = Origin.of(zone, "contain");
      double[] edge = {z.xmin(), z.xmax(), z.ymin(), z.ymax()};
      for (int side = 0; side < 4; side++) {
        double sign = side % 2 == 0 ? 1 : -1;
        LinearExpr e = LinearExpr.of(cb[side], sign).add(a[o][l], m[side]);
        c.builder.addLessOrEqual("cin_" + tag + "_" + SIDES[side], e, roomAtOne(sign * edge[side], m[side]), origin);
      }
    }
    for (int o = 0; o < cl.zoneCount(); o++) {
      c.builder.addEquality("asg_" + cl.zoneTags().get(o), once[o] == null ? new LinearExpr() : once[o], 1,
          Origin.of(cl.zoneNames().get(o), "assign-once"));
    }
    symmetry(c, cl, a);
  }

  /**
   * The right-hand side {@code bound + m} of a containment row {@code sign·side + m·a ≤ bound + m},
   * raised by a few units in the last place if need be so that with {@code a = 1} the side may
   * still reach {@code bound} exactly when the numbers are read as the decimals they print as. The
   * zone with the extreme edge pins the side at the end of its range; without this, edge + M − M
   * came out 1e-14 short of the range on the rock field, and ojAlgo's model simplification (which
   * computes in decimals) fixed that zone's assignment binaries at 0 and called the model
   * infeasible. Solvers with tolerances were unaffected, and the raise is far below them.
   */
  static double roomAtOne(double bound, double m) {
    BigDecimal exact = BigDecimal.valueOf(bound);
    BigDecimal big = BigDecimal.valueOf(m);
    double rhs = bound + m;
    while (BigDecimal.valueOf(rhs).subtract(big).compareTo(exact) < 0) {
      rhs = Math.nextUp(rhs);
    }
    return rhs;
  }

  private static void symmetry(LoweringContext c, ClusterLayout cl, Variable[][] a) {
    if (cl.rule() == SymmetryRule.ORDERED) {
      for (int l = 1; l < cl.count(); l++) {
        for (int o = l; o < cl.zoneCount(); o++) {
          LinearExpr e = LinearExpr.of(a[o][l]);
          for (int below = l - 1; below < o; below++) {
            e.add(a[below][l - 1], -1);
          }
          c.builder.addLessOrEqual("symopen_" + cl.zoneTags().get(o) + "_c" + l, e, 0,
              Origin.of(cl.zoneNames().get(o), "symmetry"));
        }
      }
    } else if (cl.rule() == SymmetryRule.SORTED) {
      for (int l = 0; l + 1 < cl.count(); l++) {
        c.builder.addLessOrEqual("symsort_c" + l,
            LinearExpr.of(c.clusterBounds[l][0]).add(c.clusterBounds[l + 1][0], -1), 0,
            Origin.of("c" + l, "symmetry"));
      }
    }
  }
}
