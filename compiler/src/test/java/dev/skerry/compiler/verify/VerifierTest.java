package dev.skerry.compiler.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class VerifierTest {
  /** A 10 m square zone at (20..30, 20..30); the vehicle has radius 1 m, limits 5 m/s and 2 m/s². */
  static Scenario scenario() {
    Path root = Path.of(".").toAbsolutePath();
    return ScenarioChecker.check(SourceFile.of(root.resolve("v.skerry"), """
        vehicle v { start (0, 0) at rest speed max 5 m/s accel max 2 m/s^2 radius 1 m }
        area a box (-10, -10) to (60, 60)
        zone block box (20, 20) to (30, 30)
        target t point (50, 50) within 1 m
        plan { step 1 s horizon 40 }
        """), new DiskLoader(root)).scenario();
  }

  /** A path at constant velocity through the given waypoints' straight legs, one sample per second. */
  static Trajectory straight(Vec2... points) {
    List<Sample> samples = new ArrayList<>();
    int k = 0;
    for (int i = 0; i < points.length; i++) {
      Vec2 v = i + 1 < points.length ? points[i + 1].minus(points[i]) : Vec2.ZERO;
      samples.add(new Sample(k, k, points[i], v, Vec2.ZERO));
      k++;
    }
    return new Trajectory("v", 1, samples, points.length - 1);
  }

  @Test
  void aPathThatCutsACornerBetweenSamplesIsCaught() {
    // Both samples lie outside the grown zone, but the chord from (18, 27) to (23, 32) crosses the
    // corner at (20, 30).
    Trajectory path = straight(new Vec2(14, 23), new Vec2(18, 27), new Vec2(23, 32), new Vec2(27, 36));
    VerifyReport r = Verifier.verify(scenario(), path);
    assertTrue(r.violations().stream().anyMatch(x -> x.kind() == Violation.Kind.ZONE && x.step() == 1), r.toString());
  }

  @Test
  void aClearPathPasses() {
    Trajectory path = straight(new Vec2(0, 0), new Vec2(4, 0), new Vec2(8, 0));
    VerifyReport r = Verifier.verify(scenario(), path);
    assertTrue(r.violations().stream().noneMatch(x -> x.kind() == Violation.Kind.ZONE), r.toString());
    // Closest approach: from (8, 0) to the zone's corner (20, 20), less the 1 m radius.
    assertEquals(Math.hypot(12, 20) - 1, r.minClearance(), 1e-6);
  }

  @Test
  void theZeroOrderHoldArcBulgeIsSeenEvenWhenTheChordIsClear() {
    // The chord runs along y = 18.5, 1.5 m below the zone: clear of the 1 m radius. A downward
    // acceleration of 2 m/s² with an upward start velocity of 2 m/s bends the arc up by
    // |u|·Δt²/8 = 1 m at mid-step (y = 19.5), 0.5 m too close.
    double dt = 2;
    Sample s0 = new Sample(0, 0, new Vec2(22, 18.5), new Vec2(1, 2), new Vec2(0, -2));
    Vec2 p1 = Verifier.arcPoint(s0, dt);
    assertEquals(18.5, p1.y(), 1e-12);
    Sample s1 = new Sample(1, dt, p1, new Vec2(1, -2), Vec2.ZERO);
    VerifyReport r = Verifier.verify(scenario(), new Trajectory("v", dt, List.of(s0, s1), 1));
    Violation zone = r.violations().stream().filter(x -> x.kind() == Violation.Kind.ZONE).findFirst().orElseThrow();
    assertEquals(0.5, zone.amount(), 0.01);
  }

  @Test
  void limitsDynamicsAndTargetAreChecked() {
    Trajectory fast = straight(new Vec2(0, 0), new Vec2(7, 0), new Vec2(14, 0));
    VerifyReport r = Verifier.verify(scenario(), fast);
    assertTrue(r.violations().stream().anyMatch(x -> x.kind() == Violation.Kind.SPEED), r.toString());
    assertTrue(r.violations().stream().anyMatch(x -> x.kind() == Violation.Kind.TARGET), r.toString());
    List<Sample> broken = List.of(new Sample(0, 0, Vec2.ZERO, new Vec2(1, 0), Vec2.ZERO),
        new Sample(1, 1, new Vec2(3, 0), new Vec2(1, 0), Vec2.ZERO));
    VerifyReport d = Verifier.verify(scenario(), new Trajectory("v", 1, broken, 1));
    assertTrue(d.violations().stream().anyMatch(x -> x.kind() == Violation.Kind.DYNAMICS), d.toString());
  }
}
