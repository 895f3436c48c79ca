package dev.skerry.compiler.check;

import java.math.BigDecimal;

/** Numbers as messages show them: at most 4 significant decimals, no exponent for everyday sizes. */
public final class Format {
  private Format() {}

  public static String number(double value) {
    if (value == Math.rint(value) && Math.abs(value) < 1e15) {
      return Long.toString((long) value);
    }
    if (Math.abs(value) >= 1e-3 && Math.abs(value) < 1e9) {
      return new BigDecimal(value).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString();
    }
    return String.format("%.3g", value);
  }
}
