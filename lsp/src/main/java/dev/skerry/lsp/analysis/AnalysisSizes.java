package dev.skerry.lsp.analysis;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.SizeReport;
import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.model.Scenario;
import java.util.Optional;

/** The compiler's size analysis as the server's {@link SizeEstimator}: the same function `skerry check` prints. */
public final class AnalysisSizes implements SizeEstimator {
  @Override
  public Optional<PlanSizes> estimate(Scenario scenario) {
    SizeReport r = Analysis.report(scenario);
    int suggested = scenario.plan().clustered() || r.comparison() == null ? 0 : Analysis.SUGGESTED_CLUSTERS;
    return Optional.of(new PlanSizes(counts(r.asWritten()), counts(r.comparison()), r.comparisonLabel(), suggested,
        Analysis.zoneBinaries(scenario)));
  }

  /** The counts of {@code s}; null stays null (no clustering comparison in 3-D). */
  private static Counts counts(Sizes s) {
    return s == null ? null : new Counts(s.binaries(), s.continuous(), s.rows());
  }
}
