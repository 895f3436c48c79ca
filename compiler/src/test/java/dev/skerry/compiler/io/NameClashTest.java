package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Objective;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.api.Test;

/**
 * Names the writers make up never take a name the model keeps, and repeated names are refused in a
 * model that did not come from a builder (a builder refuses them itself).
 */
class NameClashTest {
  private static final Origin O = Origin.NONE;

  @ParameterizedTest
  @EnumSource(ModelFormat.class)
  void repeatedNamesInAHandMadeModelAreRefused(ModelFormat format) {
    Variable x = new Variable(0, "x", VarType.CONTINUOUS, 0, 1, O);
    Variable twin = new Variable(1, "x", VarType.CONTINUOUS, 0, 1, O);
    Milp columns = new Milp("m", List.of(x, twin), List.of(), Objective.zero());
    StringBuilder out = new StringBuilder();
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> ModelFiles.writeTo(columns, out, format));
    assertEquals("two columns are named x", e.getMessage());

    Row a = new Row(0, "r", new int[] {0}, new double[] {1}, 0, 1, O);
    Row b = new Row(1, "r", new int[] {0}, new double[] {2}, 0, 1, O);
    Milp rows = new Milp("m", List.of(x), List.of(a, b), Objective.zero());
    e = assertThrows(IllegalArgumentException.class, () -> ModelFiles.writeTo(rows, out, format));
    assertEquals("two rows are named r", e.getMessage());
    assertEquals(0, out.length());
  }

  @Test
  void aliasesAndTheObjectiveRowStepAroundKeptNamesOfTheSameShape() throws Exception {
    MilpBuilder b = new MilpBuilder("clash");
    Variable kept = b.newContinuous("C0000001", 0, 1, O);
    Variable spaced = b.newContinuous("has space", 0, 1, O);
    Variable longKept = b.newContinuous("C00000002", 0, 1, O);
    b.addLessOrEqual("OBJ", LinearExpr.of(kept).add(spaced), 1, O);
    b.addLessOrEqual("R0000001", LinearExpr.of(spaced).add(longKept), 1, O);
    b.addLessOrEqual("bad row", LinearExpr.of(kept), 1, O);
    b.minimize(LinearExpr.of(spaced).addConstant(2));
    Milp milp = b.build();

    StringWriter text = new StringWriter();
    WriteSummary free = MpsWriter.free().write(milp, text);
    assertEquals("OBJ1", free.objectiveRow());
    assertEquals("OBJCONST", free.constantColumn().orElseThrow());
    assertEquals("C0000002", free.names().alias(0));
    assertEquals("has space", free.names().fullName(0));
    assertEquals("R0000002", free.names().alias(1));
    assertEquals("bad row", free.names().fullName(1));
    Milp back = MpsReader.read(new StringReader(text.toString()), ModelFormat.MPS);
    assertEquals(milp.objective().value(new double[] {0, 1, 0}), back.objective().value(new double[] {0, 1, 0, 1}));

    // Fixed MPS: the 9-character C00000002 is aliased too, and takes the next free alias.
    WriteSummary fixed = MpsWriter.fixed().write(milp, new StringWriter());
    assertEquals("C0000002", fixed.names().alias(0));
    assertEquals("C0000003", fixed.names().alias(1));
    assertEquals("C00000002", fixed.names().fullName(1));
    assertTrue(fixed.names().size() == 3, fixed.names().toString());
  }
}
