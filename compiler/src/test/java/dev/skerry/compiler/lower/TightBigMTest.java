package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.LimitPolygon;
import dev.skerry.compiler.analysis.Reachability;
import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Vec2;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every big-M row, with its binary at the inactive value (0) and "arrived" at 0, cuts off no
 * point of its domain: the keep-in area without pruning, the reach box with pruning (box corners
 * and random points, and for cluster rows every corner of the cluster bounds' range). And each M
 * is tight: some corner of the domain makes the slack no larger than the padding.
 */
class TightBigMTest {
  private static final Set<String> BIG_M_ROLES = Set.of("avoid", "terminal", "at-rest", "visit-row", "contain");

  @ParameterizedTest(name = "pruning={0} guard={1} clusters={2}")
  @CsvSource({"false, true, 0", "true, true, 0", "false, false, 0", "true, false, 0", "true, true, 2",
      "false, true, 3"})
  void noDomainPointIsCutOffAndEveryMIsTight(boolean pruning, boolean guard, int clusters) {
    Scenario base = TestScenarios.harbour(12);
    Scenario s = new Scenario(base.name(), base.vehicles(), base.area(), base.zones(), base.targets(),
        List.of(new Waypoint("buoy", new Vec2(14, 3), 0.5, null)),
        base.plan().withPruning(pruning).withGuard(guard).withClusters(clusters, SymmetryRule.NONE));
    Milp m = Lowering.lower(s);
    Reachability reach = Reachability.of(s);
    LimitPolygon speed = LimitPolygon.inscribed(s.vehicle().maxSpeed(), s.vehicle().sides());
    Random random = new Random(7);
    int checked = 0;
    for (Row r : m.rows()) {
      if (!BIG_M_ROLES.contains(r.origin().role())) {
        continue;
      }
      List<double[]> points = new ArrayList<>();
      points.add(new double[m.columnCount()]);
      for (int i = 0; i < r.size(); i++) {
        Variable v = m.variables().get(r.cols()[i]);
        String n = v.name();
        if (v.type() != VarType.CONTINUOUS || n.startsWith("done_")) {
          continue;
        }
        int k = v.origin().step();
        Bounds domain;
        if (n.startsWith("px_") || n.startsWith("py_")) {
          domain = pruning || k == 0 ? reach.position(k) : reach.keepIn();
        } else if (n.startsWith("vx_") || n.startsWith("vy_")) {
          domain = pruning ? reach.velocity(k) : new Bounds(speed.xmin(), speed.ymin(), speed.xmax(), speed.ymax());
        } else {
          domain = new Bounds(v.lower(), v.lower(), v.upper(), v.upper());
        }
        boolean isY = n.startsWith("py_") || n.startsWith("vy_") || n.startsWith("cym");
        double lo = isY ? domain.ymin() : domain.xmin();
        double hi = isY ? domain.ymax() : domain.xmax();
        List<double[]> next = new ArrayList<>();
        for (double[] p : points) {
          for (double value : new double[] {lo, hi, lo + random.nextDouble() * (hi - lo)}) {
            double[] q = p.clone();
            q[v.index()] = value;
            next.add(q);
          }
        }
        points = next;
      }
      double minSlack = Double.POSITIVE_INFINITY;
      for (double[] x : points) {
        double a = r.activity(x);
        double slack = Math.min(a - r.lower(), r.upper() - a);
        assertTrue(slack >= -1e-9, "row " + r.name() + " cuts off a domain point by " + -slack);
        minSlack = Math.min(minSlack, slack);
      }
      double bigM = binaryCoefficient(m, r);
      if (bigM > 1e-5) {
        assertTrue(minSlack <= 1e-6 * bigM + 1e-6 + 1e-9, "row " + r.name() + " has a loose M: slack " + minSlack);
      }
      checked++;
    }
    assertTrue(checked > 50, "too few big-M rows checked: " + checked);
  }

  /**
   * With its binary at 1 a containment row pins a cluster side at the zone's edge; for the zone
   * with the extreme edge that is the end of the side's range. The range must still hold a value
   * the row allows in exact decimal arithmetic on the numbers as written (the shortest decimal of
   * each double, as a solver that reads numbers exactly does): on the rock field, before the
   * right-hand sides were raised where needed ({@code ClusterLowering.roomAtOne}), edge + M − M came
   * out 1e-14 short of the range and ojAlgo's model simplification fixed that zone's assignment
   * binaries at 0, making the model infeasible.
   */
  @org.junit.jupiter.api.Test
  void anActiveContainmentRowLeavesTheSideARangeValueInExactArithmetic() {
    Milp m = Lowering.lower(dev.skerry.compiler.plan.ExampleScenarios.full("rock_field"));
    int checked = 0;
    for (Row r : m.rows()) {
      if (!r.origin().role().equals("contain")) {
        continue;
      }
      java.math.BigDecimal rest = java.math.BigDecimal.valueOf(r.upper());
      Variable side = null;
      double sign = 0;
      for (int i = 0; i < r.size(); i++) {
        Variable v = m.variables().get(r.cols()[i]);
        if (v.type() == VarType.BINARY) {
          rest = rest.subtract(java.math.BigDecimal.valueOf(r.coefs()[i]));
        } else {
          side = v;
          sign = r.coefs()[i];
        }
      }
      // sign·side ≤ rest: the side's lower bound (sign +1) or upper bound (sign −1) must satisfy it
      java.math.BigDecimal best = java.math.BigDecimal.valueOf(sign > 0 ? side.lower() : -side.upper());
      assertTrue(best.compareTo(rest) <= 0, "row " + r.name() + " with its binary at 1 leaves no value of "
          + side.name() + " in its range: needs " + best + " ≤ " + rest);
      checked++;
    }
    assertTrue(checked > 100, "too few containment rows checked: " + checked);
  }

  private static double binaryCoefficient(Milp m, Row r) {
    for (int i = 0; i < r.size(); i++) {
      if (m.variables().get(r.cols()[i]).type() == VarType.BINARY) {
        return Math.abs(r.coefs()[i]);
      }
    }
    return 0;
  }
}
