package dev.skerry.compiler.check;

import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.compiler.syntax.ScenarioReader;
import java.util.Locale;

/**
 * The front end in one call: read the text, expand includes, resolve and check, and (when the
 * scenario is complete) compute the feasibility hints. Used by {@code skerry check}, every later
 * command and the language server. Never throws on bad input.
 */
public final class ScenarioChecker {
  private ScenarioChecker() {}

  public static CheckResult check(SourceFile main, SourceLoader loader) {
    Diagnostics sink = new Diagnostics();
    ScenarioFile file = ScenarioReader.read(main, sink);
    Includes.Expansion expansion = Includes.expand(file, loader, sink);
    Checker checker = new Checker(sink);
    Scenario scenario = null;
    try {
      scenario = checker.check(file, expansion.decls());
      if (scenario != null && Analysis.binaryBound(scenario) > Analysis.MAX_BINARIES) {
        sink.report(Code.MODEL_TOO_LARGE, checker.planRanges().getOrDefault("horizon", new SourceRange(main, 0, 0)),
            String.format(Locale.ROOT, "this plan could have up to %,d binaries before pruning, more than the %,d"
                + " Skerry builds: use fewer vehicles, free targets, zones or steps",
                Analysis.binaryBound(scenario), Analysis.MAX_BINARIES));
        scenario = null;
      } else if (scenario != null) {
        Hints.report(scenario, sink, checker.planRanges());
      }
    } catch (StackOverflowError e) {
      sink.report(Code.NESTING_TOO_DEEP, new SourceRange(main, 0, 0),
          "an expression is too deeply nested to evaluate; simplify it");
      scenario = null;
    }
    return new CheckResult(expansion.files(), checker.symbols(), scenario, sink.sorted());
  }
}
