package dev.skerry.compiler.analysis;

/**
 * The part of the MILP that belongs to one vehicle: its states and limits ({@link MotionLayout}),
 * its variable horizon and target choice ({@link ArrivalLayout}) and its avoidance of every zone or
 * cluster box ({@link AvoidanceLayout}). {@code scope} is what the vehicle adds to column and row
 * names: empty for a single vehicle (so its names read as before), {@code tag_} in a fleet.
 * {@code planMargin} and {@code verticalMargin} are how far zones grow for it (see {@link
 * FormulationLayout#margin}).
 */
public record VehicleLayout(
    int index,
    String name,
    String tag,
    String scope,
    FormulationLayout.Domains domains,
    MotionLayout motion,
    ArrivalLayout arrival,
    AvoidanceLayout avoidance,
    double planMargin,
    double verticalMargin) {

  public Reachability reach() {
    return domains.reach();
  }

  /** The owner written into origins: the vehicle's name in a fleet, empty for a single vehicle. */
  public String owner() {
    return scope.isEmpty() ? "" : name;
  }
}
