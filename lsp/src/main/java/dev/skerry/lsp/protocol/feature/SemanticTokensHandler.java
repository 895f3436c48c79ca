package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.source.SourceFile;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.Highlights;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.SemanticTokenModifiers;
import org.eclipse.lsp4j.SemanticTokenTypes;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensLegend;

/** Semantic tokens for the whole document, one line at a time (a comment over lines is split). */
public final class SemanticTokensHandler {
  /** Token types, in the order of {@link Highlights.Kind}. */
  public static final SemanticTokensLegend LEGEND = new SemanticTokensLegend(
      List.of(SemanticTokenTypes.Keyword, SemanticTokenTypes.Number, SemanticTokenTypes.String,
          SemanticTokenTypes.Comment, SemanticTokenTypes.Variable, SemanticTokenTypes.Type,
          SemanticTokenTypes.EnumMember),
      List.of(SemanticTokenModifiers.Declaration, SemanticTokenModifiers.Readonly));

  public SemanticTokens full(AnalysisResult result) {
    SourceFile file = result.main();
    List<Integer> data = new ArrayList<>();
    int lastLine = 0;
    int lastColumn = 0;
    for (Highlights.Piece p : Highlights.of(result)) {
      int modifiers = (p.declaration() ? 1 : 0) | (p.constant() ? 2 : 0);
      int start = p.start();
      while (start < p.end()) {
        int line = file.lineOf(start);
        int lineEnd = line + 1 < file.lineCount() ? file.lineStart(line + 1) - 1 : file.length();
        int end = Math.min(p.end(), lineEnd);
        int column = file.columnOf(start);
        if (end > start) {
          data.add(line - lastLine);
          data.add(line == lastLine ? column - lastColumn : column);
          data.add(end - start);
          data.add(p.kind().ordinal());
          data.add(modifiers);
          lastLine = line;
          lastColumn = column;
        }
        start = lineEnd + 1;
      }
    }
    return new SemanticTokens(data);
  }
}
