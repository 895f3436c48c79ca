package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.syntax.ScenarioReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Expands {@code include} declarations: each included file is read where the include stands,
 * resolved relative to the including file, confined to the workspace root, read once even when
 * included twice, and a cycle is an error.
 */
final class Includes {
  private final SourceLoader loader;
  private final Diagnostics sink;
  private final List<ScenarioFile> files = new ArrayList<>();
  private final Set<Path> done = new HashSet<>();

  /** A declaration with the file it was written in (each file has its own default units). */
  record Placed(Decl decl, ScenarioFile file) {}

  private Includes(SourceLoader loader, Diagnostics sink) {
    this.loader = loader;
    this.sink = sink;
  }

  /** The declarations of the main file with every include expanded in place, and the files read. */
  static Expansion expand(ScenarioFile main, SourceLoader loader, Diagnostics sink) {
    Includes includes = new Includes(loader, sink);
    List<Placed> placed = new ArrayList<>();
    includes.files.add(main);
    Set<Path> stack = new LinkedHashSet<>();
    Path mainPath = main.source().path();
    if (mainPath != null) {
      Path real = realPath(mainPath.toAbsolutePath().normalize());
      stack.add(real);
      includes.done.add(real);
    }
    includes.walk(main, stack, placed, true);
    return new Expansion(placed, includes.files);
  }

  record Expansion(List<Placed> decls, List<ScenarioFile> files) {}

  private void walk(ScenarioFile file, Set<Path> stack, List<Placed> out, boolean isMain) {
    for (Decl decl : file.decls()) {
      if (decl instanceof Decl.IncludeDecl include) {
        follow(file, include, stack, out);
        continue;
      }
      if (!isMain && !(decl instanceof Decl.ZoneDecl || decl instanceof Decl.ConstDecl || decl instanceof Decl.UnitsDecl)) {
        sink.report(Code.NOT_ALLOWED_IN_INCLUDE, decl.range(),
            "an included file may hold only zones, constants and units; move this into the main scenario");
        continue;
      }
      out.add(new Placed(decl, file));
    }
  }

  private void follow(ScenarioFile from, Decl.IncludeDecl include, Set<Path> stack, List<Placed> out) {
    Path root = loader.root();
    Path base = from.source().path() == null ? root : from.source().path().toAbsolutePath().getParent();
    Path target;
    try {
      target = base.resolve(include.path()).toAbsolutePath().normalize();
    } catch (InvalidPathException e) {
      sink.report(Code.INCLUDE_NOT_FOUND, include.pathRange(), "`" + include.path() + "` is not a valid file name");
      return;
    }
    if (include.path().isBlank()) {
      sink.report(Code.INCLUDE_NOT_FOUND, include.pathRange(), "the include names no file");
      return;
    }
    if (!target.startsWith(root) || !realPath(target).startsWith(realPath(root))) {
      sink.report(Code.INCLUDE_OUTSIDE_WORKSPACE, include.pathRange(),
          "`" + include.path() + "` lies outside the workspace root " + root + "; includes stay inside it");
      return;
    }
    Path real = realPath(target);
    if (stack.contains(real)) {
      sink.report(Code.INCLUDE_CYCLE, include.pathRange(),
          "`" + include.path() + "` includes, directly or through other files, the file that includes it");
      return;
    }
    if (!done.add(real)) {
      return;
    }
    SourceFile source;
    try {
      if (Files.isDirectory(target)) {
        throw new IOException("it is a folder");
      }
      source = loader.load(target);
    } catch (IOException | RuntimeException e) {
      String reason = e instanceof java.nio.file.NoSuchFileException ? "no such file" : e.getMessage();
      sink.report(Code.INCLUDE_NOT_FOUND, include.pathRange(),
          "cannot read `" + include.path() + "`: " + (reason == null ? e.getClass().getSimpleName() : reason));
      return;
    }
    ScenarioFile included = ScenarioReader.read(source, sink);
    files.add(included);
    stack.add(real);
    walk(included, stack, out, false);
    stack.remove(real);
  }

  private static Path realPath(Path p) {
    try {
      return p.toRealPath();
    } catch (IOException | SecurityException e) {
      return p;
    }
  }
}
