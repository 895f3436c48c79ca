package dev.skerry.compiler.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/** Every example in {@code examples/} parses and checks clean: no error, no warning. */
class ExamplesTest {
  static final Path EXAMPLES = Path.of("../examples");

  static List<Path> examples() throws IOException {
    try (Stream<Path> files = Files.list(EXAMPLES)) {
      return files.filter(p -> p.toString().endsWith(".skerry")).sorted().toList();
    }
  }

  static CheckResult check(Path file) throws IOException {
    return ScenarioChecker.check(SourceFile.of(file.toAbsolutePath().normalize(), Files.readString(file)),
        new DiskLoader(EXAMPLES.toAbsolutePath().normalize()));
  }

  @TestFactory
  Stream<DynamicTest> examplesCheckClean() throws IOException {
    return examples().stream().map(p -> DynamicTest.dynamicTest(p.getFileName().toString(), () -> {
      CheckResult result = check(p);
      List<String> shown = result.diagnostics().stream().map(Diagnostic::format).toList();
      assertEquals(List.of(), shown, "diagnostics of " + p);
      assertNotNull(result.scenario(), "scenario of " + p);
    }));
  }
}
