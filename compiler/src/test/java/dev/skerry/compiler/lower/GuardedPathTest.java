package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Zone;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A solved plan with the guard on flies no segment p_k → p_{k+1} through any inflated zone,
 * checked by clipping each segment against the zone's faces (Cyrus–Beck), independently of the
 * MILP's rows; and the plan arrives inside the target at rest.
 */
class GuardedPathTest {

  @ParameterizedTest(name = "pruning={0}")
  @ValueSource(booleans = {true})
  void segmentsMissEveryInflatedZone(boolean pruning) {
    Scenario base = TestScenarios.inlet(8, 0);
    Scenario s = base.withPlan(base.plan().withPruning(pruning).withGuard(true));
    Milp m = Lowering.lower(s);
    OjAlgoSolve.Result r = OjAlgoSolve.solve(m);
    assertTrue(r.optimal(), "not solved: " + r.state());
    int arrival = -1;
    for (int k = 1; k <= 8; k++) {
      var f = m.variable("f_" + k);
      if (f != null && r.x()[f.index()] > 0.5) {
        arrival = k;
      }
    }
    assertTrue(arrival > 0, "no arrival step chosen");
    for (int k = 0; k < arrival; k++) {
      Vec2 a = point(m, r, k);
      Vec2 b = point(m, r, k + 1);
      for (Zone z : s.zones()) {
        Shape inflated = z.shape().inflate(s.vehicle().radius());
        assertTrue(depthInside(inflated, a, b) < 1e-6, "segment " + k + " " + a + " → " + b + " crosses " + z.name());
      }
    }
    Vec2 end = point(m, r, arrival);
    assertTrue(s.target().region().contains(end) || s.target().region().inflate(1e-7).contains(end),
        "arrival point " + end + " outside the target");
    assertEquals(0, r.x()[m.variable("vx_skiff_" + arrival).index()], 1e-6);
    assertEquals(0, r.x()[m.variable("vy_skiff_" + arrival).index()], 1e-6);
  }

  private static Vec2 point(Milp m, OjAlgoSolve.Result r, int k) {
    return new Vec2(r.x()[m.variable("px_skiff_" + k).index()], r.x()[m.variable("py_skiff_" + k).index()]);
  }

  /**
   * How deep the segment reaches into the convex shape: the largest, over the part of the segment
   * inside every face's half-plane, of the smallest distance to a face; 0 when it stays outside.
   */
  private static double depthInside(Shape shape, Vec2 a, Vec2 b) {
    double t0 = 0;
    double t1 = 1;
    Vec2 d = b.minus(a);
    for (Shape.Face f : shape.faces()) {
      double num = f.offset() - f.normal().dot(a);
      double den = f.normal().dot(d);
      if (den == 0) {
        if (num < 0) {
          return 0;
        }
      } else if (den > 0) {
        t1 = Math.min(t1, num / den);
      } else {
        t0 = Math.max(t0, num / den);
      }
    }
    if (t0 > t1) {
      return 0;
    }
    double best = 0;
    for (int i = 0; i <= 20; i++) {
      Vec2 p = a.plus(d.times(t0 + (t1 - t0) * i / 20));
      double depth = Double.POSITIVE_INFINITY;
      for (Shape.Face f : shape.faces()) {
        depth = Math.min(depth, f.offset() - f.normal().dot(p));
      }
      best = Math.max(best, depth);
    }
    return best;
  }
}
