package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;

/** Entry point of the analysis stage: predicted sizes and facts, without building the MILP. */
public final class Analysis {
  /** Clusters suggested for comparison when a plan has none. */
  public static final int SUGGESTED_CLUSTERS = 2;

  private Analysis() {}

  /** Sizes of the plan as written. */
  public static Sizes sizes(Scenario s) {
    return FormulationLayout.of(s).sizes();
  }

  /** Binaries each zone adds to the plan as written, by zone name (counted from the same layout). */
  public static java.util.Map<String, Long> zoneBinaries(Scenario s) {
    return FormulationLayout.of(s).avoidance().zoneBinaries();
  }

  public static SizeReport report(Scenario s) {
    PlanOptions plan = s.plan();
    FormulationLayout written = FormulationLayout.of(s);
    Sizes unpruned = plan.pruning() ? FormulationLayout.of(s.withPlan(plan.withPruning(false))).sizes()
        : written.sizes();
    Sizes comparison;
    String label;
    if (s.threeD() && !plan.clustered()) {
      comparison = null;
      label = "clusters: not available in 3-D";
    } else if (plan.clustered()) {
      comparison = sizes(s.withPlan(plan.withClusters(0, plan.symmetry())));
      label = "without clusters";
    } else {
      comparison = sizes(s.withPlan(plan.withClusters(SUGGESTED_CLUSTERS, PlanOptions.SymmetryRule.ORDERED)));
      label = "with " + SUGGESTED_CLUSTERS + " clusters, ordered";
    }
    return new SizeReport(written.sizes(), unpruned, comparison, label,
        written.avoidance().skippedSlots(), written.avoidance().hardSlots(), written.facts());
  }
}
