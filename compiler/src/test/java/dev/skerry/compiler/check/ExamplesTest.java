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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import dev.skerry.compiler.analysis.Analysis;
import dev.skerry.compiler.analysis.Sizes;
import dev.skerry.compiler.model.PlanOptions;
import dev.skerry.compiler.model.Scenario;

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

  /**
   * Unpruned sizes against the formulas, counted by hand from the files (common practice, no
   * single source): 4 binaries per box zone per segment, one per polygon face per segment, N
   * arrival binaries, N visit binaries per waypoint; clusters NC·NO assignments (less NC(NC−1)/2
   * under the ordered rule, where zone o joins only clusters l ≤ o) and 4·NS·NC avoidance.
   */
  @Test
  void unprunedSizesMatchTheFormulas() throws IOException {
    // Harbour: N = 40 segments (guard on), 8 box zones, 2 four-sided polygons, 1 waypoint.
    Scenario harbour = check(EXAMPLES.resolve("harbour_survey.skerry")).scenario();
    Sizes h = Analysis.sizes(harbour.withPlan(harbour.plan().withPruning(false)));
    assertEquals(4L * 40 * 8, h.zoneBoxBinaries());
    assertEquals((4L + 4) * 40, h.zonePolygonBinaries());
    assertEquals(40, h.arrivalBinaries());
    assertEquals(40, h.waypointBinaries());
    // Rock field: 40 box zones, N = 30, 3 clusters with the ordered rule.
    Scenario rocks = check(EXAMPLES.resolve("rock_field.skerry")).scenario();
    Sizes r = Analysis.sizes(rocks.withPlan(rocks.plan().withPruning(false)));
    assertEquals(3L * 40 - 3 * 2 / 2, r.clusterAssignmentBinaries());
    assertEquals(4L * 30 * 3, r.clusterAvoidanceBinaries());
    assertEquals(0, r.zoneBoxBinaries());
    Sizes none = Analysis.sizes(rocks.withPlan(rocks.plan().withPruning(false).withClusters(0, PlanOptions.SymmetryRule.NONE)));
    assertEquals(4L * 30 * 40, none.zoneBoxBinaries());
    Sizes free = Analysis.sizes(rocks.withPlan(rocks.plan().withPruning(false).withClusters(3, PlanOptions.SymmetryRule.NONE)));
    assertEquals(3L * 40, free.clusterAssignmentBinaries());
    // Warehouse: 6 boxes and a 4-sided polygon, N = 40.
    Scenario hall = check(EXAMPLES.resolve("warehouse_floor.skerry")).scenario();
    Sizes w = Analysis.sizes(hall.withPlan(hall.plan().withPruning(false)));
    assertEquals(4L * 40 * 6, w.zoneBoxBinaries());
    assertEquals(4L * 40, w.zonePolygonBinaries());
  }

  /** The per-zone binaries the language server shows on hover add up to the zone binaries of the sizes. */
  @Test
  void perZoneBinariesAddUpToTheSizes() throws IOException {
    for (Path p : examples()) {
      Scenario s = check(p).scenario();
      Scenario unclustered = s.withPlan(s.plan().withClusters(0, PlanOptions.SymmetryRule.NONE));
      Sizes sizes = Analysis.sizes(unclustered);
      long sum = Analysis.zoneBinaries(unclustered).values().stream().mapToLong(Long::longValue).sum();
      assertEquals(sizes.zoneBoxBinaries() + sizes.zonePolygonBinaries(), sum, p.toString());
      assertEquals(unclustered.zones().size(), Analysis.zoneBinaries(unclustered).size(), p.toString());
    }
  }
}
