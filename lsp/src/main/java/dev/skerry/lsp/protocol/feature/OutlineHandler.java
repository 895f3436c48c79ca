package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.PlanProp;
import dev.skerry.compiler.ast.ShapeNode;
import dev.skerry.compiler.ast.VehicleProp;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.TextScan;
import dev.skerry.lsp.protocol.Ranges;
import java.util.ArrayList;
import java.util.List;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.FoldingRange;
import org.eclipse.lsp4j.FoldingRangeKind;
import org.eclipse.lsp4j.SymbolKind;

/** The document's outline (one symbol per declaration, block lines as children) and its folding ranges. */
public final class OutlineHandler {

  public List<DocumentSymbol> symbols(AnalysisResult result) {
    List<DocumentSymbol> out = new ArrayList<>();
    for (Decl d : result.check().main().decls()) {
      DocumentSymbol s = symbol(d);
      if (s != null) {
        out.add(s);
      }
    }
    return out;
  }

  private static DocumentSymbol symbol(Decl d) {
    if (d instanceof Decl.Header h) {
      return named(h.name().text(), "scenario", SymbolKind.File, d.range(), h.name().range());
    } else if (d instanceof Decl.ConstDecl c) {
      return named(c.name().text(), "const", SymbolKind.Constant, d.range(), c.name().range());
    } else if (d instanceof Decl.IncludeDecl i) {
      return named(i.path(), "include", SymbolKind.File, d.range(), i.pathRange());
    } else if (d instanceof Decl.VehicleDecl v) {
      DocumentSymbol s = named(v.name().text(), "vehicle", SymbolKind.Object, d.range(), v.name().range());
      List<DocumentSymbol> children = new ArrayList<>();
      for (VehicleProp p : v.props()) {
        children.add(line(p.keyword(), p.range()));
      }
      s.setChildren(children);
      return s;
    } else if (d instanceof Decl.AreaDecl a) {
      return named(a.name().text(), "area " + shapeWord(a.shape()), SymbolKind.Package, d.range(), a.name().range());
    } else if (d instanceof Decl.ZoneDecl z) {
      return named(z.name().text(), "zone " + shapeWord(z.shape()), SymbolKind.Struct, d.range(), z.name().range());
    } else if (d instanceof Decl.TargetDecl t) {
      return named(t.name().text(), "target " + shapeWord(t.shape()), SymbolKind.Event, d.range(), t.name().range());
    } else if (d instanceof Decl.WaypointDecl w) {
      return named(w.name().text(), "waypoint", SymbolKind.Key, d.range(), w.name().range());
    } else if (d instanceof Decl.PlanDecl p) {
      SourceRange keyword = new SourceRange(d.range().source(), d.range().start(), d.range().start() + 4);
      DocumentSymbol s = named("plan", "", SymbolKind.Namespace, d.range(), keyword);
      List<DocumentSymbol> children = new ArrayList<>();
      for (PlanProp prop : p.props()) {
        children.add(line(prop.keyword(), prop.range()));
      }
      s.setChildren(children);
      return s;
    } else if (d instanceof Decl.UnitsDecl u) {
      return named("units", "", SymbolKind.Property, d.range(), d.range());
    }
    return null;
  }

  private static String shapeWord(ShapeNode shape) {
    if (shape instanceof ShapeNode.BoxNode) {
      return "box";
    } else if (shape instanceof ShapeNode.PolygonNode) {
      return "polygon";
    }
    return "point";
  }

  private static DocumentSymbol line(String keyword, SourceRange range) {
    return named(keyword, range.text().substring(Math.min(keyword.length(), range.text().length())).strip(),
        SymbolKind.Property, range, range);
  }

  private static DocumentSymbol named(String name, String detail, SymbolKind kind, SourceRange range, SourceRange selection) {
    DocumentSymbol s = new DocumentSymbol(name.isEmpty() ? "(unnamed)" : name, kind, Ranges.of(range), Ranges.of(selection));
    s.setDetail(detail);
    return s;
  }

  /** Folds every `{ }` block and block comment that spans more than one line; the closing line stays visible. */
  public List<FoldingRange> folding(AnalysisResult result) {
    var file = result.main();
    TextScan scan = TextScan.of(file.text());
    List<FoldingRange> out = new ArrayList<>();
    for (TextScan.Span s : scan.braces()) {
      int first = file.lineOf(s.start());
      int last = file.lineOf(s.end()) - 1;
      if (last > first) {
        out.add(new FoldingRange(first, last));
      }
    }
    for (TextScan.Span s : scan.blockComments()) {
      int first = file.lineOf(s.start());
      int last = file.lineOf(Math.max(s.start(), s.end() - 1));
      if (last > first) {
        FoldingRange r = new FoldingRange(first, last);
        r.setKind(FoldingRangeKind.Comment);
        out.add(r);
      }
    }
    out.sort((a, b) -> Integer.compare(a.getStartLine(), b.getStartLine()));
    return out;
  }
}
