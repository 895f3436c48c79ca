package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The fleet start's move onto a vehicle's shortest way round the zones, on the full twin skiffs,
 * against SCIP's optimum of the same model (which {@code ExampleCrossCheckTest} checks against cbc
 * and glpsol). The rounds here are solved by SCIP, so the plan the move starts from is the same on
 * every run.
 */
class FleetMovesTest {
  private static final SolverBackend SCIP = ScipOptimum.SCIP;
  private static final SolverBackend OJALGO = Backends.standard().choose("ojalgo", null).backend();
  private static final SolveOptions TEN_SECONDS = SolveOptions.defaults().withTimeLimit(Duration.ofSeconds(10));

  private static Scenario s;
  private static Milp model;
  private static double[] optimum;

  @BeforeAll
  static void solve() {
    ScipOptimum o = ScipOptimum.of(ExampleScenarios.full("twin_skiffs"));
    s = o.scenario();
    model = o.model();
    optimum = o.values();
  }

  /**
   * The skiffs planned south first, the south skiff's plan alone made to pass north of the seal
   * rock (its y at step 5 at least 29.5 m; the rock spans 20–28 m and its shortest way passes south
   * of it), the north skiff then planned round it: the move puts the south skiff on its shortest
   * way's sides, south of the rock, for less; the north skiff's step-sooner move then reaches SCIP's
   * optimum of the whole model.
   */
  @Test
  void aSkiffPlannedTheLongWayRoundARockIsPutOnItsShortestWay() {
    List<Vehicle> reverse = new ArrayList<>(s.vehicles());
    Collections.reverse(reverse);
    Vehicle south = reverse.get(0);
    Milp alone = FleetStarts.round(s, reverse.subList(0, 1), null, null, Set.of(), true);
    SolveResult first = SCIP.solve(withLowerBound(alone, "py", 5, 29.5), SolveOptions.defaults());
    assertTrue(first.status().hasSolution(), first::summary);
    Milp both = FleetStarts.round(s, reverse, alone, first.values(), Set.of(south.name()), true);
    SolveResult second = SCIP.solve(both, SolveOptions.defaults());
    assertTrue(second.status().hasSolution(), second::summary);
    double[] rounds = second.values();
    assertTrue(value(rounds, south.name(), "py", 5) >= 29.5 - 1e-6);

    double[] moved = FleetStarts.onItsGuide(s, model, rounds, south, OJALGO, TEN_SECONDS);
    assertNotNull(moved, "no point on the south skiff's shortest way");
    assertTrue(model.maxViolation(moved) <= WarmStarts.TOLERANCE, "violation " + model.maxViolation(moved));
    assertTrue(model.objective().value(moved) < model.objective().value(rounds) - 1e-6,
        model.objective().value(moved) + " not below the rounds' " + model.objective().value(rounds));
    assertTrue(value(moved, south.name(), "py", 5) < 20, "still north of the rock");
    for (Vehicle v : s.vehicles()) {
      assertEquals(SoonerArrival.arrivalStep(model, rounds, v.name()), SoonerArrival.arrivalStep(model, moved, v.name()));
    }

    String north = reverse.get(1).name();
    double[] sooner = SoonerArrival.of(model, moved, north, OJALGO, TEN_SECONDS);
    assertNotNull(sooner, "no point with the north skiff a step sooner");
    double best = model.objective().value(optimum);
    assertEquals(best, model.objective().value(sooner), 1e-6 * best, "SCIP's optimum");
  }

  private static Milp withLowerBound(Milp m, String role, int step, double lower) {
    List<Variable> vars = new ArrayList<>();
    for (Variable v : m.variables()) {
      boolean hit = v.origin().role().equals(role) && v.origin().step() == step;
      vars.add(hit ? new Variable(v.index(), v.name(), v.type(), lower, v.upper(), v.origin()) : v);
    }
    return new Milp(m.name(), vars, m.rows(), m.objective());
  }

  private static double value(double[] x, String vehicle, String role, int step) {
    return model.variables().stream()
        .filter(v -> v.origin().role().equals(role) && v.origin().entity().equals(vehicle) && v.origin().step() == step)
        .mapToDouble(v -> x[v.index()]).findFirst().orElseThrow();
  }
}
