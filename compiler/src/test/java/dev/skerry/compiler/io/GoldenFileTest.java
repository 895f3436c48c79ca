package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The files written for one small model, compared with the reviewed copies under
 * src/test/resources/.../golden. They change only when someone asks for it with {@code
 * -Dskerry.golden.update=true}, and then the diff is reviewed like code. The checked-in copies are
 * also solved by the outside judges ({@code cbc} 2.10 from coinor-cbc, {@code glpsol} 5.0 from
 * glpk-utils), which must find the optimum worked out by hand below.
 */
class GoldenFileTest {
  static final Path GOLDEN = Path.of("src/test/resources/dev/skerry/compiler/io/golden");
  static final boolean UPDATE = Boolean.getBoolean("skerry.golden.update");

  /**
   * max 3x + 2b - n + 0.5 f + 10 subject to cap: x + 4b + n ≤ 9.5, link: x - f = 0.5, floor: x + n
   * ≥ -1, band[1]: -2 ≤ 2x - n ≤ 8; x in [0, 4], b binary, n integer in [-3, 5], f free.
   *
   * <p>By hand: f = x - 0.5 turns the objective into 3.5x + 2b - n + 9.75. n must be at least
   * max(-3, -1 - x, 2x - 8), so each unit of x costs at most 2 in n and gains 3.5: x = 4, n = 0, b
   * = 1 (cap: 8 ≤ 9.5), objective 14 + 2 - 0 + 9.75 = 25.75.
   */
  static final double OPTIMUM = 25.75;

  static Milp model() {
    Origin o = Origin.NONE;
    MilpBuilder b = new MilpBuilder("golden");
    Variable x = b.newContinuous("x", 0, 4, o);
    Variable bin = b.newBinary("b", o);
    Variable n = b.newInteger("n", -3, 5, o);
    Variable f =
        b.newContinuous(
            "offset_of_the_reference_point", Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, o);
    b.addLessOrEqual("cap", LinearExpr.of(x).add(bin, 4).add(n), 9.5, o);
    b.addEquality("link", LinearExpr.of(x).add(f, -1), 0.5, o);
    b.addGreaterOrEqual("floor", LinearExpr.of(x).add(n), -1, o);
    b.addRange("band[1]", -2, LinearExpr.of(x, 2).add(n, -1), 8, o);
    b.maximize(LinearExpr.of(x, 3).add(bin, 2).add(n, -1).add(f, 0.5).addConstant(10));
    return b.build();
  }

  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void writtenFilesMatchTheReviewedCopies(ModelFormat format) throws IOException {
    StringWriter text = new StringWriter();
    WriteSummary summary = ModelFiles.writeTo(model(), text, format);
    compare(GOLDEN.resolve("small" + format.extension()), text.toString());
    StringWriter names = new StringWriter();
    summary.names().write(names);
    Path mapFile = GOLDEN.resolve("small" + format.extension() + ModelFiles.NAME_MAP_SUFFIX);
    if (summary.names().isEmpty()) {
      assertTrue(
          !Files.exists(mapFile) || UPDATE && deleted(mapFile),
          mapFile + " should not exist: no name changed");
    } else {
      compare(mapFile, names.toString());
    }
  }

  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void theReviewedCopiesSolveToTheOptimumWorkedOutByHand(ModelFormat format) throws Exception {
    Path file = GOLDEN.resolve("small" + format.extension());
    if (!Files.exists(file)) {
      fail(file + " is missing; create it with -Dskerry.golden.update=true and review it");
    }
    // The model maximises, so each file minimises the negated objective.
    for (OutsideSolvers.Result result :
        new OutsideSolvers.Result[] {
          OutsideSolvers.cbcObjective(file), OutsideSolvers.glpsolObjective(file, format)
        }) {
      assertEquals(
          OutsideSolvers.Status.OPTIMAL, result.status(), result.solver() + ": " + result.detail());
      assertTrue(
          OutsideSolvers.sameOptimum(-OPTIMUM, result.objective()),
          result.solver() + " on " + file.getFileName() + " gives " + result.objective());
    }
  }

  private static void compare(Path golden, String actual) throws IOException {
    if (UPDATE) {
      Files.createDirectories(golden.getParent());
      Files.writeString(golden, actual, StandardCharsets.US_ASCII);
      return;
    }
    if (!Files.exists(golden)) {
      fail(golden + " is missing; create it with -Dskerry.golden.update=true and review it");
    }
    assertEquals(
        Files.readString(golden, StandardCharsets.US_ASCII),
        actual,
        golden
            + " differs; if the change is intended, regenerate with -Dskerry.golden.update=true"
            + " and review the diff");
  }

  private static boolean deleted(Path file) {
    try {
      return Files.deleteIfExists(file);
    } catch (IOException e) {
      throw new IllegalStateException("cannot remove stale golden file " + file, e);
    }
  }
}
