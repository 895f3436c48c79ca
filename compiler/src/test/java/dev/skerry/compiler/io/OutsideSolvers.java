package dev.skerry.compiler.io;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

/**
 * The outside judges of our model files, run as separate processes:
 *
 * <ul>
 *   <li>{@code cbc} 2.10 from the Debian package {@code coinor-cbc};
 *   <li>{@code glpsol} 5.0 from the Debian package {@code glpk-utils}.
 * </ul>
 *
 * Both exit with code 0 even when they could not read the file, so the sign of failure is a missing
 * solution file (FORMATS.md). When a solver is not installed, the calling test fails with a message
 * saying which package to install; it is never skipped.
 */
public final class OutsideSolvers {
  private static final long TIMEOUT_SECONDS = 120;

  private OutsideSolvers() {}

  /** How a solve ended, as the solver's own solution file says. */
  public enum Status {
    OPTIMAL,
    INFEASIBLE,
    UNBOUNDED,
    /** A solution file with a status we do not map (e.g. stopped on a limit). */
    OTHER,
    /** No solution file: the solver did not read the model. */
    FAILED
  }

  /**
   * One outside solve.
   *
   * @param solver {@code cbc} or {@code glpsol}
   * @param objective the optimum of the file as written (NaN unless optimal)
   * @param detail the first line of the solution file, or the end of the log when there is none
   */
  public record Result(String solver, Status status, double objective, String detail) {
    public boolean isOptimal() {
      return status == Status.OPTIMAL;
    }
  }

  /**
   * Solves with {@code cbc F -solve -printingOptions all -solu SOL} (cbc picks LP or MPS by
   * extension).
   */
  public static Result cbcObjective(Path model) throws IOException, InterruptedException {
    return cbcObjective(model, TIMEOUT_SECONDS);
  }

  /**
   * As {@link #cbcObjective(Path)}, but the process is ended after {@code timeoutSeconds} (for the
   * opt-in solves of the larger examples); a solve ended so has no solution file and says FAILED.
   */
  public static Result cbcObjective(Path model, long timeoutSeconds)
      throws IOException, InterruptedException {
    Path cbc = require("cbc", "coinor-cbc");
    Path work = Files.createTempDirectory("skerry-cbc");
    try {
      Path solution = work.resolve("solution.txt");
      String log =
          run(
              work,
              List.of(
                  cbc.toString(),
                  model.toAbsolutePath().toString(),
                  "-preprocess",
                  "off",
                  "-solve",
                  "-printingOptions",
                  "all",
                  "-solu",
                  solution.toString()),
              timeoutSeconds);
      if (!Files.exists(solution)) {
        return new Result("cbc", Status.FAILED, Double.NaN, tail(log));
      }
      List<String> lines = Files.readAllLines(solution, StandardCharsets.ISO_8859_1);
      String first = lines.isEmpty() ? "" : lines.get(0).trim();
      return new Result("cbc", cbcStatus(first), cbcValue(first), first);
    } finally {
      deleteTree(work);
    }
  }

  /** Solves with {@code glpsol --freemps|--mps|--lp F --pcost -w SOL} (minimising). */
  public static Result glpsolObjective(Path model, ModelFormat format)
      throws IOException, InterruptedException {
    return glpsolObjective(model, format, false);
  }

  /**
   * Solves with glpsol; {@code maximize} adds {@code --max}, for outside files that are meant to be
   * maximised but carry no sense (our own files are always minimisations).
   */
  public static Result glpsolObjective(Path model, ModelFormat format, boolean maximize)
      throws IOException, InterruptedException {
    return glpsolObjective(model, format, maximize, TIMEOUT_SECONDS);
  }

  /** As {@link #glpsolObjective(Path, ModelFormat)}, the process ended after {@code timeoutSeconds}. */
  public static Result glpsolObjective(Path model, ModelFormat format, long timeoutSeconds)
      throws IOException, InterruptedException {
    return glpsolObjective(model, format, false, timeoutSeconds);
  }

