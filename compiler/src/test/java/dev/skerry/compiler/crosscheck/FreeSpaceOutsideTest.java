package dev.skerry.compiler.crosscheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.ScenarioChecker;
import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.io.OutsideSolvers;
import dev.skerry.compiler.io.WriteSummary;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Minimum time, rest to rest over a distance d with no zones, solved by {@code cbc} 2.10 (Debian
 * package coinor-cbc) on the free MPS file {@code skerry build} writes, not by Skerry itself.
 *
 * <p>Outside reference: with |a| ≤ a_max the continuous-time minimum is T* = 2·√(d/a_max),
 * accelerate then brake at full thrust (Kirk, <i>Optimal Control Theory</i>, the minimum-time
 * double integrator). Two allowances, as in {@code lower.FreeSpaceMinimumTimeTest}, which justifies
 * them in full:
 *
 * <ul>
 *   <li>The 2-norm limit is an inscribed 16-gon, so along x (a face normal) the model allows a_eff
 *       = a_max·cos(π/16), never more; and the target box's near edge lies at d − tol. So the bound
 *       to compare with is T* = 2·√((d − tol)/a_eff): no plan of the model can beat it.
 *   <li>Zero-order hold (piecewise-constant acceleration, arrival at whole steps): k steps rest to
 *       rest cover at most a_eff·Δt²·g(k) with g(2m) = m², g(2m+1) = m(m+1), so the optimum is the
 *       least such k, which lies in [T*, T* + 2Δt).
 * </ul>
 *
 * The objective is {@code minimize time}, so the file's optimum is the arrival time itself.
 */
class FreeSpaceOutsideTest {
  private static final double A_MAX = 1;
  private static final double DT = 1;
  private static final double TOL = 1e-3;

  @TempDir Path folder;

  @ParameterizedTest(name = "d = {0} m")
  @ValueSource(doubles = {3.0, 8.0, 12.5})
  void cbcOnOurFileFindsTheBangBangTimeWithinTheDiscretisation(double d) throws Exception {
    String text = String.format(Locale.ROOT, """
        scenario free_run
        units m, s
        vehicle runner {
          start (0, 0) at rest
          speed max 20 m/s
          accel max %s m/s^2
          sides 16
        }
        area open box (-5, -5) to (30, 5)
        target line box (%s, %s) to (%s, %s) at rest
        plan {
          step %s s
          horizon 10
          minimize time
        }
        """, A_MAX, d - TOL, -TOL, d + TOL, TOL, DT);
    Path source = folder.resolve("free_run.skerry");
    CheckResult checked = ScenarioChecker.check(SourceFile.of(source, text), new DiskLoader(folder));
    assertFalse(checked.hasErrors(), checked.diagnostics().toString());
    Milp milp = Lowering.lower(checked.scenario());
    Path mps = folder.resolve("free_run.mps");
    WriteSummary summary = ModelFiles.write(milp, mps, ModelFormat.MPS).summary();
    OutsideSolvers.Result cbc = OutsideSolvers.cbcObjective(mps);
    assertEquals(OutsideSolvers.Status.OPTIMAL, cbc.status(), cbc.detail());
    double arrival = summary.modelObjective(cbc.objective());

    double aEff = A_MAX * Math.cos(Math.PI / 16);
    double tStar = 2 * Math.sqrt((d - TOL) / aEff);
    assertTrue(arrival >= tStar - 1e-6, "cbc's arrival " + arrival + " s beats the continuous minimum " + tStar);
    assertTrue(arrival < tStar + 2 * DT, "cbc's arrival " + arrival + " s is late against " + tStar);
    int k = 1;
    while (aEff * DT * DT * g(k) < d - TOL) {
      k++;
    }
    assertEquals(k * DT, arrival, 1e-6, "the least whole number of steps that covers d");
  }

  private static double g(int k) {
    int m = k / 2;
    return k % 2 == 0 ? (double) m * m : (double) m * (m + 1);
  }
}
