package dev.skerry.compiler.io;

import static dev.skerry.compiler.io.MilpAssertions.assertSameModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.milp.LinearExpr;
import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.MilpBuilder;
import dev.skerry.compiler.milp.Origin;
import dev.skerry.compiler.milp.VarType;
import dev.skerry.compiler.milp.Variable;
import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.LongRange;
import net.jqwik.api.statistics.Statistics;

/**
 * Random small models survive a trip through free and fixed MPS bit for bit. There is no LP reader,
 * so LP files are checked by {@code glpsol} 5.0 (Debian glpk-utils) instead, on a sample of
 * feasible, bounded models. (cbc judges LP files in {@link OutsideJudgeTest}, on fixed models, so
 * that a cbc bug met on a new random model cannot make this property flaky.)
 */
class RoundTripProperties {
  record ColumnSpec(String name, VarType type, double lower, double upper) {}

  record Term(int column, double coef) {}

  record RowSpec(String name, List<Term> terms, double lower, double upper) {}

  record ModelSpec(
      List<ColumnSpec> columns,
      List<RowSpec> rows,
      List<Term> objective,
      double constant,
      boolean minimize) {
    Milp build() {
      MilpBuilder b = new MilpBuilder("property");
      List<Variable> vars = new ArrayList<>();
      for (ColumnSpec c : columns) {
        vars.add(
            switch (c.type()) {
              case BINARY -> b.newBinary(c.name(), Origin.NONE);
              case INTEGER -> b.newInteger(c.name(), c.lower(), c.upper(), Origin.NONE);
              case CONTINUOUS -> b.newContinuous(c.name(), c.lower(), c.upper(), Origin.NONE);
            });
      }
      for (RowSpec r : rows) {
        b.addRange(r.name(), r.lower(), expression(vars, r.terms()), r.upper(), Origin.NONE);
      }
      LinearExpr objectiveExpr = expression(vars, objective).addConstant(constant);
      if (minimize) {
        b.minimize(objectiveExpr);
      } else {
        b.maximize(objectiveExpr);
      }
      return b.build();
    }

    /** One term per column: sums of merged terms are the builder's business, not ours. */
    private static LinearExpr expression(List<Variable> vars, List<Term> terms) {
      LinearExpr e = new LinearExpr();
      Set<Integer> used = new HashSet<>();
      for (Term t : terms) {
        if (used.add(t.column() % vars.size())) {
          e.add(vars.get(t.column() % vars.size()), t.coef());
        }
      }
      return e;
    }
  }

  /** Any finite double a lowering might produce, from tiny to large, 1/3 and π included. */
  static Arbitrary<Double> anyNumber() {
    return Arbitraries.oneOf(
        Arbitraries.doubles().between(-1e6, 1e6),
        Arbitraries.doubles().between(-1e28, 1e28),
        Arbitraries.of(
            1.0 / 3, -2.0 / 3, Math.PI, 0.1, 0.3, 1e-300, -4.9e-324, 123456789.123456789),
        Arbitraries.integers().between(-20, 20).map(i -> (double) i));
  }

  /** Decimals of at most six significant digits: what fixed MPS is meant to carry. */
  static Arbitrary<Double> shortDecimal() {
    return Combinators.combine(
            Arbitraries.integers().between(-999_999, 999_999),
            Arbitraries.integers().between(-3, 8))
        .as((unscaled, scale) -> BigDecimal.valueOf(unscaled, scale).doubleValue());
  }

  static Arbitrary<String> names() {
    return Arbitraries.oneOf(
        Arbitraries.strings().withCharRange('a', 'z').ofMinLength(1).ofMaxLength(8),
        Arbitraries.strings()
            .withCharRange('a', 'z')
            .numeric()
            .withChars('_', '[', ']', ',')
            .ofMinLength(9)
            .ofMaxLength(90),
        Arbitraries.strings()
            .withChars('x', ' ', '\u00e9', '$', '*', '\'', '\t')
            .ofMinLength(1)
            .ofMaxLength(12));
  }

  static Arbitrary<ModelSpec> models(Arbitrary<Double> numbers) {
    Arbitrary<double[]> bounds =
        Combinators.combine(numbers, numbers, Arbitraries.integers().between(0, 5))
            .as(
                (a, b, kind) -> {
                  double lo = Math.min(a, b);
                  double up = Math.max(a, b);
                  return switch (kind) {
                    case 0 -> new double[] {Double.NEGATIVE_INFINITY, up};
                    case 1 -> new double[] {lo, Double.POSITIVE_INFINITY};
                    case 2 -> new double[] {Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY};
                    case 3 -> new double[] {lo, lo};
                    default -> new double[] {lo, up};
                  };
                });
    Arbitrary<ColumnSpec> column =
        Combinators.combine(names(), Arbitraries.of(VarType.class), bounds)
            .as((name, type, bound) -> new ColumnSpec(name, type, bound[0], bound[1]));
    Arbitrary<Term> term =
        Combinators.combine(Arbitraries.integers().between(0, 1000), numbers).as(Term::new);
    Arbitrary<RowSpec> row =
        Combinators.combine(names(), term.list().ofMaxSize(6), bounds)
            .as((name, terms, bound) -> new RowSpec(name, terms, bound[0], bound[1]));
    return Combinators.combine(
            column.list().ofMinSize(1).ofMaxSize(8).uniqueElements(ColumnSpec::name),
            row.list().ofMaxSize(8).uniqueElements(RowSpec::name),
            term.list().ofMaxSize(6),
            numbers,
            Arbitraries.of(true, false))
        .as(ModelSpec::new);
  }

