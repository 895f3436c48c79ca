package dev.skerry.compiler.plan;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Reads a plan out of a MILP solution by the origins the lowering gave its columns: the state and
 * input per step, the arrival step, and the cluster boxes with their zones.
 */
public final class PlanExtractor {
  private PlanExtractor() {}

  /** One trajectory per vehicle, in the scenario's vehicle order. */
  public static List<Trajectory> trajectories(Scenario s, Milp milp, double[] x) {
    List<Trajectory> out = new ArrayList<>();
    for (Vehicle v : s.vehicles()) {
      out.add(trajectory(s, v, milp, x));
    }
    return out;
  }

  /** The first vehicle's trajectory. */
  public static Trajectory trajectory(Scenario s, Milp milp, double[] x) {
    return trajectory(s, s.vehicle(), milp, x);
  }

  /**
   * Vehicle {@code vehicle}'s trajectory: its columns are those named after it (states and inputs)
   * and, in a fleet, those it owns (arrival binaries); the arrival is the step and target of its
   * largest arrival binary.
   */
  public static Trajectory trajectory(Scenario s, Vehicle vehicle, Milp milp, double[] x) {
    int n = s.plan().horizon();
    double[][] state = new double[9][n + 1];
    int arrival = n;
    String target = null;
    double best = -1;
    String owner = s.fleet() ? vehicle.name() : "";
    for (Variable v : milp.variables()) {
      String role = v.origin().role();
      int k = v.origin().step();
      int slot = switch (role) {
        case "px" -> 0;
        case "py" -> 1;
        case "vx" -> 2;
        case "vy" -> 3;
        case "ux" -> 4;
        case "uy" -> 5;
        case "pz" -> 6;
        case "vz" -> 7;
        case "uz" -> 8;
        default -> -1;
      };
      if (slot >= 0 && k >= 0 && k <= n && v.origin().entity().equals(vehicle.name())) {
        state[slot][k] = x[v.index()];
      } else if (role.equals("arrive") && v.origin().owner().equals(owner) && x[v.index()] > best) {
        best = x[v.index()];
        arrival = k;
        target = v.origin().entity();
      }
    }
    List<Sample> samples = new ArrayList<>();
    for (int k = 0; k <= n; k++) {
      Vec2 u = k < n ? new Vec2(state[4][k], state[5][k]) : Vec2.ZERO;
      double uz = k < n ? state[8][k] : 0;
      samples.add(new Sample(k, k * s.plan().step(), new Vec2(state[0][k], state[1][k]),
          new Vec2(state[2][k], state[3][k]), u, state[6][k], state[7][k], uz));
    }
    boolean named = s.targets().size() > 1;
    return new Trajectory(vehicle.name(), s.plan().step(), samples, arrival, named ? target : null);
  }

  /** The cluster boxes of a clustered plan, in cluster order; empty when the plan has none. */
  public static List<ClusterBox> clusters(Scenario s, Milp milp, double[] x) {
    Map<Integer, double[]> bounds = new TreeMap<>();
    Map<Integer, List<String>> members = new TreeMap<>();
    for (Variable v : milp.variables()) {
      String role = v.origin().role();
      if (role.equals("cluster-bound")) {
        int l = Integer.parseInt(v.origin().entity().substring(1));
        double[] b = bounds.computeIfAbsent(l, key -> new double[4]);
        int side = v.name().startsWith("cxmin") ? 0 : v.name().startsWith("cymin") ? 1 : v.name().startsWith("cxmax") ? 2 : 3;
        b[side] = x[v.index()];
      } else if (role.equals("assign") && x[v.index()] > 0.5) {
        int l = Integer.parseInt(v.name().substring(v.name().lastIndexOf("_c") + 2));
        members.computeIfAbsent(l, key -> new ArrayList<>()).add(v.origin().entity());
      }
    }
    List<ClusterBox> out = new ArrayList<>();
    for (Map.Entry<Integer, double[]> e : bounds.entrySet()) {
      double[] b = e.getValue();
      out.add(new ClusterBox("c" + (e.getKey() + 1), new Bounds(b[0], b[1], b[2], b[3]),
          members.getOrDefault(e.getKey(), List.of())));
    }
    return out;
  }
}
