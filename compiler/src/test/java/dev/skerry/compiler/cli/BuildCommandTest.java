package dev.skerry.compiler.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.MpsReader;
import dev.skerry.compiler.io.NameMap;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Variable;
import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code skerry build}: formats, printed sizes, refusals and exit codes, the name map. */
class BuildCommandTest {
  private static final Path WAREHOUSE = Path.of("..", "examples", "warehouse_floor.skerry").toAbsolutePath().normalize();
  private static final Pattern SIZES =
      Pattern.compile("([\\d,]+) binaries, ([\\d,]+) continuous, ([\\d,]+) rows, ([\\d,]+) non-zeros");

  @TempDir Path dir;
  private Path scenario;

  @BeforeEach
  void copyExample() throws Exception {
    scenario = Files.copy(WAREHOUSE, dir.resolve("warehouse.skerry"));
  }

  private static CheckCommandTest.Run build(String... args) {
    String[] all = new String[args.length + 1];
    all[0] = "build";
    System.arraycopy(args, 0, all, 1, args.length);
    return CheckCommandTest.run(all);
  }

  @Test
  void formatFollowsTheExtension() throws Exception {
    Path mps = dir.resolve("out.mps");
    Path fixed = dir.resolve("out.fixed.mps");
    Path lp = dir.resolve("out.lp");
    for (Path p : List.of(mps, fixed, lp)) {
      CheckCommandTest.Run r = build(scenario.toString(), "-o", p.toString());
      assertEquals(0, r.code(), r.out() + r.err());
    }
    assertTrue(nameLine(mps).endsWith(" FREE"), nameLine(mps));
    assertFalse(nameLine(fixed).contains("FREE"), nameLine(fixed));
    assertTrue(fitsFixedColumns(fixed), "fixed MPS has a name past 8 characters");
    String lpText = Files.readString(lp);
    assertTrue(lpText.contains("\nMinimize\n") && lpText.strip().endsWith("End"), "not LP text");
    // Each file reads back as the model the scenario lowers to.
    Milp lowered = lowerWarehouse();
    assertSameShape(lowered, MpsReader.read(mps));
    assertSameShape(lowered, MpsReader.read(fixed, ModelFormat.FIXED_MPS,
        NameMap.readFrom(dir.resolve("out.fixed.mps" + ModelFiles.NAME_MAP_SUFFIX))));
  }

  @Test
  void formatOptionOverridesTheExtension() throws Exception {
    Path asText = dir.resolve("model.txt");
    CheckCommandTest.Run r = build(scenario.toString(), "-o", asText.toString(), "--format", "lp");
    assertEquals(0, r.code(), r.out() + r.err());
    assertTrue(Files.readString(asText).contains("\nSubject To\n"));
    Path mpsNamedLp = dir.resolve("model.lp");
    r = build(scenario.toString(), "-o", mpsNamedLp.toString(), "--format", "mps");
    assertEquals(0, r.code(), r.out() + r.err());
    assertTrue(nameLine(mpsNamedLp).endsWith(" FREE"), nameLine(mpsNamedLp));
  }

  @Test
  void printedSizesAreThoseOfTheWrittenFile() throws Exception {
    Path mps = dir.resolve("sizes.mps");
    CheckCommandTest.Run r = build(scenario.toString(), "-o", mps.toString());
    assertEquals(0, r.code(), r.out() + r.err());
    Matcher m = SIZES.matcher(r.out());
    assertTrue(m.find(), r.out());
    Milp read = MpsReader.read(mps);
    assertEquals(read.binaryCount(), count(m.group(1)));
    assertEquals(read.continuousCount(), count(m.group(2)));
    assertEquals(read.rowCount(), count(m.group(3)));
    assertEquals(read.nonZeros(), count(m.group(4)));
  }

  @Test
  void refusesToWriteOverItsInput() throws Exception {
    byte[] before = Files.readAllBytes(scenario);
    // --format is given so that the refusal, not the unknown `.skerry` extension, is what stops it;
    // the second spelling of the same file goes through `.` to test the same-file check.
    for (String target : List.of(scenario.toString(), dir.resolve(".").resolve("warehouse.skerry").toString())) {
      CheckCommandTest.Run r = build(scenario.toString(), "-o", target, "--format", "mps");
      assertEquals(2, r.code(), r.out() + r.err());
      assertTrue(r.err().contains("refusing"), r.err());
      assertArrayEquals(before, Files.readAllBytes(scenario));
    }
    assertEquals(List.of(scenario), listing());
  }

