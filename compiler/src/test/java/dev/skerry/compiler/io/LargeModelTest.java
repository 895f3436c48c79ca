package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * The writers stream: a model of 400,000 binaries and 1,000,000 rows is written in all three
 * formats by a JVM limited to 1 GB of heap. Slow (about a minute), so it runs only when asked for
 * with {@code -Dskerry.io.large=true}.
 */
class LargeModelTest {
  static final int BINARIES = 400_000;
  static final int CONTINUOUS = 200_000;
  static final int ROWS = 1_000_000;

  @Test
  @EnabledIfSystemProperty(named = "skerry.io.large", matches = "true")
  void aMillionRowsAreWrittenWithinOneGigabyteOfHeap() throws Exception {
    Path log = Files.createTempFile("skerry-large", ".log");
    try {
      String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
      Process process =
          new ProcessBuilder(
                  java,
                  "-Xmx1g",
                  "-cp",
                  System.getProperty("java.class.path"),
                  LargeModelTest.class.getName())
              .redirectErrorStream(true)
              .redirectOutput(log.toFile())
              .start();
      assertTrue(
          process.waitFor(15, TimeUnit.MINUTES), "the large write did not finish in 15 minutes");
      String output = Files.readString(log);
      System.out.print(output);
      assertEquals(0, process.exitValue(), output);
      assertTrue(output.contains("done"), output);
    } finally {
      Files.deleteIfExists(log);
    }
  }

  /** Builds the large model and writes it in each format to a counting sink; prints figures. */
  public static void main(String[] args) throws IOException {
    long start = cpuNanos();
    Milp milp = build();
    System.out.printf(
        "built %d columns, %d rows, %d non-zeros in %.1f s of CPU; model alone %d MB of heap%n",
        milp.columnCount(), milp.rowCount(), milp.nonZeros(), seconds(start), liveMegabytes());
    for (ModelFormat format : ModelFormat.values()) {
      long t = cpuNanos();
      CountingWriter out = new CountingWriter();
      WriteSummary summary = ModelFiles.writeTo(milp, out, format);
      System.out.printf(
          "%s: %d MB of text, %d aliased names, %.1f s of CPU (heap limit %d MB)%n",
          format,
          out.chars() / 1_000_000,
          summary.names().size(),
          seconds(t),
          Runtime.getRuntime().maxMemory() / 1_000_000);
    }
    System.out.println("done");
  }

  /**
   * Shaped like a trajectory model: per step, position-like continuous columns; per zone and step,
   * binaries; each row ties one binary to two continuous columns (a big-M side) or sums four
   * binaries (at least one side active). Long names, so fixed MPS aliases all of them.
   */
  static Milp build() {
    MilpBuilder b = new MilpBuilder("large");
    Origin o = Origin.NONE;
    List<Variable> cont = new ArrayList<>(CONTINUOUS);
    for (int j = 0; j < CONTINUOUS; j++) {
      cont.add(b.newContinuous("position_axis" + (j % 2) + "_step" + (j / 2), -1000, 1000, o));
    }
    List<Variable> bins = new ArrayList<>(BINARIES);
    for (int j = 0; j < BINARIES; j++) {
      bins.add(
          b.newBinary("avoid_zone" + (j / 4 % 1000) + "_step" + (j / 4000) + "_side" + (j % 4), o));
    }
    int sums = BINARIES / 4;
    for (int i = 0; i < ROWS - sums; i++) {
      Variable bin = bins.get(i % BINARIES);
      b.addLessOrEqual(
          "side_" + i,
          LinearExpr.of(cont.get(i % CONTINUOUS), 1)
              .add(cont.get((i * 7 + 1) % CONTINUOUS), -0.5)
              .add(bin, -2000),
          12.5,
          o);
    }
    for (int z = 0; z < sums; z++) {
      LinearExpr e = new LinearExpr();
      for (int s = 0; s < 4; s++) {
        e.add(bins.get(4 * z + s));
      }
      b.addLessOrEqual("one_side_" + z, e, 3, o);
    }
    LinearExpr objective = new LinearExpr();
    for (int j = 0; j < CONTINUOUS; j += 2) {
      objective.add(cont.get(j), 0.25);
    }
    b.minimize(objective);
    return b.build();
  }

  private static long cpuNanos() {
    return ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
  }

  private static double seconds(long since) {
    return (cpuNanos() - since) / 1e9;
  }

  private static long liveMegabytes() {
    System.gc();
    Runtime r = Runtime.getRuntime();
    return (r.totalMemory() - r.freeMemory()) / 1_000_000;
  }
}
