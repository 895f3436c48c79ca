package dev.skerry.compiler.bench;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.ClusterBox;
import dev.skerry.compiler.plan.PlanExtractor;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.verify.Verifier;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Clustering benchmark (a main class, not a test): the rock-field example solved without clusters
 * and with NC = 1…5 clusters under every symmetry rule, in one run, all with SCIP at the same
 * relative gap and time cap. Prints per case the binaries, status, wall time and the process's CPU
 * time during the solve (robust to other load on the machine), each also as the unclustered figure
 * divided by this case's (the speed-up), cost, best bound, nodes, how many clusters hold zones, and
 * whether the verifier accepts the plan against the original zones.
 *
 * <p>Run from the repository root: {@code mvn -q -B install -DskipTests -pl grammar,compiler &&
 * mvn -q -B test-compile -pl compiler && java -cp
 * compiler/target/classes:compiler/target/test-classes:$(cat compiler/target/runtime-classpath.txt)
 * dev.skerry.compiler.bench.ClusterBench [cap-seconds [gap [max-clusters [scenario-file]]]]}
 * (defaults 120 s, 1e-4, 5, {@code examples/rock_field.skerry}). Threads: SCIP's default.
 */
public final class ClusterBench {
  private ClusterBench() {}

  /** One solved case. */
  private record Row(String label, long binaries, SolveResult r, double cpu, int used, String verified) {}

  public static void main(String[] args) throws Exception {
    double cap = args.length > 0 ? Double.parseDouble(args[0]) : 120;
    double gap = args.length > 1 ? Double.parseDouble(args[1]) : 1e-4;
    int maxClusters = args.length > 2 ? Integer.parseInt(args[2]) : 5;
    Path file = Path.of(args.length > 3 ? args[3] : "examples/rock_field.skerry").toAbsolutePath().normalize();
    Scenario base = load(file);
    SolveOptions options = capped(gap, cap);
    header(file, base, gap, cap);
    List<Row> rows = new ArrayList<>();
    rows.add(run("none", base.withPlan(base.plan().withClusters(0, SymmetryRule.NONE)), options));
    System.out.println("| clusters | binaries | status | wall s | speed-up (wall) | CPU s | speed-up (CPU) | cost"
        + " | bound | nodes | used | verified |");
    System.out.println("|---|---|---|---|---|---|---|---|---|---|---|---|");
    print(rows.get(0), rows.get(0));
    for (int nc = 1; nc <= maxClusters; nc++) {
      for (SymmetryRule rule : SymmetryRule.values()) {
        Row row = run(nc + " " + rule.keyword(), base.withPlan(base.plan().withClusters(nc, rule)), options);
        rows.add(row);
        print(rows.get(0), row);
      }
    }
  }

  private static Row run(String label, Scenario s, SolveOptions options) {
    Milp milp = Lowering.lower(s);
    long binaries = Analysis.sizes(s).binaries();
    double cpu0 = cpuSeconds();
    SolveResult r = Backends.standard().choose("scip", milp).backend().solve(milp, options, SolveMonitor.NONE);
    double cpu = cpuSeconds() - cpu0;
    int used = 0;
    String verified = "-";
    if (r.status().hasSolution()) {
      for (ClusterBox b : PlanExtractor.clusters(s, milp, r.values())) {
        used += b.zones().isEmpty() ? 0 : 1;
      }
      verified = Verifier.verify(s, PlanExtractor.trajectory(s, milp, r.values())).ok() ? "yes" : "NO";
    }
    return new Row(label, binaries, r, cpu, used, verified);
  }

  /** The checked scenario of an example file; a file that does not check stops the benchmark. */
  static Scenario load(Path file) throws java.io.IOException {
    CheckResult checked = ScenarioChecker.check(SourceFile.of(file, Files.readString(file)),
        new DiskLoader(file.getParent()));
    if (checked.scenario() == null) {
      throw new IllegalStateException("scenario " + file + " did not check: " + checked.diagnostics());
    }
    return checked.scenario();
  }

  /** Solver options with the relative gap and a time cap in seconds. */
  static SolveOptions capped(double gap, double cap) {
    return SolveOptions.defaults().withRelativeGap(gap).withTimeLimit(Duration.ofMillis(Math.round(cap * 1000)));
  }

  /** The first line of a benchmark's output: the example, its size and the solve settings. */
  static void header(Path file, Scenario base, double gap, double cap) {
    System.out.printf(Locale.ROOT, "# %s: %d zones, horizon %d, SCIP, gap %g, cap %.0f s, %d cores%n",
        file.getFileName(), base.zones().size(), base.plan().horizon(), gap, cap,
        Runtime.getRuntime().availableProcessors());
  }

  /** CPU time of this whole process, the solver's native threads included. */
  static double cpuSeconds() {
    return ProcessHandle.current().info().totalCpuDuration().map(d -> d.toMillis() / 1000.0).orElse(Double.NaN);
  }

  private static void print(Row base, Row row) {
    SolveResult r = row.r();
    double secs = r.wallTime().toMillis() / 1000.0;
    double speedUp = base.r().wallTime().toMillis() / 1000.0 / Math.max(secs, 1e-3);
    double cpuUp = base.cpu() / Math.max(row.cpu(), 1e-3);
    System.out.printf(Locale.ROOT,
        "| %-10s | %5d | %-17s | %7.2f | %7.1f× | %7.2f | %7.1f× | %9.4f | %9.4f | %8d | %d | %s |%n",
        row.label(), row.binaries(), r.status(), secs, speedUp, row.cpu(), cpuUp, r.objective(), r.bestBound(),
        r.nodes(), row.used(), row.verified());
  }
}
