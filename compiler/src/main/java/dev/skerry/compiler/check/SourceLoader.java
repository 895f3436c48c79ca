package dev.skerry.compiler.check;

import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Path;

/**
 * Gives the text of an included file. The command line reads the disk; the language server
 * answers from its open documents first. {@code root} is the workspace root no include may leave.
 */
public interface SourceLoader {
  Path root();

  SourceFile load(Path file) throws IOException;
}
