package dev.skerry.compiler.milp;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/** The exact reduction: what it takes out, and that points map back with the same objective. */
class ReductionTest {
  /**
   * x fixed at 2; the row x + y ≤ 5 keeps y only and becomes y ≤ 3; −2z ≤ −3 with z integer
   * becomes z ≥ 2 (1.5 rounded up); w + z ≥ 4 keeps two columns and stays.
   */
  private static Milp sample() {
    MilpBuilder b = new MilpBuilder("sample");
    Variable x = b.newContinuous("x", 2, 2, Origin.NONE);
    Variable y = b.newContinuous("y", 0, 10, Origin.NONE);
    Variable z = b.newInteger("z", 0, 9, Origin.NONE);
    Variable w = b.newContinuous("w", 0, 10, Origin.NONE);
    b.addLessOrEqual("xy", LinearExpr.of(x).add(y), 5, Origin.NONE);
    b.addLessOrEqual("z_low", LinearExpr.of(z, -2), -3, Origin.NONE);
    b.addGreaterOrEqual("wz", LinearExpr.of(w).add(z), 4, Origin.NONE);
    b.minimize(LinearExpr.of(x, 3).add(y, -1).add(z).add(w));
    return b.build();
  }

  @Test
  void fixedColumnsAndOneColumnRowsBecomeBounds() {
    Reduction red = Reduction.of(sample());
    Milp r = red.reduced();
    assertNull(red.infeasibleRow());
    assertEquals(1, red.removedColumns());
    assertEquals(2, red.removedRows());
    assertEquals(3, r.columnCount());
    assertEquals("y", r.variables().get(0).name());
    assertEquals(3, r.variables().get(0).upper(), 1e-12);
    assertEquals(2, r.variables().get(1).lower(), 1e-12);
    assertEquals(1, r.rowCount());
    assertEquals("wz", r.rows().get(0).name());
    assertEquals(6, r.objective().constant(), 1e-12);
  }

  @Test
  void pointsMapBackWithTheSameObjective() {
    Milp m = sample();
    Reduction red = Reduction.of(m);
    double[] reducedPoint = {3, 2, 2};
    double[] x = red.expand(reducedPoint);
    assertArrayEquals(new double[] {2, 3, 2, 2}, x, 0);
    assertEquals(red.reduced().objective().value(reducedPoint), m.objective().value(x), 1e-12);
    assertEquals(0, m.maxViolation(x), 1e-12);
    assertArrayEquals(reducedPoint, red.restrict(x), 0);
  }

  /**
   * A row no point within the bounds can break goes; one that some point breaks stays. The first is
   * the shape of a cluster-containment row whose big-M is almost 0 (c ≥ 23.55 already, the row asks
   * c ≥ 14.05 + 1e-6·a), which ojAlgo's simplification mishandled.
   */
  @Test
  void aRowTheBoundsAlreadyKeepIsDropped() {
    MilpBuilder b = new MilpBuilder("slack");
    Variable c = b.newContinuous("c", 23.55, 91.65, Origin.NONE);
    Variable a = b.newBinary("a", Origin.NONE);
    b.addLessOrEqual("idle", LinearExpr.of(c, -1).add(a, 1e-6), -14.05, Origin.NONE);
    b.addLessOrEqual("tight", LinearExpr.of(c, -1).add(a, 70), -24, Origin.NONE);
    b.minimize(LinearExpr.of(c));
    Reduction red = Reduction.of(b.build());
    assertEquals(1, red.removedRows());
    assertEquals("tight", red.reduced().rows().get(0).name());
  }

  @Test
  void aFixingCanEmptyARowThatThenShowsTheModelInfeasible() {
    MilpBuilder b = new MilpBuilder("chain");
    Variable u = b.newBinary("u", Origin.NONE);
    Variable v = b.newContinuous("v", 0, 4, Origin.NONE);
    // u ≥ 0.5 makes the binary 1; then v + u = 1 fixes v at 0 and u + v ≥ 2 cannot hold
    b.addGreaterOrEqual("u_up", LinearExpr.of(u), 0.5, Origin.NONE);
    b.addEquality("sum", LinearExpr.of(v).add(u), 1, Origin.NONE);
    b.addGreaterOrEqual("big", LinearExpr.of(u).add(v), 2, Origin.NONE);
    b.minimize(LinearExpr.of(v));
    Reduction red = Reduction.of(b.build());
    assertEquals("big", red.infeasibleRow());
  }

  @Test
  void aModelWithNothingFixedIsLeftAsItIs() {
    MilpBuilder b = new MilpBuilder("plain");
    Variable p = b.newContinuous("p", 0, 1, Origin.NONE);
    Variable q = b.newBinary("q", Origin.NONE);
    b.addLessOrEqual("pq", LinearExpr.of(p).add(q), 1.5, Origin.NONE);
    b.maximize(LinearExpr.of(p).add(q));
    Milp m = b.build();
    Reduction red = Reduction.of(m);
    assertEquals(0, red.removedColumns());
    assertEquals(0, red.removedRows());
    assertEquals(m.rows().get(0).upper(), red.reduced().rows().get(0).upper(), 0);
  }
}
