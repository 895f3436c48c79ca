package dev.skerry.lsp.analysis;

import dev.skerry.compiler.model.Scenario;
import java.util.Optional;

/**
 * Predicted MILP sizes of a checked scenario, from the compiler's analysis stage; the server
 * never counts them itself. Called on an analysis worker, never on a request thread. A server
 * started without one shows no sizes anywhere and does not offer inlay hints.
 */
public interface SizeEstimator {
  Optional<PlanSizes> estimate(Scenario scenario);

  /**
   * The plan as written and one comparison (the unclustered plan when the plan clusters, else a
   * suggested clustering), with {@code suggestedClusters} > 0 when the comparison is a suggestion.
   */
  record PlanSizes(Counts asWritten, Counts comparison, String comparisonLabel, int suggestedClusters,
      java.util.Map<String, Long> zoneBinaries) {
    public PlanSizes {
      zoneBinaries = zoneBinaries == null ? java.util.Map.of() : java.util.Map.copyOf(zoneBinaries);
    }

    public PlanSizes(Counts asWritten, Counts comparison, String comparisonLabel, int suggestedClusters) {
      this(asWritten, comparison, comparisonLabel, suggestedClusters, java.util.Map.of());
    }
  }

  record Counts(long binaries, long continuous, long rows) {}
}
