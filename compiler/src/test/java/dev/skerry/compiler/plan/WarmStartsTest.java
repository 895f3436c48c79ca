package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.Capability;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.SolverBackend;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import dev.skerry.compiler.verify.Verifier;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class WarmStartsTest {
  static final SolverBackend SCIP = new OrToolsBackend(Engine.SCIP);
  static final Duration CAP = Duration.ofSeconds(30);

  static List<String> names() {
    return ExampleScenarios.PLANAR_SINGLE;
  }

  /** The start is a plan: the model accepts it, the verifier accepts it, and it is no better than the optimum. */
  @ParameterizedTest(name = "{0}")
  @MethodSource("names")
  void theStartIsAFeasiblePlanNoBetterThanTheOptimum(String name) {
    Scenario s = ExampleScenarios.small(name);
    Milp m = Lowering.lower(s);
    WarmStarts.Start start = WarmStarts.find(m, SCIP, SolveOptions.defaults(), CAP);
    assertTrue(start.found(), start::reason);
    assertTrue(m.maxViolation(start.values()) <= WarmStarts.TOLERANCE);
    assertTrue(Verifier.verify(s, PlanExtractor.trajectory(s, m, start.values())).ok());
    SolveResult optimum = SCIP.solve(m, SolveOptions.defaults());
    assertEquals(SolveStatus.OPTIMAL, optimum.status(), optimum::summary);
    assertTrue(start.objective() >= optimum.objective() - 1e-6 * Math.abs(optimum.objective()),
        () -> "start " + start.objective() + " beats the optimum " + optimum.objective());
    assertTrue(start.zonesUsed() < s.zones().size(), "the start should need only some zones");
  }

  /** Fails every restricted model (by name), solves the full one with SCIP. */
  static final class FailingOnRestricted implements SolverBackend {
    final boolean throwing;

    FailingOnRestricted(boolean throwing) {
      this.throwing = throwing;
    }

    @Override
    public String id() {
      return "scip";
    }

    @Override
    public Capability capableOf(Milp model) {
      return Capability.yes();
    }

    @Override
    public SolveResult solve(Milp model, SolveOptions options, SolveMonitor monitor) {
      if (model.name().endsWith("_restricted")) {
        if (throwing) {
          throw new IllegalStateException("simulated crash");
        }
        return SolveResult.builder("scip", SolveStatus.ERROR).message("simulated failure").build();
      }
      return SCIP.solve(model, options, monitor);
    }
  }

  @ParameterizedTest(name = "throwing {0}")
  @org.junit.jupiter.params.provider.ValueSource(booleans = {false, true})
  void aFailingHeuristicNeverBreaksTheSolve(boolean throwing) {
    Scenario s = ExampleScenarios.tiny("warehouse_floor");
    Planner planner = new Planner(new Backends(List.of(new FailingOnRestricted(throwing))));
    PlanResult r = planner.plan(s, "scip", Planner.optionsOf(s.plan()), SolveMonitor.NONE);
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve()::summary);
    assertTrue(r.verified());
    assertTrue(r.solve().warnings().stream().anyMatch(w -> w.startsWith("no warm start")), r.solve().warnings()::toString);
  }

  @Test
  void anInfeasibleScenarioGivesNoStartAndNoException() {
    Milp m = Lowering.lower(BadInputScenarios.walledOff());
    WarmStarts.Start start = WarmStarts.find(m, SCIP, SolveOptions.defaults(), CAP);
    assertFalse(start.found());
    assertTrue(start.reason().contains("INFEASIBLE"), start::reason);
  }
}
