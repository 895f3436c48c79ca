package dev.skerry.compiler.semdiff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs real git in a temporary repository set up as docs/version-control.md says, with a small
 * script standing in for the installed {@code skerry} command.
 */
class GitDriverTest {
  @TempDir Path repo;
  private Path skerry;

  @BeforeEach
  void setUp() throws Exception {
    Path bin = Files.createDirectories(repo.resolve(".bin"));
    skerry = bin.resolve("skerry");
    String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
    Files.writeString(skerry, "#!/bin/sh\nexec '" + java + "' -cp '" + System.getProperty("java.class.path")
        + "' dev.skerry.compiler.cli.SkerryCli \"$@\"\n");
    Files.setPosixFilePermissions(skerry, PosixFilePermissions.fromString("rwxr-xr-x"));
    git("init", "-q");
    git("config", "diff.skerry.command", skerry + " diff --for-git");
    git("config", "diff.skerry.textconv", skerry + " fmt --stdout");
    Files.writeString(repo.resolve(".gitattributes"), "*.skerry diff=skerry\n");
    Files.writeString(repo.resolve(".git/info/exclude"), ".bin/\n");
    Files.copy(GoldenDiffTest.CASES.resolve("base.skerry"), repo.resolve("harbour.skerry"));
    git("add", ".");
    git("commit", "-q", "-m", "first version");
  }

  @Test
  void gitDiffShowsWhatTheChangeMeans() throws Exception {
    Files.copy(GoldenDiffTest.CASES.resolve("zone-moved/new.skerry"), repo.resolve("harbour.skerry"),
        java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    String out = git("diff");
    assertTrue(out.startsWith("harbour.skerry (meaning)\n  zone hull_3: moved 8 m east; now overlaps hull_2\n"
        + "  sizes: binaries "), out);
  }

  @Test
  void aLayoutOnlyChangeMeansNothingAndVanishesFromTheLineDiff() throws Exception {
    String text = Files.readString(repo.resolve("harbour.skerry"));
    Files.writeString(repo.resolve("harbour.skerry"), text.replace("zone hull_2 box (50, 10) to (56, 22)",
        "zone   hull_2 box(50,10)to(56,22)"));
    assertEquals("harbour.skerry (meaning)\n  no differences in meaning\n", git("diff"));
    String lines = git("diff", "--no-ext-diff");
    assertFalse(lines.contains("hull_2"), lines);
  }

  @Test
  void historyComparesRevisionsThroughShowAndStandardInput() throws Exception {
    Files.copy(GoldenDiffTest.CASES.resolve("plan-options/new.skerry"), repo.resolve("harbour.skerry"),
        java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    git("commit", "-q", "-am", "longer horizon");
    assertTrue(git("log", "-p", "--ext-diff", "-1").contains("plan: horizon 60 steps → 80 steps"));
    String old = git("show", "HEAD~1:harbour.skerry");
    Process p = new ProcessBuilder(skerry.toString(), "diff", "-", "harbour.skerry").directory(repo.toFile()).start();
    p.getOutputStream().write(old.getBytes(StandardCharsets.UTF_8));
    p.getOutputStream().close();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(p.waitFor(60, TimeUnit.SECONDS));
    assertEquals(1, p.exitValue());
    assertTrue(out.startsWith("plan: horizon 60 steps → 80 steps"), out);
  }

  private String git(String... args) throws IOException, InterruptedException {
    List<String> command = new ArrayList<>(List.of("git", "-c", "user.name=Test", "-c", "user.email=test@example.invalid",
        "-c", "core.pager=cat", "-c", "commit.gpgsign=false"));
    command.addAll(List.of(args));
    ProcessBuilder pb = new ProcessBuilder(command).directory(repo.toFile());
    pb.environment().put("GIT_CONFIG_NOSYSTEM", "1");
    pb.environment().put("HOME", repo.toString());
    pb.environment().put("PATH", System.getenv("PATH") + File.pathSeparator + skerry.getParent());
    pb.redirectErrorStream(false);
    Process p = pb.start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
    assertTrue(p.waitFor(60, TimeUnit.SECONDS), "git " + String.join(" ", args) + " did not finish");
    assertEquals(0, p.exitValue(), "git " + String.join(" ", args) + " failed: " + err);
    return out;
  }
}
