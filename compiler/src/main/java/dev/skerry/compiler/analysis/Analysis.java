package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;

/** Entry point of the analysis stage: predicted sizes and facts, without building the MILP. */
public final class Analysis {
  /** Clusters suggested for comparison when a plan has none. */
  public static final int SUGGESTED_CLUSTERS = 2;

  /** The most binaries, before pruning, of a plan Skerry lays out (see {@link #binaryBound}). */
  public static final long MAX_BINARIES = 2_000_000;

  private Analysis() {}

  /**
   * An upper bound of the plan's binaries without building its layout: the unpruned count of every
   * cause (zone faces or cluster boxes per vehicle and step, arrival per vehicle, candidate target
   * and step, waypoint visits per vehicle and step, separation faces per pair and step). Cheap, so
   * the checker can refuse a plan whose layout would not fit in memory.
   */
  public static long binaryBound(Scenario s) {
    long n = s.plan().horizon();
    long v = s.vehicles().size();
    long faces = 0;
    for (var z : s.zones()) {
      faces += z.faceCount();
    }
    long zones = s.plan().clustered()
        ? v * 4L * s.plan().clusters() * n + (long) s.zones().size() * s.plan().clusters()
        : v * faces * n;
    long arrival = 0;
    for (var vehicle : s.vehicles()) {
      arrival += s.candidateTargets(vehicle).size() * n;
    }
    long waypoints = (long) s.waypoints().size() * v * n;
    long separation = v * (v - 1) / 2 * (s.threeD() ? 6 : 4) * n;
    return zones + arrival + waypoints + separation;
  }

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
