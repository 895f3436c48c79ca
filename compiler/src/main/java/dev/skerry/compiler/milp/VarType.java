package dev.skerry.compiler.milp;

/** Kind of a MILP column. A binary is an integer column with bounds [0, 1]. */
public enum VarType {
  CONTINUOUS,
  INTEGER,
  BINARY;

  public boolean isInteger() {
    return this != CONTINUOUS;
  }
}
