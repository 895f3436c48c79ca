package dev.skerry.lsp.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** Only the protocol package may touch LSP4J; documents and analysis stay plain Java over the compiler. */
class LayeringTest {
  @Test
  void documentAndAnalysisNeverImportLsp4j() throws IOException {
    Path main = Path.of("src/main/java/dev/skerry/lsp");
    List<Path> checked;
    try (Stream<Path> files = Stream.of("document", "analysis").flatMap(p -> walk(main.resolve(p)))) {
      checked = files.filter(f -> f.toString().endsWith(".java")).toList();
    }
    assertTrue(checked.size() >= 8, "expected the two packages' sources, found " + checked);
    List<Path> offending = checked.stream().filter(f -> read(f).contains("org.eclipse.lsp4j")).toList();
    assertEquals(List.of(), offending);
  }

  private static Stream<Path> walk(Path dir) {
    try {
      return Files.walk(dir).toList().stream();
    } catch (IOException e) {
      throw new IllegalStateException("cannot list " + dir, e);
    }
  }

  private static String read(Path f) {
    try {
      return Files.readString(f);
    } catch (IOException e) {
      throw new IllegalStateException("cannot read " + f, e);
    }
  }
}
