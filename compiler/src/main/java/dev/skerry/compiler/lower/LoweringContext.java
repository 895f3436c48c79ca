package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.analysis.MotionLayout;
import dev.skerry.compiler.analysis.VehicleLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Vec2;

/**
 * What the lowering pieces share while one vehicle's part of the MILP is built: the builder, the
 * whole layout and this vehicle's part of it, and the columns created so far (states, inputs,
 * fuel, arrival, and the fleet's cluster bounds), indexed by step. In 3-D the altitude channel
 * (pz, vz, uz, wz) is filled; in 2-D those arrays stay empty.
 */
final class LoweringContext {
  final MilpBuilder builder;
  final FormulationLayout layout;
  final VehicleLayout part;
  final String vehicle;
  final String vehicleTag;
  /** Added to the names of rows and columns not already named after the vehicle: "" or "tag_". */
  final String scope;
  final Variable[] px;
  final Variable[] py;
  final Variable[] vx;
  final Variable[] vy;
  final Variable[] ux;
  final Variable[] uy;
  final Variable[] wx;
  final Variable[] wy;
  final Variable[] pz;
  final Variable[] vz;
  final Variable[] uz;
  final Variable[] wz;
  /** f[candidate][k], null where the layout has no arrival in that target at k. */
  final Variable[][] arrive;
  /** d_k = "arrived by k", null where the layout has none. */
  final Variable[] done;
  /** Cluster bounds [l][xmin, xmax, ymin, ymax], shared by the fleet. */
  Variable[][] clusterBounds = new Variable[0][];

  LoweringContext(MilpBuilder builder, FormulationLayout layout, VehicleLayout part) {
    this.builder = builder;
    this.layout = layout;
    this.part = part;
    this.vehicle = part.name();
    this.vehicleTag = part.tag();
    this.scope = part.scope();
    int n = part.motion().horizon();
    px = new Variable[n + 1];
    py = new Variable[n + 1];
    vx = new Variable[n + 1];
    vy = new Variable[n + 1];
    ux = new Variable[n];
    uy = new Variable[n];
    wx = new Variable[n];
    wy = new Variable[n];
    boolean z = part.motion().climb() != null;
    pz = new Variable[z ? n + 1 : 0];
    vz = new Variable[z ? n + 1 : 0];
    uz = new Variable[z ? n : 0];
    wz = new Variable[z ? n : 0];
    arrive = new Variable[part.arrival().candidates().size()][n + 1];
    done = new Variable[n + 1];
  }

  MotionLayout motion() {
    return part.motion();
  }

  /** An origin owned by this vehicle in a fleet. */
  Origin origin(String entity, String role, int k) {
    return Origin.of(entity, role, k).ownedBy(part.owner());
  }

  /** {@code n·p_k} as a fresh expression; zero components add no term. */
  LinearExpr position(Vec2 n, int k) {
    return along(n, px[k], py[k]);
  }

  /** {@code n·p_k + nz·z_k}. */
  LinearExpr position(Vec2 n, double nz, int k) {
    LinearExpr e = along(n, px[k], py[k]);
    if (nz != 0) {
      e.add(pz[k], nz);
    }
    return e;
  }

  LinearExpr velocity(Vec2 n, int k) {
    return along(n, vx[k], vy[k]);
  }

  /** {@code n·v_k + nz·ż_k}. */
  LinearExpr velocity(Vec2 n, double nz, int k) {
    LinearExpr e = along(n, vx[k], vy[k]);
    if (nz != 0) {
      e.add(vz[k], nz);
    }
    return e;
  }

  static LinearExpr along(Vec2 n, Variable x, Variable y) {
    LinearExpr e = new LinearExpr();
    if (n.x() != 0) {
      e.add(x, n.x());
    }
    if (n.y() != 0) {
      e.add(y, n.y());
    }
    return e;
  }

  /** d_k, or null when no arrival can have happened by k. */
  Variable doneBy(int k) {
    return k >= 0 && k < done.length ? done[k] : null;
  }

  /** Every arrival binary of this vehicle with its step, weighted by k·Δt·weight, added to {@code e}. */
  void addArrivalTime(LinearExpr e, double weight) {
    double dt = part.motion().step();
    for (var s : part.arrival().steps()) {
      e.add(arrive[s.target()][s.step()], weight * s.step() * dt);
    }
  }
}
