package dev.skerry.lsp.protocol;

import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.AnalysisScheduler;
import dev.skerry.lsp.document.Document;
import dev.skerry.lsp.document.DocumentStore;
import dev.skerry.lsp.protocol.feature.CodeActionHandler;
import dev.skerry.lsp.protocol.feature.CompletionHandler;
import dev.skerry.lsp.protocol.feature.HoverHandler;
import dev.skerry.lsp.protocol.feature.NavigationHandler;
import dev.skerry.lsp.protocol.feature.OutlineHandler;
import dev.skerry.lsp.protocol.feature.RenameHandler;
import dev.skerry.lsp.protocol.feature.SemanticTokensHandler;
import dev.skerry.lsp.protocol.feature.SizeHandler;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
import java.util.function.Function;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionList;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidCloseTextDocumentParams;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.DidSaveTextDocumentParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.LocationLink;
import org.eclipse.lsp4j.PrepareRenameDefaultBehavior;
import org.eclipse.lsp4j.PrepareRenameParams;
import org.eclipse.lsp4j.PrepareRenameResult;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.jsonrpc.messages.Either3;
import org.eclipse.lsp4j.services.TextDocumentService;

/**
 * Dispatches text-document notifications to the store and the scheduler, and requests to one
 * handler per feature. Requests wait for the analysis of the latest version (starting it at once)
 * and run on their own pool; unknown documents and missing parameters get an empty answer.
 */
final class TextDocuments implements TextDocumentService {
  private final DocumentStore store;
  private final AnalysisScheduler scheduler;
  private final Consumer<String> onClose;
  private final ExecutorService requests = Executors.newFixedThreadPool(2, r -> {
    Thread t = new Thread(null, r, "skerry-request", 16L << 20);
    t.setDaemon(true);
    return t;
  });
  private final HoverHandler hover = new HoverHandler();
  private final NavigationHandler navigation;
  private final RenameHandler rename;
  private final OutlineHandler outline = new OutlineHandler();
  private final CompletionHandler completion = new CompletionHandler();
  private final CodeActionHandler codeActions;
  private final SizeHandler sizes = new SizeHandler();
  private final SemanticTokensHandler semanticTokens = new SemanticTokensHandler();
  private final dev.skerry.lsp.protocol.feature.FormattingHandler formatter =
      new dev.skerry.lsp.protocol.feature.FormattingHandler();

  TextDocuments(DocumentStore store, AnalysisScheduler scheduler, Locations locations, DiagnosticConverter converter,
      Consumer<String> onClose) {
    this.store = store;
    this.scheduler = scheduler;
    this.onClose = onClose;
    this.navigation = new NavigationHandler(locations);
    this.rename = new RenameHandler(locations);
    this.codeActions = new CodeActionHandler(converter);
  }

  /** Stops taking requests; answers already being written finish (an interrupt could cut one in half). */
  void close() {
    requests.shutdown();
  }

  @Override
  public void didOpen(DidOpenTextDocumentParams params) {
    TextDocumentItem item = params == null ? null : params.getTextDocument();
    if (item == null || item.getUri() == null) {
      return;
    }
    Document document = new Document(item.getUri(), item.getVersion(), item.getText() == null ? "" : item.getText());
    store.put(document);
    scheduler.update(document);
  }

  @Override
  public void didChange(DidChangeTextDocumentParams params) {
    if (params == null || params.getTextDocument() == null || params.getContentChanges() == null) {
      return;
    }
    Document document = store.get(params.getTextDocument().getUri());
    if (document == null) {
      return;
    }
    int version = params.getTextDocument().getVersion() == null ? document.version() + 1
        : params.getTextDocument().getVersion();
    for (TextDocumentContentChangeEvent change : params.getContentChanges()) {
      if (change == null || change.getText() == null) {
        continue;
      }
      Range range = change.getRange();
      if (range == null || range.getStart() == null || range.getEnd() == null) {
        document = document.replace(version, change.getText());
      } else {
        int start = Ranges.offset(document.source(), range.getStart());
        int end = Ranges.offset(document.source(), range.getEnd());
        if (start > end) {
          System.err.println("skerry-lsp: ignored a change to " + document.uri() + " whose range ends before it starts");
          continue;
        }
        document = document.edit(version, start, end, change.getText());
      }
    }
    store.put(document);
    scheduler.update(document);
  }

