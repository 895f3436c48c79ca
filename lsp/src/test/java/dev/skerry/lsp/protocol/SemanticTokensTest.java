package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.SemanticTokensLegend;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SemanticTokensTest {
  @TempDir
  Path dir;

  @Test
  void tokensTellNamesFromKeywordsAndUnitsFromOptions() throws Exception {
    String text = """
        units m, s
        /* two
           lines */
        const gap = 0.5 m
        zone box box (1, 1) to (2, 2) km
        vehicle v {
          dynamics double_integrator
          radius gap
        }
        """;
    try (Harness h = new Harness(dir)) {
      SemanticTokensLegend legend = h.initialized.getCapabilities().getSemanticTokensProvider().getLegend();
      String uri = h.open("t.skerry", text);
      List<Integer> data = h.remote.getTextDocumentService()
          .semanticTokensFull(new SemanticTokensParams(Harness.doc(uri))).get(5, TimeUnit.SECONDS).getData();
      List<String> decoded = new ArrayList<>();
      String[] lines = text.split("\n", -1);
      int line = 0;
      int column = 0;
      for (int i = 0; i < data.size(); i += 5) {
        column = data.get(i) == 0 ? column + data.get(i + 1) : data.get(i + 1);
        line += data.get(i);
        String word = lines[line].substring(column, column + data.get(i + 2));
        StringBuilder mods = new StringBuilder();
        for (int bit = 0; bit < legend.getTokenModifiers().size(); bit++) {
          if ((data.get(i + 4) & (1 << bit)) != 0) {
            mods.append(' ').append(legend.getTokenModifiers().get(bit));
          }
        }
        decoded.add(word + "=" + legend.getTokenTypes().get(data.get(i + 3)) + mods);
      }
      assertEquals(List.of("units=keyword", "m=type", "s=type", "/* two=comment", "   lines */=comment",
          "const=keyword", "gap=variable declaration readonly", "0.5=number", "m=type",
          "zone=keyword", "box=variable declaration", "box=keyword"), decoded.subList(0, 12));
      assertTrue(decoded.contains("km=type"), decoded::toString);
      assertTrue(decoded.contains("double_integrator=enumMember"), decoded::toString);
      assertEquals("gap=variable readonly", decoded.get(decoded.size() - 1));
    }
  }
}
