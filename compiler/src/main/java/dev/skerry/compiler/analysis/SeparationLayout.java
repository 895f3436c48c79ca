package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Span;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Separation of two vehicles a and b of a fleet, by big-M: at every slot one of the faces
 * {@code ±(x_a − x_b) ≥ D}, {@code ±(y_a − y_b) ≥ D} (and {@code ±(z_a − z_b) ≥ D} in 3-D) holds:
 * 4 binaries per pair and slot in plan view, 6 in 3-D. Any of them keeps the centres at least D
 * apart in the ∞-norm, so at least D apart (common practice: the box around one vehicle that the
 * other may not enter).
 *
 * <p><b>Between samples.</b> With the guard a slot is the segment between steps s and s+1 and one
 * set of binaries holds at both ends, so the relative chord stays in the chosen half-space. The
 * relative motion between samples is itself a zero-order-hold arc, bulging from its chord by at most
 * |u_a − u_b|·Δt²/8 per axis ≤ (a_a + a_b)·Δt²/8; D grows by that amount (by the climb
 * accelerations for the altitude faces). Without the guard, slots are the samples 1..N.
 *
 * <p><b>After arrival</b> a vehicle has left the shared space (moored, landed): the cover row
 * Σ b + d_a + d_b ≥ 1 is relaxed as soon as either has arrived.
 *
 * <p><b>Pruning</b> works on the difference of the two reach boxes: a slot where some face holds
 * over both boxes needs no binary; faces neither box pair can satisfy are dropped; one face left
 * becomes a hard row.
 */
public record SeparationLayout(int a, int b, String nameA, String nameB, String tagA, String tagB, double distance,
    List<Slot> slots) {

  public SeparationLayout {
    slots = List.copyOf(slots);
  }

  /** Face names, in the order of the axis index of {@link Face}: +x, −x, +y, −y, +z, −z. */
  public static final String[] FACES = {"xp", "xn", "yp", "yn", "zp", "zn"};

  /** One slot of the pair; {@code relaxA}/{@code relaxB} the d index of each vehicle, −1 when none. */
  public record Slot(int slot, boolean hard, boolean blocked, int relaxA, int relaxB, List<Face> faces) {
    public Slot {
      faces = List.copyOf(faces);
    }

    int relaxTerms() {
      return (relaxA >= 0 ? 1 : 0) + (relaxB >= 0 ? 1 : 0);
    }
  }

  /**
   * Face {@code axis} (0..5 as {@link #FACES}): rows {@code sign·(q_a − q_b) ≥ bound} at the
   * position indices {@code points} with padded big-M per point.
   */
  public record Face(int axis, double bound, int[] points, double[] bigM) {
    public double sign() {
      return axis % 2 == 0 ? 1 : -1;
    }

    public boolean vertical() {
      return axis >= 4;
    }
  }

  static SeparationLayout of(int a, int b, String nameA, String nameB, String tagA, String tagB, double distance,
      double planGrow, double verticalGrow, FormulationLayout.Domains da, FormulationLayout.Domains db,
      ArrivalLayout arrA, ArrivalLayout arrB, List<Fact> facts, long[] tally) {
    boolean guard = da.guard();
    int faces = da.threeD() ? 6 : 4;
    List<Slot> slots = new ArrayList<>();
    for (int s = AvoidanceLayout.firstSlot(guard); s <= AvoidanceLayout.lastSlot(guard, da.horizon()); s++) {
      int[] pts = AvoidanceLayout.points(s, guard);
      int relaxA = AvoidanceLayout.relaxBy(s, guard, arrA);
      int relaxB = AvoidanceLayout.relaxBy(s, guard, arrB);
      List<Face> all = new ArrayList<>();
      List<Face> possible = new ArrayList<>();
      boolean satisfied = false;
      for (int axis = 0; axis < faces; axis++) {
        double bound = distance + (axis >= 4 ? verticalGrow : planGrow);
        double[] m = new double[pts.length];
        int[] keep = new int[pts.length];
        double[] keptM = new double[pts.length];
        int kept = 0;
        boolean everywhere = true;
        boolean ok = true;
        for (int i = 0; i < pts.length; i++) {
          double[] range = difference(axis, da, db, pts[i]);
          double raw = bound - range[0];
          m[i] = BigM.pad(raw);
          everywhere &= raw <= 0;
          ok &= range[1] >= bound - Geometry.TOLERANCE * Math.max(1, Math.abs(bound));
          if (raw > 0) {
            keep[kept] = pts[i];
            keptM[kept] = m[i];
            kept++;
          }
        }
        all.add(new Face(axis, bound, pts.clone(), m));
        if (!da.pruning()) {
          continue;
        }
        satisfied |= everywhere;
        if (ok) {
          possible.add(new Face(axis, bound, Arrays.copyOf(keep, kept), Arrays.copyOf(keptM, kept)));
        }
      }
      if (!da.pruning()) {
        slots.add(new Slot(s, false, false, relaxA, relaxB, all));
      } else if (satisfied) {
        tally[0]++;
      } else if (possible.isEmpty()) {
        tally[2]++;
        facts.add(new Fact("vehicles-always-close", nameA, s, "vehicles " + nameA + " and " + nameB
            + " cannot be " + distance + " m apart at step " + pts[pts.length - 1]
            + " wherever they are: the plan is infeasible unless one arrives earlier"));
        slots.add(new Slot(s, false, true, relaxA, relaxB, all));
      } else {
        boolean hard = possible.size() == 1;
        tally[1] += hard ? 1 : 0;
        slots.add(new Slot(s, hard, false, relaxA, relaxB, possible));
      }
    }
    return new SeparationLayout(a, b, nameA, nameB, tagA, tagB, distance, slots);
  }

  /** [min, max] of sign·(q_a − q_b) on the axis over the two domain boxes at position index p. */
  private static double[] difference(int axis, FormulationLayout.Domains da, FormulationLayout.Domains db, int p) {
    double loA;
    double hiA;
    double loB;
    double hiB;
    if (axis >= 4) {
      Span sa = da.altitude(p);
      Span sb = db.altitude(p);
      loA = sa.lo();
      hiA = sa.hi();
      loB = sb.lo();
      hiB = sb.hi();
    } else {
      Bounds ba = da.position(p);
      Bounds bb = db.position(p);
      boolean x = axis < 2;
      loA = x ? ba.xmin() : ba.ymin();
      hiA = x ? ba.xmax() : ba.ymax();
      loB = x ? bb.xmin() : bb.ymin();
      hiB = x ? bb.xmax() : bb.ymax();
    }
    double lo = loA - hiB;
    double hi = hiA - loB;
    return axis % 2 == 0 ? new double[] {lo, hi} : new double[] {-hi, -lo};
  }

  void count(Sizes.Counter c) {
    for (Slot s : slots) {
      if (!s.hard()) {
        c.separation += s.faces().size();
        c.row(s.faces().size() + s.relaxTerms());
      }
      for (Face f : s.faces()) {
        c.rows(f.points().length, 2 + (s.hard() ? s.relaxTerms() : 1));
      }
    }
  }
}
