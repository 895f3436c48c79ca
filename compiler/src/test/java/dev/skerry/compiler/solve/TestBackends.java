package dev.skerry.compiler.solve;

import dev.skerry.compiler.solve.ojalgo.OjAlgoBackend;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import java.util.List;
import java.util.stream.Stream;

/** The backends the tests run, shared so every test class sees the same set. */
final class TestBackends {
  private TestBackends() {}

  static final Backends ALL = Backends.standard();

  /** The backends that solve our model exactly. */
  static List<SolverBackend> exact() {
    return List.of(
        new OjAlgoBackend(),
        new OrToolsBackend(Engine.SCIP),
        new OrToolsBackend(Engine.CBC),
        new OrToolsBackend(Engine.HIGHS));
  }

  static Stream<SolverBackend> exactStream() {
    return exact().stream();
  }

  static Stream<SolverBackend> orTools() {
    return Stream.of(Engine.values()).map(OrToolsBackend::new);
  }

  static SolverBackend cpSat() {
    return new OrToolsBackend(Engine.CP_SAT);
  }
}
