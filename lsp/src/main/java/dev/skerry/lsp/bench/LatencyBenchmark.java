package dev.skerry.lsp.bench;

import dev.skerry.lsp.Main;
import dev.skerry.lsp.protocol.SkerryLanguageServer;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.Pipe;
import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.MessageActionItem;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.ShowMessageRequestParams;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageServer;

/**
 * Measures the server over JSON-RPC through OS pipes in one JVM, on a generated scenario of about 2,000 lines:
 * time from a one-character edit to its published diagnostics (edits spaced like slow typing,
 * and in a fast burst), hover and completion latency, and the heap after a full collection.
 * Run: {@code java -cp lsp/target/classes:$(cat lsp/target/runtime-classpath.txt) dev.skerry.lsp.bench.LatencyBenchmark}
 */
public final class LatencyBenchmark {
  private static final String URI = "untitled:generated_field.skerry";

  private final Map<Integer, Long> published = new ConcurrentHashMap<>();
  private final Map<Integer, CompletableFuture<Long>> waiting = new ConcurrentHashMap<>();
  private final Map<Integer, Long> sent = new ConcurrentHashMap<>();
  private LanguageServer remote;

  public static void main(String[] args) throws Exception {
    int lines = args.length > 0 ? Integer.parseInt(args[0]) : 2000;
    int edits = args.length > 1 ? Integer.parseInt(args[1]) : 200;
    new LatencyBenchmark().run(lines, edits);
    System.exit(0);
  }

