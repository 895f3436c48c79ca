package dev.skerry.lsp.protocol;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.io.MpsReader;
import dev.skerry.compiler.milp.Milp;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ExecuteCommandParams;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** workspace/executeCommand writes the open scenario's MILP next to it, and refuses a broken one. */
class ExportCommandTest {
  @TempDir
  Path dir;

  static final String SCENARIO = """
      vehicle v { start (0, 0) at rest speed max 2 m/s accel max 1 m/s^2 }
      area a box (-1, -1) to (30, 30)
      zone rock box (10, 10) to (12, 12)
      target t point (20, 20) within 1 m at rest
      plan { step 1 s horizon 30 }
      """;

  @Test
  void exportsMpsAndLpNextToTheScenario() throws Exception {
    try (Harness h = new Harness(dir)) {
      String uri = h.open("mission.skerry", SCENARIO);
      h.diagnostics(uri, 1);
      Object mps = h.remote.getWorkspaceService().executeCommand(
          new ExecuteCommandParams(Workspace.EXPORT_MPS, List.of(uri))).get(10, TimeUnit.SECONDS);
      Path file = dir.resolve("mission.mps");
      assertEquals(file.toString(), String.valueOf(mps).replace("\"", ""));
      Milp read = MpsReader.read(file);
      assertTrue(read.binaryCount() > 0);
      h.remote.getWorkspaceService().executeCommand(new ExecuteCommandParams(Workspace.EXPORT_LP, List.of(uri)))
          .get(10, TimeUnit.SECONDS);
      assertTrue(Files.readString(dir.resolve("mission.lp")).contains("Subject To"));
    }
  }

  @Test
  void aBrokenScenarioIsNotExported() throws Exception {
    try (Harness h = new Harness(dir)) {
      String uri = h.open("broken.skerry", "zone z box (0, 0) to (0, 1)\n");
      h.diagnostics(uri, 1);
      Object answer = h.remote.getWorkspaceService().executeCommand(
          new ExecuteCommandParams(Workspace.EXPORT_MPS, List.of(uri))).get(10, TimeUnit.SECONDS);
      assertTrue(String.valueOf(answer).contains("errors"), String.valueOf(answer));
      assertTrue(Files.notExists(dir.resolve("broken.mps")));
    }
  }
}
