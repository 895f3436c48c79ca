package dev.skerry.lsp.protocol;

import dev.skerry.lsp.analysis.AnalysisScheduler;
import dev.skerry.lsp.document.Document;
import dev.skerry.lsp.document.DocumentStore;
import org.eclipse.lsp4j.DidChangeConfigurationParams;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.services.WorkspaceService;

/** Workspace notifications: a file changed on disk may change what open documents include. */
final class Workspace implements WorkspaceService {
  private final DocumentStore store;
  private final AnalysisScheduler scheduler;

  Workspace(DocumentStore store, AnalysisScheduler scheduler) {
    this.store = store;
    this.scheduler = scheduler;
  }

  @Override
  public void didChangeConfiguration(DidChangeConfigurationParams params) {
    // Skerry has no settings yet; nothing to reload.
  }

  @Override
  public void didChangeWatchedFiles(DidChangeWatchedFilesParams params) {
    for (Document d : store.all()) {
      scheduler.update(d);
    }
  }
}
