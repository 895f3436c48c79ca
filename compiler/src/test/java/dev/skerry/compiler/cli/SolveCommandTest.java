package dev.skerry.compiler.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.plan.BadInputScenarios;
import dev.skerry.compiler.plan.ExampleScenarios;
import dev.skerry.compiler.plan.PlanResult;
import dev.skerry.compiler.plan.Planner;
import dev.skerry.compiler.solve.Backends;
import dev.skerry.compiler.solve.Capability;
import dev.skerry.compiler.solve.SolveMonitor;
import dev.skerry.compiler.solve.SolveOptions;
import dev.skerry.compiler.solve.SolveResult;
import dev.skerry.compiler.solve.SolveStatus;
import dev.skerry.compiler.solve.SolverBackend;
import dev.skerry.compiler.solve.ojalgo.OjAlgoBackend;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

class SolveCommandTest {
  @TempDir Path dir;

  record Run(int code, String out, String err, double seconds) {}

  static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    long t0 = System.nanoTime();
    int code = SkerryCli.run(new PrintWriter(out), new PrintWriter(err), args);
    return new Run(code, out.toString(), err.toString(), (System.nanoTime() - t0) / 1e9);
  }

  Path write(String name, String text) throws Exception {
    return Files.writeString(dir.resolve(name), text);
  }

  /**
   * Open water, no zones: the least clearance is infinite, which JSON cannot hold (RFC 8259 §6:
   * "Infinity and NaN are not permitted"); the file leaves the key out and the summary says there are
   * no zones.
   */
  @Test
  void aScenarioWithNoZonesGivesValidJson() throws Exception {
    Path f = write("open.skerry", """
        scenario open_water
        units m, s
        vehicle skiff {
          start (1, 1) at rest
          speed max 2 m/s
          accel max 1 m/s^2
          radius 0.5 m
        }
        area sea box (0, 0) to (30, 20)
        target dock point (25, 5) within 0.5 m at rest
        plan {
          step 1 s
          horizon 30
          minimize time
        }
        """);
    Path json = dir.resolve("open.json");
    Run r = run("solve", "--solver", "scip", f.toString(), "--json", json.toString());
    assertEquals(0, r.code(), r.out() + r.err());
    assertTrue(r.out().contains("(no zones)") && !r.out().contains("Infinity"), r.out());
    String text = Files.readString(json);
    assertTrue(!text.contains("Infinity") && !text.contains("NaN"), text);
    JsonObject verify = JsonParser.parseString(text).getAsJsonObject().getAsJsonObject("verify");
    assertTrue(verify.get("ok").getAsBoolean() && !verify.has("minClearance"), verify::toString);
  }

  /**
   * One solve writes all three outputs. Outside check of the SVG: {@code rsvg-convert} from
   * Debian's librsvg2-bin renders it to a PNG; the JDK's XML parser checks it is well-formed.
   */
  @Test
  void svgCsvAndJsonOutputs() throws Exception {
    Path f = write("warehouse_small.skerry", ExampleScenarios.smallText("warehouse_floor"));
    Path svg = dir.resolve("plan.svg");
    Path csv = dir.resolve("plan.csv");
    Path json = dir.resolve("plan.json");
    Run r = run("solve", "--quiet", "--solver", "scip", f.toString(), "--svg", svg.toString(), "--csv", csv.toString(),
        "--json", json.toString());
    assertEquals(0, r.code(), r.out() + r.err());

    Document doc = DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(svg.toFile());
    assertEquals("svg", doc.getDocumentElement().getTagName());
    assertTrue(doc.getElementsByTagName("polyline").getLength() + doc.getElementsByTagName("path").getLength() > 0);
    Path png = dir.resolve("plan.png");
    Process p = new ProcessBuilder("rsvg-convert", "-o", png.toString(), svg.toString()).redirectErrorStream(true).start();
    assertTrue(p.waitFor(60, TimeUnit.SECONDS), "rsvg-convert hung");
    String log = new String(p.getInputStream().readAllBytes());
    assertEquals(0, p.exitValue(), "rsvg-convert (Debian librsvg2-bin) failed: " + log);
    byte[] head = Files.readAllBytes(png);
    assertTrue(head.length > 8 && head[1] == 'P' && head[2] == 'N' && head[3] == 'G', "not a PNG");

    JsonObject o = JsonParser.parseString(Files.readString(json)).getAsJsonObject();
    for (String key : List.of("plan", "cost", "solver", "verify")) {
      assertTrue(o.has(key), key + " missing from " + o.keySet());
    }
    assertTrue(o.getAsJsonObject("verify").get("ok").getAsBoolean());
    int arrival = o.getAsJsonObject("cost").get("arrivalStep").getAsInt();
    assertEquals(arrival + 1, o.getAsJsonObject("plan").getAsJsonArray("samples").size());

    List<String> lines = Files.readAllLines(csv);
    String header = lines.get(0);
    for (String unit : List.of("time_s", "x_m", "vx_m_per_s", "ax_m_per_s2")) {
      assertTrue(header.contains(unit), header);
    }
    assertEquals(arrival + 2, lines.size(), "a header and one row per step up to arrival");
    for (int k = 1; k < lines.size(); k++) {
      assertEquals(String.valueOf(k - 1), lines.get(k).split(",")[1]);
    }
  }

  @Test
  void aWalledOffScenarioIsInfeasibleWithExitOne() throws Exception {
    Path f = write("walled.skerry", BadInputScenarios.WALLED_OFF);
    Run check = run("check", f.toString());
    assertEquals(0, check.code(), "the checker must not see the wall, or this tests nothing: " + check.out());
    Run r = run("solve", "--quiet", "--solver", "scip", f.toString());
    assertEquals(1, r.code(), r.out() + r.err());
    assertTrue(r.out().contains("infeasible"), r.out());
    assertTrue(r.out().contains("no plan satisfies the scenario"), r.out());
  }

  /** The full harbour example takes SCIP seconds; 0.1 s must come back at once with a plain status. */
  @Test
  void aTinyTimeLimitReturnsQuicklyWithAClearStatus() {
    Run r = run("solve", "--quiet", "--solver", "scip", "--time-limit", "0.1", ExampleScenarios.file("harbour_survey").toString());
    assertTrue(r.seconds() < 20, "took " + r.seconds() + " s");
    assertTrue(r.out().contains("no plan found before the solver stopped")
        || r.out().contains("a plan was found, but the solver stopped before proving it the best"), r.out());
    assertTrue(r.code() == 0 || r.code() == 1, r.out() + r.err());
  }

  @Test
  void anUnknownSolverIsMisuse() {
    Run r = run("solve", "--solver", "gurobi-ish", ExampleScenarios.file("warehouse_floor").toString());
    assertEquals(2, r.code(), r.out() + r.err());
    assertTrue(r.err().contains("unknown solver"), r.err());
  }

  /** A backend that never loads, standing in for OR-Tools without its natives. */
  static final class Unloadable implements SolverBackend {
    @Override
    public String id() {
      return "scip";
    }

    @Override
    public Capability capableOf(Milp model) {
      return Capability.no("native library failed to load (simulated)");
    }

    @Override
    public SolveResult solve(Milp model, SolveOptions options, SolveMonitor monitor) {
      throw new AssertionError("an incapable backend must not be asked to solve");
    }
  }

  @Test
  void defaultFallsBackToOjAlgoWithANotice() {
    Scenario s = ExampleScenarios.tiny("warehouse_floor");
    Planner planner = new Planner(new Backends(List.of(new Unloadable(), new OjAlgoBackend())));
    PlanResult r = planner.plan(s, "default", Planner.optionsOf(s.plan()), SolveMonitor.NONE);
    assertEquals("ojalgo", r.solve().backendId());
    assertEquals(SolveStatus.OPTIMAL, r.solve().status(), r.solve()::summary);
    String notice = r.notice().orElse("");
    assertTrue(notice.contains("falling back to ojAlgo") && notice.contains("simulated"), notice);
  }

  /**
   * ojAlgo finds no plan for the full harbour in 60 s (BENCHMARKS.md), so with a 1.5 s limit it
   * surely runs past one second; its progress events must reach standard error as a line.
   */
  @Test
  void aSolveOverASecondPrintsProgress() {
    StringWriter err = new StringWriter();
    Scenario s = ExampleScenarios.full("harbour_survey");
    Milp m = Lowering.lower(s);
    SolveOptions o = Planner.optionsOf(s.plan()).withTimeLimit(java.time.Duration.ofMillis(1500));
    SolveResult r = new OjAlgoBackend().solve(m, o, SolveCommand.progress(new PrintWriter(err)));
    assertTrue(r.wallTime().toMillis() > 1200, "the solve was too quick to test progress: " + r.summary());
    assertTrue(err.toString().matches("(?s)\\s*solving with ojalgo: \\d+ s.*"), err.toString());
  }
}
