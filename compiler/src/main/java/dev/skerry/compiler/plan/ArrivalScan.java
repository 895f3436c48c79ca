package dev.skerry.compiler.plan;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * A feasible point of a one-vehicle model for a backend whose branch and bound is slow (ojAlgo),
 * found by small MILPs: the arrival step is fixed and only the zone slots the path runs into keep
 * their face binaries free.
 *
 * <p>Why: the zone-by-zone heuristic ({@link WarmStarts}) solves models with every arrival binary
 * and every face binary of the zones put back. ojAlgo cannot: on the harbour example the first such
 * model (48 arrival and waypoint binaries, no zones) took it 15–25 s, and with three zones put back
 * and the arrival fixed it found nothing in 30 s. With the arrival fixed and no zones it answers in
 * 0.3–3 s; with a few dozen face binaries about as fast (BENCHMARKS.md).
 *
 * <ol>
 *   <li>Solve the LP relaxation of the zone-free model; its mean arrival step, rounded down, is the
 *       first step tried (the relaxation flies through every zone, so an earlier step seldom gives
 *       a point).
 *   <li>For an arrival step k: fix the arrival binaries at k. Fix each waypoint's visit binaries at
 *       the step the zone-free LP visits on average, or the nearest step around it for which that
 *       LP still has a point ({@link #VISIT_TRIES} tried; none: the visit stays free). Solve the
 *       zone-free model. Then, while the point runs into zones: put those zones back; every slot of
 *       theirs within a window of a broken slot (now or in an earlier round) keeps its face
 *       binaries free, every other slot gets the face that holds at the point with the largest
 *       margin (a side the path already keeps), and the rows those fixings leave idle are dropped.
 *       Solve again. A solve with no point first moves the fixed visits one step later, once (a
 *       path that goes round the zones reaches a waypoint later than the zone-free LP's: on the
 *       harbour the optimum visits the gauge at step 17, the LP at 16), then widens the window
 *       ({@link #WINDOWS}). When the point clears every zone it is a start, and later steps begin
 *       with the window that gave it.
 *   <li>The steps are tried galloping (k, k + 1, k + 3, k + 7, ...) until one gives a point, then
 *       one by one downwards from it until one gives none; the cheapest point is kept. (Downwards
 *       rather than by bisection: for ojAlgo a step with no point costs 5–12 s to refute, one that
 *       has a point less, and the best step is most often just below the first found.) A step that
 *       gives no point is not proven infeasible (a solve may stop at its limit), so the start is
 *       not claimed optimal.
 * </ol>
 *
 * <p>With a guide ({@link GuidePath}, the shortest path round the zones, for plan-view scenarios)
 * each step's first round puts every zone back at once with every slot on the guide's side and the
 * visits where the guide passes the waypoints: a plain LP. Steps are then tried one by one upwards
 * from the guide's fastest, each with the guide's sides and then with the slots round the guide's
 * turns freed, and the first that gives a point ends the scan (every step below it was tried). On
 * the full warehouse the zone-free LP's path crosses two shelf rows and the unguided scan found no
 * point in 45 s; guided it found the optimum in 1.3 s, and the harbour's in 1.4 s (BENCHMARKS.md).
 * Where the guide's sides fit at no step, the unguided scan runs in the time left.
 *
 * <p>Only for a model with one set of free arrival binaries (one vehicle, one target); anything else
 * gets an empty result, as does any failure, never an exception.
 */
public final class ArrivalScan {
  /**
   * Slots on each side of a broken slot that keep their face binaries free: the first, then wider
   * when a solve gives no point (the path may have to change sides further away, as round the end
   * of a long shelf), the last being the whole zone.
   */
  static final int[] WINDOWS = {2, 6, Integer.MAX_VALUE / 2};

  /**
   * A window of 0: every slot of the zones put back gets a face fixed, the one that holds at the
   * point or, where none does, the one the point is nearest to (a plain LP, quick even for ojAlgo).
   * Worth trying first where the zones are large boxes the path must run alongside, such as
   * cluster boxes of known members ({@link ClusterStarts}): there the windows round every broken
   * slot keep hundreds of face binaries free.
   */
  static final int NEAREST = 0;

  /**
   * The windows with a guide ({@link GuidePath}): its sides first (a plain LP), then the slots round
   * its turns freed; not whole zones, which for ojAlgo cost as much as the full model.
   */
  static final int[] GUIDED = {NEAREST, 2, 6};

  /**
   * One small solve may take at most this share of the budget: a solve stopped at its limit with a
   * point still gives the next round its sides, and a step that will not work does not eat the
   * whole budget.
   */
  static final int ROUND_SHARE = 4;

  /**
   * The relative gap of each small solve, at least: a start needs a point, not a proof, and a
   * branch and bound that may stop at 2 % ends sooner and leaves more of the budget for the rounds.
   */
  static final double SUB_GAP = 0.02;

  /**
   * A small solve that has a point may stop after this share of its cap: ojAlgo, with a point in
   * hand early, otherwise spent the whole cap on a 2 % proof it seldom finished (the harbour's
   * rounds at step 26: 11.3 s each), leaving no time for the step below, where the optimum was.
   * With it the harbour's scan reached 50.83 (optimum 50.80) in 32 s of its 45 s.
   */
  static final int POINT_SHARE = 4;

  /** Solves per arrival step at most (each puts back at least one zone or frees a slot). */
  public static final int MAX_ROUNDS = 12;

  private ArrivalScan() {}

  /** Whether the scan can run on {@code model}: it has exactly one set of arrival binaries. */
  public static boolean applies(Milp model) {
    return !arrivalColumns(model).isEmpty();
  }

  /** A start for {@code model} found with {@code backend} within {@code budget} in all. */
  public static WarmStarts.Start find(Milp model, SolverBackend backend, SolveOptions options, Duration budget) {
    return find(model, backend, options, budget, WINDOWS);
  }

  /**
   * Whether {@link #find(Scenario, Milp, SolverBackend, SolveOptions, Duration)} can run on {@code
   * model}: one set of free arrival binaries, or one vehicle's sets for several targets it may take.
   */
  public static boolean appliesToSomeTarget(Milp model) {
    return applies(model) || targetGroups(model).size() > 1;
  }

  /**
   * As {@link #find(Milp, SolverBackend, SolveOptions, Duration)}, guided by the shortest path round
   * the zones ({@link GuidePath}) where the scenario has one. A vehicle that may take any of several
   * targets gets a scan per target ({@link #eachTarget}).
   */
  public static WarmStarts.Start find(Scenario s, Milp model, SolverBackend backend, SolveOptions options,
      Duration budget) {
    Map<String, List<Variable>> groups = targetGroups(model);
    if (groups.size() > 1) {
      return eachTarget(s, model, groups, backend, options, budget);
    }
    GuidePath guide;
    try {
      guide = GuidePath.of(s, model).orElse(null);
    } catch (RuntimeException e) {
      guide = null; // a start is a help, never a reason to fail: the unguided scan
    }
    return guide == null ? find(model, backend, options, budget)
        : find(model, backend, options, budget, GUIDED, guide);
  }

  /**
   * A scan per target the vehicle may take, each with the other targets' arrival binaries fixed at
   * 0 and an equal share of what is left of the budget (a target scanned quickly passes its time
   * on); the cheapest point kept. Without it a vehicle the MILP assigns a target had no scan: two
   * skiffs and two berths on the harbour got no start from ojAlgo in 60 s (BENCHMARKS.md).
   */
  private static WarmStarts.Start eachTarget(Scenario s, Milp model, Map<String, List<Variable>> groups,
      SolverBackend backend, SolveOptions options, Duration budget) {
    long t0 = System.nanoTime();
    WarmStarts.Start best = null;
    int solves = 0;
    List<String> reasons = new ArrayList<>();
    List<String> targets = new ArrayList<>(groups.keySet());
    for (int i = 0; i < targets.size() && !options.cancel().isCancelled(); i++) {
      Duration share = left(budget, t0).dividedBy(targets.size() - i);
      if (share.isZero()) {
        break;
      }
      Map<Integer, Double> elsewhere = new HashMap<>();
      for (String other : targets) {
        if (!other.equals(targets.get(i))) {
          groups.get(other).forEach(v -> elsewhere.put(v.index(), 0.0));
        }
      }
      WarmStarts.Start one = find(s, withBounds(model, elsewhere), backend, options, share);
      solves += one.rounds();
      if (!one.found()) {
        reasons.add(targets.get(i) + ": " + one.reason());
      } else if (best == null || (model.objective().minimize() ? one.objective() < best.objective()
          : one.objective() > best.objective())) {
        best = one;
      }
    }
    return best == null ? none(t0, solves, 0, "no target gave a point: " + String.join("; ", reasons))
        : new WarmStarts.Start(best.values(), best.objective(), WarmStarts.since(t0), solves, best.zonesUsed(), "");
  }

  /**
   * The free arrival binaries by target ("owner/target"), when they all belong to one vehicle;
   * empty when several vehicles have free ones.
   */
  static Map<String, List<Variable>> targetGroups(Milp model) {
    Map<String, List<Variable>> byTarget = new TreeMap<>();
    Set<String> owners = new HashSet<>();
    for (Variable v : model.variables()) {
      if (v.origin().role().equals("arrive") && v.lower() < v.upper()) {
        byTarget.computeIfAbsent(v.origin().owner() + "/" + v.origin().entity(), k -> new ArrayList<>()).add(v);
        owners.add(v.origin().owner());
      }
    }
    return owners.size() == 1 ? byTarget : Map.of();
  }

  /**
   * As {@link #find(Milp, SolverBackend, SolveOptions, Duration)}, widening the windows through
   * {@code windows} (ascending, the last the whole zone; {@link #NEAREST} may come first).
   */
  static WarmStarts.Start find(Milp model, SolverBackend backend, SolveOptions options, Duration budget,
      int[] windows) {
    return find(model, backend, options, budget, windows, null);
  }

  /**
   * As {@link #find(Milp, SolverBackend, SolveOptions, Duration, int[])}, each step's first round
   * taking its sides and visits from {@code guide} (null: from the zone-free LP's path), and the
   * steps starting from the guide's fastest one where that is later than the LP's.
   */
  static WarmStarts.Start find(Milp model, SolverBackend backend, SolveOptions options, Duration budget,
      int[] windows, GuidePath guide) {
    long t0 = System.nanoTime();
    List<Variable> arrivals = arrivalColumns(model);
    if (arrivals.isEmpty()) {
      return none(t0, 0, 0, "the model has no single set of arrival binaries");
    }
    int solves = 0;
    try {
      SolveResult lp = backend.solve(relaxed(WarmStarts.restricted(model, Set.of())), sub(options, budget, t0));
      solves++;
      if (!lp.status().hasSolution()) {
        return none(t0, solves, 0, "zone-free LP relaxation: " + lp.summary());
      }
      int first = (int) Math.floor(meanStep(arrivals, lp.values()) + 1e-9);
      if (guide != null) {
        // the guide's profile is of the true norms, the model's of a polygon round them (a few per
        // cent faster): a step or so below it may still fit
        first = Math.max(first, (int) Math.floor(guide.fastestStep() * GUIDE_SLACK));
      }
      // galloping from the relaxation's step (1, 2, 4, ... steps on) until one gives a point, then a
      // bisection between the last that gave none and it: an early step that gives no point is
      // quick to refute, a late one is slow to find (its path meets more slots of the zones)
      int lo = 0;
      while (lo < arrivals.size() - 1 && arrivals.get(lo).origin().step() < first) {
        lo++;
      }
      int hi = arrivals.size() - 1;
      WarmStarts.Start best = null;
      int probe = lo;
      int stride = 1;
      int window = windows[0];
      while (lo <= hi && !left(budget, t0).isZero() && !options.cancel().isCancelled()) {
        // with a guide: upwards its sides alone (a plain LP per step, cheap even for ojAlgo), then
        // downwards from the first step they fit with the slots round its turns freed
        boolean upwards = guide != null && best == null;
        int[] tried = upwards ? Arrays.copyOf(windows, Math.min(2, windows.length)) : windows;
        int from = guide == null ? window : upwards ? windows[0] : windows[Math.min(1, windows.length - 1)];
        Attempt a = atStep(model, arrivals.get(probe), arrivals, backend, options, budget, t0, tried, from, guide);
        solves += a.solves();
        if (a.start() != null) {
          // the next steps start from the window that worked: on the warehouse, windows 2 and 6 never
          // let the path round a long shelf's end, and retrying them at every step cost 3 s a step
          window = a.window();
          boolean better = best == null || (model.objective().minimize()
              ? a.start().objective() < best.objective() : a.start().objective() > best.objective());
          if (better) {
            best = a.start();
          }
          hi = probe - 1;
          probe = hi;
        } else {
          lo = probe + 1;
          if (best == null) {
            probe = Math.min(hi, probe + (guide != null ? 1 : stride));
            stride *= 2;
          } else {
            probe = (lo + hi) / 2;
          }
        }
      }
      if (best == null && guide != null && !left(budget, t0).isZero()) {
        // the guide's sides fit at no step (a guide through a gap the dynamics cannot take): the
        // zone-free LP's path instead, in the time left
        WarmStarts.Start plain = find(model, backend, options, left(budget, t0), WINDOWS, null);
        return new WarmStarts.Start(plain.values(), plain.objective(), WarmStarts.since(t0), solves + plain.rounds(),
            plain.zonesUsed(), plain.reason());
      }
      if (best == null) {
        return none(t0, solves, 0, "no arrival step from " + first + " gave a point within "
            + budget.toMillis() + " ms");
      }
      return new WarmStarts.Start(best.values(), best.objective(), WarmStarts.since(t0), solves, best.zonesUsed(), "");
    } catch (RuntimeException e) {
      return none(t0, solves, 0, "arrival scan failed: " + e);
    }
  }

  private record Attempt(WarmStarts.Start start, int solves, int window) {
    Attempt(WarmStarts.Start start, int solves) {
      this(start, solves, -1);
    }
  }

  /** The lazy-zone rounds with the arrival fixed at {@code arrival}'s step, from window {@code firstWindow}. */
  private static Attempt atStep(Milp model, Variable arrival, List<Variable> arrivals, SolverBackend backend,
      SolveOptions options, Duration budget, long t0, int[] windows, int firstWindow, GuidePath guide) {
    Map<Integer, Double> fixed = new HashMap<>();
    for (Variable v : arrivals) {
      fixed.put(v.index(), v == arrival ? 1.0 : 0.0);
    }
    int solves = 0;
    List<Integer> visits = new ArrayList<>();
    SolveResult lp = backend.solve(relaxed(withBounds(WarmStarts.restricted(model, Set.of()), fixed)),
        sub(options, budget, t0));
    solves++;
    if (!lp.status().hasSolution()) {
      return new Attempt(null, solves);
    }
    Set<String> active = new TreeSet<>();
    Map<String, Set<Integer>> everBroken = new TreeMap<>();
    double[] last = null;
    int window = firstWindow;
    if (guide == null) {
      solves += fixVisits(model, lp.values(), fixed, visits, backend, options, budget, t0);
    } else {
      // every zone back at once, each slot on the guide's side of it; the slots where the guide
      // turns from one face to another count as broken, so wider windows free the binaries there
      last = guide.at(arrival.origin().step());
      for (Variable v : model.variables()) {
        if (v.origin().role().equals("visit") && v.lower() < v.upper() && !fixed.containsKey(v.index())
            && v.origin().owner().equals(guide.owner()) && guide.passes(v.origin().entity())) {
          fixed.put(v.index(), last[v.index()]);
          visits.add(v.index());
        }
      }
      active.addAll(coveredZones(model));
      everBroken.putAll(turns(model, last, guide.owner()));
      fixSides(model, active, everBroken, last, fixed, window);
      SoonerArrival.fixFarSeparation(model, last, fixed);
    }
    boolean shifted = false; // the visits moved one step later already
    for (int round = 1; round <= MAX_ROUNDS; round++) {
      if (left(budget, t0).isZero()) {
        return new Attempt(null, solves);
      }
      SolveResult r = backend.solve(withBounds(WarmStarts.restricted(model, active), fixed),
          sub(options, budget, t0, budget.dividedBy(ROUND_SHARE)));
      solves++;
      if (!r.status().hasSolution()) {
        if (last == null && !visits.isEmpty()) {
          // the visit steps the LP suggested do not fit: let the solver choose them
          visits.forEach(fixed::remove);
          visits.clear();
          continue;
        }
        if (last != null && !shifted && shiftVisits(model, fixed, visits)) {
          shifted = true;
          continue;
        }
        if (last == null || window >= windows[windows.length - 1]) {
          return new Attempt(null, solves);
        }
        // the path may need to change sides further from where it ran into the zone: free more
        window = windows[Arrays.binarySearch(windows, window) + 1];
        fixSides(model, active, everBroken, last, fixed, window);
        SoonerArrival.fixFarSeparation(model, last, fixed);
        continue;
      }
      double[] x = r.values();
      last = x.clone();
      Map<String, Set<Integer>> broken = WarmStarts.brokenSlots(model, x);
      if (broken.isEmpty()) {
        WarmStarts.setFaces(model, x);
        if (!(model.maxViolation(x) <= WarmStarts.TOLERANCE)) {
          return new Attempt(null, solves);
        }
        return new Attempt(new WarmStarts.Start(x, model.objective().value(x), WarmStarts.since(t0), solves,
            active.size(), ""), solves, window);
      }
      active.addAll(broken.keySet());
      broken.forEach((zone, slots) -> everBroken.computeIfAbsent(zone, k -> new TreeSet<>()).addAll(slots));
      fixSides(model, active, everBroken, x, fixed, window);
      SoonerArrival.fixFarSeparation(model, x, fixed);
    }
    return new Attempt(null, solves);
  }

  /**
   * Fixes each waypoint's visit binaries (added to {@code visits}) at the step nearest the one the
   * LP {@code x} visits on average for which the zone-free LP still has a point, trying up to
   * {@link #VISIT_TRIES} steps around it: with the arrival fixed too, the zone-free model is then
   * a plain LP. A waypoint with no such step stays free.
   */
  private static int fixVisits(Milp model, double[] x, Map<Integer, Double> fixed, List<Integer> visits,
      SolverBackend backend, SolveOptions options, Duration budget, long t0) {
    Map<String, List<Variable>> groups = new TreeMap<>();
    for (Variable v : model.variables()) {
      if (v.origin().role().equals("visit") && v.lower() < v.upper() && !fixed.containsKey(v.index())) {
        groups.computeIfAbsent(v.origin().owner() + "/" + v.origin().entity(), k -> new ArrayList<>()).add(v);
      }
    }
    int solves = 0;
    Milp zoneFree = WarmStarts.restricted(model, Set.of());
    for (List<Variable> group : groups.values()) {
      long centre = Math.round(meanStep(group, x));
      for (int t = 0; t < VISIT_TRIES; t++) {
        long step = centre + (t % 2 == 1 ? (t + 1) / 2 : -(t / 2));
        Variable chosen = group.stream().filter(v -> v.origin().step() == step).findFirst().orElse(null);
        if (chosen == null || left(budget, t0).isZero()) {
          continue;
        }
        for (Variable v : group) {
          fixed.put(v.index(), v == chosen ? 1.0 : 0.0);
        }
        solves++;
        if (backend.solve(relaxed(withBounds(zoneFree, fixed)), sub(options, budget, t0)).status().hasSolution()) {
          group.forEach(v -> visits.add(v.index()));
          break;
        }
        group.forEach(v -> fixed.remove(v.index()));
      }
    }
    return solves;
  }

  /** Moves each fixed visit one step later where the waypoint has such a step; whether any moved. */
  private static boolean shiftVisits(Milp model, Map<Integer, Double> fixed, List<Integer> visits) {
    Map<String, Variable> byStep = new HashMap<>();
    for (int c : visits) {
      Variable v = model.variables().get(c);
      byStep.put(v.origin().owner() + "/" + v.origin().entity() + "/" + v.origin().step(), v);
    }
    boolean moved = false;
    List<Integer> chosen = visits.stream().filter(c -> fixed.getOrDefault(c, 0.0) > 0.5).toList();
    for (int c : chosen) {
      Variable v = model.variables().get(c);
      Variable next = byStep.get(v.origin().owner() + "/" + v.origin().entity() + "/" + (v.origin().step() + 1));
      if (next != null) {
        fixed.put(c, 0.0);
        fixed.put(next.index(), 1.0);
        moved = true;
      }
    }
    return moved;
  }

  /**
   * A better point near {@code x} (a point of {@code model}), or null: vehicle {@code owner}'s
   * arrival and visits held at x's, each of its slots held to the face x keeps best except within
   * {@code window} slots of where that face changes, and solved to the options' gap from x. For
   * polishing a start: the turns may move, the route may not.
   */
  static double[] polish(Milp model, double[] x, String owner, int window, SolverBackend backend,
      SolveOptions options) {
    Map<Integer, Double> fixed = new HashMap<>();
    holdArrivals(model, x, owner, fixed);
    fixSides(model, coveredZones(model), turns(model, x, owner), x, fixed, window);
    double[] y = solveHeld(model, fixed, x, x, backend, options);
    if (y == null) {
      return null;
    }
    boolean better = model.objective().minimize() ? model.objective().value(y) < model.objective().value(x)
        : model.objective().value(y) > model.objective().value(x);
    return better ? y : null;
  }

  /**
   * Holds the free arrival and visit binaries of vehicle {@code owner} (null: of every vehicle) at
   * their values in x, rounded.
   */
  static void holdArrivals(Milp model, double[] x, String owner, Map<Integer, Double> fixed) {
    for (Variable v : model.variables()) {
      String role = v.origin().role();
      if ((role.equals("arrive") || role.equals("visit")) && (owner == null || v.origin().owner().equals(owner))
          && v.lower() < v.upper()) {
        fixed.put(v.index(), x[v.index()] > 0.5 ? 1.0 : 0.0);
      }
    }
  }

  /**
   * {@code model} with {@code fixed} and the separation binaries of slots far apart at {@code
   * point} fixed too, solved from {@code from} (null: no start): the point if the whole model
   * accepts it, else null.
   */
  static double[] solveHeld(Milp model, Map<Integer, Double> fixed, double[] point, double[] from,
      SolverBackend backend, SolveOptions options) {
    SoonerArrival.fixFarSeparation(model, point, fixed);
    SolveResult r = backend.solve(withBounds(model, fixed), options.withWarmStart(from));
    return r.status().hasSolution() && model.maxViolation(r.values()) <= WarmStarts.TOLERANCE ? r.values() : null;
  }

  /** Every zone (or cluster) with a cover row in the model. */
  static Set<String> coveredZones(Milp model) {
    Set<String> zones = new TreeSet<>();
    for (Row r : model.rows()) {
      if (r.origin().role().equals("cover")) {
        zones.add(r.origin().entity());
      }
    }
    return zones;
  }

  /** The guide's fastest step is scaled by this for the first step tried. */
  static final double GUIDE_SLACK = 0.97;

  /**
   * For each zone, the slots of vehicle {@code owner} at which the face the point {@code x} keeps
   * best differs from the previous slot's, or where no face holds at it; slots the arrival covers at x
   * (after it) are none.
   */
  static Map<String, Set<Integer>> turns(Milp model, double[] x, String owner) {
    Map<Integer, Double> margin = WarmStarts.margins(model, x);
    Map<String, Set<Integer>> out = new TreeMap<>();
    Map<String, String> before = new HashMap<>();
    List<Row> covers = new ArrayList<>();
    for (Row r : model.rows()) {
      if (r.origin().role().equals("cover") && r.origin().owner().equals(owner)) {
        covers.add(r);
      }
    }
    covers.sort((a, b) -> Integer.compare(a.origin().step(), b.origin().step()));
    for (Row cover : covers) {
      if (WarmStarts.rest(model, cover, x) >= cover.lower() - WarmStarts.TOLERANCE) {
        continue; // a slot the arrival covers: its side is no turn
      }
      String zone = cover.origin().entity();
      int face = WarmStarts.bestFace(model, cover, margin);
      // a face binary is named ..._f<face>_<slot>: the face, whatever binaries pruning left the slot
      String name = face < 0 ? "" : model.variables().get(face).name();
      String which = face < 0 ? "" : name.substring(name.lastIndexOf("_f") + 2, name.lastIndexOf('_'));
      String previous = before.put(zone, which);
      if (face < 0 || (previous != null && !previous.equals(which))) {
        out.computeIfAbsent(zone, k -> new TreeSet<>()).add(cover.origin().step());
      }
    }
    return out;
  }

  /** Visit steps tried around the LP's for each waypoint. */
  static final int VISIT_TRIES = 9;

  /**
   * The free arrival binaries of the model's one target, in step order; empty unless there is
   * exactly one set (fixed ones, such as an earlier vehicle's in {@link FleetStarts}, do not count).
   */
  static List<Variable> arrivalColumns(Milp model) {
    Map<String, List<Variable>> byTarget = new TreeMap<>();
    for (Variable v : model.variables()) {
      if (v.origin().role().equals("arrive") && v.lower() < v.upper()) {
        byTarget.computeIfAbsent(v.origin().owner() + "/" + v.origin().entity(), k -> new ArrayList<>()).add(v);
      }
    }
    if (byTarget.size() != 1) {
      return List.of();
    }
    List<Variable> cols = new ArrayList<>(byTarget.values().iterator().next());
    cols.sort((a, b) -> Integer.compare(a.origin().step(), b.origin().step()));
    return cols;
  }

  /** The mean step of a group of step binaries (arrival or visit) at the LP point {@code x}. */
  private static double meanStep(List<Variable> group, double[] x) {
    double mass = 0;
    double mean = 0;
    for (Variable v : group) {
      mass += x[v.index()];
      mean += x[v.index()] * v.origin().step();
    }
    return mass <= 0 ? group.get(0).origin().step() : mean / mass;
  }

  /**
   * For every slot of the active zones: face binaries free within {@link #WINDOWS} of a slot broken
   * in this or an earlier round; elsewhere the face that holds at {@code x} with the largest margin
   * fixed at 1 and the slot's other faces at 0, or every face at 0 where the arrival relaxation
   * covers the slot.
   */
  static void fixSides(Milp model, Set<String> active, Map<String, Set<Integer>> everBroken, double[] x,
      Map<Integer, Double> fixed, int window) {
    fixSides(model, active, everBroken, x, fixed, window, null);
  }

  /** As {@link #fixSides(Milp, Set, Map, double[], Map, int)}, for vehicle {@code owner}'s slots only (null: all). */
  static void fixSides(Milp model, Set<String> active, Map<String, Set<Integer>> everBroken, double[] x,
      Map<Integer, Double> fixed, int window, String owner) {
    Map<Integer, Double> margin = WarmStarts.margins(model, x);
    for (Row cover : model.rows()) {
      if (!cover.origin().role().equals("cover") || !active.contains(cover.origin().entity())
          || (owner != null && !cover.origin().owner().equals(owner))) {
        continue;
      }
      int slot = cover.origin().step();
      boolean near = window != NEAREST && everBroken.getOrDefault(cover.origin().entity(), Set.of()).stream()
          .anyMatch(s -> Math.abs(s - slot) <= window);
      int face = WarmStarts.bestFace(model, cover, margin);
      boolean relaxed = WarmStarts.rest(model, cover, x) >= cover.lower() - WarmStarts.TOLERANCE;
      if (window == NEAREST && face < 0 && !relaxed) {
        face = nearestFace(model, cover, margin);
      }
      for (int c : cover.cols()) {
        Variable v = model.variables().get(c);
        if (!WarmStarts.isFace(v) || v.lower() == v.upper()) {
          continue;
        }
        if (relaxed) {
          // the arrival covers the slot (every caller holds the arrival, so it stays covered): no
          // side to keep, and every face at 0 lets its rows go
          fixed.put(c, 0.0);
        } else if (near || face < 0) {
          fixed.remove(c);
        } else {
          fixed.put(c, c == face ? 1.0 : 0.0);
        }
      }
    }
  }

  /** The face column of a cover row with the largest margin, negative or not, or -1 if it has none. */
  private static int nearestFace(Milp model, Row cover, Map<Integer, Double> margin) {
    int best = -1;
    double top = Double.NEGATIVE_INFINITY;
    for (int c : cover.cols()) {
      Double m = margin.get(c);
      if (WarmStarts.isFace(model.variables().get(c)) && m != null && m > top) {
        best = c;
        top = m;
      }
    }
    return best;
  }

  /**
   * The model with some columns fixed (kept integer), without the rows those fixings leave with
   * nothing to say: an avoidance row whose face is fixed at 0 (its big-M is valid for every point
   * the dynamics can reach, so it cannot bind) and a cover row with a face fixed at 1. Every point
   * found is checked against the whole model before it is used, so dropping a row can never let a
   * wrong start through; it only makes each small solve cheaper.
   */
  static Milp withBounds(Milp model, Map<Integer, Double> fixed) {
    List<Variable> vars = new ArrayList<>(model.columnCount());
    for (Variable v : model.variables()) {
      Double value = fixed.get(v.index());
      vars.add(value == null ? v : new Variable(v.index(), v.name(), v.type(), value, value, v.origin()));
    }
    List<Row> rows = new ArrayList<>(model.rowCount());
    for (Row r : model.rows()) {
      String role = r.origin().role();
      double drop = role.equals("avoid") ? 0.0 : role.equals("cover") ? 1.0 : -1;
      boolean idle = false;
      for (int c : r.cols()) {
        Double value = fixed.get(c);
        idle |= drop >= 0 && value != null && value == drop && WarmStarts.isFace(model.variables().get(c));
      }
      if (!idle) {
        rows.add(new Row(rows.size(), r.name(), r.cols(), r.coefs(), r.lower(), r.upper(), r.origin()));
      }
    }
    return new Milp(model.name(), vars, rows, model.objective());
  }

  /** The model with every integer column continuous. */
  private static Milp relaxed(Milp model) {
    List<Variable> vars = new ArrayList<>(model.columnCount());
    for (Variable v : model.variables()) {
      vars.add(v.isInteger() ? new Variable(v.index(), v.name(), VarType.CONTINUOUS, v.lower(), v.upper(), v.origin())
          : v);
    }
    return new Milp(model.name() + "_lp", vars, model.rows(), model.objective());
  }

  private static SolveOptions sub(SolveOptions options, Duration budget, long t0) {
    return sub(options, budget, t0, budget);
  }

  /** Options for one small solve: at most {@code most}, and no more than the budget has left. */
  private static SolveOptions sub(SolveOptions options, Duration budget, long t0, Duration most) {
    Duration left = left(budget, t0);
    left = left.compareTo(most) > 0 ? most : left;
    return options.withWarmStart(null).withRelativeGap(Math.max(options.relativeGap(), SUB_GAP))
        .withTimeLimit(left.isZero() ? Duration.ofMillis(1) : left)
        .withPointSufficingAfter(most.dividedBy(POINT_SHARE));
  }

  private static Duration left(Duration budget, long t0) {
    Duration left = budget.minus(WarmStarts.since(t0));
    return left.isNegative() ? Duration.ZERO : left;
  }

  private static WarmStarts.Start none(long t0, int solves, int zones, String reason) {
    return new WarmStarts.Start(null, Double.NaN, WarmStarts.since(t0), solves, zones, reason);
  }
}
