package dev.skerry.lsp.protocol;

import dev.skerry.compiler.io.ModelFiles;
import dev.skerry.compiler.io.ModelFormat;
import dev.skerry.compiler.lower.Lowering;
import dev.skerry.lsp.analysis.AnalysisResult;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import org.eclipse.lsp4j.ExecuteCommandParams;

import dev.skerry.lsp.analysis.AnalysisScheduler;
import dev.skerry.lsp.document.Document;
import dev.skerry.lsp.document.DocumentStore;
import org.eclipse.lsp4j.DidChangeConfigurationParams;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.services.WorkspaceService;

/** Workspace notifications: a file changed on disk may change what open documents include. */
final class Workspace implements WorkspaceService {
  private final DocumentStore store;
  private final AnalysisScheduler scheduler;

  Workspace(DocumentStore store, AnalysisScheduler scheduler) {
    this.store = store;
    this.scheduler = scheduler;
  }

  /** The commands {@code workspace/executeCommand} accepts. */
  static final String EXPORT_MPS = "skerry.exportMps";
  static final String EXPORT_LP = "skerry.exportLp";

  /**
   * Exports the open scenario's MILP next to it ({@code mission.skerry} → {@code mission.mps} or
   * {@code .lp}), from the latest checked text, off the request thread. Answers the path written, or
   * an error message when the scenario has errors or the command is unknown. Never solves.
   */
  @Override
  public CompletableFuture<Object> executeCommand(ExecuteCommandParams params) {
    return CompletableFuture.supplyAsync(() -> {
      if (params == null || params.getCommand() == null) {
        return "no command given";
      }
      ModelFormat format = EXPORT_MPS.equals(params.getCommand()) ? ModelFormat.MPS
          : EXPORT_LP.equals(params.getCommand()) ? ModelFormat.LP : null;
      if (format == null) {
        return "unknown command " + params.getCommand() + "; known: " + EXPORT_MPS + ", " + EXPORT_LP;
      }
      String uri = argument(params);
      Document document = uri == null ? null : store.get(uri);
      if (document == null || document.path() == null) {
        return "export needs the URI of an open scenario file as its argument";
      }
      AnalysisResult r = scheduler.last(uri);
      if (r == null || r.check().hasErrors() || r.check().scenario() == null) {
        return "the scenario has errors; fix them before exporting";
      }
      String name = document.path().getFileName().toString().replaceFirst("\\.skerry$", "") + format.extension();
      Path target = document.path().resolveSibling(name);
      try {
        ModelFiles.write(Lowering.lower(r.check().scenario()), target, format);
        return target.toString();
      } catch (IOException | RuntimeException e) {
        return "cannot write " + target + ": " + e.getMessage();
      }
    });
  }

  private static String argument(ExecuteCommandParams params) {
    List<Object> args = params.getArguments();
    if (args == null || args.isEmpty() || args.get(0) == null) {
      return null;
    }
    Object a = args.get(0);
    if (a instanceof com.google.gson.JsonPrimitive p && p.isString()) {
      return p.getAsString();
    }
    return a instanceof String text ? text : null;
  }

  @Override
  public void didChangeConfiguration(DidChangeConfigurationParams params) {
    // Skerry has no settings yet; nothing to reload.
  }

  @Override
  public void didChangeWatchedFiles(DidChangeWatchedFilesParams params) {
    for (Document d : store.all()) {
      scheduler.update(d);
    }
  }
}
