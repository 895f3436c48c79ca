package dev.skerry.compiler.io;

import java.nio.file.Path;
import java.util.Locale;

/**
 * The file formats Skerry writes a {@link dev.skerry.compiler.milp.Milp} to. The format follows
 * from the file name: {@code .fixed.mps} is fixed MPS, any other {@code .mps} free MPS, {@code .lp}
 * the common LP text format.
 */
public enum ModelFormat {
  /** Free MPS: whitespace-separated fields, names up to 64 characters. */
  MPS(".mps"),
  /** Fixed MPS: fields in fixed columns, names up to 8 characters, numbers up to 12. */
  FIXED_MPS(".fixed.mps"),
  /** The LP text format subset that both outside readers take alike (see FORMATS.md). */
  LP(".lp");

  private final String extension;

  ModelFormat(String extension) {
    this.extension = extension;
  }

  /** The file-name ending that selects this format, e.g. {@code .fixed.mps}. */
  public String extension() {
    return extension;
  }

  /** True for both MPS variants. */
  public boolean isMps() {
    return this != LP;
  }

  /**
   * The format a file name asks for, ignoring case.
   *
   * @throws IllegalArgumentException when the name ends in none of the known extensions
   */
  public static ModelFormat fromFileName(String fileName) {
    String lower = fileName.toLowerCase(Locale.ROOT);
    if (lower.endsWith(FIXED_MPS.extension)) {
      return FIXED_MPS;
    }
    if (lower.endsWith(MPS.extension)) {
      return MPS;
    }
    if (lower.endsWith(LP.extension)) {
      return LP;
    }
    throw new IllegalArgumentException(
        "cannot tell the model format of '"
            + fileName
            + "': use a name ending in .mps (free MPS), .fixed.mps (fixed MPS) or .lp (LP)");
  }

  /** The format of a path's file name; see {@link #fromFileName(String)}. */
  public static ModelFormat fromPath(Path path) {
    Path name = path.getFileName();
    if (name == null) {
      throw new IllegalArgumentException("path " + path + " has no file name");
    }
    return fromFileName(name.toString());
  }
}
