package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.model.Scenario;
import java.util.List;

/**
 * What checking a scenario gives: the files read (main first), the names declared, the scenario in
 * SI units (null when errors leave it incomplete; present but not to be solved when a hint is an
 * error) and every diagnostic, in source order.
 */
public record CheckResult(List<ScenarioFile> files, SymbolTable symbols, Scenario scenario, List<Diagnostic> diagnostics) {
  public CheckResult {
    files = List.copyOf(files);
    diagnostics = List.copyOf(diagnostics);
  }

  public boolean hasErrors() {
    return diagnostics.stream().anyMatch(Diagnostic::isError);
  }

  public ScenarioFile main() {
    return files.get(0);
  }
}
