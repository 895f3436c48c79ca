package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.format.FormatResult;
import dev.skerry.compiler.format.Formatter;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.lsp.document.Document;
import java.util.List;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextEdit;

/**
 * Document formatting with the compiler's canonical formatter, the one `skerry fmt` uses. A text
 * with syntax errors is left as it is (no edits), as the command line leaves such a file untouched.
 */
public final class FormattingHandler {
  public List<TextEdit> format(Document document) {
    SourceFile source = document.source();
    FormatResult result = Formatter.format(source);
    if (!result.formatted() || !result.changed()) {
      return List.of();
    }
    int lastLine = source.lineCount() - 1;
    Position end = new Position(lastLine, source.length() - source.lineStart(lastLine));
    return List.of(new TextEdit(new Range(new Position(0, 0), end), result.text()));
  }
}
