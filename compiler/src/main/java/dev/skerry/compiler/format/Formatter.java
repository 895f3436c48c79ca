package dev.skerry.compiler.format;

import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.syntax.ScenarioReader;
import dev.skerry.grammar.SkerryLexer;
import dev.skerry.grammar.SkerryParser;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.antlr.v4.runtime.BailErrorStrategy;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.atn.PredictionMode;
import org.antlr.v4.runtime.misc.ParseCancellationException;

/**
 * The canonical layout of a scenario file, shared by {@code skerry fmt} and the language server.
 * Works on the token stream, comments included, so only whitespace ever changes: the tokens and
 * the comments of the result are those of the input, in the same order. A file that cannot be read
 * is returned untouched with the reasons.
 */
public final class Formatter {
  /** Codes that mean the text was not read as a whole, so there is no layout to give it. */
  private static final Set<Code> UNREADABLE = Set.of(Code.SYNTAX_ERROR, Code.NESTING_TOO_DEEP, Code.FILE_TOO_LARGE);

  /** Columns between the end of the code and a trailing comment, at least. */
  static final int COMMENT_GAP = 2;

  private Formatter() {}

  public static FormatResult format(SourceFile source) {
    String original = source.text();
    Diagnostics sink = new Diagnostics();
    ScenarioReader.read(source, sink);
    List<Diagnostic> problems = sink.all().stream().filter(d -> UNREADABLE.contains(d.code())).toList();
    if (!problems.isEmpty()) {
      return new FormatResult(original, original, false, problems);
    }
    CommonTokenStream tokens = lex(original);
    SkerryParser.FileContext tree = parse(tokens, source);
    String text = render(Layout.of(tokens.getTokens(), Structure.of(tree)));
    requireSameTokens(original, text, source);
    return new FormatResult(original, text, true, List.of());
  }

  /** Convenience for callers that hold only text (tests, editors). */
  public static String format(String text) {
    return format(SourceFile.anonymous("<text>", text)).text();
  }

  private static CommonTokenStream lex(String text) {
    SkerryLexer lexer = new SkerryLexer(CharStreams.fromString(text));
    lexer.removeErrorListeners();
    CommonTokenStream tokens = new CommonTokenStream(lexer);
    tokens.fill();
    return tokens;
  }

  private static SkerryParser.FileContext parse(CommonTokenStream tokens, SourceFile source) {
    SkerryParser parser = new SkerryParser(tokens);
    parser.removeErrorListeners();
    parser.setErrorHandler(new BailErrorStrategy());
    parser.getInterpreter().setPredictionMode(PredictionMode.SLL);
    try {
      return parser.file();
    } catch (ParseCancellationException e) {
      tokens.seek(0);
      parser.reset();
      parser.getInterpreter().setPredictionMode(PredictionMode.LL);
      try {
        return parser.file();
      } catch (ParseCancellationException again) {
        throw new IllegalStateException("the reader accepted " + source + " but the formatter cannot parse it", again);
      }
    }
  }

  /** Joins lines, lining up trailing comments within each run of neighbouring lines of one indentation. */
  static String render(List<Line> lines) {
    StringBuilder out = new StringBuilder();
    List<Line> run = new ArrayList<>();
    for (Line line : lines) {
      if (!run.isEmpty() && !continuesRun(run.get(run.size() - 1), line)) {
        renderRun(run, out);
        run.clear();
      }
      run.add(line);
    }
    renderRun(run, out);
    return out.toString();
  }

  private static boolean continuesRun(Line previous, Line line) {
    return !line.blankBefore && line.alignable() && previous.alignable() && line.indent == previous.indent;
  }

  private static void renderRun(List<Line> run, StringBuilder out) {
    int column = 0;
    for (Line line : run) {
      if (line.trailing != null) {
        column = Math.max(column, line.width() + COMMENT_GAP);
      }
    }
    for (Line line : run) {
      if (line.blankBefore) {
        out.append('\n');
      }
      out.append(" ".repeat(line.indent)).append(line.code);
      if (line.trailing != null) {
        int pad = line.alignable() ? column - line.width() : COMMENT_GAP;
        out.append(" ".repeat(pad)).append(line.trailing);
      }
      out.append('\n');
    }
  }

  /** Guards the promise that formatting changes whitespace only. */
  private static void requireSameTokens(String before, String after, SourceFile source) {
    List<String> a = significant(before);
    List<String> b = significant(after);
    if (!a.equals(b)) {
      throw new IllegalStateException("formatting " + source + " would change its tokens or comments; "
          + "the file is left as it is");
    }
  }

  private static List<String> significant(String text) {
    List<String> out = new ArrayList<>();
    for (Token t : lex(text).getTokens()) {
      if (t.getType() != SkerryLexer.WS && t.getType() != Token.EOF) {
        out.add(t.getType() + ":" + t.getText());
      }
    }
    return out;
  }
}
