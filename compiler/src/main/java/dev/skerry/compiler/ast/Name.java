package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;

/** An identifier where it is written. */
public record Name(String text, SourceRange range) {}
