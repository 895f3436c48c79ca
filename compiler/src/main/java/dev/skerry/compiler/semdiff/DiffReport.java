package dev.skerry.compiler.semdiff;

import java.util.List;

/**
 * The semantic difference between two versions of a scenario: every change in order (scenario,
 * vehicles, area, zones, targets, waypoints, plan) and the predicted sizes of both versions (null
 * when they cannot be predicted).
 */
public record DiffReport(String oldLabel, String newLabel, List<Change> changes, SizeFigures sizesBefore,
    SizeFigures sizesAfter) {
  public DiffReport {
    changes = List.copyOf(changes);
  }

  /** True when both versions mean the same. */
  public boolean identical() {
    return changes.isEmpty();
  }

  public boolean hasSizes() {
    return sizesBefore != null && sizesAfter != null;
  }
}
