package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Files appear whole or not at all; the name map travels with the model file. */
class ModelFilesTest {
  @TempDir Path folder;

  @Test
  void theFormatFollowsTheFileName() {
    assertEquals(ModelFormat.MPS, ModelFormat.fromFileName("plan.mps"));
    assertEquals(ModelFormat.MPS, ModelFormat.fromFileName("PLAN.MPS"));
    assertEquals(ModelFormat.FIXED_MPS, ModelFormat.fromFileName("plan.fixed.mps"));
    assertEquals(ModelFormat.LP, ModelFormat.fromFileName("a.b.lp"));
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> ModelFormat.fromFileName("plan.mps.gz"));
    assertTrue(e.getMessage().contains(".fixed.mps"), e.getMessage());
    assertEquals(ModelFormat.LP, ModelFormat.fromPath(Path.of("out", "x.lp")));
  }

  private static Milp model(String columnName) {
    MilpBuilder b = new MilpBuilder("files");
    Variable x = b.newContinuous(columnName, 0, 2, Origin.NONE);
    b.addLessOrEqual("cap", LinearExpr.of(x), 1.5, Origin.NONE);
    b.maximize(LinearExpr.of(x));
    return b.build();
  }

  private List<String> folderContents() throws IOException {
    try (var files = Files.list(folder)) {
      return files.map(p -> p.getFileName().toString()).sorted().toList();
    }
  }

  @Test
  void aWriteLeavesTheModelAndNoTemporaryFile() throws IOException {
    Path target = folder.resolve("plan.mps");
    ModelFiles.Written written = ModelFiles.write(model("x"), target);
    assertEquals(target.toAbsolutePath(), written.model());
    assertTrue(written.nameMap().isEmpty());
    assertEquals(List.of("plan.mps"), folderContents());
    assertTrue(written.summary().objectiveNegated());
    assertTrue(Files.readString(target, StandardCharsets.US_ASCII).endsWith("ENDATA\n"));
  }

  @Test
  void aRefusedModelLeavesThePreviousFileUntouched() throws IOException {
    Path target = folder.resolve("plan.fixed.mps");
    ModelFiles.write(model("x"), target);
    String before = Files.readString(target);
    MilpBuilder b = new MilpBuilder("third");
    Variable x = b.newContinuous("x", 0, 1.0 / 3, Origin.NONE);
    b.minimize(LinearExpr.of(x));
    assertThrows(IllegalArgumentException.class, () -> ModelFiles.write(b.build(), target));
    assertEquals(before, Files.readString(target));
    assertEquals(List.of("plan.fixed.mps"), folderContents());
  }

  @Test
  void theNameMapGoesNextToTheModelAndAStaleOneIsRemoved() throws IOException {
    Path target = folder.resolve("plan.fixed.mps");
    ModelFiles.Written aliased = ModelFiles.write(model("velocity_north"), target);
    Path map = folder.resolve("plan.fixed.mps.names").toAbsolutePath();
    assertEquals(map, aliased.nameMap().orElseThrow());
    assertEquals("C0000001\tvelocity_north\n", Files.readString(map));
    Milp back = MpsReader.read(target, ModelFormat.FIXED_MPS, NameMap.readFrom(map));
    assertEquals("velocity_north", back.variables().get(0).name());

    ModelFiles.Written plain = ModelFiles.write(model("v"), target);
    assertTrue(plain.nameMap().isEmpty());
    assertFalse(Files.exists(map), "a name map from an earlier write must not outlive it");
    assertEquals(List.of("plan.fixed.mps"), folderContents());
  }

  @Test
  void aNameMapKeepsNamesWithTabsAndBackslashes() throws IOException {
    NameMap map =
        new NameMap.Builder().add("C0000001", "a\tb\\c\nd").add("C0000002", "plain").build();
    Path file = folder.resolve("m.names");
    map.writeTo(file);
    NameMap back = NameMap.readFrom(file);
    assertEquals(map, back);
    assertEquals("a\tb\\c\nd", back.restore("C0000001"));
    assertEquals("other", back.restore("other"));
    assertEquals(2, Files.readAllLines(file).size());
  }
}
