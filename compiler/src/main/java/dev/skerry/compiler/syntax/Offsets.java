package dev.skerry.compiler.syntax;

import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.tree.TerminalNode;

/**
 * The one helper that turns ANTLR token positions into {@link SourceRange}s. ANTLR counts code
 * points; Java strings (and LSP) count UTF-16 units, so text with characters outside the basic
 * plane needs a map.
 */
final class Offsets {
  private final SourceFile source;
  private final int[] codePointToChar;

  Offsets(SourceFile source) {
    this.source = source;
    String text = source.text();
    if (text.codePoints().count() == text.length()) {
      codePointToChar = null;
    } else {
      int[] map = new int[text.codePointCount(0, text.length()) + 1];
      int cp = 0;
      for (int i = 0; i < text.length(); i += Character.charCount(text.codePointAt(i))) {
        map[cp++] = i;
      }
      map[cp] = text.length();
      codePointToChar = map;
    }
  }

  int toChar(int codePointIndex) {
    if (codePointToChar == null) {
      return codePointIndex;
    }
    return codePointToChar[Math.max(0, Math.min(codePointIndex, codePointToChar.length - 1))];
  }

  SourceRange range(Token token) {
    if (token.getType() == Token.EOF || token.getStartIndex() < 0) {
      int end = source.length();
      return new SourceRange(source, end, end);
    }
    return new SourceRange(source, toChar(token.getStartIndex()), toChar(token.getStopIndex() + 1));
  }

  SourceRange range(Token first, Token last) {
    SourceRange a = range(first);
    if (last == null || last.getStopIndex() < first.getStartIndex()) {
      return a;
    }
    return a.to(range(last));
  }

  SourceRange range(TerminalNode node) {
    return range(node.getSymbol());
  }

  SourceRange rangeAt(int line, int column) {
    int offset = source.offsetOf(line - 1, column);
    return new SourceRange(source, offset, Math.min(offset + 1, source.length()));
  }

  SourceRange whole() {
    return new SourceRange(source, 0, source.length());
  }
}
