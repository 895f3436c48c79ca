package dev.skerry.compiler.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.util.Properties;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code skerry} command line: one subcommand per job. */
@Command(
    name = "skerry",
    mixinStandardHelpOptions = true,
    versionProvider = SkerryCli.Version.class,
    description = {
      "Scenario language and MILP compiler for planning vehicle trajectories.",
      "Planning aid only, not certified guidance software."
    },
    subcommands = {CheckCommand.class, BuildCommand.class, SolveCommand.class, RunCommand.class, CompareCommand.class, FmtCommand.class, DiffCommand.class, CommandLine.HelpCommand.class})
public final class SkerryCli implements Runnable {
  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  public static void main(String[] args) {
    System.exit(run(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args));
  }

  /** Runs the command line with the given streams; returns the exit code (0 ok, 1 errors found, 2 misuse). */
  public static int run(PrintWriter out, PrintWriter err, String... args) {
    CommandLine cli = new CommandLine(new SkerryCli());
    cli.setOut(out);
    cli.setErr(err);
    cli.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
      commandLine.getErr().println("skerry: internal error: " + ex
          + "\n(please report this with the scenario that caused it)");
      return 3;
    });
    int code = cli.execute(args);
    out.flush();
    err.flush();
    return code;
  }

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /** Reads the version Maven wrote into the jar. */
  static final class Version implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() throws IOException {
      Properties p = new Properties();
      try (InputStream in = SkerryCli.class.getResourceAsStream("/dev/skerry/compiler/version.properties")) {
        if (in != null) {
          p.load(in);
        }
      }
      return new String[] {"skerry " + p.getProperty("version", "unknown"), "Java " + System.getProperty("java.version")};
    }
  }
}
