package dev.skerry.compiler.crosscheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.SolverBackend;

/** The solve Skerry itself does, in process: SCIP through the standard backends. */
final class InProcess {
  private InProcess() {}

  /**
   * SCIP's proven optimum of {@code milp}, with a relative gap far below the 1e-6 the outside
   * comparison allows, so that a gap-sized difference cannot pass for agreement or disagreement.
   */
  static SolveResult scip(Milp milp, double relativeGap) {
    Backends.Choice choice = Backends.standard().choose("scip", milp);
    assertTrue(choice.notice().isEmpty(), "SCIP cannot run here: " + choice.notice().orElse(""));
    SolverBackend scip = choice.backend();
    SolveResult result = scip.solve(milp, SolveOptions.defaults().withRelativeGap(relativeGap).withThreads(1));
    assertEquals(SolveStatus.OPTIMAL, result.status(), milp.name() + ": " + result.summary());
    return result;
  }
}
