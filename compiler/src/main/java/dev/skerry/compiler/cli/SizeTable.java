package dev.skerry.compiler.cli;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.Fact;
import dev.skerry.compiler.analysis.SizeReport;
import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.check.CheckResult;
import java.io.PrintWriter;
import java.util.Locale;

/**
 * The predicted MILP sizes of a checked scenario, as a text table and as JSON. Every figure comes
 * from {@link Analysis#report}, the same layout the lowering walks.
 */
final class SizeTable {
  private SizeTable() {}

  static SizeReport report(CheckResult result) {
    if (result.scenario() == null) {
      return null;
    }
    return Analysis.report(result.scenario());
  }

  static void print(PrintWriter out, CheckResult result) {
    SizeReport r = report(result);
    if (r == null) {
      return;
    }
    out.println();
    out.printf(Locale.ROOT, "  %-34s %10s %11s %10s %11s%n", "MILP size", "binaries", "continuous", "rows", "non-zeros");
    row(out, "as written" + (result.scenario().plan().pruning() ? " (pruned)" : ""), r.asWritten());
    row(out, "without pruning", r.unpruned());
    if (r.comparison() != null) {
      row(out, r.comparisonLabel(), r.comparison());
    }
    if (r.comparison() != null && !result.scenario().plan().clustered()) {
      out.println("  (the clustered row is a size only: a cluster's box covers whole zones and can close a"
          + " passage the plan needs; `skerry compare` flies both)");
    }
    Sizes w = r.asWritten();
    out.printf(Locale.ROOT, "  binaries as written: %,d box-zone faces, %,d polygon faces, %,d arrival, %,d waypoint,"
            + " %,d cluster assignment, %,d cluster avoidance%s%n", w.zoneBoxBinaries(), w.zonePolygonBinaries(),
        w.arrivalBinaries(), w.waypointBinaries(), w.clusterAssignmentBinaries(), w.clusterAvoidanceBinaries(),
        result.scenario().fleet() ? String.format(Locale.ROOT, ", %,d vehicle separation", w.separationBinaries()) : "");
    for (Fact f : r.facts()) {
      out.println("  note: " + f.message() + " [" + f.code() + "]");
    }
    out.println();
  }

  private static void row(PrintWriter out, String label, Sizes s) {
    out.printf(Locale.ROOT, "  %-34s %,10d %,11d %,10d %,11d%n", label, s.binaries(), s.continuous(), s.rows(), s.nonZeros());
  }

  /** Sizes for the semantic diff: the plan as written. */
  static dev.skerry.compiler.semdiff.SizeFigures figures(dev.skerry.compiler.model.Scenario scenario) {
    Sizes s = Analysis.sizes(scenario);
    return new dev.skerry.compiler.semdiff.SizeFigures(s.binaries(), s.continuous(), s.rows());
  }

  static void addJson(JsonObject report, CheckResult result) {
    SizeReport r = report(result);
    if (r == null) {
      return;
    }
    JsonObject sizes = new JsonObject();
    sizes.add("asWritten", json(r.asWritten()));
    sizes.add("unpruned", json(r.unpruned()));
    if (r.comparison() != null) {
      JsonObject comparison = json(r.comparison());
      comparison.addProperty("label", r.comparisonLabel());
      sizes.add("comparison", comparison);
    }
    JsonArray facts = new JsonArray();
    for (Fact f : r.facts()) {
      JsonObject o = new JsonObject();
      o.addProperty("code", f.code());
      o.addProperty("entity", f.entity());
      o.addProperty("step", f.step());
      o.addProperty("message", f.message());
      facts.add(o);
    }
    sizes.add("facts", facts);
    report.add("sizes", sizes);
  }

  static JsonObject json(Sizes s) {
    JsonObject o = new JsonObject();
    o.addProperty("binaries", s.binaries());
    o.addProperty("continuous", s.continuous());
    o.addProperty("rows", s.rows());
    o.addProperty("nonZeros", s.nonZeros());
    JsonObject cause = new JsonObject();
    cause.addProperty("boxZoneFaces", s.zoneBoxBinaries());
    cause.addProperty("polygonFaces", s.zonePolygonBinaries());
    cause.addProperty("arrival", s.arrivalBinaries());
    cause.addProperty("waypoint", s.waypointBinaries());
    cause.addProperty("clusterAssignment", s.clusterAssignmentBinaries());
    cause.addProperty("clusterAvoidance", s.clusterAvoidanceBinaries());
    cause.addProperty("separation", s.separationBinaries());
    o.add("binariesByCause", cause);
    return o;
  }
}
