package dev.skerry.compiler.report;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.plan.ClusterBox;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.verify.Violation;
import java.util.Locale;

/** A plan as text for people, CSV for spreadsheets and JSON for programs. */
public final class PlanOutputs {
  public static final String CAUTION = "Planning aid only, not certified guidance: check the plan against local aviation"
      + " or maritime rules, your operator's procedures and licensed practice; the radius margin is your choice.";

  private PlanOutputs() {}

  public static String summary(PlanResult r) {
    StringBuilder b = new StringBuilder();
    SolveResult s = r.solve();
    b.append("status: ").append(s.status().description());
    if (s.status().hasSolution() && s.stopReason() != dev.skerry.compiler.solve.StopReason.FINISHED) {
      b.append(" (").append(s.stopReason().name().toLowerCase(Locale.ROOT).replace('_', ' ')).append(")");
    }
    b.append('\n');
    b.append(String.format(Locale.ROOT, "solver: %s, %.2f s%s%s%n", s.backendId(), s.wallTime().toMillis() / 1000.0,
        s.nodes() >= 0 ? ", " + s.nodes() + " nodes" : "",
        Double.isFinite(s.gap()) && s.status().hasSolution() ? String.format(Locale.ROOT, ", gap %.3g %%", 100 * s.gap()) : ""));
    b.append(String.format(Locale.ROOT, "model: %,d binaries, %,d continuous, %,d rows%n", r.milp().binaryCount(),
        r.milp().continuousCount(), r.milp().rowCount()));
    if (!s.message().isBlank()) {
      b.append("solver says: ").append(s.message()).append('\n');
    }
    for (String w : s.warnings()) {
      b.append("warning: ").append(w).append('\n');
    }
    if (!r.hasPlan()) {
      return b.toString();
    }
    b.append(String.format(Locale.ROOT, "objective: %s (arrival %s s at step %d, fuel %s m/s)%n",
        Format.number(s.objective()), Format.number(r.timeCost()), r.trajectory().arrival(), Format.number(r.fuelCost())));
    for (ClusterBox c : r.clusters()) {
      b.append(String.format(Locale.ROOT, "cluster %s: (%s, %s) to (%s, %s) holds %s%n", c.name(),
          Format.number(c.box().xmin()), Format.number(c.box().ymin()), Format.number(c.box().xmax()),
          Format.number(c.box().ymax()), c.zones().isEmpty() ? "no zones (unused)" : String.join(", ", c.zones())));
    }
    if (r.verified()) {
      b.append(String.format(Locale.ROOT, "verified: %d segments clear of every zone (closest %s m beyond the radius),"
              + " inside the area, within limits (speed %s, accel %s of the limit)%n",
          r.verify().segmentsChecked(), Format.number(r.verify().minClearance()),
          percent(r.verify().speedExcess()), percent(r.verify().accelExcess())));
    } else {
      b.append("VERIFICATION FAILED: ").append(r.verify().violations().size()).append(" violation(s)\n");
      for (Violation v : r.verify().violations()) {
        b.append("  ").append(v.kind().word()).append(": ").append(v.message()).append('\n');
      }
    }
    b.append(CAUTION).append('\n');
    return b.toString();
  }

  private static String percent(double excess) {
    return String.format(Locale.ROOT, "%.1f %%", 100 * (1 + excess));
  }

  public static String csv(PlanResult r) {
    StringBuilder b = new StringBuilder("vehicle,step,time_s,x_m,y_m,vx_m_per_s,vy_m_per_s,ax_m_per_s2,ay_m_per_s2\n");
    for (Sample s : r.trajectory().flown()) {
      b.append(r.trajectory().vehicle()).append(',').append(s.step()).append(',').append(s.time()).append(',')
          .append(s.position().x()).append(',').append(s.position().y()).append(',').append(s.velocity().x()).append(',')
          .append(s.velocity().y()).append(',').append(s.accel().x()).append(',').append(s.accel().y()).append('\n');
    }
    return b.toString();
  }

  public static JsonObject json(PlanResult r) {
    JsonObject o = new JsonObject();
    o.addProperty("scenario", r.scenario().name());
    o.addProperty("caution", CAUTION);
    SolveResult s = r.solve();
    JsonObject solver = new JsonObject();
    solver.addProperty("backend", s.backendId());
    solver.addProperty("status", s.status().name().toLowerCase(Locale.ROOT));
    solver.addProperty("stopReason", s.stopReason().name().toLowerCase(Locale.ROOT));
    if (s.status().hasSolution()) {
      solver.addProperty("objective", s.objective());
    }
    if (Double.isFinite(s.bestBound())) {
      solver.addProperty("bound", s.bestBound());
    }
    if (Double.isFinite(s.gap())) {
      solver.addProperty("gap", s.gap());
    }
    solver.addProperty("seconds", s.wallTime().toNanos() / 1e9);
    solver.addProperty("nodes", s.nodes());
    solver.addProperty("binaries", r.milp().binaryCount());
    solver.addProperty("continuous", r.milp().continuousCount());
    solver.addProperty("rows", r.milp().rowCount());
    o.add("solver", solver);
    if (!r.hasPlan()) {
      return o;
    }
    JsonObject cost = new JsonObject();
    cost.addProperty("arrivalSeconds", r.timeCost());
    cost.addProperty("fuel", r.fuelCost());
    cost.addProperty("arrivalStep", r.trajectory().arrival());
    o.add("cost", cost);
    JsonArray samples = new JsonArray();
    for (Sample p : r.trajectory().flown()) {
      JsonObject j = new JsonObject();
      j.addProperty("step", p.step());
      j.addProperty("t", p.time());
      j.addProperty("x", p.position().x());
      j.addProperty("y", p.position().y());
      j.addProperty("vx", p.velocity().x());
      j.addProperty("vy", p.velocity().y());
      j.addProperty("ax", p.accel().x());
      j.addProperty("ay", p.accel().y());
      samples.add(j);
    }
    JsonObject plan = new JsonObject();
    plan.addProperty("vehicle", r.trajectory().vehicle());
    plan.addProperty("step", r.trajectory().step());
    plan.add("samples", samples);
    o.add("plan", plan);
    JsonArray clusters = new JsonArray();
    for (ClusterBox c : r.clusters()) {
      JsonObject j = new JsonObject();
      j.addProperty("name", c.name());
      j.addProperty("xmin", c.box().xmin());
      j.addProperty("ymin", c.box().ymin());
      j.addProperty("xmax", c.box().xmax());
      j.addProperty("ymax", c.box().ymax());
      JsonArray zones = new JsonArray();
      c.zones().forEach(zones::add);
      j.add("zones", zones);
      clusters.add(j);
    }
    o.add("clusters", clusters);
    JsonObject verify = new JsonObject();
    verify.addProperty("ok", r.verify().ok());
    verify.addProperty("minClearance", r.verify().minClearance());
    verify.addProperty("speedRatio", 1 + r.verify().speedExcess());
    verify.addProperty("accelRatio", 1 + r.verify().accelExcess());
    JsonArray violations = new JsonArray();
    for (Violation v : r.verify().violations()) {
      JsonObject j = new JsonObject();
      j.addProperty("kind", v.kind().word());
      j.addProperty("step", v.step());
      j.addProperty("entity", v.entity());
      j.addProperty("amount", v.amount());
      j.addProperty("message", v.message());
      violations.add(j);
    }
    verify.add("violations", violations);
    o.add("verify", verify);
    return o;
  }

  public static String jsonText(PlanResult r) {
    return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().serializeSpecialFloatingPointValues().create()
        .toJson(json(r)) + "\n";
  }
}
