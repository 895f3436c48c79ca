package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The fleet's "a step sooner" move and its separation fixing, on the small twin skiffs, against
 * SCIP's optimum of the same model (SCIP's optimum of the full example is checked against cbc and
 * glpsol in {@code ExampleCrossCheckTest}).
 */
class SoonerArrivalTest {
  private static final SolverBackend SCIP = ScipOptimum.SCIP;
  private static final SolverBackend OJALGO = Backends.standard().choose("ojalgo", null).backend();

  private static Scenario s;
  private static Milp model;
  private static double[] optimum;

  @BeforeAll
  static void solve() {
    ScipOptimum o = ScipOptimum.of(ExampleScenarios.tiny("twin_skiffs"));
    s = o.scenario();
    model = o.model();
    optimum = o.values();
  }

  /**
   * A plan with one skiff held back a step (SCIP's best with that skiff's arrival a step later than
   * in the optimum): the move brings it back to its optimal step, the fleet solved again round it
   * by ojAlgo, to a point of the whole model that costs less than the held-back plan and no less
   * than the optimum.
   */
  @Test
  void aSkiffHeldBackAStepArrivesSoonerWithTheFleetSolvedRoundIt() {
    String skiff = s.vehicles().get(0).name();
    int best = SoonerArrival.arrivalStep(model, optimum, skiff);
    double[] late = SCIP.solve(arrivingAt(skiff, best + 1), SolveOptions.defaults()).values();
    assertEquals(best + 1, SoonerArrival.arrivalStep(model, late, skiff));
    assertTrue(model.maxViolation(late) <= WarmStarts.TOLERANCE);

    double[] sooner = SoonerArrival.of(model, late, skiff, OJALGO,
        SolveOptions.defaults().withTimeLimit(Duration.ofSeconds(20)));
    assertNotNull(sooner, "no point with the skiff a step sooner");
    assertTrue(model.maxViolation(sooner) <= WarmStarts.TOLERANCE, "violation " + model.maxViolation(sooner));
    assertEquals(best, SoonerArrival.arrivalStep(model, sooner, skiff));
    double cost = model.objective().value(sooner);
    assertTrue(cost < model.objective().value(late), cost + " not below " + model.objective().value(late));
    assertTrue(cost >= model.objective().value(optimum) - 1e-6, cost + " below the optimum");
  }

  /**
   * Played faster along its own track, a skiff is at its start at step 0 and where it arrived at
   * its new arrival step, and its arrival binary moves there.
   */
  @Test
  void aRetimedTrackKeepsItsEndsAndMovesTheArrival() {
    String skiff = s.vehicles().get(1).name();
    int a = SoonerArrival.arrivalStep(model, optimum, skiff);
    double[] z = SoonerArrival.retimed(model, optimum, skiff, a, a - 1);
    assertEquals(a - 1, SoonerArrival.arrivalStep(model, z, skiff));
    for (String role : List.of("px", "py")) {
      assertEquals(value(optimum, skiff, role, 0), value(z, skiff, role, 0), 1e-9);
      assertEquals(value(optimum, skiff, role, a), value(z, skiff, role, a - 1), 1e-9);
    }
  }

  /**
   * At the optimum the crossing skiffs come near at some slots and stay far apart at others: the
   * far slots' binaries are fixed, the near ones left free, and the optimum's path satisfies the
   * faces fixed.
   */
  @Test
  void separationIsFixedOnlyWhereThePairIsFarApart() {
    Map<Integer, Double> fixed = new HashMap<>();
    SoonerArrival.fixFarSeparation(model, optimum, fixed);
    long free = model.variables().stream()
        .filter(v -> v.origin().role().equals("separate-binary") && !fixed.containsKey(v.index())).count();
    assertTrue(!fixed.isEmpty() && free > 0, fixed.size() + " fixed, " + free + " free");
    double[] x = optimum.clone();
    fixed.forEach((c, value) -> x[c] = value);
    assertTrue(model.maxViolation(x) <= WarmStarts.TOLERANCE, "violation " + model.maxViolation(x));
  }

  /**
   * The skiffs planned in the reverse order by SCIP, each round to its optimum: the north skiff
   * (planned second) gives way round the south one's fixed path, 0.03 % above the optimum. Solved
   * again with both free on the sides of the zones they keep, by ojAlgo, the plan is SCIP's optimum
   * of the whole model (within 1e-6, relative), each arrival step kept.
   */
  @Test
  void theFleetSolvedAgainOnItsSidesStraightensTheSkiffThatGaveWay() {
    List<dev.skerry.compiler.model.Vehicle> reverse = new ArrayList<>(s.vehicles());
    java.util.Collections.reverse(reverse);
    String first = reverse.get(0).name();
    Milp one = FleetStarts.round(s, reverse.subList(0, 1), null, null, java.util.Set.of(), true);
    SolveResult r1 = SCIP.solve(one, SolveOptions.defaults());
    assertTrue(r1.status().hasSolution(), r1::summary);
    Milp two = FleetStarts.round(s, reverse, one, r1.values(), java.util.Set.of(first), true);
    assertEquals(model.columnCount(), two.columnCount());
    SolveResult r2 = SCIP.solve(two, SolveOptions.defaults());
    assertTrue(r2.status().hasSolution(), r2::summary);
    double[] rounds = r2.values();
    assertTrue(model.maxViolation(rounds) <= WarmStarts.TOLERANCE);

    double[] again = SoonerArrival.onItsSides(model, rounds, OJALGO,
        SolveOptions.defaults().withTimeLimit(Duration.ofSeconds(20)));
    assertNotNull(again, "no point on the rounds' sides");
    assertTrue(model.maxViolation(again) <= WarmStarts.TOLERANCE, "violation " + model.maxViolation(again));
    double cost = model.objective().value(again);
    double best = model.objective().value(optimum);
    assertTrue(cost < model.objective().value(rounds) - 1e-6, cost + " not below the rounds' plan");
    assertEquals(best, cost, 1e-6 * Math.abs(best), "the optimum");
    for (var v : s.vehicles()) {
      assertEquals(SoonerArrival.arrivalStep(model, rounds, v.name()), SoonerArrival.arrivalStep(model, again, v.name()));
    }
  }

  private static Milp arrivingAt(String vehicle, int step) {
    List<Variable> vars = new ArrayList<>();
    for (Variable v : model.variables()) {
      boolean held = v.origin().role().equals("arrive") && v.origin().owner().equals(vehicle);
      double value = v.origin().step() == step && v.upper() > 0 ? 1 : 0;
      vars.add(held ? new Variable(v.index(), v.name(), v.type(), value, value, v.origin()) : v);
    }
    return new Milp(model.name(), vars, model.rows(), model.objective());
  }

  private static double value(double[] x, String vehicle, String role, int step) {
    return model.variables().stream()
        .filter(v -> v.origin().role().equals(role) && v.origin().entity().equals(vehicle) && v.origin().step() == step)
        .mapToDouble(v -> x[v.index()]).findFirst().orElseThrow();
  }
}
