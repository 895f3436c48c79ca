package dev.skerry.compiler.solve.ortools;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.MappedByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StaleUnpacksTest {
  @TempDir Path temp;

  Path unpack(String name, Duration age) throws IOException {
    Path dir = Files.createDirectories(temp.resolve(name).resolve("ortools-linux-x86-64"));
    Files.write(dir.resolve("libjniortools.so"), new byte[4096]);
    Instant then = Instant.now().minus(age);
    Files.setLastModifiedTime(dir, FileTime.from(then));
    Files.setLastModifiedTime(dir.getParent(), FileTime.from(then));
    return dir.getParent();
  }

  @Test
  void removesOnlyOldCopiesNoProcessMaps() throws IOException {
    Path stale = unpack("ortools-java1111", Duration.ofHours(3));
    Path fresh = unpack("ortools-java2222", Duration.ofMinutes(5));
    Path mapped = unpack("ortools-java3333", Duration.ofHours(3));
    Path foreign = unpack("other-tool4444", Duration.ofHours(3));
    Path library = mapped.resolve("ortools-linux-x86-64").resolve("libjniortools.so");
    try (FileChannel ch = FileChannel.open(library, StandardOpenOption.READ)) {
      MappedByteBuffer inUse = ch.map(FileChannel.MapMode.READ_ONLY, 0, 4096);
      long start = System.nanoTime();
      StaleUnpacks.Report report = StaleUnpacks.clean(temp, StaleUnpacks.MIN_AGE);
      System.out.printf(
          "stale clean-up scanned /proc in %.1f ms%n", (System.nanoTime() - start) / 1e6);
      assertEquals(List.of(stale), report.removed());
      assertEquals(List.of(mapped), report.inUse());
      assertEquals(4096, report.bytesFreed());
      assertEquals(0, inUse.get(0), "the mapping stays readable");
    }
    assertFalse(Files.exists(stale));
    assertTrue(Files.exists(fresh));
    assertTrue(Files.exists(mapped));
    assertTrue(Files.exists(foreign));
  }

  @Test
  void withoutProcNothingIsRemoved() {
    assertTrue(StaleUnpacks.mappedFiles(temp.resolve("no-proc")).isEmpty());
  }
}
