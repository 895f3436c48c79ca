package dev.skerry.compiler.bench;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.io.CountingWriter;
import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.MpsWriter;
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
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Lowering and writing benchmark (a main class, not a test): generated scenarios with 10 to 2,000
 * box zones and 10 to 50 steps, pruned and plain. Per case it prints the analysis time, the
 * lowering wall time (layout + MILP), the time to stream the free MPS into a writer that only
 * counts characters, and the time to write it to a real temporary file through {@link ModelFiles}
 * (temporary file and move, as {@code skerry build} does); each the best of at least {@value
 * #REPEATS} runs, more for fast cases, after a warm-up. Then the peak heap while one lowering and
 * one file write run, the CPU time of the JVM over analysis, lowering and both writes (which tells
 * work from waiting on a loaded machine), millions of non-zeros per second for lowering and for writing, and at the end
 * the log-log slopes of the times against NS·NO (plain cases) and against the non-zeros. Output is a Markdown table, as pasted into
 * BENCHMARKS.md.
 *
 * <p>Run: {@code mvn -q -B install -DskipTests -pl grammar,compiler && mvn -q -B test-compile -pl
 * compiler && java -Xmx1g -Xms1g -XX:+UseSerialGC -cp
 * compiler/target/classes:compiler/target/test-classes:$(cat compiler/target/runtime-classpath.txt)
 * dev.skerry.compiler.bench.LoweringBench [quick]} ({@code -Xmx1g} shows that the largest case fits
 * in 1 GB of heap; the serial collector because G1's young pauses dominate on a loaded 2-core
 * machine)
 */
public final class LoweringBench {
  private static final int REPEATS = 3;
  private static final int MAX_REPEATS = 50;

  private LoweringBench() {}

  public static void main(String[] args) throws Exception {
    boolean quick = args.length > 0 && args[0].equals("quick");
    int[] zoneCounts = quick ? new int[] {10, 100, 500} : new int[] {10, 50, 200, 500, 1000, 2000};
    int[] horizons = quick ? new int[] {10, 25} : new int[] {10, 25, 50};
    Path folder = Files.createTempDirectory("skerry-bench");
    Path file = folder.resolve("bench.mps");
    System.out.println("| zones | N | pruning | binaries | rows | non-zeros | analyse s | lower s | lower Mnz/s"
        + " | write (counted) s | write Mnz/s | write (file) s | file MB | CPU s, all four | peak heap MB |");
    System.out.println("|---:|---:|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|");
    for (int i = 0; i < 20; i++) {
      Milp warm = Lowering.lower(generate(200, 25, i % 2 == 0, i));
      MpsWriter.free().write(warm, new CountingWriter());
    }
    List<double[]> lowerPoints = new ArrayList<>();
    List<double[]> writePoints = new ArrayList<>();
    List<double[]> totalPoints = new ArrayList<>();
    List<double[]> bigPoints = new ArrayList<>();
    double slowestLowerRate = Double.POSITIVE_INFINITY;
    double slowestWriteRate = Double.POSITIVE_INFINITY;
    for (int no : zoneCounts) {
      for (int n : horizons) {
        for (boolean pruning : new boolean[] {false, true}) {
          Scenario s = generate(no, n, pruning, 42L + no);
          double analyse = Double.POSITIVE_INFINITY;
          double lower = Double.POSITIVE_INFINITY;
          double counted = Double.POSITIVE_INFINITY;
          double written = Double.POSITIVE_INFINITY;
          double cpu = Double.POSITIVE_INFINITY;
          Milp milp = null;
          Sizes sizes = null;
          long chars = 0;
          long started = System.nanoTime();
          for (int rep = 0; rep < MAX_REPEATS && (rep < REPEATS || System.nanoTime() - started < 1e9); rep++) {
            milp = null;
            long c0 = processCpuNanos();
            long t0 = System.nanoTime();
            sizes = Analysis.sizes(s);
            long t1 = System.nanoTime();
            milp = Lowering.lower(FormulationLayout.of(s)).milp();
            long t2 = System.nanoTime();
            CountingWriter sink = new CountingWriter();
            MpsWriter.free().write(milp, sink);
            long t3 = System.nanoTime();
            ModelFiles.write(milp, file, ModelFormat.MPS);
            long t4 = System.nanoTime();
            cpu = Math.min(cpu, (processCpuNanos() - c0) / 1e9);
            chars = sink.chars();
            analyse = Math.min(analyse, (t1 - t0) / 1e9);
            lower = Math.min(lower, (t2 - t1) / 1e9);
            counted = Math.min(counted, (t3 - t2) / 1e9);
            written = Math.min(written, (t4 - t3) / 1e9);
          }
          long nonZeros = milp.nonZeros();
          long rows = milp.rowCount();
          milp = null;
          double peak = peakHeapDuring(() -> {
            Milp m = Lowering.lower(s);
            ModelFiles.write(m, file, ModelFormat.MPS);
          });
          long nsno = (long) n * no;
          double lowerRate = nonZeros / lower / 1e6;
          double writeRate = nonZeros / counted / 1e6;
          slowestLowerRate = Math.min(slowestLowerRate, lowerRate);
          slowestWriteRate = Math.min(slowestWriteRate, writeRate);
          System.out.printf(Locale.ROOT, "| %d | %d | %s | %d | %d | %d | %.3f | %.3f | %.2f | %.3f | %.2f | %.3f | %.1f | %.3f | %.0f |%n",
              no, n, pruning ? "on" : "off", sizes.binaries(), rows, nonZeros, analyse, lower, lowerRate, counted,
              writeRate, written, chars / 1e6, cpu, peak / 1e6);
          if (!pruning) {
            lowerPoints.add(new double[] {Math.log(nsno), Math.log(lower)});
            writePoints.add(new double[] {Math.log(nsno), Math.log(counted)});
            totalPoints.add(new double[] {Math.log(nsno), Math.log(lower + written)});
          }
          if (nonZeros >= 100_000) {
            bigPoints.add(new double[] {Math.log(nonZeros), Math.log(lower + written)});
          }
        }
      }
    }
    Files.deleteIfExists(file);
    Files.deleteIfExists(folder);
    // Pruned models do not grow with NS·NO (pruning drops most zones), so the slope against NS·NO
    // is taken over the plain cases, whose size is proportional to it; and, over every case of at
    // least 100,000 non-zeros, the slope of lowering + file write against the non-zeros.
    System.out.printf(Locale.ROOT, "%nlog-log slope vs NS*NO (pruning off): lowering %.2f, writing %.2f,"
        + " lowering + file write %.2f%n", slope(lowerPoints), slope(writePoints), slope(totalPoints));
    System.out.printf(Locale.ROOT, "log-log slope of lowering + file write vs non-zeros (cases >= 100k): %.2f%n",
        slope(bigPoints));
    System.out.printf(Locale.ROOT, "slowest rate: lowering %.2f M non-zeros/s, writing %.2f M non-zeros/s%n",
        slowestLowerRate, slowestWriteRate);
    System.out.printf(Locale.ROOT, "heap limit %.0f MB%n", Runtime.getRuntime().maxMemory() / 1e6);
  }

  /**
   * CPU time of the whole JVM (collector and compiler included), to tell work from waiting for a
   * core on a loaded machine; -1 where the platform does not say.
   */
  private static long processCpuNanos() {
    java.lang.management.OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
    if (os instanceof com.sun.management.OperatingSystemMXBean sun) {
      return sun.getProcessCpuTime();
    }
    return -1;
  }

  /** Work whose peak heap is measured. */
  @FunctionalInterface
  interface Work {
    void run() throws Exception;
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
  private static double peakHeapDuring(Work work) throws Exception {
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
