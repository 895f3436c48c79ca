package dev.skerry.compiler.analysis;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The reach boxes over-approximate what the dynamics can do: random input sequences admitted by
 * the acceleration polygon, whose velocities the speed polygon admits and whose positions stay in
 * the keep-in box, never leave the boxes. Half the trials hold one corner of the acceleration
 * polygon throughout, clipped to the speed polygon: that accelerate-then-cruise input is what
 * reaches the box edges.
 */
class ReachabilityProperties {

  @Property(tries = 100)
  void simulatedTrajectoriesStayInTheBoxes(@ForAll long seed) {
    Scenario s = RandomScenarios.of(seed);
    Reachability reach = Reachability.of(s);
    LimitPolygon speed = LimitPolygon.inscribed(s.vehicle().maxSpeed(), s.vehicle().sides());
    LimitPolygon accel = LimitPolygon.inscribed(s.vehicle().maxAccel(), s.vehicle().sides());
    double dt = s.plan().step();
    Random r = new Random(seed);

    for (int trial = 0; trial < 40; trial++) {
      boolean hold = trial % 2 == 0;
      Vec2 p = s.vehicle().start();
      Vec2 v = s.vehicle().startVelocity();
      Vec2 u = corner(accel, r, hold);
      for (int k = 1; k <= s.plan().horizon(); k++) {
        if (!hold && r.nextInt(3) == 0) {
          u = corner(accel, r, false);
        }
        Vec2 step = u;
        if (!inside(speed, v.plus(step.times(dt)))) {
          double lo = 0;
          double hi = 1;
          for (int i = 0; i < 60; i++) {
            double mid = (lo + hi) / 2;
            if (inside(speed, v.plus(u.times(mid * dt)))) {
              lo = mid;
            } else {
              hi = mid;
            }
          }
          step = u.times(lo);
          if (!inside(speed, v.plus(step.times(dt)))) {
            break;
          }
        }
        p = p.plus(v.times(dt)).plus(step.times(dt * dt / 2));
        v = v.plus(step.times(dt));
        if (!reach.keepIn().contains(p)) {
          break;
        }
        assertTrue(grow(reach.position(k)).contains(p),
            "seed " + seed + ": p_" + k + " = " + p + " outside " + reach.position(k));
        assertTrue(grow(reach.velocity(k)).contains(v),
            "seed " + seed + ": v_" + k + " = " + v + " outside " + reach.velocity(k));
      }
    }
  }

  /** A corner of the polygon (the per-axis extremes), sometimes shrunk when {@code full} is false. */
  private static Vec2 corner(LimitPolygon poly, Random r, boolean full) {
    double angle = 2 * Math.PI * (2 * r.nextInt(poly.sides()) + 1) / (2.0 * poly.sides());
    double scale = !full && r.nextInt(4) == 0 ? r.nextDouble() : 1;
    return new Vec2(Math.cos(angle), Math.sin(angle)).times(poly.radius() * scale * (1 - 1e-12));
  }

  private static boolean inside(LimitPolygon poly, Vec2 x) {
    for (Vec2 n : poly.normals()) {
      if (n.dot(x) > poly.offset() + 1e-12) {
        return false;
      }
    }
    return true;
  }

  private static Bounds grow(Bounds b) {
    return b.expand(1e-9 * (1 + Math.abs(b.xmin()) + Math.abs(b.xmax()) + Math.abs(b.ymin()) + Math.abs(b.ymax())));
  }
}
