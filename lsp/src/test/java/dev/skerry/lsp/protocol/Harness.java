package dev.skerry.lsp.protocol;

import dev.skerry.lsp.analysis.SizeEstimator;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.Pipe;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.WorkspaceFolder;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageServer;

/** Our server and an LSP4J client over two pipes, in one JVM, with a workspace folder. */
final class Harness implements AutoCloseable {
  final Path root;
  final SkerryLanguageServer server;
  final LanguageServer remote;
  final RecordingClient client = new RecordingClient();
  final InitializeResult initialized;
  final AtomicInteger exitCode = new AtomicInteger(-1);
  private final OutputStream toServer;
  private final OutputStream toClient;

  Harness(Path root, Duration debounce) throws Exception {
    this(root, debounce, null);
  }

  Harness(Path root, Duration debounce, SizeEstimator sizes) throws Exception {
    this.root = root.toAbsolutePath().normalize();
    server = new SkerryLanguageServer(debounce, exitCode::set, sizes);
    // NIO pipes: java.io's piped streams fail a read once the thread that last wrote has ended.
    Pipe toServerPipe = Pipe.open();
    InputStream serverIn = Channels.newInputStream(toServerPipe.source());
    toServer = Channels.newOutputStream(toServerPipe.sink());
    Pipe toClientPipe = Pipe.open();
    InputStream clientIn = Channels.newInputStream(toClientPipe.source());
    toClient = Channels.newOutputStream(toClientPipe.sink());
    Launcher<LanguageClient> serverLauncher = LSPLauncher.createServerLauncher(server, serverIn, toClient);
    server.connect(serverLauncher.getRemoteProxy());
    serverLauncher.startListening();
    Launcher<LanguageServer> clientLauncher = LSPLauncher.createClientLauncher(client, clientIn, toServer);
    clientLauncher.startListening();
    remote = clientLauncher.getRemoteProxy();
    InitializeParams init = new InitializeParams();
    init.setCapabilities(new ClientCapabilities());
    init.setWorkspaceFolders(List.of(new WorkspaceFolder(this.root.toUri().toString(), "ws")));
    initialized = remote.initialize(init).get(5, TimeUnit.SECONDS);
  }

  Harness(Path root) throws Exception {
    this(root, Duration.ofMillis(20));
  }

  String uri(String name) {
    return root.resolve(name).toUri().toString();
  }

  /** Writes a file into the workspace without opening it. */
  Path write(String name, String text) throws IOException {
    Path p = root.resolve(name);
    Files.createDirectories(p.getParent());
    Files.writeString(p, text);
    return p;
  }

  String open(String name, String text) {
    String uri = uri(name);
    remote.getTextDocumentService().didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(uri, "skerry", 1, text)));
    return uri;
  }

  void change(String uri, int version, String text) {
    remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
        new VersionedTextDocumentIdentifier(uri, version), List.of(new TextDocumentContentChangeEvent(text))));
  }

  /** The first publication for {@code uri} of version {@code version} or later. */
  PublishDiagnosticsParams diagnostics(String uri, int version) throws InterruptedException {
    return client.await(uri, p -> p.getVersion() != null && p.getVersion() >= version);
  }

  static TextDocumentIdentifier doc(String uri) {
    return new TextDocumentIdentifier(uri);
  }

  @Override
  public void close() throws Exception {
    try {
      remote.shutdown().get(5, TimeUnit.SECONDS);
      remote.exit();
    } catch (java.util.concurrent.TimeoutException e) {
      Thread.getAllStackTraces().forEach((t, stack) -> {
        System.err.println("thread " + t.getName() + " " + t.getState());
        for (StackTraceElement el : stack) {
          System.err.println("    at " + el);
        }
      });
      throw e;
    } finally {
      toServer.close();
      toClient.close();
    }
  }
}
