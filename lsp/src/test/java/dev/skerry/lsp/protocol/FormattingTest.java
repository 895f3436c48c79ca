package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.format.Formatter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.TextEdit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The formatting request gives exactly what `skerry fmt` writes, and nothing for broken text. */
class FormattingTest {
  @TempDir
  Path dir;

  @Test
  void formattingEqualsTheCommandLineFormatter() throws Exception {
    String messy = "zone   reef box(1,2)to(3,4)   // rocks\nvehicle v{start (0,0) at rest speed max 2 m/s accel max 1 m/s^2}\n";
    try (Harness h = new Harness(dir)) {
      String uri = h.open("messy.skerry", messy);
      List<? extends TextEdit> edits = h.remote.getTextDocumentService()
          .formatting(new DocumentFormattingParams(Harness.doc(uri), new FormattingOptions(2, true)))
          .get(5, TimeUnit.SECONDS);
      assertEquals(1, edits.size());
      assertEquals(Formatter.format(messy), edits.get(0).getNewText());
      assertEquals(0, edits.get(0).getRange().getStart().getLine());
      assertEquals(2, edits.get(0).getRange().getEnd().getLine());
    }
  }

  @Test
  void brokenTextIsLeftAlone() throws Exception {
    try (Harness h = new Harness(dir)) {
      String uri = h.open("broken.skerry", "zone reef box (1, 2) to\n");
      List<? extends TextEdit> edits = h.remote.getTextDocumentService()
          .formatting(new DocumentFormattingParams(Harness.doc(uri), new FormattingOptions(2, true)))
          .get(5, TimeUnit.SECONDS);
      assertTrue(edits.isEmpty(), edits.toString());
    }
  }
}
