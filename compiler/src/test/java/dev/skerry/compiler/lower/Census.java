package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Zone;
import java.util.HashMap;
import java.util.Map;

/**
 * Sizes read off a lowered MILP itself (columns by type and origin, rows, merged non-zeros),
 * independently of the layout's counting, for the agreement tests.
 */
final class Census {
  private Census() {}

  static Sizes of(Milp milp, Scenario s) {
    Map<String, Zone> zones = new HashMap<>();
    s.zones().forEach(z -> zones.put(z.name(), z));
    long box = 0;
    long poly = 0;
    long arrival = 0;
    long waypoint = 0;
    long assign = 0;
    long clusterAvoid = 0;
    long separation = 0;
    long continuous = 0;
    for (Variable v : milp.variables()) {
      if (v.type() == VarType.CONTINUOUS) {
        continuous++;
        continue;
      }
      String role = v.origin().role();
      switch (role) {
        case "arrive" -> arrival++;
        case "visit" -> waypoint++;
        case "assign" -> assign++;
        case "separate-binary" -> separation++;
        case "avoid-binary" -> {
          if (v.name().startsWith("bc_")) {
            clusterAvoid++;
          } else if (zones.get(v.origin().entity()).isBox()) {
            box++;
          } else {
            poly++;
          }
        }
        default -> throw new AssertionError("binary " + v.name() + " has an unexpected role " + role);
      }
    }
    return new Sizes(box, poly, arrival, waypoint, assign, clusterAvoid, separation, continuous, milp.rowCount(),
        milp.nonZeros());
  }
}
