package dev.skerry.compiler.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Zone;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The words for fleets and 3-D scenarios: the model they give, and what the checker refuses. */
class FleetAndAltitudeTest {
  private static CheckResult check(String text) {
    Path root = Path.of(".").toAbsolutePath().normalize();
    return ScenarioChecker.check(SourceFile.of(root.resolve("t.skerry"), text), new DiskLoader(root));
  }

  private static List<String> codes(CheckResult r) {
    return r.diagnostics().stream().map(d -> d.code().id()).toList();
  }

  private static Scenario clean(String text) {
    CheckResult r = check(text);
    assertEquals(List.of(), r.diagnostics().stream().map(Diagnostic::format).toList());
    assertNotNull(r.scenario());
    return r.scenario();
  }

  private static final String THREE_D = """
      vehicle d {
        start (10, 10, 5) velocity (1, 0, 0.5)
        speed max 6 m/s
        accel max 2 m/s^2
        climb max 2 m/s
        altitude 2 m to 50 m
        radius 1 m
      }
      area air box (0, 0, 0) to (100, 100, 60)
      zone hill polygon (40, 0) (60, 0) (60, 100) (40, 100) altitude 0 m to 30 m
      zone mast box (20, 60, 0) to (24, 64, 45)
      zone column box (70, 70) to (75, 75)
      target pad point (90, 50, 3) within 2 m at rest
      waypoint high (50, 50, 40) within 4 m
      waypoint flat (30, 30) within 4 m
      plan {
        step 1 s
        horizon 40
        dimensions 3
      }
      """;

  private static final String PAD = "target pad point (90, 50, 3) within 2 m at rest";
  private static final String ROOF = "target roof box (80, 10) to (90, 20) altitude 10 m to 20 m";

  @Test
  void aThreeDimensionalScenarioCarriesItsAltitudes() {
    Scenario s = clean(THREE_D);
    assertEquals(3, s.dimensions());
    Vehicle d = s.vehicle();
    assertEquals(new Vehicle.Vertical(5, 0.5, 2, 2, new Span(2, 50)), d.vertical());
    assertEquals(new Span(0, 60), s.area().altitude());
    Zone hill = s.zones().get(0);
    assertTrue(hill.shape() instanceof Shape.Polygon);
    assertEquals(new Span(0, 30), hill.altitude());
    assertEquals(new Span(0, 45), s.zones().get(1).altitude());
    assertNull(s.zones().get(2).altitude(), "a zone with no range is a column");
    assertEquals(new Span(1, 5), s.target("pad").altitude());
    assertEquals(88, s.target("pad").region().bounds().xmin(), 1e-12);
    Scenario roof = clean(THREE_D.replace("target pad point (90, 50, 3) within 2 m at rest", ROOF));
    assertEquals(new Span(10, 20), roof.target().altitude());
    assertEquals(new Span(36, 44), s.waypoints().get(0).altitude());
    assertNull(s.waypoints().get(1).altitude());
  }

  @Test
  void climbAccelerationDefaultsToThePlanViewLimit() {
    Scenario s = clean(THREE_D.replace("climb max 2 m/s", "climb max 2 m/s\n  climb accel max 0.5 m/s^2"));
    assertEquals(0.5, s.vehicle().vertical().maxClimbAccel(), 1e-12);
  }

  @Test
  void aPlanViewScenarioIsUnchanged() {
    Scenario s = clean("""
        vehicle v { start (5, 5) speed max 2 m/s accel max 1 m/s^2 }
        area a box (0, 0) to (100, 100)
        target t box (80, 80) to (90, 90)
        plan { step 1 s horizon 60 }
        """);
    assertEquals(2, s.dimensions());
    assertNull(s.vehicle().vertical());
    assertNull(s.vehicle().target());
    assertNull(s.area().altitude());
    assertEquals(0, s.plan().separation());
    assertFalse(s.plan().latestArrival());
  }

  private static final String FLEET = """
      vehicle a { start (5, 5) speed max 2 m/s accel max 1 m/s^2 radius 1 m target t2 }
      vehicle b { start (5, 50) speed max 2 m/s accel max 1 m/s^2 radius 1 m }
      vehicle c { start (5, 95) speed max 2 m/s accel max 1 m/s^2 radius 1 m }
      area sea box (0, 0) to (100, 100)
      target t1 box (80, 80) to (90, 90)
      target t2 box (80, 10) to (90, 20)
      target t3 box (80, 45) to (90, 55)
      plan { step 1 s horizon 60 minimize latest time + 0.1 fuel separation 4 m }
      """;

