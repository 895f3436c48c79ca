package dev.skerry.compiler.solve.ortools;

import com.google.ortools.Loader;
import com.sun.jna.Platform;
import java.io.IOException;
import java.io.InputStream;
import java.lang.reflect.Field;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystem;
import java.nio.file.FileSystemAlreadyExistsException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.stream.Stream;

/**
 * Loads OR-Tools' native libraries once per JVM, from a cache folder instead of the temp folder.
 *
 * <p>OR-Tools' own {@link Loader} unpacks all of its natives (about 69 MB on linux x86-64) into a
 * new temp folder at every start and removes it only on a normal exit. Instead, the natives are
 * unpacked once into {@code <cache>/ortools-<version>-<platform>} (written to a side folder, then
 * renamed, so a concurrent start never sees half a copy), and {@code libjniortools} is loaded from
 * there; it finds its sibling libraries through its {@code $ORIGIN} run path. The cache folder is
 * the system property {@code skerry.cache}, else {@code $XDG_CACHE_HOME/skerry}, else {@code
 * ~/.cache/skerry}.
 *
 * <p>When the cache cannot be used, OR-Tools' own loader runs instead, after removing the temp
 * copies that crashed runs left behind ({@link StaleUnpacks}).
 */
public final class OrToolsNatives {
  private static final String JNI_LIBRARY = "jniortools";
  private static final String COMPLETE_MARKER = ".complete";
  private static Status status;

  private OrToolsNatives() {}

  /**
   * How loading went: whether the natives are usable, how they were loaded, the failure in words
   * when they are not, and the time it took.
   */
  public record Status(boolean loaded, String how, String failure, Duration took) {}

  /** Loads the natives on the first call; later calls return the first outcome. */
  public static synchronized Status load() {
    if (status == null) {
      long start = System.nanoTime();
      status = loadNow(start);
    }
    return status;
  }

  private static Status loadNow(long start) {
    String cacheFailure;
    try {
      Path dir = cachedNatives();
      System.load(dir.resolve(System.mapLibraryName(JNI_LIBRARY)).toString());
      markLoaderDone();
      return new Status(true, "from cache " + dir, "", since(start));
    } catch (IOException | RuntimeException | UnsatisfiedLinkError e) {
      cacheFailure = e.getMessage() == null ? e.toString() : e.getMessage();
    }
    StaleUnpacks.Report cleaned =
        StaleUnpacks.clean(Path.of(System.getProperty("java.io.tmpdir")), StaleUnpacks.MIN_AGE);
    try {
      Loader.loadNativeLibraries();
      String how =
          "by OR-Tools' loader into the temp folder (cache unusable: "
              + cacheFailure
              + "; removed "
              + cleaned.removed().size()
              + " stale copies)";
      return new Status(true, how, "", since(start));
    } catch (RuntimeException | UnsatisfiedLinkError e) {
      return new Status(
          false,
          "",
          "OR-Tools native libraries could not be loaded for platform "
              + platform()
              + ": "
              + e.getMessage()
              + " (cache: "
              + cacheFailure
              + ")",
          since(start));
    }
  }

  private static Duration since(long start) {
    return Duration.ofNanos(System.nanoTime() - start);
  }

  static String platform() {
    return Platform.RESOURCE_PREFIX;
  }

  /** The cache folder for natives: {@code skerry.cache}, XDG cache home, or {@code ~/.cache}. */
  static Path cacheRoot() {
    String configured = System.getProperty("skerry.cache");
    if (configured != null && !configured.isBlank()) {
      return Path.of(configured);
    }
    String xdg = System.getenv("XDG_CACHE_HOME");
    if (xdg != null && !xdg.isBlank()) {
      return Path.of(xdg, "skerry");
    }
    return Path.of(System.getProperty("user.home"), ".cache", "skerry");
  }

  /** The folder holding a complete copy of this platform's natives, unpacking it if needed. */
  static Path cachedNatives() throws IOException {
    if (Platform.isWindows()) {
      throw new IOException("the cache is not used on Windows, whose libraries name no run path");
    }
    String resource = "ortools-" + platform();
    Path target = cacheRoot().resolve(resource + "-" + version(resource));
    if (Files.exists(target.resolve(COMPLETE_MARKER))) {
      return target;
    }
    Files.createDirectories(target.getParent());
    Path partial =
        Files.createTempDirectory(target.getParent(), target.getFileName() + ".partial-");
    try {
      unpack(resource, partial);
      Files.writeString(partial.resolve(COMPLETE_MARKER), "unpacked from the OR-Tools jar\n");
      try {
        Files.move(partial, target, StandardCopyOption.ATOMIC_MOVE);
      } catch (FileAlreadyExistsException | DirectoryNotEmptyException raced) {
        // another process finished first; its copy is as good as ours
      }
    } finally {
      if (Files.exists(partial)) {
        StaleUnpacks.deleteTree(partial);
      }
    }
    if (!Files.exists(target.resolve(COMPLETE_MARKER))) {
      throw new IOException("cache folder " + target + " is incomplete and could not be replaced");
    }
    return target;
  }

  private static String version(String resource) throws IOException {
    String pom = "META-INF/maven/com.google.ortools/" + resource + "/pom.properties";
    try (InputStream in = OrToolsNatives.class.getClassLoader().getResourceAsStream(pom)) {
      if (in == null) {
        throw new IOException("no OR-Tools natives on the class path for platform " + platform());
      }
      Properties p = new Properties();
      p.load(in);
      String v = p.getProperty("version");
      if (v == null || !v.matches("[0-9A-Za-z.+-]+")) {
        throw new IOException("unreadable OR-Tools version in " + pom + ": " + v);
      }
      return v;
    }
  }

  private static void unpack(String resource, Path into) throws IOException {
    URL url = OrToolsNatives.class.getClassLoader().getResource(resource + "/");
    if (url == null) {
      throw new IOException("resource folder " + resource + " not found on the class path");
    }
    URI uri;
    try {
      uri = url.toURI();
    } catch (URISyntaxException e) {
      throw new IOException("bad resource address " + url, e);
    }
    if ("file".equals(uri.getScheme())) {
      copyTree(Path.of(uri), into);
      return;
    }
    FileSystem jar;
    boolean opened = false;
    try {
      jar = FileSystems.newFileSystem(uri, Map.of());
      opened = true;
    } catch (FileSystemAlreadyExistsException e) {
      jar = FileSystems.getFileSystem(uri);
    }
    try {
      copyTree(jar.provider().getPath(uri), into);
    } finally {
      if (opened) {
        jar.close();
      }
    }
  }

  private static void copyTree(Path from, Path into) throws IOException {
    List<Path> files;
    try (Stream<Path> walk = Files.walk(from)) {
      files = walk.filter(Files::isRegularFile).toList();
    }
    for (Path file : files) {
      Path target = into.resolve(from.relativize(file).toString());
      Files.createDirectories(target.getParent());
      Files.copy(file, target, StandardCopyOption.REPLACE_EXISTING);
    }
  }

  /**
   * Tells OR-Tools' loader that its natives are in, so a later {@code Loader.loadNativeLibraries()}
   * elsewhere in the JVM does not unpack a second copy. Best effort: if its private flag is renamed
   * in a later version, that call merely costs a second unpack.
   */
  private static void markLoaderDone() {
    try {
      Field loaded = Loader.class.getDeclaredField("loaded");
      loaded.setAccessible(true);
      loaded.setBoolean(null, true);
    } catch (ReflectiveOperationException | RuntimeException e) {
      // see above: harmless
    }
  }
}
