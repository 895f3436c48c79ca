package dev.skerry.compiler.solve.ojalgo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.plan.ExampleScenarios;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.StopReason;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;

/**
 * The ojAlgo behaviour behind the false INFEASIBLE, shown deterministically: a limit that stops the
 * root LP part way (here an iteration limit, so the test does not depend on the machine's speed;
 * a time limit or a cancel does the same at a moment that does) makes ojAlgo 56.1.1 answer
 * INFEASIBLE for the small harbour, a model it solves to optimality without the limit. If an
 * upgrade of ojAlgo makes this fail, revisit the INFEASIBLE mapping in {@link OjAlgoBackend}.
 */
class OjAlgoStoppedLpTest {
  @Test
  void ojAlgoCallsAFeasibleModelInfeasibleWhenItsRootLpIsStopped() {
    new OjAlgoBackend(); // clears ojAlgo's presolvers, as every solve of ours runs
    Milp m = Lowering.lower(ExampleScenarios.small("harbour_survey"));
    ExpressionsBasedModel lp = OjAlgoModels.of(m);
    lp.relax();
    lp.options.iterations_abort = 300;
    assertEquals(Optimisation.State.FEASIBLE, lp.minimise().getState(), "the LP is cut short after phase 1");
    ExpressionsBasedModel mip = OjAlgoModels.of(m);
    mip.options.iterations_abort = 300;
    assertEquals(Optimisation.State.INFEASIBLE, mip.minimise().getState(), "ojAlgo's answer for a feasible model");
  }

  /**
   * The same pruning with an incumbent: given a plan that arrives at the last step (32.53, found by
   * SCIP with the arrival fixed there) and the same iteration limit, ojAlgo answers OPTIMAL at that
   * plan, where 26.74 exists (it finds that without the limit). This is why an OPTIMAL after a stop
   * is reported as FEASIBLE.
   */
  @Test
  void ojAlgoCallsItsStartOptimalWhenItsRootLpIsStopped() {
    new OjAlgoBackend();
    Milp m = Lowering.lower(ExampleScenarios.small("harbour_survey"));
    double[] late = lateArrival(m);
    ExpressionsBasedModel mip = OjAlgoModels.of(m);
    OjAlgoModels.setStart(mip, late);
    mip.options.iterations_abort = 300;
    Optimisation.Result stopped = mip.minimise();
    assertEquals(Optimisation.State.OPTIMAL, stopped.getState(), "ojAlgo's answer when stopped");
    assertEquals(m.objective().value(late), stopped.getValue() + m.objective().constant(), 1e-6);
    ExpressionsBasedModel free = OjAlgoModels.of(m);
    OjAlgoModels.setStart(free, late);
    Optimisation.Result finished = free.minimise();
    assertEquals(Optimisation.State.OPTIMAL, finished.getState());
    assertTrue(finished.getValue() + m.objective().constant() < m.objective().value(late) - 1,
        "without the limit ojAlgo finds the better plan");
  }

  /** Our reading of it: OPTIMAL from a search a limit stopped is a feasible plan, not a proof. */
  @Test
  void anOptimalAfterAStopIsReportedAsFeasible() {
    Milp m = Lowering.lower(ExampleScenarios.small("harbour_survey"));
    double[] late = lateArrival(m);
    Optimisation.Result optimal = Optimisation.Result.of(Optimisation.State.OPTIMAL, late);
    SolveResult.Builder stopped = SolveResult.builder(OjAlgoBackend.ID, SolveStatus.ERROR);
    OjAlgoBackend.describe(m, new OjAlgoBackend.Outcome(optimal, null, StopReason.TIME_LIMIT, false), stopped);
    assertEquals(SolveStatus.FEASIBLE, stopped.status());
    assertEquals(StopReason.TIME_LIMIT, stopped.build().stopReason());
    SolveResult.Builder finished = SolveResult.builder(OjAlgoBackend.ID, SolveStatus.ERROR);
    OjAlgoBackend.describe(m, new OjAlgoBackend.Outcome(optimal, null, StopReason.FINISHED, false), finished);
    assertEquals(SolveStatus.OPTIMAL, finished.status());
  }

