package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.io.StringReader;
import org.junit.jupiter.api.Test;

/** Malformed input gives our exception with the right line; odd but valid input reads right. */
class MpsReaderErrorsTest {
  private static final String GOOD =
      """
      NAME  tiny  FREE
      ROWS
       N  cost
       L  lim
      COLUMNS
          x  cost  1  lim  2
      RHS
          RHS  lim  4
      BOUNDS
       UP BND  x  3
      ENDATA
      """;

  private static Milp free(String text) throws IOException {
    return MpsReader.read(new StringReader(text), ModelFormat.MPS);
  }

  private static ModelFormatException failure(String text) {
    return assertThrows(ModelFormatException.class, () -> free(text));
  }

  @Test
  void theBaseTextIsValid() throws IOException {
    Milp milp = free(GOOD);
    assertEquals("tiny", milp.name());
    assertEquals(4, milp.rows().get(0).upper());
    assertEquals(3, milp.variables().get(0).upper());
  }

  @Test
  void aTruncatedFileSaysItEndsWithoutEndata() {
    String cut = GOOD.substring(0, GOOD.indexOf("RHS"));
    ModelFormatException e = failure(cut);
    assertEquals(7, e.line(), e.getMessage());
    assertTrue(e.getMessage().contains("ENDATA"), e.getMessage());
  }

  @Test
  void anUnknownSectionIsNamedWithItsLine() {
    ModelFormatException e = failure(GOOD.replace("BOUNDS", "LIMITS"));
    assertEquals(9, e.line());
    assertTrue(e.getMessage().startsWith("line 9: unknown section 'LIMITS'"), e.getMessage());
  }

  @Test
  void aBadNumberIsOurExceptionNotANumberFormatException() {
    for (String bad : new String[] {"4x", "1e", "--4", "NaN", "Infinity", "0x10", "1.5f", "."}) {
      ModelFormatException e = failure(GOOD.replace("lim  4", "lim  " + bad));
      assertEquals(8, e.line(), bad);
      assertTrue(e.getMessage().contains("'" + bad + "' is not a number"), e.getMessage());
    }
  }

  @Test
  void aNumberTooLargeForADoubleIsRefused() {
    ModelFormatException e = failure(GOOD.replace("lim  2", "lim  1e999"));
    assertEquals(6, e.line());
    assertTrue(e.getMessage().contains("out of range"), e.getMessage());
  }

  @Test
  void structuralMistakesGiveTheirLine() {
    assertEquals(6, failure(GOOD.replace("lim  2", "other  2")).line(), "unknown row");
    assertEquals(4, failure(GOOD.replace(" L  lim", " Q  lim")).line(), "row type");
    assertEquals(10, failure(GOOD.replace("UP BND  x", "UP BND  y")).line(), "unknown column");
    assertEquals(10, failure(GOOD.replace("UP BND", "SC BND")).line(), "unsupported bound");
    assertEquals(8, failure(GOOD.replace("lim  4", "lim  4  lim  5")).line(), "second rhs");
    assertEquals(
        4, failure(GOOD.replace("ROWS\n", "ROWS\n N  cost\n")).line(), "row declared twice");
    assertEquals(6, failure(GOOD.replace("lim  2", "cost  2")).line(), "second entry in a row");
    assertEquals(7, failure(GOOD.replace("RHS\n", "COLUMNS\n")).line(), "section out of order");
    assertEquals(3, failure(GOOD.replace(" N  cost", "N  cost")).line(), "data in column 1");
  }

  @Test
  void aColumnThatComesBackLaterIsRefused() {
    String text =
        GOOD.replace("    x  cost  1  lim  2\n", "    x  cost  1\n    y  lim  1\n    x  lim  2\n");
    ModelFormatException e = failure(text);
    assertEquals(8, e.line());
    assertTrue(e.getMessage().contains("contiguous"), e.getMessage());
  }

