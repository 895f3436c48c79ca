package dev.skerry.compiler.plan;

import dev.skerry.compiler.analysis.ClusterLayout;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.PlanOptions.SymmetryRule;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolverBackend;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A start for a one-vehicle model whose zones are grouped into clusters chosen in the MILP, for a
 * backend whose branch and bound is slow (ojAlgo): the zones are first shared out among the
 * cluster boxes by geometry, the assignment binaries fixed so, and the {@link ArrivalScan} run on
 * what is left, a few boxes of known members to keep clear of.
 *
 * <p>Why: with the assignment binaries free every small solve of the scan is itself a clustering
 * problem. On the rock field (40 zones, 3 clusters, 120 assignment binaries) ojAlgo found no point
 * in the scan's 45 s that way (BENCHMARKS.md).
 *
 * <p>The groupings tried: the path has to run between the boxes. Seen from the line from the start
 * to the target, a corridor line parallel to it at a cross offset d puts the zones whose centre lies
 * to its left on one side and the rest on the other; each side's zones are cut into runs that are
 * consecutive along the line, one box per run, with k boxes on the left and K − k on the right
 * (the cuts chosen by dynamic programming so that the boxes reach least across the corridor line,
 * then smallest). A grouping where a box on one side overlaps a box on the other, or holds the
 * start or the target, leaves no corridor and is skipped; the rest are tried from the one whose
 * corridor strays least from the straight line. This is a heuristic for a start only: every point
 * is checked against the whole model before use, and when no grouping gives one the plain scan
 * runs on what is left of the budget.
 */
public final class ClusterStarts {
  /**
   * Groupings tried at most, until one gives a point, each with three quarters of what the budget
   * has left: the first is the likeliest, and a scan that gives up ends before its share is spent.
   * The first point ends the search and leaves the rest of the time to the backend's own search (on
   * the rock field the next three groupings gave 45.72–45.85 with SCIP, against 43.68).
   */
  static final int MAX_TRIES = 4;

  private ClusterStarts() {}

  /** Whether the start applies: one vehicle, clusters chosen in the model, one set of arrival binaries. */
  public static boolean applies(Scenario s, ClusterLayout clusters, Milp model) {
    return !s.fleet() && clusters != null && clusters.count() > 0 && ArrivalScan.applies(model);
  }

  /** A start for {@code model} found with {@code backend} within {@code budget} in all. */
  public static WarmStarts.Start find(Scenario s, ClusterLayout clusters, Milp model, SolverBackend backend,
      SolveOptions options, Duration budget) {
    long t0 = System.nanoTime();
    WarmStarts.Start best = null;
    int solves = 0;
    int tried = 0;
    String failure = "";
    int found = 0;
    try {
      List<Target> targets = s.candidateTargets(s.vehicle());
      if (targets.size() != 1) {
        return ArrivalScan.find(model, backend, options, budget);
      }
      List<int[]> groupings = groupings(clusters, s.vehicle().start(), targets.get(0).region().bounds().center());
      found = groupings.size();
      for (int[] label : groupings) {
        Duration left = budget.minus(WarmStarts.since(t0));
        if (best != null || tried == MAX_TRIES || left.compareTo(MIN_TRY) < 0 || options.cancel().isCancelled()) {
          break;
        }
        tried++;
        Milp grouped = fixed(model, clusters, label);
        // the shortest path round this grouping's boxes gives each slot its side of every box
        GuidePath guide = GuidePath.of(s, grouped, boxes(clusters, label)).orElse(null);
        WarmStarts.Start r = ArrivalScan.find(grouped, backend, options, left.multipliedBy(3).dividedBy(4),
            guide == null ? WINDOWS : ArrivalScan.GUIDED, guide);
        solves += r.rounds();
        if (r.found() && model.maxViolation(r.values()) <= WarmStarts.TOLERANCE) {
          best = r;
        }
      }
    } catch (RuntimeException e) {
      best = null;
      failure = " (grouping failed: " + e + ")";
    }
    if (best != null) {
      return new WarmStarts.Start(best.values(), best.objective(), WarmStarts.since(t0), solves, best.zonesUsed(),
          "");
    }
    Duration left = budget.minus(WarmStarts.since(t0));
    WarmStarts.Start plain = ArrivalScan.find(model, backend, options, left.isNegative() ? Duration.ZERO : left);
    String why = (clusters.zoneCount() > MAX_ZONES ? "over " + MAX_ZONES + " zones, too many to group first"
        : found == 0 ? "no grouping of the zones into clusters leaves a corridor"
        : tried == 0 ? "no grouping of the zones into clusters was tried (under " + MIN_TRY.toSeconds() + " s left)"
        : tried + " grouping(s) of the zones into clusters gave no point") + failure;
    return plain.found()
        ? new WarmStarts.Start(plain.values(), plain.objective(), WarmStarts.since(t0), solves + plain.rounds(),
            plain.zonesUsed(), why + "; the plain scan found this one")
        : new WarmStarts.Start(null, Double.NaN, WarmStarts.since(t0), solves + plain.rounds(), 0,
            why + "; " + plain.reason());
  }

