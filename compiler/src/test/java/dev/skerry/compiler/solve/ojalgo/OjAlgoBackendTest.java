package dev.skerry.compiler.solve.ojalgo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.solve.SolveOptions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ojalgo.optimisation.integer.IntegerStrategy;
import org.ojalgo.type.context.NumberContext;

class OjAlgoBackendTest {
  /** The tolerance handed to ojAlgo allows at most the gap asked for, and not ten times less. */
  @ParameterizedTest(name = "gap {0}")
  @ValueSource(doubles = {0.2, 0.05, 0.01, 0.005, 1e-4, 1e-6})
  void gapBecomesADigitCountNoLooserThanAsked(double gap) {
    NumberContext context = OjAlgoBackend.gapContext(gap);
    double allowed = context.error(1000.0) / 1000.0;
    assertTrue(allowed <= gap * (1 + 1e-9), context + " allows " + allowed);
    assertTrue(allowed > gap / 10, context + " allows only " + allowed);
  }

  @ParameterizedTest(name = "at {0}")
  @ValueSource(doubles = {1e-3, 1, 1000})
  void defaultGapIsOjAlgosOwnDefault(double value) {
    NumberContext ours = OjAlgoBackend.gapContext(SolveOptions.DEFAULT_RELATIVE_GAP);
    assertEquals(IntegerStrategy.DEFAULT.getGapTolerance().error(value), ours.error(value));
  }
}
