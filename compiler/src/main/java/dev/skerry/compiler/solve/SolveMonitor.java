package dev.skerry.compiler.solve;

/**
 * Receives progress events while a solve runs, on a thread of the backend's. Must return quickly
 * and must not block; an exception thrown here is caught and reported as a warning of the result.
 */
@FunctionalInterface
public interface SolveMonitor {
  SolveMonitor NONE = progress -> {};

  void onProgress(SolveProgress progress);
}
