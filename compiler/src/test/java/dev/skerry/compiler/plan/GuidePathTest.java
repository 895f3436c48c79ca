package dev.skerry.compiler.plan;

import static dev.skerry.compiler.analysis.TestScenarios.box;
import static dev.skerry.compiler.analysis.TestScenarios.plan;
import static dev.skerry.compiler.analysis.TestScenarios.scenario;
import static dev.skerry.compiler.analysis.TestScenarios.target;
import static dev.skerry.compiler.analysis.TestScenarios.vehicle;
import static dev.skerry.compiler.analysis.TestScenarios.zone;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The shortest path round the zones and its speed profile, against hand-worked values. */
class GuidePathTest {
  /**
   * A 2 m × 8 m box across the line from (0, 0) to (10, 0), reaching 6 m above it and 1 m below:
   * the shortest way round passes under it, bending at its two lower corners (4, −1) and (6, −1):
   * √17 + 2 + √17 = 10.2462 m (worked by hand; the corners are pushed out by the clearance only).
   */
  @Test
  void theGuideBendsAtTheNearCornersOfAZoneInTheWay() {
    Scenario s = scenario(vehicle(new Vec2(0, 0), 2, 1, 0, 8), box(-5, -5, 15, 10),
        List.of(zone("block", box(4, -1, 6, 5))), target(box(9.999, -0.001, 10.001, 0.001), true), List.of(),
        plan(1.0, 30, 1, 0));
    GuidePath g = GuidePath.of(s, Lowering.lower(s)).orElseThrow();
    List<Vec2> p = g.points();
    assertEquals(4, p.size(), p::toString);
    assertEquals(2 * Math.sqrt(17) + 2, length(p), 1e-2, p::toString);
    assertTrue(p.get(1).distanceTo(new Vec2(4, -1)) < 2 * GuidePath.CLEARANCE, p::toString);
    assertTrue(p.get(2).distanceTo(new Vec2(6, -1)) < 2 * GuidePath.CLEARANCE, p::toString);
    for (int i = 1; i < p.size(); i++) {
      assertFalse(GuidePath.crossesInterior(p.get(i - 1), p.get(i), box(4, -1, 6, 5)), p::toString);
    }
  }

  /** A waypoint off the line draws the guide through its box, at the nearer side. */
  @Test
  void theGuidePassesTheWaypointsBox() {
    Waypoint w = new Waypoint("buoy", new Vec2(5, 4), 1, null);
    Scenario s = scenario(vehicle(new Vec2(0, 0), 2, 1, 0, 8), box(-5, -5, 15, 10), List.of(),
        target(box(9.9, -0.1, 10.1, 0.1), true), List.of(w), plan(1.0, 30, 1, 0));
    List<Vec2> p = GuidePath.of(s, Lowering.lower(s)).orElseThrow().points();
    assertTrue(p.stream().anyMatch(q -> w.region().contains(q)), p::toString);
    assertTrue(p.stream().allMatch(q -> q.y() <= 3.5), () -> "the guide should touch the box's near side: " + p);
  }

  /**
   * The profile against the closed forms of the double integrator's minimum time from rest to rest
   * over a distance L with |a| ≤ A (bang-bang: T = 2√(L/A)), and with |v| ≤ V once the speed limit
   * binds (T = L/V + V/A) (textbook results of optimal control, e.g. Kirk, Optimal Control Theory,
   * ch. 5; from memory).
   */
  @Test
  void theProfileIsTheBangBangMinimumTime() {
    GuidePath.Profile free = GuidePath.Profile.fastest(8, 0, 0, 100, 2);
    assertEquals(2 * Math.sqrt(8 / 2.0), free.duration(), 1e-9);
    assertEquals(8, free.distance(free.duration()), 1e-9);
    assertEquals(4, free.distance(free.duration() / 2), 1e-9);
    GuidePath.Profile capped = GuidePath.Profile.fastest(30, 0, 0, 3, 1);
    assertEquals(30 / 3.0 + 3 / 1.0, capped.duration(), 1e-9);
    assertEquals(30, capped.distance(capped.duration()), 1e-9);
    assertEquals(capped.duration() / 2, capped.timeAt(15), 1e-9);
  }

  /**
   * The guide is a start, not a bound, but on a clear case it comes near the optimum: with the
   * arrival fixed at the guide's fastest step (rounded up) and every slot's face taken from the
   * guide, SCIP finds the plan (a plain LP), and that step is at most one above SCIP's optimal
   * arrival of the whole model.
   */
  @Test
  void theGuidesSidesFitNearTheOptimalArrival() {
    Scenario s = scenario(vehicle(new Vec2(0, 0), 2, 1, 0.2, 16), box(-5, -5, 15, 10),
        List.of(zone("block", box(4, -1, 6, 5))), target(box(9.5, -0.5, 10.5, 0.5), true), List.of(),
        plan(1.0, 20, 1, 0));
    Milp m = Lowering.lower(s);
    SolveResult whole = new OrToolsBackend(Engine.SCIP).solve(m, SolveOptions.defaults().withTimeLimit(
        Duration.ofSeconds(60)));
    assertEquals(SolveStatus.OPTIMAL, whole.status(), whole::summary);
    GuidePath g = GuidePath.of(s, m).orElseThrow();
    int optimal = (int) Math.round(whole.objective());
    assertTrue(g.fastestStep() <= optimal + 1 && g.fastestStep() >= optimal - 2,
        () -> "guide " + g.fastestStep() + ", optimum " + optimal);
    WarmStarts.Start start = ArrivalScan.find(s, m, new OrToolsBackend(Engine.SCIP), SolveOptions.defaults(),
        Duration.ofSeconds(30));
    assertTrue(start.found(), start::reason);
    assertTrue(start.objective() <= optimal + 1 + 1e-9, () -> start.objective() + " vs " + optimal);
  }