  @Override
  public void didClose(DidCloseTextDocumentParams params) {
    TextDocumentIdentifier id = params == null ? null : params.getTextDocument();
    if (id == null || store.remove(id.getUri()) == null) {
      return;
    }
    scheduler.close(id.getUri());
    onClose.accept(id.getUri());
    for (Document d : store.all()) {
      scheduler.update(d);
    }
  }

  @Override
  public void didSave(DidSaveTextDocumentParams params) {
    // The text arrives with every change; saving changes nothing the analysis reads.
  }

  private <T> CompletableFuture<T> withAnalysis(TextDocumentIdentifier id, Function<AnalysisResult, T> answer) {
    String uri = id == null ? null : id.getUri();
    return scheduler.current(uri).thenApplyAsync(result -> result == null ? null : answer.apply(result), requests);
  }

  @Override
  public CompletableFuture<Hover> hover(HoverParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(), r -> hover.hover(r, params.getPosition()));
  }

  @Override
  public CompletableFuture<Either<List<? extends Location>, List<? extends LocationLink>>> definition(
      DefinitionParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(),
        r -> Either.forLeft(navigation.definition(r, params.getPosition())));
  }

  @Override
  public CompletableFuture<List<? extends Location>> references(ReferenceParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(), r -> navigation.references(r,
        params.getPosition(), params.getContext() == null || params.getContext().isIncludeDeclaration()));
  }

  @Override
  public CompletableFuture<Either3<Range, PrepareRenameResult, PrepareRenameDefaultBehavior>> prepareRename(
      PrepareRenameParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(), r -> {
      PrepareRenameResult found = rename.prepare(r, params.getPosition());
      return found == null ? null : Either3.forSecond(found);
    });
  }

  @Override
  public CompletableFuture<WorkspaceEdit> rename(RenameParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(),
        r -> rename.rename(r, params.getPosition(), params.getNewName()));
  }

  @Override
  public CompletableFuture<List<Either<SymbolInformation, DocumentSymbol>>> documentSymbol(DocumentSymbolParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(),
        r -> outline.symbols(r).stream().map(Either::<SymbolInformation, DocumentSymbol>forRight).toList());
  }

  @Override
  public CompletableFuture<List<FoldingRange>> foldingRange(FoldingRangeRequestParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(), outline::folding);
  }

  /** Formatting answers from the latest text with the compiler's canonical formatter. */
  @Override
  public CompletableFuture<List<? extends TextEdit>> formatting(DocumentFormattingParams params) {
    TextDocumentIdentifier id = params == null ? null : params.getTextDocument();
    Document document = id == null ? null : store.get(id.getUri());
    if (document == null) {
      return CompletableFuture.completedFuture(List.of());
    }
    return CompletableFuture.supplyAsync(() -> formatter.format(document), requests);
  }

  /** Completion answers from the latest text at once, with names from the newest analysis available. */
  @Override
  public CompletableFuture<Either<List<CompletionItem>, CompletionList>> completion(CompletionParams params) {
    TextDocumentIdentifier id = params == null ? null : params.getTextDocument();
    Document document = id == null ? null : store.get(id.getUri());
    if (document == null) {
      return CompletableFuture.completedFuture(null);
    }
    return CompletableFuture.supplyAsync(() -> Either.forRight(
        completion.complete(document, scheduler.last(document.uri()), params.getPosition())), requests);
  }

  @Override
  public CompletableFuture<List<Either<Command, CodeAction>>> codeAction(CodeActionParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(), r -> codeActions.actions(r, params.getRange()));
  }

  @Override
  public CompletableFuture<List<InlayHint>> inlayHint(InlayHintParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(),
        r -> sizes.inlayHints(r, Ranges.toSource(r.main(), params.getRange())));
  }

  @Override
  public CompletableFuture<SemanticTokens> semanticTokensFull(SemanticTokensParams params) {
    return withAnalysis(params == null ? null : params.getTextDocument(), semanticTokens::full);
  }
}
