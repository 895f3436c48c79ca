package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.ClusterLayout;
import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolverBackend;
import dev.skerry.compiler.verify.Verifier;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/**
 * Starts for clustered models: the zones grouped into cluster boxes by geometry first. The judge of
 * each start is the whole model (every row), the verifier, and SCIP's proven bound on the same
 * model (a start can never beat it).
 */
class ClusterStartsTest {
  static final Duration BUDGET = Duration.ofSeconds(90);

  static SolverBackend backend(String id, Milp m) {
    return Backends.standard().choose(id, m).backend();
  }

  /** Rocks below, above and below the straight line from the start to the target. */
  static Scenario threeRocks() {
    return ExampleScenarios.parse("three_rocks", """
        vehicle v { start (2, 15) at rest speed max 5 m/s accel max 2 m/s^2 radius 0.5 m }
        area a box (0, 0) to (60, 30)
        zone r1 box (18, 8) to (22, 12)
        zone r2 box (28, 18) to (32, 22)
        zone r3 box (38, 8) to (42, 12)
        target t point (58, 15) within 1 m at rest
        plan { step 2 s horizon 20 minimize time + 0.1 fuel clusters 2 ordered }
        """);
  }

  /** Labels every zone, with clusters numbered as the ORDERED rule wants (by each group's lowest zone). */
  static void assertOrderedLabels(ClusterLayout cl, int[] label) {
    int groups = IntStream.of(label).max().orElse(-1) + 1;
    assertTrue(groups <= cl.count(), () -> groups + " groups for " + cl.count() + " clusters");
    int lowestBefore = -1;
    for (int l = 0; l < groups; l++) {
      int cluster = l;
      int lowest = IntStream.range(0, label.length).filter(o -> label[o] == cluster).min().orElse(-1);
      assertTrue(lowest > lowestBefore, () -> "cluster " + cluster + " is empty or out of order");
      lowestBefore = lowest;
    }
  }

  /**
   * The rock field's first grouping leaves a corridor: with the assignment and boxes fixed as it
   * says, SCIP finds a plan that the whole model and the verifier accept, within 5 % of SCIP's
   * optimum of the model with the clusters free (measured 43.68 against 43.39).
   */
  @Test
  void theRockFieldsFirstGroupingLeavesACorridor() {
    Scenario s = ExampleScenarios.full("rock_field");
    Lowering.Lowered lw = Lowering.lowerWithLayout(s);
    Milp m = lw.milp();
    ClusterLayout cl = lw.layout().clusters();
    List<int[]> groupings = ClusterStarts.groupings(cl, s.vehicle().start(), s.target().region().bounds().center());
    assertFalse(groupings.isEmpty());
    groupings.forEach(label -> assertOrderedLabels(cl, label));
    SolveOptions o = Planner.optionsOf(s.plan()).withTimeLimit(Duration.ofSeconds(60));
    SolveResult free = backend("scip", m).solve(m, o);
    SolveResult grouped = backend("scip", m).solve(ClusterStarts.fixed(m, cl, groupings.get(0)), o);
    assertTrue(free.status().hasSolution() && grouped.status().hasSolution(), grouped::summary);
    assertTrue(m.maxViolation(grouped.values()) <= WarmStarts.TOLERANCE);
    assertTrue(Verifier.verify(s, PlanExtractor.trajectory(s, m, grouped.values())).ok());
    assertTrue(grouped.objective() >= free.bestBound() - 1e-6, () -> grouped.summary() + " vs " + free.summary());
    assertTrue(grouped.objective() <= 1.05 * free.objective(), () -> grouped.summary() + " vs " + free.summary());
  }

  /**
   * ojAlgo alone finds a start for the full rock field (40 rocks, 3 clusters): the model and the
   * verifier accept it, it is no better than SCIP's proven bound and within 5 % of SCIP's optimum
   * (measured: 43.68 in 7 s, against 43.39). Without the grouping, the scan found no point in 45 s
   * (BENCHMARKS.md).
   */
  @Test
  void ojAlgoFindsAStartForTheFullRockField() {
    Scenario s = ExampleScenarios.full("rock_field");
    Lowering.Lowered lw = Lowering.lowerWithLayout(s);
    Milp m = lw.milp();
    assertTrue(ClusterStarts.applies(s, lw.layout().clusters(), m));
    SolveOptions o = Planner.optionsOf(s.plan());
    WarmStarts.Start start = ClusterStarts.find(s, lw.layout().clusters(), m, ArrivalScanTest.OJALGO, o, BUDGET);
    assertTrue(start.found(), start::reason);
    assertTrue(m.maxViolation(start.values()) <= WarmStarts.TOLERANCE);
    assertTrue(Verifier.verify(s, PlanExtractor.trajectory(s, m, start.values())).ok());
    SolveResult scip = backend("scip", m).solve(m, o.withTimeLimit(Duration.ofSeconds(60)));
    assertTrue(start.objective() >= scip.bestBound() - 1e-6, () -> start.objective() + " vs " + scip.summary());
    assertTrue(start.objective() <= 1.05 * scip.objective(), () -> start.objective() + " vs " + scip.summary());
  }