  /** Past its corner budget there is no guide (the scan runs unguided), rather than a slow one. */
  @Test
  void manyZonesGiveNoGuide() {
    List<dev.skerry.compiler.model.Zone> rocks = new java.util.ArrayList<>();
    for (int i = 0; i < 160; i++) {
      double x = 10 + (i % 16) * 5;
      double y = 10 + (i / 16) * 5;
      rocks.add(zone("rock" + i, box(x, y, x + 1, y + 1)));
    }
    Scenario s = scenario(vehicle(new Vec2(1, 1), 2, 1, 0.2, 8), box(0, 0, 100, 70), rocks,
        target(box(95, 65, 96, 66), true), List.of(), plan(1.0, 10, 1, 0));
    assertTrue(160 * 4 > GuidePath.MAX_CORNERS);
    assertTrue(GuidePath.of(s, Lowering.lower(s)).isEmpty());
  }

  private static double length(List<Vec2> p) {
    double sum = 0;
    for (int i = 1; i < p.size(); i++) {
      sum += p.get(i).distanceTo(p.get(i - 1));
    }
    return sum;
  }

  /**
   * In a fleet a waypoint is the guided vehicle's to pass only when no other vehicle may: in the
   * first round (one vehicle planned) the guide passes the buoy; in the whole fleet's model, where
   * the other craft's visit binaries are free, it leaves the buoy to the MILP.
   */
  @Test
  void inAFleetTheGuidePassesOnlyTheWaypointsLeftToItsVehicle() {
    Waypoint w = new Waypoint("buoy", new Vec2(5, 4), 1, null);
    Scenario one = scenario(vehicle(new Vec2(0, 0), 2, 1, 0, 8), box(-5, -5, 15, 10), List.of(),
        target(box(9.9, -0.1, 10.1, 0.1), true), List.of(w), plan(1.0, 30, 1, 0));
    dev.skerry.compiler.model.Vehicle skiff = one.vehicle().withTarget("berth");
    dev.skerry.compiler.model.Vehicle tug = one.vehicle().withName("tug").withStart(new Vec2(0, 8), Vec2.ZERO, 0, 0)
        .withTarget("quay");
    Scenario fleet = one.withVehiclesAndTargets(List.of(skiff, tug), List.of(one.target(),
        new dev.skerry.compiler.model.Target("quay", box(9.9, 7.9, 10.1, 8.1), true, null)));
    Milp first = FleetStarts.round(fleet, 1, null, null, java.util.Set.of(), true);
    assertTrue(GuidePath.of(FleetStarts.withVehicles(fleet, List.of(skiff)), first).orElseThrow().passes("buoy"));
    Milp whole = Lowering.lower(fleet);
    List<dev.skerry.compiler.milp.Variable> vars = new java.util.ArrayList<>();
    for (dev.skerry.compiler.milp.Variable v : whole.variables()) {
      boolean tugArrives = v.origin().role().equals("arrive") && v.origin().owner().equals("tug");
      vars.add(tugArrives ? new dev.skerry.compiler.milp.Variable(v.index(), v.name(), v.type(), 0, 0, v.origin()) : v);
    }
    Milp skiffFree = new Milp(whole.name(), vars, whole.rows(), whole.objective());
    GuidePath g = GuidePath.of(fleet, skiffFree).orElseThrow();
    assertEquals("skiff", g.owner());
    assertFalse(g.passes("buoy"));
  }

  /**
   * A round with one vehicle names none in its columns, so its guide must be read against the
   * round's own scenario: the reverse order's first round (the fleet's second skiff alone) is guided
   * from that skiff's start, and the whole fleet's scenario, where the lone columns could be either
   * skiff's, gives no guide rather than the first skiff's (which once guided that round from the
   * other skiff's start).
   */
  @Test
  void aLoneLaterVehicleIsGuidedFromItsOwnStart() {
    Scenario s = ExampleScenarios.tiny("twin_skiffs");
    dev.skerry.compiler.model.Vehicle second = s.vehicles().get(1);
    Milp alone = FleetStarts.round(s, List.of(second), null, null, java.util.Set.of(), true);
    GuidePath g = GuidePath.of(FleetStarts.withVehicles(s, List.of(second)), alone).orElseThrow();
    assertEquals(0, g.position(0).distanceTo(second.start()), 1e-9);
    assertTrue(second.start().distanceTo(s.vehicles().get(0).start()) > 1, "the skiffs start apart");
    assertTrue(GuidePath.of(s, alone).isEmpty());
  }
}
