package dev.skerry.lsp.analysis;

import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.check.SymbolTable;
import dev.skerry.lsp.document.Document;
import dev.skerry.lsp.document.DocumentStore;
import dev.skerry.lsp.document.WorkspaceLoader;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Supplier;

/**
 * Checks one document version with the compiler's front end: a function of the text, the open
 * buffers it includes and the disk. Never throws; a failure inside the checker becomes an empty
 * result and a line on standard error.
 */
public final class Analyzer {
  private final DocumentStore store;
  private final Supplier<Path> workspaceRoot;
  private final SizeEstimator sizes;

  /** {@code sizes} may be null: then no sizes are predicted. */
  public Analyzer(DocumentStore store, Supplier<Path> workspaceRoot, SizeEstimator sizes) {
    this.store = store;
    this.workspaceRoot = workspaceRoot;
    this.sizes = sizes;
  }

  public AnalysisResult analyze(Document document) {
    WorkspaceLoader loader = new WorkspaceLoader(rootFor(document), store);
    CheckResult check;
    try {
      check = ScenarioChecker.check(document.source(), loader);
    } catch (RuntimeException | LinkageError | StackOverflowError e) {
      System.err.println("skerry-lsp: checking " + document.uri() + " failed: " + e);
      check = new CheckResult(List.of(new ScenarioFile(document.source(), List.of())), new SymbolTable(), null,
          List.of());
    }
    Set<Path> read = new HashSet<>();
    for (ScenarioFile f : check.files()) {
      if (f.source().path() != null) {
        read.add(f.source().path().toAbsolutePath().normalize());
      }
    }
    return new AnalysisResult(document, check, read, estimate(document, check));
  }

  private SizeEstimator.PlanSizes estimate(Document document, CheckResult check) {
    if (sizes == null || check.scenario() == null) {
      return null;
    }
    try {
      return sizes.estimate(check.scenario()).orElse(null);
    } catch (RuntimeException e) {
      System.err.println("skerry-lsp: predicting the sizes of " + document.uri() + " failed: " + e);
      return null;
    }
  }

  /** The workspace root when the document lies inside it, else the document's own folder. */
  private Path rootFor(Document document) {
    Path root = workspaceRoot.get();
    Path path = document.path();
    if (path == null) {
      return root != null ? root : Path.of("").toAbsolutePath();
    }
    if (root != null && path.startsWith(root)) {
      return root;
    }
    Path parent = path.getParent();
    return parent != null ? parent : path;
  }
}
