package dev.skerry.compiler.milp;

/** The sense of a row, read off its two bounds. */
public enum RowSense {
  /** expression ≤ upper */
  LE,
  /** expression ≥ lower */
  GE,
  /** expression = lower = upper */
  EQ,
  /** lower ≤ expression ≤ upper, both finite and different */
  RANGE,
  /** no finite bound at all (a free row) */
  FREE
}
