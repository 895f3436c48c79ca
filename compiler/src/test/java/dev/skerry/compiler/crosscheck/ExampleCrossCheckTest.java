package dev.skerry.compiler.crosscheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.OutsideSolvers;
import dev.skerry.compiler.io.WriteSummary;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shipped examples end to end: check, lower, write free MPS, solve the file with {@code cbc}
 * 2.10 (Debian package coinor-cbc, {@code -preprocess off}) as the outside judge, and compare with
 * SCIP's optimum of the same model in process (the solve {@code skerry solve} does). SCIP runs with
 * the default relative gap of 1e-6 and cbc proves optimality, so they must agree within that gap.
 *
 * <p>Every example is read by both judges: cbc on the free MPS file and glpsol on the LP file (the
 * ridge also on free MPS). The largest take minutes each, so their outside solves run two at a time.
 */
class ExampleCrossCheckTest {
  private static final Path EXAMPLES = Path.of("..", "examples").toAbsolutePath().normalize();

  @TempDir Path folder;

  @Test
  void warehouseFileSolvedByCbcMatchesInProcessScip() throws Exception {
    crossCheck("warehouse_floor", 120);
  }

  /**
   * glpsol 5.0 (Debian glpk-utils) reads our LP file of the warehouse example (2.5 s here with
   * {@code --pcost}, 23 s without) and must prove the same optimum as SCIP in process; the
   * generated cases cover every format.
   */
  @Test
  void warehouseLpFileSolvedByGlpsolMatchesInProcessScip() throws Exception {
    glpsolAgrees("warehouse_floor", ModelFormat.LP);
  }

  /**
   * The 3-D ridge example, small enough for every outside reading: cbc 2.10 on the free MPS file,
   * glpsol 5.0 on the LP file and on the free MPS file (under a second each here).
   */
  @Test
  void ridgeDroneFilesSolvedByCbcAndGlpsolMatchInProcessScip() throws Exception {
    crossCheck("ridge_drone", 120);
    glpsolAgrees("ridge_drone", ModelFormat.LP);
    glpsolAgrees("ridge_drone", ModelFormat.MPS);
  }

  /**
   * The larger examples by both outside judges: cbc 2.10 on the free MPS files of the harbour and
   * rock-field examples (about 55 s and 90 s here) and of the twin skiffs (30 s), glpsol 5.0 on
   * their LP files (about 23 s, 34 s and 17 s with {@code --pcost}; 170 s, 155 s and 87 s with
   * glpsol's default branching). Each solve is its own process, so they run two at a time on the
   * two cores, longest first; each must prove the optimum SCIP finds in process.
   */
  @Test
  void largerExamplesSolvedByCbcAndGlpsolMatchInProcessScip() throws Exception {
    record Job(String example, ModelFormat format) {}
    List<Job> jobs = List.of(new Job("rock_field", ModelFormat.MPS), new Job("harbour_survey", ModelFormat.MPS),
        new Job("rock_field", ModelFormat.LP), new Job("twin_skiffs", ModelFormat.MPS),
        new Job("harbour_survey", ModelFormat.LP), new Job("twin_skiffs", ModelFormat.LP));
    Map<String, Double> inProcess = new HashMap<>();
    Map<Job, WriteSummary> written = new HashMap<>();
    for (Job job : jobs) {
      Milp milp = lowered(job.example());
      inProcess.computeIfAbsent(job.example(), e -> InProcess.scip(milp, SolveOptions.DEFAULT_RELATIVE_GAP).objective());
      written.put(job, ModelFiles.write(milp, folder.resolve(job.example() + job.format().extension()), job.format())
          .summary());
    }
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      Map<Job, Future<OutsideSolvers.Result>> running = new LinkedHashMap<>();
      for (Job job : jobs) {
        Path file = folder.resolve(job.example() + job.format().extension());
        running.put(job, pool.submit(() -> job.format() == ModelFormat.MPS ? OutsideSolvers.cbcObjective(file, 900)
            : OutsideSolvers.glpsolObjective(file, job.format(), 900)));
      }
      for (Map.Entry<Job, Future<OutsideSolvers.Result>> e : running.entrySet()) {
        Job job = e.getKey();
        OutsideSolvers.Result r = e.getValue().get();
        assertEquals(OutsideSolvers.Status.OPTIMAL, r.status(), job + ": " + r.solver() + " said " + r.detail());
        double outside = written.get(job).modelObjective(r.objective());
        double ours = inProcess.get(job.example());
        assertTrue(Math.abs(outside - ours) <= 1e-9 + SolveOptions.DEFAULT_RELATIVE_GAP * Math.max(Math.abs(outside),
            Math.abs(ours)), job + ": " + r.solver() + " on our file gives " + outside + ", SCIP in process " + ours);
      }
    } finally {
      pool.shutdownNow();
    }
  }

  /** glpsol proves the same optimum on our file of the example as SCIP in process, within 1e-6 relative. */
  private void glpsolAgrees(String example, ModelFormat format) throws Exception {
    Milp milp = lowered(example);
    Path file = folder.resolve(example + format.extension());
    WriteSummary summary = ModelFiles.write(milp, file, format).summary();
    OutsideSolvers.Result glpsol = OutsideSolvers.glpsolObjective(file, format);
    assertEquals(OutsideSolvers.Status.OPTIMAL, glpsol.status(), example + " " + format + ": glpsol said "
        + glpsol.detail());
    double outside = summary.modelObjective(glpsol.objective());
    double inProcess = InProcess.scip(milp, SolveOptions.DEFAULT_RELATIVE_GAP).objective();
    assertTrue(Math.abs(outside - inProcess) <= 1e-9 + 1e-6 * Math.max(Math.abs(outside), Math.abs(inProcess)),
        example + " " + format + ": glpsol on our file gives " + outside + ", SCIP in process " + inProcess);
  }

  private static Milp lowered(String example) throws Exception {
    Path file = EXAMPLES.resolve(example + ".skerry");
    CheckResult checked = ScenarioChecker.check(SourceFile.of(file, Files.readString(file)), new DiskLoader(EXAMPLES));
    assertFalse(checked.hasErrors(), checked.diagnostics().toString());
    return Lowering.lower(checked.scenario());
  }

  private void crossCheck(String example, long cbcSeconds) throws Exception {
    Milp milp = lowered(example);
    Path mps = folder.resolve(example + ".mps");
    WriteSummary summary = ModelFiles.write(milp, mps, ModelFormat.MPS).summary();
    OutsideSolvers.Result cbc = OutsideSolvers.cbcObjective(mps, cbcSeconds);
    assertEquals(OutsideSolvers.Status.OPTIMAL, cbc.status(), example + ": cbc said " + cbc.detail());
    double outside = summary.modelObjective(cbc.objective());
    double inProcess = InProcess.scip(milp, SolveOptions.DEFAULT_RELATIVE_GAP).objective();
    double gap = SolveOptions.DEFAULT_RELATIVE_GAP;
    assertTrue(Math.abs(outside - inProcess) <= 1e-9 + gap * Math.max(Math.abs(outside), Math.abs(inProcess)),
        example + ": cbc on our MPS file gives " + outside + ", SCIP in process " + inProcess);
  }
}
