package dev.skerry.compiler.io;

import java.util.Optional;

/**
 * What a writer put in a file, beyond the model itself.
 *
 * @param format the format written
 * @param objectiveNegated true when the model maximises: the file minimises the negated objective,
 *     so an outside solver's optimum must be negated back
 * @param objectiveRow the name of the objective row in the file
 * @param constantColumn the column fixed at 1 that carries the objective constant, when one was
 *     written
 * @param names the names that had to be replaced (empty when none was)
 * @param rows constraint rows in the file (a range counts once in MPS and twice in LP; a dummy LP
 *     row counts too)
 * @param columns columns in the file, the constant column included
 * @param nonZeros constraint-matrix entries written (the objective not counted)
 */
public record WriteSummary(
    ModelFormat format,
    boolean objectiveNegated,
    String objectiveRow,
    Optional<String> constantColumn,
    NameMap names,
    long rows,
    long columns,
    long nonZeros) {

  /** Turns an outside solver's optimum of the written file into the optimum of the model. */
  public double modelObjective(double fileObjective) {
    return objectiveNegated ? -fileObjective : fileObjective;
  }
}
