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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The shipped examples end to end: check, lower, write free MPS, solve the file with {@code cbc}
 * 2.10 (Debian package coinor-cbc, {@code -preprocess off}) as the outside judge, and compare with
 * SCIP's optimum of the same model in process (the solve {@code skerry solve} does). SCIP runs with
 * the default relative gap of 1e-6 and cbc proves optimality, so they must agree within that gap.
 *
 * <p>By default the warehouse (cbc about 7 s here, glpsol about 40 s), twin-skiff (cbc about 30 s)
 * and ridge (cbc and glpsol, under a second each) examples run. The harbour and rock-field
 * examples take cbc about a minute and a half each on a 2-core machine, and glpsol takes about 80 s
 * on the twin skiffs, so those run only with {@code -Dskerry.slow=true}, each with a 10-minute limit
 * on the cbc process.
 */
class ExampleCrossCheckTest {
  private static final Path EXAMPLES = Path.of("..", "examples").toAbsolutePath().normalize();

  @TempDir Path folder;

  @Test
  void warehouseFileSolvedByCbcMatchesInProcessScip() throws Exception {
    crossCheck("warehouse_floor", 120);
  }

  /**
   * glpsol 5.0 (Debian glpk-utils) reads our LP file of the warehouse example (about 40 s here) and
   * must prove the same optimum as SCIP in process; the generated cases cover every format.
   */
  @Test
  void warehouseLpFileSolvedByGlpsolMatchesInProcessScip() throws Exception {
    glpsolAgrees("warehouse_floor", ModelFormat.LP);
  }

  /** The twin-skiff fleet example: cbc proves its optimum in about 30 s here. */
  @Test
  void twinSkiffsFileSolvedByCbcMatchesInProcessScip() throws Exception {
    crossCheck("twin_skiffs", 300);
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

  /** glpsol on the twin-skiff LP file takes about 80 s here: opt-in. */
  @Test
  @EnabledIfSystemProperty(named = "skerry.slow", matches = "true")
  void twinSkiffsLpFileSolvedByGlpsolMatchesInProcessScip() throws Exception {
    glpsolAgrees("twin_skiffs", ModelFormat.LP);
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

  @ParameterizedTest(name = "{0}")
  @ValueSource(strings = {"harbour_survey", "rock_field"})
  @EnabledIfSystemProperty(named = "skerry.slow", matches = "true")
  void largerExamplesSolvedByCbcMatchInProcessScip(String example) throws Exception {
    crossCheck(example, 600);
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
