package dev.skerry.compiler.plan;

import dev.skerry.compiler.model.Bounds;
import java.util.List;

/** A cluster box the MILP chose and the zones assigned to it (empty when the cluster is unused). */
public record ClusterBox(String name, Bounds box, List<String> zones) {
  public ClusterBox {
    zones = List.copyOf(zones);
  }
}
