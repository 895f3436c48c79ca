package dev.skerry.compiler.units;

/** A unit: its dimension and the factor that turns a value in it into SI. */
public record Unit(String symbol, Dim dim, double toSi) {}