  /**
   * The scan's windows here: first every slot of a box fixed to the face the point holds or is
   * nearest to, as a box of a side's zones is long and the path runs along it; on the rock field
   * the scan's own first window left 204 face binaries free, too many for ojAlgo in 7 s.
   */
  static final int[] WINDOWS = {ArrivalScan.NEAREST, 2, 6, Integer.MAX_VALUE / 2};

  /** The least time worth giving one more grouping. */
  private static final Duration MIN_TRY = Duration.ofSeconds(1);

  /**
   * The model with every assignment binary fixed, zone o in cluster {@code label[o]}, and each
   * cluster box fixed at the smallest box holding its zones (an empty cluster at the inverted box
   * {@link ClusterLayout} describes, which blocks nothing). With the boxes fixed the scan's margins
   * are measured to the boxes the path will meet, not to wherever a zone-free solve left them.
   * Columns keep their indices; rows are unchanged.
   */
  static Milp fixed(Milp model, ClusterLayout clusters, int[] label) {
    Map<String, Integer> zoneIndex = new LinkedHashMap<>();
    for (int o = 0; o < clusters.zoneCount(); o++) {
      zoneIndex.put(clusters.zoneNames().get(o), o);
    }
    Map<String, Double> bound = boxBounds(clusters, label);
    List<Variable> vars = new ArrayList<>(model.columnCount());
    for (Variable v : model.variables()) {
      String role = v.origin().role();
      Integer o = role.equals("assign") ? zoneIndex.get(v.origin().entity()) : null;
      Double value = role.equals("cluster-bound") ? bound.get(v.name()) : null;
      if (o != null) {
        int l = Integer.parseInt(v.name().substring(v.name().lastIndexOf("_c") + 2));
        value = l == label[o] ? 1.0 : 0.0;
      }
      vars.add(value == null ? v : new Variable(v.index(), v.name(), v.type(), value, value, v.origin()));
    }
    return new Milp(model.name(), vars, model.rows(), model.objective());
  }

  /** The boxes of the grouping {@code label}, each the union of its zones' inflated boxes. */
  private static List<Shape> boxes(ClusterLayout clusters, int[] label) {
    List<Shape> out = new ArrayList<>();
    for (Bounds b : groupBoxes(clusters, label)) {
      if (b != null) {
        out.add(new Shape.Box(b));
      }
    }
    return out;
  }

  /** Cluster l's box under the grouping {@code label} at [l]: the union of its zones' boxes, null if it has none. */
  private static Bounds[] groupBoxes(ClusterLayout clusters, int[] label) {
    Bounds[] zone = zoneBoxes(clusters);
    Bounds[] out = new Bounds[clusters.count()];
    for (int o = 0; o < zone.length; o++) {
      int l = label[o];
      out[l] = out[l] == null ? zone[o] : out[l].union(zone[o]);
    }
    return out;
  }

