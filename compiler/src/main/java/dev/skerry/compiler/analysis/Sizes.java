package dev.skerry.compiler.analysis;

/**
 * The size of a lowered MILP, counted from its {@link FormulationLayout}: binaries split by what
 * causes them, continuous columns, rows and constraint-matrix non-zeros (objective not counted).
 *
 * @param zoneBoxBinaries face binaries of box zones avoided one by one
 * @param zonePolygonBinaries face binaries of polygon zones avoided one by one
 * @param arrivalBinaries arrival-step binaries of the variable horizon
 * @param waypointBinaries visit binaries of waypoints
 * @param clusterAssignmentBinaries zone-to-cluster assignment binaries
 * @param clusterAvoidanceBinaries face binaries of cluster boxes
 * @param separationBinaries face binaries keeping pairs of vehicles of a fleet apart
 */
public record Sizes(
    long zoneBoxBinaries,
    long zonePolygonBinaries,
    long arrivalBinaries,
    long waypointBinaries,
    long clusterAssignmentBinaries,
    long clusterAvoidanceBinaries,
    long separationBinaries,
    long continuous,
    long rows,
    long nonZeros) {

  /** Sizes of a model without separation binaries (one vehicle). */
  public Sizes(long zoneBoxBinaries, long zonePolygonBinaries, long arrivalBinaries, long waypointBinaries,
      long clusterAssignmentBinaries, long clusterAvoidanceBinaries, long continuous, long rows, long nonZeros) {
    this(zoneBoxBinaries, zonePolygonBinaries, arrivalBinaries, waypointBinaries, clusterAssignmentBinaries,
        clusterAvoidanceBinaries, 0, continuous, rows, nonZeros);
  }

  public long binaries() {
    return zoneBoxBinaries + zonePolygonBinaries + arrivalBinaries + waypointBinaries
        + clusterAssignmentBinaries + clusterAvoidanceBinaries + separationBinaries;
  }

  public long columns() {
    return binaries() + continuous;
  }

  /** Accumulates counts while a layout is walked. */
  static final class Counter {
    long zoneBox;
    long zonePolygon;
    long arrival;
    long waypoint;
    long clusterAssignment;
    long clusterAvoidance;
    long separation;
    long continuous;
    long rows;
    long nonZeros;

    void row(long terms) {
      rows++;
      nonZeros += terms;
    }

    void rows(long count, long termsEach) {
      rows += count;
      nonZeros += count * termsEach;
    }

    Sizes toSizes() {
      return new Sizes(zoneBox, zonePolygon, arrival, waypoint, clusterAssignment, clusterAvoidance, separation,
          continuous, rows, nonZeros);
    }
  }
}
