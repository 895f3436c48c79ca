package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Avoidance of every obstacle (a zone inflated by the radius, or a cluster box) over every slot.
 *
 * <p><b>Binaries.</b> Face binary b_j = 1 means "face j separates": the row {@code n_j·p ≥ c_j −
 * M_j(1 − b_j)} then reads n_j·p ≥ c_j; with b_j = 0 it is slack over the whole domain box. A
 * cover row Σ_j b_j + d ≥ 1 asks for one separating face (d = "arrived", see {@link
 * ArrivalLayout}). This is the complement of the Σ b ≤ F − 1 form and has the same strength.
 *
 * <p><b>Slots.</b> With the guard, slot s = 0..N−1 is the segment p_s → p_{s+1} and one set of
 * binaries applies to both end points, so the whole segment lies in the chosen half-plane. Without
 * it, slot s = 1..N is the point p_s.
 *
 * <p><b>Pruning</b> (zones only; a cluster box moves with the solution): with U the box around the
 * slot's reach boxes, a zone whose interior misses U is skipped; a face some end point cannot
 * satisfy anywhere in its reach box is dropped; one remaining face becomes a hard row (0 binaries,
 * relaxed after arrival by M·d); none remaining means the zone covers all reachable positions —
 * recorded as a {@code zone-covers-reach} fact, and all faces kept so the solver proves it. A row
 * whose end point satisfies the face over its whole reach box is left out.
 */
public record AvoidanceLayout(List<Obstacle> obstacles, long skippedSlots, long hardSlots, long blockedSlots) {

  public AvoidanceLayout {
    obstacles = List.copyOf(obstacles);
  }

  /** What an obstacle costs over the horizon; {@code cluster} ≥ 0 for a cluster box, else −1. */
  public record Obstacle(String entity, String tag, int cluster, boolean boxShape, List<Slot> slots) {
    public Obstacle {
      slots = List.copyOf(slots);
    }

    public boolean isCluster() {
      return cluster >= 0;
    }
  }

  /**
   * One slot of one obstacle. {@code hard}: a single face as a plain row, no binary. {@code
   * relaxBy}: the index k of the d_k that relaxes it after arrival, −1 when none can.
   */
  public record Slot(int slot, boolean hard, boolean blocked, int relaxBy, List<FaceRow> faces) {
    public Slot {
      faces = List.copyOf(faces);
    }
  }

  /**
   * Face j of an obstacle: rows at the position indices {@code points}, each with its padded
   * {@code bigM} (the binary's M, or for a hard row the relaxation M). For a cluster the row's
   * right-hand side is the cluster bound variable of face j and {@code offset} is unused.
   */
  public record FaceRow(int face, Vec2 normal, double offset, int[] points, double[] bigM, double nz) {
    public FaceRow(int face, Vec2 normal, double offset, int[] points, double[] bigM) {
      this(face, normal, offset, points, bigM, 0);
    }

    public int terms(boolean cluster, boolean hard, boolean relaxed) {
      return Geometry.termCount(normal, nz) + (cluster ? 1 : 0) + (hard ? (relaxed ? 1 : 0) : 1);
    }
  }

  /**
   * A face of an obstacle in 3-D form: the obstacle lies in {@code n·p + nz·z ≤ offset}; a zone
   * with an altitude range adds a ceiling face (nz = 1) and a floor face (nz = −1) to its plan-view
   * faces (nz = 0).
   */
  record SolidFace(Vec2 normal, double nz, double offset) {}

  /**
   * The faces of a zone grown by {@code planMargin} in plan view and {@code verticalMargin} above
   * and below: plan faces of the grown shape, then, when the zone has an altitude range in a 3-D
   * scenario, the ceiling z ≤ hi + m and the floor −z ≤ −(lo − m).
   */
  static List<SolidFace> solidFaces(Zone zone, double planMargin, double verticalMargin, boolean threeD) {
    List<SolidFace> out = new ArrayList<>();
    for (Shape.Face f : zone.shape().inflate(planMargin).faces()) {
      out.add(new SolidFace(f.normal(), 0, f.offset()));
    }
    if (threeD && zone.altitude() != null) {
      out.add(new SolidFace(Vec2.ZERO, 1, zone.altitude().hi() + verticalMargin));
      out.add(new SolidFace(Vec2.ZERO, -1, -(zone.altitude().lo() - verticalMargin)));
    }
    return out;
  }