  @Test
  void aFleetSharesTheTargetsNoVehicleNames() {
    Scenario s = clean(FLEET);
    assertEquals(3, s.vehicles().size());
    assertEquals("t2", s.vehicles().get(0).target());
    assertEquals(List.of("t2"), s.candidateTargets(s.vehicles().get(0)).stream().map(t -> t.name()).toList());
    assertEquals(List.of("t1", "t3"), s.candidateTargets(s.vehicles().get(1)).stream().map(t -> t.name()).toList());
    assertEquals(4, s.plan().separation(), 1e-12);
    assertTrue(s.plan().latestArrival());
    assertEquals(1, s.plan().timeWeight(), 1e-12);
    assertEquals(0.1, s.plan().fuelWeight(), 1e-12);
  }

  @Test
  void targetsMustGoRound() {
    assertEquals(List.of("target-conflict"), codes(check(FLEET.replace("target t3 box (80, 45) to (90, 55)", ""))));
    assertEquals(List.of("target-conflict"), codes(check(FLEET.replace("radius 1 m }\nvehicle c", "radius 1 m target t2 }\nvehicle c"))));
    assertEquals(List.of("unknown-name"), codes(check(FLEET.replace("target t2 }", "target t9 }"))));
    assertEquals(List.of("unknown-name"), codes(check(FLEET.replace("target t2 }", "target sea }"))));
    String allNamed = FLEET.replace("radius 1 m }\nvehicle c", "radius 1 m target t1 }\nvehicle c")
        .replace("(5, 95) speed max 2 m/s accel max 1 m/s^2 radius 1 m }", "(5, 95) speed max 2 m/s accel max 1 m/s^2 radius 1 m target t3 }")
        .replace("plan {", "target t4 box (80, 60) to (90, 70)\nplan {");
    CheckResult r = check(allNamed);
    assertEquals(List.of("target-unused"), codes(r));
    assertNotNull(r.scenario(), "an unused target is only a warning");
  }

  @Test
  void objectiveAndSeparationAreChecked() {
    assertEquals(List.of("unknown-option"), codes(check(FLEET.replace("0.1 fuel", "0.1 latest fuel"))));
    assertEquals(List.of("duplicate-property"), codes(check(FLEET.replace("latest time +", "latest time + time +"))));
    assertEquals(List.of("value-out-of-range"), codes(check(FLEET.replace("separation 4 m", "separation -1 m"))));
    assertEquals(List.of("unit-mismatch"), codes(check(FLEET.replace("separation 4 m", "separation 4 s"))));
    String one = """
        vehicle v { start (5, 5) speed max 2 m/s accel max 1 m/s^2 }
        area a box (0, 0) to (100, 100)
        target t box (80, 80) to (90, 90)
        plan { step 1 s horizon 60 separation 3 m }
        """;
    assertEquals(List.of(Code.NO_EFFECT.id()), codes(check(one)));
  }

  @Test
  void aConstantNamedLatestStillWorksAsAWeight() {
    Scenario s = clean("""
        const latest = 2
        vehicle v { start (5, 5) speed max 2 m/s accel max 1 m/s^2 }
        area a box (0, 0) to (100, 100)
        target t box (80, 80) to (90, 90)
        plan { step 1 s horizon 60 minimize latest fuel + time }
        """);
    assertEquals(2, s.plan().fuelWeight(), 1e-12);
    assertFalse(s.plan().latestArrival());
  }

  @Test
  void threeDimensionalWordsAreRefusedInPlanView() {
    String flat = """
        vehicle v { start (5, 5) speed max 2 m/s accel max 1 m/s^2 }
        area a box (0, 0) to (100, 100)
        target t box (80, 80) to (90, 90)
        plan { step 1 s horizon 60 }
        """;
    assertEquals(List.of("dimension-mismatch"), codes(check(flat.replace("accel max 1 m/s^2 }", "accel max 1 m/s^2 altitude 0 m to 9 m }"))));
    assertEquals(List.of("dimension-mismatch"), codes(check(flat.replace("accel max 1 m/s^2 }", "accel max 1 m/s^2 climb accel max 1 m/s^2 }"))));
    assertEquals(List.of("dimension-mismatch"), codes(check(flat.replace("(90, 90)", "(90, 90) altitude 0 m to 9 m"))));
    assertEquals(List.of("wrong-dimension", "wrong-dimension"),
        codes(check(flat.replace("(80, 80) to (90, 90)", "(80, 80, 0) to (90, 90, 9)"))));
    assertEquals(List.of("value-out-of-range"), codes(check(flat.replace("horizon 60", "horizon 60 dimensions 4"))));
  }

