package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Random scenarios from a seed, for property tests: box or polygon area, 0–5 box or triangle
 * zones (possibly over the start), 0–2 waypoints, random limits, sides, horizon, step, guard,
 * pruning, clusters and symmetry rule.
 */
public final class RandomScenarios {
  private RandomScenarios() {}

  public static Scenario of(long seed) {
    Random r = new Random(seed);
    double w = 10 + r.nextDouble() * 90;
    double h = 10 + r.nextDouble() * 90;
    Shape area = r.nextInt(4) == 0
        ? new Shape.Polygon(List.of(new Vec2(0, 0), new Vec2(w, 0), new Vec2(w, h), new Vec2(w * 0.3, h)))
        : TestScenarios.box(0, 0, w, h);
    Vec2 start = new Vec2(w * (0.3 + 0.6 * r.nextDouble()), h * (0.1 + 0.8 * r.nextDouble()));
    Vec2 startVelocity = r.nextBoolean() ? Vec2.ZERO : new Vec2(r.nextDouble() - 0.5, r.nextDouble() - 0.5);
    Vehicle v = new Vehicle("v-" + seed % 7, Vehicle.Dynamics.DOUBLE_INTEGRATOR, start, startVelocity,
        0.5 + r.nextDouble() * 5, 0.2 + r.nextDouble() * 2, r.nextDouble() * 0.8, 3 + r.nextInt(14), null);
    List<Zone> zones = new ArrayList<>();
    int nz = r.nextInt(6);
    for (int o = 0; o < nz; o++) {
      double x = r.nextDouble() * w;
      double y = r.nextDouble() * h;
      double s = 0.5 + r.nextDouble() * w / 4;
      Shape shape = r.nextBoolean() ? TestScenarios.box(x, y, x + s, y + s * (0.3 + r.nextDouble()))
          : new Shape.Polygon(List.of(new Vec2(x, y), new Vec2(x + s, y + s * 0.2), new Vec2(x + s * 0.4, y + s)));
      zones.add(TestScenarios.zone(o == 1 ? "zone 1!" : "z" + o, shape));
    }
    List<Waypoint> wps = new ArrayList<>();
    for (int i = r.nextInt(3); i > 0; i--) {
      wps.add(new Waypoint("wp" + i, new Vec2(r.nextDouble() * w, r.nextDouble() * h), 0.5 + r.nextDouble(), null));
    }
    double tx = w * 0.9 * r.nextDouble();
    double ty = h * 0.9 * r.nextDouble();
    Shape region = r.nextBoolean() ? TestScenarios.box(tx, ty, tx + 1 + r.nextDouble() * 3, ty + 1)
        : new Shape.Polygon(List.of(new Vec2(tx, ty), new Vec2(tx + 2, ty), new Vec2(tx + 1, ty + 2)));
    int clusters = r.nextInt(3) == 0 ? 1 + r.nextInt(3) : 0;
    PlanOptions plan = new PlanOptions(0.3 + r.nextDouble() * 2, 1 + r.nextInt(14), r.nextDouble(),
        r.nextBoolean() ? 0 : r.nextDouble(), clusters, SymmetryRule.values()[r.nextInt(3)], 0,
        PlanOptions.DEFAULT_SOLVER, Duration.ofSeconds(10), 0.01, 0, r.nextBoolean(), r.nextBoolean(), null);
    return TestScenarios.scenario(v, area, zones, TestScenarios.target(region, r.nextBoolean()), wps, plan);
  }
}
