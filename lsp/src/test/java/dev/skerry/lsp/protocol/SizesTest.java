package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.lsp.analysis.SizeEstimator;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextEdit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Where sizes appear, with a stub in place of the compiler's size analysis (these counts are not a formula). */
class SizesTest {
  private static final SizeEstimator.PlanSizes STUB = new SizeEstimator.PlanSizes(
      new SizeEstimator.Counts(3360, 1200, 4000), new SizeEstimator.Counts(260, 1300, 4200),
      "with 2 clusters, ordered", 2);

  @TempDir
  Path dir;

  @Test
  void withoutAnEstimatorNoSizesAppearAnywhere() throws Exception {
    String text = Marked.parse(NavigationAndHoverTest.SCENARIO).text();
    try (Harness h = new Harness(dir)) {
      assertNull(h.initialized.getCapabilities().getInlayHintProvider());
      String uri = h.open("bay.skerry", text);
      String plan = h.remote.getTextDocumentService().hover(new HoverParams(Harness.doc(uri),
          Marked.position(text, text.indexOf("horizon")))).get(5, TimeUnit.SECONDS).getContents().getRight().getValue();
      assertFalse(plan.contains("binaries"), plan);
      assertEquals(List.of(), actions(h, uri, text));
    }
  }

  @Test
  void hintsAfterTheHorizonHoverAndAClusteringActionUseTheEstimate() throws Exception {
    String text = Marked.parse(NavigationAndHoverTest.SCENARIO).text();
    List<Integer> horizonsSeen = new CopyOnWriteArrayList<>();
    SizeEstimator stub = scenario -> {
      horizonsSeen.add(scenario.plan().horizon());
      return Optional.of(STUB);
    };
    try (Harness h = new Harness(dir, Duration.ofMillis(20), stub)) {
      assertTrue(h.initialized.getCapabilities().getInlayHintProvider().getLeft());
      String uri = h.open("bay.skerry", text);
      Range all = new Range(Marked.position(text, 0), Marked.position(text, text.length()));
      List<InlayHint> hints = h.remote.getTextDocumentService().inlayHint(new InlayHintParams(Harness.doc(uri), all))
          .get(5, TimeUnit.SECONDS);
      assertEquals(1, hints.size());
      assertEquals(Marked.position(text, text.indexOf("horizon 60") + "horizon 60".length()), hints.get(0).getPosition());
      assertEquals("binaries 3,360 · continuous 1,200 · rows 4,000", hints.get(0).getLabel().getLeft());
      assertEquals(List.of(60), horizonsSeen);
      String plan = h.remote.getTextDocumentService().hover(new HoverParams(Harness.doc(uri),
          Marked.position(text, text.indexOf("horizon")))).get(5, TimeUnit.SECONDS).getContents().getRight().getValue();
      assertTrue(plan.contains("- with 2 clusters, ordered: binaries 260 · continuous 1,300 · rows 4,200"), plan);
      List<CodeAction> actions = actions(h, uri, text);
      assertEquals(List.of("Use 2 clusters: binaries 3,360 → 260"), actions.stream().map(CodeAction::getTitle).toList());
      TextEdit edit = actions.get(0).getEdit().getChanges().get(uri).get(0);
      String changed = text.substring(0, Marked.offset(text, edit.getRange().getStart())) + edit.getNewText()
          + text.substring(Marked.offset(text, edit.getRange().getEnd()));
      assertTrue(changed.contains("  horizon 60\n  clusters 2 ordered\n}"), changed);
      h.change(uri, 2, changed);
      assertEquals(List.of(), h.diagnostics(uri, 2).getDiagnostics());
      List<InlayHint> after = h.remote.getTextDocumentService().inlayHint(new InlayHintParams(Harness.doc(uri), all))
          .get(5, TimeUnit.SECONDS);
      assertEquals(List.of("binaries 3,360 · continuous 1,200 · rows 4,000",
          "with 2 clusters, ordered: binaries 260 · continuous 1,300 · rows 4,200"),
          after.stream().map(x -> x.getLabel().getLeft()).toList());
    }
  }

  private static List<CodeAction> actions(Harness h, String uri, String text) throws Exception {
    Range all = new Range(Marked.position(text, 0), Marked.position(text, text.length()));
    return h.remote.getTextDocumentService().codeAction(new CodeActionParams(Harness.doc(uri), all,
        new CodeActionContext(List.of()))).get(5, TimeUnit.SECONDS).stream().map(e -> e.getRight()).toList();
  }

