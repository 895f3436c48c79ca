package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.analysis.VehicleLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.source.SourceRange;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Entry point of the lowering stage: scenario → {@link FormulationLayout} → {@link Milp}. Each
 * piece of the formulation has its own class; this one runs them in order and sets the objective
 * timeWeight·Σ k·Δt·f_k + fuelWeight·Σ Δt·(wx + wy) (summed over a fleet's vehicles, or with
 * {@code latest} time the makespan T in place of the arrival sum). The scenario is only read.
 */
public final class Lowering {
  private Lowering() {}

  /** A scenario entity a column or row can come from; clusters have no source range. */
  public record Entity(String kind, String name, SourceRange range) {}

  /** The MILP, the layout it was built from, and each entity name in an {@code Origin} mapped back. */
  public record Lowered(Milp milp, FormulationLayout layout, Map<String, Entity> entities) {
    public Lowered {
      entities = Map.copyOf(entities);
    }

    /** The entity a column or row of this MILP came from, or null. */
    public Entity entityOf(Origin origin) {
      return entities.get(origin.entity());
    }
  }

  public static Milp lower(Scenario s) {
    return lowerWithLayout(s).milp();
  }

  public static Lowered lowerWithLayout(Scenario s) {
    return lower(FormulationLayout.of(s));
  }

  public static Lowered lower(FormulationLayout layout) {
    Scenario s = layout.scenario();
    MilpBuilder builder = new MilpBuilder(s.name());
    List<LoweringContext> parts = new ArrayList<>();
    for (VehicleLayout part : layout.vehicles()) {
      LoweringContext c = new LoweringContext(builder, layout, part);
      parts.add(c);
      DynamicsLowering.lower(c);
      LimitsLowering.lower(c);
      KeepInLowering.lower(c);
      ArrivalLowering.lower(c);
      FuelLowering.lower(c);
    }
    ClusterLowering.lower(parts);
    for (LoweringContext c : parts) {
      ZoneAvoidanceLowering.lower(c);
    }
    WaypointLowering.lower(layout, parts, builder);
    SeparationLowering.lower(layout.separations(), parts, builder);
    Variable latest = ArrivalLowering.lowerFleet(layout, parts, builder);
    PlanOptions plan = s.plan();
    LinearExpr objective = new LinearExpr();
    if (latest != null) {
      objective.add(latest, plan.timeWeight());
    } else {
      for (LoweringContext c : parts) {
        ArrivalLowering.addCost(c, objective, plan.timeWeight());
      }
    }
    for (LoweringContext c : parts) {
      FuelLowering.addCost(c, objective, plan.fuelWeight());
    }
    builder.minimize(objective);
    return new Lowered(builder.build(), layout, entities(s));
  }

  private static Map<String, Entity> entities(Scenario s) {
    Map<String, Entity> map = new LinkedHashMap<>();
    s.vehicles().forEach(v -> map.putIfAbsent(v.name(), new Entity("vehicle", v.name(), v.range())));
    map.putIfAbsent(s.area().name(), new Entity("area", s.area().name(), s.area().range()));
    s.zones().forEach(z -> map.putIfAbsent(z.name(), new Entity("zone", z.name(), z.range())));
    s.targets().forEach(t -> map.putIfAbsent(t.name(), new Entity("target", t.name(), t.range())));
    s.waypoints().forEach(w -> map.putIfAbsent(w.name(), new Entity("waypoint", w.name(), w.range())));
    for (int l = 0; l < s.plan().clusters(); l++) {
      map.putIfAbsent("c" + l, new Entity("cluster", "c" + l, null));
    }
    return map;
  }
}
