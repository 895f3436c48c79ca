package dev.skerry.lsp.analysis;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.check.SymbolTable;
import dev.skerry.compiler.check.Symbol;
import dev.skerry.compiler.source.SourceRange;
import java.util.ArrayList;
import java.util.List;

/** Answers "what is at this offset" and "where is this name used" from an analysis. */
public final class Lookup {
  private Lookup() {}

  /** A named thing under the cursor: the symbol, and the occurrence the cursor is on. */
  public record Hit(Symbol symbol, SourceRange at) {}

  /** The declared name or reference at an offset of the main document, or null. */
  public static Hit symbolAt(AnalysisResult result, int offset) {
    SymbolTable table = result.check().symbols();
    for (Symbol s : table.symbols()) {
      if (result.isMain(s.name().range().source()) && s.name().range().contains(offset)) {
        return new Hit(s, s.name().range());
      }
    }
    for (SymbolTable.Reference r : table.references()) {
      if (result.isMain(r.at().range().source()) && r.at().range().contains(offset)) {
        return new Hit(r.target(), r.at().range());
      }
    }
    return null;
  }

  /** The top-level declaration of the main document that contains an offset, or null. */
  public static Decl declAt(AnalysisResult result, int offset) {
    for (Decl d : result.check().main().decls()) {
      if (d.range().contains(offset)) {
        return d;
      }
    }
    return null;
  }

  /** Every place a symbol is written: its declaration first, then its uses, in any file read. */
  public static List<SourceRange> occurrences(AnalysisResult result, Symbol symbol, boolean withDeclaration) {
    List<SourceRange> out = new ArrayList<>();
    if (withDeclaration) {
      out.add(symbol.name().range());
    }
    for (SymbolTable.Reference r : result.check().symbols().referencesTo(symbol)) {
      out.add(r.at().range());
    }
    return out;
  }
}
