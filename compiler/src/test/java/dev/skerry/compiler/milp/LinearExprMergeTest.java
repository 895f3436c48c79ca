package dev.skerry.compiler.milp;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** How a row's terms are merged: column order, repeats summed in the order added, zeros left out. */
class LinearExprMergeTest {
  private static Row row(LinearExpr e) {
    MilpBuilder b = new MilpBuilder("m");
    for (int j = 0; j < 6; j++) {
      b.newContinuous("x" + j, 0, 1, Origin.NONE);
    }
    return b.addLessOrEqual("r", e, 1, Origin.NONE);
  }

  @Test
  void termsInColumnOrderAreKeptAsTheyAre() {
    Row r = row(new LinearExpr().add(0, 1.5).add(2, -2).add(5, 0.25));
    assertArrayEquals(new int[] {0, 2, 5}, r.cols());
    assertArrayEquals(new double[] {1.5, -2, 0.25}, r.coefs());
  }

  @Test
  void termsOutOfOrderAreSorted() {
    Row r = row(new LinearExpr().add(4, 1).add(1, 2).add(3, 3).add(0, 4));
    assertArrayEquals(new int[] {0, 1, 3, 4}, r.cols());
    assertArrayEquals(new double[] {4, 2, 3, 1}, r.coefs());
  }

  @Test
  void repeatsAreSummedInTheOrderTheyWereAdded() {
    // (0.1 + 0.2) + 0.3 and 0.1 + (0.2 + 0.3) differ in the last bit.
    assertNotEquals((0.1 + 0.2) + 0.3, (0.3 + 0.2) + 0.1);
    Row r = row(new LinearExpr().add(3, 0.1).add(1, 7).add(3, 0.2).add(3, 0.3));
    assertArrayEquals(new int[] {1, 3}, r.cols());
    assertEquals((0.1 + 0.2) + 0.3, r.coefs()[1]);
    Row back = row(new LinearExpr().add(3, 0.3).add(3, 0.2).add(1, 7).add(3, 0.1));
    assertEquals((0.3 + 0.2) + 0.1, back.coefs()[1]);
  }

  @Test
  void zerosAndCancelledTermsAreLeftOut() {
    Row r = row(new LinearExpr().add(0, 0.0).add(1, -0.0).add(2, 1).add(4, 2).add(4, -2).add(5, 3));
    assertArrayEquals(new int[] {2, 5}, r.cols());
    assertArrayEquals(new double[] {1, 3}, r.coefs());
    Row empty = row(new LinearExpr().add(2, 0));
    assertEquals(0, empty.size());
  }

  @Test
  void aBuiltModelSaysItsNamesWereChecked() {
    MilpBuilder b = new MilpBuilder("m");
    b.newContinuous("x", 0, 1, Origin.NONE);
    assertThrows(IllegalArgumentException.class, () -> b.newBinary("x", Origin.NONE));
    Milp built = b.build();
    assertTrue(built.namesChecked());
    Milp handMade = new Milp("m", built.variables(), built.rows(), built.objective());
    assertEquals(false, handMade.namesChecked());
  }
}
