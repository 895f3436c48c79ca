package dev.skerry.compiler.analysis;

import java.util.List;

/**
 * Sizes of a plan three ways, all from {@link FormulationLayout}: as written; as formulated without
 * reachability pruning (the plain per-zone, per-step, per-face count); and the clustering
 * comparison — the unclustered plan when the plan clusters, otherwise a suggested plan with {@link
 * Analysis#SUGGESTED_CLUSTERS} clusters; null in 3-D, where plans avoid zones one by one.
 *
 * @param comparisonLabel what {@code comparison} is, e.g. "without clusters"
 * @param facts what the analysis of the plan as written proved
 */
public record SizeReport(Sizes asWritten, Sizes unpruned, Sizes comparison, String comparisonLabel,
    long skippedSlots, long hardSlots, List<Fact> facts) {

  public SizeReport {
    facts = List.copyOf(facts);
  }
}
