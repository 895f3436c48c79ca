package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.SeparationLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.util.List;

/**
 * Pairwise separation of a fleet as laid out by {@link SeparationLayout}. Big-M slot: binary b per
 * face, rows {@code sign·(q_a − q_b) − M b ≥ D − M} at each listed point, cover Σ b + d_a + d_b ≥ 1.
 * Hard slot: {@code sign·(q_a − q_b) + M d_a + M d_b ≥ D}.
 */
final class SeparationLowering {
  private SeparationLowering() {}

  static void lower(List<SeparationLayout> pairs, List<LoweringContext> parts, MilpBuilder b) {
    for (SeparationLayout pair : pairs) {
      LoweringContext ca = parts.get(pair.a());
      LoweringContext cb = parts.get(pair.b());
      String entity = pair.nameA() + "|" + pair.nameB();
      String tag = pair.tagA() + "_" + pair.tagB();
      for (SeparationLayout.Slot s : pair.slots()) {
        Variable da = s.relaxA() >= 0 ? ca.done[s.relaxA()] : null;
        Variable db = s.relaxB() >= 0 ? cb.done[s.relaxB()] : null;
        LinearExpr cover = new LinearExpr();
        for (SeparationLayout.Face f : s.faces()) {
          String face = tag + "_" + SeparationLayout.FACES[f.axis()] + "_" + s.slot();
          Variable bin = null;
          if (!s.hard()) {
            bin = b.newBinary("bs_" + face, Origin.of(entity, "separate-binary", s.slot()));
            cover.add(bin);
          }
          for (int i = 0; i < f.points().length; i++) {
            int p = f.points()[i];
            double m = f.bigM()[i];
            LinearExpr e = new LinearExpr();
            e.add(coordinate(ca, f.axis(), p), f.sign());
            e.add(coordinate(cb, f.axis(), p), -f.sign());
            double rhs = f.bound();
            if (s.hard()) {
              if (da != null) {
                e.add(da, m);
              }
              if (db != null) {
                e.add(db, m);
              }
            } else {
              e.add(bin, -m);
              rhs -= m;
            }
            b.addGreaterOrEqual((s.hard() ? "hsep_" : "sep_") + face + "_" + p, e, rhs,
                Origin.of(entity, s.hard() ? "separate-hard" : "separate", p));
          }
        }
        if (!s.hard()) {
          if (da != null) {
            cover.add(da);
          }
          if (db != null) {
            cover.add(db);
          }
          b.addGreaterOrEqual("covs_" + tag + "_" + s.slot(), cover, 1, Origin.of(entity, "separate-cover", s.slot()));
        }
      }
    }
  }

  private static Variable coordinate(LoweringContext c, int axis, int k) {
    return axis < 2 ? c.px[k] : axis < 4 ? c.py[k] : c.pz[k];
  }
}
