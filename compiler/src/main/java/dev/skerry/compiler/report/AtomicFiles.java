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

  /**
   * Temporary files are created owner-only (0600); an output file should read like any other file
   * the user writes, so it gets rw-r--r-- where the file system has POSIX permissions.
   */
  public static void readableByAll(Path file) throws IOException {
    if (file.getFileSystem().supportedFileAttributeViews().contains("posix")) {
      Files.setPosixFilePermissions(file, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
    }
  }

  public static void write(Path target, String text) throws IOException {
    Path abs = target.toAbsolutePath();
    Path dir = abs.getParent();
    Files.createDirectories(dir);
    Path tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".tmp");
    try {
      readableByAll(tmp);
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
