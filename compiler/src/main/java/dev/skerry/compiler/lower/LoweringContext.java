package dev.skerry.compiler.lower;

import dev.skerry.compiler.analysis.FormulationLayout;
import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.model.Vec2;

/**
 * What the lowering pieces share while one MILP is built: the builder, the layout, and the columns
 * created so far (states, inputs, fuel, arrival, cluster bounds), indexed by step.
 */
final class LoweringContext {
  final MilpBuilder builder;
  final FormulationLayout layout;
  final String vehicle;
  final String vehicleTag;
  final Variable[] px;
  final Variable[] py;
  final Variable[] vx;
  final Variable[] vy;
  final Variable[] ux;
  final Variable[] uy;
  final Variable[] wx;
  final Variable[] wy;
  /** f_k, null where the layout has no arrival at k. */
  final Variable[] arrive;
  /** d_k = "arrived by k", null where the layout has none. */
  final Variable[] done;
  /** Cluster bounds [l][xmin, xmax, ymin, ymax]. */
  Variable[][] clusterBounds = new Variable[0][];

  LoweringContext(MilpBuilder builder, FormulationLayout layout) {
    this.builder = builder;
    this.layout = layout;
    this.vehicle = layout.motion().vehicleName();
    this.vehicleTag = layout.motion().vehicleTag();
    int n = layout.horizon();
    px = new Variable[n + 1];
    py = new Variable[n + 1];
    vx = new Variable[n + 1];
    vy = new Variable[n + 1];
    ux = new Variable[n];
    uy = new Variable[n];
    wx = new Variable[n];
    wy = new Variable[n];
    arrive = new Variable[n + 1];
    done = new Variable[n + 1];
  }

  /** {@code n·p_k} as a fresh expression; zero components add no term. */
  LinearExpr position(Vec2 n, int k) {
    return along(n, px[k], py[k]);
  }

  LinearExpr velocity(Vec2 n, int k) {
    return along(n, vx[k], vy[k]);
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
}
