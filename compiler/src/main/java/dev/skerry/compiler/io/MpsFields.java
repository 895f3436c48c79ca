package dev.skerry.compiler.io;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * How one MPS line breaks into fields, and which field texts are numbers: blank-separated words for
 * free MPS; fixed columns 2-3, 5-12, 15-22, 25-36, 40-47, 50-61 for fixed MPS (GLPK reference
 * manual, appendix B), where a {@code $} at the start of field 3 or 5 makes the rest of the line a
 * comment. Problems are {@link ModelFormatException}s on the given line.
 */
final class MpsFields {
  private MpsFields() {}

  /** Fields 1 to 6 of a fixed-MPS line, trimmed, blank when absent. */
  static String[] fixed(String text, int lineNo) throws ModelFormatException {
    int[][] spans = {{1, 3}, {4, 12}, {14, 22}, {24, 36}, {39, 47}, {49, 61}};
    int end = text.length();
    if (end > 14 && text.charAt(14) == '$') {
      end = 14;
    } else if (end > 39 && text.charAt(39) == '$') {
      end = 39;
    }
    end = Math.min(end, 61);
    String[] fields = new String[6];
    int previous = 0;
    for (int k = 0; k < 6; k++) {
      int from = spans[k][0];
      int to = spans[k][1];
      for (int c = previous; c < Math.min(from, end); c++) {
        if (!Character.isWhitespace(text.charAt(c))) {
          throw new ModelFormatException(
              lineNo,
              "text in column "
                  + (c + 1)
                  + " falls between the fields of fixed MPS (columns 2-3,"
                  + " 5-12, 15-22, 25-36, 40-47, 50-61); is this free MPS?");
        }
      }
      fields[k] = from < end ? text.substring(from, Math.min(to, end)).trim() : "";
      previous = to;
    }
    return fields;
  }

  /** The blank-separated words of a free-MPS line. */
  static List<String> split(String text) {
    List<String> words = new ArrayList<>(6);
    int i = 0;
    int n = text.length();
    while (i < n) {
      while (i < n && Character.isWhitespace(text.charAt(i))) {
        i++;
      }
      int start = i;
      while (i < n && !Character.isWhitespace(text.charAt(i))) {
        i++;
      }
      if (i > start) {
        words.add(text.substring(start, i));
      }
    }
    return words;
  }

  /** A finite number; anything else (NaN, Infinity, 0x10, 1.5f, overflow) is refused. */
  static double number(String text, int lineNo) throws ModelFormatException {
    String normal = checkedNumber(text, lineNo);
    double v = Double.parseDouble(normal);
    if (Double.isInfinite(v)) {
      throw new ModelFormatException(lineNo, "number " + text + " is out of range");
    }
    return v;
  }

  /** A number as the exact decimal written (for RANGES widths). */
  static BigDecimal decimal(String text, int lineNo) throws ModelFormatException {
    String normal = checkedNumber(text, lineNo);
    try {
      return new BigDecimal(normal);
    } catch (NumberFormatException e) {
      throw new ModelFormatException(lineNo, "number " + text + " is out of range");
    }
  }

  /**
   * The text of a plain decimal number ({@code -12}, {@code .5}, {@code 2.5E-7}, Fortran's {@code
   * 1.5D3}), with a D exponent turned into E; anything else is refused.
   */
  private static String checkedNumber(String text, int lineNo) throws ModelFormatException {
    int i = 0;
    int n = text.length();
    if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
      i++;
    }
    int digits = 0;
    while (i < n && Character.isDigit(text.charAt(i))) {
      i++;
      digits++;
    }
    if (i < n && text.charAt(i) == '.') {
      i++;
      while (i < n && Character.isDigit(text.charAt(i))) {
        i++;
        digits++;
      }
    }
    boolean ok = digits > 0;
    int exponentAt = -1;
    if (ok && i < n && "eEdD".indexOf(text.charAt(i)) >= 0) {
      exponentAt = i;
      i++;
      if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
        i++;
      }
      int expDigits = 0;
      while (i < n && Character.isDigit(text.charAt(i))) {
        i++;
        expDigits++;
      }
      ok = expDigits > 0;
    }
    if (!ok || i != n) {
      throw new ModelFormatException(lineNo, "'" + text + "' is not a number");
    }
    if (exponentAt >= 0 && (text.charAt(exponentAt) == 'd' || text.charAt(exponentAt) == 'D')) {
      return text.substring(0, exponentAt) + 'E' + text.substring(exponentAt + 1);
    }
    return text;
  }
}
