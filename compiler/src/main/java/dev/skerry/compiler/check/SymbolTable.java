package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.Name;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Every declared name across the main file and its includes, and every reference to one. Names
 * share one namespace. The language server answers definition, references and rename from it.
 */
public final class SymbolTable {
  private final Map<String, Symbol> symbols = new LinkedHashMap<>();
  private final List<Reference> references = new ArrayList<>();

  /** A use of a declared name. */
  public record Reference(Name at, Symbol target) {}

  /** Adds a symbol; returns the earlier one with the same name, if any (and keeps that one). */
  Symbol declare(Symbol symbol) {
    return symbols.putIfAbsent(symbol.name().text(), symbol);
  }

  void reference(Name at, Symbol target) {
    references.add(new Reference(at, target));
  }

  public Symbol lookup(String name) {
    return symbols.get(name);
  }

  public List<Symbol> symbols() {
    return List.copyOf(symbols.values());
  }

  public List<Reference> references() {
    return List.copyOf(references);
  }

  /** References to one symbol. */
  public List<Reference> referencesTo(Symbol symbol) {
    return references.stream().filter(r -> r.target() == symbol).toList();
  }
}
