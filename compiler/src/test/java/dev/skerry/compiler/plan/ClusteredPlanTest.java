package dev.skerry.compiler.plan;

import static dev.skerry.compiler.analysis.TestScenarios.box;
import static dev.skerry.compiler.analysis.TestScenarios.zone;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Zone;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Clustered plans on a small channel with four box zones, solved to optimality (SCIP, relative gap
 * 1e-6): the verifier accepts them against the original zones, the chosen boxes really hold their
 * zones and keep clear of the path (checked here with our own geometry, not the MILP's rows), the
 * optimum never beats the unclustered one, and the symmetry rules do not change it.
 */
class ClusteredPlanTest {
  private static final SolveOptions EXACT = SolveOptions.defaults().withRelativeGap(1e-6)
      .withTimeLimit(Duration.ofSeconds(60));
  private static final double TOL = 1e-6;
  private static PlanResult unclustered;

  /**
   * Start (1, 6) and a target around (18, 6) at rest in a 20 m × 12 m channel; one zone on the
   * direct line near each end, one above and one below the middle. A single box around all four
   * spans nearly the whole width, so one cluster forces a long detour.
   */
  static Scenario channel() {
    List<Zone> zones = List.of(
        zone("west", box(5, 4, 6, 8)),
        zone("south", box(9, 1, 10, 3)),
        zone("north", box(9, 9, 10, 11)),
        zone("east", box(13, 5, 14, 7)));
    return TestScenarios.scenario(TestScenarios.vehicle(new Vec2(1, 6), 3, 1.5, 0.25, 8), box(0, 0, 20, 12), zones,
        TestScenarios.target(box(17.5, 5.5, 18.5, 6.5), true), List.of(), TestScenarios.plan(1.0, 16, 1, 0.1));
  }

  @BeforeAll
  static void solveUnclustered() {
    unclustered = plan(channel());
    assertEquals(SolveStatus.OPTIMAL, unclustered.solve().status(), unclustered.solve().summary());
    assertTrue(unclustered.verified(), () -> "unclustered plan fails the verifier: " + unclustered.verify());
  }

  @ParameterizedTest(name = "{0} cluster(s)")
  @ValueSource(ints = {1, 2, 3})
  void everyRuleFindsTheSameVerifiedOptimumNoBetterThanUnclustered(int count) {
    Scenario base = channel();
    double best = unclustered.solve().objective();
    Map<SymmetryRule, Double> optimum = new HashMap<>();
    for (SymmetryRule rule : SymmetryRule.values()) {
      Scenario s = base.withPlan(base.plan().withClusters(count, rule));
      PlanResult r = plan(s);
      String what = count + " " + rule.keyword();
      assertEquals(SolveStatus.OPTIMAL, r.solve().status(), what + ": " + r.solve().summary());
      assertTrue(r.verified(), () -> what + ": plan fails the verifier against the original zones: " + r.verify());
      assertEquals(count, r.clusters().size(), what);
      checkBoxes(s, r, what);
      double cost = r.solve().objective();
      assertTrue(cost >= best - TOL * Math.max(1, best), what + ": cost " + cost + " beats unclustered " + best);
      if (count == 1) {
        assertTrue(cost > best + 0.5, what + ": one box around every zone should force a detour, cost " + cost
            + " vs " + best);
      }
      optimum.put(rule, cost);
    }
    double none = optimum.get(SymmetryRule.NONE);
    for (Map.Entry<SymmetryRule, Double> e : optimum.entrySet()) {
      assertEquals(none, e.getValue(), 1e-5 * Math.max(1, Math.abs(none)), count + " " + e.getKey().keyword());
    }
  }

  /**
   * Each zone in exactly one cluster, its bounding box grown by the radius and the guard's arc bulge
   * a_max·Δt²/8 inside that cluster's box, and no flown chord p_k → p_{k+1} enters a used cluster's
   * box (an empty cluster holds nothing and may collapse anywhere). A chord outside a box grown by
   * the bulge keeps the true arc outside the box grown by the radius alone.
   */
  private static void checkBoxes(Scenario s, PlanResult r, String what) {
    double grow = s.vehicle().radius() + s.vehicle().maxAccel() * s.plan().step() * s.plan().step() / 8;
    Map<String, Integer> seen = new HashMap<>();
    for (ClusterBox c : r.clusters()) {
      for (String name : c.zones()) {
        seen.merge(name, 1, Integer::sum);
        Bounds need = zoneNamed(s, name).shape().bounds().expand(grow);
        assertTrue(inside(need, c.box()), what + ": zone " + name + " grown to " + need + " is not inside " + c);
      }
    }
    for (Zone z : s.zones()) {
      assertEquals(1, seen.getOrDefault(z.name(), 0), what + ": zone " + z.name() + " is in " + seen.get(z.name())
          + " clusters");
    }
    List<Sample> flown = r.trajectory().flown();
    for (ClusterBox c : r.clusters()) {
      if (c.zones().isEmpty()) {
        continue;
      }
      for (int k = 0; k + 1 < flown.size(); k++) {
        Vec2 a = flown.get(k).position();
        Vec2 b = flown.get(k + 1).position();
        assertFalse(entersInterior(a, b, c.box()), what + ": chord " + k + " " + a + " → " + b + " enters " + c);
      }
    }
  }

  @Test
  void oneClusterAroundTheStartIsFlaggedAndInfeasible() {
    String text = """
        scenario boxed_in
        units m, s
        vehicle skiff {
          start (7.5, 6) at rest
          speed max 3 m/s
          accel max 1.5 m/s^2
          radius 0.25 m
        }
        area channel box (0, 0) to (20, 12)
        zone west box (5, 4) to (6, 8)
        zone south box (9, 1) to (10, 3)
        zone north box (9, 9) to (10, 11)
        zone east box (13, 5) to (14, 7)
        target berth box (17.5, 5.5) to (18.5, 6.5) at rest
        plan {
          step 1 s
          horizon 16
          minimize time + 0.1 fuel
          clusters 1
        }
        """;
    Path place = Path.of("boxed_in.skerry").toAbsolutePath();
    CheckResult checked = ScenarioChecker.check(SourceFile.of(place, text), new DiskLoader(place.getParent()));
    List<Code> codes = checked.diagnostics().stream().map(Diagnostic::code).toList();
    assertTrue(codes.contains(Code.SINGLE_CLUSTER_COVERS), "diagnostics: " + checked.diagnostics());
    Scenario s = checked.scenario();
    assertNotNull(s, "the checker still builds the scenario when only the hint fails");
    assertEquals(SolveStatus.INFEASIBLE, solve(s).status(), "one cluster around the start");
    Scenario three = s.withPlan(s.plan().withClusters(3, SymmetryRule.ORDERED));
    assertTrue(solve(three).status().hasSolution(), "with three clusters the same scenario has a plan");
  }

  private static SolveResult solve(Scenario s) {
    Milp milp = Lowering.lower(s);
    return Backends.standard().choose("scip", milp).backend().solve(milp, EXACT, SolveMonitor.NONE);
  }

  private static PlanResult plan(Scenario s) {
    return Planner.standard().plan(s, "scip", EXACT, SolveMonitor.NONE);
  }

  private static Zone zoneNamed(Scenario s, String name) {
    return s.zones().stream().filter(z -> z.name().equals(name)).findFirst().orElseThrow();
  }

  private static boolean inside(Bounds in, Bounds out) {
    return in.xmin() >= out.xmin() - TOL && in.ymin() >= out.ymin() - TOL
        && in.xmax() <= out.xmax() + TOL && in.ymax() <= out.ymax() + TOL;
  }

  /**
   * Whether segment a → b meets the box shrunk by {@link #TOL} (Liang–Barsky clipping, common
   * practice): touching the box's boundary is allowed, entering its interior is not.
   */
  static boolean entersInterior(Vec2 a, Vec2 b, Bounds box) {
    double[] p = {-(b.x() - a.x()), b.x() - a.x(), -(b.y() - a.y()), b.y() - a.y()};
    double[] q = {a.x() - (box.xmin() + TOL), (box.xmax() - TOL) - a.x(), a.y() - (box.ymin() + TOL),
        (box.ymax() - TOL) - a.y()};
    double t0 = 0;
    double t1 = 1;
    for (int i = 0; i < 4; i++) {
      if (p[i] == 0) {
        if (q[i] < 0) {
          return false;
        }
      } else {
        double t = q[i] / p[i];
        if (p[i] < 0) {
          t0 = Math.max(t0, t);
        } else {
          t1 = Math.min(t1, t);
        }
      }
    }
    return t0 <= t1;
  }
}
