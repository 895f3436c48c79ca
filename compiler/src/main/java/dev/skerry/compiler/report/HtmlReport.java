package dev.skerry.compiler.report;

import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.sim.Iteration;
import dev.skerry.compiler.sim.LoopResult;
import java.util.List;
import java.util.Locale;

/**
 * A self-contained HTML page comparing closed-loop runs: the table, per run the flown and the first
 * predicted path with the first iteration's clusters, and a chart of predicted total cost against
 * cost flown per iteration. No scripts, no outside files.
 */
public final class HtmlReport {
  private HtmlReport() {}

  public static String render(Scenario s, List<LoopOutputs.Run> runs) {
    StringBuilder b = new StringBuilder();
    b.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>")
        .append(esc(s.name())).append(" — closed-loop comparison</title>\n<style>\n")
        .append("body{font-family:sans-serif;margin:24px 40px;color:#1f2a36;background:#fbfaf7}")
        .append("h1{font-weight:600;font-size:22px}h2{font-size:17px;margin-top:32px;border-bottom:2px solid #d1495b33}")
        .append("table{border-collapse:collapse;font-size:14px}td,th{padding:4px 10px;border-bottom:1px solid #ccc;")
        .append("text-align:right}th:first-child,td:first-child{text-align:left}.caution{background:#fff3e0;")
        .append("border-left:4px solid #d1495b;padding:8px 12px;font-size:13px}.run{display:flex;flex-wrap:wrap;gap:16px}")
        .append("\n</style></head><body>\n");
    b.append("<h1>").append(esc(s.name())).append(": closed-loop comparison</h1>\n");
    b.append("<p class=\"caution\">").append(esc(PlanOutputs.CAUTION)).append("</p>\n");
    b.append("<table id=\"summary\"><tr><th>configuration</th><th>binaries (largest)</th><th>compute total (s)</th>")
        .append("<th>mean (s)</th><th>worst (s)</th><th>cost flown</th><th>time (s)</th><th>fuel</th><th>steps</th>")
        .append("<th>verified</th></tr>\n");
    for (LoopOutputs.Run run : runs) {
      LoopResult r = run.result();
      b.append("<tr data-config=\"").append(esc(run.label())).append("\"><td>").append(esc(run.label())).append("</td><td>")
          .append(r.largestBinaries()).append("</td><td>").append(fmt(r.totalSeconds())).append("</td><td>")
          .append(fmt(r.meanSeconds())).append("</td><td>").append(fmt(r.worstSeconds())).append("</td><td>")
          .append(Format.number(r.flownCost())).append("</td><td>").append(Format.number(r.flownTime())).append("</td><td>")
          .append(Format.number(r.flownFuel())).append("</td><td>").append(r.iterations().size()).append("</td><td>")
          .append(r.verify().ok() ? "yes" : "NO").append("</td></tr>\n");
    }
    b.append("</table>\n");
    for (LoopOutputs.Run run : runs) {
      LoopResult r = run.result();
      b.append("<h2>").append(esc(run.label())).append("</h2>\n<div class=\"run\">\n");
      var clusters = r.iterations().isEmpty() ? List.<dev.skerry.compiler.plan.ClusterBox>of() : r.iterations().get(0).clusters();
      String svg = SvgPlot.renderLoop(s, r.flownPaths(), r.firstPredictions(), clusters, run.label() + ": flown (solid) and first"
          + " prediction (dashed)");
      b.append("<div>").append(svg.substring(svg.indexOf("<svg"))).append("</div>\n");
      b.append("<div>").append(chart(run)).append("</div>\n</div>\n");
    }
    b.append("</body></html>\n");
    return b.toString();
  }

  /** Predicted total (line with dots) and cost flown (bars) per iteration, each point carrying its number. */
  static String chart(LoopOutputs.Run run) {
    List<Iteration> its = run.result().iterations();
    int w = 520;
    int h = 300;
    int m = 50;
    double max = 1e-9;
    for (Iteration it : its) {
      max = Math.max(max, Math.max(it.flownCost(), Double.isFinite(it.predictedTotal()) ? it.predictedTotal() : 0));
    }
    double xs = (w - 2.0 * m) / Math.max(1, its.size());
    double ys = (h - 2.0 * m) / max;
    StringBuilder b = new StringBuilder();
    b.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"cost-chart\" width=\"").append(w).append("\" height=\"")
        .append(h).append("\" font-family=\"sans-serif\" font-size=\"11\">");
    b.append("<rect width=\"100%\" height=\"100%\" fill=\"white\"/>");
    b.append("<text x=\"").append(m).append("\" y=\"20\" font-size=\"13\">cost per iteration: predicted total vs flown</text>");
    b.append("<line x1=\"").append(m).append("\" y1=\"").append(h - m).append("\" x2=\"").append(w - m).append("\" y2=\"")
        .append(h - m).append("\" stroke=\"#1f2a36\"/>");
    b.append("<line x1=\"").append(m).append("\" y1=\"").append(m).append("\" x2=\"").append(m).append("\" y2=\"")
        .append(h - m).append("\" stroke=\"#1f2a36\"/>");
    b.append("<text x=\"").append(m - 6).append("\" y=\"").append(m + 4).append("\" text-anchor=\"end\">")
        .append(Format.number(max)).append("</text><text x=\"").append(m - 6).append("\" y=\"").append(h - m)
        .append("\" text-anchor=\"end\">0</text>");
    b.append("<text x=\"").append(w - m).append("\" y=\"").append(h - m + 18).append("\" text-anchor=\"end\">iteration</text>");
    StringBuilder line = new StringBuilder();
    for (int i = 0; i < its.size(); i++) {
      Iteration it = its.get(i);
      double x = m + (i + 0.5) * xs;
      double barH = it.flownCost() * ys;
      b.append("<rect class=\"flown\" data-iteration=\"").append(it.index()).append("\" data-value=\"")
          .append(it.flownCost()).append("\" x=\"").append(fmt(x - xs * 0.35)).append("\" y=\"").append(fmt(h - m - barH))
          .append("\" width=\"").append(fmt(xs * 0.7)).append("\" height=\"").append(fmt(barH))
          .append("\" fill=\"#2a9d8f\" fill-opacity=\"0.5\"/>");
      if (Double.isFinite(it.predictedTotal())) {
        double y = h - m - it.predictedTotal() * ys;
        line.append(fmt(x)).append(',').append(fmt(y)).append(' ');
        b.append("<circle class=\"predicted\" data-iteration=\"").append(it.index()).append("\" data-value=\"")
            .append(it.predictedTotal()).append("\" cx=\"").append(fmt(x)).append("\" cy=\"").append(fmt(y))
            .append("\" r=\"3\" fill=\"#d1495b\"/>");
      }
    }
    b.append("<polyline fill=\"none\" stroke=\"#d1495b\" stroke-width=\"1.5\" points=\"").append(line).append("\"/>");
    b.append("<rect x=\"").append(w - m - 150).append("\" y=\"30\" width=\"10\" height=\"10\" fill=\"#2a9d8f\" fill-opacity=\"0.5\"/>")
        .append("<text x=\"").append(w - m - 135).append("\" y=\"39\">cost flown so far</text>");
    b.append("<circle cx=\"").append(w - m - 145).append("\" cy=\"52\" r=\"3\" fill=\"#d1495b\"/><text x=\"")
        .append(w - m - 135).append("\" y=\"56\">predicted total</text>");
    return b.append("</svg>").toString();
  }

  private static String fmt(double v) {
    return String.format(Locale.ROOT, "%.3f", v);
  }

  private static String esc(String text) {
    return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
  }
}
