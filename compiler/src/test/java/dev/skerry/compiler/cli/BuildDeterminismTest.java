package dev.skerry.compiler.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.io.ModelFiles;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The same scenario gives the same bytes: {@code skerry build} run twice on each example writes
 * identical free MPS, fixed MPS (with its name map) and LP files, also when the second run is a
 * separate JVM (so no hash order or identity hash can leak into a file). And a change to one zone
 * changes only a few lines, those of that zone, so a model file under version control shows a diff
 * a person can read.
 */
class BuildDeterminismTest {
  private static final Path EXAMPLES = Path.of("..", "examples").toAbsolutePath().normalize();

  @TempDir Path dir;

  @ParameterizedTest(name = "{0}")
  @ValueSource(strings = {"warehouse_floor", "harbour_survey", "rock_field"})
  void twoBuildsGiveIdenticalBytes(String example) throws Exception {
    Path scenario = EXAMPLES.resolve(example + ".skerry");
    for (String extension : List.of(".mps", ".fixed.mps", ".lp")) {
      Path first = dir.resolve("a" + extension);
      Path second = dir.resolve("b" + extension);
      assertEquals(0, CheckCommandTest.run("build", scenario.toString(), "-o", first.toString()).code());
      assertEquals(0, CheckCommandTest.run("build", scenario.toString(), "-o", second.toString()).code());
      assertArrayEquals(Files.readAllBytes(first), Files.readAllBytes(second), example + extension);
      Path firstMap = dir.resolve("a" + extension + ModelFiles.NAME_MAP_SUFFIX);
      Path secondMap = dir.resolve("b" + extension + ModelFiles.NAME_MAP_SUFFIX);
      assertEquals(Files.exists(firstMap), Files.exists(secondMap));
      if (Files.exists(firstMap)) {
        assertArrayEquals(Files.readAllBytes(firstMap), Files.readAllBytes(secondMap), example + " name map");
      }
    }
    // A third build of the free MPS in a fresh JVM.
    Path separate = dir.resolve("c.mps");
    String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
    Path log = dir.resolve("jvm.log");
    Process p = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), SkerryCli.class.getName(),
        "build", scenario.toString(), "-o", separate.toString())
        .redirectErrorStream(true).redirectOutput(log.toFile()).start();
    assertTrue(p.waitFor(2, TimeUnit.MINUTES), "the separate build did not finish");
    assertEquals(0, p.exitValue(), Files.readString(log));
    assertArrayEquals(Files.readAllBytes(dir.resolve("a.mps")), Files.readAllBytes(separate),
        example + ": a separate JVM wrote other bytes");
  }

  /**
   * Moves and grows the warehouse's pillar by a metre: the free MPS changes in under 5 % of its
   * lines, and every changed line but the header comment (which carries the counts) names the
   * pillar. Lines are compared as multisets: a line counts as changed when it occurs more often in
   * one file than in the other, which is what a line diff shows when nothing else moved.
   */
  @Test
  void oneZoneChangeIsALocalChangeOfTheFile() throws Exception {
    String text = Files.readString(EXAMPLES.resolve("warehouse_floor.skerry"));
    String zone = "zone pillar polygon (36, 14) (37, 14) (37, 15) (36, 15)";
    assertTrue(text.contains(zone), "the example's pillar changed; update this test");
    Path before = Files.writeString(dir.resolve("before.skerry"), text);
    Path after = Files.writeString(dir.resolve("after.skerry"),
        text.replace(zone, "zone pillar polygon (35, 13) (37, 13) (37, 15) (35, 15)"));
    Path beforeMps = dir.resolve("before.mps");
    Path afterMps = dir.resolve("after.mps");
    assertEquals(0, CheckCommandTest.run("build", before.toString(), "-o", beforeMps.toString()).code());
    assertEquals(0, CheckCommandTest.run("build", after.toString(), "-o", afterMps.toString()).code());
    List<String> a = Files.readAllLines(beforeMps);
    List<String> b = Files.readAllLines(afterMps);
    List<String> changed = changedLines(a, b);
    assertNotEquals(0, changed.size(), "moving a zone must show in the file");
    assertTrue(changed.size() < 0.05 * Math.min(a.size(), b.size()),
        changed.size() + " of " + a.size() + " lines changed");
    List<String> elsewhere = changed.stream().filter(l -> !l.contains("pillar") && !l.startsWith("*")).toList();
    assertEquals(List.of(), elsewhere, "lines changed that do not belong to the pillar");
  }

  /** Lines that occur more often in one list than in the other, with their surplus. */
  static List<String> changedLines(List<String> a, List<String> b) {
    Map<String, Integer> balance = new HashMap<>();
    a.forEach(l -> balance.merge(l, 1, Integer::sum));
    b.forEach(l -> balance.merge(l, -1, Integer::sum));
    return balance.entrySet().stream()
        .flatMap(e -> Stream.generate(e::getKey).limit(Math.abs(e.getValue())))
        .sorted()
        .toList();
  }
}
