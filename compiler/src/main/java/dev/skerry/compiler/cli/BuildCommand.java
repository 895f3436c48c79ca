package dev.skerry.compiler.cli;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.io.FixedPrecision;
import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code skerry build FILE -o OUT}: lower a scenario to a MILP and write it as MPS or LP. */
@Command(
    name = "build",
    mixinStandardHelpOptions = true,
    description = {
      "Lower a scenario to its MILP and write it for any solver: free MPS (.mps), fixed MPS",
      "(.fixed.mps) or the common LP text format (.lp). The file is the exact model `skerry solve`",
      "solves, byte for byte the same for the same scenario. Nothing is written when the scenario",
      "has errors. Exit code: 0 written, 1 errors in the scenario, 2 misuse."
    })
final class BuildCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(index = "0", paramLabel = "FILE", description = "Scenario file (.skerry).")
  Path file;

  @Option(names = {"-o", "--output"}, required = true, paramLabel = "OUT", description = "Model file to write.")
  Path output;

  @Option(names = "--format", paramLabel = "FORMAT",
      description = "mps, fixed-mps or lp (default: from the output's extension).")
  String format;

  @Option(names = "--root", paramLabel = "DIR", description = "Workspace root that includes may not leave.")
  Path root;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    ModelFormat chosen;
    try {
      chosen = format == null ? ModelFormat.fromPath(output) : parseFormat(format);
    } catch (IllegalArgumentException e) {
      err.println("skerry build: " + e.getMessage());
      return 2;
    }
    try {
      if (Files.exists(output) && Files.isSameFile(output, file)) {
        err.println("skerry build: refusing to write the model over its own scenario " + file);
        return 2;
      }
    } catch (IOException e) {
      err.println("skerry build: " + e.getMessage());
      return 2;
    }
    CheckResult result;
    try {
      result = Inputs.check(file, root);
    } catch (Inputs.UsageProblem e) {
      err.println("skerry build: " + e.getMessage());
      return 2;
    }
    for (Diagnostic d : result.diagnostics()) {
      (d.isError() ? err : out).println(d.format());
    }
    if (result.hasErrors() || result.scenario() == null) {
      err.println("skerry build: " + file + " has errors; nothing written");
      return 1;
    }
    Milp milp = Lowering.lower(result.scenario());
    if (chosen == ModelFormat.FIXED_MPS) {
      FixedPrecision.Rounded rounded = FixedPrecision.round(milp);
      milp = rounded.milp();
      if (rounded.changed() > 0) {
        out.printf(Locale.ROOT, "fixed MPS holds 12-character numbers: %d values rounded, largest relative change"
            + " %.1e (use free MPS for the exact model)%n", rounded.changed(), rounded.maxRelativeChange());
      }
    }
    ModelFiles.Written written;
    try {
      written = ModelFiles.write(milp, output, chosen);
    } catch (IOException | IllegalArgumentException e) {
      err.println("skerry build: cannot write " + output + ": " + e.getMessage());
      return 1;
    }
    out.printf(Locale.ROOT, "wrote %s (%s): %,d binaries, %,d continuous, %,d rows, %,d non-zeros%n", output,
        chosen.name().toLowerCase(Locale.ROOT).replace('_', '-'), milp.binaryCount(), milp.continuousCount(),
        milp.rowCount(), milp.nonZeros());
    written.nameMap().ifPresent(p -> out.println("long names are shortened; the map is in " + p));
    if (!milp.objective().minimize()) {
      out.println("the objective is written negated (files hold minimisations only)");
    }
    return 0;
  }

  private static ModelFormat parseFormat(String text) {
    switch (text) {
      case "mps":
        return ModelFormat.MPS;
      case "fixed-mps":
        return ModelFormat.FIXED_MPS;
      case "lp":
        return ModelFormat.LP;
      default:
        throw new IllegalArgumentException("unknown format `" + text + "`; choose mps, fixed-mps or lp");
    }
  }
}
