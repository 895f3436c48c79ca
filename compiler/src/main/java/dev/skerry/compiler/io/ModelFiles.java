package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Optional;

/**
 * Writes a model file so that no reader ever sees half of it: the text goes to a temporary file in
 * the same folder, which then replaces the target in one atomic move. When names had to be
 * replaced, the {@link NameMap} goes next to the model as {@code <file>.names}; a stale name map
 * from an earlier write that needed none is removed, so the two never disagree.
 */
public final class ModelFiles {
  /** Appended to the model file's name to name its name map. */
  public static final String NAME_MAP_SUFFIX = ".names";

  private ModelFiles() {}

  /**
   * What was written.
   *
   * @param model the model file
   * @param nameMap the name-map file, when names had to be replaced
   * @param summary what the writer reports about the file
   */
  public record Written(Path model, Optional<Path> nameMap, WriteSummary summary) {}

  /**
   * Temporary files are created owner-only (0600); an output file should read like any other file
   * the user writes, so it gets rw-r--r-- where the file system has POSIX permissions.
   */
  public static void readableByAll(Path file) throws IOException {
    if (file.getFileSystem().supportedFileAttributeViews().contains("posix")) {
      Files.setPosixFilePermissions(file, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
    }
  }

  /** Writes {@code milp} to {@code target} in {@code format}. */
  public static Written write(Milp milp, Path target, ModelFormat format) throws IOException {
    Path absolute = target.toAbsolutePath();
    Path folder = absolute.getParent();
    Path mapFile = absolute.resolveSibling(absolute.getFileName() + NAME_MAP_SUFFIX);
    Path temporary = Files.createTempFile(folder, "." + absolute.getFileName(), ".part");
    readableByAll(temporary);
    Path mapTemporary = null;
    try {
      WriteSummary summary;
      try (Writer out = asciiWriter(temporary)) {
        summary = writeTo(milp, out, format);
      }
      if (!summary.names().isEmpty()) {
        mapTemporary = Files.createTempFile(folder, "." + mapFile.getFileName(), ".part");
        readableByAll(mapTemporary);
        summary.names().writeTo(mapTemporary);
        moveInto(mapTemporary, mapFile);
        mapTemporary = null;
      } else {
        Files.deleteIfExists(mapFile);
      }
      moveInto(temporary, absolute);
      temporary = null;
      return new Written(
          absolute, summary.names().isEmpty() ? Optional.empty() : Optional.of(mapFile), summary);
    } finally {
      if (temporary != null) {
        Files.deleteIfExists(temporary);
      }
      if (mapTemporary != null) {
        Files.deleteIfExists(mapTemporary);
      }
    }
  }

  /** Writes {@code milp} to {@code target}, the format following from the file name. */
  public static Written write(Milp milp, Path target) throws IOException {
    return write(milp, target, ModelFormat.fromPath(target));
  }

  /** Streams {@code milp} in {@code format} to any text target. */
  public static WriteSummary writeTo(Milp milp, Appendable out, ModelFormat format)
      throws IOException {
    return switch (format) {
      case MPS -> MpsWriter.free().write(milp, out);
      case FIXED_MPS -> MpsWriter.fixed().write(milp, out);
      case LP -> new LpWriter().write(milp, out);
    };
  }

  /**
   * A writer of ASCII text that, like {@link Files#newBufferedWriter}, refuses any other character
   * rather than replacing it. The writers hand over text in 64 KB chunks, so no character buffer is
   * needed in between; the bytes are gathered in 64 KB blocks before they go to the file (the 8 KB
   * the encoder writes at a time made writing a 140 MB model about a third slower).
   */
  private static Writer asciiWriter(Path file) throws IOException {
    return new OutputStreamWriter(
        new BufferedOutputStream(Files.newOutputStream(file), 1 << 16),
        StandardCharsets.US_ASCII.newEncoder());
  }

  private static void moveInto(Path from, Path to) throws IOException {
    try {
      Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    } catch (AtomicMoveNotSupportedException e) {
      throw new IOException(
          "cannot replace " + to + " atomically on this file system; nothing was changed", e);
    }
  }
}
