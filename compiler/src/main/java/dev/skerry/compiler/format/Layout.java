package dev.skerry.compiler.format;

import dev.skerry.grammar.SkerryLexer;
import java.util.ArrayList;
import java.util.List;
import org.antlr.v4.runtime.Token;

/**
 * Lays out a token stream, comments included, as canonical lines. Top-level declarations start at
 * column 0, block items are indented by {@link #INDENT} per block, everything else of a
 * declaration stays on its line. Comments keep their place: a comment that followed code on the
 * same line stays at the end of that line (or inline, for a block comment); a comment on a line of
 * its own keeps a line of its own, indented like the code it precedes. A line comment in the
 * middle of a declaration ends the line, and the declaration continues on the next line indented
 * by {@link #CONTINUATION} more.
 */
final class Layout {
  static final int INDENT = 2;
  static final int CONTINUATION = 4;

  private enum Piece { NONE, OPEN_PAREN, UNARY_MINUS, OTHER }

  private final List<Token> tokens;
  private final Structure structure;
  private final List<Line> lines = new ArrayList<>();
  private Line current;
  private Piece last = Piece.NONE;
  private int depth;
  /** Set after a line comment or a comment on its own line: the next code starts a new line. */
  private boolean breakPending;
  /** False until a line has been started since the last code token (for the blank between groups). */
  private boolean gapHasLine;
  private Structure.Group previousGroup;

  private Layout(List<Token> tokens, Structure structure) {
    this.tokens = tokens;
    this.structure = structure;
  }

  /** The lines of the canonical layout of {@code tokens} (all channels, in order). */
  static List<Line> of(List<Token> tokens, Structure structure) {
    Layout layout = new Layout(tokens, structure);
    layout.run();
    return layout.lines;
  }

  private void run() {
    int newlines = 0;
    boolean first = true;
    for (int i = 0; i < tokens.size(); i++) {
      Token t = tokens.get(i);
      int type = t.getType();
      if (type == Token.EOF) {
        break;
      }
      if (type == SkerryLexer.WS) {
        newlines += count(t.getText(), '\n');
        continue;
      }
      boolean ownLine = first || newlines > 0;
      boolean blankInSource = newlines >= 2;
      newlines = 0;
      first = false;
      if (type == SkerryLexer.LINE_COMMENT || type == SkerryLexer.BLOCK_COMMENT) {
        comment(t, ownLine, blankInSource, nextCode(i));
      } else {
        code(t, blankInSource);
      }
    }
  }

  private void comment(Token t, boolean ownLine, boolean blankInSource, Token next) {
    boolean lineComment = t.getType() == SkerryLexer.LINE_COMMENT;
    if (!ownLine && current != null) {
      if (lineComment && !current.commentOnly) {
        current.trailing = t.getText();
      } else {
        append(t.getText(), Piece.OTHER, true);
      }
      breakPending |= lineComment;
      return;
    }
    boolean structural = next == null || startsLine(next);
    int indent = structural ? depth * INDENT : depth * INDENT + CONTINUATION;
    boolean blank = structural && blankBefore(next, blankInSource, false);
    startLine(indent, blank, true);
    append(t.getText(), Piece.OTHER, true);
    breakPending = true;
  }

  private void code(Token t, boolean blankInSource) {
    String text = t.getText();
    boolean close = text.equals("}");
    if (startsLine(t)) {
      int indent = (close ? depth - 1 : depth) * INDENT;
      startLine(indent, !close && blankBefore(t, blankInSource, true), false);
      Structure.Group group = structure.declarationAt(t.getTokenIndex());
      if (group != null) {
        previousGroup = group;
      }
    } else if (breakPending || current == null || current.commentOnly) {
      startLine(depth * INDENT + CONTINUATION, false, false);
    }
    Piece piece = Piece.OTHER;
    if (text.equals("(")) {
      piece = Piece.OPEN_PAREN;
    } else if (text.equals("-") && structure.unaryMinusAt(t.getTokenIndex())) {
      piece = Piece.UNARY_MINUS;
    }
    boolean spaceBefore = !text.equals(",") && !text.equals(")");
    append(text, piece, spaceBefore);
    current.opensBlock = text.equals("{");
    if (current.opensBlock) {
      depth++;
    } else if (close) {
      depth--;
    }
    breakPending = false;
    gapHasLine = false;
  }

  private boolean startsLine(Token t) {
    int index = t.getTokenIndex();
    return structure.declarationAt(index) != null || structure.itemAt(index) || t.getText().equals("}");
  }

  /**
   * Whether a blank line comes before a line that starts with {@code next} (or with a comment
   * that precedes it): never right after an opening brace or before a closing one, always between
   * top-level declarations of different groups, and otherwise where the source had one.
   */
  private boolean blankBefore(Token next, boolean blankInSource, boolean isCode) {
    if (lines.isEmpty() || lines.get(lines.size() - 1).opensBlock) {
      return false;
    }
    if (isCode && next.getText().equals("}")) {
      return false;
    }
    Structure.Group group = next == null ? null : structure.declarationAt(next.getTokenIndex());
    if (group != null && !gapHasLine && previousGroup != null && previousGroup.separatedFrom(group)) {
      return true;
    }
    return blankInSource;
  }

  private void startLine(int indent, boolean blank, boolean commentOnly) {
    current = new Line(Math.max(0, indent), blank, commentOnly);
    lines.add(current);
    last = Piece.NONE;
    gapHasLine = true;
  }

  private void append(String text, Piece piece, boolean spaceBefore) {
    boolean glued = last == Piece.OPEN_PAREN || (last == Piece.UNARY_MINUS && piece != Piece.UNARY_MINUS);
    if (!current.isEmpty() && spaceBefore && !glued) {
      current.code.append(' ');
    }
    current.code.append(text);
    last = piece;
  }

  private Token nextCode(int from) {
    for (int j = from + 1; j < tokens.size(); j++) {
      Token t = tokens.get(j);
      if (t.getType() == Token.EOF) {
        return null;
      }
      if (t.getChannel() == Token.DEFAULT_CHANNEL) {
        return t;
      }
    }
    return null;
  }

  private static int count(String text, char c) {
    int n = 0;
    for (int i = 0; i < text.length(); i++) {
      if (text.charAt(i) == c) {
        n++;
      }
    }
    return n;
  }
}