  @Provide
  Arbitrary<ModelSpec> anyModel() {
    return models(anyNumber());
  }

  @Provide
  Arbitrary<ModelSpec> shortDecimalModel() {
    return models(shortDecimal());
  }

  @Property(tries = 300)
  void freeMpsReadsBackExactly(@ForAll("anyModel") ModelSpec spec) throws IOException {
    Milp milp = spec.build();
    StringWriter text = new StringWriter();
    WriteSummary summary = MpsWriter.free().write(milp, text);
    assertSameModel(
        milp, MpsReader.read(new StringReader(text.toString()), ModelFormat.MPS, summary.names()));
  }

  /** Most of these models must really be written, or the property would prove little. */
  @Property(tries = 300)
  void fixedMpsReadsBackExactly(@ForAll("shortDecimalModel") ModelSpec spec) throws IOException {
    Milp milp = spec.build();
    StringWriter text = new StringWriter();
    WriteSummary summary;
    try {
      summary = MpsWriter.fixed().write(milp, text);
    } catch (IllegalArgumentException e) {
      // Sums of short decimals (merged terms, shifted constants) can need 17 digits: refused
      // cleanly, with nothing written.
      assertTrue(e.getMessage().contains("12 characters"), e.getMessage());
      assertEquals("", text.toString());
      Statistics.collect(
          "refused "
              + e.getMessage()
                  .replaceAll("[-0-9.E]+", "#")
                  .replaceAll("(row|column) .*?:", "$1 N:"));
      return;
    }
    Statistics.collect("written");
    Statistics.coverage(coverage -> coverage.check("written").percentage(p -> p >= 60));
    for (String line : text.toString().split("\n")) {
      assertTrue(line.length() <= 61 || line.startsWith("*"), "fixed MPS line too long: " + line);
    }
    assertSameModel(
        milp,
        MpsReader.read(new StringReader(text.toString()), ModelFormat.FIXED_MPS, summary.names()));
  }

  @Property(tries = 200)
  void fixedMpsEitherReadsBackExactlyOrRefusesBeforeWriting(@ForAll("anyModel") ModelSpec spec)
      throws IOException {
    Milp milp = spec.build();
    StringWriter text = new StringWriter();
    try {
      WriteSummary summary = MpsWriter.fixed().write(milp, text);
      assertSameModel(
          milp,
          MpsReader.read(
              new StringReader(text.toString()), ModelFormat.FIXED_MPS, summary.names()));
    } catch (IllegalArgumentException e) {
      assertTrue(e.getMessage().contains("12 characters"), e.getMessage());
      assertEquals("", text.toString());
    }
  }

  /**
   * Sampled: the LP file of a feasible, bounded random model gives glpsol the optimum it finds in
   * the free MPS file of the same model.
   */
  @Property(tries = 12)
  void lpFilesSolveLikeMpsFiles(@ForAll @LongRange(min = 1000, max = 1_000_000) long seed)
      throws Exception {
    Milp milp = SampleModels.random(seed, false);
    Path folder = Files.createTempDirectory("skerry-lp-property");
    try {
      Path lp = folder.resolve("m.lp");
      Path mps = folder.resolve("m.mps");
      WriteSummary lpSummary = ModelFiles.write(milp, lp, ModelFormat.LP).summary();
      WriteSummary mpsSummary = ModelFiles.write(milp, mps, ModelFormat.MPS).summary();
      OutsideSolvers.Result reference = OutsideSolvers.glpsolObjective(mps, ModelFormat.MPS);
      assertEquals(OutsideSolvers.Status.OPTIMAL, reference.status(), reference.detail());
      double expected = mpsSummary.modelObjective(reference.objective());
      for (OutsideSolvers.Result result :
          List.of(OutsideSolvers.glpsolObjective(lp, ModelFormat.LP))) {
        assertEquals(
            OutsideSolvers.Status.OPTIMAL,
            result.status(),
            result.solver() + ": " + result.detail());
        double actual = lpSummary.modelObjective(result.objective());
        assertTrue(
            OutsideSolvers.sameOptimum(expected, actual),
            "seed "
                + seed
                + ": MPS gives "
                + expected
                + ", "
                + result.solver()
                + " on LP "
                + actual);
      }
    } finally {
      try (var files = Files.list(folder)) {
        for (Path p : files.toList()) {
          Files.delete(p);
        }
      }
      Files.delete(folder);
    }
  }
}
