package dev.skerry.compiler.verify;

import static dev.skerry.compiler.verify.FleetScenarios.SEPARATION;
import static dev.skerry.compiler.verify.FleetScenarios.fleet;
import static dev.skerry.compiler.verify.FleetScenarios.legs;
import static dev.skerry.compiler.verify.FleetScenarios.p;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class FleetVerifierTest {
  /** gull east along y = 40 and tern north along x = 8 at 4 m/s, Δt = 4 s: both reach (8, 40) at t = 2 s. */
  static Trajectory gull(double dx) {
    return legs("gull", "north_pad", 4, p(dx, 40), p(dx + 16, 40), p(dx + 32, 40));
  }

  static Trajectory tern(double dx) {
    return legs("tern", "east_pad", 4, p(8 + dx, 32), p(8 + dx, 48), p(8 + dx, 64));
  }

  static List<Violation> of(VerifyReport r, Violation.Kind kind) {
    return r.violations().stream().filter(v -> v.kind() == kind).toList();
  }

  @Test
  void arcsThatCrossBetweenFarApartSamplesBreakTheSeparation() {
    Trajectory a = gull(0);
    Trajectory b = tern(0);
    for (int k = 0; k < 3; k++) {
      assertTrue(a.samples().get(k).position().distanceTo(b.samples().get(k).position()) > 2 * SEPARATION,
          "every pair of samples is far apart");
    }
    VerifyReport r = Verifier.verify(fleet(2), List.of(a, b));
    List<Violation> sep = of(r, Violation.Kind.SEPARATION);
    assertEquals(1, sep.size(), r.toString());
    assertEquals(0, sep.get(0).step());
    assertEquals("gull,tern", sep.get(0).entity());
    // They meet exactly at τ = 2 s: the whole separation is missing.
    assertEquals(SEPARATION, sep.get(0).amount(), 1e-9);
    assertTrue(sep.get(0).message().contains("`gull`") && sep.get(0).message().contains("`tern`"));
    assertEquals(-SEPARATION, r.minSeparation(), 1e-9);
  }

  @Test
  void theSamePairShiftedApartKeepsItsSeparation() {
    VerifyReport r = Verifier.verify(fleet(2), List.of(gull(0), tern(40)));
    assertTrue(of(r, Violation.Kind.SEPARATION).isEmpty(), r.toString());
    // Closest approach: tern at x = 48 and gull at x = 32 at the end of the plan, 24 m apart in y;
    // over the first step gull (4t, 40) and tern (48, 32 + 4t) are least apart at t = 4 s: (16, −8).
    assertTrue(r.hasPairs());
    assertTrue(r.minSeparation() > 0, "margin " + r.minSeparation());
  }

  @Test
  void aVehicleThatHasArrivedNoLongerCounts() {
    // gull arrives at (16, 40) at step 1 and is then parked there; tern reaches that point at step 3.
    List<Sample> gs = new ArrayList<>();
    gs.add(new Sample(0, 0, new Vec2(8, 40), new Vec2(4, 0), Vec2.ZERO));
    for (int k = 1; k <= 3; k++) {
      gs.add(new Sample(k, 2.0 * k, new Vec2(16, 40), Vec2.ZERO, Vec2.ZERO));
    }
    Trajectory parked = new Trajectory("gull", 2, gs, 1, "north_pad");
    Trajectory tern = legs("tern", "east_pad", 2, p(16, 28), p(16, 32), p(16, 36), p(16, 40));
    Scenario s = fleet(2);
    assertTrue(of(Verifier.verify(s, List.of(parked, tern)), Violation.Kind.SEPARATION).isEmpty());
    // Had gull still been flying (arrival at step 3) the two would meet.
    Trajectory hovering = new Trajectory("gull", 2, gs, 3, "north_pad");
    List<Violation> sep = of(Verifier.verify(s, List.of(hovering, tern)), Violation.Kind.SEPARATION);
    assertFalse(sep.isEmpty());
    assertEquals(SEPARATION, sep.get(sep.size() - 1).amount(), 1e-9);
  }

  @Test
  void separationIsAtLeastTheRadiiSummed() {
    Scenario s = fleet(2);
    assertEquals(SEPARATION, s.separation(s.vehicles().get(0), s.vehicles().get(1)));
    Scenario loose = s.withPlan(s.plan().withSeparation(0));
    assertEquals(2, loose.separation(loose.vehicles().get(0), loose.vehicles().get(1)));
    // Samples 3 m apart all the way: too close for 5 m, enough for the radii's 2 m.
    Trajectory a = legs("gull", "north_pad", 1, p(0, 0), p(2, 0));
    Trajectory b = legs("tern", "east_pad", 1, p(0, 3), p(2, 3));
    assertEquals(2, of(Verifier.verify(s, List.of(a, b)), Violation.Kind.SEPARATION).get(0).amount(), 1e-9);
    assertTrue(of(Verifier.verify(loose, List.of(a, b)), Violation.Kind.SEPARATION).isEmpty());
  }

  @Test
  void eachVehicleIsCheckedAgainstItsOwnTargetAndAWaypointByAnyVehicle() {
    Scenario s = FleetScenarios.withWaypoint(fleet(2), new Waypoint("buoy", new Vec2(8, 48), 1, null));
    // gull ends in north_pad as it names; tern names east_pad but stops short of it.
    Trajectory a = legs("gull", "north_pad", 4, p(64, 80), p(80, 80));
    Trajectory b = legs("tern", "east_pad", 4, p(8, 32), p(8, 48), p(8, 64));
    VerifyReport r = Verifier.verify(s, List.of(a, b));
    List<Violation> target = of(r, Violation.Kind.TARGET);
    assertEquals(1, target.size(), r.toString());
    assertEquals("east_pad", target.get(0).entity());
    assertTrue(target.get(0).message().startsWith("vehicle `tern`: "), target.get(0).message());
    assertTrue(of(r, Violation.Kind.WAYPOINT).isEmpty(), "tern passes the buoy at step 1");
    // Both vehicles in the same unnamed target: each target takes one vehicle.
    Trajectory c = legs("tern", "north_pad", 4, p(80, 64), p(80, 80));
    assertTrue(of(Verifier.verify(s, List.of(a, c)), Violation.Kind.TARGET).stream()
        .anyMatch(v -> v.message().contains("both end in target `north_pad`")));
  }
}
