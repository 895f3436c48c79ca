package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.Fact;
import dev.skerry.compiler.analysis.SizeReport;
import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * What pruning proves infeasible is reported as a fact, and the model stays faithful: the solver
 * reaches the same verdict on it.
 */
class FactsTest {

  @Test
  void startInsideAZoneIsReportedAndInfeasible() {
    Scenario s = TestScenarios.inlet(6, 0).withStart(new Vec2(6, 4), Vec2.ZERO);
    SizeReport report = Analysis.report(s);
    assertTrue(has(report.facts(), "zone-covers-reach", "hull"), "facts: " + report.facts());
    OjAlgoSolve.Result r = OjAlgoSolve.solve(Lowering.lower(s));
    assertTrue(r.infeasible() || !r.state().isFeasible(), "solver found a plan from inside a zone: " + r.state());
  }

  @Test
  void horizonTooShortIsReportedAndInfeasible() {
    Scenario s = TestScenarios.inlet(3, 0);
    SizeReport report = Analysis.report(s);
    assertTrue(has(report.facts(), "target-unreachable", "berth"), "facts: " + report.facts());
    OjAlgoSolve.Result r = OjAlgoSolve.solve(Lowering.lower(s));
    assertTrue(!r.state().isFeasible(), "solver reached the target in 3 steps: " + r.state());
  }

  @Test
  void feasibleScenarioHasNoFacts() {
    assertTrue(Analysis.report(TestScenarios.inlet(8, 0)).facts().isEmpty());
  }

  private static boolean has(List<Fact> facts, String code, String entity) {
    return facts.stream().anyMatch(f -> f.code().equals(code) && f.entity().equals(entity));
  }
}
