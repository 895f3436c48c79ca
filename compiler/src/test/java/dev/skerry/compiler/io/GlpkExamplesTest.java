package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Reduction;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * GLPK's own example models (fixed MPS, shipped with the Debian package glpk-utils under
 * /usr/share/doc/glpk-utils/examples): our reader reads each, our writers write it back in all
 * three formats, and {@code glpsol} 5.0 (glpk-utils) finds the same optimum for the original and
 * for every copy. Where the file's header states its optimum ({@code *OPT SOLN:}), glpsol's optimum
 * must match it to the digits stated. murtagh.mps says in its header that it is a maximisation but
 * carries no sense, so it is solved with {@code --max} and read as one.
 */
class GlpkExamplesTest {
  static final Path EXAMPLES = Path.of("/usr/share/doc/glpk-utils/examples");
  static final List<String> NAMES =
      List.of("plan", "murtagh", "icecream", "samp1", "samp2", "furnace", "alloy");
  private static final Pattern STATED_OPTIMUM =
      Pattern.compile("^\\*OPT SOLN:\\s*(\\S+)", Pattern.MULTILINE);
  private static final Set<String> MAXIMISATIONS = Set.of("murtagh");

  @TempDir Path folder;

  static Stream<String> examples() {
    return NAMES.stream();
  }

  @Test
  void theExamplesAreInstalled() {
    for (String name : NAMES) {
      Path file = EXAMPLES.resolve(name + ".mps");
      if (!Files.isReadable(file)) {
        fail(
            file
                + " is missing: install the Debian package glpk-utils, which ships GLPK's"
                + " examples");
      }
    }
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("examples")
  void ourCopiesSolveToTheOriginalsOptimum(String name) throws Exception {
    Path original = EXAMPLES.resolve(name + ".mps");
    boolean maximize = MAXIMISATIONS.contains(name);
    OutsideSolvers.Result reference =
        OutsideSolvers.glpsolObjective(original, ModelFormat.FIXED_MPS, maximize);
    assertEquals(
        OutsideSolvers.Status.OPTIMAL,
        reference.status(),
        "glpsol on the original: " + reference.detail());
    String text = Files.readString(original, StandardCharsets.ISO_8859_1);
    Matcher stated = STATED_OPTIMUM.matcher(text);
    if (stated.find()) {
      BigDecimal value = new BigDecimal(stated.group(1));
      double halfLastDigit = 0.5 * Math.pow(10, -value.scale());
      assertTrue(
          Math.abs(value.doubleValue() - reference.objective()) <= halfLastDigit + 1e-9,
          name + ": the file states " + value + ", glpsol finds " + reference.objective());
    }

    Milp milp = read(name);
    for (ModelFormat format : ModelFormat.values()) {
      Path copy = folder.resolve(name + format.extension());
      ModelFiles.Written written = ModelFiles.write(milp, copy, format);
      OutsideSolvers.Result result = OutsideSolvers.glpsolObjective(copy, format);
      assertEquals(
          OutsideSolvers.Status.OPTIMAL,
          result.status(),
          "glpsol on our " + format + " copy: " + result.detail());
      double optimum = written.summary().modelObjective(result.objective());
      assertTrue(
          OutsideSolvers.sameOptimum(reference.objective(), optimum),
          name + " as " + format + ": original " + reference.objective() + ", our copy " + optimum);
    }
  }

  /**
   * The exact reduction the ojAlgo backend hands its models through ({@link Reduction}): glpsol
   * finds the original's optimum for the reduced copy too, once the constant the reduction moved
   * into the objective is added back. murtagh, icecream and alloy lose rows or columns to it (2, 2
   * and 2, 4), the other four are left as they are.
   */
  @ParameterizedTest(name = "{0}")
  @MethodSource("examples")
  void reducedCopiesSolveToTheOriginalsOptimum(String name) throws Exception {
    Milp milp = read(name);
    OutsideSolvers.Result reference =
        OutsideSolvers.glpsolObjective(
            EXAMPLES.resolve(name + ".mps"), ModelFormat.FIXED_MPS, MAXIMISATIONS.contains(name));
    Reduction reduction = Reduction.of(milp);
    assertNull(reduction.infeasibleRow(), name);
    Path copy = folder.resolve(name + "_reduced.lp");
    ModelFiles.Written written = ModelFiles.write(reduction.reduced(), copy, ModelFormat.LP);
    OutsideSolvers.Result result = OutsideSolvers.glpsolObjective(copy, ModelFormat.LP);
    assertEquals(OutsideSolvers.Status.OPTIMAL, result.status(), name + ": " + result.detail());
    double optimum = written.summary().modelObjective(result.objective());
    assertTrue(
        OutsideSolvers.sameOptimum(reference.objective(), optimum),
        name
            + " reduced by "
            + reduction.removedColumns()
            + " columns and "
            + reduction.removedRows()
            + " rows: original "
            + reference.objective()
            + ", reduced "
            + optimum);
  }

  /** The example as our reader reads it; a known maximisation gets its sense. */
  private static Milp read(String name) throws IOException {
    Milp milp =
        MpsReader.read(EXAMPLES.resolve(name + ".mps"), ModelFormat.FIXED_MPS, NameMap.EMPTY);
    if (!MAXIMISATIONS.contains(name)) {
      return milp;
    }
    Objective o = milp.objective();
    return new Milp(
        milp.name(),
        milp.variables(),
        milp.rows(),
        new Objective(false, o.cols(), o.coefs(), o.constant()));
  }

  /** Free MPS names hold no blanks: a model name with blanks comes back with underscores. */
  @ParameterizedTest(name = "{0}")
  @MethodSource("examples")
  void ourFreeCopyReadsBackAsTheSameModel(String name) throws IOException {
    Milp milp = read(name);
    Path copy = folder.resolve(name + ".mps");
    ModelFiles.Written written = ModelFiles.write(milp, copy, ModelFormat.MPS);
    Milp back = MpsReader.read(copy, ModelFormat.MPS, written.summary().names());
    Milp expected =
        new Milp(milp.name().replace(' ', '_'), milp.variables(), milp.rows(), milp.objective());
    MilpAssertions.assertSameModel(expected, back);
  }
}
