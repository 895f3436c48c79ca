package dev.skerry.compiler.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import dev.skerry.compiler.cli.SkerryCliAccess;
import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `skerry compare --report` writes a page a real browser renders (Debian's Chromium, headless) to a
 * picture that is not blank, and the chart's numbers are the ones in the JSON.
 */
class CompareReportTest {
  @TempDir Path dir;

  static final String SCENARIO = """
      vehicle v { start (0, 0) at rest speed max 3 m/s accel max 2 m/s^2 radius 0.5 m }
      area a box (-5, -5) to (25, 15)
      zone block box (6, -5) to (9, 5)
      zone post box (12, 6) to (13, 7)
      target t point (16, 0) within 1 m at rest
      plan { step 1 s horizon 12 minimize time + 0.2 fuel closed_loop max 20 solver scip }
      """;

  @Test
  void theReportRendersInChromiumAndItsChartMatchesTheJson() throws Exception {
    Path file = Files.writeString(dir.resolve("loop.skerry"), SCENARIO);
    Path out = dir.resolve("report");
    Path json = dir.resolve("runs.json");
    int code = SkerryCliAccess.run("compare", file.toString(), "--clusters", "none,1", "--report", out.toString(),
        "--json", json.toString(), "--root", dir.toString());
    assertEquals(0, code, "compare should arrive with verified paths");
    String html = Files.readString(out.resolve("index.html"));
    assertTrue(html.contains("not certified"), "the caution is on the page");
    JsonArray runs = JsonParser.parseString(Files.readString(json)).getAsJsonObject().getAsJsonArray("runs");
    assertEquals(2, runs.size());
    List<Double> expected = new ArrayList<>();
    for (JsonElement run : runs) {
      for (JsonElement it : run.getAsJsonObject().getAsJsonArray("iterationLog")) {
        JsonObject o = it.getAsJsonObject();
        expected.add(o.get("predictedTotal").getAsDouble());
      }
    }
    List<Double> charted = new ArrayList<>();
    Matcher m = Pattern.compile("class=\"predicted\" data-iteration=\"\\d+\" data-value=\"([^\"]+)\"").matcher(html);
    while (m.find()) {
      charted.add(Double.parseDouble(m.group(1)));
    }
    assertEquals(expected, charted, "the chart plots the JSON's predicted totals");

    // Outside judge: Debian's Chromium renders the page headless to a screenshot.
    Path png = dir.resolve("shot.png");
    Process p = new ProcessBuilder("chromium", "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic",
        "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync",
        "--user-data-dir=" + dir.resolve("profile"), "--window-size=1200,1600", "--screenshot=" + png,
        out.resolve("index.html").toUri().toString()).redirectErrorStream(true).start();
    String log = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(p.waitFor(120, TimeUnit.SECONDS), "chromium hung");
    assertTrue(Files.exists(png), "no screenshot (is Debian's chromium installed?): " + log);
    BufferedImage image = ImageIO.read(new File(png.toString()));
    Set<Integer> colours = new HashSet<>();
    for (int y = 0; y < image.getHeight(); y += 4) {
      for (int x = 0; x < image.getWidth(); x += 4) {
        colours.add(image.getRGB(x, y));
      }
    }
    assertTrue(colours.size() > 20, "the screenshot looks blank: " + colours.size() + " colours");
  }
}
