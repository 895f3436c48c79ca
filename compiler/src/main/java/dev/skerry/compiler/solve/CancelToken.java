package dev.skerry.compiler.solve;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * Asks a running solve to stop. Any thread may cancel; a backend registers what it must do to stop
 * (interrupt a native solver, prune its search) with {@link #onCancel}. Cancelling twice is
 * harmless. A solve that is cancelled returns its best plan so far, if any.
 */
public final class CancelToken {
  private final List<Runnable> actions = new CopyOnWriteArrayList<>();
  private volatile boolean cancelled;

  public void cancel() {
    synchronized (this) {
      if (cancelled) {
        return;
      }
      cancelled = true;
    }
    for (Runnable action : actions) {
      action.run();
    }
  }

  public boolean isCancelled() {
    return cancelled;
  }

  /**
   * Runs the action when the token is cancelled, at once if it already is. Close the returned
   * registration when the solve ends so that a token reused for several solves does not keep stale
   * actions.
   */
  public Registration onCancel(Runnable action) {
    boolean runNow;
    synchronized (this) {
      actions.add(action);
      runNow = cancelled;
    }
    if (runNow) {
      action.run();
    }
    return () -> actions.remove(action);
  }

  /** Undoes an {@link #onCancel} registration. */
  public interface Registration extends AutoCloseable {
    @Override
    void close();
  }
}
