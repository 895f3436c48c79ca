package dev.skerry.lsp.protocol;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.compiler.diag.Severity;
import dev.skerry.lsp.analysis.AnalysisResult;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticRelatedInformation;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/**
 * Turns the checker's diagnostics into LSP ones with the same code id, range, severity and related
 * places. A diagnostic inside an included file is shown on the include line of the document (its
 * message names the file and line, its related information points there), so each document owns
 * exactly the diagnostics of its own check.
 */
public final class DiagnosticConverter {
  public static final String SOURCE = "skerry";

  private final Locations locations;

  public DiagnosticConverter(Locations locations) {
    this.locations = locations;
  }

  public List<Diagnostic> convert(AnalysisResult result) {
    List<Diagnostic> out = new ArrayList<>();
    for (dev.skerry.compiler.diag.Diagnostic d : result.check().diagnostics()) {
      out.add(convert(result, d));
    }
    return out;
  }

  public Diagnostic convert(AnalysisResult result, dev.skerry.compiler.diag.Diagnostic d) {
    List<DiagnosticRelatedInformation> related = new ArrayList<>();
    SourceRange at = d.range();
    String message = d.message();
    if (!result.isMain(at.source())) {
      related.add(new DiagnosticRelatedInformation(locations.of(result, at), "the problem in " + at.source().displayName()));
      message = "in " + at + ": " + message;
      at = includeLineFor(result, at.source());
    }
    for (dev.skerry.compiler.diag.Diagnostic.Related r : d.related()) {
      related.add(new DiagnosticRelatedInformation(locations.of(result, r.range()), r.message()));
    }
    Diagnostic lsp = new Diagnostic(Ranges.of(at), message, severity(d.severity()), SOURCE);
    lsp.setCode(Either.forLeft(d.code().id()));
    if (!related.isEmpty()) {
      lsp.setRelatedInformation(related);
    }
    return lsp;
  }

  static DiagnosticSeverity severity(Severity severity) {
    if (severity == Severity.ERROR) {
      return DiagnosticSeverity.Error;
    } else if (severity == Severity.WARNING) {
      return DiagnosticSeverity.Warning;
    }
    return DiagnosticSeverity.Hint;
  }

  /** The include in the document that brings in {@code file} (directly, or the first include when nested). */
  private static SourceRange includeLineFor(AnalysisResult result, SourceFile file) {
    SourceFile main = result.main();
    Decl.IncludeDecl first = null;
    for (Decl d : result.check().main().decls()) {
      if (d instanceof Decl.IncludeDecl include) {
        first = first == null ? include : first;
        if (file.path() != null && main.path() != null && resolves(main.path(), include.path(), file.path())) {
          return include.pathRange();
        }
      }
    }
    return first != null ? first.pathRange() : new SourceRange(main, 0, 0);
  }

  private static boolean resolves(Path from, String written, Path target) {
    try {
      Path parent = from.getParent();
      return parent != null && parent.resolve(written).toAbsolutePath().normalize().equals(target.toAbsolutePath().normalize());
    } catch (java.nio.file.InvalidPathException e) {
      return false;
    }
  }
}
