package dev.skerry.compiler.cli;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.report.AtomicFiles;
import dev.skerry.compiler.report.PlanOutputs;
import dev.skerry.compiler.report.SvgPlot;
import dev.skerry.compiler.solve.CancelToken;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code skerry solve FILE}: plan in-process, verify the plan, print it and write pictures and tables. */
@Command(
    name = "solve",
    mixinStandardHelpOptions = true,
    description = {
      "Lower a scenario, solve the MILP in-process, check the plan with the independent verifier,",
      "and print it. Ctrl-C stops the search and keeps the best plan found (marked as not proven).",
      "Exit code: 0 verified plan, 1 no plan or a verifier violation or scenario errors, 2 misuse."
    })
final class SolveCommand implements Callable<Integer> {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(index = "0", paramLabel = "FILE", description = "Scenario file (.skerry).")
  Path file;

  @Option(names = "--solver", paramLabel = "ID",
      description = "default, ojalgo, scip, cbc, highs or cpsat (default: the plan's `solver`).")
  String solver;

  @Option(names = "--time-limit", paramLabel = "SECONDS", description = "Stop after this long (overrides the plan).")
  Double timeLimit;

  @Option(names = "--gap", paramLabel = "FRACTION", description = "Relative gap, e.g. 0.01 (overrides the plan).")
  Double gap;

  @Option(names = "--threads", paramLabel = "N", description = "Solver threads (overrides the plan).")
  Integer threads;

  @Option(names = "--svg", paramLabel = "FILE", description = "Write a picture of the plan.")
  Path svg;

  @Option(names = "--csv", paramLabel = "FILE", description = "Write the plan, one row per step, SI units.")
  Path csv;

  @Option(names = "--json", paramLabel = "FILE", description = "Write plan, costs, statistics and verifier result.")
  Path json;

  @Option(names = "--root", paramLabel = "DIR", description = "Workspace root that includes may not leave.")
  Path root;

  @Option(names = "--quiet", description = "No progress lines on standard error.")
  boolean quiet;

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    CheckResult checked;
    try {
      checked = Inputs.check(file, root);
    } catch (Inputs.UsageProblem e) {
      err.println("skerry solve: " + e.getMessage());
      return 2;
    }
    for (Diagnostic d : checked.diagnostics()) {
      out.println(d.format());
    }
    if (checked.hasErrors() || checked.scenario() == null) {
      err.println("skerry solve: " + file + " has errors; nothing solved");
      return 1;
    }
    SolveOptions options = Planner.optionsOf(checked.scenario().plan());
    if (timeLimit != null) {
      if (!(timeLimit > 0)) {
        err.println("skerry solve: --time-limit must be positive");
        return 2;
      }
      options = options.withTimeLimit(Duration.ofNanos((long) (timeLimit * 1e9)));
    }
    if (gap != null) {
      options = options.withRelativeGap(gap);
    }
    if (threads != null) {
      options = options.withThreads(threads);
    }
    CancelToken cancel = new CancelToken();
    options = options.withCancel(cancel);
    CountDownLatch printed = new CountDownLatch(1);
    Thread hook = new Thread(() -> {
      cancel.cancel();
      try {
        printed.await(15, TimeUnit.SECONDS);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
    }, "skerry-interrupt");
    Runtime.getRuntime().addShutdownHook(hook);
    PlanResult result;
    try {
      SolveMonitor monitor = quiet ? SolveMonitor.NONE : progress(err);
      result = Planner.standard().plan(checked.scenario(), solver, options, monitor);
    } catch (IllegalArgumentException | IllegalStateException e) {
      err.println("skerry solve: " + e.getMessage());
      printed.countDown();
      return 2;
    }
    try {
      result.notice().ifPresent(n -> err.println("note: " + n));
      if (cancel.isCancelled()) {
        out.println("interrupted: the search was stopped; the plan below (if any) is the best found, not proven optimal");
      }
      out.print(PlanOutputs.summary(result));
      if (!result.hasPlan()) {
        if (result.solve().status() == dev.skerry.compiler.solve.SolveStatus.INFEASIBLE) {
          out.println("no plan satisfies the scenario; the checker's hints, if any, are above. Try a longer horizon,"
              + " fewer or smaller zones, or a smaller radius.");
        }
        return 1;
      }
      try {
        String title = checked.scenario().name() + " — " + result.solve().backendId() + ", "
            + result.solve().status().name().toLowerCase(Locale.ROOT);
        if (svg != null) {
          AtomicFiles.write(svg, SvgPlot.renderPlan(checked.scenario(), result.trajectories(), result.clusters(), title));
        }
        if (csv != null) {
          AtomicFiles.write(csv, PlanOutputs.csv(result));
        }
        if (json != null) {
          AtomicFiles.write(json, PlanOutputs.jsonText(result));
        }
      } catch (IOException e) {
        err.println("skerry solve: cannot write an output: " + e.getMessage());
        return 1;
      }
      return result.verified() ? 0 : 1;
    } finally {
      out.flush();
      printed.countDown();
      try {
        Runtime.getRuntime().removeShutdownHook(hook);
      } catch (IllegalStateException shuttingDown) {
        // the hook is running because of Ctrl-C; it is released by the latch above
      }
    }
  }

  /** Progress on standard error once a solve has run for more than a second, then every two. */
  static SolveMonitor progress(PrintWriter err) {
    long[] last = {-1000};
    return p -> {
      long ms = p.elapsed().toMillis();
      if (ms < 1000 || ms - last[0] < 2000) {
        return;
      }
      last[0] = ms;
      StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "  solving with %s: %.0f s", p.backendId(), ms / 1000.0));
      if (p.hasIncumbent()) {
        b.append(String.format(Locale.ROOT, ", best %.6g", p.incumbent()));
      }
      if (p.hasBound()) {
        b.append(String.format(Locale.ROOT, ", bound %.6g", p.bound()));
      }
      err.println(b);
      err.flush();
    };
  }
}
