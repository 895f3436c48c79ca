package dev.skerry.compiler.milp;

/**
 * Where a column or row comes from in the scenario: the entity (vehicle, zone, cluster, target,
 * waypoint), the role it plays in the formulation (e.g. {@code px}, {@code avoid}), the time step
 * (-1 when the item is not tied to a step), and in a fleet the vehicle it belongs to ({@code owner};
 * empty for single-vehicle models and fleet-wide items such as cluster bounds). Lets a solution and
 * a culprit row map back to the text.
 */
public record Origin(String entity, String role, int step, String owner) {
  public static final Origin NONE = new Origin("", "", -1, "");

  public Origin {
    entity = entity == null ? "" : entity;
    role = role == null ? "" : role;
    owner = owner == null ? "" : owner;
  }

  public Origin(String entity, String role, int step) {
    this(entity, role, step, "");
  }

  public static Origin of(String entity, String role, int step) {
    return new Origin(entity, role, step, "");
  }

  public static Origin of(String entity, String role) {
    return new Origin(entity, role, -1, "");
  }

  /** The same origin belonging to vehicle {@code vehicle} (unchanged when {@code vehicle} is empty). */
  public Origin ownedBy(String vehicle) {
    return vehicle == null || vehicle.isEmpty() ? this : new Origin(entity, role, step, vehicle);
  }
}
