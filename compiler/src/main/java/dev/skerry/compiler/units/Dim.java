package dev.skerry.compiler.units;

/** A physical dimension as exponents of length, time and angle. */
public record Dim(int length, int time, int angle) {
  public static final Dim NONE = new Dim(0, 0, 0);
  public static final Dim LENGTH = new Dim(1, 0, 0);
  public static final Dim TIME = new Dim(0, 1, 0);
  public static final Dim SPEED = new Dim(1, -1, 0);
  public static final Dim ACCEL = new Dim(1, -2, 0);
  public static final Dim ANGLE = new Dim(0, 0, 1);

  public Dim times(Dim o) {
    return new Dim(length + o.length, time + o.time, angle + o.angle);
  }

  public Dim over(Dim o) {
    return new Dim(length - o.length, time - o.time, angle - o.angle);
  }

  /** A word for messages: "a length", "a speed", or the exponents when there is no word. */
  public String describe() {
    if (equals(NONE)) {
      return "a plain number";
    }
    if (equals(LENGTH)) {
      return "a length";
    }
    if (equals(TIME)) {
      return "a time";
    }
    if (equals(SPEED)) {
      return "a speed";
    }
    if (equals(ACCEL)) {
      return "an acceleration";
    }
    if (equals(ANGLE)) {
      return "an angle";
    }
    return "a quantity of dimension " + symbol();
  }

  /** An example a message can offer: "`4 m`". */
  public String example() {
    if (equals(LENGTH)) {
      return "`4 m`";
    }
    if (equals(TIME)) {
      return "`2 s`";
    }
    if (equals(SPEED)) {
      return "`3 m/s`";
    }
    if (equals(ACCEL)) {
      return "`1 m/s^2`";
    }
    if (equals(ANGLE)) {
      return "`90 deg`";
    }
    return "`2`";
  }

  public String symbol() {
    StringBuilder b = new StringBuilder();
    append(b, "m", length);
    append(b, "s", time);
    append(b, "rad", angle);
    return b.length() == 0 ? "1" : b.toString().trim();
  }

  private static void append(StringBuilder b, String unit, int exp) {
    if (exp != 0) {
      b.append(' ').append(unit);
      if (exp != 1) {
        b.append('^').append(exp);
      }
    }
  }
}
