package dev.skerry.compiler.check;

import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.syntax.ScenarioReader;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Reads scenario files from disk as UTF-8 (malformed bytes become U+FFFD, never an exception). */
public final class DiskLoader implements SourceLoader {
  private final Path root;

  public DiskLoader(Path root) {
    this.root = root.toAbsolutePath().normalize();
  }

  @Override
  public Path root() {
    return root;
  }

  @Override
  public SourceFile load(Path file) throws IOException {
    Path cwd = Path.of("").toAbsolutePath();
    Path abs = file.toAbsolutePath().normalize();
    String shown = abs.startsWith(cwd) ? cwd.relativize(abs).toString() : abs.toString();
    return new SourceFile(abs, shown, readText(file));
  }

  /** Reads a file as text, refusing (with a message) files far beyond what the reader accepts. */
  public static String readText(Path file) throws IOException {
    long size = Files.size(file);
    if (size > 4L * ScenarioReader.MAX_CHARS) {
      throw new IOException("the file has " + size + " bytes, more than Skerry reads");
    }
    byte[] bytes = Files.readAllBytes(file);
    try {
      return StandardCharsets.UTF_8.newDecoder()
          .onMalformedInput(CodingErrorAction.REPLACE)
          .onUnmappableCharacter(CodingErrorAction.REPLACE)
          .decode(java.nio.ByteBuffer.wrap(bytes))
          .toString();
    } catch (CharacterCodingException e) {
      throw new IOException("the file is not text: " + e.getMessage(), e);
    }
  }
}
