package dev.skerry.compiler.plan;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * The shipped examples as scenarios, and a small and a tiny version of each derived from its text
 * (a nearer target, a shorter horizon, fewer zones), small enough for in-process CBC and for ojAlgo
 * in a unit test. Each edit must match the example's text, so a changed example fails loudly here
 * instead of silently testing something else.
 */
public final class ExampleScenarios {
  /** The examples folder, from the compiler module (where tests run) or the repository root. */
  public static final Path EXAMPLES = Files.isDirectory(Path.of("../examples")) ? Path.of("../examples") : Path.of("examples");

  /** Every example in the folder (a test checks that none is missing). */
  public static final List<String> NAMES =
      List.of("warehouse_floor", "harbour_survey", "rock_field", "ridge_drone", "twin_skiffs");

  /** The examples with one vehicle in the plane, the ones the zone-by-zone start heuristic is for. */
  public static final List<String> PLANAR_SINGLE = List.of("warehouse_floor", "harbour_survey", "rock_field");

  private ExampleScenarios() {}

  public static Path file(String name) {
    return EXAMPLES.resolve(name + ".skerry");
  }

  public static String text(String name) {
    try {
      return Files.readString(file(name));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  public static Scenario full(String name) {
    return parse(name, text(name));
  }

  /** The small version of an example (see the class comment). */
  public static Scenario small(String name) {
    return parse(name, smallText(name));
  }

  /** The small version with another horizon (steps). */
  public static Scenario small(String name, int horizon) {
    return parse(name, smallText(name).replaceFirst("horizon \\d+", "horizon " + horizon));
  }

  /** The small version with another horizon and the plan's clusters line replaced (e.g. by "clusters 1"). */
  public static Scenario small(String name, int horizon, String clusters) {
    String t = smallText(name).replaceFirst("horizon \\d+", "horizon " + horizon);
    return parse(name, clusters == null ? t : edit(t, "clusters 2 ordered", clusters));
  }

  /**
   * A version small enough for ojAlgo in a unit test (a few seconds each, measured): the small
   * version cut to a horizon just above its minimum time; for the rock field, only the three rocks
   * beside the direct line, still in two clusters chosen by the MILP (2–3 s; before the
   * containment rows' right-hand sides were made exact, ojAlgo called every clustered rock field
   * infeasible, see {@code ClusterLowering.roomAtOne}).
   */
  public static Scenario tiny(String name) {
    switch (name) {
      case "warehouse_floor":
        return small(name, 10);
      case "harbour_survey":
        return small(name, 13);
      case "rock_field":
        String t = smallText(name).replaceFirst("horizon \\d+", "horizon 9");
        t = t.replaceAll("(?m)^zone rock_(0[135-9]) .*$", "");
        return parse(name, t);
      case "ridge_drone":
        // A lower ridge and a pad just past it (no cloud bank on the way): 79 binaries, ojAlgo 4.6 s.
        t = edit(text(name), "altitude 0 m to 35 m", "altitude 0 m to 15 m");
        t = edit(t, "target pad point (185, 40, 2)", "target pad point (125, 40, 2)");
        return parse(name, edit(t, "horizon 20", "horizon 12"));
      case "twin_skiffs":
        return parse(name, smallText(name));
      default:
        throw new IllegalArgumentException("no tiny version of " + name);
    }
  }

  public static String smallText(String name) {
    String t = text(name);
    switch (name) {
      case "warehouse_floor":
        // Round the west end of row 1 into the first aisle instead of crossing the hall.
        t = edit(t, "target pick_face point (20, 10) within 0.5 m at rest", "target pick_face point (10, 6.5) within 0.5 m at rest");
        t = edit(t, "horizon 40", "horizon 14");
        return t;
      case "harbour_survey":
        // Only the pier, the jetty and the shoal; no moorings, no waypoint; a berth just past the pier.
        t = edit(t, "include \"shared/tern_cove_moorings.skerry\"", "");
        t = edit(t, "waypoint tide_gauge (90, 20) within 3 m", "");
        t = edit(t, "target survey_berth box (108, 56) to (114, 62) at rest", "target survey_berth box (40, 4) to (44, 8) at rest");
        t = edit(t, "horizon 40", "horizon 16");
        return t;
      case "rock_field":
        // The ten rocks nearest the slip, two clusters, a mooring just past them.
        t = t.replaceAll("(?m)^zone rock_(1[1-9]|[2-4][0-9]) .*$", "");
        t = edit(t, "target mooring point (190, 52) within 2 m at rest", "target mooring point (52, 40) within 2 m at rest");
        t = edit(t, "horizon 30", "horizon 12");
        t = edit(t, "clusters 3 ordered", "clusters 2 ordered");
        return t;
      case "ridge_drone":
        // Already small: 184 binaries, in-process CBC under a second.
        return t;
      case "twin_skiffs":
        // Only seal rock between the launches and two stations a third of the way across, which
        // still puts the crossing tracks over it: 115 binaries, ojAlgo 14 s, SCIP 0.6 s.
        for (String rock : List.of("gull_rock", "low_rock", "kelp_ledge")) {
          edit(t, "zone " + rock + " ", "");
          t = t.replaceFirst("(?m)^zone " + rock + " .*$", "");
        }
        t = edit(t, "station_east box (70, 36) to (76, 42)", "station_east box (36, 34) to (40, 38)");
        t = edit(t, "station_south box (70, 8) to (76, 14)", "station_south box (36, 12) to (40, 16)");
        return edit(t, "horizon 20", "horizon 12");
      default:
        throw new IllegalArgumentException("no small version of " + name);
    }
  }

  private static String edit(String text, String from, String to) {
    if (!text.contains(from)) {
      throw new IllegalStateException("the example no longer contains: " + from);
    }
    return text.replace(from, to);
  }

  public static Scenario parse(String name, String text) {
    Path root = EXAMPLES.toAbsolutePath().normalize();
    CheckResult r = ScenarioChecker.check(SourceFile.of(root.resolve(name + ".skerry"), text), new DiskLoader(root));
    if (r.hasErrors() || r.scenario() == null) {
      throw new IllegalStateException(name + " has errors: " + r.diagnostics());
    }
    return r.scenario();
  }
}
