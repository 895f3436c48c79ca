package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.model.Area;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Sizes of fleets and 3-D models: the unpruned binary counts against the usual formulas (common
 * practice: one binary per face of each zone and step, 4 per pair of vehicles and step in plan
 * view, 6 in 3-D for a box with an altitude range and for a pair), and the predicted sizes against
 * the lowered model, cause by cause, pruned and unpruned.
 */
class FleetCountsTest {

  /** {@code count} vehicles along the west edge of the harbour, each free to take any dock. */
  static Scenario fleet(int count, boolean threeD, int horizon) {
    Scenario base = TestScenarios.harbour(horizon);
    List<Vehicle> vehicles = new ArrayList<>();
    List<Target> docks = new ArrayList<>();
    for (int i = 0; i < count; i++) {
      Vehicle.Vertical vert = threeD ? new Vehicle.Vertical(3, 0, 1, 0.5, null) : null;
      vehicles.add(new Vehicle("v" + i, Vehicle.Dynamics.DOUBLE_INTEGRATOR, new Vec2(1, 2 + 3 * i), Vec2.ZERO, 3, 1.5,
          0.25, 8, null, vert, null));
      docks.add(new Target("dock" + i, TestScenarios.box(17.5, 1.5 + 3 * i, 18.5, 2.5 + 3 * i), true, null,
          threeD ? new Span(2, 4) : null));
    }
    List<Zone> zones = new ArrayList<>();
    for (Zone z : base.zones()) {
      zones.add(threeD && z.isBox() ? new Zone(z.name(), z.shape(), null, new Span(0, 6)) : z);
    }
    Area area = new Area("harbour", base.area().shape(), null, threeD ? new Span(0, 10) : null);
    return new Scenario("fleet", vehicles, area, zones, docks, base.waypoints(), base.plan().withSeparation(1),
        threeD ? 3 : 2);
  }

  @ParameterizedTest(name = "{0} vehicles, 3-D={1}")
  @CsvSource({"1, false", "2, false", "3, false", "1, true", "2, true", "3, true"})
  void unprunedBinariesFollowTheFormulas(int count, boolean threeD) {
    int n = 10;
    Scenario base = fleet(count, threeD, n);
    Scenario s = base.withPlan(base.plan().withPruning(false));
    Sizes sizes = Analysis.sizes(s);
    // guard on: slots are the N segments; each vehicle avoids each zone at each slot.
    int boxFaces = threeD ? 6 : 4;
    int polygonFaces = 3;
    assertEquals((long) count * boxFaces * n, sizes.zoneBoxBinaries());
    assertEquals((long) count * polygonFaces * n, sizes.zonePolygonBinaries());
    long pairs = (long) count * (count - 1) / 2;
    assertEquals(pairs * (threeD ? 6 : 4) * n, sizes.separationBinaries());
    // one arrival binary per vehicle, dock and step 1..N (any vehicle may take any dock).
    assertEquals((long) count * count * n, sizes.arrivalBinaries());
    assertEquals(Census.of(Lowering.lower(s), s), sizes);
  }

  @ParameterizedTest(name = "{0} vehicles, 3-D={1}, pruning={2}, guard={3}, clusters={4}, latest={5}")
  @CsvSource({
      "2, false, true, true, 0, false",
      "2, false, true, false, 0, true",
      "3, false, true, true, 2, false",
      "2, true, true, true, 0, true",
      "3, true, true, true, 0, false",
      "2, true, false, true, 2, false",
      "3, true, true, false, 3, true"})
  void predictedSizesEqualLoweredSizes(int count, boolean threeD, boolean pruning, boolean guard, int clusters,
      boolean latest) {
    Scenario base = fleet(count, threeD, 12);
    Scenario s = base.withPlan(base.plan().withPruning(pruning).withGuard(guard)
        .withClusters(clusters, SymmetryRule.ORDERED).withLatestArrival(latest));
    Lowering.Lowered lowered = Lowering.lowerWithLayout(s);
    assertEquals(Census.of(lowered.milp(), s), Analysis.sizes(s));
    assertEquals(Census.of(lowered.milp(), s), lowered.layout().sizes());
  }

  /** A polygon zone as a prism: plan faces plus a floor and a ceiling. */
  @ParameterizedTest(name = "horizon {0}")
  @CsvSource({"6", "9"})
  void prismAddsTwoBinariesPerSlot(int n) {
    Scenario base = fleet(1, true, n);
    List<Zone> zones = new ArrayList<>();
    for (Zone z : base.zones()) {
      zones.add(z.shape() instanceof Shape.Polygon ? new Zone(z.name(), z.shape(), null, new Span(1, 5)) : z);
    }
    Scenario s = new Scenario("prism", base.vehicles(), base.area(), zones, base.targets(), List.of(),
        base.plan().withPruning(false), 3);
    assertEquals((3L + 2) * n, Analysis.sizes(s).zonePolygonBinaries());
    assertEquals(Census.of(Lowering.lower(s), s), Analysis.sizes(s));
  }
}
