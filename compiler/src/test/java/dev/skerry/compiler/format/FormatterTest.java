package dev.skerry.compiler.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.cli.SkerryCli;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FormatterTest {
  private static final String MESSY = """
         // header comment

      scenario   demo   units m,s
      const   k=-(3+ 4)*2 m   # hash comment
      vehicle v{dynamics double_integrator // point mass
      start (1,2) at rest



        speed max 3m/s
        accel max -  -1 m/s^2 /* inline */ radius 0.5 m
        // before the brace

      }
      zone z1 polygon (1,1) // first corner
        (5,1)
        (5,5) zone z2 box (10, 10) to (20, 20)
      plan { step 1 s horizon 40 minimize time+0.1 fuel solver default time_limit 30 s gap 0.5% }
      """;

  private static final String CANONICAL = """
      // header comment

      scenario demo
      units m, s

      const k = -(3 + 4) * 2 m  # hash comment

      vehicle v {
        dynamics double_integrator  // point mass
        start (1, 2) at rest

        speed max 3 m/s
        accel max - -1 m/s^2 /* inline */
        radius 0.5 m
        // before the brace
      }

      zone z1 polygon (1, 1)  // first corner
          (5, 1) (5, 5)
      zone z2 box (10, 10) to (20, 20)

      plan {
        step 1 s
        horizon 40
        minimize time + 0.1 fuel
        solver default time_limit 30 s gap 0.5 %
      }
      """;

  private static final String FLEET_3D = """
      scenario   pair  units m,s
      vehicle a{start (1,2, 3) velocity (1,0,0.5) speed max 3m/s accel max 1 m/s^2 climb max 2 m/s climb accel max 0.5 m/s^2 altitude 1 m to 40 m target t1}
      vehicle b{start (5,2,3) at rest speed max 3m/s accel max 1 m/s^2 climb max 2m/s}
      area air box (0,0,0) to (100,100,50)
      zone hill polygon (40,0) (60,0) (50,30) altitude 0 m to 20m
      zone mast box (10,10,0)to(12,12,30)
      target t1 point (90,90,5) within 2 m at rest
      target t2 box (90,10) to (95,15) altitude 0 to 10 at rest
      waypoint w (50,50,30) within 3
      plan { step 1 s horizon 60 dimensions 3 separation 5 m minimize latest time+0.1 fuel }
      """;

  private static final String FLEET_3D_CANONICAL = """
      scenario pair
      units m, s

      vehicle a {
        start (1, 2, 3) velocity (1, 0, 0.5)
        speed max 3 m/s
        accel max 1 m/s^2
        climb max 2 m/s
        climb accel max 0.5 m/s^2
        altitude 1 m to 40 m
        target t1
      }

      vehicle b {
        start (5, 2, 3) at rest
        speed max 3 m/s
        accel max 1 m/s^2
        climb max 2 m/s
      }

      area air box (0, 0, 0) to (100, 100, 50)

      zone hill polygon (40, 0) (60, 0) (50, 30) altitude 0 m to 20 m
      zone mast box (10, 10, 0) to (12, 12, 30)

      target t1 point (90, 90, 5) within 2 m at rest
      target t2 box (90, 10) to (95, 15) altitude 0 to 10 at rest

      waypoint w (50, 50, 30) within 3

      plan {
        step 1 s
        horizon 60
        dimensions 3
        separation 5 m
        minimize latest time + 0.1 fuel
      }
      """;

  /** The words of fleets and 3-D scenarios lay out like the others, idempotently, with the same meaning. */
  @Test
  void laysOutAThreeDimensionalFleet() {
    String once = Formatter.format(FLEET_3D);
    assertEquals(FLEET_3D_CANONICAL, once);
    assertEquals(once, Formatter.format(once));
    Path place = Texts.EXAMPLES.resolve("fleet_3d.skerry");
    var before = Texts.check(place, FLEET_3D);
    var after = Texts.check(place, once);
    assertTrue(before.diagnostics().isEmpty(), before.diagnostics().toString());
    assertTrue(dev.skerry.compiler.semdiff.ModelView.sameMeaning(before.scenario(), after.scenario()));
  }

  @Test
  void laysOutACrampedFileCanonically() {
    assertEquals(CANONICAL, Formatter.format(MESSY));
  }

  @Test
  void alignsTrailingCommentsInARun() {
    String text = "zone a box (0, 0) to (1, 1) // a\nzone bb box (0, 0) to (10, 10) // b\n";
    assertEquals("zone a box (0, 0) to (1, 1)     // a\nzone bb box (0, 0) to (10, 10)  // b\n", Formatter.format(text));
  }

  @Test
  void leavesAFileWithSyntaxErrorsUntouched() {
    String broken = "zone a box (0,0) to\nplan {";
    FormatResult result = Formatter.format(SourceFile.anonymous("broken.skerry", broken));
    assertFalse(result.formatted());
    assertEquals(broken, result.text());
    assertTrue(result.diagnostics().stream().allMatch(d -> d.code() == Code.SYNTAX_ERROR));
    assertFalse(result.diagnostics().isEmpty());
  }

  @Test
  void emptyAndCommentOnlyFiles() {
    assertEquals("", Formatter.format(""));
    assertEquals("// only\n\n/* two */\n", Formatter.format("\n\n  // only\n\n\n   /* two */  \n\n"));
  }

  @Test
  void checkListsFilesThatWouldChangeAndWritesNothing(@TempDir Path dir) throws IOException {
    Path messy = Files.writeString(dir.resolve("messy.skerry"), MESSY);
    Path tidy = Files.writeString(dir.resolve("tidy.skerry"), CANONICAL);
    Run run = run("fmt", "--check", messy.toString(), tidy.toString());
    assertEquals(1, run.code);
    assertEquals(messy + "\n", run.out);
    assertEquals(MESSY, Files.readString(messy));
    assertEquals(0, run("fmt", "--check", tidy.toString()).code);
  }

  @Test
  void rewritesInPlaceAndStdoutPrints(@TempDir Path dir) throws IOException {
    Path messy = Files.writeString(dir.resolve("messy.skerry"), MESSY);
    Run printed = run("fmt", "--stdout", messy.toString());
    assertEquals(0, printed.code);
    assertEquals(CANONICAL, printed.out);
    assertEquals(MESSY, Files.readString(messy));
    assertEquals(0, run("fmt", messy.toString()).code);
    assertEquals(CANONICAL, Files.readString(messy));
    try (var files = Files.list(dir)) {
      assertEquals(1, files.count(), "no temporary file is left behind");
    }
  }

  @Test
  void syntaxErrorsExitOneAndMisuseExitsTwo(@TempDir Path dir) throws IOException {
    Path broken = Files.writeString(dir.resolve("broken.skerry"), "zone a box (0,0) to\n");
    Run run = run("fmt", broken.toString());
    assertEquals(1, run.code);
    assertTrue(run.err.contains("[syntax-error]"), run.err);
    assertEquals("zone a box (0,0) to\n", Files.readString(broken));
    assertEquals(2, run("fmt", dir.resolve("missing.skerry").toString()).code);
    assertEquals(2, run("fmt", "--check", "--stdout", broken.toString()).code);
  }

  record Run(int code, String out, String err) {}

  static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = SkerryCli.run(new PrintWriter(out), new PrintWriter(err), args);
    return new Run(code, out.toString(), err.toString());
  }
}