  /** The value of each cluster bound column, by column name, for the grouping {@code label}. */
  private static Map<String, Double> boxBounds(ClusterLayout clusters, int[] label) {
    Bounds[] group = groupBoxes(clusters, label);
    Map<String, Double> out = new LinkedHashMap<>();
    for (int l = 0; l < clusters.count(); l++) {
      Bounds b = group[l];
      double[] side = b == null
          ? new double[] {clusters.sides().get(ClusterLayout.XMIN).hi(), clusters.sides().get(ClusterLayout.XMAX).lo(),
              clusters.sides().get(ClusterLayout.YMIN).hi(), clusters.sides().get(ClusterLayout.YMAX).lo()}
          : new double[] {b.xmin(), b.xmax(), b.ymin(), b.ymax()};
      String[] names = {"cxmin_c", "cxmax_c", "cymin_c", "cymax_c"};
      for (int i = 0; i < 4; i++) {
        out.put(names[i] + l, side[i]);
      }
    }
    return out;
  }

  /**
   * The groupings of the class comment, best first, each as a cluster label per zone, numbered so
   * that the plan's symmetry rule holds (ORDERED: by each group's lowest zone; otherwise by the left
   * edge of its box). Distinct groupings only.
   */
  static List<int[]> groupings(ClusterLayout clusters, Vec2 start, Vec2 target) {
    int n = clusters.zoneCount();
    if (n > MAX_ZONES) {
      return List.of();
    }
    Bounds[] box = zoneBoxes(clusters);
    Vec2 dir = target.minus(start);
    Vec2 u = dir.norm() > 0 ? dir.times(1 / dir.norm()) : new Vec2(1, 0);
    Vec2 normal = new Vec2(-u.y(), u.x());
    double[] along = new double[n];
    double[] cross = new double[n];
    for (int o = 0; o < n; o++) {
      Vec2 c = box[o].center().minus(start);
      along[o] = c.dot(u);
      cross[o] = c.dot(normal);
    }
    double[] sorted = cross.clone();
    Arrays.sort(sorted);
    List<Double> cuts = new ArrayList<>();
    cuts.add(sorted.length == 0 ? 0 : sorted[0] - 1);
    for (int i = 0; i + 1 < sorted.length; i++) {
      if (sorted[i + 1] > sorted[i]) {
        cuts.add((sorted[i] + sorted[i + 1]) / 2);
      }
    }
    cuts.add(sorted.length == 0 ? 0 : sorted[sorted.length - 1] + 1);
    Map<String, Candidate> found = new LinkedHashMap<>();
    for (double d : spread(cuts)) {
      List<Integer> left = new ArrayList<>();
      List<Integer> right = new ArrayList<>();
      for (int o = 0; o < n; o++) {
        (cross[o] > d ? left : right).add(o);
      }
      Comparator<Integer> byAlong = Comparator.comparingDouble(o -> along[o]);
      left.sort(byAlong);
      right.sort(byAlong);
      int k = Math.min(clusters.count(), n);
      double[][] leftCost = Side.costs(left, box, start, normal, d, +1);
      double[][] rightCost = Side.costs(right, box, start, normal, d, -1);
      for (int kl = 0; kl <= k; kl++) {
        int kr = k - kl;
        if (kl > left.size() || kr > right.size() || (kl == 0) != left.isEmpty() || (kr == 0) != right.isEmpty()) {
          continue;
        }
        Side l = Side.cut(left, kl, leftCost, box, start, normal, d, +1);
        Side r = Side.cut(right, kr, rightCost, box, start, normal, d, -1);
        if (blocked(l, r, start, target)) {
          continue;
        }
        int[] label = label(n, clusters.rule(), l, r, box);
        Candidate c = new Candidate(label, stray(l, r, d));
        found.merge(Arrays.toString(label), c, (a, b) -> a.stray() <= b.stray() ? a : b);
      }
    }
    List<Candidate> list = new ArrayList<>(found.values());
    list.sort(Comparator.comparingDouble(Candidate::stray));
    List<int[]> out = new ArrayList<>();
    list.forEach(c -> out.add(c.label()));
    return out;
  }

