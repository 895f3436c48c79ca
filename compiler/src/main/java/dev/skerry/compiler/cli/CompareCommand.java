package dev.skerry.compiler.cli;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.report.AtomicFiles;
import dev.skerry.compiler.report.HtmlReport;
import dev.skerry.compiler.report.LoopOutputs;
import dev.skerry.compiler.sim.ClosedLoop;
import dev.skerry.compiler.solve.SolveOptions;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code skerry compare FILE --clusters none,2,3}: closed-loop runs side by side. */
@Command(
    name = "compare",
    mixinStandardHelpOptions = true,
    description = {
      "Fly a scenario closed loop once per clustering configuration and compare compute time",
      "against closed-loop cost. Exit code: 0 every run arrived verified, 1 otherwise, 2 misuse."
    })
final class CompareCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(index = "0", paramLabel = "FILE", description = "Scenario file (.skerry).")
  Path file;

  @CommandLine.Mixin LoopFlags flags = new LoopFlags();

  @Option(names = "--clusters", split = ",", paramLabel = "N",
      description = "Configurations: `none` or a number of clusters, comma-separated (default: none,2,3).")
  List<String> clusters = List.of("none", "2", "3");

  @Option(names = "--rule", paramLabel = "RULE", description = "Symmetry rule for clustered runs: none, ordered, sorted.")
  String rule;

  @Option(names = "--json", paramLabel = "FILE", description = "Every run and iteration as JSON.")
  Path json;

  @Option(names = "--csv", paramLabel = "FILE", description = "One row per run and iteration.")
  Path csv;

  @Option(names = "--report", paramLabel = "DIR", description = "Write a self-contained HTML page there.")
  Path report;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    Scenario s;
    SolveOptions options;
    try {
      s = flags.load(file, out, "compare");
      options = flags.options(s, "compare");
    } catch (LoopFlags.Stop stop) {
      err.println(stop.getMessage());
      return stop.exitCode;
    }
    PlanOptions.SymmetryRule symmetry = rule == null ? s.plan().symmetry() : PlanOptions.SymmetryRule.fromKeyword(rule);
    if (symmetry == null) {
      err.println("skerry compare: unknown rule `" + rule + "`; choose none, ordered or sorted");
      return 2;
    }
    List<LoopOutputs.Run> runs = new ArrayList<>();
    for (String c : clusters) {
      int n;
      if (c.equals("none") || c.equals("0")) {
        n = 0;
      } else {
        try {
          n = Integer.parseInt(c.trim());
        } catch (NumberFormatException e) {
          err.println("skerry compare: `" + c + "` is not `none` or a number of clusters");
          return 2;
        }
        if (n < 1 || n > s.zones().size()) {
          err.println("skerry compare: " + n + " clusters: choose 1 to " + s.zones().size());
          return 2;
        }
      }
      Scenario variant = s.withPlan(s.plan().withClusters(n, symmetry));
      String label = n == 0 ? "no clusters" : n + " clusters, " + symmetry.keyword();
      err.println("flying: " + label);
      err.flush();
      try {
        runs.add(new LoopOutputs.Run(label, new ClosedLoop(Planner.standard(), options, 0, 1).run(variant, flags.solver,
            it -> { })));
      } catch (IllegalArgumentException | IllegalStateException e) {
        err.println("skerry compare: " + e.getMessage());
        return 2;
      }
    }
    out.print(LoopOutputs.table(runs));
    out.println(dev.skerry.compiler.report.PlanOutputs.CAUTION);
    try {
      if (json != null) {
        JsonObject doc = new JsonObject();
        doc.addProperty("scenario", s.name());
        JsonArray all = new JsonArray();
        runs.forEach(r -> all.add(LoopOutputs.json(r)));
        doc.add("runs", all);
        AtomicFiles.write(json, new GsonBuilder().setPrettyPrinting().create().toJson(doc) + "\n");
      }
      if (csv != null) {
        AtomicFiles.write(csv, LoopOutputs.csv(runs));
      }
      if (report != null) {
        Path page = report.resolve("index.html");
        AtomicFiles.write(page, HtmlReport.render(s, runs));
        out.println("report: " + page);
      }
    } catch (IOException e) {
      err.println("skerry compare: cannot write an output: " + e.getMessage());
      return 1;
    }
    boolean allGood = runs.stream().allMatch(r -> r.result().stop() == dev.skerry.compiler.sim.LoopResult.Stop.ARRIVED
        && r.result().verify().ok());
    return allGood ? 0 : 1;
  }
}
