package dev.skerry.compiler.solve;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.solve.ojalgo.OjAlgoBackend;
import dev.skerry.compiler.solve.ortools.Engine;
import dev.skerry.compiler.solve.ortools.OrToolsBackend;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The solver backends by id, and the choice behind {@code default}: the first capable of {@link
 * #DEFAULT_ORDER}. SCIP comes first because it was the most consistent across sizes, honours its
 * time limit with an incumbent and uses a hint well (SOLVERS.md); ojAlgo comes last because it is
 * much slower on many binaries, but it is pure Java and so always there.
 */
public final class Backends {
  public static final String DEFAULT = "default";
  public static final List<String> DEFAULT_ORDER = List.of("scip", "cbc", "highs", "ojalgo");

  private final Map<String, SolverBackend> byId = new LinkedHashMap<>();

  /** A registry of the given backends; their ids must be distinct and not {@code default}. */
  public Backends(List<? extends SolverBackend> backends) {
    for (SolverBackend b : backends) {
      String id = b.id();
      if (DEFAULT.equals(id) || byId.putIfAbsent(id, b) != null) {
        throw new IllegalArgumentException("backend id '" + id + "' is reserved or used twice");
      }
    }
  }

  /** ojAlgo and the four OR-Tools engines. */
  public static Backends standard() {
    List<SolverBackend> all = new ArrayList<>();
    all.add(new OjAlgoBackend());
    for (Engine e : Engine.values()) {
      all.add(new OrToolsBackend(e));
    }
    return new Backends(all);
  }

  /** Every id a user may type, {@code default} first. */
  public List<String> ids() {
    List<String> ids = new ArrayList<>();
    ids.add(DEFAULT);
    ids.addAll(byId.keySet());
    return ids;
  }

  /**
   * A backend chosen for a model, and a one-line notice for the user when the choice deserves one
   * (a fallback, or an approximate engine).
   */
  public record Choice(SolverBackend backend, Optional<String> notice) {}

  /**
   * The backend for an id ({@code default} when null or blank), ids compared ignoring case.
   *
   * @throws IllegalArgumentException for an unknown id, naming the valid ones
   * @throws IllegalStateException when {@code default} finds no capable backend, with each reason
   */
  public Choice choose(String id, Milp model) {
    String key = id == null || id.isBlank() ? DEFAULT : id.trim().toLowerCase(Locale.ROOT);
    if (DEFAULT.equals(key)) {
      return chooseDefault(model);
    }
    SolverBackend backend = byId.get(key);
    if (backend == null) {
      throw new IllegalArgumentException(
          "unknown solver '" + id + "'; choose one of: " + String.join(", ", ids()));
    }
    Capability c = backend.capableOf(model);
    if (!c.capable()) {
      return new Choice(backend, Optional.of("solver " + key + " cannot run here: " + c.reason()));
    }
    if ("cpsat".equals(key)) {
      return new Choice(
          backend,
          Optional.of("solver cpsat scales the model to integers: its optimum is approximate"));
    }
    return new Choice(backend, Optional.empty());
  }

  private Choice chooseDefault(Milp model) {
    List<String> refusals = new ArrayList<>();
    for (String candidate : DEFAULT_ORDER) {
      SolverBackend backend = byId.get(candidate);
      if (backend == null) {
        continue;
      }
      Capability c = backend.capableOf(model);
      if (c.capable()) {
        return new Choice(backend, notice(candidate, refusals, model));
      }
      refusals.add(candidate + ": " + c.reason());
    }
    throw new IllegalStateException(
        "no solver can run this model here: "
            + (refusals.isEmpty() ? "none is registered" : String.join("; ", refusals)));
  }

  private static Optional<String> notice(String chosen, List<String> refusals, Milp model) {
    if (refusals.isEmpty()) {
      return Optional.empty();
    }
    String why = refusals.get(0);
    if (OjAlgoBackend.ID.equals(chosen)) {
      return Optional.of(
          "falling back to ojAlgo ("
              + why
              + "); it is much slower on models with many binaries, and this one has "
              + model.binaryCount());
    }
    return Optional.of("falling back to " + chosen + " (" + why + ")");
  }
}