  @Test
  void scenarioWithErrorsWritesNothingAndKeepsTheOldOutput() throws Exception {
    Path bad = Files.writeString(dir.resolve("bad.skerry"), Files.readString(scenario)
        .replace("accel max 0.5 m/s^2", "accel max 0.5 m/s"));
    Path out = Files.writeString(dir.resolve("old.mps"), "an earlier model\n");
    FileTime stamp = FileTime.fromMillis(1_000_000_000_000L);
    Files.setLastModifiedTime(out, stamp);
    List<Path> before = listing();
    for (String format : List.of("mps", "fixed-mps", "lp")) {
      CheckCommandTest.Run r = build(bad.toString(), "-o", out.toString(), "--format", format);
      assertEquals(1, r.code(), r.out() + r.err());
      assertTrue(r.out().contains("unit-mismatch") || r.err().contains("unit-mismatch"), r.out() + r.err());
      assertTrue(r.err().contains("nothing written"), r.err());
    }
    assertEquals("an earlier model\n", Files.readString(out));
    assertEquals(stamp, Files.getLastModifiedTime(out));
    assertEquals(before, listing(), "a temporary or name-map file was left behind");
  }

  @Test
  void unknownFormatIsMisuse() throws Exception {
    CheckCommandTest.Run r = build(scenario.toString(), "-o", dir.resolve("m.mps").toString(), "--format", "xml");
    assertEquals(2, r.code(), r.out() + r.err());
    assertTrue(r.err().contains("mps, fixed-mps or lp"), r.err());
    r = build(scenario.toString(), "-o", dir.resolve("m.xml").toString());
    assertEquals(2, r.code(), r.out() + r.err());
    assertEquals(List.of(scenario), listing());
  }

  @Test
  void fixedMpsComesWithANameMapThatRestoresEveryName() throws Exception {
    Path fixed = dir.resolve("hall.fixed.mps");
    CheckCommandTest.Run r = build(scenario.toString(), "-o", fixed.toString());
    assertEquals(0, r.code(), r.out() + r.err());
    Path mapFile = dir.resolve("hall.fixed.mps" + ModelFiles.NAME_MAP_SUFFIX);
    assertTrue(r.out().contains(mapFile.toString()), r.out());
    NameMap map = NameMap.readFrom(mapFile);
    assertTrue(map.size() > 0);
    Set<String> aliases = new HashSet<>();
    for (int i = 0; i < map.size(); i++) {
      assertTrue(map.alias(i).length() <= 8, map.alias(i));
      assertTrue(aliases.add(map.alias(i)), "alias used twice: " + map.alias(i));
    }
    Milp lowered = lowerWarehouse();
    Milp read = MpsReader.read(fixed, ModelFormat.FIXED_MPS, map);
    for (Variable v : lowered.variables()) {
      assertNotNull(read.variable(v.name()), "column " + v.name() + " not restored from the map");
    }
    for (int i = 0; i < lowered.rowCount(); i++) {
      assertEquals(lowered.rows().get(i).name(), read.rows().get(i).name());
    }
    // The free MPS of the same scenario needs no map, and a stale one is not left next to it.
    Path free = dir.resolve("hall.mps");
    assertEquals(0, build(scenario.toString(), "-o", free.toString()).code());
    assertFalse(Files.exists(dir.resolve("hall.mps" + ModelFiles.NAME_MAP_SUFFIX)));
  }

  private Milp lowerWarehouse() throws Exception {
    var checked = ScenarioChecker.check(SourceFile.of(scenario, Files.readString(scenario)), new DiskLoader(dir));
    return Lowering.lower(checked.scenario());
  }

  private static void assertSameShape(Milp expected, Milp read) {
    assertEquals(expected.rowCount(), read.rowCount());
    assertEquals(expected.columnCount(), read.columnCount());
    assertEquals(expected.binaryCount(), read.binaryCount());
    assertEquals(expected.nonZeros(), read.nonZeros());
  }

  private static String nameLine(Path mps) throws Exception {
    try (Stream<String> lines = Files.lines(mps)) {
      return lines.filter(l -> l.startsWith("NAME")).findFirst().orElse("").stripTrailing();
    }
  }

  /** Names in fixed MPS sit in columns 5–12 and 15–22 (GLPK reference manual, appendix B). */
  private static boolean fitsFixedColumns(Path mps) throws Exception {
    for (String line : Files.readAllLines(mps)) {
      if (line.startsWith(" ") && line.length() > 4) {
        String name = line.substring(4, Math.min(12, line.length()));
        if (line.length() > 12 && line.charAt(12) != ' ' || name.isBlank()) {
          return false;
        }
      }
    }
    return true;
  }

  private static long count(String digits) {
    return Long.parseLong(digits.replace(",", ""));
  }

  private List<Path> listing() throws Exception {
    try (Stream<Path> s = Files.list(dir)) {
      return s.sorted().toList();
    }
  }
}
