package dev.skerry.compiler.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.ClusterBox;
import dev.skerry.compiler.plan.Planner;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Clusters are chosen again at every closed-loop iteration, so a zone the vehicle has left behind
 * may join another cluster once the vehicle is out of the box that grouping would make.
 *
 * <p>The scenario is built for it: the start lies inside the box that would hold the west zone
 * with either of the two zones ahead, so at first the only grouping is the two zones ahead together,
 * which closes the gap between them and forces a detour. Once the vehicle has climbed out of the
 * west zone's box with the south zone (or the north one), that grouping opens a gap beside the other
 * zone and the predicted total drops.
 */
class RegroupingTest {
  static final String THREE_ROCKS = """
      vehicle v { start (0, 0) at rest speed max 3 m/s accel max 2 m/s^2 radius 0.5 m }
      area a box (-10, -20) to (36, 20)
      zone west box (-6, -1) to (-4, 1)
      zone south box (14, -12) to (16, -4)
      zone north box (14, 4) to (16, 12)
      target t point (30, 0) within 1 m at rest
      plan { step 1 s horizon 24 minimize time + 0.1 fuel clusters 2 closed_loop max 30 solver scip gap 0.0001 % }
      """;

  @Test
  void regroupingAZonePassedByLowersThePrediction() {
    Scenario s = ClosedLoopTest.scenario(THREE_ROCKS);
    LoopResult r = new ClosedLoop(Planner.standard(), Planner.optionsOf(s.plan()), 0, 1).run(s, "scip", it -> { });
    assertEquals(LoopResult.Stop.ARRIVED, r.stop());
    assertTrue(r.verify().ok(), r.verify().violations().toString());
    Iteration first = r.iterations().get(0);
    // At first the two zones ahead share a cluster; the west zone is alone.
    assertTrue(together(first.clusters(), "south", "north"), first.clusters().toString());
    double lowest = r.iterations().stream().mapToDouble(Iteration::predictedTotal).min().orElseThrow();
    // A drop of more than one step of time (1 s): a shorter route, not solver noise.
    assertTrue(lowest < first.predictedTotal() - 1, "predictions " + r.iterations().stream()
        .map(Iteration::predictedTotal).toList());
    Iteration regrouped = r.iterations().stream().filter(it -> it.predictedTotal() < first.predictedTotal() - 1)
        .findFirst().orElseThrow();
    assertTrue(together(regrouped.clusters(), "west", "south") || together(regrouped.clusters(), "west", "north"),
        "iteration " + regrouped.index() + ": " + regrouped.clusters());
    assertNotEquals(first.clusters(), regrouped.clusters());
    // Without clusters the direct route is open from the start: the first prediction is lower.
    Scenario unclustered = s.withPlan(s.plan().withClusters(0, s.plan().symmetry()));
    double direct = new ClosedLoop(Planner.standard(), Planner.optionsOf(s.plan()), 0, 1)
        .run(unclustered.withPlan(unclustered.plan().withClosedLoopMax(1)), "scip", it -> { })
        .iterations().get(0).predictedTotal();
    assertTrue(direct < first.predictedTotal() - 1, "direct " + direct + " vs clustered " + first.predictedTotal());
  }

  private static boolean together(List<ClusterBox> clusters, String a, String b) {
    return clusters.stream().anyMatch(c -> c.zones().contains(a) && c.zones().contains(b));
  }
}
