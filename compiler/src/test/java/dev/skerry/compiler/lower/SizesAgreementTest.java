package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.TestScenarios;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The analysis predicts exactly the sizes the lowering builds, cause by cause. */
class SizesAgreementTest {

  @ParameterizedTest(name = "N={0} pruning={1} guard={2} clusters={3} {4}")
  @CsvSource({
      "10, true, true, 0, NONE",
      "10, false, true, 0, NONE",
      "10, true, false, 0, NONE",
      "10, false, false, 0, NONE",
      "12, true, true, 2, ORDERED",
      "12, false, true, 2, SORTED",
      "8, true, false, 3, NONE",
      "1, true, true, 0, NONE",
      "2, false, false, 1, ORDERED"})
  void predictedSizesEqualLoweredSizes(int n, boolean pruning, boolean guard, int clusters, SymmetryRule rule) {
    Scenario base = TestScenarios.harbour(n);
    Scenario s = base.withPlan(base.plan().withPruning(pruning).withGuard(guard).withClusters(clusters, rule));
    Lowering.Lowered lowered = Lowering.lowerWithLayout(s);
    assertEquals(Census.of(lowered.milp(), s), Analysis.sizes(s));
    assertEquals(Census.of(lowered.milp(), s), lowered.layout().sizes());
  }
}
