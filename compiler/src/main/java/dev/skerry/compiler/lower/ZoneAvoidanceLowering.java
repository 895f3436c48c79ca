package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.AvoidanceLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;

/**
 * Avoidance rows for every obstacle slot of {@link AvoidanceLayout} (zones, or cluster boxes when
 * the plan clusters). Big-M slot: binary b_j per face, rows {@code n_j·p − M_j b_j ≥ c_j − M_j} at
 * each listed point (b_j = 1: face j separates), cover Σ_j b_j + d ≥ 1. Hard slot: {@code n·p + M d
 * ≥ c}. For a cluster, c_j is the cluster bound variable: {@code n_j·p − n_a·bound_j − M_j b_j ≥
 * −M_j}.
 */
final class ZoneAvoidanceLowering {
  private ZoneAvoidanceLowering() {}

  static void lower(LoweringContext c) {
    for (AvoidanceLayout.Obstacle o : c.part.avoidance().obstacles()) {
      String prefix = o.isCluster() ? "c" : "";
      for (AvoidanceLayout.Slot s : o.slots()) {
        Variable d = s.relaxBy() >= 0 ? c.done[s.relaxBy()] : null;
        LinearExpr cover = new LinearExpr();
        for (AvoidanceLayout.FaceRow f : s.faces()) {
          String face = c.scope + o.tag() + "_f" + f.face() + "_" + s.slot();
          Variable bin = null;
          if (!s.hard()) {
            bin = c.builder.newBinary("b" + prefix + "_" + face, c.origin(o.entity(), "avoid-binary", s.slot()));
            cover.add(bin);
          }
          for (int i = 0; i < f.points().length; i++) {
            int p = f.points()[i];
            double m = f.bigM()[i];
            LinearExpr e = c.position(f.normal(), f.nz(), p);
            double rhs = f.offset();
            if (o.isCluster()) {
              e.add(c.clusterBounds[o.cluster()][f.face()], -(f.normal().x() + f.normal().y()));
              rhs = 0;
            }
            String role;
            if (s.hard()) {
              role = "avoid-hard";
              if (d != null) {
                e.add(d, m);
              }
            } else {
              role = "avoid";
              e.add(bin, -m);
              rhs -= m;
            }
            c.builder.addGreaterOrEqual((s.hard() ? "hard" : "av") + prefix + "_" + face + "_" + p, e, rhs,
                c.origin(o.entity(), role, p));
          }
        }
        if (!s.hard()) {
          if (d != null) {
            cover.add(d);
          }
          c.builder.addGreaterOrEqual("cov" + prefix + "_" + c.scope + o.tag() + "_" + s.slot(), cover, 1,
              c.origin(o.entity(), "cover", s.slot()));
        }
      }
    }
  }
}
