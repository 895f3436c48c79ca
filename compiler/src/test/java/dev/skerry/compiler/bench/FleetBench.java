package dev.skerry.compiler.bench;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Fleet benchmark (a main class, not a test): the harbour example with 1 to 4 copies of its skiff,
 * starting along the west shore, sharing the example's berth and three more on the east side
 * (assigned by the MILP), 4 m apart at least; each fleet without clusters and with NC ordered
 * clusters (3 by default: with 2 the harbour's boxes close the cove and no plan exists), all in
 * one run with SCIP at the same gap and time cap, through the planner as {@code skerry solve}
 * runs it (warm start included, inside the cap). Prints binaries by cause (zones, separation,
 * arrival), status, wall and CPU time, each as a ratio to the one-vehicle unclustered case, cost
 * and bound, whether the verifier accepts the plan (separation included), and the warm start.
 *
 * <p>Run from the repository root: {@code mvn -q -B install -DskipTests -pl grammar,compiler &&
 * mvn -q -B test-compile -pl compiler && java -cp
 * compiler/target/classes:compiler/target/test-classes:$(cat compiler/target/runtime-classpath.txt)
 * dev.skerry.compiler.bench.FleetBench [cap-seconds [gap [max-vehicles [clusters]]]]} (defaults 60 s,
 * 0.005, 4, 3).
 */
public final class FleetBench {
  private static final Vec2[] STARTS = {new Vec2(6, 8), new Vec2(6, 28), new Vec2(6, 46), new Vec2(6, 62)};
  private static final Bounds[] EXTRA_BERTHS = {
      new Bounds(108, 40, 114, 46), new Bounds(108, 22, 114, 28), new Bounds(108, 4, 114, 10)};

  private FleetBench() {}

  public static void main(String[] args) throws Exception {
    double cap = args.length > 0 ? Double.parseDouble(args[0]) : 60;
    double gap = args.length > 1 ? Double.parseDouble(args[1]) : 0.005;
    int most = args.length > 2 ? Integer.parseInt(args[2]) : 4;
    int clustered = args.length > 3 ? Integer.parseInt(args[3]) : 3;
    Path file = Path.of("examples/harbour_survey.skerry").toAbsolutePath().normalize();
    Scenario base = ClusterBench.load(file);
    SolveOptions options = ClusterBench.capped(gap, cap);
    ClusterBench.header(file, base, gap, cap);
    System.out.println("| vehicles | clusters | binaries | zone/cluster | separation | arrival | status | wall s"
        + " | wall ratio | CPU s | CPU ratio | cost | bound | verified | warm start |");
    System.out.println("|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|");
    double[] first = null;
    for (int n = 1; n <= Math.min(most, STARTS.length); n++) {
      for (int clusters : new int[] {0, clustered}) {
        Scenario s = fleet(base, n).withPlan(base.plan().withClusters(clusters, SymmetryRule.ORDERED)
            .withSeparation(4));
        double[] row = run(n, clusters, s, options, first);
        first = first == null ? row : first;
      }
    }
  }

  /** The example with {@code n} skiffs and n berths (the example's first). */
  static Scenario fleet(Scenario base, int n) {
    Vehicle skiff = base.vehicle();
    List<Vehicle> vehicles = new ArrayList<>();
    List<Target> berths = new ArrayList<>();
    berths.add(base.target());
    for (int i = 0; i < n; i++) {
      vehicles.add(skiff.withStart(STARTS[i], Vec2.ZERO, 0, 0).withTarget(null).withName(skiff.name() + (i + 1)));
      if (i > 0) {
        berths.add(new Target("berth_" + (i + 1), new Shape.Box(EXTRA_BERTHS[i - 1]), true, null));
      }
    }
    return base.withVehiclesAndTargets(vehicles, berths);
  }

  private static double[] run(int n, int clusters, Scenario s, SolveOptions options, double[] first) {
    Sizes sizes = Analysis.sizes(s);
    double cpu0 = ClusterBench.cpuSeconds();
    long t0 = System.nanoTime();
    PlanResult p = Planner.standard().plan(s, "scip", options, SolveMonitor.NONE);
    double wall = (System.nanoTime() - t0) / 1e9;
    double cpu = ClusterBench.cpuSeconds() - cpu0;
    SolveResult r = p.solve();
    String verified = p.hasPlan() ? (p.verified() ? "yes" : "NO") : "-";
    String start = r.warnings().stream().filter(w -> w.contains("warm start")).findFirst().orElse("-")
        .replace("warm start: vehicles planned one after another, ", "").replace("|", "/");
    double[] base = first == null ? new double[] {wall, cpu} : first;
    System.out.printf(Locale.ROOT,
        "| %d | %d | %,d | %,d | %,d | %,d | %-17s | %7.2f | %6.1f× | %7.2f | %6.1f× | %9.3f | %9.3f | %s | %s |%n",
        n, clusters, sizes.binaries(),
        sizes.zoneBoxBinaries() + sizes.zonePolygonBinaries() + sizes.clusterAvoidanceBinaries()
            + sizes.clusterAssignmentBinaries(),
        sizes.separationBinaries(), sizes.arrivalBinaries(), r.status(), wall, wall / Math.max(base[0], 1e-3), cpu,
        cpu / Math.max(base[1], 1e-3), r.objective(), r.bestBound(), verified, start);
    return new double[] {wall, cpu};
  }
}
