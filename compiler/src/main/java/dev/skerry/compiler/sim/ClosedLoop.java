package dev.skerry.compiler.sim;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.verify.Verifier;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Receding horizon: from the current state, lower and solve the scenario with the configured
 * horizon, apply the plan's first input to the plant for one step, move, and solve again. The plant
 * is the same double integrator (with its altitude channel in 3-D), optionally pushed by a bounded
 * random velocity disturbance drawn from a seeded generator. When an iteration finds no plan the
 * loop keeps flying the last plan's next inputs while they last, and says so.
 *
 * <p>A fleet is planned together at every iteration. A vehicle that arrives leaves the loop (and
 * the shared space): later iterations plan the others only, and a target it took by assignment is
 * no longer offered. The time cost flown is the sum of arrival times, or with {@code latest} time
 * the time until the last arrival.
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

  /** One vehicle's plant state and record while the loop runs. */
  private static final class Craft {
    final Vehicle vehicle;
    Vec2 p;
    Vec2 v;
    double z;
    double w;
    final List<Sample> flown = new ArrayList<>();
    boolean arrived;
    String target;
    Trajectory fallbackPlan;

    Craft(Vehicle vehicle) {
      this.vehicle = vehicle;
      this.p = vehicle.start();
      this.v = vehicle.startVelocity();
      this.z = vehicle.vertical() == null ? 0 : vehicle.vertical().start();
      this.w = vehicle.vertical() == null ? 0 : vehicle.vertical().startRate();
      this.target = vehicle.target();
    }
  }

  public LoopResult run(Scenario scenario, String solverId, Listener listener) {
    Random random = new Random(seed);
    double dt = scenario.plan().step();
    double wt = scenario.plan().timeWeight();
    double wf = scenario.plan().fuelWeight();
    boolean latest = scenario.fleet() && scenario.plan().latestArrival();
    List<Craft> crafts = new ArrayList<>();
    for (Vehicle v : scenario.vehicles()) {
      crafts.add(new Craft(v));
    }
    List<Iteration> iterations = new ArrayList<>();
    double flownTime = 0;
    double flownFuel = 0;
    List<Trajectory> firstPredictions = null;
    int fallbackIndex = 0;
    LoopResult.Stop stop = LoopResult.Stop.LIMIT;
    Milp previousMilp = null;
    double[] previousValues = null;
    for (int i = 0; i < scenario.plan().closedLoopMax(); i++) {
      List<Craft> active = crafts.stream().filter(c -> !c.arrived).toList();
      Scenario now = current(scenario, crafts, active);
      final Milp lastMilp = previousMilp;
      final double[] lastValues = previousValues;
      PlanResult r = planner.plan(now, solverId, options, SolveMonitor.NONE,
          lastMilp == null ? null : next -> ShiftedStart.of(lastMilp, lastValues, next, dt));
      double seconds = r.solve().wallTime().toNanos() / 1e9;
      boolean fallback;
      double predicted;
      boolean anyArrivesNext = false;
      if (r.hasPlan()) {
        if (firstPredictions == null) {
          firstPredictions = r.trajectories();
        }
        for (int a = 0; a < active.size(); a++) {
          Trajectory t = r.trajectories().get(a);
          active.get(a).fallbackPlan = t;
          if (t.target() != null) {
            active.get(a).target = t.target();
          }
          anyArrivesNext |= t.arrival() <= 1;
        }
        fallbackIndex = 1;
        previousMilp = r.milp();
        previousValues = r.solve().values();
        fallback = false;
        predicted = wt * flownTime + wf * flownFuel + r.solve().objective();
      } else if (active.get(0).fallbackPlan != null && fallbackIndex < active.get(0).fallbackPlan.arrival()) {
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
      int stepIndex = fallback ? fallbackIndex++ : 0;
      for (Craft c : active) {
        Sample planned = c.fallbackPlan.samples().get(Math.min(stepIndex, c.fallbackPlan.samples().size() - 1));
        Vec2 u = planned.accel();
        double uz = planned.climbAccel();
        c.flown.add(new Sample(i, i * dt, c.p, c.v, u, c.z, c.w, uz));
        Vec2 nextV = c.v.plus(u.times(dt));
        c.p = c.p.plus(c.v.times(dt)).plus(u.times(0.5 * dt * dt));
        c.z = c.z + c.w * dt + 0.5 * uz * dt * dt;
        c.w = c.w + uz * dt;
        if (disturbance > 0) {
          nextV = nextV.plus(new Vec2((2 * random.nextDouble() - 1) * disturbance,
              (2 * random.nextDouble() - 1) * disturbance));
        }
        c.v = nextV;
        flownFuel += (Math.abs(u.x()) + Math.abs(u.y()) + Math.abs(uz)) * dt;
        flownTime += latest ? 0 : dt;
      }
      flownTime += latest ? dt : 0;
      for (Craft c : active) {
        Target t = targetOf(scenario, c);
        boolean planArrivesNext = !fallback && c.fallbackPlan.arrival() <= 1;
        if (t != null && (arrived(scenario, c, t, 0) || (planArrivesNext && arrived(scenario, c, t, disturbance * dt)))) {
          c.arrived = true;
          c.target = t.name();
        }
      }
      Iteration it = new Iteration(i, r.solve().status(), seconds, r.milp().binaryCount(), predicted,
          wt * flownTime + wf * flownFuel, fallback, r.clusters());
      iterations.add(it);
      listener.onIteration(it);
      if (crafts.stream().allMatch(c -> c.arrived)) {
        stop = LoopResult.Stop.ARRIVED;
        break;
      }
      if (anyArrivesNext && crafts.stream().anyMatch(c -> c.arrived)) {
        previousMilp = null;
      }
    }
    List<Trajectory> paths = new ArrayList<>();
    for (Craft c : crafts) {
      c.flown.add(new Sample(c.flown.size(), c.flown.size() * dt, c.p, c.v, Vec2.ZERO, c.z, c.w, 0));
      String target = scenario.targets().size() > 1 ? c.target : null;
      paths.add(new Trajectory(c.vehicle.name(), dt, c.flown, c.flown.size() - 1, target));
    }
    return new LoopResult(iterations, paths, firstPredictions, stop, flownTime, flownFuel,
        wt * flownTime + wf * flownFuel, Verifier.verify(scenario, paths));
  }

  /**
   * The scenario to plan now: the vehicles still flying, from their current states, and the targets
   * not yet taken by an arrived vehicle.
   */
  private static Scenario current(Scenario scenario, List<Craft> crafts, List<Craft> active) {
    List<Vehicle> vehicles = new ArrayList<>();
    for (Craft c : active) {
      vehicles.add(c.vehicle.withStart(c.p, c.v, c.z, c.w));
    }
    List<Target> targets = new ArrayList<>();
    for (Target t : scenario.targets()) {
      boolean taken = crafts.stream().anyMatch(c -> c.arrived && t.name().equals(c.target));
      if (!taken) {
        targets.add(t);
      }
    }
    return scenario.withVehiclesAndTargets(vehicles, targets);
  }

  /** The target craft c is heading for: its own, the one its last plan chose, else the first candidate. */
  private static Target targetOf(Scenario s, Craft c) {
    if (c.target != null) {
      return s.target(c.target);
    }
    List<Target> candidates = s.candidateTargets(c.vehicle);
    return candidates.isEmpty() ? null : candidates.get(0);
  }

  /**
   * In the target (and at rest when asked), within the solver's accuracy plus {@code slack}: when the
   * plan applied arrives at the next step, a disturbed plant counts as arrived within what one
   * step of disturbance can move it (slack in metres, slack/Δt·Δt in m/s).
   */
  private static boolean arrived(Scenario s, Craft c, Target t, double slack) {
    var b = s.area().bounds();
    double tol = 1e-5 * Math.max(1, Math.hypot(b.width(), b.height())) + slack;
    for (Shape.Face f : t.region().faces()) {
      if (f.normal().dot(c.p) > f.offset() + tol) {
        return false;
      }
    }
    if (s.threeD() && t.altitude() != null && (c.z > t.altitude().hi() + tol || c.z < t.altitude().lo() - tol)) {
      return false;
    }
    double still = 1e-5 * Math.max(1, c.vehicle.maxSpeed()) + slack / s.plan().step() * 1.5;
    return !t.atRest() || (c.v.norm() <= still && (!s.threeD() || Math.abs(c.w) <= still));
  }
}
