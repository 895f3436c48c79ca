package dev.skerry.compiler.semdiff;

import java.util.List;

/**
 * What happened to one entity of a scenario between two versions. {@code kind} is the keyword that
 * declares it ("zone", "vehicle", "plan", ...); {@code name} its name in the old version (in the
 * new one when added); {@code newName} the new name of a renamed entity.
 */
public record Change(String kind, String name, Status status, String newName, List<Detail> details) {
  public Change {
    details = List.copyOf(details);
  }

  public enum Status {
    ADDED("added"),
    REMOVED("removed"),
    RENAMED("renamed"),
    CHANGED("changed");

    private final String word;

    Status(String word) {
      this.word = word;
    }

    public String word() {
      return word;
    }
  }

  /**
   * One difference of one field: the values before and after as written for people (with units;
   * null when the field is absent on that side) and a phrase that says what it means.
   */
  public record Detail(String field, String before, String after, String phrase) {}

  /** How the change is named in messages: {@code zone reef}, or {@code plan} for the plan. */
  public String subject() {
    return name == null || name.isEmpty() ? kind : kind + " " + name;
  }
}
