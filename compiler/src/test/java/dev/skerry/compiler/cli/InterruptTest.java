package dev.skerry.compiler.cli;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ctrl-C during `skerry solve`: the search stops, the command prints the plan it has (or says it has
 * none), marks it as not proven optimal, and exits — in a real JVM receiving a real SIGINT.
 */
class InterruptTest {
  @TempDir Path dir;

  @Test
  void sigintStopsTheSearchAndKeepsWhatWasFound() throws Exception {
    String classpath = Path.of("target/classes").toAbsolutePath() + File.pathSeparator
        + Files.readString(Path.of("target/runtime-classpath.txt")).trim();
    Path out = dir.resolve("out.txt");
    Process p = new ProcessBuilder("java", "-cp", classpath, "dev.skerry.compiler.cli.SkerryCli", "solve",
        Path.of("../examples/harbour_survey.skerry").toAbsolutePath().toString(), "--gap", "0", "--quiet")
        .redirectErrorStream(true).redirectOutput(out.toFile()).start();
    Thread.sleep(6000);
    assertTrue(p.isAlive(), "the solve ended before the interrupt: " + Files.readString(out));
    new ProcessBuilder("kill", "-INT", Long.toString(p.pid())).start().waitFor(10, TimeUnit.SECONDS);
    assertTrue(p.waitFor(60, TimeUnit.SECONDS), "the solve did not stop after SIGINT");
    String text = Files.readString(out, StandardCharsets.UTF_8);
    assertTrue(text.contains("interrupted: the search was stopped"), text);
    assertTrue(text.contains("status: "), text);
    assertTrue(!text.contains("status: optimal") || text.contains("not proven"), text);
  }
}