  /** The position indices of slot s. */
  static int[] points(int s, boolean guard) {
    return guard ? new int[] {s, s + 1} : new int[] {s};
  }

  static int firstSlot(boolean guard) {
    return guard ? 0 : 1;
  }

  static int lastSlot(boolean guard, int horizon) {
    return guard ? horizon - 1 : horizon;
  }

  static int relaxBy(int s, boolean guard, ArrivalLayout arrival) {
    int k = guard ? s : s - 1;
    return arrival.hasDone(k) ? k : -1;
  }

  static Obstacle zone(Zone zone, String tag, double radius, FormulationLayout.Domains d, ArrivalLayout arrival,
      List<Fact> facts, long[] tally) {
    return zone(zone, tag, radius, radius, d, arrival, facts, tally);
  }

  static Obstacle zone(Zone zone, String tag, double planMargin, double verticalMargin, FormulationLayout.Domains d,
      ArrivalLayout arrival, List<Fact> facts, long[] tally) {
    Shape inflated = zone.shape().inflate(planMargin);
    List<SolidFace> faces = solidFaces(zone, planMargin, verticalMargin, d.threeD());
    Span band = d.threeD() && zone.altitude() != null ? zone.altitude().expand(verticalMargin) : null;
    List<Slot> slots = new ArrayList<>();
    for (int s = firstSlot(d.guard()); s <= lastSlot(d.guard(), d.horizon()); s++) {
      int[] pts = points(s, d.guard());
      int relax = relaxBy(s, d.guard(), arrival);
      if (!d.pruning()) {
        slots.add(new Slot(s, false, false, relax, allFaces(faces, pts, d)));
        continue;
      }
      Bounds u = d.position(pts[0]);
      for (int p : pts) {
        u = u.union(d.position(p));
      }
      boolean apart = Geometry.interiorsDisjoint(inflated, u);
      if (!apart && band != null) {
        Span a = d.altitude(pts[0]);
        for (int p : pts) {
          a = a.union(d.altitude(p));
        }
        apart = !band.overlapsInterior(a);
      }
      if (apart) {
        tally[0]++;
        continue;
      }
      List<FaceRow> possible = new ArrayList<>();
      for (int j = 0; j < faces.size(); j++) {
        SolidFace f = faces.get(j);
        boolean ok = true;
        for (int p : pts) {
          ok &= !Geometry.impossibleWithin(d.position(p), d.altitude(p), f.normal(), f.nz(), f.offset());
        }
        if (ok) {
          possible.add(needed(j, f, pts, d));
        }
      }
      if (possible.isEmpty()) {
        tally[2]++;
        facts.add(new Fact("zone-covers-reach", zone.name(), s, "every position reachable at step "
            + pts[pts.length - 1] + " lies inside zone " + zone.name()
            + " inflated by the radius: the plan is infeasible unless the target is reached earlier"));
        slots.add(new Slot(s, false, true, relax, allFaces(faces, pts, d)));
      } else {
        boolean hard = possible.size() == 1;
        tally[1] += hard ? 1 : 0;
        slots.add(new Slot(s, hard, false, relax, possible));
      }
    }
    return new Obstacle(zone.name(), tag, -1, zone.isBox(), slots);
  }

