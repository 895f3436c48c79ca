package dev.skerry.compiler.solve;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Test models shaped like Skerry's own: a 2-D point mass (double integrator, zero-order hold)
 * moving rest to rest across a square area in {@code steps} steps of 1 s, with |u| ≤ 1 and |v| ≤ 3
 * per axis, 1-norm fuel as objective, and 4 big-M binaries per box zone per step with Σb ≤ 3. Each
 * big-M is the tightest that keeps its row inactive over the area, padded by 1e-6 relative (the
 * padding SOLVERS.md asks for). The formulation is common practice; see DESIGN.md §5.
 */
final class TrajectoryMilps {
  static final double SIDE = 20;
  static final double U_MAX = 1;
  static final double V_MAX = 3;

  record Box(double x1, double y1, double x2, double y2) {}

  private TrajectoryMilps() {}

  /** {@code count} zones of side 2 to 4 placed by a seeded random generator in [3, 17]². */
  static Milp randomZones(int steps, int count, long seed) {
    Random random = new Random(seed);
    List<Box> zones = new ArrayList<>();
    while (zones.size() < count) {
      double w = 2 + 2 * random.nextDouble();
      double h = 2 + 2 * random.nextDouble();
      double x = 3 + (14 - w) * random.nextDouble();
      double y = 3 + (14 - h) * random.nextDouble();
      zones.add(new Box(x, y, x + w, y + h));
    }
    return build("zones_" + count + "_" + seed, steps, zones);
  }

  static Milp build(String name, int steps, List<Box> zones) {
    return build(name, steps, new double[] {1, 1}, new double[] {19, 19}, zones);
  }

  static final List<Box> SHORT_HOP_ZONES =
      List.of(new Box(5, 4, 7, 7), new Box(8.5, 8.5, 10.5, 10.5));

  /** A hop from (2, 2) to (12, 12) in 10 steps past two zones on the diagonal: 72 binaries. */
  static Milp shortHop() {
    return build("short_hop", 10, new double[] {2, 2}, new double[] {12, 12}, SHORT_HOP_ZONES);
  }

  /** The same hop with no zones: an LP. */
  static Milp shortHopFree() {
    return build("short_hop_free", 10, new double[] {2, 2}, new double[] {12, 12}, List.of());
  }

  static Milp build(String name, int steps, double[] start, double[] target, List<Box> zones) {
    MilpBuilder b = new MilpBuilder(name);
    Variable[][] p = new Variable[steps + 1][2];
    Variable[][] v = new Variable[steps + 1][2];
    Variable[][] u = new Variable[steps][2];
    Variable[][] w = new Variable[steps][2];
    String[] axis = {"x", "y"};
    for (int k = 0; k <= steps; k++) {
      for (int a = 0; a < 2; a++) {
        double lo = k == 0 ? start[a] : k == steps ? target[a] : 0;
        double hi = k == 0 ? start[a] : k == steps ? target[a] : SIDE;
        p[k][a] =
            b.newContinuous("p" + axis[a] + "_" + k, lo, hi, Origin.of("craft", "p" + axis[a], k));
        double vlo = k == 0 || k == steps ? 0 : -V_MAX;
        double vhi = k == 0 || k == steps ? 0 : V_MAX;
        v[k][a] =
            b.newContinuous(
                "v" + axis[a] + "_" + k, vlo, vhi, Origin.of("craft", "v" + axis[a], k));
      }
    }
    LinearExpr fuel = new LinearExpr();
    for (int k = 0; k < steps; k++) {
      for (int a = 0; a < 2; a++) {
        u[k][a] =
            b.newContinuous("u" + axis[a] + "_" + k, -U_MAX, U_MAX, Origin.of("craft", "u", k));
        w[k][a] = b.newContinuous("w" + axis[a] + "_" + k, 0, U_MAX, Origin.of("craft", "fuel", k));
        Origin o = Origin.of("craft", "dynamics", k);
        // p+ = p + v + u/2 and v+ = v + u with a step of 1 s (zero-order hold)
        b.addEquality(
            "pos" + axis[a] + "_" + k,
            LinearExpr.of(p[k + 1][a]).add(p[k][a], -1).add(v[k][a], -1).add(u[k][a], -0.5),
            0,
            o);
        b.addEquality(
            "vel" + axis[a] + "_" + k,
            LinearExpr.of(v[k + 1][a]).add(v[k][a], -1).add(u[k][a], -1),
            0,
            o);
        b.addGreaterOrEqual(
            "absp" + axis[a] + "_" + k, LinearExpr.of(w[k][a]).add(u[k][a], -1), 0, o);
        b.addGreaterOrEqual("absn" + axis[a] + "_" + k, LinearExpr.of(w[k][a]).add(u[k][a]), 0, o);
        fuel.add(w[k][a]);
      }
    }
    for (int z = 0; z < zones.size(); z++) {
      Box box = zones.get(z);
      String zone = "zone" + z;
      for (int k = 1; k < steps; k++) {
        Origin o = Origin.of(zone, "avoid", k);
        Variable[] side = new Variable[4];
        LinearExpr sum = new LinearExpr();
        for (int s = 0; s < 4; s++) {
          side[s] = b.newBinary("b_" + zone + "_" + k + "_" + s, o);
          sum.add(side[s]);
        }
        // px ≤ x1 + M·b0, −px ≤ −x2 + M·b1, py ≤ y1 + M·b2, −py ≤ −y2 + M·b3
        b.addLessOrEqual(
            zone + "_left_" + k,
            LinearExpr.of(p[k][0]).add(side[0], -pad(SIDE - box.x1())),
            box.x1(),
            o);
        b.addLessOrEqual(
            zone + "_right_" + k,
            LinearExpr.of(p[k][0], -1).add(side[1], -pad(box.x2())),
            -box.x2(),
            o);
        b.addLessOrEqual(
            zone + "_below_" + k,
            LinearExpr.of(p[k][1]).add(side[2], -pad(SIDE - box.y1())),
            box.y1(),
            o);
        b.addLessOrEqual(
            zone + "_above_" + k,
            LinearExpr.of(p[k][1], -1).add(side[3], -pad(box.y2())),
            -box.y2(),
            o);
        b.addLessOrEqual(zone + "_oneside_" + k, sum, 3, o);
      }
    }
    b.minimize(fuel);
    return b.build();
  }

  private static double pad(double m) {
    return m * (1 + 1e-6) + 1e-6;
  }
}
