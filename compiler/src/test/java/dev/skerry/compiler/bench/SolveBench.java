package dev.skerry.compiler.bench;

import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.ExampleScenarios;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

/**
 * Solve benchmark (a main class, not a test): for each example, the wall time of planning in-process
 * with each backend (warm start on and off where the backend takes one) and of the {@code cbc}
 * command line (Debian coinor-cbc, {@code -preprocess off -threads 2}) on the exported free MPS,
 * side by side in one run, every solver given the plan's gap and the same time cap. Prints a
 * Markdown table with the ratio of each time to cbc's, the objective and the gap.
 *
 * <p>The in-process CBC cannot be interrupted: after its cap it keeps a core busy until it ends,
 * so its rows run last, after every other measurement.
 *
 * <p>Run from the repository root: {@code mvn -q -B install -DskipTests -pl grammar,compiler && java
 * -cp compiler/target/classes:compiler/target/test-classes:$(cat compiler/target/runtime-classpath.txt)
 * dev.skerry.compiler.bench.SolveBench [CAP_SECONDS [EXAMPLE,...]]} (cap 120 s by default; examples
 * by file name without {@code .skerry}, or {@code small:NAME} for the small versions the tests use).
 */
public final class SolveBench {
  private record Run(String example, String who, boolean warm, double seconds, String status, double objective,
      double gap, String note) {}

  /** The in-process backends to run: all by default, or those of {@code -Dskerry.bench.solvers=ojalgo,scip}. */
  private static final List<String> SOLVERS =
      List.of(System.getProperty("skerry.bench.solvers", "scip,highs,cpsat,ojalgo,cbc").split(","));

  /**
   * The warm-start settings to run for backends that take one: both by default, or only {@code
   * -Dskerry.bench.warm=on} (or {@code off}) to halve a long run.
   */
  private static final List<Boolean> WARM = switch (System.getProperty("skerry.bench.warm", "both")) {
    case "on" -> List.of(true);
    case "off" -> List.of(false);
    default -> List.of(false, true);
  };

  private SolveBench() {}

  public static void main(String[] args) throws Exception {
    Duration cap = Duration.ofSeconds(args.length > 0 ? Long.parseLong(args[0]) : 120);
    List<String> names = args.length > 1 ? List.of(args[1].split(",")) : ExampleScenarios.NAMES;
    Planner planner = new Planner(Backends.standard());
    List<Run> runs = new ArrayList<>();
    List<Run> cbcCli = new ArrayList<>();
    for (String name : names) {
      Scenario s = scenario(name);
      Milp m = Lowering.lower(s);
      System.err.printf("%s: %d binaries, %d rows%n", name, m.binaryCount(), m.rowCount());
      cbcCli.add(cbcCommandLine(name, m, s.plan().relativeGap(), cap));
      System.err.println("  " + cbcCli.get(cbcCli.size() - 1));
      for (String id : SOLVERS) {
        if (id.equals("cbc")) {
          continue;
        }
        // HiGHS is never hinted and CP-SAT gets no heuristic start (its points are only nearly feasible).
        for (boolean warm : id.equals("highs") || id.equals("cpsat") ? List.of(false) : WARM) {
          runs.add(inProcess(planner, name, s, id, warm, cap));
          System.err.println("  " + runs.get(runs.size() - 1));
        }
      }
    }
    for (String name : SOLVERS.contains("cbc") ? names : List.<String>of()) {
      runs.add(inProcess(planner, name, scenario(name), "cbc", false, cap));
      System.err.println("  " + runs.get(runs.size() - 1));
    }
    System.out.printf("cap %d s per solve; gap from each plan; %d cores%n%n", cap.toSeconds(),
        Runtime.getRuntime().availableProcessors());
    System.out.println("| example | solver | warm start | wall s | × cbc | status | objective | gap |");
    System.out.println("|---|---|---|---|---|---|---|---|");
    for (Run c : cbcCli) {
      print(c, c);
      for (Run r : runs) {
        if (r.example().equals(c.example())) {
          print(r, c);
        }
      }
    }
    System.exit(0);
  }

  private static Scenario scenario(String name) {
    return name.startsWith("small:") ? ExampleScenarios.small(name.substring(6)) : ExampleScenarios.full(name);
  }

  private static void print(Run r, Run cbc) {
    System.out.printf(Locale.ROOT, "| %s | %s | %s | %.2f | %.2f | %s | %s | %s |%n", r.example(), r.who(),
        r.who().startsWith("cbc command") || r.who().equals("highs") || r.who().equals("cpsat") ? "–" : (r.warm() ? "on" : "off"), r.seconds(),
        r.seconds() / cbc.seconds(), r.status(), Double.isNaN(r.objective()) ? "–" : String.format(Locale.ROOT, "%.5f", r.objective()),
        Double.isNaN(r.gap()) ? "–" : String.format(Locale.ROOT, "%.3g %%", 100 * r.gap()));
  }

  private static Run inProcess(Planner planner, String name, Scenario s, String id, boolean warm, Duration cap) {
    SolveOptions o = Planner.optionsOf(s.plan()).withTimeLimit(cap);
    long t0 = System.nanoTime();
    PlanResult p = planner.withWarmStart(warm).plan(s, id, o, progress -> {});
    double seconds = (System.nanoTime() - t0) / 1e9;
    SolveResult r = p.solve();
    String status = r.status().name().toLowerCase(Locale.ROOT) + (p.hasPlan() && !p.verified() ? " (verifier: violation)" : "");
    return new Run(name, id, warm, seconds, status, r.objective(), r.gap(), String.join("; ", r.warnings()));
  }

  /** {@code cbc F.mps -threads 2 -preprocess off -ratioGap G -sec CAP -solve -solu SOL}, timed as a whole. */
  private static Run cbcCommandLine(String name, Milp m, double gap, Duration cap) throws IOException, InterruptedException {
    Path work = Files.createTempDirectory("skerry-bench");
    Path mps = work.resolve(name.replace(':', '_') + ".mps");
    ModelFiles.write(m, mps, ModelFormat.MPS);
    Path sol = work.resolve("solution.txt");
    List<String> cmd = List.of("cbc", mps.toString(), "-threads", "2", "-preprocess", "off", "-ratioGap",
        String.valueOf(gap), "-sec", String.valueOf(cap.toSeconds()), "-solve", "-solu", sol.toString());
    long t0 = System.nanoTime();
    Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(work.resolve("log.txt").toFile()).start();
    if (!p.waitFor(cap.toSeconds() + 60, TimeUnit.SECONDS)) {
      p.destroyForcibly().waitFor();
    }
    double seconds = (System.nanoTime() - t0) / 1e9;
    String first = Files.exists(sol) ? Files.readAllLines(sol, StandardCharsets.ISO_8859_1).get(0).trim() : "no solution file";
    double objective = Double.NaN;
    int at = first.indexOf("objective value");
    if (at >= 0) {
      objective = Double.parseDouble(first.substring(at + "objective value".length()).trim());
    }
    String status = first.startsWith("Optimal") ? "optimal" : first.split(" - ")[0].toLowerCase(Locale.ROOT);
    return new Run(name, "cbc command line", false, seconds, status, objective, Double.NaN, first);
  }
}
