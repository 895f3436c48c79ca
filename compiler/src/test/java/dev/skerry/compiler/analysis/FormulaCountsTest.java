package dev.skerry.compiler.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Binary counts of the plain (unpruned) formulation against the textbook formulas — common
 * practice, no single source: 4 binaries per box zone per step (4·NS·NO), one per face for a convex
 * polygon, N arrival binaries for a variable horizon of N steps, NC·NO assignment plus 4·NS·NC
 * cluster-avoidance binaries for in-MILP clustering. NS = N slots both with the guard (segments
 * 0..N−1) and without it (points 1..N).
 */
class FormulaCountsTest {

  private static Scenario boxes(int n, int zones, boolean guard) {
    List<Zone> list = new ArrayList<>();
    for (int o = 0; o < zones; o++) {
      double x = 3 + 2.5 * o;
      list.add(TestScenarios.zone("z" + o, TestScenarios.box(x, 1 + (o % 3), x + 1, 2.5 + (o % 3))));
    }
    Scenario s = TestScenarios.scenario(TestScenarios.vehicle(new Vec2(1, 6), 3, 1.5, 0.25, 16),
        TestScenarios.box(0, 0, 40, 12), list,
        TestScenarios.target(TestScenarios.box(37, 5, 38, 6), false), List.of(),
        TestScenarios.plan(1, n, 1, 0.1));
    return s.withPlan(s.plan().withPruning(false).withGuard(guard));
  }

  @ParameterizedTest(name = "N={0} NO={1} guard={2}")
  @CsvSource({"10, 1, true", "10, 5, true", "25, 8, false", "40, 12, true"})
  void plainZoneAndArrivalCounts(int n, int no, boolean guard) {
    Sizes sizes = Analysis.sizes(boxes(n, no, guard));
    assertEquals(4L * n * no, sizes.zoneBoxBinaries());
    assertEquals(n, sizes.arrivalBinaries());
    assertEquals(0, sizes.zonePolygonBinaries());
    // p, v for k = 0..N; u and fuel w for k = 0..N−1; "arrived by" d_k for k = 1..N−1.
    assertEquals(4L * (n + 1) + 2L * n + 2L * n + (n - 1), sizes.continuous());
  }

  @ParameterizedTest(name = "N={0} NO={1} NC={2}")
  @CsvSource({"10, 5, 2", "20, 8, 3", "15, 3, 3"})
  void plainClusterCounts(int n, int no, int nc) {
    Scenario s = boxes(n, no, true);
    for (SymmetryRule rule : SymmetryRule.values()) {
      Sizes sizes = Analysis.sizes(s.withPlan(s.plan().withClusters(nc, rule)));
      // ORDERED lets zone o join only clusters l ≤ o: the NC(NC−1)/2 pairs with l > o never exist.
      long assignments = (long) nc * no - (rule == SymmetryRule.ORDERED ? (long) nc * (nc - 1) / 2 : 0);
      assertEquals(assignments, sizes.clusterAssignmentBinaries(), rule.keyword());
      assertEquals(4L * n * nc, sizes.clusterAvoidanceBinaries(), rule.keyword());
      assertEquals(0, sizes.zoneBoxBinaries(), rule.keyword());
    }
  }

  @ParameterizedTest(name = "faces={0}")
  @CsvSource({"3", "5", "8"})
  void polygonZoneHasOneBinaryPerFacePerStep(int faces) {
    List<Vec2> vertices = new ArrayList<>();
    for (int i = 0; i < faces; i++) {
      double a = 2 * Math.PI * i / faces;
      vertices.add(new Vec2(20 + 2 * Math.cos(a), 6 + 2 * Math.sin(a)));
    }
    Scenario s = boxes(12, 0, true);
    s = new Scenario(s.name(), s.vehicles(), s.area(), List.of(TestScenarios.zone("rock", new Shape.Polygon(vertices))),
        s.targets(), s.waypoints(), s.plan());
    assertEquals((long) faces * 12, Analysis.sizes(s).zonePolygonBinaries());
  }

  @ParameterizedTest(name = "N={0} NO={1}")
  @CsvSource({"16, 8", "20, 12", "25, 20"})
  void reportGivesPlainPrunedAndClusteredFromOneLayout(int n, int no) {
    Scenario s = boxes(n, no, true);
    Scenario pruned = s.withPlan(s.plan().withPruning(true));
    SizeReport report = Analysis.report(pruned);
    assertEquals(4L * n * no, report.unpruned().zoneBoxBinaries());
    assertEquals(Analysis.sizes(pruned), report.asWritten());
    long nc = Analysis.SUGGESTED_CLUSTERS;
    assertEquals(nc * no - nc * (nc - 1) / 2, report.comparison().clusterAssignmentBinaries());
    assertEquals(4L * n * nc, report.comparison().clusterAvoidanceBinaries());
    SizeReport back = Analysis.report(pruned.withPlan(pruned.plan().withClusters(3, SymmetryRule.NONE)));
    assertEquals(report.asWritten(), back.comparison());
  }
}
