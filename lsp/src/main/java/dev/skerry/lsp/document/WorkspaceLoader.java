package dev.skerry.lsp.document;

import dev.skerry.compiler.check.DiskLoader;
import dev.skerry.compiler.check.SourceLoader;
import dev.skerry.compiler.source.SourceFile;
import java.io.IOException;
import java.nio.file.Path;

/**
 * Serves included files to the checker: the open buffer when the editor has the file open (so
 * unsaved edits count), the disk otherwise, and nothing outside the workspace root.
 */
public final class WorkspaceLoader implements SourceLoader {
  private final Path root;
  private final DocumentStore store;

  public WorkspaceLoader(Path root, DocumentStore store) {
    this.root = root.toAbsolutePath().normalize();
    this.store = store;
  }

  @Override
  public Path root() {
    return root;
  }

  @Override
  public SourceFile load(Path file) throws IOException {
    Path abs = file.toAbsolutePath().normalize();
    if (!abs.startsWith(root)) {
      throw new IOException(abs + " lies outside the workspace root " + root);
    }
    Document open = store.byPath(abs);
    if (open != null) {
      return open.source();
    }
    return new SourceFile(abs, root.relativize(abs).toString(), DiskLoader.readText(abs));
  }
}
