package dev.skerry.lsp.document;

import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/** The open documents, by URI. Safe to read from any thread. */
public final class DocumentStore {
  private final Map<String, Document> open = new ConcurrentHashMap<>();

  public void put(Document document) {
    open.put(document.uri(), document);
  }

  public Document get(String uri) {
    return uri == null ? null : open.get(uri);
  }

  public Document remove(String uri) {
    return uri == null ? null : open.remove(uri);
  }

  /** The open document that stands for a file, or null. */
  public Document byPath(Path path) {
    if (path == null) {
      return null;
    }
    for (Document d : open.values()) {
      if (path.equals(d.path())) {
        return d;
      }
    }
    return null;
  }

  /** The URI to show for a file: the client's own when the file is open. */
  public String uriOf(Path path) {
    Document d = byPath(path);
    return d != null ? d.uri() : Uris.fromPath(path);
  }

  public Collection<Document> all() {
    return List.copyOf(open.values());
  }
}
