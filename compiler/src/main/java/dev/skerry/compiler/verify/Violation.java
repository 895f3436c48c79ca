package dev.skerry.compiler.verify;

/**
 * One way a plan breaks the scenario, with the amount: how deep into a zone, how far outside the
 * area, how much over a limit, in SI units.
 */
public record Violation(Kind kind, int step, String entity, double amount, String message) {
  public enum Kind {
    ZONE("zone"),
    AREA("area"),
    SPEED("speed"),
    ACCEL("accel"),
    DYNAMICS("dynamics"),
    TARGET("target"),
    WAYPOINT("waypoint"),
    SEPARATION("separation"),
    ALTITUDE("altitude"),
    CLIMB("climb");

    private final String word;

    Kind(String word) {
      this.word = word;
    }

    public String word() {
      return word;
    }
  }
}