  private static List<FaceRow> allFaces(List<SolidFace> faces, int[] pts, FormulationLayout.Domains d) {
    List<FaceRow> rows = new ArrayList<>(faces.size());
    for (int j = 0; j < faces.size(); j++) {
      SolidFace f = faces.get(j);
      double[] m = new double[pts.length];
      for (int i = 0; i < pts.length; i++) {
        m[i] = BigM.pad(f.offset() - Geometry.minOver(d.position(pts[i]), d.altitude(pts[i]), f.normal(), f.nz()));
      }
      rows.add(new FaceRow(j, f.normal(), f.offset(), pts.clone(), m, f.nz()));
    }
    return rows;
  }

  /** Face j with rows only at the points whose reach box does not already satisfy it throughout. */
  private static FaceRow needed(int j, SolidFace f, int[] pts, FormulationLayout.Domains d) {
    int[] keep = new int[pts.length];
    double[] m = new double[pts.length];
    int n = 0;
    for (int p : pts) {
      double raw = f.offset() - Geometry.minOver(d.position(p), d.altitude(p), f.normal(), f.nz());
      if (raw > 0) {
        keep[n] = p;
        m[n] = BigM.pad(raw);
        n++;
      }
    }
    return new FaceRow(j, f.normal(), f.offset(), Arrays.copyOf(keep, n), Arrays.copyOf(m, n), f.nz());
  }

  /**
   * Cluster box l: faces in the order of {@link Shape.Box#faces()} (x ≤ xmin side, x ≥ xmax, y ≤
   * ymin, y ≥ ymax), each separating when {@code n·p − n_a·bound ≥ 0} (n_a the normal's only non-zero
   * component). M covers every position of the domain box and every value of the bound's range
   * ({@link ClusterLayout#sides}).
   */
  static Obstacle cluster(int l, String tag, List<ClusterLayout.Range> sides, FormulationLayout.Domains d,
      ArrivalLayout arrival) {
    List<Shape.Face> faces = new Shape.Box(new Bounds(0, 0, 1, 1)).faces();
    List<Slot> slots = new ArrayList<>();
    for (int s = firstSlot(d.guard()); s <= lastSlot(d.guard(), d.horizon()); s++) {
      int[] pts = points(s, d.guard());
      List<FaceRow> rows = new ArrayList<>(4);
      for (int j = 0; j < 4; j++) {
        Vec2 n = faces.get(j).normal();
        double axis = n.x() + n.y();
        ClusterLayout.Range range = sides.get(j);
        double boundMax = axis > 0 ? range.hi() : -range.lo();
        double[] m = new double[pts.length];
        for (int i = 0; i < pts.length; i++) {
          m[i] = BigM.pad(boundMax - Geometry.minOver(d.position(pts[i]), n));
        }
        rows.add(new FaceRow(j, n, 0, pts.clone(), m));
      }
      slots.add(new Slot(s, false, false, relaxBy(s, d.guard(), arrival), rows));
    }
    return new Obstacle("c" + l, tag, l, true, slots);
  }

  /** Binaries each zone adds (zones avoided one by one; none when the plan clusters), by zone name. */
  public java.util.Map<String, Long> zoneBinaries() {
    java.util.Map<String, Long> out = new java.util.LinkedHashMap<>();
    for (Obstacle o : obstacles) {
      if (o.isCluster()) {
        continue;
      }
      long b = 0;
      for (Slot s : o.slots()) {
        if (!s.hard()) {
          b += s.faces().size();
        }
      }
      out.merge(o.entity(), b, Long::sum);
    }
    return out;
  }

  void count(Sizes.Counter c) {
    for (Obstacle o : obstacles) {
      for (Slot s : o.slots()) {
        boolean relaxed = s.relaxBy() >= 0;
        if (!s.hard()) {
          long b = s.faces().size();
          if (o.isCluster()) {
            c.clusterAvoidance += b;
          } else if (o.boxShape()) {
            c.zoneBox += b;
          } else {
            c.zonePolygon += b;
          }
          c.row(b + (relaxed ? 1 : 0));
        }
        for (FaceRow f : s.faces()) {
          c.rows(f.points().length, f.terms(o.isCluster(), s.hard(), relaxed));
        }
      }
    }
  }
}
