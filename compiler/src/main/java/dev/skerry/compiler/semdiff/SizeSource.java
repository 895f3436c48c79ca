package dev.skerry.compiler.semdiff;

import dev.skerry.compiler.model.Scenario;

/**
 * Where the diff gets predicted MILP sizes from: the command line passes the analysis stage;
 * {@link #NONE} answers null and the diff leaves sizes out (used by tests of the wording).
 */
@FunctionalInterface
public interface SizeSource {
  SizeSource NONE = scenario -> null;

  /** The predicted sizes of {@code scenario}, or null when they cannot be predicted. */
  SizeFigures sizes(Scenario scenario);
}
