package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.services.TextDocumentService;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

@Timeout(60)
class BadClientInputTest {
  @TempDir
  Path dir;

  private static final String INIT = "{\"jsonrpc\":\"2.0\",\"id\":1,\"method\":\"initialize\",\"params\":{\"capabilities\":{}}}";
  private static final String HOVER_UNKNOWN = "{\"jsonrpc\":\"2.0\",\"id\":%d,\"method\":\"textDocument/hover\","
      + "\"params\":{\"textDocument\":{\"uri\":\"file:///nowhere.skerry\"},\"position\":{\"line\":0,\"character\":0}}}";

  @Test
  void unknownDocumentsGetEmptyAnswers() throws Exception {
    try (Harness h = new Harness(dir)) {
      TextDocumentService docs = h.remote.getTextDocumentService();
      String uri = h.uri("never-opened.skerry");
      Position p = new Position(0, 0);
      assertNull(docs.hover(new HoverParams(Harness.doc(uri), p)).get(5, TimeUnit.SECONDS));
      assertNull(docs.definition(new DefinitionParams(Harness.doc(uri), p)).get(5, TimeUnit.SECONDS));
      assertNull(docs.completion(new CompletionParams(Harness.doc(uri), p)).get(5, TimeUnit.SECONDS));
      assertNull(docs.documentSymbol(new DocumentSymbolParams(Harness.doc(uri))).get(5, TimeUnit.SECONDS));
      h.change(uri, 2, "zone z box (0, 0) to (1, 1)");
      assertEquals(List.of(), h.client.publishedFor(uri), "a change to an unopened document is ignored");
    }
  }

  @Test
  void outOfRangePositionsAreClampedNotFatal() throws Exception {
    String text = Marked.parse(NavigationAndHoverTest.SCENARIO).text();
    try (Harness h = new Harness(dir)) {
      TextDocumentService docs = h.remote.getTextDocumentService();
      String uri = h.open("bay.skerry", text);
      for (Position p : List.of(new Position(-5, -5), new Position(1_000_000, 3), new Position(2, 1_000_000),
          new Position(Integer.MAX_VALUE, Integer.MAX_VALUE))) {
        docs.hover(new HoverParams(Harness.doc(uri), p)).get(5, TimeUnit.SECONDS);
        docs.completion(new CompletionParams(Harness.doc(uri), p)).get(5, TimeUnit.SECONDS);
        docs.definition(new DefinitionParams(Harness.doc(uri), p)).get(5, TimeUnit.SECONDS);
      }
      change(h, uri, 2, new Range(new Position(900, 0), new Position(-3, 7)), "zone");
      change(h, uri, 3, new Range(new Position(900, 0), new Position(1000, 0)), "\n# appended\n");
      assertEquals(List.of(), h.diagnostics(uri, 3).getDiagnostics(),
          "the reversed range was refused and the one past the end appended at the end");
      String hover = docs.hover(new HoverParams(Harness.doc(uri), new Position(2, 9))).get(5, TimeUnit.SECONDS)
          .getContents().getRight().getValue();
      assertTrue(hover.startsWith("vehicle `skiff`"), hover);
    }
  }

  private static void change(Harness h, String uri, int version, Range range, String text) {
    h.remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
        new VersionedTextDocumentIdentifier(uri, version), List.of(new TextDocumentContentChangeEvent(range, text))));
  }

  @Test
  void malformedMessagesGetErrorsAndTheServerKeepsAnswering() throws Exception {
    try (RawConnection c = new RawConnection()) {
      c.send(INIT);
      assertTrue(c.response(1).has("result"));
      c.send("{\"jsonrpc\":\"2.0\",\"id\":2,\"method\":\"textDocument/hover\",\"params\":{\"textDocument\":5,\"position\":\"x\"}}");
      JsonObject wrongTypes = c.response(2);
      assertTrue(wrongTypes.has("error") || wrongTypes.get("result").isJsonNull(), wrongTypes::toString);
      c.send("{\"jsonrpc\":\"2.0\",\"id\":3,\"method\":\"textDocument/hover\",\"params\":null}");
      JsonObject noParams = c.response(3);
      assertTrue(noParams.has("error") || noParams.get("result").isJsonNull(), noParams::toString);
      c.send("{\"jsonrpc\":\"2.0\",\"id\":4,\"method\":\"textDocument/hover\",\"params\":{\"textDocument\":{");
      c.send("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didOpen\",\"params\":{}}");
      c.send("{\"jsonrpc\":\"2.0\",\"method\":\"textDocument/didChange\",\"params\":{\"contentChanges\":[null]}}");
      c.send("{\"jsonrpc\":\"2.0\",\"id\":5,\"method\":\"skerry/noSuchMethod\",\"params\":{}}");
      assertEquals(-32601, c.response(5).getAsJsonObject("error").get("code").getAsInt());
      c.sendRaw("Content-Length: 8\r\n\r\nnot json");
      c.send(HOVER_UNKNOWN.formatted(6));
      JsonObject alive = c.response(6);
      assertTrue(alive.has("result") && alive.get("result").isJsonNull(), alive::toString);
    }
  }

  @Test
  void aTwentyMegabyteDocumentIsRefusedQuicklyAndTheServerStaysResponsive() throws Exception {
    StringBuilder big = new StringBuilder(20 << 20);
    String line = "zone rock box (1, 2) to (3, 4)   // a line of filler text to reach twenty megabytes\n";
    while (big.length() < 20 << 20) {
      big.append(line);
    }
    try (Harness h = new Harness(dir)) {
      long start = System.nanoTime();
      String uri = h.open("huge.skerry", big.toString());
      PublishDiagnosticsParams p = h.diagnostics(uri, 1);
      assertEquals("file-too-large", p.getDiagnostics().get(0).getCode().getLeft());
      TextDocumentService docs = h.remote.getTextDocumentService();
      Position end = new Position(200_000, 10);
      docs.hover(new HoverParams(Harness.doc(uri), end)).get(10, TimeUnit.SECONDS);
      docs.completion(new CompletionParams(Harness.doc(uri), end)).get(10, TimeUnit.SECONDS);
      docs.foldingRange(new FoldingRangeRequestParams(Harness.doc(uri))).get(10, TimeUnit.SECONDS);
      String small = h.open("small.skerry", "zone z box (0, 0) to (1, 1)\n");
      assertEquals("missing-declaration", h.diagnostics(small, 1).getDiagnostics().get(0).getCode().getLeft());
      long seconds = TimeUnit.NANOSECONDS.toSeconds(System.nanoTime() - start);
      assertTrue(seconds < 20, "took " + seconds + " s");
    }
  }
}
