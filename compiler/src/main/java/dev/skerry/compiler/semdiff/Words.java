package dev.skerry.compiler.semdiff;

import dev.skerry.compiler.model.Vec2;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/** Numbers, points and moves written for people: SI units, no floating-point noise. */
final class Words {
  /** Differences smaller than this (in SI units) are rounding noise, not moves. */
  static final double NOISE = 1e-9;

  private Words() {}

  /** A number with at most 9 significant digits and no trailing zeros: 0.1 + 0.2 reads 0.3. */
  static String number(double value) {
    if (Double.isNaN(value) || Double.isInfinite(value)) {
      return Double.toString(value);
    }
    if (Math.abs(value) < NOISE) {
      return "0";
    }
    return new BigDecimal(value).round(new MathContext(9)).stripTrailingZeros().toPlainString();
  }

  static String quantity(double value, String unit) {
    return number(value) + " " + unit;
  }

  static String point(Vec2 p, String unit) {
    return "(" + number(p.x()) + ", " + number(p.y()) + ") " + unit;
  }

  static String points(List<Vec2> points) {
    List<String> out = new ArrayList<>();
    for (Vec2 p : points) {
      out.add("(" + number(p.x()) + ", " + number(p.y()) + ")");
    }
    return String.join(" ", out) + " m";
  }

  static String signed(long value) {
    return value > 0 ? "+" + value : Long.toString(value);
  }

  /** A displacement as compass words, x east and y north: {@code 4 m east and 3 m north}. */
  static String move(Vec2 delta) {
    List<String> parts = new ArrayList<>();
    if (Math.abs(delta.x()) >= NOISE) {
      parts.add(quantity(Math.abs(delta.x()), "m") + (delta.x() > 0 ? " east" : " west"));
    }
    if (Math.abs(delta.y()) >= NOISE) {
      parts.add(quantity(Math.abs(delta.y()), "m") + (delta.y() > 0 ? " north" : " south"));
    }
    return parts.isEmpty() ? "not at all" : String.join(" and ", parts);
  }

  static boolean same(double a, double b) {
    return Math.abs(a - b) <= NOISE * Math.max(1, Math.max(Math.abs(a), Math.abs(b)));
  }

  static boolean same(Vec2 a, Vec2 b) {
    return same(a.x(), b.x()) && same(a.y(), b.y());
  }
}
