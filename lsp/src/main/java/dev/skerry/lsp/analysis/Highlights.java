package dev.skerry.lsp.analysis;

import dev.skerry.compiler.check.Symbol;
import dev.skerry.compiler.check.SymbolTable;
import dev.skerry.compiler.syntax.ScenarioReader;
import dev.skerry.grammar.SkerryLexer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.Token;

/**
 * Classifies the text for highlighting: the lexer gives keywords, numbers, strings and comments;
 * the analysis tells names (declared or used) from keywords written where a name stands, and a
 * word after a number is its unit.
 */
public final class Highlights {
  /** What a piece of text is. */
  public enum Kind { KEYWORD, NUMBER, STRING, COMMENT, NAME, UNIT, OPTION }

  /** One classified piece: {@code [start, end)} offsets, its kind, and whether it declares or names a constant. */
  public record Piece(int start, int end, Kind kind, boolean declaration, boolean constant) {}

  private static final int CLOSE_PAREN = literal("')'");
  private static final int COMMA = literal("','");

  private Highlights() {}

  private static int literal(String quoted) {
    for (int t = 1; t <= SkerryLexer.VOCABULARY.getMaxTokenType(); t++) {
      if (quoted.equals(SkerryLexer.VOCABULARY.getLiteralName(t))) {
        return t;
      }
    }
    throw new IllegalStateException("the grammar has no token " + quoted);
  }

  public static List<Piece> of(AnalysisResult result) {
    String text = result.main().text();
    List<Piece> out = new ArrayList<>();
    if (text.length() > ScenarioReader.MAX_CHARS) {
      return out;
    }
    Map<Integer, Symbol> declared = new HashMap<>();
    Map<Integer, Symbol> used = new HashMap<>();
    SymbolTable table = result.check().symbols();
    for (Symbol s : table.symbols()) {
      if (result.isMain(s.name().range().source())) {
        declared.put(s.name().range().start(), s);
      }
    }
    for (SymbolTable.Reference r : table.references()) {
      if (result.isMain(r.at().range().source())) {
        used.put(r.at().range().start(), r.target());
      }
    }
    SkerryLexer lexer = new SkerryLexer(CharStreams.fromString(text));
    lexer.removeErrorListeners();
    int previous = -1;
    boolean unitsLine = false;
    for (Token t : lexer.getAllTokens()) {
      int type = t.getType();
      if (t.getChannel() == Token.DEFAULT_CHANNEL) {
        unitsLine = type == SkerryLexer.UNITS || (unitsLine && (type == COMMA || type == SkerryLexer.IDENT
            || type == SkerryLexer.UNIT));
      }
      int start = t.getStartIndex();
      int end = t.getStopIndex() + 1;
      Symbol name = declared.containsKey(start) ? declared.get(start) : used.get(start);
      if (name != null) {
        out.add(new Piece(start, end, Kind.NAME, declared.containsKey(start), name.kind() == Symbol.Kind.CONSTANT));
      } else if (type == SkerryLexer.LINE_COMMENT || type == SkerryLexer.BLOCK_COMMENT) {
        out.add(new Piece(start, end, Kind.COMMENT, false, false));
      } else if (type == SkerryLexer.NUMBER) {
        out.add(new Piece(start, end, Kind.NUMBER, false, false));
      } else if (type == SkerryLexer.STRING) {
        out.add(new Piece(start, end, Kind.STRING, false, false));
      } else if (type == SkerryLexer.UNIT || type == SkerryLexer.PERCENT
          || (type == SkerryLexer.IDENT && (unitsLine || previous == SkerryLexer.NUMBER || previous == CLOSE_PAREN))) {
        out.add(new Piece(start, end, Kind.UNIT, false, false));
      } else if (type == SkerryLexer.IDENT) {
        out.add(new Piece(start, end, Kind.OPTION, false, false));
      } else if (type >= SkerryLexer.SCENARIO && type <= SkerryLexer.OFF) {
        out.add(new Piece(start, end, Kind.KEYWORD, false, false));
      }
      if (t.getChannel() == Token.DEFAULT_CHANNEL) {
        previous = type;
      }
    }
    return out;
  }
}
