package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.PlanProp;
import dev.skerry.compiler.ast.PointNode;
import dev.skerry.compiler.ast.ShapeNode;
import dev.skerry.compiler.check.Hints;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.compiler.units.Units;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.protocol.DiagnosticConverter;
import dev.skerry.lsp.protocol.Ranges;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/** Quick fixes for what the checker diagnoses; each title says what the edit changes. */
public final class CodeActionHandler {
  private final DiagnosticConverter converter;
  private final SizeHandler sizes = new SizeHandler();

  public CodeActionHandler(DiagnosticConverter converter) {
    this.converter = converter;
  }

  public List<Either<Command, CodeAction>> actions(AnalysisResult result, Range range) {
    SourceFile main = result.main();
    SourceRange asked = Ranges.toSource(main, range);
    if (asked == null) {
      asked = new SourceRange(main, 0, main.length());
    }
    List<Either<Command, CodeAction>> out = new ArrayList<>();
    for (Diagnostic d : result.check().diagnostics()) {
      if (!result.isMain(d.range().source()) || !Ranges.touches(d.range(), asked)) {
        continue;
      }
      Fix fix = fix(result, d);
      if (fix != null) {
        CodeAction action = new CodeAction(fix.title());
        action.setKind(CodeActionKind.QuickFix);
        action.setDiagnostics(List.of(converter.convert(result, d)));
        action.setIsPreferred(true);
        action.setEdit(new WorkspaceEdit(Map.of(result.document().uri(),
            List.of(new TextEdit(Ranges.of(fix.range()), fix.replacement())))));
        out.add(Either.forRight(action));
      }
    }
    CodeAction clusters = sizes.useClusters(result);
    if (clusters != null && planTouches(result, asked)) {
      out.add(Either.forRight(clusters));
    }
    return out;
  }

  /** One text replacement and what it does. */
  record Fix(String title, SourceRange range, String replacement) {}

  private static Fix fix(AnalysisResult result, Diagnostic d) {
    Code code = d.code();
    if (code == Code.HORIZON_TOO_SHORT) {
      return raiseHorizon(result, d);
    } else if (code == Code.POLYGON_CLOCKWISE) {
      return reverseCorners(result, d);
    } else if (code == Code.DUPLICATE_PROPERTY) {
      return removeLine(d);
    } else if (code == Code.CORNER_CUTTING) {
      return guardOn(result, d);
    } else if (code == Code.UNKNOWN_UNIT) {
      return closestUnit(d);
    }
    return null;
  }

  private static Fix raiseHorizon(AnalysisResult result, Diagnostic d) {
    if (result.check().scenario() == null) {
      return null;
    }
    for (PlanProp p : planProps(result)) {
      if (p instanceof PlanProp.Horizon h && h.range().equals(d.range())) {
        int needed = Hints.minimumSteps(result.check().scenario());
        return new Fix("Raise the horizon to " + needed + " (the minimum to reach the target)", h.value().range(),
            Integer.toString(needed));
      }
    }
    return null;
  }

  private static Fix reverseCorners(AnalysisResult result, Diagnostic d) {
    for (Decl decl : result.check().main().decls()) {
      ShapeNode shape = decl instanceof Decl.ZoneDecl z ? z.shape() : decl instanceof Decl.AreaDecl a ? a.shape()
          : decl instanceof Decl.TargetDecl t ? t.shape() : null;
      if (shape instanceof ShapeNode.PolygonNode p && p.range().equals(d.range()) && p.corners().size() > 1) {
        List<PointNode> corners = p.corners();
        List<String> reversed = new ArrayList<>();
        for (int i = corners.size() - 1; i >= 0; i--) {
          reversed.add(corners.get(i).range().text());
        }
        SourceRange span = corners.get(0).range().to(corners.get(corners.size() - 1).range());
        return new Fix("Reverse the corners of `" + decl.name().text() + "` to counter-clockwise (same region)", span,
            String.join(" ", reversed));
      }
    }
    return null;
  }

  /** Deletes the repeated property's line (or only the property, when the line holds more). */
  private static Fix removeLine(Diagnostic d) {
    SourceRange r = d.range();
    SourceFile file = r.source();
    String text = file.text();
    int lineStart = file.lineStart(file.lineOf(r.start()));
    int lineEnd = text.indexOf('\n', r.end());
    lineEnd = lineEnd < 0 ? text.length() : lineEnd + 1;
    boolean alone = text.substring(lineStart, r.start()).isBlank() && text.substring(r.end(), lineEnd).isBlank();
    String keyword = r.text().split("\\s+", 2)[0];
    SourceRange cut = alone ? new SourceRange(file, lineStart, lineEnd) : r;
    return new Fix("Remove the repeated `" + keyword + "` line (the first one stays)", cut, "");
  }

  private static Fix guardOn(AnalysisResult result, Diagnostic d) {
    for (PlanProp p : planProps(result)) {
      if (p instanceof PlanProp.Guard g && g.range().equals(d.range())) {
        return new Fix("Turn the guard on (`guard on`: no corner cutting between steps)", g.range(), "guard on");
      }
    }
    return null;
  }

  private static Fix closestUnit(Diagnostic d) {
    String written = d.range().text();
    String best = null;
    int bestDistance = 3;
    List<String> known = new ArrayList<>(Units.simpleSymbols());
    known.addAll(new java.util.TreeSet<>(Units.commonCompounds()));
    for (String u : known) {
      int distance = distance(written, u);
      if (distance < bestDistance) {
        bestDistance = distance;
        best = u;
      }
    }
    return best == null ? null : new Fix("Replace the unit `" + written + "` with `" + best + "`", d.range(), best);
  }

  static int distance(String a, String b) {
    int[] prev = new int[b.length() + 1];
    int[] cur = new int[b.length() + 1];
    for (int j = 0; j <= b.length(); j++) {
      prev[j] = j;
    }
    for (int i = 1; i <= a.length(); i++) {
      cur[0] = i;
      for (int j = 1; j <= b.length(); j++) {
        int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
        cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
      }
      int[] swap = prev;
      prev = cur;
      cur = swap;
    }
    return prev[b.length()];
  }

  private static boolean planTouches(AnalysisResult result, SourceRange asked) {
    for (Decl decl : result.check().main().decls()) {
      if (decl instanceof Decl.PlanDecl p && Ranges.touches(p.range(), asked)) {
        return true;
      }
    }
    return false;
  }

  private static List<PlanProp> planProps(AnalysisResult result) {
    List<PlanProp> out = new ArrayList<>();
    for (Decl decl : result.check().main().decls()) {
      if (decl instanceof Decl.PlanDecl p) {
        out.addAll(p.props());
      }
    }
    return out;
  }
}
