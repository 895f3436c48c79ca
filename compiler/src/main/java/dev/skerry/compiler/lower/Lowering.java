package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.source.SourceRange;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Entry point of the lowering stage: scenario → {@link FormulationLayout} → {@link Milp}. Each
 * piece of the formulation has its own class; this one runs them in order and sets the objective
 * timeWeight·Σ k·Δt·f_k + fuelWeight·Σ Δt·(wx + wy). The scenario is only read.
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
    LoweringContext c = new LoweringContext(new MilpBuilder(s.name()), layout);
    DynamicsLowering.lower(c);
    LimitsLowering.lower(c);
    KeepInLowering.lower(c);
    ArrivalLowering.lower(c);
    FuelLowering.lower(c);
    ClusterLowering.lower(c);
    ZoneAvoidanceLowering.lower(c);
    WaypointLowering.lower(c);
    PlanOptions plan = s.plan();
    LinearExpr objective = new LinearExpr();
    ArrivalLowering.addCost(c, objective, plan.timeWeight());
    FuelLowering.addCost(c, objective, plan.fuelWeight());
    c.builder.minimize(objective);
    return new Lowered(c.builder.build(), layout, entities(s));
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
