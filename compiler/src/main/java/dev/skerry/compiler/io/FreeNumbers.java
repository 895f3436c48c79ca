package dev.skerry.compiler.io;

/**
 * Numbers in free format ({@link NumberText#appendFree}) for one file, with the text of recent
 * fractional values kept in a small direct-mapped table. A lowered model repeats few distinct
 * fractional values many times (the same normals, step sizes and big-M values at every step), and
 * {@link Double#toString} was the dearest part of writing a line; a value found in the table is
 * copied instead. The text is the same either way.
 */
final class FreeNumbers {
  private static final int SLOTS = 1 << 13;

  private final long[] bits = new long[SLOTS];
  private final String[] texts = new String[SLOTS];

  /** Appends {@code v} as {@link NumberText#appendFree} would. */
  void append(double v, StringBuilder out) {
    if (NumberText.isWhole(v)) {
      NumberText.appendFree(v, out);
      return;
    }
    out.append(fractional(v));
  }

  /** {@code v} as {@link NumberText#free} would spell it. */
  String text(double v) {
    return NumberText.isWhole(v) ? NumberText.free(v) : fractional(v);
  }

  private String fractional(double v) {
    long b = Double.doubleToRawLongBits(v);
    int slot = (int) ((b * 0x9E3779B97F4A7C15L) >>> 51);
    String text = texts[slot];
    if (text == null || bits[slot] != b) {
      text = Double.toString(v);
      texts[slot] = text;
      bits[slot] = b;
    }
    return text;
  }
}
