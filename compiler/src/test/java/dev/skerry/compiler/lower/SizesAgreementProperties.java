package dev.skerry.compiler.lower;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.RandomScenarios;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import java.util.regex.Pattern;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/** On random scenarios the analysis predicts the lowered sizes exactly and every name is well formed. */
class SizesAgreementProperties {
  private static final Pattern NAME = Pattern.compile("[A-Za-z][A-Za-z0-9_]{0,63}");

  @Property(tries = 150)
  void predictedEqualsLowered(@ForAll long seed) {
    Scenario s = RandomScenarios.of(seed);
    for (boolean pruning : new boolean[] {true, false}) {
      Scenario variant = s.withPlan(s.plan().withPruning(pruning));
      Milp m = Lowering.lower(variant);
      assertEquals(Census.of(m, variant), Analysis.sizes(variant), "seed " + seed + " pruning " + pruning);
      for (Variable v : m.variables()) {
        assertTrue(NAME.matcher(v.name()).matches(), "bad column name " + v.name());
      }
      for (Row r : m.rows()) {
        assertTrue(NAME.matcher(r.name()).matches(), "bad row name " + r.name());
      }
    }
  }

  /** Clustered variants of random scenarios: 1 to 4 clusters under every symmetry rule. */
  @Property(tries = 40)
  void predictedEqualsLoweredForEveryClusterRule(@ForAll long seed) {
    Scenario s = RandomScenarios.of(seed);
    int count = 1 + (int) Math.floorMod(seed, 4L);
    for (SymmetryRule rule : SymmetryRule.values()) {
      Scenario variant = s.withPlan(s.plan().withClusters(count, rule));
      assertEquals(Census.of(Lowering.lower(variant), variant), Analysis.sizes(variant),
          "seed " + seed + " clusters " + count + " " + rule.keyword());
    }
  }

  @Property(tries = 30)
  void loweringIsDeterministic(@ForAll long seed) {
    Scenario s = RandomScenarios.of(seed);
    Milp a = Lowering.lower(s);
    Milp b = Lowering.lower(s);
    assertEquals(a.variables(), b.variables());
    assertEquals(a.rows(), b.rows());
    assertEquals(a.objective(), b.objective());
  }

  @Property(tries = 100)
  void pruningNeverAddsBinaries(@ForAll long seed) {
    Scenario s = RandomScenarios.of(seed);
    long pruned = Analysis.sizes(s.withPlan(s.plan().withPruning(true))).binaries();
    long plain = Analysis.sizes(s.withPlan(s.plan().withPruning(false))).binaries();
    assertTrue(pruned <= plain, "seed " + seed + ": pruned " + pruned + " > plain " + plain);
  }
}
