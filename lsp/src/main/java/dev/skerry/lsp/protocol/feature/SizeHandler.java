package dev.skerry.lsp.protocol.feature;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.PlanProp;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.lsp.analysis.AnalysisResult;
import dev.skerry.lsp.analysis.SizeEstimator;
import dev.skerry.lsp.protocol.Ranges;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.InlayHint;
import org.eclipse.lsp4j.InlayHintKind;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;

/**
 * Predicted sizes where the user looks: inlay hints after the plan's {@code horizon} and {@code
 * clusters} lines, the plan hover's comparison, and a "use N clusters" action when that is smaller.
 * Everything here is empty when the analysis carries no sizes.
 */
public final class SizeHandler {

  public List<InlayHint> inlayHints(AnalysisResult result, SourceRange visible) {
    SizeEstimator.PlanSizes sizes = result.sizes();
    List<InlayHint> out = new ArrayList<>();
    if (sizes == null) {
      return out;
    }
    for (PlanProp p : planProps(result)) {
      if (visible != null && !Ranges.touches(p.range(), visible)) {
        continue;
      }
      if (p instanceof PlanProp.Horizon) {
        out.add(hint(p.range(), counts(sizes.asWritten())));
      } else if (p instanceof PlanProp.Clusters && sizes.comparison() != null) {
        out.add(hint(p.range(), sizes.comparisonLabel() + ": " + counts(sizes.comparison())));
      }
    }
    return out;
  }

  private static InlayHint hint(SourceRange line, String label) {
    InlayHint hint = new InlayHint(Ranges.position(line.source(), line.end()), Either.forLeft(label));
    hint.setKind(InlayHintKind.Type);
    hint.setPaddingLeft(true);
    return hint;
  }

  /** Lines for the plan hover; empty without sizes. */
  public static List<String> hoverLines(SizeEstimator.PlanSizes sizes) {
    if (sizes == null) {
      return List.of();
    }
    if (sizes.comparison() == null) {
      return List.of("- MILP as written: " + counts(sizes.asWritten()), "- " + sizes.comparisonLabel());
    }
    return List.of("- MILP as written: " + counts(sizes.asWritten()),
        "- " + sizes.comparisonLabel() + ": " + counts(sizes.comparison()));
  }

  /** "Use N clusters: binaries A → B", inserting a clusters line after the horizon, when that has fewer binaries. */
  public CodeAction useClusters(AnalysisResult result) {
    SizeEstimator.PlanSizes sizes = result.sizes();
    if (sizes == null || sizes.suggestedClusters() <= 0 || sizes.comparison() == null
        || sizes.comparison().binaries() >= sizes.asWritten().binaries()) {
      return null;
    }
    if (result.check().scenario() != null && result.check().scenario().threeD()) {
      return null; // clusters are plan-view boxes; the checker refuses them in a 3-D scenario
    }
    PlanProp.Horizon horizon = null;
    for (PlanProp p : planProps(result)) {
      if (p instanceof PlanProp.Clusters) {
        return null;
      }
      if (p instanceof PlanProp.Horizon h) {
        horizon = h;
      }
    }
    if (horizon == null) {
      return null;
    }
    SourceRange line = horizon.range();
    String text = line.source().text();
    int lineStart = line.source().lineStart(line.source().lineOf(line.start()));
    String indent = text.substring(lineStart, line.start()).isBlank() ? text.substring(lineStart, line.start()) : "  ";
    CodeAction action = new CodeAction("Use " + sizes.suggestedClusters() + " clusters: binaries "
        + number(sizes.asWritten().binaries()) + " → " + number(sizes.comparison().binaries()));
    action.setKind(CodeActionKind.RefactorRewrite);
    SourceRange at = new SourceRange(line.source(), line.end(), line.end());
    action.setEdit(new WorkspaceEdit(Map.of(result.document().uri(), List.of(new TextEdit(Ranges.of(at),
        "\n" + indent + "clusters " + sizes.suggestedClusters() + " ordered")))));
    return action;
  }

  static String counts(SizeEstimator.Counts c) {
    return "binaries " + number(c.binaries()) + " · continuous " + number(c.continuous()) + " · rows " + number(c.rows());
  }

  static String number(long n) {
    return String.format(Locale.ROOT, "%,d", n);
  }

  private static List<PlanProp> planProps(AnalysisResult result) {
    List<PlanProp> out = new ArrayList<>();
    for (Decl d : result.check().main().decls()) {
      if (d instanceof Decl.PlanDecl p) {
        out.addAll(p.props());
      }
    }
    return out;
  }
}