  /** A plan of {@code m} that arrives at the last step: SCIP's optimum with the arrival fixed there. */
  private static double[] lateArrival(Milp m) {
    int last = m.variables().stream().filter(v -> v.origin().role().equals("arrive"))
        .mapToInt(v -> v.origin().step()).max().orElseThrow();
    List<Variable> vars = new ArrayList<>();
    for (Variable v : m.variables()) {
      double at = v.origin().step() == last ? 1 : 0;
      vars.add(v.origin().role().equals("arrive") ? new Variable(v.index(), v.name(), v.type(), at, at, v.origin()) : v);
    }
    SolveResult r = new OrToolsBackend(Engine.SCIP).solve(new Milp("late", vars, m.rows(), m.objective()),
        SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertTrue(m.maxViolation(r.values()) <= 1e-6);
    return r.values();
  }

  /**
   * ojAlgo's own {@code time_suffice}, and why the backend does not use it for {@link
   * SolveOptions#withPointSufficingAfter}. Once that time has passed with a point in hand, ojAlgo
   * stops at it with the state FEASIBLE (the small harbour, proven OPTIMAL without it in about 4 s
   * here). But the time also cuts short every LP after it, whether a point is in hand or not: with
   * 1 ms the root LP is stopped and ojAlgo answers INFEASIBLE for this feasible model, the trap of
   * the tests above. (On the full warehouse the arrival scan's rounds that had no point yet ended
   * that way at a quarter of their cap, and the scan found no plan in 45 s.)
   */
  @Test
  void ojAlgoStopsAtAPointOnceItsSufficeTimeHasPassed() {
    new OjAlgoBackend();
    Milp m = Lowering.lower(ExampleScenarios.small("harbour_survey"));
    ExpressionsBasedModel proven = OjAlgoModels.of(m);
    Optimisation.Result optimum = proven.minimise();
    assertEquals(Optimisation.State.OPTIMAL, optimum.getState());
    ExpressionsBasedModel early = OjAlgoModels.of(m);
    early.options.time_suffice = 500;
    Optimisation.Result point = early.minimise();
    assertEquals(Optimisation.State.FEASIBLE, point.getState(), "ojAlgo's answer once a point suffices");
    assertTrue(point.getValue() >= optimum.getValue() - 1e-6, point + " vs " + optimum);
    ExpressionsBasedModel cut = OjAlgoModels.of(m);
    cut.options.time_suffice = 1;
    assertEquals(Optimisation.State.INFEASIBLE, cut.minimise().getState(), "ojAlgo's answer when the LP is cut");
  }

  /**
   * Through the backend: once a point suffices the search stops at its first point after that time,
   * reported as feasible and stopped (not optimal: the proof was not finished), and the point
   * satisfies the model. A search that has no point yet goes on: with 1 ms, where ojAlgo's own
   * {@code time_suffice} answers INFEASIBLE (above), the backend still returns a point.
   */
  @Test
  void aPointSufficesOnlyOnceTheSearchHasOne() {
    Milp m = Lowering.lower(ExampleScenarios.small("harbour_survey"));
    OjAlgoBackend ojAlgo = new OjAlgoBackend();
    for (Duration after : List.of(Duration.ofMillis(500), Duration.ofMillis(1))) {
      SolveResult r = ojAlgo.solve(m, SolveOptions.defaults().withPointSufficingAfter(after));
      assertEquals(SolveStatus.FEASIBLE, r.status(), () -> after + ": " + r.summary());
      assertEquals(StopReason.SOLVER_LIMIT, r.stopReason(), () -> after + ": " + r.summary());
      assertTrue(m.maxViolation(r.values()) <= 1e-6, () -> after + ": " + r.summary());
    }
  }
}
