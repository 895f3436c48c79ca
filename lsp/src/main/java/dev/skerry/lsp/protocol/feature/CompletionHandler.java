package dev.skerry.lsp.protocol.feature;

import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.Completions;
import dev.skerry.lsp.document.Document;
import dev.skerry.lsp.protocol.Ranges;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionItemKind;
import org.eclipse.lsp4j.CompletionList;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/** Completion: keywords by block, follow-up words, constant names where a value stands, units after a number. */
public final class CompletionHandler {

  /**
   * Proposals at a position of the latest text. {@code analysis} may be of an older version or
   * null; it only supplies names and the properties a block already has.
   */
  public CompletionList complete(Document document, AnalysisResult analysis, Position position) {
    int offset = Ranges.offset(document.source(), position);
    if (offset < 0) {
      return new CompletionList(false, List.of());
    }
    String text = document.text();
    int start = Completions.wordStart(text, offset);
    Range replace = new Range(Ranges.position(document.source(), start), Ranges.position(document.source(), offset));
    String typed = text.substring(start, offset);
    List<CompletionItem> items = new ArrayList<>();
    for (Completions.Item item : Completions.at(text, offset, analysis)) {
      if (!item.label().startsWith(typed)) {
        continue;
      }
      CompletionItem c = new CompletionItem(item.label());
      c.setKind(kind(item.kind()));
      c.setDetail(item.detail());
      c.setTextEdit(Either.forLeft(new TextEdit(replace, item.label())));
      c.setSortText(String.format("%03d", items.size()));
      items.add(c);
    }
    return new CompletionList(false, items);
  }

  private static CompletionItemKind kind(Completions.Kind kind) {
    if (kind == Completions.Kind.KEYWORD) {
      return CompletionItemKind.Keyword;
    } else if (kind == Completions.Kind.CONSTANT) {
      return CompletionItemKind.Constant;
    } else if (kind == Completions.Kind.UNIT) {
      return CompletionItemKind.Unit;
    }
    return CompletionItemKind.Reference;
  }
}
