package dev.skerry.compiler.syntax;

import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.grammar.SkerryLexer;
import dev.skerry.grammar.SkerryParser;
import java.util.List;
import org.antlr.v4.runtime.BailErrorStrategy;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.DefaultErrorStrategy;
import org.antlr.v4.runtime.atn.PredictionMode;
import org.antlr.v4.runtime.misc.ParseCancellationException;

/**
 * Reads one file's text into its declarations: guards against pathological input, lexes, parses
 * (fast SLL first, full LL with error recovery only when that fails) and builds the AST. Syntax
 * errors become diagnostics; the declarations that could be read are still returned.
 */
public final class ScenarioReader {
  /** Largest file read, in characters (a 2,000-zone scenario is about 100 KB). */
  public static final int MAX_CHARS = 4 * 1024 * 1024;

  /** Deepest nesting of brackets accepted. */
  public static final int MAX_NESTING = 200;

  private ScenarioReader() {}

  public static ScenarioFile read(SourceFile source, Diagnostics sink) {
    Offsets offsets = new Offsets(source);
    if (source.length() > MAX_CHARS) {
      sink.report(Code.FILE_TOO_LARGE, new SourceRange(source, 0, 0),
          "the file has " + source.length() + " characters; Skerry reads files of up to " + MAX_CHARS
              + " (split zones into included files)");
      return new ScenarioFile(source, List.of());
    }
    int deepAt = deepNesting(source.text());
    if (deepAt >= 0) {
      sink.report(Code.NESTING_TOO_DEEP, new SourceRange(source, deepAt, deepAt + 1),
          "brackets nest more than " + MAX_NESTING + " levels deep here; simplify the expression");
      return new ScenarioFile(source, List.of());
    }
    try {
      SkerryParser.FileContext tree = parse(source, sink, offsets);
      return new AstBuilder(source, offsets, sink).file(tree);
    } catch (StackOverflowError e) {
      sink.report(Code.NESTING_TOO_DEEP, new SourceRange(source, 0, 0),
          "the file nests too deeply to read (a very long chain of operators or signs); simplify it");
      return new ScenarioFile(source, List.of());
    }
  }

  private static SkerryParser.FileContext parse(SourceFile source, Diagnostics sink, Offsets offsets) {
    SkerryLexer lexer = new SkerryLexer(CharStreams.fromString(source.text(), source.displayName()));
    lexer.removeErrorListeners();
    CommonTokenStream tokens = new CommonTokenStream(lexer);
    SkerryParser parser = new SkerryParser(tokens);
    parser.removeErrorListeners();
    parser.getInterpreter().setPredictionMode(PredictionMode.SLL);
    parser.setErrorHandler(new BailErrorStrategy());
    try {
      return parser.file();
    } catch (ParseCancellationException e) {
      tokens.seek(0);
      parser.reset();
      parser.addErrorListener(new SyntaxErrors(sink, offsets));
      parser.setErrorHandler(new DefaultErrorStrategy());
      parser.getInterpreter().setPredictionMode(PredictionMode.LL);
      return parser.file();
    }
  }

  /**
   * The offset where brackets first nest deeper than {@link #MAX_NESTING}, or -1. Skips comments
   * and strings, as the lexer does.
   */
  static int deepNesting(String text) {
    int depth = 0;
    int n = text.length();
    for (int i = 0; i < n; i++) {
      char c = text.charAt(i);
      if (c == '#' || (c == '/' && i + 1 < n && text.charAt(i + 1) == '/')) {
        while (i < n && text.charAt(i) != '\n') {
          i++;
        }
      } else if (c == '/' && i + 1 < n && text.charAt(i + 1) == '*') {
        int close = text.indexOf("*/", i + 2);
        i = close < 0 ? n : close + 1;
      } else if (c == '"') {
        while (i + 1 < n && text.charAt(i + 1) != '"' && text.charAt(i + 1) != '\n') {
          i++;
        }
        i++;
      } else if (c == '(' || c == '{') {
        if (++depth > MAX_NESTING) {
          return i;
        }
      } else if (c == ')' || c == '}') {
        depth = Math.max(0, depth - 1);
      }
    }
    return -1;
  }
}
