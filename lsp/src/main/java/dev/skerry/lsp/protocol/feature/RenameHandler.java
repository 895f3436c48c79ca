package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.source.SourceRange;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.Lookup;
import dev.skerry.lsp.protocol.Locations;
import dev.skerry.lsp.protocol.Ranges;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PrepareRenameResult;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;

/** Rename of a declared name and all its uses, in the document and the files it includes. */
public final class RenameHandler {
  private static final Pattern IDENT = Pattern.compile("[a-zA-Z_][a-zA-Z_0-9]*");
  /** Keywords that can never be a name (the grammar accepts the others as names). */
  private static final Set<String> RESERVED = Set.of("scenario", "units", "const", "include", "vehicle", "area",
      "zone", "target", "waypoint", "plan", "horizon", "minimize", "clusters", "closed_loop", "solver", "time_limit");

  private final Locations locations;

  public RenameHandler(Locations locations) {
    this.locations = locations;
  }

  public PrepareRenameResult prepare(AnalysisResult result, Position position) {
    Lookup.Hit hit = Lookup.symbolAt(result, Ranges.offset(result.main(), position));
    if (hit == null) {
      return null;
    }
    return new PrepareRenameResult(Ranges.of(hit.at()), hit.symbol().name().text());
  }

  public WorkspaceEdit rename(AnalysisResult result, Position position, String newName) {
    Lookup.Hit hit = Lookup.symbolAt(result, Ranges.offset(result.main(), position));
    if (hit == null) {
      return null;
    }
    if (newName == null || !IDENT.matcher(newName).matches() || RESERVED.contains(newName)) {
      throw invalid("`" + newName + "` is not a valid name: use letters, digits and `_`, not starting with a digit,"
          + " and not a keyword such as `zone`");
    }
    if (!newName.equals(hit.symbol().name().text()) && result.check().symbols().lookup(newName) != null) {
      throw invalid("`" + newName + "` is already declared; every name is declared once");
    }
    Map<String, List<TextEdit>> changes = new LinkedHashMap<>();
    for (SourceRange r : Lookup.occurrences(result, hit.symbol(), true)) {
      changes.computeIfAbsent(locations.uriOf(result, r.source()), k -> new ArrayList<>())
          .add(new TextEdit(Ranges.of(r), newName));
    }
    return new WorkspaceEdit(changes);
  }

  private static ResponseErrorException invalid(String message) {
    return new ResponseErrorException(new ResponseError(ResponseErrorCode.InvalidParams, message, null));
  }
}
