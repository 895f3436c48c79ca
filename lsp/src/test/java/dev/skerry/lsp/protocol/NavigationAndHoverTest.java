package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NavigationAndHoverTest {
  /** A clean scenario: speed in knots, a radius from a constant, a box zone and a polygon zone. */
  static final String SCENARIO = """
      units m, s
      const «gap» = 0.5 m
      vehicle skiff {
        start (5, 5) at rest
        speed max 6 kn
        accel max 1 m/s^2
        radius «gap»
      }
      area bay box (0, 0) to (100, 100)
      zone pier box (30, 0) to (36, 28)
      zone shoal polygon (48, 30) (58, 26) (62, 34) (52, 40)
      target berth box (80, 80) to (90, 90) at rest
      plan {
        step 1 s
        horizon 60
      }
      """;

  @TempDir
  Path dir;

  private static String hoverText(Harness h, String uri, String text, String marker) throws Exception {
    int at = text.indexOf(marker);
    Hover hover = h.remote.getTextDocumentService()
        .hover(new HoverParams(Harness.doc(uri), Marked.position(text, at + 1))).get(5, TimeUnit.SECONDS);
    return hover == null ? null : hover.getContents().getRight().getValue();
  }

  @Test
  void hoverShowsVehicleLimitsAndZoneBoundsInSiUnits() throws Exception {
    String text = Marked.parse(SCENARIO).text();
    try (Harness h = new Harness(dir)) {
      String uri = h.open("bay.skerry", text);
      String vehicle = hoverText(h, uri, text, "skiff");
      assertTrue(vehicle.contains("speed limit: 3.087 m/s"), vehicle);
      assertTrue(vehicle.contains("radius: 0.5 m"), vehicle);
      String pier = hoverText(h, uri, text, "pier");
      assertTrue(pier.contains("as written: x 30 … 36 m, y 0 … 28 m"), pier);
      assertTrue(pier.contains("(0.5 m): x 29.5 … 36.5 m, y -0.5 … 28.5 m"), pier);
      String shoal = hoverText(h, uri, text, "shoal");
      assertTrue(shoal.contains("grown corners"), shoal);
      String plan = hoverText(h, uri, text, "horizon");
      assertTrue(plan.contains("horizon: 60 steps (60 s)"), plan);
      assertNull(hoverText(h, uri, text, "units"), "nothing to say about the units line");
    }
  }

  @Test
  void definitionAndReferencesOfAConstant() throws Exception {
    Marked m = Marked.parse(SCENARIO);
    String text = m.text();
    try (Harness h = new Harness(dir)) {
      String uri = h.open("bay.skerry", text);
      int use = m.ranges().get(1)[0];
      List<? extends Location> defs = h.remote.getTextDocumentService()
          .definition(new DefinitionParams(Harness.doc(uri), Marked.position(text, use + 1)))
          .get(5, TimeUnit.SECONDS).getLeft();
      assertEquals(1, defs.size());
      assertEquals(Marked.position(text, m.ranges().get(0)[0]), defs.get(0).getRange().getStart());
      assertEquals("gap", Marked.covered(text, defs.get(0).getRange()));
      List<? extends Location> refs = h.remote.getTextDocumentService()
          .references(new ReferenceParams(Harness.doc(uri), Marked.position(text, use), new ReferenceContext(true)))
          .get(5, TimeUnit.SECONDS);
      assertEquals(List.of(Marked.position(text, m.ranges().get(0)[0]), Marked.position(text, use)),
          refs.stream().map(l -> l.getRange().getStart()).toList());
    }
  }

  @Test
  void renameReachesIntoTheIncludedFileThatDeclaresTheName() throws Exception {
    String main = """
        include "shared.inc"
        vehicle v {
          start (5, 5) at rest
          speed max 2 m/s
          accel max 1 m/s^2
          radius margin
        }
        area a box (0, 0) to (100, 100)
        target t box (80, 80) to (90, 90)
        plan {
          step 1 s
          horizon 90
        }
        """;
    try (Harness h = new Harness(dir)) {
      h.write("shared.inc", "const margin = 0.4 m\nzone rock box (40, 40) to (45, 45)\n");
      String uri = h.open("main.skerry", main);
      h.diagnostics(uri, 1);
      int use = main.indexOf("margin") + 2;
      var prepared = h.remote.getTextDocumentService()
          .prepareRename(new PrepareRenameParams(Harness.doc(uri), Marked.position(main, use))).get(5, TimeUnit.SECONDS);
      assertEquals("margin", Marked.covered(main, prepared.getSecond().getRange()));
      WorkspaceEdit edit = h.remote.getTextDocumentService()
          .rename(new RenameParams(Harness.doc(uri), Marked.position(main, use), "clearance")).get(5, TimeUnit.SECONDS);
      Map<String, List<TextEdit>> changes = edit.getChanges();
      assertEquals(2, changes.size(), changes::toString);
      TextEdit inMain = changes.get(uri).get(0);
      assertEquals("margin", Marked.covered(main, inMain.getRange()));
      TextEdit inInclude = changes.get(h.uri("shared.inc")).get(0);
      assertEquals("margin", Marked.covered("const margin = 0.4 m\n", inInclude.getRange()));
      assertEquals("clearance", inInclude.getNewText());
    }
  }

  @Test
  void renameRefusesKeywordsAndNamesInUse() throws Exception {
    String text = Marked.parse(SCENARIO).text();
    try (Harness h = new Harness(dir)) {
      String uri = h.open("bay.skerry", text);
      int pier = text.indexOf("pier") + 1;
      for (String bad : List.of("zone", "shoal", "2fast", "")) {
        ExecutionException e = assertThrows(ExecutionException.class, () -> h.remote.getTextDocumentService()
            .rename(new RenameParams(Harness.doc(uri), Marked.position(text, pier), bad)).get(5, TimeUnit.SECONDS));
        assertTrue(e.getCause().getMessage().contains("`" + bad + "`"), e.getCause().getMessage());
      }
    }
  }
}
