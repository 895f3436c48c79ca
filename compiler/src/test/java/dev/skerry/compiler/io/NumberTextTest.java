package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Number text that reads back to the same double, in the field widths the formats allow. */
class NumberTextTest {
  @Test
  void freeTextIsShortAndExact() {
    assertEquals("1", NumberText.free(1.0));
    assertEquals("-3", NumberText.free(-3.0));
    assertEquals("-0", NumberText.free(-0.0));
    assertEquals("0", NumberText.free(0.0));
    assertEquals("2.5E-7", NumberText.free(2.5e-7));
    assertEquals("0.1", NumberText.free(0.1));
    assertEquals("1.0E15", NumberText.free(1e15));
  }

  @Test
  void fixedTextPrefersPlainDigitsAndFitsTwelveCharacters() {
    assertEquals("0.1", NumberText.fixed(0.1));
    assertEquals("1500", NumberText.fixed(1500));
    assertEquals("-0.00999999", NumberText.fixed(-0.00999999));
    assertEquals("1E20", NumberText.fixed(1e20));
    assertEquals("0.00000025", NumberText.fixed(2.5e-7));
    assertEquals("2.5E-11", NumberText.fixed(2.5e-11));
    assertEquals("1.2345678E-5", NumberText.fixed(1.2345678e-5));
    assertNull(NumberText.fixed(-1.2345678e-5), "13 characters in every spelling");
    assertEquals("-0", NumberText.fixed(-0.0));
    assertNull(NumberText.fixed(1.0 / 3), "1/3 needs 16 digits");
    assertNull(NumberText.fixed(Math.PI));
  }

  @Test
  void fixedTextAlwaysReadsBackOrIsRefused() {
    Random rnd = new Random(7);
    for (int i = 0; i < 2_000; i++) {
      double v =
          switch (i % 3) {
            case 0 ->
                BigDecimal.valueOf(rnd.nextInt(2_000_000) - 1_000_000, rnd.nextInt(30) - 12)
                    .doubleValue();
            case 1 -> rnd.nextGaussian() * Math.pow(10, rnd.nextInt(40) - 20);
            default -> Double.longBitsToDouble(rnd.nextLong());
          };
      if (!Double.isFinite(v)) {
        continue;
      }
      String text = NumberText.fixed(v);
      if (i % 3 == 0) {
        assertNotNull(text, "a decimal of at most 7 digits always fits: " + v);
      }
      if (text != null) {
        assertTrue(text.length() <= 12, text);
        assertEquals(v, Double.parseDouble(text), text);
      }
    }
  }

  /** The writer puts the right-hand side at the end of smaller magnitude; so does this test. */
  @Test
  void rangeWidthsAreShortYetTheFarEndComesBackExactly() {
    assertEquals("0.2", NumberText.rangeWidth(0.1, 0.3, 12));
    assertEquals("7.75", NumberText.rangeWidth(0.25, -7.5, 12));
    assertEquals("0", NumberText.rangeWidth(2, 2, 12));
    Random rnd = new Random(11);
    for (int i = 0; i < 2_000; i++) {
      double a = rnd.nextGaussian() * Math.pow(10, rnd.nextInt(30) - 15);
      double b = rnd.nextGaussian() * Math.pow(10, rnd.nextInt(30) - 15);
      double near = Math.abs(a) <= Math.abs(b) ? a : b;
      double far = near == a ? b : a;
      String width = NumberText.rangeWidth(near, far, Integer.MAX_VALUE);
      BigDecimal r = new BigDecimal(width);
      // The reader's rule: the exact decimal sum near ± R, rounded once.
      BigDecimal end = far > near ? new BigDecimal(near).add(r) : new BigDecimal(near).subtract(r);
      assertEquals(far, end.doubleValue(), near + " .. " + far + " with width " + width);
      assertTrue(r.precision() <= 20, width);
    }
  }
}
