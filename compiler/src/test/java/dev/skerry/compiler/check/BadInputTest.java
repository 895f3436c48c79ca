package dev.skerry.compiler.check;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Bad input gets diagnostics, never an exception, in bounded time. Limits (README): files up to
 * 4 MiB characters, brackets nested up to 200 deep, at most 500 diagnostics per file.
 */
class BadInputTest {
  @TempDir Path dir;

  private CheckResult check(String text) {
    return assertTimeoutPreemptively(Duration.ofSeconds(20),
        () -> ScenarioChecker.check(SourceFile.of(dir.resolve("input.skerry"), text), new DiskLoader(dir)));
  }

  private static boolean has(CheckResult r, Code code) {
    return r.diagnostics().stream().anyMatch(d -> d.code() == code);
  }

  private static void rangesInside(CheckResult r, String text) {
    for (Diagnostic d : r.diagnostics()) {
      if (d.range().source().text() == text) {
        assertTrue(d.range().start() >= 0 && d.range().end() <= text.length(), d.format());
      }
    }
  }

  @Test
  void emptyFileReportsWhatIsMissing() {
    CheckResult r = check("");
    assertTrue(has(r, Code.MISSING_DECLARATION));
    assertTrue(r.hasErrors());
  }

  @Test
  void binaryGarbageIsReportedNotThrown() {
    byte[] bytes = new byte[200_000];
    new Random(42).nextBytes(bytes);
    String text = new String(bytes, java.nio.charset.StandardCharsets.ISO_8859_1);
    CheckResult r = check(text);
    assertTrue(has(r, Code.SYNTAX_ERROR));
    assertTrue(r.diagnostics().size() <= dev.skerry.compiler.diag.Diagnostics.LIMIT);
    rangesInside(r, text);
  }

  @Test
  void textOutsideTheBasicPlaneKeepsColumnsInUtf16() {
    String text = "// 🚤 skiff\nzone ☃ box (0, 0) to (1, 1)\n";
    CheckResult r = check(text);
    Diagnostic d = r.diagnostics().stream().filter(x -> x.code() == Code.SYNTAX_ERROR).findFirst().orElseThrow();
    assertTrue(d.range().text().equals("☃"), "range covers " + d.range().text());
  }

  @Test
  void aOneMegabyteLineIsRead() {
    StringBuilder b = new StringBuilder("const total = 1");
    while (b.length() < 1_000_000) {
      b.append(" + 1");
    }
    CheckResult r = check(b.append('\n').toString());
    assertFalse(has(r, Code.SYNTAX_ERROR));
    assertTrue(has(r, Code.MISSING_DECLARATION));
  }

  @Test
  void aOneMegabyteIdentifierIsRead() {
    String text = "zone " + "x".repeat(1_000_000) + " box (0, 0) to (1, 1)\n";
    CheckResult r = check(text);
    assertFalse(has(r, Code.SYNTAX_ERROR));
  }

  @Test
  void tenThousandNestedBracketsAreRefused() {
    String text = "const c = " + "(".repeat(10_000) + "1" + ")".repeat(10_000) + "\n";
    CheckResult r = check(text);
    assertTrue(has(r, Code.NESTING_TOO_DEEP));
  }

  @Test
  void aLongChainOfSignsDoesNotOverflowTheStack() {
    String text = "const c = " + "- ".repeat(200_000) + "1\n";
    CheckResult r = check(text);
    assertTrue(r.hasErrors());
  }

  @Test
  void twentyMegabytesAreRefusedQuickly() {
    String line = "zone z box (0, 0) to (1, 1)\n";
    String text = line.repeat(20 * 1024 * 1024 / line.length());
    CheckResult r = check(text);
    assertTrue(has(r, Code.FILE_TOO_LARGE));
  }

  @Test
  void missingAndUnreadableIncludesAreDiagnostics() throws IOException {
    assertTrue(has(check("include \"absent.skerry\"\n"), Code.INCLUDE_NOT_FOUND));
    assertTrue(has(check("include \"\"\n"), Code.INCLUDE_NOT_FOUND));
    Files.createDirectory(dir.resolve("folder.skerry"));
    assertTrue(has(check("include \"folder.skerry\"\n"), Code.INCLUDE_NOT_FOUND));
    Path locked = Files.writeString(dir.resolve("locked.skerry"), "zone z box (0, 0) to (1, 1)\n");
    Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
    boolean readable = Files.isReadable(locked); // root reads anything; then the case is moot
    CheckResult r = check("include \"locked.skerry\"\n");
    if (!readable) {
      assertTrue(has(r, Code.INCLUDE_NOT_FOUND));
    } else {
      assertFalse(has(r, Code.INCLUDE_NOT_FOUND));
    }
  }

  @Test
  void anIncludeThroughASymlinkOutOfTheWorkspaceIsRefused(@TempDir Path outside) throws IOException {
    Files.writeString(outside.resolve("zones.skerry"), "zone z box (0, 0) to (1, 1)\n");
    Files.createSymbolicLink(dir.resolve("link"), outside);
    assertTrue(has(check("include \"link/zones.skerry\"\n"), Code.INCLUDE_OUTSIDE_WORKSPACE));
  }
}
