/**
 * The write stage: a {@link dev.skerry.compiler.milp.Milp} to standard model files, and MPS back
 * to a model.
 *
 * <ul>
 *   <li>{@link dev.skerry.compiler.io.MpsWriter} (free and fixed MPS) and {@link
 *       dev.skerry.compiler.io.LpWriter} stream to any {@link java.lang.Appendable}; {@link
 *       dev.skerry.compiler.io.ModelFiles} writes a file atomically, with its {@link
 *       dev.skerry.compiler.io.NameMap} next to it when names had to change.
 *   <li>{@link dev.skerry.compiler.io.MpsReader} reads free and fixed MPS, ours and others'.
 * </ul>
 *
 * Conventions shared by the writers and the reader, chosen so that cbc and glpsol read our files
 * alike (see FORMATS.md):
 *
 * <ul>
 *   <li>Files minimise. A maximisation is written negated, and the file says so in a comment
 *       ({@code * skerry-objective-sense: maximize}) that our reader turns back into a
 *       maximisation; {@link dev.skerry.compiler.io.WriteSummary#modelObjective} turns an outside
 *       solver's optimum into the model's.
 *   <li>The objective constant is the cost of a column fixed at 1, named in a comment ({@code *
 *       skerry-objective-constant: OBJCONST}) so our reader folds it back. A RHS on the objective
 *       row of someone else's file {@code b} is read as the constant {@code -b}.
 *   <li>Names a format cannot hold become aliases ({@code C0000001}, {@code R0000001} in MPS;
 *       sanitized names in LP) listed in the name map; the same model always gets the same
 *       names and the same bytes.
 *   <li>Numbers read back to the very same double, range ends included. Fixed MPS refuses a model
 *       with a number that needs more than 12 characters for that, naming where it is.
 * </ul>
 */
package dev.skerry.compiler.io;
