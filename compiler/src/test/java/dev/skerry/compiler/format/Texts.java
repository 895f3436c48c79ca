package dev.skerry.compiler.format;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.grammar.SkerryLexer;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.Token;

/** Helpers shared by the formatter and diff tests: examples, token views, layout noise. */
public final class Texts {
  public static final Path EXAMPLES = Path.of("../examples").toAbsolutePath().normalize();

  private Texts() {}

  public static List<Path> examples() {
    try (var files = Files.list(EXAMPLES)) {
      return files.filter(p -> p.toString().endsWith(".skerry")).sorted().toList();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot list the examples", e);
    }
  }

  public static String read(Path file) {
    try {
      return Files.readString(file);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read " + file, e);
    }
  }

  /** Checks {@code text} as if it were the file {@code place} (so its includes resolve). */
  public static CheckResult check(Path place, String text) {
    return ScenarioChecker.check(SourceFile.of(place, text), new DiskLoader(EXAMPLES));
  }

  public static List<Token> tokens(String text) {
    SkerryLexer lexer = new SkerryLexer(CharStreams.fromString(text));
    lexer.removeErrorListeners();
    CommonTokenStream stream = new CommonTokenStream(lexer);
    stream.fill();
    return stream.getTokens().stream().filter(t -> t.getType() != Token.EOF).toList();
  }

  public static boolean isComment(Token t) {
    return t.getType() == SkerryLexer.LINE_COMMENT || t.getType() == SkerryLexer.BLOCK_COMMENT;
  }

  /** Every comment's text, in order. */
  public static List<String> comments(String text) {
    return tokens(text).stream().filter(Texts::isComment).map(Token::getText).toList();
  }

  /** Code and comments in order, whitespace left out. */
  public static List<String> significant(String text) {
    return tokens(text).stream().filter(t -> t.getType() != SkerryLexer.WS).map(Token::getText).toList();
  }

  /** For each comment, whether it starts a line of its own (true) or follows code on its line. */
  public static List<Boolean> commentOwnsLine(String text) {
    List<Boolean> out = new ArrayList<>();
    boolean newlineSince = true;
    for (Token t : tokens(text)) {
      if (t.getType() == SkerryLexer.WS) {
        newlineSince |= t.getText().indexOf('\n') >= 0;
        continue;
      }
      if (isComment(t)) {
        out.add(newlineSince);
      }
      newlineSince = false;
    }
    return out;
  }

  /**
   * The same tokens with random whitespace and fresh, numbered comments between them: blank
   * lines, tabs, line comments of both kinds, inline and multi-line block comments.
   */
  public static String withNoise(String text, long seed) {
    Random random = new Random(seed);
    StringBuilder out = new StringBuilder();
    int comment = 0;
    boolean needNewline = false;
    for (Token t : tokens(text)) {
      if (t.getType() == SkerryLexer.WS) {
        continue;
      }
      if (out.length() > 0) {
        String gap = switch (random.nextInt(12)) {
          case 0 -> "\n";
          case 1 -> "\n\n\n";
          case 2 -> "\t ";
          case 3 -> " /* n" + comment++ + " */ ";
          case 4 -> " // n" + comment++ + "\n";
          case 5 -> "\n# n" + comment++ + "\n";
          case 6 -> "\n/* n" + comment++ + "\n   more */\n";
          case 7 -> "   ";
          default -> " ";
        };
        out.append(needNewline && gap.indexOf('\n') < 0 ? gap + "\n" : gap);
      }
      out.append(t.getText());
      needNewline = t.getType() == SkerryLexer.LINE_COMMENT;
    }
    return out.append(needNewline ? "\n" : "").toString();
  }
}
