package dev.skerry.lsp.protocol;

import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.AnalysisScheduler;
import dev.skerry.lsp.analysis.Analyzer;
import dev.skerry.lsp.analysis.SizeEstimator;
import dev.skerry.lsp.document.DocumentStore;
import dev.skerry.lsp.document.Uris;
import dev.skerry.lsp.protocol.feature.SemanticTokensHandler;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.function.IntConsumer;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.CodeActionOptions;
import org.eclipse.lsp4j.CompletionOptions;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.RenameOptions;
import org.eclipse.lsp4j.SemanticTokensWithRegistrationOptions;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.ServerInfo;
import org.eclipse.lsp4j.TextDocumentSyncKind;
import org.eclipse.lsp4j.WorkspaceFolder;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageClientAware;
import org.eclipse.lsp4j.services.LanguageServer;
import org.eclipse.lsp4j.services.TextDocumentService;
import org.eclipse.lsp4j.services.WorkspaceService;

/** The server's lifecycle and capabilities. Feature requests go to {@link TextDocuments}. */
public final class SkerryLanguageServer implements LanguageServer, LanguageClientAware {
  private final DocumentStore store = new DocumentStore();
  private final AnalysisScheduler scheduler;
  private final DiagnosticConverter converter;
  private final TextDocuments textDocuments;
  private final Workspace workspace;
  private final IntConsumer exit;
  private volatile Path root;
  private volatile LanguageClient client;
  private volatile boolean shutdown;

  private final boolean sizes;

  /** {@code exit} receives the process exit code on the {@code exit} notification. */
  public SkerryLanguageServer(Duration debounce, IntConsumer exit) {
    this(debounce, exit, null);
  }

  /** With {@code sizes} (may be null), the server shows predicted MILP sizes and offers inlay hints. */
  public SkerryLanguageServer(Duration debounce, IntConsumer exit, SizeEstimator sizes) {
    this.exit = exit;
    this.sizes = sizes != null;
    Locations locations = new Locations(store);
    this.converter = new DiagnosticConverter(locations);
    this.scheduler = new AnalysisScheduler(new Analyzer(store, () -> root, sizes)::analyze, debounce, this::publish);
    this.textDocuments = new TextDocuments(store, scheduler, locations, converter, this::clear);
    this.workspace = new Workspace(store, scheduler);
  }

  @Override
  public void connect(LanguageClient languageClient) {
    this.client = languageClient;
  }

  @Override
  public CompletableFuture<InitializeResult> initialize(InitializeParams params) {
    root = rootOf(params);
    ServerCapabilities caps = new ServerCapabilities();
    caps.setTextDocumentSync(TextDocumentSyncKind.Full);
    caps.setHoverProvider(true);
    caps.setDefinitionProvider(true);
    caps.setReferencesProvider(true);
    caps.setRenameProvider(new RenameOptions(true));
    caps.setDocumentSymbolProvider(true);
    caps.setFoldingRangeProvider(true);
    caps.setDocumentFormattingProvider(true);
    caps.setExecuteCommandProvider(new org.eclipse.lsp4j.ExecuteCommandOptions(
        java.util.List.of(Workspace.EXPORT_MPS, Workspace.EXPORT_LP)));
    caps.setCompletionProvider(new CompletionOptions(false, List.of()));
    caps.setCodeActionProvider(new CodeActionOptions(sizes ? List.of(CodeActionKind.QuickFix,
        CodeActionKind.RefactorRewrite) : List.of(CodeActionKind.QuickFix)));
    caps.setSemanticTokensProvider(new SemanticTokensWithRegistrationOptions(SemanticTokensHandler.LEGEND, true));
    if (sizes) {
      caps.setInlayHintProvider(true);
    }
    return CompletableFuture.completedFuture(new InitializeResult(caps, new ServerInfo("skerry", version())));
  }

  private static Path rootOf(InitializeParams params) {
    if (params == null) {
      return null;
    }
    List<WorkspaceFolder> folders = params.getWorkspaceFolders();
    if (folders != null && !folders.isEmpty() && folders.get(0) != null) {
      Path p = Uris.toPath(folders.get(0).getUri());
      if (p != null) {
        return p;
      }
    }
    @SuppressWarnings("deprecation")
    String rootUri = params.getRootUri();
    return Uris.toPath(rootUri);
  }

  private static String version() {
    String v = SkerryLanguageServer.class.getPackage().getImplementationVersion();
    return v == null ? "dev" : v;
  }

  @Override
  public CompletableFuture<Object> shutdown() {
    shutdown = true;
    scheduler.close();
    textDocuments.close();
    return CompletableFuture.completedFuture(null);
  }

  @Override
  public void exit() {
    exit.accept(shutdown ? 0 : 1);
  }

  @Override
  public TextDocumentService getTextDocumentService() {
    return textDocuments;
  }

  @Override
  public WorkspaceService getWorkspaceService() {
    return workspace;
  }

  /** Analyses run so far and those thrown away as stale, for tests and the benchmark. */
  public AnalysisScheduler scheduler() {
    return scheduler;
  }

  private void publish(AnalysisResult result) {
    LanguageClient c = client;
    if (c != null && !shutdown) {
      c.publishDiagnostics(new PublishDiagnosticsParams(result.document().uri(), converter.convert(result),
          result.document().version()));
    }
  }

  private void clear(String uri) {
    LanguageClient c = client;
    if (c != null && !shutdown) {
      c.publishDiagnostics(new PublishDiagnosticsParams(uri, List.of()));
    }
  }
}
