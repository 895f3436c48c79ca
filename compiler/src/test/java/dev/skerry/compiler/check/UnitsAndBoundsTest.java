package dev.skerry.compiler.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.units.Dim;
import dev.skerry.compiler.units.Units;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class UnitsAndBoundsTest {
  private static Scenario scenario(String text) {
    Path root = Path.of(".").toAbsolutePath().normalize();
    CheckResult r = ScenarioChecker.check(SourceFile.of(root.resolve("t.skerry"), text), new DiskLoader(root));
    return r.scenario();
  }

  @Test
  void unitFactorsFollowTheirDefinitions() {
    // 1 knot = 1852 m per hour and 1 nmi = 1852 m (international definitions, 1929); 1 ft = 0.3048 m (1959).
    assertEquals(1852.0 / 3600.0, Units.lookup("kn").toSi(), 1e-15);
    assertEquals(1852.0, Units.lookup("nmi").toSi(), 0);
    assertEquals(0.3048, Units.lookup("ft").toSi(), 0);
    assertEquals(1000.0 / 3600.0, Units.lookup("km/h").toSi(), 1e-15);
    assertEquals(Dim.ACCEL, Units.lookup("m/s^2").dim());
    assertEquals(Dim.ACCEL, Units.lookup("ft/s2").dim());
    assertEquals(0.3048, Units.lookup("ft/s^2").toSi(), 1e-15);
    assertNull(Units.lookup("m/furlong"));
    assertNull(Units.lookup("parsec"));
  }

  @Test
  void bareNumbersTakeTheFileDefaultUnits() {
    Scenario s = scenario("""
        units km, min
        const half = 0.5
        vehicle v { start (1, 2) velocity (0.06, 0) speed max 0.12 accel max 3 m/s^2 radius half * 2 m }
        area a box (0, 0) to (10, 10)
        target t point (5, 5) within 100 m at rest
        plan { step 6 s horizon 2 min }
        """);
    assertEquals(1000, s.vehicle().start().x(), 1e-9);
    assertEquals(2000, s.vehicle().start().y(), 1e-9);
    assertEquals(1.0, s.vehicle().startVelocity().x(), 1e-12); // 0.06 km/min = 1 m/s
    assertEquals(2.0, s.vehicle().maxSpeed(), 1e-12);
    assertEquals(1.0, s.vehicle().radius(), 1e-12);
    assertEquals(20, s.plan().horizon()); // 2 min at 6 s per step
    assertEquals(10_000, s.area().bounds().xmax(), 1e-9);
  }

  @Test
  void headingIsACompassBearing() {
    Scenario s = scenario("""
        vehicle v { start (50, 50) moving 2 m/s heading 90 deg speed max 3 m/s accel max 1 m/s^2 }
        area a box (0, 0) to (100, 100)
        target t point (90, 50) within 1 m
        plan { step 1 s horizon 60 minimize time + 0.1 fuel clusters 0 }
        """);
    assertEquals(2.0, s.vehicle().startVelocity().x(), 1e-12);
    assertEquals(0.0, s.vehicle().startVelocity().y(), 1e-12);
    assertEquals(1.0, s.plan().timeWeight(), 0);
    assertEquals(0.1, s.plan().fuelWeight(), 1e-15);
  }

  @Test
  void minimumTimeIsTheBangBangClosedForm() {
    // Rest to rest over d with |a| <= a_max: t = 2*sqrt(d/a_max) while the speed limit is not reached
    // (bang-bang; Kirk, Optimal Control Theory, ch. 5); with the limit reached, d/v + v/a (bang-off-bang).
    assertEquals(2 * Math.sqrt(4 / 1.0), Hints.minimumTime(4, 0, 10, 1, true), 1e-12);
    assertEquals(100 / 2.0 + 2 / 1.0, Hints.minimumTime(100, 0, 2, 1, true), 1e-12);
    // Free final velocity: accelerate all the way, t = sqrt(2d/a).
    assertEquals(Math.sqrt(2 * 8 / 1.0), Hints.minimumTime(8, 0, 10, 1, false), 1e-12);
  }

  @Test
  void theMinimumStepsBoundTheHorizonHint() {
    // d = 100 m, v = 2 m/s, a = 1 m/s^2, rest to rest: 52 s, so 52 steps of 1 s.
    Scenario s = scenario("""
        vehicle v { start (0, 50) at rest speed max 2 m/s accel max 1 m/s^2 }
        area a box (-1, 0) to (200, 100)
        target t box (100, 40) to (110, 60) at rest
        plan { step 1 s horizon 52 }
        """);
    assertEquals(52, Hints.minimumSteps(s));
  }
}
