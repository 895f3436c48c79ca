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
import java.util.function.Function;

/**
 * A warm start for a fleet by planning its vehicles one after another (prioritised planning, common
 * practice): round i lowers the scenario with the first i vehicles of the order, fixes the states
 * and inputs of the first i−1 to the previous round's plan, and finds a plan for vehicle i, which
 * must keep clear of the earlier vehicles' fixed paths and take a target they left: by the
 * zone-by-zone heuristic of {@link WarmStarts} (the earlier vehicles' rows are fixed data, so its
 * restricted models hold one vehicle's nearby zones), else by solving the round's model. Each round
 * gets an equal share of the time limit (one share is left for the solve proper) and costs about
 * one vehicle alone; for a slow backend (the arrival scan) the rounds share the scan's budget, a
 * round's unused time passing on to the next. A slow backend plans the reverse order too (the
 * order decides who gives way where two vehicles cross; an order whose earlier vehicles leave a
 * later one no way through may have a reverse that works): the given order's rounds may take the
 * whole budget, the reverse's what they leave, planned only when at least as much is left as the
 * given order's took (or the given order failed). The time left then goes to moves that plan
 * vehicles again round the others ({@link Moves}): each order's plan through the cheap moves, the
 * cheapest plan after them through all the moves.
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
   * slow backend plans the fleet in two orders, the given one and its reverse, improves each plan
   * ({@link Moves}) and keeps the cheapest: which vehicle gives way decides the plan (below).
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
      // A slow backend's rounds share the scan's time: the given order's rounds may take all of it
      // (as many vehicles may need), the reverse order's what they leave. Then each order's plan
      // goes through the cheap moves, and the cheapest through all of them. On the twin skiffs the
      // given order has the south skiff give way (59.71, which no move improves); the reverse the
      // north one, whose rounds give 61.94 and whose cheap moves reach the optimum, 59.63, in 4–7 s.
      Duration budget = Planner.scanBudget(options);
      List<List<Vehicle>> orders = new ArrayList<>(List.of(s.vehicles()));
      if (s.fleet()) {
        List<Vehicle> reverse = new ArrayList<>(s.vehicles());
        Collections.reverse(reverse);
        orders.add(reverse);
      }
      List<double[]> planned = new ArrayList<>();
      int rounds = 0;
      List<String> reasons = new ArrayList<>();
      for (List<Vehicle> order : orders) {
        Duration left = left(budget, t0);
        // another order's rounds cost about what the first one's did: with less than that left they
        // would take the time the first plan's moves need, and most likely fail
        boolean room = planned.isEmpty() || left.compareTo(WarmStarts.since(t0)) >= 0;
        if (left.isZero() || !room || options.cancel().isCancelled()) {
          break;
        }
        InTurn r = inTurn(s, model, order, backend, options, cap, left);
        rounds += r.rounds();
        if (r.values() == null) {
          reasons.add(r.reason());
        } else {
          planned.add(r.values());
        }
      }
      if (planned.isEmpty()) {
        return none(t0, rounds, reasons.isEmpty() ? "no time left" : String.join("; in reverse order: ", reasons));
      }
      // the plans' cheap moves share what is left equally, a plan's unused time passing on; the
      // cheapest plan then has the rest for all the moves
      SolveOptions sub = options.withWarmStart(null);
      Moves best = null;
      for (int k = 0; k < planned.size(); k++) {
        Moves moves = new Moves(s, model, planned.get(k), backend, sub)
            .until(left(budget, t0).dividedBy(planned.size() - k)).cheap();
        rounds += moves.solves;
        if (best == null || moves.cost() < best.cost()) {
          best = moves;
        }
      }
      int before = best.solves;
      best.until(left(budget, t0)).all();
      rounds += best.solves - before;
      return new WarmStarts.Start(best.x, best.cost(), WarmStarts.since(t0), rounds, 0, "");
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
      // the scan's guide is the shortest way of the round's free vehicle, read in the round's own
      // scenario (alone in round 1 its columns carry no vehicle's name: read in the whole fleet's,
      // the reverse order's first round was once guided from the first vehicle's start)
      Scenario planned = withVehicles(s, order.subList(0, i));
      Milp round = round(planned, previous, values, fixed, slow);
      // The zone-by-zone heuristic first (for a slow backend the arrival scan, which needs the
      // earlier vehicles' binaries fixed too so that one set of arrival binaries is left): with the
      // earlier vehicles fixed, its models hold one vehicle's nearby zones only; the round's whole
      // model when it finds nothing.
      WarmStarts.Start lazy = slow && ArrivalScan.appliesToSomeTarget(round)
          ? ArrivalScan.find(planned, round, backend, sub, perRound)
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

  /**
   * For a slow backend, moves that improve a point of the full model, each kept only when it lowers
   * the whole objective, in passes until one improves nothing or the time is out. The cheap moves:
   *
   * <ol>
   *   <li>the whole fleet solved again with every vehicle on the sides of the zones it keeps ({@link
   *       SoonerArrival#onItsSides}): a vehicle planned round another's fixed path gave way with a
   *       detour, which straightens once both may move (the twin skiffs planned south first: the
   *       rounds' 61.94 to 61.54; a plan with the north skiff's detour behind the south one, 60.67,
   *       to the optimum 59.63 in 1–2 s);
   *   <li>each vehicle on the sides of its shortest way round the zones, the fleet solved round it
   *       ({@link #onItsGuide});
   *   <li>each vehicle a step sooner with the whole fleet solved again round it, the latest first
   *       ({@link SoonerArrival#of}): the rounds make a later vehicle give way to an earlier one's
   *       fixed path, and this move lets the earlier one bend aside (on the twin skiffs planned
   *       south first it takes the north skiff from step 16 to 15, 61.54 to the optimum 59.63).
   * </ol>
   *
   * <p>The dear ones, which search longer:
   *
   * <ol>
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
   *
   * <p>A move is not run again at a point where it ran before, unless it now has twice the time: it
   * would find the same.
   */
  private static final class Moves {
    private final Scenario s;
    private final Milp model;
    private final SolverBackend backend;
    private final SolveOptions sub;
    /** For each move, when it last ran. */
    private final Map<String, Ran> ranAt = new HashMap<>();
    private long deadline;
    private double[] x;
    /** How many times x has been improved. */
    private int version;
    private int solves;

    Moves(Scenario s, Milp model, double[] start, SolverBackend backend, SolveOptions sub) {
      this.s = s;
      this.model = model;
      this.backend = backend;
      this.sub = sub;
      this.x = start;
    }

    /** These moves, to stop {@code budget} from now. */
    Moves until(Duration budget) {
      deadline = System.nanoTime() + budget.toNanos();
      return this;
    }

    double cost() {
      return model.objective().value(x);
    }

    /** The cheap moves, in passes until one improves nothing or the time is out. */
    Moves cheap() {
      while (!out() && cheapPass()) {
        // again from the better point
      }
      return this;
    }

    /** All the moves, in passes until one improves nothing or the time is out. */
    Moves all() {
      boolean better = true;
      while (better && !out()) {
        better = cheapPass();
        better |= dearPass();
      }
      return this;
    }

    private boolean cheapPass() {
      boolean better = attempt("sides", 3, 4,
          cap -> SoonerArrival.onItsSides(model, x, backend, sub.withTimeLimit(cap)));
      for (Vehicle v : s.vehicles()) {
        better |= attempt("guide " + v.name(), 1, 4,
            cap -> onItsGuide(s, model, x, v, backend, sub.withTimeLimit(cap)));
      }
      List<Vehicle> latestFirst = new ArrayList<>(s.vehicles());
      double[] at = x;
      latestFirst.sort((a, b) -> Integer.compare(SoonerArrival.arrivalStep(model, at, b.name()),
          SoonerArrival.arrivalStep(model, at, a.name())));
      for (Vehicle v : latestFirst) {
        better |= attempt("sooner " + v.name(), 1, 2,
            cap -> SoonerArrival.of(model, x, v.name(), backend, sub.withTimeLimit(cap)));
      }
      return better;
    }

    private boolean dearPass() {
      List<String> names = s.vehicles().stream().map(Vehicle::name).toList();
      boolean better = attempt("polish", 1, 2,
          cap -> SoonerArrival.polish(model, x, names, POLISH_WINDOW, backend, sub.withTimeLimit(cap)));
      for (Vehicle v : s.vehicles()) {
        Milp held = heldRoundOthers(s, model, x, v);
        if (!ArrivalScan.applies(held)) {
          continue;
        }
        better |= attempt("scan " + v.name(), 1, 1, cap -> {
          WarmStarts.Start again = ArrivalScan.find(s, held, backend, sub.withTimeLimit(cap), cap.dividedBy(2));
          solves += again.rounds() - 1;
          return again.values();
        });
        // held again: the scan may have moved x
        better |= attempt("polish " + v.name(), 1, 2, cap -> ArrivalScan.polish(heldRoundOthers(s, model, x, v),
            x, v.name(), POLISH_WINDOW, backend, sub.withTimeLimit(cap)));
      }
      return better;
    }

    /** When a move last ran: at which point (by {@link #version}) and with how much time. */
    private record Ran(int version, Duration cap) {}

    /**
     * Runs {@code move} from x with {@code num/den} of the time left, unless the time is out or it
     * ran from this very point before with at least half that time (a move that found nothing finds
     * nothing again, unless it was cut short); takes its point if that lowers the objective.
     */
    private boolean attempt(String name, int num, int den, Function<Duration, double[]> move) {
      Duration cap = left().multipliedBy(num).dividedBy(den);
      Ran before = ranAt.get(name);
      boolean triedHere = before != null && before.version() == version
          && cap.compareTo(before.cap().multipliedBy(2)) < 0;
      if (out() || triedHere) {
        return false;
      }
      ranAt.put(name, new Ran(version, cap));
      double[] y = move.apply(cap);
      solves++;
      if (y == null || !lowers(model, y, cost())) {
        return false;
      }
      x = y;
      version++;
      return true;
    }

    private Duration left() {
      long n = deadline - System.nanoTime();
      return n <= 0 ? Duration.ZERO : Duration.ofNanos(n);
    }

    private boolean out() {
      return left().isZero() || sub.cancel().isCancelled();
    }
  }

  /**
   * A point of {@code model} with vehicle {@code v} on the sides of its shortest way round the zones
   * ({@link GuidePath}, played to arrive at its step at x) and every other vehicle on the sides it
   * keeps at x, the fleet solved round it with every arrival held; null when the guide's sides are
   * the ones v keeps already, or there is no guide or no point. A vehicle planned round another's
   * fixed path, or by small solves that stop at a 2 % gap, may keep other sides than its shortest
   * way's (the twin skiffs planned south first with the south skiff forced north of the seal rock,
   * 61.83: this move puts it south of the rock, 61.54, and the north skiff's step-sooner move then
   * finds the optimum, 59.63; {@code FleetMovesTest}).
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
    return round(withVehicles(s, planned), previous, values, fixed, arrivals);
  }

  /** As above, for the scenario of the round's vehicles ({@link #withVehicles}). */
  private static Milp round(Scenario planned, Milp previous, double[] values, Set<String> fixed, boolean arrivals) {
    Milp round = Lowering.lower(planned);
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
