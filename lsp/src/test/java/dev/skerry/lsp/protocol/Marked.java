package dev.skerry.lsp.protocol;

import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;

/**
 * Test text with markers: {@code |} is the cursor, {@code «...»} marks ranges. The markers are
 * removed; positions are those of the clean text.
 */
record Marked(String text, int cursor, List<int[]> ranges) {

  static Marked parse(String marked) {
    StringBuilder clean = new StringBuilder();
    int cursor = -1;
    List<int[]> ranges = new ArrayList<>();
    int open = -1;
    for (int i = 0; i < marked.length(); i++) {
      char c = marked.charAt(i);
      if (c == '|') {
        cursor = clean.length();
      } else if (c == '«') {
        open = clean.length();
      } else if (c == '»') {
        ranges.add(new int[] {open, clean.length()});
      } else {
        clean.append(c);
      }
    }
    return new Marked(clean.toString(), cursor, ranges);
  }

  Position cursorPosition() {
    if (cursor < 0) {
      throw new IllegalStateException("the text has no | cursor marker");
    }
    return position(text, cursor);
  }

  static Position position(String text, int offset) {
    int line = 0;
    int lineStart = 0;
    for (int i = 0; i < offset; i++) {
      if (text.charAt(i) == '\n') {
        line++;
        lineStart = i + 1;
      }
    }
    return new Position(line, offset - lineStart);
  }

  static int offset(String text, Position p) {
    int line = 0;
    int i = 0;
    while (line < p.getLine() && i < text.length()) {
      if (text.charAt(i++) == '\n') {
        line++;
      }
    }
    return i + p.getCharacter();
  }

  /** The text an LSP range covers. */
  static String covered(String text, Range r) {
    return text.substring(offset(text, r.getStart()), offset(text, r.getEnd()));
  }
}
