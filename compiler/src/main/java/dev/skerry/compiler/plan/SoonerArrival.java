package dev.skerry.compiler.plan;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolverBackend;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Moves for a fleet's start, each a small solve of the whole fleet with every arrival held: one
 * vehicle a step sooner ({@link #of}), the fleet on its own sides ({@link #onItsSides}), every
 * vehicle's turns free ({@link #polish}). The first is the one the name is for: one vehicle arrives
 * a step sooner and the whole fleet is solved again round it, every vehicle free to move within the
 * sides of the zones it already keeps.
 *
 * <p>Why: planning the vehicles one after another ({@link FleetStarts}) makes a later vehicle give
 * way to an earlier one's fixed path, and replanning one vehicle with the others held cannot undo
 * that, as the others never move aside. On the twin skiffs the rounds sometimes have the south
 * skiff arriving at step 16 round the north one's path (61.83); this move brings it to step 15,
 * the north skiff's path bent a little to let it by (59.64, optimum 59.63), in 2–3 s with ojAlgo.
 * With the skiffs planned the other way round (south first, the north at step 16) it found the
 * optimum itself.
 *
 * <p>The model solved: every arrival binary fixed (the vehicle's at its step less one, the others'
 * as they are); the vehicle's path sampled again along its own track, played faster to arrive a
 * step sooner, and with the others' paths as they are, each zone slot's face fixed to the side that
 * point keeps ({@link ArrivalScan#fixSides}, window {@link ArrivalScan#NEAREST}), each waypoint's
 * visit held (the vehicle's moved to the matching step of the faster play); of the separation
 * binaries only those of slots where a pair comes near stay free. What is left is a small MILP: on
 * the twin skiffs 20 binaries.
 */
final class SoonerArrival {
  /** Position columns, resampled along the vehicle's track. */
  private static final Set<String> POSITION = Set.of("px", "py", "pz");

  private SoonerArrival() {}

  /**
   * A point of {@code model} with vehicle {@code vehicle} arriving a step sooner than at {@code x}
   * (a point of the model), or null when there is none within the options' limit or the vehicle
   * arrives at no step at x, or at step 1.
   */
  static double[] of(Milp model, double[] x, String vehicle, SolverBackend backend, SolveOptions options) {
    int arrival = arrivalStep(model, x, vehicle);
    if (arrival <= 1) {
      return null;
    }
    return onSidesOf(model, retimed(model, x, vehicle, arrival, arrival - 1), null, backend, options);
  }

  /**
   * A point of {@code model} no dearer than {@code x} (a point of the model) with every vehicle
   * keeping the sides it keeps at x, or null: every arrival and visit held, each zone slot's face
   * fixed to the side x keeps (window {@link ArrivalScan#NEAREST}), the separation binaries free
   * where a pair comes near; solved from x. Nearly a plain LP: the whole fleet moves at once along
   * its own sides, so a vehicle that gave way in the rounds with a detour (planned round another's
   * fixed path) takes the straighter line the other leaves it once both may move. On the twin
   * skiffs, from a plan with the north skiff's detour behind the south one (60.67) to the optimum
   * 59.63 in 1–2 s with ojAlgo.
   */
  static double[] onItsSides(Milp model, double[] x, SolverBackend backend, SolveOptions options) {
    return onSidesOf(model, x, x, backend, options);
  }

  /**
   * The model with every arrival and visit held at {@code point}, each zone slot's face fixed to the
   * side the point keeps (or is nearest), solved from {@code from} (null: no start); a point of the
   * whole model, or null.
   */
  private static double[] onSidesOf(Milp model, double[] point, double[] from, SolverBackend backend,
      SolveOptions options) {
    Map<Integer, Double> fixed = new HashMap<>();
    ArrivalScan.holdArrivals(model, point, null, fixed);
    ArrivalScan.fixSides(model, ArrivalScan.coveredZones(model), Map.of(), point, fixed, ArrivalScan.NEAREST);
    return ArrivalScan.solveHeld(model, fixed, point, from, backend, options);
  }

  /**
   * A better point near {@code x} (a point of the model) or null: every vehicle's arrival and
   * visits held, each vehicle's zone slots held to the side x keeps except within {@code window}
   * slots of its turns, the separation binaries free where a pair comes near; solved from x. The
   * fleet's counterpart of {@link ArrivalScan#polish}: every vehicle's turns may move at once, so a
   * crossing pair can share the way round each other.
   */
  static double[] polish(Milp model, double[] x, List<String> vehicles, int window, SolverBackend backend,
      SolveOptions options) {
    Map<Integer, Double> fixed = new HashMap<>();
    ArrivalScan.holdArrivals(model, x, null, fixed);
    Set<String> zones = ArrivalScan.coveredZones(model);
    for (String vehicle : vehicles) {
      ArrivalScan.fixSides(model, zones, ArrivalScan.turns(model, x, vehicle), x, fixed, window, vehicle);
    }
    return ArrivalScan.solveHeld(model, fixed, x, x, backend, options);
  }

  /** The step at which {@code vehicle} arrives at x, or -1. */
  static int arrivalStep(Milp model, double[] x, String vehicle) {
    for (Variable v : model.variables()) {
      if (v.origin().role().equals("arrive") && v.origin().owner().equals(vehicle) && x[v.index()] > 0.5) {
        return v.origin().step();
      }
    }
    return -1;
  }

  /**
   * x with {@code vehicle} played along its own track to arrive at step {@code to} instead of
   * {@code from}: its position at step t is its position at x at (fractional) step t·from/to,
   * interpolated; its arrival binaries at step {@code to} of the same target; its visits at the
   * matching steps. Not a solution: a point to read sides from.
   */
  static double[] retimed(Milp model, double[] x, String vehicle, int from, int to) {
    double[] z = x.clone();
    Map<String, Variable> byRoleAndStep = new HashMap<>();
    String target = null;
    for (Variable v : model.variables()) {
      String role = v.origin().role();
      if (POSITION.contains(role) && v.origin().entity().equals(vehicle)) {
        byRoleAndStep.put(role + "/" + v.origin().step(), v);
      } else if ((role.equals("arrive") || role.equals("visit")) && v.origin().owner().equals(vehicle)) {
        byRoleAndStep.put(role + "/" + v.origin().entity() + "/" + v.origin().step(), v);
        if (role.equals("arrive") && x[v.index()] > 0.5) {
          target = v.origin().entity();
        }
      }
    }
    double scale = (double) from / to;
    for (Variable v : model.variables()) {
      String role = v.origin().role();
      int t = v.origin().step();
      if (POSITION.contains(role) && v.origin().entity().equals(vehicle) && v.lower() < v.upper()) {
        double u = t * scale;
        int lo = (int) Math.floor(u);
        Variable a = byRoleAndStep.get(role + "/" + lo);
        Variable b = byRoleAndStep.get(role + "/" + (lo + 1));
        if (a != null) {
          double f = u - lo;
          z[v.index()] = b == null ? x[a.index()] : (1 - f) * x[a.index()] + f * x[b.index()];
        } else {
          z[v.index()] = x[v.index()]; // past the horizon: where the vehicle ends
        }
      } else if (role.equals("arrive") && v.origin().owner().equals(vehicle)) {
        z[v.index()] = v.origin().entity().equals(target) && t == to ? 1 : 0;
      } else if (role.equals("visit") && v.origin().owner().equals(vehicle)) {
        z[v.index()] = 0;
      } else if (role.equals("done") && v.origin().owner().equals(vehicle)) {
        z[v.index()] = t >= to ? 1 : 0;
      }
    }
    for (Variable v : model.variables()) {
      if (v.origin().role().equals("visit") && v.origin().owner().equals(vehicle) && x[v.index()] > 0.5) {
        int at = (int) Math.max(1, Math.round(v.origin().step() / scale));
        Variable moved = byRoleAndStep.get("visit/" + v.origin().entity() + "/" + at);
        z[(moved == null ? v : moved).index()] = 1;
      }
    }
    return z;
  }

  /**
   * Fixes the separation binaries of every slot where, at {@code point}, some face holds with a
   * margin of at least the separation distance itself (along that axis the pair is twice the
   * separation apart, far enough that the solve will not bring them together): that face at 1, the
   * slot's others at 0. Slots where a pair comes nearer keep their binaries free (freed, if an
   * earlier call fixed them).
   */
  static void fixFarSeparation(Milp model, double[] point, Map<Integer, Double> fixed) {
    Map<Integer, Double> margin = new HashMap<>();
    Map<Integer, Double> distance = new HashMap<>();
    for (Row r : model.rows()) {
      if (!r.origin().role().equals("separate")) {
        continue;
      }
      // sign·(q_a − q_b) − M b ≥ D − M: with b = 1 the row asks sign·(q_a − q_b) ≥ D
      for (int i = 0; i < r.cols().length; i++) {
        int c = r.cols()[i];
        if (!model.variables().get(c).origin().role().equals("separate-binary")) {
          continue;
        }
        double rest = 0;
        for (int j = 0; j < r.cols().length; j++) {
          rest += j == i ? 0 : r.coefs()[j] * point[r.cols()[j]];
        }
        double d = r.lower() - r.coefs()[i];
        margin.merge(c, rest - d, Math::min);
        distance.put(c, d);
      }
    }
    for (Row cover : model.rows()) {
      if (!cover.origin().role().equals("separate-cover")) {
        continue;
      }
      int best = -1;
      for (int c : cover.cols()) {
        if (margin.containsKey(c)) {
          fixed.remove(c); // as an earlier point left it: this point decides
          best = best < 0 || margin.get(c) > margin.get(best) ? c : best;
        }
      }
      if (best < 0 || margin.get(best) < distance.get(best)) {
        continue;
      }
      for (int c : cover.cols()) {
        if (margin.containsKey(c) && model.variables().get(c).lower() < model.variables().get(c).upper()) {
          fixed.put(c, c == best ? 1.0 : 0.0);
        }
      }
    }
  }
}
