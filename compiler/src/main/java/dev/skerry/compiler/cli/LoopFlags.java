package dev.skerry.compiler.cli;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.solve.SolveOptions;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import picocli.CommandLine.Option;

/** The options `run` and `compare` share, and the loading of their scenario. */
final class LoopFlags {
  @Option(names = "--solver", paramLabel = "ID", description = "Backend (default: the plan's `solver`).")
  String solver;

  @Option(names = "--time-limit", paramLabel = "SECONDS", description = "Time limit per iteration.")
  Double timeLimit;

  @Option(names = "--max-iterations", paramLabel = "N", description = "Overrides the plan's `closed_loop max`.")
  Integer maxIterations;

  @Option(names = "--root", paramLabel = "DIR", description = "Workspace root that includes may not leave.")
  Path root;

  /** A reason the command stops before flying, with its exit code. */
  static final class Stop extends Exception {
    final int exitCode;

    Stop(int exitCode, String message) {
      super(message);
      this.exitCode = exitCode;
    }
  }

  /** The checked scenario with the iteration limit applied; diagnostics go to {@code out}. */
  Scenario load(Path file, PrintWriter out, String command) throws Stop {
    CheckResult checked;
    try {
      checked = Inputs.check(file, root);
    } catch (Inputs.UsageProblem e) {
      throw new Stop(2, "skerry " + command + ": " + e.getMessage());
    }
    for (Diagnostic d : checked.diagnostics()) {
      out.println(d.format());
    }
    if (checked.hasErrors() || checked.scenario() == null) {
      throw new Stop(1, "skerry " + command + ": " + file + " has errors; nothing flown");
    }
    Scenario s = checked.scenario();
    if (maxIterations != null) {
      if (maxIterations < 1) {
        throw new Stop(2, "skerry " + command + ": --max-iterations must be at least 1");
      }
      s = s.withPlan(s.plan().withClosedLoopMax(maxIterations));
    }
    return s;
  }

  /** Solver options from the plan, with the per-iteration time limit when given. */
  SolveOptions options(Scenario s, String command) throws Stop {
    SolveOptions options = Planner.optionsOf(s.plan());
    if (timeLimit != null) {
      if (!(timeLimit > 0)) {
        throw new Stop(2, "skerry " + command + ": --time-limit must be positive");
      }
      options = options.withTimeLimit(Duration.ofNanos((long) (timeLimit * 1e9)));
    }
    return options;
  }
}
