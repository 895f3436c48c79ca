package dev.skerry.compiler.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.solve.ojalgo.OjAlgoBackend;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;

class BackendsTest {
  static final Milp KNAPSACK = KnownOptimaTest.knapsack();

  /** Stands for a backend whose native libraries failed to load. */
  record Unavailable(String id, String reason) implements SolverBackend {
    @Override
    public Capability capableOf(Milp model) {
      return Capability.no(reason);
    }

    @Override
    public SolveResult solve(Milp model, SolveOptions options, SolveMonitor monitor) {
      return SolveResult.builder(id, SolveStatus.ERROR)
          .message(reason)
          .wallTime(Duration.ZERO)
          .build();
    }
  }

  @Test
  void standardRegistryKnowsEveryId() {
    assertEquals(
        List.of("default", "ojalgo", "scip", "cbc", "highs", "cpsat"), TestBackends.ALL.ids());
    for (String id : TestBackends.ALL.ids()) {
      assertTrue(TestBackends.ALL.choose(id, KNAPSACK).backend().capableOf(KNAPSACK).capable(), id);
    }
  }

  @Test
  void defaultIsScipWithoutNoticeWhenOrToolsLoads() {
    Backends.Choice c = TestBackends.ALL.choose("default", KNAPSACK);
    assertEquals("scip", c.backend().id());
    assertTrue(c.notice().isEmpty(), c.notice()::toString);
    assertEquals("scip", TestBackends.ALL.choose(null, KNAPSACK).backend().id());
    assertEquals("scip", TestBackends.ALL.choose("  SCIP ", KNAPSACK).backend().id());
  }

  @Test
  void unknownIdNamesTheValidOnes() {
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class, () -> TestBackends.ALL.choose("gurobi", KNAPSACK));
    assertEquals(
        "unknown solver 'gurobi'; choose one of: default, ojalgo, scip, cbc, highs, cpsat",
        e.getMessage());
  }

  @Test
  void defaultFallsBackToOjAlgoWithANoticeAndStillSolves() {
    String reason = "OR-Tools native libraries could not be loaded for platform test";
    Backends registry =
        new Backends(
            List.of(
                new OjAlgoBackend(),
                new Unavailable("scip", reason),
                new Unavailable("cbc", reason),
                new Unavailable("highs", reason)));
    Backends.Choice c = registry.choose("default", KNAPSACK);
    assertEquals("ojalgo", c.backend().id());
    String notice = c.notice().orElseThrow();
    assertTrue(notice.startsWith("falling back to ojAlgo (scip: " + reason + ")"), notice);
    assertTrue(notice.endsWith("this one has 10"), notice);
    assertTrue(!notice.contains("\n"), "one line");
    SolveResult r = c.backend().solve(KNAPSACK, SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, r.status(), r::summary);
    assertEquals(KnownOptimaTest.knapsackByEnumeration(), r.objective(), 1e-6);
  }

  @Test
  void defaultTakesTheNextOrToolsEngineWhenScipIsMissing() {
    Backends registry =
        new Backends(
            List.of(
                new OjAlgoBackend(),
                new Unavailable("scip", "no SCIP in this build"),
                new OrToolsBackend(Engine.CBC)));
    Backends.Choice c = registry.choose("default", KNAPSACK);
    assertEquals("cbc", c.backend().id());
    assertEquals("falling back to cbc (scip: no SCIP in this build)", c.notice().orElseThrow());
  }

  @Test
  void noCapableBackendIsAnErrorWithEveryReason() {
    Backends registry =
        new Backends(List.of(new Unavailable("scip", "a"), new Unavailable("ojalgo", "b")));
    IllegalStateException e =
        assertThrows(IllegalStateException.class, () -> registry.choose("default", KNAPSACK));
    assertEquals("no solver can run this model here: scip: a; ojalgo: b", e.getMessage());
  }

  @Test
  void explicitChoicesCarryTheirNotices() {
    Backends registry =
        new Backends(List.of(new Unavailable("scip", "natives missing"), TestBackends.cpSat()));
    assertEquals(
        "solver scip cannot run here: natives missing",
        registry.choose("scip", KNAPSACK).notice().orElseThrow());
    assertTrue(registry.choose("cpsat", KNAPSACK).notice().orElseThrow().contains("approximate"));
  }

  @Test
  void idsMustBeDistinct() {
    assertThrows(
        IllegalArgumentException.class,
        () -> new Backends(List.of(new OjAlgoBackend(), new OjAlgoBackend())));
    assertThrows(
        IllegalArgumentException.class,
        () -> new Backends(List.of(new Unavailable("default", "x"))));
  }
}
