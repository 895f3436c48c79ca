package dev.skerry.compiler.bench;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Area;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Zone;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Lowering benchmark (a main class, not a test): generated scenarios with 10 to 2,000 box zones
 * and 10 to 50 steps, pruned and plain. Prints per case the analysis time, the lowering wall time
 * (layout + MILP, best of at least {@value #REPEATS} runs, more for fast cases, after a warm-up),
 * peak heap during one lowering, non-zeros per second, and at the end the log-log slope of
 * lowering time against NS·NO.
 *
 * <p>Run: {@code mvn -q -B install -DskipTests -pl grammar,compiler -am && mvn -q -B test-compile
 * -pl compiler && java -Xmx4g -cp compiler/target/classes:compiler/target/test-classes:$(cat
 * compiler/target/runtime-classpath.txt) dev.skerry.compiler.bench.LoweringBench [quick]} (add {@code -Xms1g
 * -XX:+UseSerialGC} on a loaded 2-core machine: G1 young pauses there dominate the timings)
 */
public final class LoweringBench {
  private static final int REPEATS = 3;
  private static final int MAX_REPEATS = 50;

  /**
   * Work done on the lowered model after lowering, timed per case. Empty for now; the MPS writer
   * from the io branch goes here, e.g. {@code new Stage("mps", m -> MpsWriter.write(m, sink))}.
   */
  private static final List<Stage> AFTER_LOWERING = List.of();

  /** A timed step applied to each lowered model. */
  public record Stage(String name, StageAction action) {}

  /** What a stage does with a model. */
  @FunctionalInterface
  public interface StageAction {
    void run(Milp milp) throws Exception;
  }

  private LoweringBench() {}

  public static void main(String[] args) throws Exception {
    boolean quick = args.length > 0 && args[0].equals("quick");
    int[] zoneCounts = quick ? new int[] {10, 100, 500} : new int[] {10, 50, 200, 500, 1000, 2000};
    int[] horizons = quick ? new int[] {10, 25} : new int[] {10, 25, 50};
    System.out.printf(Locale.ROOT, "%-6s %-4s %-7s %10s %10s %10s %9s %10s %9s %9s %12s%s%n", "zones", "N",
        "pruning", "binaries", "rows", "nonzeros", "analyse", "lower", "peakMB", "Mnz/s", "NS*NO", stageHeader());
    for (int i = 0; i < 20; i++) {
      Lowering.lower(generate(200, 25, i % 2 == 0, i));
    }
    List<double[]> plain = new ArrayList<>();
    List<double[]> pruned = new ArrayList<>();
    for (int no : zoneCounts) {
      for (int n : horizons) {
        for (boolean pruning : new boolean[] {false, true}) {
          Scenario s = generate(no, n, pruning, 42L + no);
          double analyse = Double.POSITIVE_INFINITY;
          double lower = Double.POSITIVE_INFINITY;
          Milp milp = null;
          Sizes sizes = null;
          long started = System.nanoTime();
          for (int rep = 0; rep < MAX_REPEATS && (rep < REPEATS || System.nanoTime() - started < 1e9); rep++) {
            milp = null;
            long t0 = System.nanoTime();
            sizes = Analysis.sizes(s);
            long t1 = System.nanoTime();
            milp = Lowering.lower(FormulationLayout.of(s)).milp();
            long t2 = System.nanoTime();
            analyse = Math.min(analyse, (t1 - t0) / 1e9);
            lower = Math.min(lower, (t2 - t1) / 1e9);
          }
          milp = null;
          double peak = peakHeapDuring(() -> Lowering.lower(s));
          milp = Lowering.lower(s);
          StringBuilder stages = new StringBuilder();
          for (Stage st : AFTER_LOWERING) {
            long t0 = System.nanoTime();
            st.action().run(milp);
            stages.append(String.format(Locale.ROOT, " %9.3f", (System.nanoTime() - t0) / 1e9));
          }
          long nsno = (long) n * no;
          System.out.printf(Locale.ROOT, "%-6d %-4d %-7s %10d %10d %10d %9.3f %10.3f %9.1f %9.2f %12d%s%n", no, n,
              pruning ? "on" : "off", sizes.binaries(), milp.rowCount(), milp.nonZeros(), analyse, lower,
              peak / 1e6, milp.nonZeros() / lower / 1e6, nsno, stages);
          (pruning ? pruned : plain).add(new double[] {Math.log(nsno), Math.log(lower)});
        }
      }
    }
    System.out.printf(Locale.ROOT, "log-log slope of lowering time vs NS*NO: plain %.2f, pruned %.2f%n",
        slope(plain), slope(pruned));
  }

  private static String stageHeader() {
    StringBuilder sb = new StringBuilder();
    for (Stage s : AFTER_LOWERING) {
      sb.append(String.format(Locale.ROOT, " %9s", s.name()));
    }
    return sb.toString();
  }

  /**
   * A square harbour of side 25·√NO m with NO random 2–6 m box zones, start at the west edge, a
   * target due east at 60 % of the distance the horizon allows at full speed (so the target is
   * reachable and pruning has real work), 5 m/s and 2 m/s², 1 s steps.
   */
  static Scenario generate(int zones, int horizon, boolean pruning, long seed) {
    Random r = new Random(seed);
    double side = 25 * Math.sqrt(zones);
    List<Zone> list = new ArrayList<>(zones);
    for (int o = 0; o < zones; o++) {
      double x = side * (0.05 + 0.9 * r.nextDouble());
      double y = side * r.nextDouble();
      double w = 2 + 4 * r.nextDouble();
      double h = 2 + 4 * r.nextDouble();
      list.add(new Zone("z" + o, new Shape.Box(new Bounds(x, y, Math.min(side, x + w), Math.min(side, y + h))), null));
    }
    Vehicle v = new Vehicle("bench", Vehicle.Dynamics.DOUBLE_INTEGRATOR, new Vec2(1, side / 2), Vec2.ZERO, 5, 2, 0.5,
        Vehicle.DEFAULT_SIDES, null);
    double tx = Math.min(side - 3, 1 + 0.6 * 5 * horizon);
    Target t = new Target("east", new Shape.Box(new Bounds(tx, side / 2 - 1, tx + 2, side / 2 + 1)), true, null);
    PlanOptions plan = new PlanOptions(1, horizon, 1, 0.1, 0, PlanOptions.SymmetryRule.NONE, 0,
        PlanOptions.DEFAULT_SOLVER, Duration.ofSeconds(30), 0.005, 0, true, pruning, null);
    return new Scenario("bench", List.of(v), new Area("square", new Shape.Box(new Bounds(0, 0, side, side)), null),
        list, List.of(t), List.of(), plan);
  }

  /** Peak heap in bytes while {@code work} runs, from the heap pools' peak counters. */
  private static double peakHeapDuring(Runnable work) {
    System.gc();
    long base = 0;
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP) {
        pool.resetPeakUsage();
        base += pool.getUsage().getUsed();
      }
    }
    work.run();
    long peak = 0;
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP) {
        peak += pool.getPeakUsage().getUsed();
      }
    }
    return peak - base;
  }

  /** Least-squares slope of y against x. */
  private static double slope(List<double[]> points) {
    double n = points.size();
    double sx = 0;
    double sy = 0;
    double sxx = 0;
    double sxy = 0;
    for (double[] p : points) {
      sx += p[0];
      sy += p[1];
      sxx += p[0] * p[0];
      sxy += p[0] * p[1];
    }
    return (n * sxy - sx * sy) / (n * sxx - sx * sx);
  }
}
