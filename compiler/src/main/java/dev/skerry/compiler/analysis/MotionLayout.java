package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import java.util.ArrayList;
import java.util.List;

/**
 * The continuous part: states p_k, v_k (k = 0..N), inputs u_k (k = 0..N−1), fuel auxiliaries
 * w_k when fuel is weighted, the dynamics, the speed and acceleration polygons, and the keep-in
 * area. A box area becomes the bounds of p_k (deflated by the radius); a polygon area adds one row
 * per face and step (k = 1..N), except where pruning shows the whole reach box already satisfies it.
 * The start state is fixed through the bounds of p_0 and v_0.
 */
public record MotionLayout(
    String vehicleTag,
    String vehicleName,
    int horizon,
    double step,
    Vec2 start,
    Vec2 startVelocity,
    LimitPolygon speed,
    LimitPolygon accel,
    Bounds positionBounds,
    boolean fuel,
    String areaTag,
    String areaName,
    List<KeepInRow> keepIn,
    Climb climb) {

  public MotionLayout {
    keepIn = List.copyOf(keepIn);
  }

  /**
   * The altitude channel of a 3-D scenario (null in 2-D): z_k, ż_k (k = 0..N) and a_k (k = 0..N−1)
   * with the same zero-order hold, |ż| ≤ {@code maxRate} and |a| ≤ {@code maxAccel} as bounds, z
   * within {@code altitudes} (keep-in floor and ceiling, shrunk by the radius); with fuel, an
   * auxiliary per step for |a|.
   */
  public record Climb(double start, double startRate, double maxRate, double maxAccel, Span altitudes) {}

  /** One keep-in row {@code n·p_k ≤ offset} of a polygon area. */
  public record KeepInRow(int step, int face, Vec2 normal, double offset) {}

  static MotionLayout of(Scenario s, Vehicle v, String tag, Names names, Reachability reach, boolean pruning) {
    int n = s.plan().horizon();
    Shape area = Reachability.deflatedArea(s, v);
    List<KeepInRow> rows = new ArrayList<>();
    if (area instanceof Shape.Polygon) {
      List<Shape.Face> faces = area.faces();
      for (int k = 1; k <= n; k++) {
        for (int j = 0; j < faces.size(); j++) {
          Shape.Face f = faces.get(j);
          if (pruning && Geometry.maxOver(reach.position(k), f.normal()) <= f.offset()) {
            continue;
          }
          rows.add(new KeepInRow(k, j, f.normal(), f.offset()));
        }
      }
    }
    Climb climb = null;
    if (v.vertical() != null) {
      Vehicle.Vertical vt = v.vertical();
      climb = new Climb(vt.start(), vt.startRate(), vt.maxClimb(), vt.maxClimbAccel(), VerticalReach.keepIn(s, v));
    }
    return new MotionLayout(tag, v.name(), n, s.plan().step(), v.start(),
        v.startVelocity(), LimitPolygon.inscribed(v.maxSpeed(), v.sides()),
        LimitPolygon.inscribed(v.maxAccel(), v.sides()), reach.keepIn(), s.plan().fuelWeight() != 0,
        names.tag("area", s.area().name()), s.area().name(), rows, climb);
  }

  /** Bound of every plan-view fuel auxiliary: the largest per-axis acceleration magnitude. */
  public double fuelBound() {
    return Math.max(Math.max(-accel.xmin(), accel.xmax()), Math.max(-accel.ymin(), accel.ymax()));
  }

  void count(Sizes.Counter c, ArrivalLayout arrival) {
    int n = horizon;
    c.continuous += 4L * (n + 1) + 2L * n;
    c.rows(2L * n, 4);
    c.rows(2L * n, 3);
    c.rows += (long) n * (speed.sides() + accel.sides());
    c.nonZeros += (long) n * (speed.termCount() + accel.termCount());
    if (fuel) {
      c.continuous += 2L * n;
      for (int k = 0; k < n; k++) {
        c.rows(4, arrival.hasDone(k) ? 3 : 2);
      }
    }
    for (KeepInRow r : keepIn) {
      c.row(Geometry.termCount(r.normal()));
    }
    if (climb != null) {
      c.continuous += 2L * (n + 1) + n;
      c.rows(n, 4);
      c.rows(n, 3);
      if (fuel) {
        c.continuous += n;
        for (int k = 0; k < n; k++) {
          c.rows(2, arrival.hasDone(k) ? 3 : 2);
        }
      }
    }
  }
}
