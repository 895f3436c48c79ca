package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;

/**
 * Exact comparison of two models: names, types, every bound and coefficient bit for bit ({@link
 * Double#compare}), the objective with its sense and constant. Origins are not compared (files do
 * not carry them).
 */
final class MilpAssertions {
  private MilpAssertions() {}

  static void assertSameModel(Milp expected, Milp actual) {
    assertEquals(expected.name(), actual.name(), "model name");
    assertEquals(expected.columnCount(), actual.columnCount(), "column count");
    for (int j = 0; j < expected.columnCount(); j++) {
      Variable e = expected.variables().get(j);
      Variable a = actual.variables().get(j);
      String where = "column " + j + " (" + e.name() + ")";
      assertEquals(j, a.index(), where + " index");
      assertEquals(e.name(), a.name(), where + " name");
      assertEquals(e.type(), a.type(), where + " type");
      assertEquals(
          0,
          Double.compare(e.lower(), a.lower()),
          where + " lower " + e.lower() + " vs " + a.lower());
      assertEquals(
          0,
          Double.compare(e.upper(), a.upper()),
          where + " upper " + e.upper() + " vs " + a.upper());
    }
    assertEquals(expected.rowCount(), actual.rowCount(), "row count");
    for (int i = 0; i < expected.rowCount(); i++) {
      Row e = expected.rows().get(i);
      Row a = actual.rows().get(i);
      String where = "row " + i + " (" + e.name() + ")";
      assertEquals(i, a.index(), where + " index");
      assertEquals(e.name(), a.name(), where + " name");
      assertArrayEquals(e.cols(), a.cols(), where + " columns");
      assertArrayEquals(e.coefs(), a.coefs(), where + " coefficients");
      assertEquals(
          0,
          Double.compare(e.lower(), a.lower()),
          where + " lower " + e.lower() + " vs " + a.lower());
      assertEquals(
          0,
          Double.compare(e.upper(), a.upper()),
          where + " upper " + e.upper() + " vs " + a.upper());
    }
    assertEquals(expected.objective().minimize(), actual.objective().minimize(), "objective sense");
    assertArrayEquals(expected.objective().cols(), actual.objective().cols(), "objective columns");
    assertArrayEquals(
        expected.objective().coefs(), actual.objective().coefs(), "objective coefficients");
    assertEquals(
        0,
        Double.compare(expected.objective().constant(), actual.objective().constant()),
        "objective constant "
            + expected.objective().constant()
            + " vs "
            + actual.objective().constant());
  }
}
