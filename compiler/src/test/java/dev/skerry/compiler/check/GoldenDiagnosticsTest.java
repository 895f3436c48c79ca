package dev.skerry.compiler.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * Each file in {@code golden/} is a broken scenario carrying its own expectations as comments:
 * {@code # expect: CODE at LINE:COL} (optionally {@code in FILE} for a diagnostic in an included
 * file). The diagnostics reported must be exactly those, no more and no fewer.
 */
class GoldenDiagnosticsTest {
  static final Path GOLDEN = Path.of("src/test/resources/golden");
  private static final Pattern EXPECT = Pattern.compile("# expect: ([a-z-]+) at (\\d+):(\\d+)(?: in (\\S+))?");

  @TestFactory
  Stream<DynamicTest> everyGoldenFileReportsExactlyItsExpectations() throws IOException {
    try (Stream<Path> files = Files.list(GOLDEN)) {
      return files.filter(p -> p.toString().endsWith(".skerry")).sorted().toList().stream()
          .map(p -> DynamicTest.dynamicTest(p.getFileName().toString(), () -> checkGolden(p)));
    }
  }

  private static void checkGolden(Path file) throws IOException {
    String text = Files.readString(file);
    Set<String> expected = new TreeSet<>();
    Matcher m = EXPECT.matcher(text);
    while (m.find()) {
      String in = m.group(4) == null ? file.getFileName().toString() : m.group(4);
      expected.add(m.group(1) + " at " + m.group(2) + ":" + m.group(3) + " in " + in);
    }
    assertFalse(expected.isEmpty(), file + " has no expectations");
    CheckResult result = ScenarioChecker.check(
        SourceFile.of(file.toAbsolutePath(), text), new DiskLoader(GOLDEN.toAbsolutePath()));
    Set<String> actual = new TreeSet<>();
    for (Diagnostic d : result.diagnostics()) {
      String in = d.range().source().path().getFileName().toString();
      actual.add(d.code().id() + " at " + d.range().line() + ":" + d.range().column() + " in " + in);
    }
    assertEquals(expected, actual, "diagnostics of " + file.getFileName());
  }

  @Test
  void everyCodeHasAGoldenFile() throws IOException {
    List<String> missing = new ArrayList<>();
    for (Code code : Code.values()) {
      if (code == Code.FILE_TOO_LARGE) {
        continue; // a 4 MB golden file would be silly; BadInputTest covers it
      }
      if (!Files.exists(GOLDEN.resolve(code.id() + ".skerry"))) {
        missing.add(code.id());
      }
    }
    assertTrue(missing.isEmpty(), "codes without a golden file: " + missing);
  }
}
