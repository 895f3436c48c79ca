package dev.skerry.compiler.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.plan.ClusterBox;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.source.SourceFile;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

class SvgPlotTest {
  @TempDir Path dir;

  static Scenario harbour() throws Exception {
    Path file = Path.of("../examples/harbour_survey.skerry").toAbsolutePath().normalize();
    return ScenarioChecker.check(SourceFile.of(file, Files.readString(file)), new DiskLoader(file.getParent())).scenario();
  }

  static Trajectory line(Vec2 from, Vec2 to, int steps) {
    List<Sample> samples = new ArrayList<>();
    Vec2 v = to.minus(from).times(1.0 / steps);
    for (int k = 0; k <= steps; k++) {
      samples.add(new Sample(k, k, from.plus(v.times(k)), k < steps ? v : Vec2.ZERO, Vec2.ZERO));
    }
    return new Trajectory("skiff", 1, samples, steps);
  }

  @Test
  void theSvgIsWellFormedWithItsPartsAndRendersWithARealRenderer() throws Exception {
    Scenario s = harbour();
    Trajectory path = line(s.vehicle().start(), new Vec2(110, 58), 20);
    List<ClusterBox> clusters = List.of(new ClusterBox("c1", new Bounds(10, 30, 30, 55), List.of("hull_a", "hull_b")));
    String svg = SvgPlot.render(s, path, clusters, "tern_cove_survey — test path");
    Document doc = DocumentBuilderFactory.newInstance().newDocumentBuilder()
        .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    assertEquals("svg", doc.getDocumentElement().getTagName());
    for (String id : List.of("area", "zones", "target", "path", "start", "arrival", "legend", "scale-bar", "axes", "clusters")) {
      assertTrue(svg.contains("id=\"" + id + "\""), "missing element " + id);
    }
    assertEquals(21, svg.split("class=\"step\"", -1).length - 1, "one marker per step 0..20");
    assertTrue(svg.contains("not certified"), "the caution is shown");
    // Outside judge: librsvg's rsvg-convert (Debian librsvg2-bin) must render it without error.
    Path svgFile = Files.writeString(dir.resolve("plan.svg"), svg);
    Path png = dir.resolve("plan.png");
    Process p = new ProcessBuilder("rsvg-convert", "-o", png.toString(), svgFile.toString()).redirectErrorStream(true).start();
    assertTrue(p.waitFor(60, TimeUnit.SECONDS), "rsvg-convert hung");
    String log = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertEquals(0, p.exitValue(), "rsvg-convert failed (is librsvg2-bin installed?): " + log);
    byte[] bytes = Files.readAllBytes(png);
    if (System.getProperty("skerry.keepPictures") != null) {
      Files.copy(png, Path.of(System.getProperty("skerry.keepPictures")), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    }
    assertTrue(bytes.length > 1000 && bytes[1] == 'P' && bytes[2] == 'N' && bytes[3] == 'G', "not a PNG");
  }

  @Test
  void eachUsedClusterTintsItsOwnZonesAndAnUnusedOneIsNotDrawn() throws Exception {
    Scenario s = harbour();
    List<ClusterBox> clusters = List.of(
        new ClusterBox("c1", new Bounds(29, -1, 63, 41), List.of("stone_pier", "shoal")),
        new ClusterBox("c2", new Bounds(63, 41, 71, 71), List.of("fuel_jetty")),
        new ClusterBox("c3", new Bounds(64, 42, 36, 28), List.of()));
    String svg = SvgPlot.render(s, null, clusters, "tinted");
    Document doc = DocumentBuilderFactory.newInstance().newDocumentBuilder()
        .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    org.w3c.dom.NodeList polygons = doc.getElementsByTagName("polygon");
    java.util.Map<String, String> tint = new java.util.HashMap<>();
    for (int i = 0; i < polygons.getLength(); i++) {
      org.w3c.dom.Element e = (org.w3c.dom.Element) polygons.item(i);
      if (e.getAttribute("class").equals("cluster-member")) {
        tint.merge(e.getAttribute("data-cluster"), e.getAttribute("fill"), (a, b) -> {
          assertEquals(a, b, "one hue per cluster");
          return a;
        });
      }
    }
    assertEquals(3, svg.split("class=\"cluster-member\"", -1).length - 1, "one tint per clustered zone");
    assertEquals(java.util.Set.of("c1", "c2"), tint.keySet());
    assertTrue(!tint.get("c1").equals(tint.get("c2")), "two clusters, two hues: " + tint);
    assertTrue(svg.contains("c1 (2 zones)") && svg.contains("c2 (1 zones)"));
    assertTrue(!svg.contains("c3 ("), "the unused cluster's collapsed box is not drawn");
  }
}