  private record Candidate(int[] label, double stray) {}

  /**
   * Corridor offsets tried at most. Each costs a dynamic programme quadratic in the zones, so with
   * every offset the groupings grew with the cube of the zone count (1,000 zones: 27 s); beyond this
   * many, offsets are taken evenly from the sorted list, the outermost two always among them. The
   * rock field has 43.
   */
  static final int MAX_CUTS = 48;

  /**
   * Zones grouped at most: with {@link #MAX_CUTS} offsets the groupings still take time quadratic in
   * the zones (measured: 1,000 zones 2.8 s, 2,000 zones 8.5 s, out of the scan's budget); a larger
   * model gets the plain scan.
   */
  static final int MAX_ZONES = 1000;

  /** {@code cuts}, or {@link #MAX_CUTS} of them spread evenly from first to last. */
  private static List<Double> spread(List<Double> cuts) {
    if (cuts.size() <= MAX_CUTS) {
      return cuts;
    }
    List<Double> out = new ArrayList<>(MAX_CUTS);
    for (int i = 0; i < MAX_CUTS; i++) {
      out.add(cuts.get((int) Math.round(i * (cuts.size() - 1) / (double) (MAX_CUTS - 1))));
    }
    return out;
  }

  /**
   * How far a path between the two sides must stray from the straight line, roughly: none when a
   * straight corridor parallel to the line through 0 fits between the boxes, else the offset of the
   * nearest straight corridor that fits, else the cut's offset plus how far the boxes reach across.
   */
  private static double stray(Side l, Side r, double d) {
    double low = l.nearest;
    double high = r.nearest;
    if (high < low) {
      return high >= 0 ? high : low <= 0 ? -low : 0;
    }
    return Math.abs(d) + l.reach + r.reach;
  }

  /** Whether a box of one side overlaps a box of the other, or any box holds the start or target. */
  private static boolean blocked(Side l, Side r, Vec2 start, Vec2 target) {
    for (Bounds a : l.boxes) {
      for (Bounds b : r.boxes) {
        if (a.overlapsInterior(b)) {
          return true;
        }
      }
    }
    List<Bounds> all = new ArrayList<>(l.boxes);
    all.addAll(r.boxes);
    return all.stream().anyMatch(b -> b.contains(start) || b.contains(target));
  }

  /** Cluster labels per zone with the groups numbered as the symmetry rule wants. */
  private static int[] label(int n, SymmetryRule rule, Side l, Side r, Bounds[] box) {
    List<List<Integer>> groups = new ArrayList<>(l.groups);
    groups.addAll(r.groups);
    List<Bounds> boxes = new ArrayList<>(l.boxes);
    boxes.addAll(r.boxes);
    Integer[] order = new Integer[groups.size()];
    for (int g = 0; g < order.length; g++) {
      order[g] = g;
    }
    if (rule == SymmetryRule.ORDERED) {
      Arrays.sort(order, Comparator.comparingInt(g -> groups.get(g).stream().mapToInt(Integer::intValue).min()
          .orElse(Integer.MAX_VALUE)));
    } else {
      Arrays.sort(order, Comparator.comparingDouble(g -> boxes.get(g).xmin()));
    }
    int[] label = new int[n];
    for (int rank = 0; rank < order.length; rank++) {
      for (int o : groups.get(order[rank])) {
        label[o] = rank;
      }
    }
    return label;
  }

