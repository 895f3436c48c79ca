package dev.skerry.compiler.report;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.sim.Iteration;
import dev.skerry.compiler.sim.LoopResult;
import dev.skerry.compiler.verify.Violation;
import java.util.List;
import java.util.Locale;

/** Closed-loop runs as text, CSV and JSON; a comparison of several runs as one table. */
public final class LoopOutputs {
  private LoopOutputs() {}

  /** A named closed-loop run, e.g. "2 clusters, ordered". */
  public record Run(String label, LoopResult result) {}

  public static String summary(LoopResult r) {
    StringBuilder b = new StringBuilder();
    b.append(String.format(Locale.ROOT, "closed loop: %s after %d iterations%n", r.stop().words(), r.iterations().size()));
    b.append(String.format(Locale.ROOT, "flown cost: %s (time %s s, fuel %s m/s)%n", Format.number(r.flownCost()),
        Format.number(r.flownTime()), Format.number(r.flownFuel())));
    if (!r.iterations().isEmpty() && Double.isFinite(r.iterations().get(0).predictedTotal())) {
      b.append("first prediction: ").append(Format.number(r.iterations().get(0).predictedTotal())).append('\n');
    }
    if (r.flownPaths().size() > 1) {
      for (Trajectory t : r.flownPaths()) {
        b.append(String.format(Locale.ROOT, "  %s: %s after %d steps (%s s)%n", t.vehicle(),
            t.target() == null ? "flew" : (r.stop() == LoopResult.Stop.ARRIVED ? "reached " : "heading for ") + t.target(), t.arrival(), Format.number(t.arrivalTime())));
      }
    }
    b.append(String.format(Locale.ROOT, "compute: %.2f s in all, mean %.3f s, worst %.3f s per iteration; largest model"
        + " %,d binaries%n", r.totalSeconds(), r.meanSeconds(), r.worstSeconds(), r.largestBinaries()));
    long fallbacks = r.iterations().stream().filter(Iteration::fallback).count();
    if (fallbacks > 0) {
      b.append(fallbacks).append(" iteration(s) found no plan; the previous plan's next input was flown instead\n");
    }
    boolean fleet = r.flownPaths().size() > 1;
    b.append(r.verify().ok() ? (fleet ? "verified: the flown paths are clear of every zone, of each other and within"
        + " limits\n" : "verified: the flown path is clear of every zone and within limits\n")
        : "VERIFICATION FAILED on the flown path" + (fleet ? "s" : "") + ":\n");
    for (Violation v : r.verify().violations()) {
      b.append("  ").append(v.kind().word()).append(": ").append(v.message()).append('\n');
    }
    b.append(PlanOutputs.CAUTION).append('\n');
    return b.toString();
  }

  public static String table(List<Run> runs) {
    StringBuilder b = new StringBuilder();
    b.append(String.format(Locale.ROOT, "%-24s %9s %9s %9s %9s %9s %8s %7s %8s%n", "configuration", "binaries",
        "total s", "mean s", "worst s", "cost", "time s", "fuel", "verified"));
    double base = runs.isEmpty() ? 0 : runs.get(0).result().totalSeconds();
    for (Run run : runs) {
      LoopResult r = run.result();
      b.append(String.format(Locale.ROOT, "%-24s %,9d %9.2f %9.3f %9.3f %9s %8s %7s %8s%n", run.label(),
          r.largestBinaries(), r.totalSeconds(), r.meanSeconds(), r.worstSeconds(), Format.number(r.flownCost()),
          r.stop() == LoopResult.Stop.ARRIVED ? Format.number(r.flownTime()) : "—", Format.number(r.flownFuel()),
          r.verify().ok() ? "yes" : "NO"));
    }
    if (runs.size() > 1 && base > 0) {
      b.append("compute time relative to ").append(runs.get(0).label()).append(":");
      for (Run run : runs) {
        b.append(String.format(Locale.ROOT, "  %s %.2f×", run.label(), run.result().totalSeconds() / base));
      }
      b.append('\n');
    }
    return b.toString();
  }

  public static JsonObject json(Run run) {
    LoopResult r = run.result();
    JsonObject o = new JsonObject();
    o.addProperty("configuration", run.label());
    o.addProperty("stop", r.stop().name().toLowerCase(Locale.ROOT));
    o.addProperty("iterations", r.iterations().size());
    o.addProperty("largestBinaries", r.largestBinaries());
    o.addProperty("totalSeconds", r.totalSeconds());
    o.addProperty("meanSeconds", r.meanSeconds());
    o.addProperty("worstSeconds", r.worstSeconds());
    o.addProperty("cost", r.flownCost());
    o.addProperty("time", r.flownTime());
    o.addProperty("fuel", r.flownFuel());
    o.addProperty("verified", r.verify().ok());
    JsonArray vehicles = new JsonArray();
    for (Trajectory t : r.flownPaths()) {
      JsonObject v = new JsonObject();
      v.addProperty("vehicle", t.vehicle());
      if (t.target() != null) {
        v.addProperty("target", t.target());
      }
      v.addProperty("steps", t.arrival());
      v.addProperty("seconds", t.arrivalTime());
      v.addProperty("fuel", t.fuel());
      vehicles.add(v);
    }
    o.add("vehicles", vehicles);
    JsonArray its = new JsonArray();
    for (Iteration it : r.iterations()) {
      JsonObject j = new JsonObject();
      j.addProperty("index", it.index());
      j.addProperty("status", it.status().name().toLowerCase(Locale.ROOT));
      j.addProperty("seconds", it.seconds());
      j.addProperty("binaries", it.binaries());
      if (Double.isFinite(it.predictedTotal())) {
        j.addProperty("predictedTotal", it.predictedTotal());
      }
      j.addProperty("flownCost", it.flownCost());
      j.addProperty("fallback", it.fallback());
      JsonArray clusters = new JsonArray();
      it.clusters().forEach(c -> {
        JsonObject cj = new JsonObject();
        cj.addProperty("name", c.name());
        JsonArray zones = new JsonArray();
        c.zones().forEach(zones::add);
        cj.add("zones", zones);
        clusters.add(cj);
      });
      j.add("clusters", clusters);
      its.add(j);
    }
    o.add("iterationLog", its);
    return o;
  }

  public static String csv(List<Run> runs) {
    StringBuilder b = new StringBuilder(
        "configuration,iteration,status,seconds,binaries,predicted_total_cost,flown_cost,fallback\n");
    for (Run run : runs) {
      for (Iteration it : run.result().iterations()) {
        b.append('"').append(run.label()).append('"').append(',').append(it.index()).append(',')
            .append(it.status().name().toLowerCase(Locale.ROOT)).append(',').append(it.seconds()).append(',')
            .append(it.binaries()).append(',').append(Double.isFinite(it.predictedTotal()) ? it.predictedTotal() : "")
            .append(',').append(it.flownCost()).append(',').append(it.fallback()).append('\n');
      }
    }
    return b.toString();
  }
}
