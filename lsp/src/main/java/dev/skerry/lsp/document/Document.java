package dev.skerry.lsp.document;

import dev.skerry.compiler.source.SourceFile;
import java.nio.file.Path;

/**
 * One version of an open editor buffer: its URI as the client spells it, the version the client
 * gave, and the text with its line index. Immutable; an edit makes a new document.
 */
public final class Document {
  private final String uri;
  private final int version;
  private final SourceFile source;

  public Document(String uri, int version, String text) {
    this.uri = uri;
    this.version = version;
    Path path = Uris.toPath(uri);
    this.source = new SourceFile(path, path == null ? uri : path.getFileName().toString(), text);
  }

  public String uri() {
    return uri;
  }

  public int version() {
    return version;
  }

  public String text() {
    return source.text();
  }

  /** The file on disk this buffer stands for, or null for an unsaved buffer. */
  public Path path() {
    return source.path();
  }

  public SourceFile source() {
    return source;
  }

  /** A new version with the range {@code [start, end)} replaced (offsets clamped to the text). */
  public Document edit(int newVersion, int start, int end, String replacement) {
    String text = text();
    int from = Math.max(0, Math.min(start, text.length()));
    int to = Math.max(from, Math.min(end, text.length()));
    return new Document(uri, newVersion, text.substring(0, from) + replacement + text.substring(to));
  }

  public Document replace(int newVersion, String text) {
    return new Document(uri, newVersion, text);
  }
}
