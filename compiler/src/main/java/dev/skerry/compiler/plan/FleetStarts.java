package dev.skerry.compiler.plan;

import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A warm start for a fleet by planning its vehicles one after another (prioritised planning, common
 * practice): round i lowers the scenario with the first i vehicles of the order, fixes the states
 * and inputs of the first i−1 to the previous round's plan, and finds a plan for vehicle i, which
 * must keep clear of the earlier vehicles' fixed paths and take a target they left: by the
 * zone-by-zone heuristic of {@link WarmStarts} (the earlier vehicles' rows are fixed data, so its
 * restricted models hold one vehicle's nearby zones), else by solving the round's model. Each round
 * gets an equal share of the time limit (one share is left for the solve proper) and costs about
 * one vehicle alone; for a slow backend (the arrival scan) the rounds share the scan's budget, a
 * round's unused time passing on to the next, and time left after the last goes to planning each
 * vehicle again round the others ({@link #improve}); a slow backend plans the reverse order too
 * and keeps the cheaper plan (the order decides who gives way where two vehicles cross; an order
 * whose earlier vehicles leave a later one no way through may have a reverse that works, tried when
 * the given order fails with time left): the given order's rounds may take the whole budget, its
 * improvement ends at half of it.
 * The last round's model is the full model with all but the last vehicle fixed: its solution is a
 * point of the full model, handed back only when the full model accepts it. An earlier vehicle's
 * fixed path may leave a later one no way through; when every order tried fails so, there is no
 * start and the reason says which round of each failed.
 */
public final class FleetStarts {
  /** Roles of the columns that fix a vehicle's path: states and inputs, plan view and altitude. */
  private static final Set<String> PATH = Set.of("px", "py", "vx", "vy", "ux", "uy", "pz", "vz", "uz");

  private FleetStarts() {}

  /**
   * A start for {@code model} (the lowered {@code s}), each round's solve capped at {@code cap}. A
   * slow backend plans the fleet in two orders, the given one and its reverse, each improved
   * ({@link #improve}), and keeps the cheaper: which vehicle gives way decides the plan (below).
   */
  public static WarmStarts.Start find(Scenario s, Milp model, SolverBackend backend, SolveOptions options,
      Duration cap) {
    long t0 = System.nanoTime();
    try {
      if (!backend.branchesSlowly()) {
        InTurn r = inTurn(s, model, s.vehicles(), backend, options, cap, null);
        return r.values() == null ? none(t0, r.rounds(), r.reason())
            : new WarmStarts.Start(r.values(), model.objective().value(r.values()), WarmStarts.since(t0), r.rounds(),
                0, "");
      }
      // A slow backend's rounds share the scan's time; what they leave goes to improving their plan.
      // The given order's rounds may take the whole budget (as many vehicles may need it), its
      // improvement what is left of the first half; the reverse order has the rest. On the twin
      // skiffs the given order has the south skiff give way (59.71 most often, improved or not),
      // the reverse the north one, which the moves take to the optimum (59.63).
      Duration budget = Planner.scanBudget(options);
      List<List<Vehicle>> orders = new ArrayList<>(List.of(s.vehicles()));
      if (s.vehicles().size() > 1) {
        List<Vehicle> reverse = new ArrayList<>(s.vehicles());
        Collections.reverse(reverse);
        orders.add(reverse);
      }
      double[] best = null;
      int rounds = 0;
      List<String> reasons = new ArrayList<>();
      for (int k = 0; k < orders.size(); k++) {
        Duration left = left(budget, t0);
        if (left.isZero() || options.cancel().isCancelled()) {
          break;
        }
        InTurn r = inTurn(s, model, orders.get(k), backend, options, cap, left);
        rounds += r.rounds();
        if (r.values() == null) {
          reasons.add(r.reason());
          continue;
        }
        // this order's improvement ends where its share of the budget does
        Duration share = budget.multipliedBy(k + 1).dividedBy(orders.size());
        Improved better = improve(s, model, r.values(), backend, options.withWarmStart(null),
            share.minus(WarmStarts.since(t0)));
        rounds += better.rounds();
        if (best == null || model.objective().value(better.values()) < model.objective().value(best)) {
          best = better.values();
        }
      }
      if (best == null) {
        return none(t0, rounds, reasons.isEmpty() ? "no time left" : String.join("; in reverse order: ", reasons));
      }
      return new WarmStarts.Start(best, model.objective().value(best), WarmStarts.since(t0), rounds, 0, "");
    } catch (RuntimeException e) {
      return none(t0, 0, "heuristic failed: " + e);
    }
  }

  /** The point the rounds gave (null if none, and why), and the solves they took. */
  private record InTurn(double[] values, int rounds, String reason) {}

  /**
   * The vehicles planned in turn, each round the ones before: each round's solve capped at {@code
   * cap}, or for a slow backend ({@code budget} not null) the rounds sharing {@code budget}, a
   * round's unused time passing on to the next.
   */
  private static InTurn inTurn(Scenario s, Milp model, List<Vehicle> order, SolverBackend backend,
      SolveOptions options, Duration cap, Duration budget) {
    long t0 = System.nanoTime();
    int n = s.vehicles().size();
    boolean slow = budget != null;
    Duration perRound = slow ? budget.dividedBy(n)
        : options.timeLimit().map(l -> l.dividedBy(n + 1)).orElse(cap.multipliedBy(2));
    SolveOptions sub = options.withWarmStart(null).withTimeLimit(perRound);
    Milp previous = null;
    double[] values = null;
    Set<String> fixed = new HashSet<>();
    for (int i = 1; i <= n; i++) {
      if (options.cancel().isCancelled()) {
        return new InTurn(null, i - 1, "cancelled");
      }
      if (slow) {
        // what an earlier round left unused passes on: the first skiff of the twin skiffs takes
        // 0.6 s of its half, and the second, which must find its way round the first, then has
        // caps twice as long for its small solves
        Duration unused = budget.minus(WarmStarts.since(t0));
        perRound = unused.isNegative() ? Duration.ofMillis(1) : unused.dividedBy(n - i + 1);
        sub = sub.withTimeLimit(perRound);
      }
      Vehicle next = order.get(i - 1);
      Milp round = round(s, order.subList(0, i), previous, values, fixed, slow);
      // The zone-by-zone heuristic first (for a slow backend the arrival scan, which needs the
      // earlier vehicles' binaries fixed too so that one set of arrival binaries is left): with the
      // earlier vehicles fixed, its models hold one vehicle's nearby zones only; the round's whole
      // model when it finds nothing.
      WarmStarts.Start lazy = slow && ArrivalScan.appliesToSomeTarget(round)
          ? ArrivalScan.find(s, round, backend, sub, perRound)
          : WarmStarts.find(round, backend, sub, cap);
      if (lazy.found()) {
        values = lazy.values();
      } else {
        // a slow backend's scan may have used its whole share; the round's model gets what is left
        Duration left = perRound.minus(lazy.wallTime());
        SolveResult r = backend.solve(round, slow ? sub.withTimeLimit(left.isNegative() || left.isZero()
            ? Duration.ofMillis(1) : left) : sub);
        if (!r.status().hasSolution()) {
          return new InTurn(null, i, "vehicle " + next.name() + " after the earlier ones: " + r.summary()
              + (lazy.reason().isEmpty() ? "" : " (before that: " + lazy.reason() + ")"));
        }
        values = r.values();
      }
      previous = round;
      fixed.add(next.name());
    }
    if (previous.columnCount() != model.columnCount()) {
      return new InTurn(null, n, "the last round's model differs from the full one");
    }
    double violation = model.maxViolation(values);
    if (!(violation <= WarmStarts.TOLERANCE)) {
      return new InTurn(null, n, "the start violates the model by " + violation);
    }
    return new InTurn(values, n, "");
  }

  private record Improved(double[] values, int rounds) {}

  /** The best point of {@link #improve} so far. */
  private static final class Incumbent {
    private final Milp model;
    private double[] x;

    Incumbent(Milp model, double[] x) {
      this.model = model;
      this.x = x;
    }

    /** Takes {@code y} (may be null) if it is a point of the model that lowers the objective; whether it did. */
    boolean offer(double[] y) {
      if (y == null || !lowers(model, y, model.objective().value(x))) {
        return false;
      }
      x = y;
      return true;
    }
  }

  /**
   * For a slow backend, with time left after the rounds, moves that keep a point only when it lowers
   * the whole objective, in passes until one improves nothing or the time is out:
   *
   * <ol>
   *   <li>the whole fleet solved again with every vehicle on the sides of the zones it keeps ({@link
   *       SoonerArrival#onItsSides}): a vehicle planned round another's fixed path gave way with a
   *       detour, which straightens once both may move (the twin skiffs planned south first: the
   *       rounds' 60.67 to the optimum 59.63 in 1–2 s);
   *   <li>each vehicle on the sides of its shortest way round the zones, the fleet solved round it
   *       ({@link #onItsGuide});
   *   <li>each vehicle a step sooner with the whole fleet solved again round it, the latest first
   *       ({@link SoonerArrival#of}): the rounds make a later vehicle give way to an earlier one's
   *       fixed path, and this move lets the earlier one bend aside (on the twin skiffs it took the
   *       rounds' 61.83 to 59.64);
   *   <li>every vehicle's turns free to move at once, the separation binaries free where a pair
   *       comes near ({@link SoonerArrival#polish});
   *   <li>each vehicle planned again with every other vehicle's path and arrival held (a fresh
   *       arrival scan on the full model so fixed), then its route polished with its turns free to
   *       move ({@link ArrivalScan#polish}): the rounds plan each vehicle round the earlier ones
   *       only, and this plans the first again round the later ones.
   * </ol>
   *
   * <p>None of these moves changes which vehicle gives way where two cross: on the twin skiffs the
   * optimum has the north skiff a step later and the south one a step sooner than the plan in the
   * given order (north first, 59.71 most often), which is why {@link #find} plans the reverse order
   * too.
   */
  private static Improved improve(Scenario s, Milp model, double[] start, SolverBackend backend, SolveOptions sub,
      Duration budget) {
    long t0 = System.nanoTime();
    Incumbent best = new Incumbent(model, start);
    List<String> names = s.vehicles().stream().map(Vehicle::name).toList();
    int solves = 0;
    boolean better = true;
    while (better) {
      better = false;
      List<Vehicle> latestFirst = new ArrayList<>(s.vehicles());
      double[] at = best.x;
      latestFirst.sort((a, b) -> Integer.compare(SoonerArrival.arrivalStep(model, at, b.name()),
          SoonerArrival.arrivalStep(model, at, a.name())));
      Duration first = left(budget, t0);
      if (first.isZero() || sub.cancel().isCancelled()) {
        return new Improved(best.x, solves);
      }
      better |= best.offer(SoonerArrival.onItsSides(model, best.x, backend,
          sub.withTimeLimit(first.multipliedBy(3).dividedBy(4))));
      solves++;
      for (Vehicle v : s.vehicles()) {
        Duration left = left(budget, t0);
        if (left.isZero() || sub.cancel().isCancelled()) {
          return new Improved(best.x, solves);
        }
        double[] guided = onItsGuide(s, model, best.x, v, backend, sub.withTimeLimit(left.dividedBy(4)));
        better |= best.offer(guided);
        solves += guided == null ? 0 : 1;
      }
      for (Vehicle v : latestFirst) {
        Duration left = left(budget, t0);
        if (left.isZero() || sub.cancel().isCancelled()) {
          return new Improved(best.x, solves);
        }
        better |= best.offer(SoonerArrival.of(model, best.x, v.name(), backend, sub.withTimeLimit(left.dividedBy(2))));
        solves++;
      }
      Duration spare = left(budget, t0);
      if (spare.isZero() || sub.cancel().isCancelled()) {
        return new Improved(best.x, solves);
      }
      better |= best.offer(SoonerArrival.polish(model, best.x, names, POLISH_WINDOW, backend,
          sub.withTimeLimit(spare.dividedBy(2))));
      solves++;
      for (Vehicle v : s.vehicles()) {
        Duration left = left(budget, t0);
        if (left.isZero() || sub.cancel().isCancelled()) {
          return new Improved(best.x, solves);
        }
        Milp held = heldRoundOthers(s, model, best.x, v);
        if (!ArrivalScan.applies(held)) {
          continue;
        }
        WarmStarts.Start again = ArrivalScan.find(s, held, backend, sub.withTimeLimit(left), left.dividedBy(2));
        solves += again.rounds();
        if (best.offer(again.values())) {
          better = true;
          held = heldRoundOthers(s, model, best.x, v);
        }
        left = left(budget, t0);
        if (left.isZero()) {
          return new Improved(best.x, solves);
        }
        better |= best.offer(ArrivalScan.polish(held, best.x, v.name(), POLISH_WINDOW, backend,
            sub.withTimeLimit(left.dividedBy(2))));
        solves++;
      }
    }
    return new Improved(best.x, solves);
  }

  /**
   * A point of {@code model} with vehicle {@code v} on the sides of its shortest way round the zones
   * ({@link GuidePath}, played to arrive at its step at x) and every other vehicle on the sides it
   * keeps at x, the fleet solved round it with every arrival held; null when the guide's sides are
   * the ones v keeps already, or there is no guide or no point. The rounds plan each vehicle from a
   * scan whose small solves stop at a 2 % gap, so a vehicle planned alone may take the longer way
   * round a zone (the twin skiffs planned south first: now and then the south skiff north of the
   * seal rock, 61.83; this move puts it south of the rock, 61.54, and the north skiff's step-sooner
   * move then finds the optimum, 59.63).
   */
  static double[] onItsGuide(Scenario s, Milp model, double[] x, Vehicle v, SolverBackend backend,
      SolveOptions options) {
    GuidePath guide;
    try {
      guide = GuidePath.of(s, heldRoundOthers(s, model, x, v)).orElse(null);
    } catch (RuntimeException e) {
      return null; // a move is a help, never a reason to fail
    }
    int arrival = SoonerArrival.arrivalStep(model, x, v.name());
    if (guide == null || arrival < 1) {
      return null;
    }
    double[] point = guide.at(arrival);
    Set<String> zones = ArrivalScan.coveredZones(model);
    Map<Integer, Double> now = new HashMap<>();
    ArrivalScan.fixSides(model, zones, Map.of(), x, now, ArrivalScan.NEAREST, v.name());
    Map<Integer, Double> fixed = new HashMap<>();
    ArrivalScan.fixSides(model, zones, Map.of(), point, fixed, ArrivalScan.NEAREST, v.name());
    if (fixed.equals(now)) {
      return null;
    }
    ArrivalScan.holdArrivals(model, point, v.name(), fixed);
    for (Vehicle o : s.vehicles()) {
      if (o != v) {
        ArrivalScan.holdArrivals(model, x, o.name(), fixed);
        ArrivalScan.fixSides(model, zones, Map.of(), x, fixed, ArrivalScan.NEAREST, o.name());
      }
    }
    return ArrivalScan.solveHeld(model, fixed, point, null, backend, options);
  }

  /** What is left of {@code budget} since {@code t0}, never negative. */
  private static Duration left(Duration budget, long t0) {
    Duration left = budget.minus(WarmStarts.since(t0));
    return left.isNegative() ? Duration.ZERO : left;
  }

  /** {@code model} with every vehicle but {@code v} held at {@code x}, and {@code v} held to its target there. */
  private static Milp heldRoundOthers(Scenario s, Milp model, double[] x, Vehicle v) {
    Set<String> others = new HashSet<>();
    s.vehicles().stream().filter(o -> o != v).forEach(o -> others.add(o.name()));
    return toItsTarget(fix(model, model, x, others, true), x, v.name());
  }

  /** Whether {@code x} satisfies {@code model} and costs less than {@code cost} by more than {@link #IMPROVEMENT}. */
  private static boolean lowers(Milp model, double[] x, double cost) {
    return model.maxViolation(x) <= WarmStarts.TOLERANCE
        && model.objective().value(x) < cost - IMPROVEMENT * Math.max(1, Math.abs(cost));
  }

  /**
   * {@code model} with vehicle {@code owner}'s arrival binaries at targets other than the one it
   * reaches at {@code x} fixed at 0 (a vehicle the MILP assigns a target keeps the one it has), so
   * that one set of arrival binaries is left for the scan.
   */
  private static Milp toItsTarget(Milp model, double[] x, String owner) {
    String reached = null;
    for (Variable v : model.variables()) {
      if (v.origin().role().equals("arrive") && v.origin().owner().equals(owner) && x[v.index()] > 0.5) {
        reached = v.origin().entity();
      }
    }
    List<Variable> vars = new ArrayList<>(model.columnCount());
    for (Variable v : model.variables()) {
      boolean elsewhere = reached != null && v.origin().role().equals("arrive") && v.origin().owner().equals(owner)
          && !v.origin().entity().equals(reached);
      vars.add(elsewhere ? new Variable(v.index(), v.name(), v.type(), 0, 0, v.origin()) : v);
    }
    return new Milp(model.name(), vars, model.rows(), model.objective());
  }

  /** Slots either side of a turn of a vehicle's route that polishing leaves free. */
  static final int POLISH_WINDOW = 2;

  /** A replanned vehicle is kept when it lowers the objective by more than this, relative. */
  static final double IMPROVEMENT = 1e-9;

  /**
   * The scenario with its first {@code count} vehicles; targets named by the vehicles left out are
   * dropped too, so a vehicle that names none cannot take a target a later vehicle needs.
   */
  static Scenario firstVehicles(Scenario s, int count) {
    return withVehicles(s, s.vehicles().subList(0, count));
  }

  /**
   * The scenario with the vehicles of {@code planned} only, in the scenario's order (so that the
   * round with all of them lowers to the full model), and without the targets the others name.
   */
  static Scenario withVehicles(Scenario s, List<Vehicle> planned) {
    List<Vehicle> kept = new ArrayList<>();
    Set<String> namedByOthers = new HashSet<>();
    for (Vehicle v : s.vehicles()) {
      if (planned.contains(v)) {
        kept.add(v);
      } else if (v.target() != null) {
        namedByOthers.add(v.target());
      }
    }
    List<Target> targets = new ArrayList<>();
    for (Target t : s.targets()) {
      if (!namedByOthers.contains(t.name())) {
        targets.add(t);
      }
    }
    return s.withVehiclesAndTargets(kept, targets);
  }

  /** {@link #firstVehicles}, for tests in other packages. */
  public static Scenario firstVehiclesForTest(Scenario s, int count) {
    return firstVehicles(s, count);
  }

  /** The model of round {@code i} in the scenario's own order (below). */
  static Milp round(Scenario s, int i, Milp previous, double[] values, Set<String> fixed, boolean arrivals) {
    return round(s, s.vehicles().subList(0, i), previous, values, fixed, arrivals);
  }

  /**
   * The model of the round that plans the last of {@code planned}: those vehicles, those in {@code
   * fixed} held to the previous round's plan ({@code previous} and {@code values}; null in round 1),
   * with their arrival binaries too when {@code arrivals}.
   */
  static Milp round(Scenario s, List<Vehicle> planned, Milp previous, double[] values, Set<String> fixed,
      boolean arrivals) {
    Milp round = Lowering.lower(withVehicles(s, planned));
    return previous == null ? round : fix(round, previous, values, fixed, arrivals);
  }

  /**
   * {@code round} with the path columns of the vehicles in {@code vehicles} fixed to their values in
   * the earlier round, and with {@code arrivals} their arrival binaries too, found by target and
   * step (a one-vehicle round names them without the vehicle).
   */
  private static Milp fix(Milp round, Milp earlier, double[] values, Set<String> vehicles, boolean arrivals) {
    Map<String, Variable> arrive = new HashMap<>();
    for (Variable v : earlier.variables()) {
      if (v.origin().role().equals("arrive")) {
        arrive.put(v.origin().owner() + "/" + v.origin().entity() + "/" + v.origin().step(), v);
      }
    }
    List<Variable> vars = new ArrayList<>(round.columnCount());
    for (Variable v : round.variables()) {
      boolean path = PATH.contains(v.origin().role()) && vehicles.contains(v.origin().entity());
      Variable then = path ? earlier.variable(v.name()) : null;
      if (arrivals && v.origin().role().equals("arrive") && vehicles.contains(v.origin().owner())) {
        String rest = "/" + v.origin().entity() + "/" + v.origin().step();
        then = arrive.getOrDefault(v.origin().owner() + rest, arrive.get(rest));
      }
      if (then == null) {
        vars.add(v);
      } else {
        double x = Math.max(v.lower(), Math.min(v.upper(), values[then.index()]));
        vars.add(new Variable(v.index(), v.name(), v.type(), x, x, v.origin()));
      }
    }
    return new Milp(round.name(), vars, round.rows(), round.objective());
  }

  private static WarmStarts.Start none(long t0, int rounds, String reason) {
    return new WarmStarts.Start(null, Double.NaN, WarmStarts.since(t0), rounds, 0, reason);
  }
}
