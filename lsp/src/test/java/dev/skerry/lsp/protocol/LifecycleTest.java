package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.TextDocumentSyncKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LifecycleTest {
  @TempDir
  Path dir;

  private static int awaitExit(Harness h) throws InterruptedException {
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
    while (h.exitCode.get() < 0 && System.nanoTime() < deadline) {
      Thread.sleep(10);
    }
    return h.exitCode.get();
  }

  @Test
  void initializeAnnouncesFullSyncAndTheFeatures() throws Exception {
    Harness h = new Harness(dir);
    ServerCapabilities caps = h.initialized.getCapabilities();
    assertEquals(TextDocumentSyncKind.Full, caps.getTextDocumentSync().getLeft());
    assertTrue(caps.getHoverProvider().getLeft());
    assertTrue(caps.getDefinitionProvider().getLeft());
    assertTrue(caps.getReferencesProvider().getLeft());
    assertTrue(caps.getRenameProvider().getRight().getPrepareProvider());
    assertTrue(caps.getDocumentSymbolProvider().getLeft());
    assertTrue(caps.getFoldingRangeProvider().getLeft());
    assertEquals("skerry", h.initialized.getServerInfo().getName());
    h.close();
    assertEquals(0, awaitExit(h), "exit after shutdown is a clean exit");
  }

  @Test
  void exitWithoutShutdownReportsFailure() throws Exception {
    try (Harness h = new Harness(dir)) {
      h.remote.exit();
      assertEquals(1, awaitExit(h));
    }
  }
}
