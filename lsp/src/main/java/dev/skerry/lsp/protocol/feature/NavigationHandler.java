package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.source.SourceRange;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.Lookup;
import dev.skerry.lsp.protocol.Locations;
import dev.skerry.lsp.protocol.Ranges;
import java.util.List;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.Position;

/** Go to definition and find references, for every declared name, across includes. */
public final class NavigationHandler {
  private final Locations locations;

  public NavigationHandler(Locations locations) {
    this.locations = locations;
  }

  public List<Location> definition(AnalysisResult result, Position position) {
    Lookup.Hit hit = Lookup.symbolAt(result, Ranges.offset(result.main(), position));
    if (hit == null) {
      return List.of();
    }
    return List.of(locations.of(result, hit.symbol().name().range()));
  }

  public List<Location> references(AnalysisResult result, Position position, boolean withDeclaration) {
    Lookup.Hit hit = Lookup.symbolAt(result, Ranges.offset(result.main(), position));
    if (hit == null) {
      return List.of();
    }
    List<SourceRange> found = Lookup.occurrences(result, hit.symbol(), withDeclaration);
    return found.stream().map(r -> locations.of(result, r)).toList();
  }
}
