package dev.skerry.compiler.syntax;

import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.grammar.SkerryLexer;
import dev.skerry.grammar.SkerryParser;
import java.util.ArrayList;
import java.util.List;
import org.antlr.v4.runtime.BaseErrorListener;
import org.antlr.v4.runtime.Parser;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Recognizer;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.misc.IntervalSet;

/**
 * Replaces ANTLR's console listener: turns the parser's expected-token sets into words a user
 * knows ("expected a vehicle property such as `speed max 3 m/s`") and reports them as
 * {@code syntax-error} diagnostics with the offending token's range.
 */
final class SyntaxErrors extends BaseErrorListener {
  private final Diagnostics sink;
  private final Offsets offsets;

  SyntaxErrors(Diagnostics sink, Offsets offsets) {
    this.sink = sink;
    this.offsets = offsets;
  }

  @Override
  public void syntaxError(
      Recognizer<?, ?> recognizer, Object offending, int line, int col, String antlrMessage, RecognitionException e) {
    if (offending instanceof Token token) {
      String message;
      if (recognizer instanceof Parser parser) {
        message = describe(token, parser.getExpectedTokens());
      } else {
        message = "unexpected character";
      }
      sink.report(Code.SYNTAX_ERROR, offsets.range(token), message);
    } else {
      sink.report(Code.SYNTAX_ERROR, offsets.rangeAt(line, col), "unexpected character");
    }
  }

  static String describe(Token found, IntervalSet expected) {
    String what = found.getType() == Token.EOF ? "the end of the file" : quote(found.getText());
    if (found.getType() == SkerryLexer.UNEXPECTED_CHAR) {
      return "unexpected character " + what + " (Skerry uses letters, digits, `( ) { } , = + - * / %`, `\"` and comments)";
    }
    String expectation = expectation(expected);
    return expectation == null ? "unexpected " + what : "expected " + expectation + ", found " + what;
  }

  private static String expectation(IntervalSet expected) {
    if (expected == null || expected.isNil()) {
      return null;
    }
    if (expected.contains(SkerryLexer.VEHICLE) && expected.contains(SkerryLexer.ZONE)) {
      return "a declaration (`vehicle`, `area`, `zone`, `target`, `waypoint`, `plan`, `const`, `include`)";
    }
    if (expected.contains(SkerryLexer.SPEED) && expected.contains(SkerryLexer.RADIUS)) {
      return "a vehicle property (`dynamics`, `start`, `speed max`, `accel max`, `radius`, `sides`) or `}`";
    }
    if (expected.contains(SkerryLexer.HORIZON) && expected.contains(SkerryLexer.STEP)) {
      return "a plan option (`step`, `horizon`, `minimize`, `clusters`, `closed_loop`, `solver`, `guard`, "
          + "`pruning`, `sides`) or `}`";
    }
    if (expected.contains(SkerryLexer.NUMBER) && expected.contains(SkerryLexer.IDENT)) {
      return "a value such as `4 m`, `3 m/s` or a constant's name";
    }
    if (expected.contains(SkerryLexer.BOX) && expected.contains(SkerryLexer.POLYGON)) {
      return expected.contains(SkerryLexer.POINT)
          ? "a region: `box (x, y) to (x, y)`, `polygon (x, y) ...` or `point (x, y) within d`"
          : "a shape: `box (x, y) to (x, y)` or `polygon (x, y) (x, y) (x, y) ...`";
    }
    if (expected.contains(SkerryLexer.IDENT)) {
      return "a name";
    }
    List<String> words = new ArrayList<>();
    for (int type : expected.toArray()) {
      words.add(tokenWord(type));
      if (words.size() > 6) {
        break;
      }
    }
    return words.size() == 1 ? words.get(0) : "one of " + String.join(", ", words);
  }

  private static String tokenWord(int type) {
    if (type == Token.EOF) {
      return "the end of the file";
    }
    String literal = SkerryParser.VOCABULARY.getLiteralName(type);
    if (literal != null) {
      return "`" + literal.substring(1, literal.length() - 1) + "`";
    }
    return switch (type) {
      case SkerryLexer.NUMBER -> "a number";
      case SkerryLexer.STRING -> "a quoted file name";
      case SkerryLexer.UNIT, SkerryLexer.PERCENT -> "a unit";
      default -> SkerryParser.VOCABULARY.getDisplayName(type).toLowerCase();
    };
  }

  private static String quote(String text) {
    String shown = text.length() > 40 ? text.substring(0, 40) + "…" : text;
    StringBuilder b = new StringBuilder("`");
    for (char c : shown.toCharArray()) {
      b.append(c < 0x20 || c == 0x7f ? String.format("\\x%02x", (int) c) : String.valueOf(c));
    }
    return b.append('`').toString();
  }
}
