package dev.skerry.compiler.plan;

import dev.skerry.compiler.model.Scenario;

/** Scenarios that look fine to the checker but have no plan. */
public final class BadInputScenarios {
  private BadInputScenarios() {}

  /** Two zones that together wall the area off from top to bottom; each alone leaves a gap. */
  public static final String WALLED_OFF = """
      vehicle v { start (2, 10) at rest speed max 3 m/s accel max 1 m/s^2 radius 0.2 m }
      area a box (0, 0) to (40, 20)
      zone lower box (18, 0) to (20, 11)
      zone upper box (19, 10) to (21, 20)
      target t point (36, 10) within 1 m at rest
      plan { step 1 s horizon 30 minimize time }
      """;

  public static Scenario walledOff() {
    return ExampleScenarios.parse("walled_off", WALLED_OFF);
  }
}
