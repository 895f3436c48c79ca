package dev.skerry.compiler.cli;

import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.format.FormatResult;
import dev.skerry.compiler.format.Formatter;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code skerry fmt FILE...}: rewrite scenarios in the canonical layout. */
@Command(
    name = "fmt",
    mixinStandardHelpOptions = true,
    description = {
      "Rewrite scenarios in the canonical layout, keeping every comment where it belongs.",
      "Files are rewritten in place (through a temporary file and a move) unless --check or",
      "--stdout is given; `-` reads standard input and prints the result. A file that does not",
      "parse is left untouched and its syntax errors are reported.",
      "Exit code: 0 done (or, with --check, nothing to change), 1 files would change or do not",
      "parse, 2 misuse."
    })
final class FmtCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(arity = "1..*", paramLabel = "FILE", description = "Scenario files (.skerry), or - for standard input.")
  List<String> files;

  @Option(names = "--check", description = "Change nothing; list the files whose layout is not canonical.")
  boolean check;

  @Option(names = "--stdout", description = "Print the formatted text instead of rewriting the files.")
  boolean toStdout;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    if (check && toStdout) {
      err.println("skerry fmt: --check and --stdout do not go together; choose one");
      return 2;
    }
    boolean findings = false;
    for (String name : files) {
      SourceFile source;
      try {
        source = read(name);
      } catch (IOException e) {
        err.println("skerry fmt: " + e.getMessage());
        return 2;
      }
      FormatResult result = Formatter.format(source);
      if (!result.formatted()) {
        for (Diagnostic d : result.diagnostics()) {
          err.println(d.format());
        }
        err.println(name + ": not formatted (fix the syntax errors first)");
        findings = true;
        continue;
      }
      if (check) {
        if (result.changed()) {
          out.println(name);
          findings = true;
        }
      } else if (toStdout || name.equals("-")) {
        out.print(result.text());
      } else if (result.changed()) {
        try {
          replace(Path.of(name), result.text());
        } catch (IOException e) {
          err.println("skerry fmt: " + name + ": cannot write: " + e.getMessage());
          return 2;
        }
      }
    }
    out.flush();
    err.flush();
    return findings ? 1 : 0;
  }

  private static SourceFile read(String name) throws IOException {
    if (name.equals("-")) {
      return SourceFile.anonymous("<stdin>", readAll(System.in));
    }
    Path file = Path.of(name);
    if (!Files.isRegularFile(file)) {
      throw new IOException(name + ": no such file");
    }
    return new SourceFile(file.toAbsolutePath().normalize(), name, DiskLoader.readText(file));
  }

  static String readAll(InputStream in) throws IOException {
    return new String(in.readAllBytes(), StandardCharsets.UTF_8);
  }

  /**
   * Writes {@code text} to a temporary file beside the real file (links followed), keeps its
   * permissions, and moves it over the original, so a reader never sees half a file.
   */
  static void replace(Path file, String text) throws IOException {
    Path target = file.toRealPath();
    Path folder = target.getParent();
    Path temporary = Files.createTempFile(folder, "." + target.getFileName() + ".", ".fmt");
    try {
      Files.writeString(temporary, text, StandardCharsets.UTF_8);
      PosixFileAttributeView view = Files.getFileAttributeView(target, PosixFileAttributeView.class);
      if (view != null) {
        Files.setPosixFilePermissions(temporary, view.readAttributes().permissions());
      }
      try {
        Files.move(temporary, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING);
      }
    } finally {
      Files.deleteIfExists(temporary);
    }
  }
}
