package dev.skerry.compiler.crosscheck;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * Small scenarios written as Skerry text from a seed, for the outside cross-checks: a box area, one
 * vehicle at rest on the west side, a target to the east, 1–3 box or polygon zones in the band
 * between them, a waypoint now and then, 6–10 steps, a time, fuel or weighted objective, clusters
 * 0/1/2 and guard and pruning on or off. Every size is kept small enough for {@code cbc} and {@code
 * glpsol} to prove the optimum in about a second. The text goes through the real front end, so
 * these cases test the path a user's file takes.
 */
final class GeneratedScenarios {
  private GeneratedScenarios() {}

  /** One generated case: its seed, a short description for test names, and its text. */
  record Case(long seed, String label, String text) {
    @Override
    public String toString() {
      return "seed " + seed + " (" + label + ")";
    }
  }

  static Case of(long seed) {
    Random r = new Random(seed);
    // The discrete choices cycle with the seed, so that any 12 consecutive seeds cover each of
    // them; the geometry and limits are random.
    int zones = 1 + (int) (seed % 3);
    int clusters = zones == 1 ? 0 : (int) (seed / 3 % 3);
    boolean guard = seed / 2 % 2 == 0;
    boolean pruning = seed % 4 != 3;
    boolean waypoint = seed % 5 == 2;
    int objectiveKind = (int) (seed / 4 % 3);
    int steps = 6 + r.nextInt(5);
    double accel = 1 + r.nextInt(3) * 0.5;
    double speed = 2 + r.nextInt(3);
    double radius = r.nextInt(3) * 0.25;
    // Rest to rest, k unit steps cover at most accel·g(k) with g(k) = ⌊k/2⌋·⌈k/2⌉; aim at 45 % of
    // what the whole horizon allows (and what the speed limit allows), so the horizon is not tight.
    double reach = Math.min(accel * (steps / 2) * ((steps + 1) / 2), speed * (steps - 1));
    double distance = Math.max(4, Math.round(0.45 * reach));
    double width = distance + 12;
    double height = 20;
    double y0 = height / 2;
    StringBuilder t = new StringBuilder();
    StringBuilder label = new StringBuilder("N=" + steps);
    t.append("// generated cross-check case, seed ").append(seed).append('\n');
    t.append("scenario xcheck_").append(seed).append('\n');
    t.append("units m, s\n\n");
    t.append("vehicle probe {\n");
    t.append("  start (").append(num(4)).append(", ").append(num(y0)).append(") at rest\n");
    t.append("  speed max ").append(num(speed)).append(" m/s\n");
    t.append("  accel max ").append(num(accel)).append(" m/s^2\n");
    t.append("  radius ").append(num(radius)).append(" m\n");
    t.append("  sides ").append(8 + 4 * r.nextInt(3)).append('\n');
    t.append("}\n\n");
    t.append("area yard box (0, 0) to (").append(num(width)).append(", ").append(num(height)).append(")\n");
    int polygons = 0;
    for (int z = 0; z < zones; z++) {
      double cx = 4 + distance * (0.3 + 0.4 * r.nextDouble());
      double cy = y0 + (r.nextDouble() - 0.5) * 3;
      double hw = 0.4 + 0.6 * r.nextDouble();
      double hh = 0.4 + 1.1 * r.nextDouble();
      if (r.nextBoolean()) {
        t.append("zone z").append(z).append(" box (").append(num(cx - hw)).append(", ").append(num(cy - hh))
            .append(") to (").append(num(cx + hw)).append(", ").append(num(cy + hh)).append(")\n");
      } else {
        polygons++;
        // A convex quadrilateral, corners counter-clockwise: a diamond leaning a little east.
        t.append("zone z").append(z).append(" polygon (").append(num(cx)).append(", ").append(num(cy - hh))
            .append(") (").append(num(cx + hw)).append(", ").append(num(cy)).append(") (")
            .append(num(cx + 0.2 * hw)).append(", ").append(num(cy + hh)).append(") (")
            .append(num(cx - hw)).append(", ").append(num(cy + 0.1 * hh)).append(")\n");
      }
    }
    label.append(", zones=").append(zones).append(" (").append(polygons).append(" polygon)");
    if (waypoint) {
      double wx = 4 + distance * (0.4 + 0.2 * r.nextDouble());
      double wy = y0 + (r.nextBoolean() ? 1 : -1) * (3 + r.nextDouble());
      t.append("waypoint mark (").append(num(wx)).append(", ").append(num(wy)).append(") within 1 m\n");
      label.append(", waypoint");
    }
    t.append("target dock box (").append(num(4 + distance - 1)).append(", ").append(num(y0 - 1))
        .append(") to (").append(num(4 + distance + 1)).append(", ").append(num(y0 + 1)).append(")")
        .append(r.nextBoolean() ? " at rest" : "").append("\n\n");
    String objective;
    switch (objectiveKind) {
      case 0:
        objective = "time";
        break;
      case 1:
        objective = "fuel";
        break;
      default:
        objective = "time + " + num(0.05 + 0.05 * r.nextInt(4)) + " fuel";
        break;
    }
    t.append("plan {\n");
    t.append("  step 1 s\n");
    t.append("  horizon ").append(steps).append('\n');
    t.append("  minimize ").append(objective).append('\n');
    if (clusters > 0) {
      t.append("  clusters ").append(clusters).append(" ordered\n");
    }
    t.append("  guard ").append(guard ? "on" : "off").append('\n');
    t.append("  pruning ").append(pruning ? "on" : "off").append('\n');
    t.append("}\n");
    label.append(", ").append(objective).append(", clusters=").append(clusters)
        .append(guard ? ", guard" : ", no guard").append(pruning ? ", pruned" : ", unpruned");
    return new Case(seed, label.toString(), t.toString());
  }

  /** Checks a case's text with the real front end, from a file name in {@code folder}. */
  static CheckResult check(Case c, Path folder) {
    Path file = folder.resolve("xcheck_" + c.seed() + ".skerry");
    return ScenarioChecker.check(SourceFile.of(file, c.text()), new DiskLoader(folder));
  }

  private static String num(double v) {
    return String.format(Locale.ROOT, "%.2f", v);
  }
}
