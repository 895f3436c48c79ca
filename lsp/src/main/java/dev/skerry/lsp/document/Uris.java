package dev.skerry.lsp.document;

import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.FileSystemNotFoundException;
import java.nio.file.Path;

/** Converts between the URIs clients send and file paths. Never throws on a malformed URI. */
public final class Uris {
  private Uris() {}

  /** The absolute, normalised path of a {@code file:} URI, or null for any other or malformed URI. */
  public static Path toPath(String uri) {
    if (uri == null) {
      return null;
    }
    try {
      URI parsed = new URI(uri);
      if (!"file".equalsIgnoreCase(parsed.getScheme()) || parsed.getPath() == null) {
        return null;
      }
      return Path.of(parsed).toAbsolutePath().normalize();
    } catch (URISyntaxException | IllegalArgumentException | FileSystemNotFoundException | SecurityException e) {
      return null;
    }
  }

  public static String fromPath(Path path) {
    return path.toAbsolutePath().normalize().toUri().toString();
  }
}
