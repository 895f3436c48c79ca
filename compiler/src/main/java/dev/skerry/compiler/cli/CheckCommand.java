package dev.skerry.compiler.cli;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.diag.Diagnostic;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code skerry check FILE...}: diagnostics, then the predicted MILP sizes. */
@Command(
    name = "check",
    mixinStandardHelpOptions = true,
    description = {
      "Check scenarios without solving: report every problem found, then the size of the MILP",
      "each would lower to (binaries by cause, continuous variables, rows, non-zeros).",
      "Exit code: 0 no errors, 1 errors found, 2 misuse."
    })
final class CheckCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(arity = "1..*", paramLabel = "FILE", description = "Scenario files (.skerry).")
  List<Path> files;

  @Option(names = "--json", description = "Print one JSON document instead of text.")
  boolean json;

  @Option(names = "--root", paramLabel = "DIR",
      description = "Workspace root that includes may not leave (default: the current folder, or the file's folder).")
  Path root;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    boolean errors = false;
    JsonArray reports = new JsonArray();
    for (Path file : files) {
      CheckResult result;
      try {
        result = Inputs.check(file, root);
      } catch (Inputs.UsageProblem e) {
        err.println("skerry check: " + e.getMessage());
        return 2;
      }
      errors |= result.hasErrors();
      if (json) {
        JsonObject report = new JsonObject();
        report.addProperty("file", file.toString());
        report.addProperty("ok", !result.hasErrors());
        report.add("diagnostics", DiagnosticJson.of(result.diagnostics()));
        SizeTable.addJson(report, result);
        reports.add(report);
      } else {
        for (Diagnostic d : result.diagnostics()) {
          out.println(d.format());
          for (Diagnostic.Related r : d.related()) {
            out.println("  " + r.range() + ": note: " + r.message());
          }
        }
        long errorCount = result.diagnostics().stream().filter(Diagnostic::isError).count();
        long others = result.diagnostics().size() - errorCount;
        out.println(file + ": " + (errorCount == 0 ? "ok" : errorCount + " error" + (errorCount == 1 ? "" : "s"))
            + (others > 0 ? ", " + others + " warning" + (others == 1 ? "" : "s") + " or hint" + (others == 1 ? "" : "s") : ""));
        SizeTable.print(out, result);
      }
    }
    if (json) {
      JsonObject doc = new JsonObject();
      doc.add("files", reports);
      out.println(new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(doc));
    }
    out.flush();
    return errors ? 1 : 0;
  }
}
