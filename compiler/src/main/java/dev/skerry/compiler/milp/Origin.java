package dev.skerry.compiler.milp;

/**
 * Where a column or row comes from in the scenario: the entity (vehicle, zone, cluster, target,
 * waypoint), the role it plays in the formulation (e.g. {@code px}, {@code avoid}) and the time
 * step, or -1 when the item is not tied to a step. Lets a solution and a culprit row map back to
 * the text.
 */
public record Origin(String entity, String role, int step) {
  public static final Origin NONE = new Origin("", "", -1);

  public Origin {
    entity = entity == null ? "" : entity;
    role = role == null ? "" : role;
  }

  public static Origin of(String entity, String role, int step) {
    return new Origin(entity, role, step);
  }

  public static Origin of(String entity, String role) {
    return new Origin(entity, role, -1);
  }
}