  @Test
  void threeDimensionalScenariosNeedTheirAltitudes() {
    assertEquals(List.of("wrong-dimension"), codes(check(THREE_D.replace("start (10, 10, 5)", "start (10, 10)"))));
    assertEquals(List.of("missing-property"), codes(check(THREE_D.replace("climb max 2 m/s", ""))));
    assertEquals(List.of("missing-altitude"), codes(check(THREE_D.replace("box (0, 0, 0) to (100, 100, 60)", "box (0, 0) to (100, 100)"))));
    assertEquals(List.of("dimension-mismatch"), codes(check(THREE_D.replace("(24, 64, 45)", "(24, 64, 45) altitude 0 m to 9 m"))));
    assertEquals(List.of("wrong-dimension"), codes(check(THREE_D.replace("(24, 64, 45)", "(24, 64)"))));
    assertEquals(List.of("degenerate-shape"), codes(check(THREE_D.replace("(24, 64, 45)", "(24, 64, 0)"))));
    assertEquals(List.of("value-out-of-range"), codes(check(THREE_D.replace("altitude 0 m to 30 m", "altitude 30 m to 0 m"))));
    assertEquals(List.of("value-out-of-range"), codes(check(THREE_D.replace("climb max 2 m/s", "climb max 0 m/s"))));
    assertEquals(List.of("wrong-dimension"), codes(check(THREE_D.replace("(40, 0) (60, 0)", "(40, 0, 0) (60, 0)"))));
    assertEquals(List.of("start-too-fast"), codes(check(THREE_D.replace("(1, 0, 0.5)", "(1, 0, 3)"))));
  }

  @Test
  void startAndTargetHintsRespectAltitude() {
    // Over the hill (0–30 m) is not inside it; under the cloud of the same plan view is.
    assertEquals(List.of(), codes(check(THREE_D.replace("start (10, 10, 5)", "start (50, 10, 35)"))));
    assertEquals(List.of("start-inside-zone"), codes(check(THREE_D.replace("start (10, 10, 5)", "start (50, 10, 20)"))));
    assertEquals(List.of("start-outside-area"), codes(check(THREE_D.replace("altitude 2 m to 50 m", "altitude 8 m to 50 m"))));
    assertEquals(List.of("start-outside-area"), codes(check(THREE_D.replace("start (10, 10, 5)", "start (10, 10, 59.5)")
        .replace("altitude 2 m to 50 m", ""))));
    assertEquals(List.of("target-inside-zone"), codes(check(THREE_D.replace(PAD,
        "target roof box (45, 10) to (55, 20) altitude 10 m to 20 m"))));
    assertEquals(List.of(), codes(check(THREE_D.replace(PAD, "target roof box (45, 10) to (55, 20) altitude 40 m to 50 m"))));
    assertEquals(List.of("target-outside-area"), codes(check(THREE_D.replace(PAD, ROOF.replace("10 m to 20 m", "70 m to 80 m")))));
    // A single vehicle naming no target may end at either: the plan picks the better one.
    assertEquals(List.of(), codes(check(THREE_D.replace(PAD, PAD + "\n" + ROOF))));
    assertEquals(List.of("unsupported"), codes(check(THREE_D.replace("dimensions 3", "dimensions 3 clusters 1"))));
  }

  @Test
  void theHorizonBoundCountsTheClimb() {
    // 2-D distance to the pad is small, but the climb from 5 m to 40 m at 2 m/s takes over 17 s.
    String high = THREE_D.replace(PAD, "target pad point (12, 10, 40) within 2 m at rest");
    assertEquals(List.of("horizon-too-short"), codes(check(high.replace("horizon 40", "horizon 10"))));
  }

  @Test
  void theNewExamplesGiveTheModelTheirTextDescribes() throws IOException {
    Scenario skiffs = ExamplesTest.check(ExamplesTest.EXAMPLES.resolve("twin_skiffs.skerry")).scenario();
    assertEquals(2, skiffs.vehicles().size());
    assertEquals(2, skiffs.dimensions());
    assertEquals(6, skiffs.plan().separation(), 1e-12);
    assertEquals("station_south", skiffs.vehicles().get(0).target());
    assertNull(skiffs.vehicles().get(1).target());
    assertEquals(List.of(skiffs.target("station_east")), skiffs.candidateTargets(skiffs.vehicles().get(1)));
    Scenario ridge = ExamplesTest.check(ExamplesTest.EXAMPLES.resolve("ridge_drone.skerry")).scenario();
    assertEquals(3, ridge.dimensions());
    assertEquals(new Span(0, 60), ridge.area().altitude());
    assertTrue(ridge.zones().stream().allMatch(Zone::hasAltitude));
    assertTrue(ridge.zones().get(0).shape() instanceof Shape.Polygon);
    assertEquals(new Span(-1, 5), ridge.target().altitude());
    assertEquals(new Vehicle.Vertical(4, 0, 3, 1, new Span(1, 55)), ridge.vehicle().vertical());
  }
}