  @Test
  void fixedMpsWithTextBetweenFieldsAsksWhetherItIsFree() {
    String text = "NAME          T\nROWS\n N  COST\nCOLUMNS\n    XVAR  COST  1\nENDATA\n";
    ModelFormatException e =
        assertThrows(
            ModelFormatException.class,
            () -> MpsReader.read(new StringReader(text), ModelFormat.FIXED_MPS));
    assertEquals(5, e.line());
    assertTrue(e.getMessage().contains("is this free MPS"), e.getMessage());
  }

  @Test
  void markersBoundsAndRangesFollowTheDocumentedRules() throws IOException {
    Milp milp =
        free(
            """
            NAME  rules
            ROWS
             N  obj
             L  l
             G  g
             E  ep
             E  en
             N  spare
            COLUMNS
                MARKER  'MARKER'  'INTORG'
                i  obj  1  l  1
                j  g  1
                MARKER  'MARKER'  'INTEND'
                u  ep  1  en  1
                v  spare  2
                w  obj  0
            RHS
                obj  2.5
                l  10  g  -1
                ep  3  en  3
            RANGES
                l  -4  g  4
                ep  2  en  -2
            BOUNDS
             UP BND  j  7
             UP BND  u  -2
             LI BND  v  -1
             UI BND  v  5
             BV BND  w
            ENDATA
            """);
    Variable i = milp.variables().get(0);
    Variable j = milp.variables().get(1);
    Variable u = milp.variables().get(2);
    Variable v = milp.variables().get(3);
    Variable w = milp.variables().get(4);
    // Integer from the markers without any bound: [0, 1] (both outside readers, FORMATS.md).
    assertEquals(VarType.INTEGER, i.type());
    assertEquals(0, i.lower());
    assertEquals(1, i.upper());
    // With a bound given, the other side keeps its usual default.
    assertEquals(0, j.lower());
    assertEquals(7, j.upper());
    // A negative UP without a LO: lower bound minus infinity, as cbc reads it.
    assertEquals(Double.NEGATIVE_INFINITY, u.lower());
    assertEquals(VarType.INTEGER, v.type());
    assertEquals(-1, v.lower());
    assertEquals(VarType.BINARY, w.type());
    // RHS of the objective b gives the constant -b.
    assertEquals(-2.5, milp.objective().constant());
    Row l = milp.rows().get(0);
    Row g = milp.rows().get(1);
    Row ep = milp.rows().get(2);
    Row en = milp.rows().get(3);
    Row spare = milp.rows().get(4);
    assertEquals(6, l.lower());
    assertEquals(10, l.upper());
    assertEquals(-1, g.lower());
    assertEquals(3, g.upper());
    assertEquals(3, ep.lower());
    assertEquals(5, ep.upper());
    assertEquals(1, en.lower());
    assertEquals(3, en.upper());
    assertEquals(Double.NEGATIVE_INFINITY, spare.lower());
    assertEquals(Double.POSITIVE_INFINITY, spare.upper());
    // The zero objective entry of w is dropped, but w exists.
    assertEquals(1, milp.objective().cols().length);
  }

  @Test
  void objsenseMaxIsReadAsAMaximisation() throws IOException {
    Milp milp = free(GOOD.replace("ROWS\n", "OBJSENSE\n    MAX\nROWS\n"));
    assertFalse(milp.objective().minimize());
    assertEquals(1, milp.objective().coefs()[0]);
    Milp inline = free(GOOD.replace("ROWS\n", "OBJSENSE MAXIMIZE\nROWS\n"));
    assertFalse(inline.objective().minimize());
  }

  @Test
  void aFortranExponentAndALeadingDotAreNumbers() throws IOException {
    Milp milp = free(GOOD.replace("lim  4", "lim  .4D1"));
    assertEquals(4, milp.rows().get(0).upper());
  }

  @Test
  void aBrokenNameMapLineIsReported() {
    ModelFormatException e =
        assertThrows(
            ModelFormatException.class,
            () -> NameMap.read(new StringReader("C0000001\tlong\nnotab\n")));
    assertEquals(2, e.line());
  }
}
