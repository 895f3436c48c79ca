package dev.skerry.compiler.cli;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Reads a scenario named on the command line and checks it, with includes confined to a workspace root. */
final class Inputs {
  private Inputs() {}

  /** A usage problem the command reports with exit code 2. */
  static final class UsageProblem extends Exception {
    UsageProblem(String message) {
      super(message);
    }
  }

  /**
   * The workspace root: {@code --root} when given; otherwise the current folder when the file
   * lies inside it, else the file's own folder.
   */
  static Path root(Path file, Path explicitRoot) {
    if (explicitRoot != null) {
      return explicitRoot.toAbsolutePath().normalize();
    }
    Path cwd = Path.of("").toAbsolutePath().normalize();
    Path abs = file.toAbsolutePath().normalize();
    return abs.startsWith(cwd) ? cwd : abs.getParent();
  }

  static CheckResult check(Path file, Path explicitRoot) throws UsageProblem {
    if (!Files.isRegularFile(file)) {
      throw new UsageProblem(file + ": no such file");
    }
    String text;
    try {
      text = DiskLoader.readText(file);
    } catch (IOException e) {
      throw new UsageProblem(file + ": cannot read: " + e.getMessage());
    }
    Path root = root(file, explicitRoot);
    SourceFile source = new SourceFile(file.toAbsolutePath().normalize(), file.toString(), text);
    return ScenarioChecker.check(source, new DiskLoader(root));
  }
}
