package dev.skerry.compiler.solve.ojalgo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.plan.ExampleScenarios;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveProgress;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.Test;

/** ojAlgo's progress events carry its incumbents and the root LP bound, constant included. */
class OjAlgoProgressTest {
  @Test
  void incumbentsAndTheRootBoundReachTheMonitor() {
    Milp m = Lowering.lower(ExampleScenarios.tiny("warehouse_floor"));
    List<SolveProgress> events = new CopyOnWriteArrayList<>();
    SolveResult r =
        new OjAlgoBackend(Duration.ofMillis(50))
            .solve(m, SolveOptions.defaults().withTimeLimit(Duration.ofSeconds(60)), events::add);
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    SolveProgress last = events.stream().filter(SolveProgress::hasIncumbent).reduce((a, b) -> b).orElseThrow(
        () -> new AssertionError("no incumbent in " + events.size() + " events"));
    assertTrue(last.incumbent() >= r.objective() - 1e-6 * Math.max(1, Math.abs(r.objective())), last + " vs " + r.summary());
    SolveProgress bounded = events.stream().filter(SolveProgress::hasBound).findFirst().orElseThrow(
        () -> new AssertionError("no bound in " + events.size() + " events"));
    assertTrue(bounded.bound() <= r.objective() + 1e-6 * Math.max(1, Math.abs(r.objective())), bounded + " vs " + r.summary());
    System.out.println("last incumbent " + last + ", first bound " + bounded + ", result " + r.summary());
  }
}
