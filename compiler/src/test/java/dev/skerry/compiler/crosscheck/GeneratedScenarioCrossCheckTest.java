package dev.skerry.compiler.crosscheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.io.FixedPrecision;
import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.OutsideSolvers;
import dev.skerry.compiler.io.WriteSummary;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Generated scenarios, from Skerry text through the checker and the lowering, written as free MPS,
 * fixed MPS and LP and solved by the two outside judges: {@code cbc} 2.10 (Debian package
 * coinor-cbc, run with {@code -preprocess off}, see OutsideSolvers) and {@code glpsol} 5.0 (Debian
 * package glpk-utils, with {@code --freemps}, {@code --mps} and {@code --lp}). Every optimum must
 * agree within 1e-6 relative with the optimum SCIP proves in process on the very {@link Milp} that
 * {@code skerry solve} hands its backend, so a file that differs from the solved model in any way
 * that moves the optimum fails here.
 *
 * <p>Fixed MPS holds 12-character numbers, so {@code skerry build} writes it from the model rounded
 * by {@link FixedPrecision}; its two outside optima are compared with SCIP's optimum of that
 * rounded model (the file must be exactly the rounded model), and the rounded model's optimum with
 * the exact one within the relative rounding the rounding reports, scaled by the model's size.
 */
class GeneratedScenarioCrossCheckTest {
  /** Tighter than the 1e-6 of the comparison: SCIP's answer stands for the exact optimum. */
  private static final double SCIP_GAP = 1e-9;

  @TempDir Path folder;

  static Stream<GeneratedScenarios.Case> cases() {
    return LongStream.rangeClosed(1, 12).mapToObj(GeneratedScenarios::of);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void outsideJudgesAgreeWithTheInProcessSolve(GeneratedScenarios.Case c) throws Exception {
    CheckResult checked = GeneratedScenarios.check(c, folder);
    assertFalse(checked.hasErrors(), () -> c.text() + "\n" + checked.diagnostics());
    assertNotNull(checked.scenario(), c.text());
    Milp milp = Lowering.lower(checked.scenario());
    FixedPrecision.Rounded rounded = FixedPrecision.round(milp);

    List<Callable<Double>> exact = new ArrayList<>();
    List<Callable<Double>> fixed = new ArrayList<>();
    for (ModelFormat format : ModelFormat.values()) {
      Milp written = format == ModelFormat.FIXED_MPS ? rounded.milp() : milp;
      Path file = folder.resolve("case" + format.extension());
      WriteSummary summary = ModelFiles.write(written, file, format).summary();
      List<Callable<Double>> into = format == ModelFormat.FIXED_MPS ? fixed : exact;
      into.add(() -> optimum(summary, OutsideSolvers.cbcObjective(file), format));
      into.add(() -> optimum(summary, OutsideSolvers.glpsolObjective(file, format), format));
    }
    List<Future<Double>> exactRuns = submit(exact);
    List<Future<Double>> fixedRuns = submit(fixed);

    double inProcess = InProcess.scip(milp, SCIP_GAP).objective();
    double inProcessRounded = InProcess.scip(rounded.milp(), SCIP_GAP).objective();
    List<Double> exactOptima = values(exactRuns);
    List<Double> fixedOptima = values(fixedRuns);
    for (double v : exactOptima) {
      assertTrue(OutsideSolvers.sameOptimum(inProcess, v),
          c + ": in-process SCIP " + inProcess + ", outside on free MPS / LP " + exactOptima + "\n" + c.text());
    }
    for (double v : fixedOptima) {
      assertTrue(OutsideSolvers.sameOptimum(inProcessRounded, v),
          c + ": in-process SCIP on the rounded model " + inProcessRounded + ", outside on fixed MPS "
              + fixedOptima + "\n" + c.text());
    }
    // Rounding moves each number by at most maxRelativeChange; the optimum of these small models
    // (objective terms of order 10, a few hundred rows) may move by a small multiple of it, never
    // anywhere near the 1e-6 the judges are held to.
    assertTrue(Math.abs(inProcessRounded - inProcess)
            <= 1e-9 + 1e3 * rounded.maxRelativeChange() * Math.abs(inProcess),
        c + ": rounding for fixed MPS (largest relative change " + rounded.maxRelativeChange()
            + ") moved the optimum from " + inProcess + " to " + inProcessRounded);
  }

  private static double optimum(WriteSummary summary, OutsideSolvers.Result result, ModelFormat format) {
    assertEquals(OutsideSolvers.Status.OPTIMAL, result.status(),
        result.solver() + " on " + format + ": " + result.detail());
    return summary.modelObjective(result.objective());
  }

  private static List<Future<Double>> submit(List<Callable<Double>> solves) {
    List<Future<Double>> out = new ArrayList<>();
    for (Callable<Double> s : solves) {
      out.add(SOLVERS.submit(s));
    }
    return out;
  }

  private static List<Double> values(List<Future<Double>> runs) throws Exception {
    List<Double> out = new ArrayList<>();
    for (Future<Double> f : runs) {
      try {
        out.add(f.get());
      } catch (ExecutionException e) {
        if (e.getCause() instanceof AssertionError failure) {
          throw failure;
        }
        throw e;
      }
    }
    return out;
  }

  /** Two outside solves at a time: the machines this runs on have two cores. */
  private static final ExecutorService SOLVERS = Executors.newFixedThreadPool(2, task -> {
    Thread t = new Thread(task, "outside-solver");
    t.setDaemon(true);
    return t;
  });

  @AfterAll
  static void stop() {
    SOLVERS.shutdown();
  }
}
