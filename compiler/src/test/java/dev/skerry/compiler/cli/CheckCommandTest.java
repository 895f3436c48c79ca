package dev.skerry.compiler.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import dev.skerry.compiler.diag.Code;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {
  @TempDir Path dir;

  record Run(int code, String out, String err) {}

  static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = SkerryCli.run(new PrintWriter(out), new PrintWriter(err), args);
    return new Run(code, out.toString(), err.toString());
  }

  @Test
  void cleanExampleExitsZero() {
    Run r = run("check", "../examples/harbour_survey.skerry");
    assertEquals(0, r.code(), r.out() + r.err());
    assertTrue(r.out().contains("harbour_survey.skerry: ok"), r.out());
    // the harbour's 2-cluster plan is infeasible (the boxes close the cove): its row says it is a size only
    assertTrue(r.out().contains("with 2 clusters, ordered"), r.out());
    assertTrue(r.out().contains("the clustered row is a size only"), r.out());
  }

  @Test
  void aClusteredPlansComparisonNeedsNoSuchRemark() {
    Run r = run("check", "../examples/rock_field.skerry");
    assertEquals(0, r.code(), r.out() + r.err());
    assertTrue(r.out().contains("without clusters"), r.out());
    assertTrue(!r.out().contains("size only"), r.out());
  }

  @Test
  void errorsExitOneWithFileLineColumnAndCode() throws Exception {
    Path f = Files.writeString(dir.resolve("bad.skerry"), "vehicle v {\n  start (1, 1)\n  speed max 2 s\n}\n");
    Run r = run("check", f.toString());
    assertEquals(1, r.code());
    assertTrue(r.out().contains(f + ":3:13: error: the speed limit must be a speed"), r.out());
    assertTrue(r.out().contains("[unit-mismatch]"), r.out());
  }

  @Test
  void misuseExitsTwo() {
    assertEquals(2, run("check").code());
    assertEquals(2, run("check", dir.resolve("absent.skerry").toString()).code());
    assertEquals(2, run("check", "--no-such-option", "x").code());
  }

  @Test
  void jsonCarriesCodesAndPositions() throws Exception {
    Path f = Files.writeString(dir.resolve("bad.skerry"), "zone z box (0, 0) to (0, 5)\n");
    Run r = run("check", "--json", f.toString());
    assertEquals(1, r.code());
    JsonObject doc = JsonParser.parseString(r.out()).getAsJsonObject();
    JsonObject file = doc.getAsJsonArray("files").get(0).getAsJsonObject();
    assertEquals(false, file.get("ok").getAsBoolean());
    boolean found = false;
    for (var d : file.getAsJsonArray("diagnostics")) {
      JsonObject o = d.getAsJsonObject();
      if (o.get("code").getAsString().equals("degenerate-shape")) {
        found = true;
        assertEquals(1, o.getAsJsonObject("range").get("line").getAsInt());
        assertEquals(8, o.getAsJsonObject("range").get("column").getAsInt());
      }
    }
    assertTrue(found, r.out());
  }

  @Test
  void helpAndVersion() {
    Run help = run("--help");
    assertEquals(0, help.code());
    assertTrue(help.out().contains("check"), help.out());
    Run version = run("--version");
    assertEquals(0, version.code());
    assertTrue(version.out().startsWith("skerry "), version.out());
    Run checkHelp = run("check", "--help");
    assertTrue(checkHelp.out().contains("--json"), checkHelp.out());
  }

  @Test
  void everyCodeIsDocumented() throws Exception {
    String doc = Files.readString(Path.of("../docs/diagnostics.md"));
    for (Code c : Code.values()) {
      assertTrue(doc.contains("| `" + c.id() + "` |"), "docs/diagnostics.md lacks " + c.id());
    }
  }
}
