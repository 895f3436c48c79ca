package dev.skerry.compiler.fleet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import dev.skerry.compiler.cli.SkerryCliAccess;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `skerry compare` and `skerry run` with a fleet written in the language, end to end. */
class FleetCommandsTest {
  @TempDir Path dir;

  /** Two craft crossing a small basin head-on, one 3 m box between their tracks' meeting point and a shore. */
  static final String CROSSING = """
      vehicle east { start (2, 7) at rest speed max 3 m/s accel max 1 m/s^2 radius 0.5 m target far }
      vehicle west { start (28, 7) at rest speed max 3 m/s accel max 1 m/s^2 radius 0.5 m target near }
      area basin box (0, 0) to (30, 14)
      zone buoy box (14, 11) to (16, 13)
      target far box (27.5, 6.5) to (28.5, 7.5) at rest
      target near box (1.5, 6.5) to (2.5, 7.5) at rest
      plan { step 1 s horizon 16 minimize time + 0.1 fuel separation 3 m closed_loop max 30 solver scip }
      """;

  @Test
  void compareFliesTheFleetPerConfigurationAndVerifiesSeparation() throws Exception {
    Path file = Files.writeString(dir.resolve("crossing.skerry"), CROSSING);
    Path json = dir.resolve("runs.json");
    Path report = dir.resolve("report");
    int code = SkerryCliAccess.run("compare", file.toString(), "--clusters", "none,1", "--json", json.toString(),
        "--report", report.toString(), "--root", dir.toString());
    assertEquals(0, code, "compare should arrive with verified paths");
    JsonArray runs = JsonParser.parseString(Files.readString(json)).getAsJsonObject().getAsJsonArray("runs");
    assertEquals(2, runs.size());
    for (var run : runs) {
      JsonObject o = run.getAsJsonObject();
      assertTrue(o.get("verified").getAsBoolean(), o.toString());
      assertEquals("arrived", o.get("stop").getAsString());
      assertEquals(2, o.getAsJsonArray("vehicles").size());
    }
    String html = Files.readString(report.resolve("index.html"));
    assertTrue(html.contains("east") && html.contains("west"), "both vehicles are drawn");
  }

  @Test
  void checkCountsTheSeparationBinaries() throws Exception {
    Path file = Files.writeString(dir.resolve("crossing.skerry"), CROSSING.replace("separation 3 m",
        "separation 3 m pruning off"));
    assertEquals(0, SkerryCliAccess.run("check", file.toString(), "--json", "--root", dir.toString()));
    // Unpruned, guard on: 4 faces per pair and segment, 16 segments (common practice).
    String out = SkerryCliAccess.lastOut();
    JsonObject sizes = JsonParser.parseString(out).getAsJsonObject().getAsJsonArray("files").get(0).getAsJsonObject()
        .getAsJsonObject("sizes");
    assertEquals(4 * 16, sizes.getAsJsonObject("asWritten").getAsJsonObject("binariesByCause").get("separation")
        .getAsInt());
  }
}