  /**
   * Worked by hand: the line from the start to the target is y = 15, r1 and r3 lie below it and r2
   * above. The straight corridor y ∈ (12.5, 17.5) (the rocks inflated by the radius) fits between
   * one box round r1 and r3 and one round r2, so that grouping comes first, numbered by each
   * group's lowest zone: r1 and r3 in cluster 0, r2 in cluster 1. ojAlgo finds a start with it that
   * the whole model and the verifier accept.
   */
  @Test
  void theGroupingWithAStraightCorridorComesFirst() {
    Scenario s = threeRocks();
    Lowering.Lowered lw = Lowering.lowerWithLayout(s);
    Milp m = lw.milp();
    ClusterLayout cl = lw.layout().clusters();
    List<int[]> groupings = ClusterStarts.groupings(cl, s.vehicle().start(), s.target().region().bounds().center());
    groupings.forEach(label -> assertOrderedLabels(cl, label));
    assertEquals(List.of("r1", "r2", "r3"), cl.zoneNames());
    assertArrayEquals(new int[] {0, 1, 0}, groupings.get(0));
    WarmStarts.Start start = ClusterStarts.find(s, cl, m, ArrivalScanTest.OJALGO, Planner.optionsOf(s.plan()), BUDGET);
    assertTrue(start.found(), start::reason);
    assertTrue(m.maxViolation(start.values()) <= WarmStarts.TOLERANCE);
    assertTrue(Verifier.verify(s, PlanExtractor.trajectory(s, m, start.values())).ok());
  }

  /** The planner takes this way for ojAlgo on a clustered model, says so, and its plan is verified. */
  @Test
  void thePlannerGroupsTheZonesFirstForOjAlgo() {
    Scenario s = threeRocks();
    SolveOptions o = Planner.optionsOf(s.plan()).withTimeLimit(Duration.ofSeconds(60));
    PlanResult r = Planner.standard().plan(s, "ojalgo", o, SolveMonitor.NONE);
    assertTrue(r.solve().status().hasSolution(), r.solve()::summary);
    assertTrue(r.verified(), () -> String.valueOf(r.verify()));
    assertTrue(r.solve().warnings().stream().anyMatch(w -> w.contains("grouped into clusters first")),
        r.solve().warnings()::toString);
  }

  /** {@code n} small rocks, seeded, between a start at the west edge and a target at the east. */
  static Scenario manyRocks(int n) {
    Random random = new Random(7);
    StringBuilder text = new StringBuilder("""
        vehicle v { start (1, 50) at rest speed max 5 m/s accel max 2 m/s^2 radius 0.2 m }
        area a box (0, 0) to (1000, 100)
        """);
    for (int i = 0; i < n; i++) {
      double x = 10 + random.nextDouble() * 980;
      double y = random.nextDouble() * 98;
      text.append(String.format(Locale.ROOT, "zone z%d box (%.2f, %.2f) to (%.2f, %.2f)%n", i, x, y,
          x + 0.5, y + 0.5));
    }
    text.append("target t point (999, 50) within 1 m at rest\n");
    text.append("plan { step 2 s horizon 120 minimize time clusters 3 ordered }\n");
    return ExampleScenarios.parse("many_rocks", text.toString());
  }

  /**
   * Large models: with more corridor offsets than {@link ClusterStarts#MAX_CUTS} the groupings still
   * come out numbered as the rule wants; past {@link ClusterStarts#MAX_ZONES} zones there are none
   * (the plain scan runs), so the grouping never eats the scan's budget.
   */
  @Test
  void largeModelsAreGroupedWithinBoundsOrNotAtAll() {
    Scenario some = manyRocks(200);
    ClusterLayout cl = FormulationLayout.of(some).clusters();
    Vec2 target = some.target().region().bounds().center();
    List<int[]> groupings = ClusterStarts.groupings(cl, some.vehicle().start(), target);
    assertFalse(groupings.isEmpty());
    groupings.forEach(label -> assertOrderedLabels(cl, label));
    Scenario many = manyRocks(ClusterStarts.MAX_ZONES + 1);
    ClusterLayout big = FormulationLayout.of(many).clusters();
    assertTrue(ClusterStarts.groupings(big, many.vehicle().start(), target).isEmpty());
  }
}
