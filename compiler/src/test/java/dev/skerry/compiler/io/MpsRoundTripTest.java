package dev.skerry.compiler.io;

import static dev.skerry.compiler.io.MilpAssertions.assertSameModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;

/** Write then read gives the very same model; writing twice gives the very same bytes. */
class MpsRoundTripTest {
  private static final Origin O = Origin.NONE;

  static Stream<Milp> models() {
    return Stream.concat(
        SampleModels.handMade().stream().map(SampleModels.Known::milp),
        Stream.concat(
            LongStream.range(1, 11).mapToObj(seed -> SampleModels.random(seed, false)),
            Stream.of(awkwardModel())));
  }

  /**
   * Long and odd names, an empty row, a column in no row, infinite bounds of every kind, ranges
   * whose width is not a short decimal, numbers with 17 significant digits.
   */
  static Milp awkwardModel() {
    MilpBuilder b = new MilpBuilder("awkward");
    Variable a =
        b.newContinuous(
            "a column name well over sixty-four characters long, with blanks in it",
            -1.0 / 3,
            2.0 / 3,
            O);
    Variable c = b.newContinuous("c", Double.NEGATIVE_INFINITY, -0.1, O);
    Variable f = b.newContinuous("f", Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, O);
    Variable n = b.newInteger("n", -7, Double.POSITIVE_INFINITY, O);
    Variable m = b.newInteger("m", Double.NEGATIVE_INFINITY, 3, O);
    Variable k = b.newBinary("k", O);
    b.newContinuous("unused", 1e-12, 123456.789, O);
    b.newInteger("fixed", 4, 4, O);
    b.addRange("r1", 0.1, LinearExpr.of(a).add(c, Math.PI), 0.3, O);
    b.addRange("r2", -1e20, LinearExpr.of(f).add(n), 1e-20, O);
    b.addRange("r3", -1.5 + Math.ulp(1.5), LinearExpr.of(m).add(k, 1e-9), 1.5, O);
    b.addLessOrEqual("empty", new LinearExpr(), 0, O);
    b.addEquality("eq", LinearExpr.of(a, 0.1).add(k, 0.7), 1.0 / 7, O);
    b.addGreaterOrEqual("\u00e9t\u00e9", LinearExpr.of(n).add(m), -2.5e-300, O);
    b.minimize(LinearExpr.of(a, 1.0 / 3).add(k, -2).addConstant(-0.1));
    return b.build();
  }

  @ParameterizedTest
  @MethodSource("models")
  void freeMpsReadsBackExactly(Milp milp) throws IOException {
    StringWriter text = new StringWriter();
    WriteSummary summary = MpsWriter.free().write(milp, text);
    Milp back = MpsReader.read(new StringReader(text.toString()), ModelFormat.MPS, summary.names());
    assertSameModel(milp, back);
  }

  @ParameterizedTest
  @MethodSource("models")
  void fixedMpsReadsBackExactlyWhenItsNumbersFit(Milp milp) throws IOException {
    StringWriter text = new StringWriter();
    WriteSummary summary;
    try {
      summary = MpsWriter.fixed().write(milp, text);
    } catch (IllegalArgumentException tooLong) {
      assertTrue(tooLong.getMessage().contains("12 characters"), tooLong.getMessage());
      assertEquals("", text.toString(), "nothing may be written when the model is refused");
      return;
    }
    Milp back =
        MpsReader.read(new StringReader(text.toString()), ModelFormat.FIXED_MPS, summary.names());
    assertSameModel(milp, back);
  }

  @Test
  void theHandMadeModelsFitFixedMps() throws IOException {
    for (SampleModels.Known known : SampleModels.handMade()) {
      StringWriter text = new StringWriter();
      WriteSummary summary = MpsWriter.fixed().write(known.milp(), text);
      Milp back =
          MpsReader.read(new StringReader(text.toString()), ModelFormat.FIXED_MPS, summary.names());
      assertSameModel(known.milp(), back);
    }
  }

  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void writingTwiceGivesIdenticalBytes(ModelFormat format) throws IOException {
    Milp milp =
        format == ModelFormat.FIXED_MPS ? SampleModels.negativeBounds().milp() : awkwardModel();
    StringWriter first = new StringWriter();
    StringWriter second = new StringWriter();
    ModelFiles.writeTo(milp, first, format);
    ModelFiles.writeTo(milp, second, format);
    assertEquals(first.toString(), second.toString());
    StringWriter rebuilt = new StringWriter();
    ModelFiles.writeTo(
        format == ModelFormat.FIXED_MPS ? SampleModels.negativeBounds().milp() : awkwardModel(),
        rebuilt,
        format);
    assertEquals(first.toString(), rebuilt.toString(), "a model built again the same way");
  }

  @Test
  void aMaximisationIsWrittenNegatedAndReadBackAsAMaximisation() throws IOException {
    Milp milp = SampleModels.maximisation().milp();
    StringWriter text = new StringWriter();
    WriteSummary summary = MpsWriter.free().write(milp, text);
    assertTrue(summary.objectiveNegated());
    assertTrue(text.toString().contains(" x  OBJ  -3"), text.toString());
    Milp back = MpsReader.read(new StringReader(text.toString()), ModelFormat.MPS);
    assertFalse(back.objective().minimize());
    assertSameModel(milp, back);
  }

  @Test
  void aLongNameIsAliasedInFixedMpsAndRestoredThroughTheNameMap() throws IOException {
    Milp milp = awkwardModel();
    StringWriter text = new StringWriter();
    WriteSummary summary = MpsWriter.free().write(milp, text);
    assertEquals("C0000001", summary.names().alias(0));
    assertEquals(milp.variables().get(0).name(), summary.names().fullName(0));
    StringWriter mapText = new StringWriter();
    summary.names().write(mapText);
    NameMap reread = NameMap.read(new StringReader(mapText.toString()));
    assertEquals(summary.names(), reread);
    Milp withAliases = MpsReader.read(new StringReader(text.toString()), ModelFormat.MPS);
    assertEquals("C0000001", withAliases.variables().get(0).name());
  }
}
