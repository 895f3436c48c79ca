package dev.skerry.compiler.semdiff;

/** The predicted size of the MILP a scenario lowers to, as the diff reports it. */
public record SizeFigures(long binaries, long continuous, long rows) {}
