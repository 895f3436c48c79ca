package dev.skerry.compiler.cli;

import com.google.gson.GsonBuilder;
import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.diag.Diagnostic;
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
import java.time.Duration;
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

  @Option(names = "--solver", paramLabel = "ID", description = "Backend (default: the plan's `solver`).")
  String solver;

  @Option(names = "--time-limit", paramLabel = "SECONDS", description = "Time limit per iteration.")
  Double timeLimit;

  @Option(names = "--disturbance", paramLabel = "M_PER_S",
      description = "Largest random velocity change per step and axis added by the plant (default 0).")
  double disturbance;

  @Option(names = "--seed", paramLabel = "N", description = "Seed of the disturbance (default 1).")
  long seed = 1;

  @Option(names = "--max-iterations", paramLabel = "N", description = "Overrides the plan's `closed_loop max`.")
  Integer maxIterations;

  @Option(names = "--svg", paramLabel = "FILE", description = "Picture of the flown and first predicted path.")
  Path svg;

  @Option(names = "--json", paramLabel = "FILE", description = "The run and every iteration as JSON.")
  Path json;

  @Option(names = "--csv", paramLabel = "FILE", description = "One row per iteration.")
  Path csv;

  @Option(names = "--root", paramLabel = "DIR", description = "Workspace root that includes may not leave.")
  Path root;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    Scenario s = Loops.load(file, root, out, err, "run");
    if (s == null) {
      return Loops.lastExit;
    }
    if (maxIterations != null) {
      if (maxIterations < 1) {
        err.println("skerry run: --max-iterations must be at least 1");
        return 2;
      }
      s = s.withPlan(s.plan().withClosedLoopMax(maxIterations));
    }
    if (disturbance < 0) {
      err.println("skerry run: --disturbance cannot be negative");
      return 2;
    }
    SolveOptions options = Loops.options(s, timeLimit, err);
    if (options == null) {
      return 2;
    }
    LoopResult r;
    try {
      r = new ClosedLoop(Planner.standard(), options, disturbance, seed).run(s, solver, it -> {
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
        AtomicFiles.write(svg, SvgPlot.render(s, r.flown(), r.firstPrediction(),
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

  /** What run and compare share: loading a scenario and building solver options. */
  static final class Loops {
    static int lastExit;

    private Loops() {}

    static Scenario load(Path file, Path root, PrintWriter out, PrintWriter err, String command) {
      CheckResult checked;
      try {
        checked = Inputs.check(file, root);
      } catch (Inputs.UsageProblem e) {
        err.println("skerry " + command + ": " + e.getMessage());
        lastExit = 2;
        return null;
      }
      for (Diagnostic d : checked.diagnostics()) {
        out.println(d.format());
      }
      if (checked.hasErrors() || checked.scenario() == null) {
        err.println("skerry " + command + ": " + file + " has errors; nothing flown");
        lastExit = 1;
        return null;
      }
      return checked.scenario();
    }

    static SolveOptions options(Scenario s, Double timeLimit, PrintWriter err) {
      SolveOptions options = Planner.optionsOf(s.plan());
      if (timeLimit != null) {
        if (!(timeLimit > 0)) {
          err.println("skerry: --time-limit must be positive");
          return null;
        }
        options = options.withTimeLimit(Duration.ofNanos((long) (timeLimit * 1e9)));
      }
      return options;
    }
  }
}
