package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceFile;
import java.util.List;

/** The declarations of one file, in order, as written. */
public record ScenarioFile(SourceFile source, List<Decl> decls) {
  public ScenarioFile {
    decls = List.copyOf(decls);
  }
}
