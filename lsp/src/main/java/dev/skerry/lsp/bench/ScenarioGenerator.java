package dev.skerry.lsp.bench;

import java.util.Locale;

/** A large, clean scenario for measuring the server: a grid of small box zones between a start and a berth. */
final class ScenarioGenerator {
  private ScenarioGenerator() {}

  /** About {@code lines} lines: a header, a vehicle, the area, one zone per line, a target and a plan. */
  static String generate(int lines) {
    int zones = Math.max(1, lines - 20);
    int columns = (int) Math.ceil(Math.sqrt(zones * 1.3));
    StringBuilder out = new StringBuilder();
    out.append("// Generated for the language-server benchmark: a field of ").append(zones).append(" rocks.\n");
    out.append("scenario generated_field\nunits m, s\n\nconst margin = 0.5 m\n\n");
    out.append("vehicle boat {\n  start (1, 1) at rest\n  speed max 5 m/s\n  accel max 1 m/s^2\n  radius margin\n}\n\n");
    int rows = (zones + columns - 1) / columns;
    double width = columns * 10.0 + 10;
    double height = rows * 10.0 + 10;
    out.append(String.format(Locale.ROOT, "area field box (0, 0) to (%.0f, %.0f)%n%n", width, height));
    for (int i = 0; i < zones; i++) {
      double x = 8 + (i % columns) * 10.0;
      double y = 8 + (i / columns) * 10.0;
      out.append(String.format(Locale.ROOT, "zone rock_%04d box (%.1f, %.1f) to (%.1f, %.1f)%n", i, x, y, x + 2, y + 2));
    }
    out.append(String.format(Locale.ROOT, "%ntarget berth point (%.0f, %.0f) within 2 m at rest%n", width - 3, height - 3));
    out.append("\nplan {\n  step 2 s\n  horizon 200\n  minimize time\n}\n");
    return out.toString();
  }
}
