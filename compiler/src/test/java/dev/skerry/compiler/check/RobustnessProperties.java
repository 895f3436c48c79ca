package dev.skerry.compiler.check;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Combinators;

/** Whatever the text, checking returns diagnostics whose ranges lie inside the document; it never throws. */
class RobustnessProperties {
  private static final List<String> TOKENS = List.of("scenario", "units", "const", "include", "vehicle", "dynamics",
      "double_integrator", "start", "at", "rest", "velocity", "moving", "heading", "speed", "accel", "max", "radius",
      "sides", "area", "zone", "target", "point", "within", "waypoint", "box", "to", "polygon", "plan", "step", "horizon",
      "minimize", "time", "fuel", "clusters", "ordered", "closed_loop", "solver", "time_limit", "gap", "threads",
      "guard", "pruning", "on", "off", "(", ")", "{", "}", ",", "=", "+", "-", "*", "/", "%", "0", "1", "2.5", "1e3",
      "-4", "m", "s", "m/s", "m/s^2", "km/h", "kn", "deg", "x", "reef", "\"z.skerry\"", "\n", "//c\n", "/*", "*/", "#",
      "@", "\u0000", "é");

  private static final Path ROOT = Path.of("../examples").toAbsolutePath().normalize();

  @Property(tries = 300)
  void randomTokenSequencesNeverThrow(@ForAll("tokenSequences") String text) {
    assertWellFormed(text);
  }

  @Property(tries = 300)
  void mutatedExamplesNeverThrow(@ForAll("mutations") String text) {
    assertWellFormed(text);
  }

  private static void assertWellFormed(String text) {
    SourceFile source = SourceFile.of(ROOT.resolve("generated.skerry"), text);
    CheckResult result = ScenarioChecker.check(source, new DiskLoader(ROOT));
    for (Diagnostic d : result.diagnostics()) {
      int length = d.range().source().length();
      assertTrue(d.range().start() >= 0 && d.range().start() <= d.range().end() && d.range().end() <= length,
          "range out of the document: " + d.format());
      assertTrue(!d.message().isBlank(), "empty message");
    }
  }

  @Provide
  Arbitrary<String> tokenSequences() {
    return Arbitraries.of(TOKENS).list().ofMaxSize(120).map(l -> String.join(" ", l));
  }

  @Provide
  Arbitrary<String> mutations() throws IOException {
    List<String> texts;
    try (var files = Files.list(ROOT)) {
      texts = files.filter(p -> p.toString().endsWith(".skerry")).sorted().map(p -> {
        try {
          return Files.readString(p);
        } catch (IOException e) {
          throw new IllegalStateException("cannot read example " + p, e);
        }
      }).toList();
    }
    Arbitrary<String> base = Arbitraries.of(texts);
    Arbitrary<Double> where = Arbitraries.doubles().between(0, 1);
    Arbitrary<Integer> kind = Arbitraries.integers().between(0, 3);
    Arbitrary<String> insert = Arbitraries.of(TOKENS);
    Arbitrary<Integer> span = Arbitraries.integers().between(1, 40);
    return Combinators.combine(base, where, kind, insert, span).as((text, at, k, token, n) -> {
      int i = (int) (at * text.length());
      int j = Math.min(text.length(), i + n);
      return switch (k) {
        case 0 -> text.substring(0, i) + text.substring(j);            // delete a span
        case 1 -> text.substring(0, i) + token + text.substring(i);     // insert a token
        case 2 -> text.substring(0, i) + token + text.substring(j);     // replace a span
        default -> text.substring(0, i) + text.substring(i, j) + text.substring(i); // duplicate a span
      };
    });
  }
}
