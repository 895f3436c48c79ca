package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticRelatedInformation;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DiagnosticsTest {
  static final String SHORT_HORIZON = """
      vehicle v {
        start (5, 5) at rest
        speed max 2 m/s
        accel max 1 m/s^2
        radius 0.5 m
      }
      area a box (0, 0) to (100, 100)
      target «t1» box (80, 80) to (90, 90) at rest
      plan {
        step 1 s
        «horizon 20»
      }
      """;

  @TempDir
  Path dir;

  static Diagnostic only(PublishDiagnosticsParams p, String code) {
    List<Diagnostic> found = p.getDiagnostics().stream().filter(d -> code.equals(d.getCode().getLeft())).toList();
    assertEquals(1, found.size(), () -> "expected one " + code + " in " + p.getDiagnostics());
    return found.get(0);
  }

  @Test
  void publishesTheCheckersCodeRangeSeverityAndRelatedPlace() throws Exception {
    Marked m = Marked.parse(SHORT_HORIZON);
    try (Harness h = new Harness(dir)) {
      String uri = h.open("short.skerry", m.text());
      PublishDiagnosticsParams p = h.diagnostics(uri, 1);
      assertEquals(1, p.getDiagnostics().size(), p.getDiagnostics()::toString);
      Diagnostic d = only(p, "horizon-too-short");
      assertEquals("horizon 20", Marked.covered(m.text(), d.getRange()));
      assertEquals(DiagnosticSeverity.Error, d.getSeverity());
      assertEquals("skerry", d.getSource());
      assertTrue(d.getMessage().contains("raise the horizon"), d.getMessage());
      DiagnosticRelatedInformation related = d.getRelatedInformation().get(0);
      assertEquals(uri, related.getLocation().getUri());
      assertEquals("t1", Marked.covered(m.text(), related.getLocation().getRange()));
    }
  }

  @Test
  void aCleanExampleWithItsIncludePublishesAnEmptyList() throws Exception {
    Path examples = Path.of("..", "examples").toAbsolutePath().normalize();
    String main = Files.readString(examples.resolve("harbour_survey.skerry"));
    try (Harness h = new Harness(dir)) {
      h.write("shared/tern_cove_moorings.skerry", Files.readString(examples.resolve("shared/tern_cove_moorings.skerry")));
      String uri = h.open("harbour_survey.skerry", main);
      assertEquals(List.of(), h.diagnostics(uri, 1).getDiagnostics());
    }
  }

  @Test
  void aProblemInsideAnIncludedFileShowsOnTheIncludeLineAndPointsIntoTheFile() throws Exception {
    Marked m = Marked.parse(SHORT_HORIZON.replace("«horizon 20»", "horizon 60").replace("«t1»", "t1")
        + "include «\"rocks.inc\"»\n");
    try (Harness h = new Harness(dir)) {
      h.write("rocks.inc", "zone reef box (40, 40) to (50, 50)\nzone bad box (1, 2) too (3, 4)\n");
      String uri = h.open("main.skerry", m.text());
      Diagnostic d = only(h.diagnostics(uri, 1), "syntax-error");
      int[] include = m.ranges().get(0);
      assertEquals("\"rocks.inc\"", m.text().substring(include[0], include[1]));
      assertEquals("\"rocks.inc\"", Marked.covered(m.text(), d.getRange()));
      assertTrue(d.getMessage().startsWith("in rocks.inc:2:"), d.getMessage());
      DiagnosticRelatedInformation inFile = d.getRelatedInformation().get(0);
      assertEquals(h.uri("rocks.inc"), inFile.getLocation().getUri());
      assertEquals(1, inFile.getLocation().getRange().getStart().getLine());
    }
  }

  @Test
  void anUnsavedEditToAnOpenIncludeRechecksTheDocumentThatIncludesIt() throws Exception {
    String main = SHORT_HORIZON.replace("«horizon 20»", "horizon 60").replace("«t1»", "t1") + "include \"dock.inc\"\n";
    try (Harness h = new Harness(dir)) {
      h.write("dock.inc", "zone dock box (40, 40) to (50, 50)\n");
      String uri = h.open("main.skerry", main);
      assertEquals(List.of(), h.diagnostics(uri, 1).getDiagnostics());
      String inc = h.open("dock.inc", "zone dock box (40, 40) to (50, 50)\n");
      h.change(inc, 2, "zone dock box (0, 0) to (10, 10)\n");
      PublishDiagnosticsParams after = h.client.await(uri, p -> !p.getDiagnostics().isEmpty());
      Diagnostic d = only(after, "start-inside-zone");
      assertEquals("dock.inc", Path.of(java.net.URI.create(d.getRelatedInformation().get(0).getLocation().getUri()))
          .getFileName().toString());
      assertTrue(Files.readString(dir.resolve("dock.inc")).contains("(40, 40)"), "the disk copy is untouched");
    }
  }

  @Test
  void rapidEditsPublishOnlyNewerVersionsAndEndWithTheLast() throws Exception {
    String base = Marked.parse(SHORT_HORIZON).text();
    try (Harness h = new Harness(dir, java.time.Duration.ofMillis(100))) {
      String uri = h.open("typing.skerry", base);
      int last = 41;
      for (int v = 2; v <= last; v++) {
        h.change(uri, v, base.replace("horizon 20", "horizon " + (v < last ? 20 : 60)));
      }
      PublishDiagnosticsParams end = h.diagnostics(uri, last);
      assertEquals(List.of(), end.getDiagnostics(), "the last text has a long enough horizon");
      List<Integer> versions = h.client.publishedFor(uri).stream().map(PublishDiagnosticsParams::getVersion).toList();
      for (int i = 1; i < versions.size(); i++) {
        assertTrue(versions.get(i) > versions.get(i - 1), () -> "published out of order: " + versions);
      }
      assertTrue(versions.size() < 10, () -> "40 edits in a burst should not each be published: " + versions);
      long runs = h.server.scheduler().runs();
      assertTrue(runs < 10, () -> "40 edits in a burst should not each be checked: " + runs + " runs");
    }
  }
}
