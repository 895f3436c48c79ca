package dev.skerry.lsp.analysis;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * A lexical walk over the text that needs no parse, so it works on broken text: brace pairs,
 * block comments, and the block the cursor is in. Skips strings and comments as the lexer does.
 */
public final class TextScan {
  /** A pair of offsets: an opening and its closing character. */
  public record Span(int start, int end) {}

  /** Where the scan stopped: the braces still open there and whether it is inside a comment or string. */
  public record Context(List<Integer> openBraces, boolean inCommentOrString) {}

  private final List<Span> braces = new ArrayList<>();
  private final List<Span> blockComments = new ArrayList<>();
  private final Deque<Integer> open = new ArrayDeque<>();
  private boolean stoppedInside;

  private TextScan() {}

  /** Scans the whole text for brace pairs and block comments. */
  public static TextScan of(String text) {
    TextScan scan = new TextScan();
    scan.walk(text, text.length());
    return scan;
  }

  /** Scans up to {@code offset}: the braces still open there, innermost last. */
  public static Context at(String text, int offset) {
    TextScan scan = new TextScan();
    scan.walk(text, Math.max(0, Math.min(offset, text.length())));
    List<Integer> stack = new ArrayList<>(scan.open);
    java.util.Collections.reverse(stack);
    return new Context(stack, scan.stoppedInside);
  }

  private void walk(String text, int limit) {
    int n = text.length();
    int i = 0;
    while (i < limit) {
      char c = text.charAt(i);
      if (c == '#' || (c == '/' && i + 1 < n && text.charAt(i + 1) == '/')) {
        int eol = text.indexOf('\n', i);
        i = eol < 0 ? n : eol;
        stoppedInside = i >= limit;
      } else if (c == '/' && i + 1 < n && text.charAt(i + 1) == '*') {
        int close = text.indexOf("*/", i + 2);
        int end = close < 0 ? n : close + 2;
        blockComments.add(new Span(i, end));
        stoppedInside = end > limit || (close < 0 && end >= limit);
        i = end;
      } else if (c == '"') {
        int j = i + 1;
        while (j < n && text.charAt(j) != '"' && text.charAt(j) != '\n') {
          j++;
        }
        stoppedInside = j >= limit;
        i = j + 1;
      } else {
        if (c == '{') {
          open.push(i);
        } else if (c == '}' && !open.isEmpty()) {
          braces.add(new Span(open.pop(), i));
        }
        stoppedInside = false;
        i++;
      }
    }
  }

  public List<Span> braces() {
    return List.copyOf(braces);
  }

  public List<Span> blockComments() {
    return List.copyOf(blockComments);
  }
}
