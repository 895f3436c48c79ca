package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextEdit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EditingFeaturesTest {
  @TempDir
  Path dir;

  private static List<String> complete(Harness h, String name, String marked) throws Exception {
    Marked m = Marked.parse(marked);
    String uri = h.open(name, m.text());
    h.diagnostics(uri, 1);
    List<CompletionItem> items = h.remote.getTextDocumentService()
        .completion(new CompletionParams(Harness.doc(uri), m.cursorPosition())).get(5, TimeUnit.SECONDS)
        .getRight().getItems();
    return items.stream().map(CompletionItem::getLabel).toList();
  }

  @Test
  void completionOffersWhatFitsTheCursor() throws Exception {
    String body = """
        const gap = 2 m
        vehicle v {
          start (5, 5) at rest
          %s
        }
        plan {
          step 1 s
          %s
        }
        %s
        """;
    try (Harness h = new Harness(dir)) {
      List<String> inVehicle = complete(h, "a.skerry", body.formatted("|", "", ""));
      assertEquals(List.of("dynamics", "speed", "accel", "radius", "sides", "target", "climb", "altitude"), inVehicle,
          "start is already given");
      List<String> inPlan = complete(h, "b.skerry", body.formatted("", "ho|", ""));
      assertEquals(List.of("horizon"), inPlan);
      List<String> top = complete(h, "c.skerry", body.formatted("", "", "z|"));
      assertEquals(List.of("zone"), top);
      List<String> units = complete(h, "d.skerry", body.formatted("speed max 3 |", "", ""));
      assertTrue(units.containsAll(List.of("m", "kn", "m/s", "m/s^2")), units::toString);
      assertFalse(units.contains("speed"), units::toString);
      List<String> afterSpeed = complete(h, "e.skerry", body.formatted("speed |", "", ""));
      assertEquals(List.of("max"), afterSpeed);
      List<String> value = complete(h, "f.skerry", body.formatted("radius |", "", ""));
      assertEquals(List.of("gap"), value);
      List<String> shape = complete(h, "g.skerry", body.formatted("", "", "zone reef |"));
      assertEquals(List.of("box", "polygon"), shape);
      List<String> inComment = complete(h, "h.skerry", body.formatted("# spe|", "", ""));
      assertEquals(List.of(), inComment);
    }
  }

  @Test
  void outlineListsDeclarationsWithBlockLinesAsChildren() throws Exception {
    String text = Marked.parse(NavigationAndHoverTest.SCENARIO).text();
    try (Harness h = new Harness(dir)) {
      String uri = h.open("bay.skerry", text);
      List<DocumentSymbol> symbols = h.remote.getTextDocumentService()
          .documentSymbol(new DocumentSymbolParams(Harness.doc(uri))).get(5, TimeUnit.SECONDS)
          .stream().map(e -> e.getRight()).toList();
      assertEquals(List.of("units", "gap", "skiff", "bay", "pier", "shoal", "berth", "plan"),
          symbols.stream().map(DocumentSymbol::getName).toList());
      DocumentSymbol skiff = symbols.get(2);
      assertEquals("skiff", Marked.covered(text, skiff.getSelectionRange()));
      assertTrue(Marked.covered(text, skiff.getRange()).startsWith("vehicle skiff {"));
      assertTrue(Marked.covered(text, skiff.getRange()).endsWith("}"));
      assertEquals(List.of("start", "speed", "accel", "radius"),
          skiff.getChildren().stream().map(DocumentSymbol::getName).toList());
      assertEquals("polygon", symbols.get(5).getDetail().split(" ")[1]);
    }
  }

  @Test
  void foldsBlocksAndMultiLineCommentsEvenInBrokenText() throws Exception {
    String text = """
        /* a note
           over two lines */
        vehicle v {
          start (5, 5) at rest
          speed max ((
        }
        plan { step 1 s }
        plan {
          horizon 4
        }
        """;
    try (Harness h = new Harness(dir)) {
      String uri = h.open("f.skerry", text);
      List<FoldingRange> ranges = h.remote.getTextDocumentService()
          .foldingRange(new FoldingRangeRequestParams(Harness.doc(uri))).get(5, TimeUnit.SECONDS);
      List<String> shown = ranges.stream().map(r -> r.getStartLine() + "-" + r.getEndLine()
          + (r.getKind() == null ? "" : " " + r.getKind())).toList();
      assertEquals(List.of("0-1 comment", "2-4", "7-8"), shown);
    }
  }

  private static String apply(String text, List<TextEdit> edits) {
    List<TextEdit> sorted = new ArrayList<>(edits);
    sorted.sort(Comparator.comparingInt((TextEdit e) -> Marked.offset(text, e.getRange().getStart())).reversed());
    String out = text;
    for (TextEdit e : sorted) {
      out = out.substring(0, Marked.offset(out, e.getRange().getStart())) + e.getNewText()
          + out.substring(Marked.offset(out, e.getRange().getEnd()));
    }
    return out;
  }

  /** Asks for fixes on the whole text, applies the one whose title starts as given, and returns the new text. */
  private static String fixWith(Harness h, String uri, String text, String titleStart) throws Exception {
    Range all = new Range(Marked.position(text, 0), Marked.position(text, text.length()));
    List<CodeAction> actions = h.remote.getTextDocumentService()
        .codeAction(new CodeActionParams(Harness.doc(uri), all, new CodeActionContext(List.of())))
        .get(5, TimeUnit.SECONDS).stream().map(e -> e.getRight()).toList();
    CodeAction chosen = actions.stream().filter(a -> a.getTitle().startsWith(titleStart)).findFirst()
        .orElseThrow(() -> new AssertionError("no action starting `" + titleStart + "` in "
            + actions.stream().map(CodeAction::getTitle).toList()));
    assertEquals("quickfix", chosen.getKind());
    return apply(text, chosen.getEdit().getChanges().get(uri));
  }

  @Test
  void quickFixesRemoveWhatTheyDiagnose() throws Exception {
    String text = Marked.parse(DiagnosticsTest.SHORT_HORIZON).text()
        + "zone rock polygon (40, 40) (40, 50) (50, 50) (50, 30)\n";
    try (Harness h = new Harness(dir)) {
      String uri = h.open("fix.skerry", text);
      List<String> codes = h.diagnostics(uri, 1).getDiagnostics().stream().map(d -> d.getCode().getLeft()).toList();
      assertEquals(List.of("horizon-too-short", "polygon-clockwise"), codes);
      // From (5, 5) to the corner (80, 80): d = 106.07 m; with v = 2 m/s, a = 1 m/s², rest to rest,
      // d > v²/a so t = d/v + v/a = 55.03 s, i.e. 56 steps of 1 s.
      String raised = fixWith(h, uri, text, "Raise the horizon to 56 (the minimum to reach the target)");
      assertTrue(raised.contains("horizon 56\n"), raised);
      h.change(uri, 2, raised);
      assertEquals(List.of("polygon-clockwise"), h.diagnostics(uri, 2).getDiagnostics().stream()
          .map(d -> d.getCode().getLeft()).toList());
      String reversed = fixWith(h, uri, raised, "Reverse the corners of `rock`");
      assertTrue(reversed.contains("zone rock polygon (50, 30) (50, 50) (40, 50) (40, 40)\n"), reversed);
      h.change(uri, 3, reversed);
      assertEquals(List.of(), h.diagnostics(uri, 3).getDiagnostics());
    }
  }

  @Test
  void quickFixesForRepeatedLinesAndMistypedUnits() throws Exception {
    String text = Marked.parse(DiagnosticsTest.SHORT_HORIZON).text().replace("horizon 20", "horizon 60")
        .replace("radius 0.5 m", "radius 0.5 mm\n  speed max 3 m/s");
    try (Harness h = new Harness(dir)) {
      String uri = h.open("dup.skerry", text);
      List<String> codes = h.diagnostics(uri, 1).getDiagnostics().stream().map(d -> d.getCode().getLeft()).toList();
      assertEquals(List.of("unknown-unit", "duplicate-property"), codes);
      String once = fixWith(h, uri, text, "Remove the repeated `speed` line");
      assertFalse(once.contains("speed max 3"), once);
      assertTrue(once.contains("speed max 2 m/s\n"), once);
      String unit = fixWith(h, uri, text, "Replace the unit `mm` with `m`");
      assertTrue(unit.contains("radius 0.5 m\n"), unit);
    }
  }
}
