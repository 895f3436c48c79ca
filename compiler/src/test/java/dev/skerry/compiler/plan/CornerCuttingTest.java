package dev.skerry.compiler.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.verify.Violation;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A scenario built to cut corners: a 0.2 m thin wall across the direct line, a fast vehicle and
 * 2 s steps (up to 16 m between samples). With the guard off only the samples are kept out of the
 * zones, and the optimum hops over the wall between two samples; the verifier, which checks every
 * segment, must say so. With the guard on the segments are kept out too and nothing is reported.
 */
class CornerCuttingTest {
  static Scenario scenario(boolean guard) {
    return ExampleScenarios.parse("corner", """
        vehicle v { start (2, 10) at rest speed max 8 m/s accel max 4 m/s^2 radius 0.1 m }
        area a box (0, 0) to (60, 40)
        zone wall box (29.9, 0) to (30.1, 30)
        target t point (56, 10) within 1 m at rest
        plan { step 2 s horizon 16 minimize time guard %s }
        """.formatted(guard ? "on" : "off"));
  }

  @ParameterizedTest(name = "guard {0}")
  @ValueSource(booleans = {false, true})
  void theVerifierFindsTheCutOnlyWithTheGuardOff(boolean guard) {
    PlanResult r = ExampleSolveTest.plan(scenario(guard), "scip");
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve()::summary);
    boolean cut = r.verify().violations().stream().anyMatch(v -> v.kind() == Violation.Kind.ZONE);
    assertEquals(!guard, cut, r.verify()::toString);
    if (!guard) {
      assertTrue(r.verify().violations().stream()
          .anyMatch(v -> v.kind() == Violation.Kind.ZONE && v.entity().equals("wall")), r.verify()::toString);
    }
  }
}
