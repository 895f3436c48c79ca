package dev.skerry.compiler.milp;

/**
 * One MILP column. Bounds may be infinite ({@link Double#NEGATIVE_INFINITY}, {@link
 * Double#POSITIVE_INFINITY}); a binary always has bounds within [0, 1].
 */
public record Variable(int index, String name, VarType type, double lower, double upper, Origin origin) {
  public Variable {
    if (name == null || name.isEmpty()) {
      throw new IllegalArgumentException("a variable needs a name");
    }
    if (Double.isNaN(lower) || Double.isNaN(upper)) {
      throw new IllegalArgumentException("variable " + name + " has a NaN bound");
    }
    if (type == VarType.BINARY && (lower < 0 || upper > 1)) {
      throw new IllegalArgumentException("binary " + name + " must have bounds within [0, 1]");
    }
    origin = origin == null ? Origin.NONE : origin;
  }

  public boolean isInteger() {
    return type.isInteger();
  }
}
