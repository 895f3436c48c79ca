package dev.skerry.compiler.semdiff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.cli.SkerryCli;
import dev.skerry.compiler.format.Formatter;
import dev.skerry.compiler.format.Texts;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DiffCommandTest {
  private static final Path CASE = GoldenDiffTest.CASES.resolve("zone-moved");

  @Test
  void exitCodesFollowDiffTools(@TempDir Path dir) throws IOException {
    String old = CASE.resolve("old.skerry").toString();
    String now = CASE.resolve("new.skerry").toString();
    Run differs = run(null, "diff", old, now);
    assertEquals(1, differs.code);
    assertTrue(differs.out.startsWith("zone hull_3: moved 8 m east; now overlaps hull_2\nsizes: binaries "), differs.out);
    assertEquals(0, run(null, "diff", old, old).code);
    assertEquals(2, run(null, "diff", old).code);
    assertEquals(2, run(null, "diff", old, dir.resolve("missing.skerry").toString()).code);
    Path broken = Files.writeString(dir.resolve("broken.skerry"), "zone a box (0, 0) to\n");
    Run brokenRun = run(null, "diff", old, broken.toString());
    assertEquals(2, brokenRun.code);
    assertTrue(brokenRun.err.contains("has errors"), brokenRun.err);
  }

  @Test
  void readsOneSideFromStandardInput() throws IOException {
    String oldText = Files.readString(CASE.resolve("old.skerry"));
    Run run = run(oldText, "diff", "--json", "-", CASE.resolve("new.skerry").toString());
    assertEquals(1, run.code);
    assertTrue(run.out.contains("\"old\": \"<stdin>\""), run.out);
    assertTrue(run.out.contains("\"text\": \"moved 8 m east\""), run.out);
  }

  @Test
  void includesOfStandardInputResolveNextToTheOtherFile() throws IOException {
    Path harbour = Texts.EXAMPLES.resolve("harbour_survey.skerry");
    Run run = run(Files.readString(harbour), "diff", "-", harbour.toString());
    assertEquals(0, run.code, run.err);
  }

  @Test
  void aFormattedExampleMeansTheSame() {
    for (Path example : Texts.examples()) {
      String text = Texts.read(example);
      for (long seed = 1; seed <= 3; seed++) {
        String reformatted = Formatter.format(Texts.withNoise(text, seed));
        DiffReport report = ScenarioDiff.compare("a", Texts.check(example, text).scenario(), "b",
            Texts.check(example, reformatted).scenario(), SizeSource.NONE);
        assertEquals(List.of(), report.changes(), example + " with layout noise " + seed);
      }
    }
  }

  @Test
  void sizesAreShownWithTheirDifferenceWhenASourceGivesThem() throws IOException {
    SizeSource byZones = s -> new SizeFigures(4L * s.zones().size() * s.plan().horizon(), 100, 10L * s.zones().size());
    DiffReport report = ScenarioDiff.compare("old", GoldenDiffTest.load(GoldenDiffTest.CASES.resolve("zone-added/old.skerry")),
        "new", GoldenDiffTest.load(GoldenDiffTest.CASES.resolve("zone-added/new.skerry")), byZones);
    List<String> lines = DiffText.lines(report);
    assertEquals("sizes: binaries 720 → 960 (+240); continuous 100 → 100; rows 30 → 40 (+10)", lines.get(lines.size() - 1));
    assertTrue(DiffJson.text(report).contains("\"binaries\": 960"));
  }

  @Test
  void addedAndDeletedFilesCompareAgainstNothing() {
    String path = CASE.resolve("old.skerry").toString();
    Run added = run(null, "diff", "--for-git", "harbour.skerry", "/dev/null", "0", "0", path, "abc", "100644");
    assertEquals(0, added.code, "git stops at any other exit code");
    assertTrue(added.out.contains("zone hull_3: added"), added.out);
    assertTrue(added.out.contains("plan: added"), added.out);
  }

  record Run(int code, String out, String err) {}

  static Run run(String stdin, String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    InputStream saved = System.in;
    try {
      if (stdin != null) {
        System.setIn(new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)));
      }
      int code = SkerryCli.run(new PrintWriter(out), new PrintWriter(err), args);
      return new Run(code, out.toString(), err.toString());
    } finally {
      System.setIn(saved);
    }
  }
}
