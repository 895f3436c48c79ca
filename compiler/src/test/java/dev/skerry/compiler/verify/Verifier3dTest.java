package dev.skerry.compiler.verify;

import static dev.skerry.compiler.verify.FleetScenarios.fleet;
import static dev.skerry.compiler.verify.FleetScenarios.legs;
import static dev.skerry.compiler.verify.FleetScenarios.p;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class Verifier3dTest {
  /** The 3-D fleet with gull alone: zone `block` reaches from 0 to 50 m, gull's own limits are 5..110 m. */
  static Scenario solo() {
    Scenario s = fleet(3);
    return s.withVehicles(List.of(s.vehicles().get(0)));
  }

  static List<Violation> of(VerifyReport r, Violation.Kind kind) {
    return r.violations().stream().filter(v -> v.kind() == kind).toList();
  }

  /** Level flight along y = 25 straight over zone `block` at altitude z. */
  static Trajectory over(double z) {
    return legs("gull", "north_pad", 2, p(10, 25, z), p(18, 25, z), p(26, 25, z), p(34, 25, z));
  }

  @Test
  void aPathOverAZoneWithACeilingIsClearAndTheSamePathLoweredIntoItIsNot() {
    VerifyReport high = Verifier.verify(solo(), over(60));
    assertTrue(of(high, Violation.Kind.ZONE).isEmpty(), high.toString());
    // 10 m above the ceiling, less the 1 m radius.
    assertEquals(9, high.minClearance(), 1e-6);
    VerifyReport low = Verifier.verify(solo(), over(50.4));
    List<Violation> zone = of(low, Violation.Kind.ZONE);
    assertFalse(zone.isEmpty(), low.toString());
    assertTrue(zone.stream().allMatch(v -> v.entity().equals("block")));
    // 0.4 m above the ceiling with a 1 m radius: 0.6 m too deep.
    assertEquals(0.6, zone.stream().mapToDouble(Violation::amount).max().orElseThrow(), 1e-6);
  }

  @Test
  void aZoneWithoutAnAltitudeSpanIsAColumnAtEveryAltitude() {
    Trajectory high = legs("gull", "north_pad", 2, p(52, 61, 100), p(60, 61, 100), p(68, 61, 100));
    VerifyReport r = Verifier.verify(solo(), high);
    assertTrue(of(r, Violation.Kind.ZONE).stream().anyMatch(v -> v.entity().equals("mast")), r.toString());
  }

  @Test
  void theVerticalArcBetweenSamplesIsSeen() {
    // Both samples sit 1.8 m above the 50 m ceiling, but with ż = −2 m/s and a_z = +2 m/s² over
    // Δt = 2 s the zero-order-hold arc z(τ) = 51.8 − 2τ + τ² dips to 50.8 m at τ = 1 s: 0.8 m
    // above the ceiling, 0.2 m inside the 1 m radius, where the chord keeps 1.8 m.
    Sample s0 = new Sample(0, 0, new Vec2(22, 25), new Vec2(2, 0), Vec2.ZERO, 51.8, -2, 2);
    Sample s1 = new Sample(1, 2, new Vec2(26, 25), new Vec2(2, 0), Vec2.ZERO, Verifier.arcAltitude(s0, 2), 2, 0);
    assertEquals(51.8, s1.altitude(), 1e-12);
    VerifyReport r = Verifier.verify(solo(), new Trajectory("gull", 2, List.of(s0, s1), 1, "north_pad"));
    Violation zone = of(r, Violation.Kind.ZONE).get(0);
    assertEquals(0.2, zone.amount(), 0.01);
    assertTrue(of(r, Violation.Kind.DYNAMICS).isEmpty(), r.toString());
  }

  @Test
  void altitudeLimitsOfTheVolumeAndOfTheVehicleAreChecked() {
    // gull's own ceiling is 110 m: 112 m is 2 m too high.
    VerifyReport r = Verifier.verify(solo(), legs("gull", "north_pad", 2, p(0, 0, 112), p(0, 0, 112)));
    List<Violation> alt = of(r, Violation.Kind.ALTITUDE);
    assertFalse(alt.isEmpty());
    assertEquals(2, alt.get(0).amount(), 1e-9);
    // tern has no limits of its own: the keep-in ceiling 120 m less its 1 m radius.
    Scenario s = fleet(3);
    Scenario ternOnly = s.withVehicles(List.of(s.vehicles().get(1)));
    VerifyReport t = Verifier.verify(ternOnly, legs("tern", "east_pad", 2, p(0, 0, 119.5), p(0, 0, 119.5)));
    assertEquals(0.5, of(t, Violation.Kind.ALTITUDE).get(0).amount(), 1e-9);
    VerifyReport floor = Verifier.verify(ternOnly, legs("tern", "east_pad", 2, p(0, 0, 0.25), p(0, 0, 0.25)));
    assertEquals(0.75, of(floor, Violation.Kind.ALTITUDE).get(0).amount(), 1e-9);
    assertTrue(of(Verifier.verify(ternOnly, legs("tern", "east_pad", 2, p(0, 0, 60), p(0, 0, 60))),
        Violation.Kind.ALTITUDE).isEmpty());
  }

  @Test
  void climbRateAndVerticalAccelerationLimitsAreChecked() {
    // 8 m in 2 s is 4 m/s, over gull's 3 m/s.
    VerifyReport r = Verifier.verify(solo(), legs("gull", "north_pad", 2, p(0, 0, 60), p(0, 0, 68)));
    List<Violation> climb = of(r, Violation.Kind.CLIMB);
    assertEquals(1, climb.size(), r.toString());
    assertEquals(1, climb.get(0).amount(), 1e-9);
    Sample s0 = new Sample(0, 0, Vec2.ZERO, Vec2.ZERO, Vec2.ZERO, 60, 0, -1.5);
    Sample s1 = new Sample(1, 1, Vec2.ZERO, Vec2.ZERO, Vec2.ZERO, 59.25, -1.5, 0);
    VerifyReport a = Verifier.verify(solo(), new Trajectory("gull", 1, List.of(s0, s1), 1, "north_pad"));
    assertEquals(0.5, of(a, Violation.Kind.CLIMB).get(0).amount(), 1e-9);
    assertTrue(of(a, Violation.Kind.DYNAMICS).isEmpty(), a.toString());
  }

  @Test
  void altitudeFollowsTheZeroOrderHoldOfADoubleIntegrator() {
    // The zero-order-hold discretisation of the double integrator z'' = a (Franklin, Powell &
    // Workman, "Digital Control of Dynamic Systems", 3rd ed., ch. 4: Φ = [1 T; 0 1], Γ = [T²/2; T])
    // gives, from rest under a constant a, z_k = z_0 + ½·a·(kT)² and ż_k = a·kT.
    double a = 0.5;
    double dt = 1.5;
    List<Sample> samples = new ArrayList<>();
    for (int k = 0; k <= 4; k++) {
      double t = k * dt;
      samples.add(new Sample(k, t, Vec2.ZERO, Vec2.ZERO, Vec2.ZERO, 20 + 0.5 * a * t * t, a * t, k < 4 ? a : 0));
    }
    VerifyReport ok = Verifier.verify(solo(), new Trajectory("gull", dt, samples, 4, "north_pad"));
    assertTrue(of(ok, Violation.Kind.DYNAMICS).isEmpty(), ok.toString());
    // An altitude 0.3 m off the closed form breaks the dynamics by 0.3 m.
    List<Sample> bent = new ArrayList<>(samples);
    Sample s2 = samples.get(2);
    bent.set(2, new Sample(2, s2.time(), Vec2.ZERO, Vec2.ZERO, Vec2.ZERO, s2.altitude() + 0.3, s2.climb(), a));
    VerifyReport bad = Verifier.verify(solo(), new Trajectory("gull", dt, bent, 4, "north_pad"));
    assertEquals(0.3, of(bad, Violation.Kind.DYNAMICS).get(0).amount(), 1e-9);
  }

  @Test
  void theTargetsAltitudeBandIsChecked() {
    // north_pad takes arrivals from 0 to 20 m.
    VerifyReport high = Verifier.verify(solo(), legs("gull", "north_pad", 2, p(76, 80, 30), p(80, 80, 30)));
    assertTrue(of(high, Violation.Kind.TARGET).stream().anyMatch(v -> Math.abs(v.amount() - 10) < 1e-9),
        high.toString());
    VerifyReport low = Verifier.verify(solo(), legs("gull", "north_pad", 2, p(76, 80, 15), p(80, 80, 15)));
    assertTrue(of(low, Violation.Kind.TARGET).isEmpty(), low.toString());
  }

  @Test
  void twoVehiclesAtTheSamePlanPositionButFarApartInAltitudeAreSeparated() {
    Trajectory a = legs("gull", "north_pad", 2, p(40, 40, 30), p(44, 40, 30));
    Trajectory b = legs("tern", "east_pad", 2, p(44, 40, 90), p(40, 40, 90));
    VerifyReport r = Verifier.verify(fleet(3), List.of(a, b));
    assertTrue(of(r, Violation.Kind.SEPARATION).isEmpty(), r.toString());
    assertEquals(60 - FleetScenarios.SEPARATION, r.minSeparation(), 1e-9);
    Trajectory c = legs("tern", "east_pad", 2, p(44, 40, 32), p(40, 40, 32));
    List<Violation> sep = of(Verifier.verify(fleet(3), List.of(a, c)), Violation.Kind.SEPARATION);
    assertEquals(FleetScenarios.SEPARATION - 2, sep.get(0).amount(), 1e-9);
  }
}
