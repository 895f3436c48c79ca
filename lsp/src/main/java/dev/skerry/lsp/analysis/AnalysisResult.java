package dev.skerry.lsp.analysis;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.lsp.document.Document;
import java.nio.file.Path;
import java.util.Set;

/**
 * What checking one version of a document gave, the files it read (for re-checking dependents),
 * and the predicted sizes when a size estimator is wired and the scenario checks (else null).
 */
public record AnalysisResult(Document document, CheckResult check, Set<Path> filesRead, SizeEstimator.PlanSizes sizes) {
  public AnalysisResult {
    filesRead = Set.copyOf(filesRead);
  }

  public SourceFile main() {
    return document.source();
  }

  public boolean isMain(SourceFile file) {
    return file == document.source();
  }
}
