package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reachability pruning and tight big-M only remove options no trajectory can use: the pruned and
 * the plain model have the same optimum (solved with ojAlgo), while the pruned one has fewer
 * binaries. The fuel-weighted case has a non-integral optimum, so a wrongly cut corner shows.
 */
class PruningPreservesOptimumTest {

  @ParameterizedTest(name = "N={0} fuel={1} guard={2} clusters={3}")
  @CsvSource({
      "8, 0.1, true, 0",
      "8, 0.0, false, 0",
      "8, 0.0, false, 2"})
  void sameOptimumFewerBinaries(int n, double fuel, boolean guard, int clusters) {
    Scenario base = TestScenarios.inlet(n, fuel);
    Scenario written = base.withPlan(base.plan().withGuard(guard).withClusters(clusters, SymmetryRule.ORDERED));
    Scenario pruned = written.withPlan(written.plan().withPruning(true));
    Scenario plain = written.withPlan(written.plan().withPruning(false));
    Milp mp = Lowering.lower(pruned);
    Milp mu = Lowering.lower(plain);
    OjAlgoSolve.Result rp = OjAlgoSolve.solve(mp);
    OjAlgoSolve.Result ru = OjAlgoSolve.solve(mu);
    assertTrue(rp.optimal(), "pruned model not solved to optimality: " + rp.state());
    assertTrue(ru.optimal(), "plain model not solved to optimality: " + ru.state());
    assertTrue(mp.maxViolation(rp.x()) < 1e-6, "pruned solution violates its own model");
    assertTrue(mu.maxViolation(ru.x()) < 1e-6, "plain solution violates its own model");
    assertEquals(ru.objective(), rp.objective(), 1e-6 * Math.max(1, Math.abs(ru.objective())));
    if (clusters == 0) {
      assertTrue(Analysis.sizes(pruned).binaries() < Analysis.sizes(plain).binaries());
    }
  }
}
