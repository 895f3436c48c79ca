package dev.skerry.compiler.plan;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.verify.Verifier;
import dev.skerry.compiler.verify.VerifyReport;
import java.util.List;

/**
 * Lower → solve → extract → verify, in one call. The verifier runs on every plan found. Used by
 * {@code skerry solve}, the closed loop and the tests.
 */
public final class Planner {
  private final Backends backends;

  public Planner(Backends backends) {
    this.backends = backends;
  }

  public static Planner standard() {
    return new Planner(Backends.standard());
  }

  /** Solver options from the plan block: time limit, gap and threads. */
  public static SolveOptions optionsOf(PlanOptions plan) {
    SolveOptions o = SolveOptions.defaults().withRelativeGap(plan.relativeGap());
    if (plan.timeLimit() != null) {
      o = o.withTimeLimit(plan.timeLimit());
    }
    if (plan.threads() > 0) {
      o = o.withThreads(plan.threads());
    }
    return o;
  }

  /**
   * Plans a checked scenario (it must have no errors) with the backend {@code solverId} (null for
   * the plan's own choice).
   *
   * @throws IllegalArgumentException for an unknown solver id
   * @throws IllegalStateException when no backend can run here
   */
  public PlanResult plan(Scenario s, String solverId, SolveOptions options, SolveMonitor monitor) {
    Milp milp = Lowering.lower(s);
    Backends.Choice choice = backends.choose(solverId == null ? s.plan().solver() : solverId, milp);
    SolveResult result = choice.backend().solve(milp, options, monitor);
    if (!result.status().hasSolution()) {
      return new PlanResult(s, milp, result, null, List.of(), null, choice.notice());
    }
    double[] x = result.values();
    Trajectory path = PlanExtractor.trajectory(s, milp, x);
    List<ClusterBox> clusters = PlanExtractor.clusters(s, milp, x);
    VerifyReport report = Verifier.verify(s, path);
    return new PlanResult(s, milp, result, path, clusters, report, choice.notice());
  }
}
