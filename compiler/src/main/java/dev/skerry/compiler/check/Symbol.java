package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.Name;

/** A declared name: what kind of thing it names, where, and its declaration. */
public record Symbol(Kind kind, Name name, Decl decl) {
  public enum Kind {
    CONSTANT("constant"),
    VEHICLE("vehicle"),
    AREA("area"),
    ZONE("zone"),
    TARGET("target"),
    WAYPOINT("waypoint"),
    SCENARIO("scenario");

    private final String word;

    Kind(String word) {
      this.word = word;
    }

    public String word() {
      return word;
    }
  }
}
