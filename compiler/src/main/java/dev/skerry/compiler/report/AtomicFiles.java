package dev.skerry.compiler.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes a text file through a temporary file in the same folder and a move: never half a file. */
public final class AtomicFiles {
  private AtomicFiles() {}

  public static void write(Path target, String text) throws IOException {
    Path abs = target.toAbsolutePath();
    Path dir = abs.getParent();
    Files.createDirectories(dir);
    Path tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".tmp");
    try {
      dev.skerry.compiler.io.ModelFiles.readableByAll(tmp);
      Files.writeString(tmp, text, StandardCharsets.UTF_8);
      try {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
      }
    } finally {
      Files.deleteIfExists(tmp);
    }
  }
}