  /**
   * One side of the corridor cut into runs: the groups, their boxes, how far the boxes reach across
   * the corridor line in all ({@code reach}) and the cross offset of the box corner nearest the
   * other side ({@code nearest}: the lowest on the left side, the highest on the right).
   */
  private record Side(List<List<Integer>> groups, List<Bounds> boxes, double reach, double nearest) {
    /**
     * The cost of one box round {@code zones} i to j − 1 (sorted along the line) at [i][j]: how far
     * it reaches across the corridor line at {@code d}, then its area; {@code sign} +1 for the left
     * side. Computed once per side and offset, for every number of runs.
     */
    static double[][] costs(List<Integer> zones, Bounds[] box, Vec2 start, Vec2 normal, double d, int sign) {
      int m = zones.size();
      double[][] cost = new double[m + 1][m + 1];
      for (int i = 0; i < m; i++) {
        Bounds b = null;
        for (int j = i + 1; j <= m; j++) {
          Bounds z = box[zones.get(j - 1)];
          b = b == null ? z : b.union(z);
          cost[i][j] = across(b, start, normal, d, sign) + AREA_WEIGHT * b.width() * b.height();
        }
      }
      return cost;
    }

    /** {@code zones} cut into {@code k} runs of the least total {@code cost} (from {@link #costs}). */
    static Side cut(List<Integer> zones, int k, double[][] cost, Bounds[] box, Vec2 start, Vec2 normal, double d,
        int sign) {
      int m = zones.size();
      if (k == 0) {
        return new Side(List.of(), List.of(), 0, sign > 0 ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY);
      }
      // best[g][j]: the first j zones in g runs; from[g][j]: where the last run starts
      double[][] best = new double[k + 1][m + 1];
      int[][] from = new int[k + 1][m + 1];
      for (double[] row : best) {
        Arrays.fill(row, Double.POSITIVE_INFINITY);
      }
      best[0][0] = 0;
      for (int g = 1; g <= k; g++) {
        for (int j = g; j <= m; j++) {
          for (int i = g - 1; i < j; i++) {
            double c = best[g - 1][i] + cost[i][j];
            if (c < best[g][j]) {
              best[g][j] = c;
              from[g][j] = i;
            }
          }
        }
      }
      List<List<Integer>> groups = new ArrayList<>();
      List<Bounds> boxes = new ArrayList<>();
      double reach = 0;
      double nearest = sign > 0 ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
      for (int g = k, j = m; g > 0; j = from[g][j], g--) {
        List<Integer> run = new ArrayList<>(zones.subList(from[g][j], j));
        Bounds b = box[run.get(0)];
        for (int o : run) {
          b = b.union(box[o]);
        }
        groups.add(0, run);
        boxes.add(0, b);
        reach += across(b, start, normal, d, sign);
        for (Vec2 p : corners(b)) {
          double c = p.minus(start).dot(normal);
          nearest = sign > 0 ? Math.min(nearest, c) : Math.max(nearest, c);
        }
      }
      return new Side(groups, boxes, reach, nearest);
    }
  }

  /** Box area counts this much against one metre of reach: it only breaks ties. */
  private static final double AREA_WEIGHT = 1e-6;

  /** How far box {@code b} reaches across the corridor line at {@code d} from side {@code sign}. */
  private static double across(Bounds b, Vec2 start, Vec2 normal, double d, int sign) {
    double most = 0;
    for (Vec2 p : corners(b)) {
      double c = p.minus(start).dot(normal);
      most = Math.max(most, sign > 0 ? d - c : c - d);
    }
    return most;
  }

  private static Vec2[] corners(Bounds b) {
    return new Vec2[] {new Vec2(b.xmin(), b.ymin()), new Vec2(b.xmax(), b.ymin()), new Vec2(b.xmin(), b.ymax()),
        new Vec2(b.xmax(), b.ymax())};
  }

  /** Each zone's inflated bounding box, by zone index. */
  private static Bounds[] zoneBoxes(ClusterLayout clusters) {
    Bounds[] box = new Bounds[clusters.zoneCount()];
    clusters.assignments().forEach(a -> box[a.zone()] = a.zoneBox());
    return box;
  }
}
