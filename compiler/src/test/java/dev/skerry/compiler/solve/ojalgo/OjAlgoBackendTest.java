package dev.skerry.compiler.solve.ojalgo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.StopReason;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.integer.IntegerStrategy;
import org.ojalgo.structure.Access1D;
import org.ojalgo.type.context.NumberContext;

class OjAlgoBackendTest {
  /** The tolerance handed to ojAlgo allows at most the gap asked for, and not ten times less. */
  @ParameterizedTest(name = "gap {0}")
  @ValueSource(doubles = {0.2, 0.05, 0.01, 0.005, 1e-4, 1e-6})
  void gapBecomesADigitCountNoLooserThanAsked(double gap) {
    NumberContext context = OjAlgoBackend.gapContext(gap);
    double allowed = context.error(1000.0) / 1000.0;
    assertTrue(allowed <= gap * (1 + 1e-9), context + " allows " + allowed);
    assertTrue(allowed > gap / 10, context + " allows only " + allowed);
  }

  @ParameterizedTest(name = "at {0}")
  @ValueSource(doubles = {1e-3, 1, 1000})
  void defaultGapIsOjAlgosOwnDefault(double value) {
    NumberContext ours = OjAlgoBackend.gapContext(SolveOptions.DEFAULT_RELATIVE_GAP);
    assertEquals(IntegerStrategy.DEFAULT.getGapTolerance().error(value), ours.error(value));
  }

  /** min x + y with x + y ≥ 1, both binary: feasible, optimum 1. */
  private static Milp cover() {
    MilpBuilder b = new MilpBuilder("cover");
    Variable x = b.newBinary("x", Origin.NONE);
    Variable y = b.newBinary("y", Origin.NONE);
    b.addGreaterOrEqual("one", LinearExpr.of(x).add(y), 1, Origin.NONE);
    b.minimize(LinearExpr.of(x).add(y));
    return b.build();
  }

  private static SolveResult.Builder described(Optimisation.State state, StopReason stopped) {
    SolveResult.Builder b = SolveResult.builder(OjAlgoBackend.ID, SolveStatus.ERROR);
    Optimisation.Result r = new Optimisation.Result(state, Double.NaN, Access1D.wrap(0, 0));
    OjAlgoBackend.describe(cover(), new OjAlgoBackend.Outcome(r, null, stopped, false), b);
    return b;
  }

  /**
   * ojAlgo prunes a node whose LP its time limit cut short as infeasible, and answers INFEASIBLE
   * when no node and no incumbent is left: after a stop that answer is no proof.
   */
  @Test
  void infeasibleAfterATimeLimitOrCancelIsNoPlanFound() {
    for (StopReason stop : new StopReason[] {StopReason.TIME_LIMIT, StopReason.CANCELLED}) {
      SolveResult r = described(Optimisation.State.INFEASIBLE, stop).build();
      assertEquals(SolveStatus.NO_SOLUTION_FOUND, r.status(), r::summary);
      assertEquals(stop, r.stopReason(), r::summary);
      assertTrue(r.warnings().stream().anyMatch(w -> w.contains("no proof")), r.warnings()::toString);
    }
  }

  @Test
  void infeasibleOfAFinishedSearchStaysInfeasible() {
    SolveResult r = described(Optimisation.State.INFEASIBLE, StopReason.FINISHED).build();
    assertEquals(SolveStatus.INFEASIBLE, r.status(), r::summary);
  }

  /** A start the model accepts is returned when ojAlgo has nothing, or something worse. */
  @Test
  void aFeasibleStartIsReturnedWhenOjAlgoHasNothingBetter() {
    Milp m = cover();
    for (SolveStatus was : new SolveStatus[] {SolveStatus.NO_SOLUTION_FOUND, SolveStatus.INFEASIBLE, SolveStatus.ERROR}) {
      SolveResult.Builder b = SolveResult.builder(OjAlgoBackend.ID, was);
      OjAlgoBackend.fallBackToStart(m, new double[] {1, 0}, b);
      SolveResult r = b.build();
      assertEquals(SolveStatus.FEASIBLE, r.status(), r::summary);
      assertEquals(1, r.values()[0]);
      assertTrue(r.warnings().stream().anyMatch(w -> w.contains("warm start")), r.warnings()::toString);
    }
    SolveResult.Builder worse = SolveResult.builder(OjAlgoBackend.ID, SolveStatus.FEASIBLE).values(new double[] {1, 1});
    OjAlgoBackend.fallBackToStart(m, new double[] {0, 1}, worse);
    assertEquals(1, worse.build().values()[1]);
    assertEquals(0, worse.build().values()[0], "the start's objective 1 beats ojAlgo's 2");
    SolveResult.Builder broken = SolveResult.builder(OjAlgoBackend.ID, SolveStatus.NO_SOLUTION_FOUND);
    OjAlgoBackend.fallBackToStart(m, new double[] {0, 0}, broken);
    assertEquals(SolveStatus.NO_SOLUTION_FOUND, broken.build().status(), "a start that breaks a row is no plan");
  }

  @Test
  void ojAlgosLimitIsRoundedUpToWholeMilliseconds() {
    assertEquals(1, OjAlgoBackend.abortMillis(Duration.ZERO));
    assertEquals(2, OjAlgoBackend.abortMillis(Duration.ofNanos(1_500_000)));
    assertEquals(60_000, OjAlgoBackend.abortMillis(Duration.ofSeconds(60)));
  }
}