  private static Result glpsolObjective(Path model, ModelFormat format, boolean maximize, long timeoutSeconds)
      throws IOException, InterruptedException {
    Path glpsol = require("glpsol", "glpk-utils");
    Path work = Files.createTempDirectory("skerry-glpsol");
    try {
      Path solution = work.resolve("solution.txt");
      String option =
          switch (format) {
            case MPS -> "--freemps";
            case FIXED_MPS -> "--mps";
            case LP -> "--lp";
          };
      List<String> command =
          new ArrayList<>(
              List.of(
                  glpsol.toString(),
                  option,
                  model.toAbsolutePath().toString(),
                  // GLPK's hybrid pseudocost branching: the same proof, found sooner on our models
                  // (the full examples' LP files, one run each: harbour 170 s → 23 s, rock field
                  // 155 s → 34 s, twin skiffs 87 s → 17 s)
                  "--pcost",
                  "-w",
                  solution.toString()));
      if (maximize) {
        command.add("--max");
      }
      String log = run(work, command, timeoutSeconds);
      if (!Files.exists(solution)) {
        return new Result("glpsol", Status.FAILED, Double.NaN, tail(log));
      }
      for (String line : Files.readAllLines(solution, StandardCharsets.ISO_8859_1)) {
        if (line.startsWith("s ")) {
          return glpsolLine(line.trim());
        }
      }
      return new Result("glpsol", Status.FAILED, Double.NaN, "no status line; " + tail(log));
    } finally {
      deleteTree(work);
    }
  }

  /** Two optima agree within 1e-6 relative plus 1e-9 absolute (cbc prints 8 significant digits). */
  public static boolean sameOptimum(double a, double b) {
    return Math.abs(a - b) <= 1e-9 + 1e-6 * Math.max(Math.abs(a), Math.abs(b));
  }

  private static Status cbcStatus(String first) {
    String lower = first.toLowerCase(Locale.ROOT);
    if (lower.startsWith("optimal")) {
      return Status.OPTIMAL;
    }
    if (lower.contains("infeasible")) {
      return Status.INFEASIBLE;
    }
    if (lower.contains("unbounded")) {
      return Status.UNBOUNDED;
    }
    return Status.OTHER;
  }

  private static double cbcValue(String first) {
    String key = "objective value";
    int at = first.indexOf(key);
    if (!first.toLowerCase(Locale.ROOT).startsWith("optimal") || at < 0) {
      return Double.NaN;
    }
    return Double.parseDouble(first.substring(at + key.length()).trim());
  }

  /** {@code s mip ROWS COLS ST OBJ} or {@code s bas ROWS COLS PST DST OBJ}. */
  private static Result glpsolLine(String line) {
    String[] f = line.split("\\s+");
    Status status;
    if (f[1].equals("mip") && f.length >= 6) {
      status =
          switch (f[4]) {
            case "o" -> Status.OPTIMAL;
            case "n" -> Status.INFEASIBLE;
            default -> Status.OTHER;
          };
    } else if (f[1].equals("bas") && f.length >= 7) {
      if (f[4].equals("f") && f[5].equals("f")) {
        status = Status.OPTIMAL;
      } else if (f[4].equals("n") || f[4].equals("i")) {
        status = Status.INFEASIBLE;
      } else if (f[5].equals("n") || f[5].equals("i")) {
        status = Status.UNBOUNDED;
      } else {
        status = Status.OTHER;
      }
    } else {
      return new Result("glpsol", Status.OTHER, Double.NaN, line);
    }
    double value = status == Status.OPTIMAL ? Double.parseDouble(f[f.length - 1]) : Double.NaN;
    return new Result("glpsol", status, value, line);
  }

  /** The solver's path, or a test failure saying which Debian package provides it. */
  private static Path require(String program, String debianPackage) {
    String path = System.getenv("PATH");
    List<String> folders = new ArrayList<>(List.of("/usr/bin", "/usr/local/bin"));
    if (path != null) {
      folders.addAll(0, List.of(path.split(File.pathSeparator)));
    }
    for (String folder : folders) {
      Path candidate = Path.of(folder, program);
      if (Files.isExecutable(candidate)) {
        return candidate;
      }
    }
    return fail(
        program
            + " is not installed, but the model-file tests need it as an outside judge:"
            + " install the Debian package "
            + debianPackage
            + " (apt-get install "
            + debianPackage
            + ")");
  }

  private static String run(Path work, List<String> command, long timeoutSeconds)
      throws IOException, InterruptedException {
    Path log = work.resolve("log.txt");
    Process process =
        new ProcessBuilder(command)
            .directory(work.toFile())
            .redirectErrorStream(true)
            .redirectOutput(log.toFile())
            .start();
    if (!process.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
      process.destroyForcibly();
      process.waitFor();
      return "timed out after " + timeoutSeconds + " s: " + String.join(" ", command);
    }
    return Files.readString(log, StandardCharsets.ISO_8859_1);
  }

  private static String tail(String log) {
    String trimmed = log.strip();
    return trimmed.length() <= 600 ? trimmed : "..." + trimmed.substring(trimmed.length() - 600);
  }

  private static void deleteTree(Path folder) throws IOException {
    try (var paths = Files.walk(folder)) {
      for (Path p : paths.sorted((a, b) -> b.getNameCount() - a.getNameCount()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
