package dev.skerry.compiler.milp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Objective-bound fixing against an incumbent: what it fixes, and that it keeps the optimum. */
class IncumbentFixingTest {
  /**
   * Arrival at step k costs 2k plus a fuel column f ≥ 0 at 0.5; exactly one step is chosen and
   * step k needs fuel ≥ 12 − 2k (arriving sooner takes more). Costs: k=1 → 2+5, k=2 → 4+4,
   * k=3 → 6+3, k=4 → 8+2, k=5 → 10+1.
   */
  private static Milp arrivals() {
    MilpBuilder b = new MilpBuilder("arrivals");
    Variable[] a = new Variable[5];
    LinearExpr once = new LinearExpr();
    LinearExpr cost = new LinearExpr();
    Variable f = b.newContinuous("f", 0, 100, Origin.NONE);
    LinearExpr need = LinearExpr.of(f);
    for (int k = 1; k <= 5; k++) {
      a[k - 1] = b.newBinary("a" + k, Origin.NONE);
      once.add(a[k - 1]);
      cost.add(a[k - 1], 2 * k);
      need.add(a[k - 1], -(12 - 2 * k));
    }
    b.addEquality("once", once, 1, Origin.NONE);
    b.addGreaterOrEqual("fuel", need, 0, Origin.NONE);
    b.minimize(cost.add(f, 0.5));
    return b.build();
  }

  @Test
  void stepsWhoseTimeAloneExceedsTheIncumbentAreFixedAtZero() {
    Milp m = arrivals();
    // incumbent: arrive at step 3 with fuel 6, cost 9; steps 5 (10) cannot beat it, step 4 (8) could
    Milp fixed = IncumbentFixing.apply(m, 9);
    assertEquals(0, fixed.variable("a5").upper());
    assertEquals(1, fixed.variable("a4").upper());
    assertEquals(1, fixed.variable("a1").upper());
    assertEquals(100, fixed.variable("f").upper(), "a continuous column is never fixed");
  }

  /** Every point of the original no worse than the incumbent is still a point of the fixed model. */
  @Test
  void everyPointAtLeastAsGoodAsTheIncumbentSurvives() {
    Milp m = arrivals();
    for (double incumbent : new double[] {7, 8, 9, 11, 20}) {
      Milp fixed = IncumbentFixing.apply(m, incumbent);
      for (int k = 1; k <= 5; k++) {
        double[] x = new double[m.columnCount()];
        x[m.variable("f").index()] = 12 - 2 * k;
        x[m.variable("a" + k).index()] = 1;
        if (m.objective().value(x) <= incumbent) {
          String what = "arrival at step " + k + " lost for incumbent " + incumbent;
          assertTrue(fixed.maxViolation(x) <= 1e-9, what);
        }
      }
    }
  }

  @Test
  void nothingIsFixedWhenTheObjectiveIsUnboundedBelow() {
    MilpBuilder b = new MilpBuilder("open");
    Variable a = b.newBinary("a", Origin.NONE);
    Variable y = b.newContinuous("y", Double.NEGATIVE_INFINITY, 0, Origin.NONE);
    b.addLessOrEqual("ay", LinearExpr.of(a).add(y), 1, Origin.NONE);
    b.minimize(LinearExpr.of(a, 50).add(y));
    Milp m = b.build();
    assertSame(m, IncumbentFixing.apply(m, 1));
  }

  @Test
  void aMaximisationFixesTheColumnsThatWouldLoseTooMuch() {
    MilpBuilder b = new MilpBuilder("max");
    Variable p = b.newBinary("p", Origin.NONE);
    Variable q = b.newBinary("q", Origin.NONE);
    b.addLessOrEqual("pq", LinearExpr.of(p).add(q), 1, Origin.NONE);
    // q = 1 costs 10 against a best case of 5 from p: with an incumbent of 0 (nothing chosen),
    // q can never help; p can
    b.maximize(LinearExpr.of(p, 5).add(q, -10));
    Milp fixed = IncumbentFixing.apply(b.build(), 0);
    assertEquals(0, fixed.variable("q").upper());
    assertEquals(1, fixed.variable("p").upper());
  }
}
