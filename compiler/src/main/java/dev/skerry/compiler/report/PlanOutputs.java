package dev.skerry.compiler.report;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.plan.ClusterBox;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.verify.Verifier;
import dev.skerry.compiler.verify.Violation;
import java.util.Locale;

/**
 * A plan as text for people, CSV for spreadsheets and JSON for programs. Every vehicle's path is
 * given (CSV: one row per vehicle and step; JSON: the {@code vehicles} list; the first vehicle also
 * as {@code plan}); a 3-D plan adds altitude, climb rate and vertical acceleration.
 */
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
    if (r.trajectories().size() == 1) {
      b.append(String.format(Locale.ROOT, "objective: %s (arrival %s s at step %d, fuel %s m/s)%n",
          Format.number(s.objective()), Format.number(r.timeCost()), r.trajectory().arrival(), Format.number(r.fuelCost())));
    } else {
      b.append(String.format(Locale.ROOT, "objective: %s (%s %s s, fuel %s m/s, %d vehicles)%n",
          Format.number(s.objective()), r.scenario() != null && r.scenario().plan().latestArrival() ? "latest arrival"
              : "arrival times summed", Format.number(r.timeCost()), Format.number(r.fuelCost()), r.trajectories().size()));
      for (Trajectory t : r.trajectories()) {
        String target = targetName(r, t);
        b.append(String.format(Locale.ROOT, "  %s: arrival %s s at step %d%s, fuel %s m/s%n", t.vehicle(),
            Format.number(t.arrivalTime()), t.arrival(), target == null ? "" : " in " + target, Format.number(t.fuel())));
      }
    }
    for (ClusterBox c : r.clusters()) {
      b.append(String.format(Locale.ROOT, "cluster %s: (%s, %s) to (%s, %s) holds %s%n", c.name(),
          Format.number(c.box().xmin()), Format.number(c.box().ymin()), Format.number(c.box().xmax()),
          Format.number(c.box().ymax()), c.zones().isEmpty() ? "no zones (unused)" : String.join(", ", c.zones())));
    }
    if (r.verified()) {
      // with no zones the least clearance is infinite: said in words, not as a number
      double clearance = r.verify().minClearance();
      String zones = Double.isFinite(clearance)
          ? "clear of every zone (closest " + Format.number(clearance) + " m beyond the radius)" : "(no zones)";
      b.append(String.format(Locale.ROOT, "verified: %d segments %s, inside the area, within limits (speed %s, accel"
              + " %s of the limit)%n", r.verify().segmentsChecked(), zones, percent(r.verify().speedExcess()),
          percent(r.verify().accelExcess())));
      if (r.verify().hasPairs()) {
        b.append(String.format(Locale.ROOT, "separated: every pair of vehicles keeps its distance while both fly"
            + " (closest %s m beyond it)%n", Format.number(r.verify().minSeparation())));
      }
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

  /** The target a trajectory ends in, by name (null when the scenario has none). */
  private static String targetName(PlanResult r, Trajectory t) {
    if (t.target() != null || r.scenario() == null) {
      return t.target();
    }
    Target target = Verifier.targetOf(r.scenario(), t);
    return target == null ? null : target.name();
  }

  private static boolean threeD(PlanResult r) {
    return r.scenario() != null && r.scenario().threeD();
  }

  /** One row per vehicle and flown step; in 3-D also altitude, climb rate and vertical acceleration. */
  public static String csv(PlanResult r) {
    boolean d3 = threeD(r);
    StringBuilder b = new StringBuilder("vehicle,step,time_s,x_m,y_m,vx_m_per_s,vy_m_per_s,ax_m_per_s2,ay_m_per_s2"
        + (d3 ? ",z_m,vz_m_per_s,az_m_per_s2" : "") + "\n");
    for (Trajectory t : r.trajectories()) {
      for (Sample s : t.flown()) {
        b.append(t.vehicle()).append(',').append(s.step()).append(',').append(s.time()).append(',')
            .append(s.position().x()).append(',').append(s.position().y()).append(',').append(s.velocity().x()).append(',')
            .append(s.velocity().y()).append(',').append(s.accel().x()).append(',').append(s.accel().y());
        if (d3) {
          b.append(',').append(s.altitude()).append(',').append(s.climb()).append(',').append(s.climbAccel());
        }
        b.append('\n');
      }
    }
    return b.toString();
  }

  private static JsonArray samples(Trajectory t, boolean d3) {
    JsonArray samples = new JsonArray();
    for (Sample p : t.flown()) {
      JsonObject j = new JsonObject();
      j.addProperty("step", p.step());
      j.addProperty("t", p.time());
      j.addProperty("x", p.position().x());
      j.addProperty("y", p.position().y());
      j.addProperty("vx", p.velocity().x());
      j.addProperty("vy", p.velocity().y());
      j.addProperty("ax", p.accel().x());
      j.addProperty("ay", p.accel().y());
      if (d3) {
        j.addProperty("z", p.altitude());
        j.addProperty("vz", p.climb());
        j.addProperty("az", p.climbAccel());
      }
      samples.add(j);
    }
    return samples;
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
    boolean d3 = threeD(r);
    JsonObject plan = new JsonObject();
    plan.addProperty("vehicle", r.trajectory().vehicle());
    plan.addProperty("step", r.trajectory().step());
    plan.add("samples", samples(r.trajectory(), d3));
    o.add("plan", plan);
    o.addProperty("dimensions", d3 ? 3 : 2);
    JsonArray vehicles = new JsonArray();
    for (Trajectory t : r.trajectories()) {
      JsonObject j = new JsonObject();
      j.addProperty("vehicle", t.vehicle());
      String target = targetName(r, t);
      if (target != null) {
        j.addProperty("target", target);
      }
      j.addProperty("step", t.step());
      j.addProperty("arrivalStep", t.arrival());
      j.addProperty("arrivalSeconds", t.arrivalTime());
      j.addProperty("fuel", t.fuel());
      j.add("samples", samples(t, d3));
      vehicles.add(j);
    }
    o.add("vehicles", vehicles);
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
    // JSON has no infinity: with no zones there is no least clearance, and the key is left out
    if (Double.isFinite(r.verify().minClearance())) {
      verify.addProperty("minClearance", r.verify().minClearance());
    }
    verify.addProperty("speedRatio", 1 + r.verify().speedExcess());
    verify.addProperty("accelRatio", 1 + r.verify().accelExcess());
    if (r.verify().hasPairs() && Double.isFinite(r.verify().minSeparation())) {
      verify.addProperty("minSeparation", r.verify().minSeparation());
    }
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