  private void run(int lines, int edits) throws Exception {
    SkerryLanguageServer server = new SkerryLanguageServer(Main.DEBOUNCE, code -> { });
    Pipe up = Pipe.open();
    InputStream serverIn = Channels.newInputStream(up.source());
    OutputStream toServer = Channels.newOutputStream(up.sink());
    Pipe down = Pipe.open();
    InputStream clientIn = Channels.newInputStream(down.source());
    OutputStream toClient = Channels.newOutputStream(down.sink());
    Launcher<LanguageClient> serverSide = LSPLauncher.createServerLauncher(server, serverIn, toClient);
    server.connect(serverSide.getRemoteProxy());
    serverSide.startListening();
    Launcher<LanguageServer> clientSide = LSPLauncher.createClientLauncher(new Client(), clientIn, toServer);
    clientSide.startListening();
    remote = clientSide.getRemoteProxy();
    InitializeParams init = new InitializeParams();
    init.setCapabilities(new ClientCapabilities());
    remote.initialize(init).get(10, TimeUnit.SECONDS);

    String text = ScenarioGenerator.generate(lines);
    int lineCount = text.split("\n", -1).length;
    int editAt = text.indexOf("zone rock_0100 box (") + "zone rock_0100 box (".length();
    expect(1);
    remote.getTextDocumentService().didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(URI, "skerry", 1, text)));
    long firstMs = waitFor(1);
    int version = 1;

    for (int i = 0; i < 20; i++) {
      text = flip(text, editAt);
      version++;
      send(version, text);
      waitFor(version);
      Thread.sleep(Main.DEBOUNCE.toMillis() + 20);
    }
    List<Double> spaced = new ArrayList<>();
    for (int i = 0; i < edits; i++) {
      text = flip(text, editAt);
      version++;
      send(version, text);
      spaced.add(waitFor(version) / 1e6);
      Thread.sleep(Main.DEBOUNCE.toMillis() + 20);
    }
    int burstFirst = version + 1;
    for (int i = 0; i < edits; i++) {
      text = flip(text, editAt);
      version++;
      send(version, text);
      Thread.sleep(30);
    }
    waitFor(version);
    List<Double> burst = new ArrayList<>();
    for (int v = burstFirst; v <= version; v++) {
      Long at = published.get(v);
      if (at != null) {
        burst.add((at - sent.get(v)) / 1e6);
      }
    }

    TextDocumentIdentifier doc = new TextDocumentIdentifier(URI);
    List<Double> hover = new ArrayList<>();
    List<Double> completion = new ArrayList<>();
    String[] all = text.split("\n", -1);
    for (int i = 0; i < edits; i++) {
      int line = 20 + (i * 7919) % (lineCount - 40);
      long t0 = System.nanoTime();
      remote.getTextDocumentService().hover(new HoverParams(doc, new Position(line, 8))).get(10, TimeUnit.SECONDS);
      hover.add((System.nanoTime() - t0) / 1e6);
      t0 = System.nanoTime();
      remote.getTextDocumentService().completion(new CompletionParams(doc, new Position(line, all[line].length())))
          .get(10, TimeUnit.SECONDS);
      completion.add((System.nanoTime() - t0) / 1e6);
    }
    System.gc();
    long heap = ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();

    System.out.printf(Locale.ROOT, "scenario: %d lines, %d characters%n", lineCount, text.length());
    System.out.printf(Locale.ROOT, "open to first diagnostics: %.1f ms%n", firstMs / 1e6);
    report("edit -> diagnostics, edits %d ms apart (%d edits)".formatted(Main.DEBOUNCE.toMillis() + 20, edits), spaced);
    report("edit -> diagnostics, burst at 30 ms per key (%d published of %d)".formatted(burst.size(), edits), burst);
    report("hover (%d requests)".formatted(edits), hover);
    report("completion (%d requests)".formatted(edits), completion);
    System.out.printf(Locale.ROOT, "analyses run: %d, thrown away as stale: %d%n", server.scheduler().runs(),
        server.scheduler().discarded());
    System.out.printf(Locale.ROOT, "heap after a full collection (server and client, one JVM): %.1f MB%n", heap / 1048576.0);
    remote.shutdown().get(10, TimeUnit.SECONDS);
  }

  /** Turns one digit into another: a one-character edit that changes the model. */
  private static String flip(String text, int at) {
    char c = text.charAt(at);
    char next = c == '9' ? '8' : (char) (c + 1);
    return text.substring(0, at) + next + text.substring(at + 1);
  }

  private void send(int version, String text) {
    expect(version);
    sent.put(version, System.nanoTime());
    remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
        new VersionedTextDocumentIdentifier(URI, version), List.of(new TextDocumentContentChangeEvent(text))));
  }

  private void expect(int version) {
    waiting.put(version, new CompletableFuture<>());
    sent.put(version, System.nanoTime());
  }

  private long waitFor(int version) throws Exception {
    return waiting.get(version).get(30, TimeUnit.SECONDS) - sent.get(version);
  }

  private static void report(String what, List<Double> ms) {
    List<Double> sorted = new ArrayList<>(ms);
    Collections.sort(sorted);
    if (sorted.isEmpty()) {
      System.out.println(what + ": no samples");
      return;
    }
    double median = sorted.get(sorted.size() / 2);
    double p95 = sorted.get(Math.min(sorted.size() - 1, (int) Math.ceil(sorted.size() * 0.95) - 1));
    System.out.printf(Locale.ROOT, "%s: median %.1f ms, p95 %.1f ms, max %.1f ms%n", what, median, p95,
        sorted.get(sorted.size() - 1));
  }

  private final class Client implements LanguageClient {
    @Override
    public void publishDiagnostics(PublishDiagnosticsParams params) {
      long now = System.nanoTime();
      Integer v = params.getVersion();
      if (v != null) {
        published.put(v, now);
        CompletableFuture<Long> f = waiting.get(v);
        if (f != null) {
          f.complete(now);
        }
      }
    }

    @Override
    public void telemetryEvent(Object object) {
      // Not used by the server.
    }

    @Override
    public void showMessage(MessageParams params) {
      // Not used by the server.
    }

    @Override
    public CompletableFuture<MessageActionItem> showMessageRequest(ShowMessageRequestParams params) {
      return CompletableFuture.completedFuture(null);
    }

    @Override
    public void logMessage(MessageParams message) {
      // Not used by the server.
    }
  }
}
