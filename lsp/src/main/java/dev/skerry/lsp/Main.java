package dev.skerry.lsp;

import dev.skerry.lsp.protocol.SkerryLanguageServer;
import java.io.InputStream;
import java.io.PrintStream;
import java.time.Duration;
import java.util.concurrent.ExecutionException;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;

/**
 * Starts the language server on standard input and output. Only LSP messages go to the real
 * standard output; anything else printed goes to standard error.
 */
public final class Main {
  /** How long an edit waits for the next one before it is checked. */
  public static final Duration DEBOUNCE = Duration.ofMillis(100);

  private Main() {}

  public static void main(String[] args) throws InterruptedException {
    InputStream in = System.in;
    PrintStream out = System.out;
    System.setOut(System.err);
    SkerryLanguageServer server = new SkerryLanguageServer(DEBOUNCE, code -> {
      out.flush();
      System.exit(code);
    }, new dev.skerry.lsp.analysis.AnalysisSizes());
    Launcher<LanguageClient> launcher = LSPLauncher.createServerLauncher(server, in, out);
    server.connect(launcher.getRemoteProxy());
    try {
      launcher.startListening().get();
    } catch (ExecutionException e) {
      System.err.println("skerry-lsp: the connection failed: " + e.getCause());
    }
    System.exit(0);
  }
}
