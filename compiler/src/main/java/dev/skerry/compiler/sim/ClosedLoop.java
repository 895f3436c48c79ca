package dev.skerry.compiler.sim;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.verify.Verifier;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Receding horizon: from the current state, lower and solve the scenario with the configured
 * horizon, apply the plan's first input to the plant for one step, move, and solve again. The plant
 * is the same double integrator, optionally pushed by a bounded random velocity disturbance drawn
 * from a seeded generator. When an iteration finds no plan the loop keeps flying the last plan's
 * next inputs while they last, and says so.
 */
public final class ClosedLoop {
  private final Planner planner;
  private final SolveOptions options;
  private final double disturbance;
  private final long seed;

  /**
   * @param disturbance the largest velocity change per step and axis the plant may add, in m/s (0
   *     for none)
   */
  public ClosedLoop(Planner planner, SolveOptions options, double disturbance, long seed) {
    this.planner = planner;
    this.options = options;
    this.disturbance = disturbance;
    this.seed = seed;
  }

  /** A listener told of each iteration as it ends (for progress lines). */
  public interface Listener {
    Listener NONE = it -> {};

    void onIteration(Iteration it);
  }

  public LoopResult run(Scenario scenario, String solverId, Listener listener) {
    Random random = new Random(seed);
    double dt = scenario.plan().step();
    double wt = scenario.plan().timeWeight();
    double wf = scenario.plan().fuelWeight();
    Vec2 p = scenario.vehicle().start();
    Vec2 v = scenario.vehicle().startVelocity();
    List<Sample> flown = new ArrayList<>();
    List<Iteration> iterations = new ArrayList<>();
    double flownTime = 0;
    double flownFuel = 0;
    Trajectory firstPrediction = null;
    Trajectory fallbackPlan = null;
    int fallbackIndex = 0;
    LoopResult.Stop stop = LoopResult.Stop.LIMIT;
    dev.skerry.compiler.milp.Milp previousMilp = null;
    double[] previousValues = null;
    for (int i = 0; i < scenario.plan().closedLoopMax(); i++) {
      Scenario now = scenario.withStart(p, v);
      final dev.skerry.compiler.milp.Milp lastMilp = previousMilp;
      final double[] lastValues = previousValues;
      PlanResult r = planner.plan(now, solverId, options, SolveMonitor.NONE,
          lastMilp == null ? null : next -> ShiftedStart.of(lastMilp, lastValues, next, dt));
      double seconds = r.solve().wallTime().toNanos() / 1e9;
      Vec2 u;
      boolean fallback;
      boolean planArrivesNext = r.hasPlan() && r.trajectory().arrival() <= 1;
      double predicted;
      if (r.hasPlan()) {
        if (firstPrediction == null) {
          firstPrediction = r.trajectory();
        }
        fallbackPlan = r.trajectory();
        fallbackIndex = 1;
        previousMilp = r.milp();
        previousValues = r.solve().values();
        u = r.trajectory().samples().get(0).accel();
        fallback = false;
        predicted = wt * flownTime + wf * flownFuel + r.solve().objective();
      } else if (fallbackPlan != null && fallbackIndex < fallbackPlan.arrival()) {
        u = fallbackPlan.samples().get(fallbackIndex++).accel();
        fallback = true;
        previousMilp = null;
        predicted = Double.NaN;
      } else {
        iterations.add(new Iteration(i, r.solve().status(), seconds, r.milp().binaryCount(), Double.NaN,
            wt * flownTime + wf * flownFuel, false, List.of()));
        listener.onIteration(iterations.get(iterations.size() - 1));
        stop = LoopResult.Stop.NO_PLAN;
        break;
      }
      flown.add(new Sample(i, i * dt, p, v, u));
      Vec2 nextP = p.plus(v.times(dt)).plus(u.times(0.5 * dt * dt));
      Vec2 nextV = v.plus(u.times(dt));
      if (disturbance > 0) {
        nextV = nextV.plus(new Vec2((2 * random.nextDouble() - 1) * disturbance, (2 * random.nextDouble() - 1) * disturbance));
      }
      flownTime += dt;
      flownFuel += (Math.abs(u.x()) + Math.abs(u.y())) * dt;
      p = nextP;
      v = nextV;
      Iteration it = new Iteration(i, r.solve().status(), seconds, r.milp().binaryCount(), predicted,
          wt * flownTime + wf * flownFuel, fallback, r.clusters());
      iterations.add(it);
      listener.onIteration(it);
      if (arrived(scenario, p, v, 0) || (planArrivesNext && arrived(scenario, p, v, disturbance * dt))) {
        stop = LoopResult.Stop.ARRIVED;
        break;
      }
    }
    flown.add(new Sample(flown.size(), flown.size() * dt, p, v, Vec2.ZERO));
    Trajectory path = new Trajectory(scenario.vehicle().name(), dt, flown, flown.size() - 1);
    return new LoopResult(iterations, path, firstPrediction, stop, flownTime, flownFuel,
        wt * flownTime + wf * flownFuel, Verifier.verify(scenario, path));
  }

  /**
   * In the target (and at rest when asked), within the solver's accuracy plus {@code slack}: when the
   * plan applied arrives at the next step, a disturbed plant counts as arrived within what one
   * step of disturbance can move it (slack in metres, slack/Δt·Δt in m/s).
   */
  static boolean arrived(Scenario s, Vec2 p, Vec2 v, double slack) {
    var b = s.area().bounds();
    double tol = 1e-5 * Math.max(1, Math.hypot(b.width(), b.height())) + slack;
    for (Shape.Face f : s.target().region().faces()) {
      if (f.normal().dot(p) > f.offset() + tol) {
        return false;
      }
    }
    return !s.target().atRest() || v.norm() <= 1e-5 * Math.max(1, s.vehicle().maxSpeed()) + slack / s.plan().step() * 1.5;
  }
}
