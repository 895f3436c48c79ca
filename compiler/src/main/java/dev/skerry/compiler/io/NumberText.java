package dev.skerry.compiler.io;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Numbers as text that reads back to the very same double. Free MPS and LP use Java's own
 * shortest-round-trip form ({@code 2.5E-7}, integers without {@code .0}); fixed MPS needs the
 * shortest form that fits its 12-character fields.
 */
final class NumberText {
  /** Width of a number field in fixed MPS (GLPK reference manual, appendix B). */
  static final int FIXED_WIDTH = 12;

  /**
   * Values this large read as infinite in cbc (measured, FORMATS.md); writers refuse them so that
   * both outside readers see the same model.
   */
  static final double HUGE = 1e30;

  private static final double LONG_SAFE = 1e15;

  private NumberText() {}

  /** Appends a finite number in a form that reads back exactly (free MPS and LP). */
  static void appendFree(double v, StringBuilder out) {
    if (isWhole(v)) {
      if (v == 0 && Double.doubleToRawLongBits(v) != 0) {
        out.append("-0");
      } else {
        out.append((long) v);
      }
    } else {
      out.append(Double.toString(v));
    }
  }

  /** True when {@link #appendFree} writes {@code v} as a whole number, without {@code Double.toString}. */
  static boolean isWhole(double v) {
    return v == Math.rint(v) && Math.abs(v) < LONG_SAFE;
  }

  /** {@code -v}, but never a negative zero: negating twice gives back the same value. */
  static double negate(double v) {
    return v == 0 ? 0.0 : -v;
  }

  static String free(double v) {
    StringBuilder out = new StringBuilder(24);
    appendFree(v, out);
    return out.toString();
  }

  /**
   * The text of at most 12 characters, with the fewest significant digits, that reads back to
   * exactly {@code v}; null when there is none (e.g. {@code 1.0/3}).
   */
  static String fixed(double v) {
    if (v == 0) {
      return Double.doubleToRawLongBits(v) == 0 ? "0" : "-0";
    }
    if (v == Math.rint(v) && Math.abs(v) < 1e11) {
      return Long.toString((long) v);
    }
    // Fast path for short decimals (most coefficients): v·10^k whole for a small k gives the
    // decimal with the fewest digits, because two decimals of at most 15 significant digits
    // never read as the same double.
    double scale = 1;
    for (int k = 1; k <= 6; k++) {
      scale *= 10;
      double scaled = v * scale;
      if (scaled == Math.rint(scaled) && Math.abs(scaled) < 1e15) {
        BigDecimal decimal = BigDecimal.valueOf((long) scaled, k);
        if (decimal.doubleValue() == v) {
          return spell(decimal, FIXED_WIDTH);
        }
        break;
      }
    }
    // Java's own text reads back exactly; try fewer of its digits first.
    BigDecimal text = new BigDecimal(Double.toString(v)).stripTrailingZeros();
    for (int digits = 1; digits < text.precision(); digits++) {
      BigDecimal rounded = text.round(new MathContext(digits, RoundingMode.HALF_EVEN));
      if (rounded.doubleValue() == v) {
        return spell(rounded, FIXED_WIDTH);
      }
    }
    return spell(text, FIXED_WIDTH);
  }

  /**
   * The 12-character text nearest to {@code v}: {@link #fixed} when it reads back exactly, else
   * {@code v} rounded to the most significant digits that fit.
   */
  static String nearestFixed(double v) {
    String exact = fixed(v);
    if (exact != null) {
      return exact;
    }
    BigDecimal value = new BigDecimal(v);
    for (int digits = 11; digits >= 1; digits--) {
      String text = spell(value.round(new MathContext(digits, RoundingMode.HALF_EVEN)), FIXED_WIDTH);
      if (text != null && text.length() <= FIXED_WIDTH) {
        return text;
      }
    }
    throw new IllegalArgumentException(v + " cannot be written in 12 characters");
  }

  /**
   * A decimal spelt in the first of these forms that fits in 12 characters: plain ({@code 1500},
   * {@code 0.25}), plain without the leading zero ({@code .25}), with an exponent ({@code 2.5E-7},
   * {@code 25E-8}); when none fits, the shortest of them if it fits in {@code maxLength}, else
   * null. cbc, glpsol and {@link Double#parseDouble} all read each form.
   */
  static String spell(BigDecimal value, int maxLength) {
    if (value.signum() == 0) {
      return "0";
    }
    BigDecimal d = value.stripTrailingZeros();
    String sign = d.signum() < 0 ? "-" : "";
    String digits = d.unscaledValue().abs().toString();
    int scale = d.scale();
    String plain = d.toPlainString();
    String noLeadingZero =
        plain.startsWith(sign + "0.") ? sign + plain.substring(sign.length() + 1) : plain;
    String dotted =
        sign
            + digits.charAt(0)
            + (digits.length() > 1 ? "." + digits.substring(1) : "")
            + "E"
            + (digits.length() - 1 - scale);
    String wholeMantissa = sign + digits + "E" + (-scale);
    String[] forms = {plain, noLeadingZero, dotted, wholeMantissa};
    String shortest = plain;
    for (String form : forms) {
      if (form.length() <= Math.min(FIXED_WIDTH, maxLength)) {
        return form;
      }
      if (form.length() < shortest.length()) {
        shortest = form;
      }
    }
    return shortest.length() <= maxLength ? shortest : null;
  }

  /**
   * The RANGES entry for a row {@code lo ≤ a·x ≤ up} written with its right-hand side at one end
   * ({@code near}): the width {@code R} with the fewest significant digits such that the other end,
   * computed as the exact decimal sum {@code near ± R} rounded once to a double (what {@link
   * MpsReader} does), is exactly {@code far}. Returns null when that text does not fit in {@code
   * maxLength} characters.
   */
  static String rangeWidth(double near, double far, int maxLength) {
    BigDecimal nearExact = new BigDecimal(near);
    BigDecimal farExact = new BigDecimal(far);
    BigDecimal width = farExact.subtract(nearExact).abs();
    if (width.signum() == 0) {
      return "0";
    }
    // Every decimal strictly between the midpoints to far's neighbours rounds to far.
    BigDecimal below = midpoint(farExact, Math.nextDown(far));
    BigDecimal above = midpoint(farExact, Math.nextUp(far));
    boolean up = far > near;
    BigDecimal least = up ? below.subtract(nearExact) : nearExact.subtract(above);
    BigDecimal most = up ? above.subtract(nearExact) : nearExact.subtract(below);
    for (int digits = 1; digits <= width.precision(); digits++) {
      BigDecimal r = width.round(new MathContext(digits, RoundingMode.HALF_EVEN));
      if (r.compareTo(least) > 0 && r.compareTo(most) < 0) {
        return spell(r, maxLength);
      }
    }
    return spell(width, maxLength);
  }

  private static BigDecimal midpoint(BigDecimal exact, double neighbour) {
    return exact.add(new BigDecimal(neighbour)).divide(BigDecimal.valueOf(2));
  }
}
