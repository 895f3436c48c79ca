package dev.skerry.compiler.solve.ortools;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Removes the native libraries that OR-Tools' own loader left in the temp folder. Its loader
 * unpacks about 69 MB into a fresh {@code ortools-java<digits>} folder at every start and deletes
 * it only on a normal JVM exit, so every crash or kill leaves one behind. A folder is removed only
 * when it is older than a minimum age and no live process maps a file from it (read from {@code
 * /proc/<pid>/maps}; where that cannot be read, nothing is removed).
 */
final class StaleUnpacks {
  static final String PREFIX = "ortools-java";
  static final Duration MIN_AGE = Duration.ofHours(1);

  private StaleUnpacks() {}

  /** What a clean-up did: folders removed, folders kept because in use, and bytes freed. */
  record Report(List<Path> removed, List<Path> inUse, long bytesFreed) {}

  static Report clean(Path tempDir, Duration minAge) {
    Optional<Set<String>> mapped = mappedFiles(Path.of("/proc"));
    List<Path> removed = new ArrayList<>();
    List<Path> inUse = new ArrayList<>();
    long freed = 0;
    if (mapped.isEmpty() || !Files.isDirectory(tempDir)) {
      return new Report(removed, inUse, 0);
    }
    Instant cutoff = Instant.now().minus(minAge);
    try (DirectoryStream<Path> entries = Files.newDirectoryStream(tempDir, PREFIX + "*")) {
      for (Path dir : entries) {
        if (!Files.isDirectory(dir) || Files.isSymbolicLink(dir)) {
          continue;
        }
        if (Files.getLastModifiedTime(dir).toInstant().isAfter(cutoff)) {
          continue;
        }
        if (isMapped(dir, mapped.get())) {
          inUse.add(dir);
          continue;
        }
        long size = sizeOf(dir);
        if (deleteTree(dir)) {
          removed.add(dir);
          freed += size;
        }
      }
    } catch (IOException | UncheckedIOException e) {
      // a temp folder we cannot list holds nothing we could remove either
    }
    return new Report(removed, inUse, freed);
  }

  private static boolean isMapped(Path dir, Set<String> mapped) {
    String prefix = dir.toAbsolutePath().normalize() + "/";
    for (String file : mapped) {
      if (file.startsWith(prefix)) {
        return true;
      }
    }
    return false;
  }

  /**
   * Every file mapped by a live process, or empty when {@code /proc} cannot be read (not Linux), in
   * which case nothing may be removed.
   */
  static Optional<Set<String>> mappedFiles(Path proc) {
    if (!Files.isReadable(proc.resolve("self").resolve("maps"))) {
      return Optional.empty();
    }
    Set<String> files = new HashSet<>();
    try (DirectoryStream<Path> pids = Files.newDirectoryStream(proc, "[0-9]*")) {
      for (Path pid : pids) {
        try (Stream<String> lines = Files.lines(pid.resolve("maps"))) {
          lines.forEach(
              line -> {
                int slash = line.indexOf('/');
                if (slash >= 0 && line.contains(PREFIX)) {
                  files.add(line.substring(slash).replace(" (deleted)", ""));
                }
              });
        } catch (IOException | UncheckedIOException e) {
          // the process ended meanwhile, or belongs to someone whose files we cannot delete anyway
        }
      }
    } catch (IOException e) {
      return Optional.empty();
    }
    return Optional.of(files);
  }

  private static long sizeOf(Path dir) {
    try (Stream<Path> files = Files.walk(dir)) {
      return files.filter(Files::isRegularFile).mapToLong(StaleUnpacks::sizeOrZero).sum();
    } catch (IOException | UncheckedIOException e) {
      return 0;
    }
  }

  private static long sizeOrZero(Path file) {
    try {
      return Files.size(file);
    } catch (IOException e) {
      return 0;
    }
  }

  static boolean deleteTree(Path dir) {
    try {
      Files.walkFileTree(
          dir,
          new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs)
                throws IOException {
              Files.delete(file);
              return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, IOException failure)
                throws IOException {
              if (failure != null) {
                throw failure;
              }
              Files.delete(d);
              return FileVisitResult.CONTINUE;
            }
          });
      return true;
    } catch (IOException e) {
      return false;
    }
  }
}
