package dev.skerry.compiler.cli;

import com.google.gson.GsonBuilder;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.report.AtomicFiles;
import dev.skerry.compiler.report.LoopOutputs;
import dev.skerry.compiler.report.SvgPlot;
import dev.skerry.compiler.sim.ClosedLoop;
import dev.skerry.compiler.sim.LoopResult;
import dev.skerry.compiler.solve.SolveOptions;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code skerry run FILE}: fly the plan closed loop (receding horizon) and report each iteration. */
@Command(
    name = "run",
    mixinStandardHelpOptions = true,
    description = {
      "Fly a scenario closed loop: solve from the current state, apply the first input for one",
      "step, move, and solve again, until arrival, the plan's `closed_loop max`, or no plan.",
      "Exit code: 0 arrived with a verified path, 1 otherwise, 2 misuse."
    })
final class RunCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(index = "0", paramLabel = "FILE", description = "Scenario file (.skerry).")
  Path file;

  @CommandLine.Mixin LoopFlags flags = new LoopFlags();

  @Option(names = "--disturbance", paramLabel = "M_PER_S",
      description = "Largest random velocity change per step and axis added by the plant (default 0).")
  double disturbance;

  @Option(names = "--seed", paramLabel = "N", description = "Seed of the disturbance (default 1).")
  long seed = 1;

  @Option(names = "--svg", paramLabel = "FILE", description = "Picture of the flown and first predicted path.")
  Path svg;

  @Option(names = "--json", paramLabel = "FILE", description = "The run and every iteration as JSON.")
  Path json;

  @Option(names = "--csv", paramLabel = "FILE", description = "One row per iteration.")
  Path csv;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    Scenario s;
    SolveOptions options;
    try {
      s = flags.load(file, out, "run");
      options = flags.options(s, "run");
    } catch (LoopFlags.Stop stop) {
      err.println(stop.getMessage());
      return stop.exitCode;
    }
    if (disturbance < 0) {
      err.println("skerry run: --disturbance cannot be negative");
      return 2;
    }
    LoopResult r;
    try {
      r = new ClosedLoop(Planner.standard(), options, disturbance, seed).run(s, flags.solver, it -> {
        err.printf(Locale.ROOT, "  iteration %d: %s, %.2f s, %,d binaries%s%n", it.index(),
            it.status().name().toLowerCase(Locale.ROOT), it.seconds(), it.binaries(), it.fallback() ? " (previous plan flown)" : "");
        err.flush();
      });
    } catch (IllegalArgumentException | IllegalStateException e) {
      err.println("skerry run: " + e.getMessage());
      return 2;
    }
    out.print(LoopOutputs.summary(r));
    LoopOutputs.Run run = new LoopOutputs.Run(s.name(), r);
    try {
      if (svg != null) {
        AtomicFiles.write(svg, SvgPlot.renderLoop(s, r.flownPaths(), r.firstPredictions(),
            r.iterations().isEmpty() ? List.of() : r.iterations().get(0).clusters(), s.name() + " — closed loop"));
      }
      if (json != null) {
        AtomicFiles.write(json, new GsonBuilder().setPrettyPrinting().create().toJson(LoopOutputs.json(run)) + "\n");
      }
      if (csv != null) {
        AtomicFiles.write(csv, LoopOutputs.csv(List.of(run)));
      }
    } catch (IOException e) {
      err.println("skerry run: cannot write an output: " + e.getMessage());
      return 1;
    }
    return r.stop() == LoopResult.Stop.ARRIVED && r.verify().ok() ? 0 : 1;
  }
}
