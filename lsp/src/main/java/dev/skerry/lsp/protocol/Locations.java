package dev.skerry.lsp.protocol;

import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.document.DocumentStore;
import org.eclipse.lsp4j.Location;

/** Names files by URI for the client: the document's own URI, an open buffer's, or a file URI. */
public final class Locations {
  private final DocumentStore store;

  public Locations(DocumentStore store) {
    this.store = store;
  }

  public String uriOf(AnalysisResult result, SourceFile file) {
    if (result.isMain(file) || file.path() == null) {
      return result.document().uri();
    }
    return store.uriOf(file.path());
  }

  public Location of(AnalysisResult result, SourceRange range) {
    return new Location(uriOf(result, range.source()), Ranges.of(range));
  }
}
