package dev.skerry.compiler.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.time.Duration;
import org.junit.jupiter.api.Test;

/** What happens to a result whose values a backend got wrong. */
class SolutionCheckTest {
  /** min x + 2b + 5 with x + 100 b ≥ 50, x ≤ 60, b binary. */
  static Milp model() {
    MilpBuilder b = new MilpBuilder("check");
    Variable x = b.newContinuous("x", 0, 60, Origin.NONE);
    Variable bin = b.newBinary("b", Origin.NONE);
    b.addGreaterOrEqual("cover", LinearExpr.of(x).add(bin, 100), 50, Origin.of("zone", "avoid", 3));
    b.minimize(LinearExpr.of(x).add(bin, 2).addConstant(5));
    return b.build();
  }

  static SolveResult claimed(double... values) {
    return SolveResult.builder("fake", SolveStatus.OPTIMAL)
        .values(values)
        .wallTime(Duration.ZERO)
        .build();
  }

  @Test
  void aFeasiblePointKeepsItsStatusAndGetsItsObjective() {
    SolveResult r = SolutionCheck.apply(model(), claimed(0, 1));
    assertEquals(SolveStatus.OPTIMAL, r.status());
    assertEquals(7, r.objective(), 0, "0 + 2·1 + 5, constant included");
    assertEquals(0, r.maxViolation());
    assertTrue(r.warnings().isEmpty(), r.warnings()::toString);
  }

  @Test
  void aPointThatViolatesARowBecomesAnErrorNamingTheRow() {
    SolveResult r = SolutionCheck.apply(model(), claimed(10, 0));
    assertEquals(SolveStatus.ERROR, r.status());
    assertTrue(r.message().contains("row cover off by 40"), r.message());
    assertTrue(r.message().startsWith("backend reported OPTIMAL"), r.message());
    assertEquals(40, r.maxViolation(), 1e-12);
  }

  @Test
  void aFractionalBinaryIsCaught() {
    SolveResult r = SolutionCheck.apply(model(), claimed(0, 0.5));
    assertEquals(SolveStatus.ERROR, r.status());
    assertTrue(r.message().contains("integrality of column b"), r.message());
  }

  @Test
  void aTinyViolationWithinSolverTolerancesIsOnlyAWarning() {
    // cover: 49.9995 + 0 is 5e-4 short on a row of size 50: 1e-5 relative
    SolveResult r = SolutionCheck.apply(model(), claimed(49.9995, 0));
    assertEquals(SolveStatus.OPTIMAL, r.status());
    assertEquals(1, r.warnings().size(), r.warnings()::toString);
    assertTrue(r.warnings().get(0).contains("row cover"), r.warnings()::toString);
  }

  @Test
  void roundingNoiseIsAccepted() {
    SolveResult r = SolutionCheck.apply(model(), claimed(50 - 1e-9, 1e-10));
    assertEquals(SolveStatus.OPTIMAL, r.status());
    assertTrue(r.warnings().isEmpty(), r.warnings()::toString);
  }

  @Test
  void wrongLengthAndNonFiniteValuesAreErrors() {
    SolveResult shortOne = SolutionCheck.apply(model(), claimed(1));
    assertEquals(SolveStatus.ERROR, shortOne.status());
    assertFalse(shortOne.hasValues());
    assertTrue(shortOne.message().contains("1 values for 2 columns"), shortOne.message());
    SolveResult nan = SolutionCheck.apply(model(), claimed(Double.NaN, 1));
    assertEquals(SolveStatus.ERROR, nan.status());
    assertTrue(nan.message().contains("column x"), nan.message());
  }

  @Test
  void gapIsDerivedFromObjectiveAndBound() {
    SolveResult r =
        SolveResult.builder("fake", SolveStatus.FEASIBLE)
            .stopReason(StopReason.TIME_LIMIT)
            .values(new double[] {50, 0})
            .bestBound(50)
            .wallTime(Duration.ZERO)
            .build();
    SolveResult checked = SolutionCheck.apply(model(), r);
    assertEquals(55, checked.objective());
    assertEquals(5.0 / 55, checked.gap(), 1e-12, "|55 − 50| / |55|");
    assertTrue(
        checked.summary().startsWith("fake: FEASIBLE (time limit) objective 55"),
        checked.summary());
  }
}
