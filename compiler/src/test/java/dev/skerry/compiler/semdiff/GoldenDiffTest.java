package dev.skerry.compiler.semdiff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * One folder per kind of change under src/test/resources/semdiff, each with old.skerry,
 * new.skerry and the expected text and JSON. Run with -Dskerry.golden.update=true to rewrite the
 * expectations after a deliberate change of wording; without it a missing or different file fails.
 */
class GoldenDiffTest {
  static final Path CASES = Path.of("src/test/resources/semdiff").toAbsolutePath();
  private static final boolean UPDATE = Boolean.getBoolean("skerry.golden.update");

  static Stream<String> cases() throws IOException {
    try (var dirs = Files.list(CASES)) {
      return dirs.filter(Files::isDirectory).map(p -> p.getFileName().toString()).sorted().toList().stream();
    }
  }

  @ParameterizedTest
  @MethodSource("cases")
  void diffMatchesGolden(String name) throws IOException {
    Path dir = CASES.resolve(name);
    DiffReport report = ScenarioDiff.compare("old.skerry", load(dir.resolve("old.skerry")), "new.skerry",
        load(dir.resolve("new.skerry")), SizeSource.NONE);
    compare(dir.resolve("expected.txt"), String.join("\n", DiffText.lines(report)) + "\n");
    compare(dir.resolve("expected.json"), DiffJson.text(report) + "\n");
  }

  static Scenario load(Path file) throws IOException {
    CheckResult result = ScenarioChecker.check(SourceFile.of(file, Files.readString(file)), new DiskLoader(file.getParent()));
    assertNotNull(result.scenario(), () -> file + " should check cleanly: " + result.diagnostics());
    return result.scenario();
  }

  private static void compare(Path golden, String actual) throws IOException {
    if (UPDATE) {
      Files.writeString(golden, actual);
      return;
    }
    assertTrue(Files.exists(golden), golden + " is missing; run with -Dskerry.golden.update=true to create it");
    assertEquals(Files.readString(golden), actual, "differs from " + golden);
  }
}
