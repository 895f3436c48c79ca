/**
 * Solving a {@link dev.skerry.compiler.milp.Milp} in-process, behind one small interface.
 *
 * <h2>Use</h2>
 *
 * <pre>{@code
 * Backends.Choice choice = Backends.standard().choose("default", milp);
 * choice.notice().ifPresent(System.err::println);      // e.g. a fallback to ojAlgo
 * SolveResult r = choice.backend().solve(milp,
 *     SolveOptions.defaults().withTimeLimit(Duration.ofSeconds(30)),
 *     progress -> ...);                                // elapsed, incumbent, bound
 * if (r.status().hasSolution()) { double x = r.value(someVariable); }
 * }</pre>
 *
 * Ids: {@code default} (the first capable of scip, cbc, highs, ojalgo), {@code ojalgo}, {@code
 * scip}, {@code cbc}, {@code highs}, {@code cpsat}. A backend never throws for a model it accepted;
 * every outcome is a {@link dev.skerry.compiler.solve.SolveResult} whose status says what a user
 * can do next, whose values have been checked against the model itself ({@link
 * dev.skerry.compiler.solve.SolutionCheck}), and whose objective includes the model's constant.
 *
 * <h2>Measured here (2 cores, OR-Tools 9.15, ojAlgo 56.1.1)</h2>
 *
 * <ul>
 *   <li>All exact backends (ojalgo, scip, cbc, highs) reach the same optimum within 1e-6 on the
 *       test models; CP-SAT, which solves a copy scaled to integers, was 8.5e-5 above the optimum
 *       on the 72-binary hop and exact on pure-integer models.
 *   <li>A 0.1 s time limit on a 1920-binary model: CP-SAT returns in 0.1 to 0.3 s, SCIP and HiGHS
 *       in 0.2 to 0.5 s, CBC in 0.2 to 1.1 s (it overruns its limit), all counting the model's
 *       translation; ojAlgo, stuck in its first LP, is left behind after its 1 s grace.
 *   <li>Cancel: SCIP, CP-SAT and ojAlgo (while branching) stop within 0.1 s; CBC and HiGHS cannot
 *       be interrupted, so the call returns at once and they run on to their own time limit.
 *   <li>OR-Tools natives: its own loader unpacks 71 MB into a new temp folder at every start (0.8
 *       s); from Skerry's cache folder the first start unpacks once (0.6 to 1.5 s) and later ones
 *       only load (about 0.08 s). Scanning /proc for stale temp copies costs about 0.2 s, so it is
 *       done only when the cache cannot be used.
 * </ul>
 *
 * Each backend's class comment lists the traps it works around; SOLVERS.md has the figures that
 * chose the default.
 */
package dev.skerry.compiler.solve;
