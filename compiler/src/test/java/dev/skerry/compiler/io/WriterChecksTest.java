package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** What the writers refuse, and the awkward shapes they must still write correctly. */
class WriterChecksTest {
  private static final Origin O = Origin.NONE;

  @TempDir Path folder;

  private static Milp withRow(Row row) {
    MilpBuilder b = new MilpBuilder("bad");
    b.newContinuous("x", 0, 1, O);
    b.newContinuous("y", 0, 1, O);
    Milp base = b.build();
    return new Milp("bad", base.variables(), List.of(row), Objective.zero());
  }

  private static IllegalArgumentException refused(Milp milp, ModelFormat format) {
    StringBuilder out = new StringBuilder();
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> ModelFiles.writeTo(milp, out, format));
    assertEquals(0, out.length(), "nothing may be written before the model is refused");
    return e;
  }

  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void aNaNOrInfiniteCoefficientIsRefusedByNameBeforeWriting(ModelFormat format) {
    Row nan = new Row(0, "speed_limit", new int[] {0, 1}, new double[] {1, Double.NaN}, 0, 1, O);
    IllegalArgumentException e = refused(withRow(nan), format);
    assertTrue(
        e.getMessage().contains("speed_limit") && e.getMessage().contains("column y"),
        e.getMessage());

    Row inf = new Row(0, "reach", new int[] {0}, new double[] {Double.NEGATIVE_INFINITY}, 0, 1, O);
    assertTrue(refused(withRow(inf), format).getMessage().contains("reach"));

    Milp base = withRow(new Row(0, "ok", new int[] {0}, new double[] {1}, 0, 1, O));
    Milp badObjective =
        new Milp(
            "bad",
            base.variables(),
            base.rows(),
            new Objective(true, new int[] {1}, new double[] {Double.POSITIVE_INFINITY}, 0));
    IllegalArgumentException o = refused(badObjective, format);
    assertTrue(
        o.getMessage().contains("objective") && o.getMessage().contains("column y"),
        o.getMessage());
  }

  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void numbersCbcWouldReadAsInfiniteAreRefused(ModelFormat format) {
    Row huge = new Row(0, "big_m", new int[] {0}, new double[] {1e30}, 0, 1, O);
    IllegalArgumentException e = refused(withRow(huge), format);
    assertTrue(
        e.getMessage().contains("big_m") && e.getMessage().contains("infinite"), e.getMessage());
  }

  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void boundsTheWrongWayRoundAreRefused(ModelFormat format) {
    Row inverted = new Row(0, "inverted", new int[] {0}, new double[] {1}, 3, 2, O);
    assertTrue(refused(withRow(inverted), format).getMessage().contains("inverted"));
    Row minusInfinity =
        new Row(0, "never", new int[] {0}, new double[] {1}, 0, Double.NEGATIVE_INFINITY, O);
    assertTrue(refused(withRow(minusInfinity), format).getMessage().contains("never"));
  }

  @Test
  void fixedMpsRefusesANumberThatNeedsMoreThanTwelveCharacters() {
    MilpBuilder b = new MilpBuilder("third");
    Variable x = b.newContinuous("x", 0, 1, O);
    b.addLessOrEqual("cap", LinearExpr.of(x, 1.0 / 3), 1, O);
    IllegalArgumentException e = refused(b.build(), ModelFormat.FIXED_MPS);
    assertTrue(e.getMessage().contains("column x in row cap"), e.getMessage());
    assertTrue(e.getMessage().contains("free MPS"), e.getMessage());
  }

  /**
   * A free row (no bound) is an N row in MPS and is left out of LP; an empty row and a column in no
   * row are valid everywhere. Judged by cbc 2.10 (Debian coinor-cbc) and glpsol 5.0 (Debian
   * glpk-utils): min x - y with x + y ≤ 3, y in [0, 2], x in [1, 5], plus a free row, an empty row
   * 0 ≥ -1 and an unused column, has optimum 1 - 2 = -1.
   */
  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void freeRowsEmptyRowsAndUnusedColumnsAreWrittenSoBothJudgesAgree(ModelFormat format)
      throws Exception {
    MilpBuilder b = new MilpBuilder("shapes");
    Variable x = b.newContinuous("x", 1, 5, O);
    Variable y = b.newContinuous("y", 0, 2, O);
    b.newInteger("unused", -3, 3, O);
    b.addLessOrEqual("cap", LinearExpr.of(x).add(y), 3, O);
    b.addRange(
        "watch", Double.NEGATIVE_INFINITY, LinearExpr.of(x, 2).add(y), Double.POSITIVE_INFINITY, O);
    b.addGreaterOrEqual("nothing", new LinearExpr(), -1, O);
    b.minimize(LinearExpr.of(x).add(y, -1));
    Milp milp = b.build();
    Path file = folder.resolve("shapes" + format.extension());
    ModelFiles.write(milp, file, format);
    assertOptimum(-1, file, format);
    if (format.isMps()) {
      StringWriter text = new StringWriter();
      WriteSummary summary = ModelFiles.writeTo(milp, text, format);
      MilpAssertions.assertSameModel(
          milp, MpsReader.read(new StringReader(text.toString()), format, summary.names()));
    }
  }

  /** A model without columns or rows: only the constant 7.5 remains (cbc and glpsol judge). */
  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void aModelWithNothingButAConstantIsStillAValidFile(ModelFormat format) throws Exception {
    MilpBuilder b = new MilpBuilder("empty");
    b.minimize(new LinearExpr().addConstant(7.5));
    Milp milp = b.build();
    Path file = folder.resolve("empty" + format.extension());
    ModelFiles.write(milp, file, format);
    assertOptimum(7.5, file, format);
  }

  /**
   * A row of 300 terms with 40-character names spans many LP lines, each under 255 characters, and
   * names the LP format cannot hold are sanitized. Judged by cbc and glpsol: min Σ x_i with Σ x_i ≥
   * 150.5 and x_i in [0, 1] is 150.5; the odd names carry cost 0 and sit at their lower bounds.
   */
  @Test
  void longLpRowsWrapAndOddNamesAreSanitized() throws Exception {
    MilpBuilder b = new MilpBuilder("wide");
    LinearExpr sum = new LinearExpr();
    for (int i = 0; i < 300; i++) {
      sum.add(
          b.newContinuous(String.format("a_column_with_a_name_of_forty_chars_%04d", i), 0, 1, O));
    }
    List<Variable> odd = new ArrayList<>();
    for (String name :
        new String[] {
          "end", "free", "e9", "E12", "st", "3x", "x[1,2]", "x y", "inf", "Bounds", "-x"
        }) {
      odd.add(b.newContinuous(name, 0, 1, O));
    }
    b.addGreaterOrEqual("need", sum, 150.5, O);
    LinearExpr oddRow = new LinearExpr();
    odd.forEach(oddRow::add);
    b.addLessOrEqual("subject", oddRow, 20, O);
    b.minimize(sum);
    Milp milp = b.build();
    Path file = folder.resolve("wide.lp");
    ModelFiles.Written written = ModelFiles.write(milp, file, ModelFormat.LP);
    List<String> lines = java.nio.file.Files.readAllLines(file);
    assertTrue(
        lines.stream().allMatch(l -> l.length() <= 255),
        "an LP line is longer than 255 characters");
    assertTrue(lines.size() > 60, "the long row should span many lines");
    NameMap names = written.summary().names();
    assertEquals(odd.size() + 1, names.size(), "every odd column and the keyword row are renamed");
    for (int i = 0; i < names.size(); i++) {
      assertTrue(names.alias(i).matches("[A-Za-z_][A-Za-z0-9_]*"), names.alias(i));
    }
    assertTrue(written.nameMap().isPresent());
    assertEquals(names, NameMap.readFrom(written.nameMap().get()));
    assertOptimum(150.5, file, ModelFormat.LP);
  }

  private static void assertOptimum(double expected, Path file, ModelFormat format)
      throws Exception {
    for (OutsideSolvers.Result result :
        List.of(OutsideSolvers.cbcObjective(file), OutsideSolvers.glpsolObjective(file, format))) {
      assertEquals(
          OutsideSolvers.Status.OPTIMAL, result.status(), result.solver() + ": " + result.detail());
      assertTrue(
          OutsideSolvers.sameOptimum(expected, result.objective()),
          result.solver() + " on " + file.getFileName() + ": " + result.objective());
    }
  }

  @Test
  void aFreeMpsNameWithBlanksOrTooLongIsAliasedAndSaidSo() throws IOException {
    MilpBuilder b = new MilpBuilder("names");
    b.newContinuous("has blank", 0, 1, O);
    b.newContinuous("x".repeat(65), 0, 1, O);
    b.newContinuous("x".repeat(64), 0, 1, O);
    StringWriter text = new StringWriter();
    WriteSummary summary = MpsWriter.free().write(b.build(), text);
    assertEquals(2, summary.names().size());
    assertEquals("has blank", summary.names().fullName(0));
    assertTrue(text.toString().contains("2 names that free MPS cannot hold"), text.toString());
    assertFalse(text.toString().contains("has blank"));
    assertTrue(text.toString().contains(" " + "x".repeat(64) + " "));
  }
}
