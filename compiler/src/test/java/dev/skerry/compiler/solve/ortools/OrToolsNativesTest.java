package dev.skerry.compiler.solve.ortools;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OrToolsNativesTest {
  @TempDir Path cache;

  @Test
  void nativesLoad() {
    OrToolsNatives.Status s = OrToolsNatives.load();
    System.out.println("OR-Tools natives: " + s);
    assertTrue(s.loaded(), s::failure);
  }

  /** The cache is filled once and then reused as is: the second call unpacks nothing. */
  @Test
  void cacheIsUnpackedOnceThenReused() throws IOException {
    String before = System.getProperty("skerry.cache");
    System.setProperty("skerry.cache", cache.toString());
    try {
      long t0 = System.nanoTime();
      Path first = OrToolsNatives.cachedNatives();
      long t1 = System.nanoTime();
      Path library = first.resolve(System.mapLibraryName("jniortools"));
      long written = Files.getLastModifiedTime(library).toMillis();
      Path second = OrToolsNatives.cachedNatives();
      long t2 = System.nanoTime();
      System.out.printf(
          "natives cache: first fill %.0f ms, reuse %.1f ms%n", (t1 - t0) / 1e6, (t2 - t1) / 1e6);
      assertEquals(first, second);
      assertTrue(first.startsWith(cache), first::toString);
      assertTrue(Files.size(library) > 1_000_000, "libjniortools is megabytes");
      assertEquals(written, Files.getLastModifiedTime(library).toMillis(), "not written again");
      try (var leftovers = Files.list(cache)) {
        assertEquals(1, leftovers.count(), "no partial folder left next to the cache");
      }
    } finally {
      if (before == null) {
        System.clearProperty("skerry.cache");
      } else {
        System.setProperty("skerry.cache", before);
      }
    }
  }
}
