package dev.skerry.compiler.analysis;

import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Vehicle;
import java.util.ArrayList;
import java.util.List;

/**
 * The altitude channel's reach in a 3-D scenario: per step k = 0..N an interval holding every
 * altitude and every climb rate the vehicle can have, by the same per-axis envelope as {@link
 * Reachability} (climb rate within ±climb max, vertical acceleration within ±climb accel max), the
 * altitudes for k ≥ 1 cut to {@code keepIn}: the keep-in volume's floor and ceiling and the
 * vehicle's own altitude limits, shrunk by its radius.
 */
public record VerticalReach(Span keepIn, List<Span> altitudes, List<Span> rates, List<Fact> facts) {

  public VerticalReach {
    altitudes = List.copyOf(altitudes);
    rates = List.copyOf(rates);
    facts = List.copyOf(facts);
  }

  /** The altitudes vehicle {@code v}'s centre may take: volume ∩ own limits, shrunk by the radius. */
  public static Span keepIn(Scenario s, Vehicle v) {
    Span volume = Span.orAll(s.area().altitude()).intersect(Span.orAll(v.vertical().limits()));
    if (!volume.bounded()) {
      throw new IllegalArgumentException("scenario " + s.name()
          + " is 3-D but its keep-in volume has no floor and ceiling");
    }
    return volume.expand(-v.radius());
  }

  static VerticalReach of(Scenario s, Vehicle v, boolean pruning) {
    Vehicle.Vertical vt = v.vertical();
    int n = s.plan().horizon();
    double dt = s.plan().step();
    Span keep = keepIn(s, v);
    double[][] a = Reachability.axis(vt.start(), vt.startRate(), -vt.maxClimb(), vt.maxClimb(),
        -vt.maxClimbAccel(), vt.maxClimbAccel(), dt, n);
    List<Fact> facts = new ArrayList<>();
    List<Span> alts = new ArrayList<>(n + 1);
    List<Span> rates = new ArrayList<>(n + 1);
    double eps = 1e-6 * Math.max(1, Math.abs(keep.length()));
    boolean reported = false;
    for (int k = 0; k <= n; k++) {
      if (k == 0) {
        alts.add(new Span(vt.start(), vt.start()));
        rates.add(new Span(vt.startRate(), vt.startRate()));
        continue;
      }
      Span raw = new Span(a[0][k] - eps, a[1][k] + eps);
      Span cut = raw.intersect(keep);
      if (cut.lo() > cut.hi()) {
        if (!reported) {
          facts.add(new Fact("altitude-unreachable", v.name(), k,
              "no altitude reachable at step " + k + " lies within the keep-in volume's floor and ceiling"));
          reported = true;
        }
        cut = raw;
      }
      alts.add(pruning ? cut : keep);
      double vpad = eps / Math.max(dt, 1e-9);
      rates.add(pruning ? new Span(a[2][k] - vpad, a[3][k] + vpad) : new Span(-vt.maxClimb(), vt.maxClimb()));
    }
    if (!keep.contains(vt.start())) {
      facts.add(new Fact("start-outside-volume", v.name(), 0,
          "the start altitude lies outside the keep-in volume's floor and ceiling shrunk by the radius"));
    }
    return new VerticalReach(keep, alts, rates, facts);
  }

  public Span altitude(int k) {
    return altitudes.get(k);
  }

  public Span rate(int k) {
    return rates.get(k);
  }
}