  /** With the real analysis wired in (as Main does), the hint shows exactly what `skerry check` predicts. */
  @Test
  void theRealAnalysisAgreesWithTheCompiler() throws Exception {
    String text = Marked.parse(NavigationAndHoverTest.SCENARIO).text();
    try (Harness h = new Harness(dir, Duration.ofMillis(20), new dev.skerry.lsp.analysis.AnalysisSizes())) {
      String uri = h.open("bay.skerry", text);
      Range all = new Range(Marked.position(text, 0), Marked.position(text, text.length()));
      List<InlayHint> hints = h.remote.getTextDocumentService().inlayHint(new InlayHintParams(Harness.doc(uri), all))
          .get(5, TimeUnit.SECONDS);
      assertEquals(label(compilerSizes("bay.skerry", text)), hints.get(0).getLabel().getLeft());
    }
  }

  /** Hover on a zone tells the binaries it adds, the same count the analysis gives that zone. */
  @Test
  void zoneHoverShowsTheBinariesTheZoneAdds() throws Exception {
    String text = Marked.parse(NavigationAndHoverTest.SCENARIO).text();
    try (Harness h = new Harness(dir, Duration.ofMillis(20), new dev.skerry.lsp.analysis.AnalysisSizes())) {
      String uri = h.open("bay.skerry", text);
      h.diagnostics(uri, 1);
      var checked = dev.skerry.compiler.check.ScenarioChecker.check(
          dev.skerry.compiler.source.SourceFile.of(dir.resolve("bay.skerry"), text),
          new dev.skerry.compiler.check.DiskLoader(dir));
      var zone = checked.scenario().zones().get(0);
      long expected = dev.skerry.compiler.analysis.Analysis.zoneBinaries(checked.scenario()).get(zone.name());
      int at = text.indexOf("zone " + zone.name()) + 5;
      String hover = h.remote.getTextDocumentService().hover(new HoverParams(Harness.doc(uri),
          Marked.position(text, at))).get(5, TimeUnit.SECONDS).getContents().getRight().getValue();
      assertTrue(hover.contains(String.format(java.util.Locale.ROOT, "binaries it adds: %,d", expected)), hover);
    }
  }

  /**
   * A fleet in 3-D: the hint is the compiler's count, separation binaries included, and the plan
   * hover says clusters are not offered in 3-D (and no action suggests them).
   */
  @Test
  void aThreeDimensionalFleetShowsTheCompilersCountAndNoClusteringOffer() throws Exception {
    String text = """
        vehicle a { start (5, 5, 10) at rest speed max 2 m/s accel max 1 m/s^2 climb max 1 m/s radius 1 m }
        vehicle b { start (5, 40, 10) at rest speed max 2 m/s accel max 1 m/s^2 climb max 1 m/s radius 1 m }
        area sea box (0, 0, 0) to (60, 50, 30)
        zone mast box (20, 15) to (24, 30) altitude 0 m to 20 m
        target east box (50, 20) to (56, 26) at rest
        target west box (50, 35) to (56, 41) at rest
        plan {
          step 2 s
          horizon 20
          dimensions 3
          separation 4 m
        }
        """;
    try (Harness h = new Harness(dir, Duration.ofMillis(20), new dev.skerry.lsp.analysis.AnalysisSizes())) {
      String uri = h.open("fleet.skerry", text);
      assertEquals(List.of(), h.diagnostics(uri, 1).getDiagnostics());
      Range all = new Range(Marked.position(text, 0), Marked.position(text, text.length()));
      List<InlayHint> hints = h.remote.getTextDocumentService().inlayHint(new InlayHintParams(Harness.doc(uri), all))
          .get(5, TimeUnit.SECONDS);
      var sizes = compilerSizes("fleet.skerry", text);
      assertTrue(sizes.separationBinaries() > 0, sizes.toString());
      assertEquals(label(sizes), hints.get(0).getLabel().getLeft());
      String plan = h.remote.getTextDocumentService().hover(new HoverParams(Harness.doc(uri),
          Marked.position(text, text.indexOf("horizon")))).get(5, TimeUnit.SECONDS).getContents().getRight().getValue();
      assertTrue(plan.contains("clusters: not available in 3-D"), plan);
      assertTrue(plan.contains("fleet of 2 vehicles, at least 4 m apart"), plan);
      assertEquals(List.of(), actions(h, uri, text));
    }
  }

  /** What `skerry check` predicts for the text, from the compiler itself. */
  private dev.skerry.compiler.analysis.Sizes compilerSizes(String name, String text) {
    var checked = dev.skerry.compiler.check.ScenarioChecker.check(
        dev.skerry.compiler.source.SourceFile.of(dir.resolve(name), text), new dev.skerry.compiler.check.DiskLoader(dir));
    return dev.skerry.compiler.analysis.Analysis.sizes(checked.scenario());
  }

  private static String label(dev.skerry.compiler.analysis.Sizes sizes) {
    return String.format(java.util.Locale.ROOT, "binaries %,d · continuous %,d · rows %,d", sizes.binaries(),
        sizes.continuous(), sizes.rows());
  }
}
