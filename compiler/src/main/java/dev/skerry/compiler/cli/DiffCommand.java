package dev.skerry.compiler.cli;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.semdiff.DiffJson;
import dev.skerry.compiler.semdiff.DiffReport;
import dev.skerry.compiler.semdiff.DiffText;
import dev.skerry.compiler.semdiff.ScenarioDiff;
import dev.skerry.compiler.semdiff.SizeSource;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code skerry diff OLD NEW}: what a change to a scenario does to the mission and to the problem size. */
@Command(
    name = "diff",
    mixinStandardHelpOptions = true,
    description = {
      "Compare two versions of a scenario by meaning: entities added, removed, renamed and",
      "changed field by field, plan options, and the predicted MILP sizes before and after.",
      "Layout and comments do not count. Either file may be - for standard input, e.g.",
      "  git show HEAD~1:harbour.skerry | skerry diff - harbour.skerry",
      "With --for-git the arguments are the seven (or nine) that git passes to an external diff",
      "program; see docs/version-control.md.",
      "Exit code: 0 same meaning, 1 differences found, 2 misuse or a version with errors",
      "(with --for-git always 0, since git stops at any other exit code)."
    })
final class DiffCommand implements Callable<Integer> {
  /** The name git gives a side that does not exist (a file added or deleted). */
  private static final String NO_FILE = "/dev/null";

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(arity = "2..9", paramLabel = "FILE", description = "OLD and NEW scenario files, - for standard input.")
  List<String> operands;

  @Option(names = "--json", description = "Print one JSON document instead of text.")
  boolean json;

  @Option(names = "--for-git", description = "Take git's external-diff arguments: PATH OLD-FILE OLD-HEX OLD-MODE NEW-FILE NEW-HEX NEW-MODE.")
  boolean forGit;

  @Option(names = "--root", paramLabel = "DIR",
      description = "Workspace root that includes may not leave (default: the current folder, or the file's folder).")
  Path root;

  /** A version that cannot be compared; the command reports it and exits with 2. */
  private static final class Trouble extends Exception {
    Trouble(String message) {
      super(message);
    }
  }

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    String oldName;
    String newName;
    String oldLabel;
    String newLabel;
    Path gitPath = null;
    if (forGit) {
      if (operands.size() != 7 && operands.size() != 9) {
        err.println("skerry diff: --for-git expects the 7 or 9 arguments git passes, got " + operands.size());
        return 2;
      }
      gitPath = Path.of(operands.get(0));
      oldName = operands.get(1);
      newName = operands.get(4);
      oldLabel = operands.get(0);
      newLabel = operands.size() == 9 ? operands.get(7) : operands.get(0);
    } else {
      if (operands.size() != 2) {
        err.println("skerry diff: give two files, OLD and NEW (either may be -)");
        return 2;
      }
      oldName = operands.get(0);
      newName = operands.get(1);
      if (oldName.equals("-") && newName.equals("-")) {
        err.println("skerry diff: only one of OLD and NEW can be read from standard input");
        return 2;
      }
      oldLabel = oldName.equals("-") ? "<stdin>" : oldName;
      newLabel = newName.equals("-") ? "<stdin>" : newName;
    }
    DiffReport report;
    try {
      Scenario before = load(oldName, oldLabel, newName, gitPath);
      Scenario after = load(newName, newLabel, oldName, gitPath);
      report = ScenarioDiff.compare(oldLabel, before, newLabel, after, SizeTable::figures);
    } catch (Trouble e) {
      PrintWriter to = forGit ? out : err;
      to.println((forGit ? oldLabel + ": " : "skerry diff: ") + e.getMessage());
      to.flush();
      return forGit ? 0 : 2;
    }
    print(out, report, forGit ? oldLabel.equals(newLabel) ? oldLabel : oldLabel + " → " + newLabel : null);
    out.flush();
    return forGit || report.identical() ? 0 : 1;
  }

  private void print(PrintWriter out, DiffReport report, String heading) {
    if (json) {
      out.println(DiffJson.text(report));
      return;
    }
    String indent = heading == null ? "" : "  ";
    if (heading != null) {
      out.println(heading + " (meaning)");
    }
    for (String line : DiffText.lines(report)) {
      out.println(indent + line);
    }
  }

  /**
   * Reads and checks one version. Returns null for "no scenario" (git's /dev/null, an empty file or
   * one with only comments). Standard input resolves includes next to the other file.
   */
  private Scenario load(String name, String label, String other, Path gitPath) throws Trouble {
    String text;
    SourceFile source;
    Path workspace;
    try {
      if (name.equals("-")) {
        text = FmtCommand.readAll(System.in);
        Path base = !other.equals("-") && Files.isRegularFile(Path.of(other))
            ? Path.of(other).toAbsolutePath().getParent() : Path.of("").toAbsolutePath();
        workspace = root != null ? root.toAbsolutePath().normalize() : base;
        source = new SourceFile(base.resolve(".stdin.skerry"), label, text);
      } else if (name.equals(NO_FILE)) {
        return null;
      } else {
        Path file = Path.of(name);
        if (!Files.isRegularFile(file)) {
          throw new Trouble(name + ": no such file");
        }
        text = DiskLoader.readText(file);
        Path place = gitPath != null ? gitPath : file;
        workspace = Inputs.root(place, root);
        source = new SourceFile(place.toAbsolutePath().normalize(), label, text);
      }
    } catch (IOException e) {
      throw new Trouble(name + ": cannot read: " + e.getMessage());
    }
    CheckResult result = ScenarioChecker.check(source, new DiskLoader(workspace));
    if (result.scenario() != null) {
      return result.scenario();
    }
    boolean nothingWritten = result.main().decls().isEmpty()
        && result.diagnostics().stream().allMatch(d -> d.code() == Code.MISSING_DECLARATION);
    if (nothingWritten) {
      return null;
    }
    StringBuilder message = new StringBuilder(label + " has errors, so its meaning cannot be compared:");
    for (Diagnostic d : result.diagnostics()) {
      if (d.isError()) {
        message.append("\n  ").append(d.format());
      }
    }
    throw new Trouble(message.toString());
  }
}
