package dev.skerry.compiler.solve;

import java.time.Duration;
import java.util.concurrent.Executors;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

/**
 * A watchdog thread for one solve: sends the monitor the elapsed time (and the incumbent and bound
 * once a backend reports them) at a fixed period, and runs a backend's timed actions, such as
 * interrupting a solver that overran its deadline. A helper for backends; close it when the solve
 * ends.
 */
public final class ProgressTicker implements AutoCloseable {
  public static final Duration DEFAULT_PERIOD = Duration.ofMillis(250);

  private final String backendId;
  private final SolveMonitor monitor;
  private final ScheduledExecutorService timer;
  private final long startNanos = System.nanoTime();
  private volatile double incumbent = Double.NaN;
  private volatile double bound = Double.NaN;
  private volatile String monitorFailure;

  public ProgressTicker(String backendId, SolveMonitor monitor, Duration period) {
    this.backendId = backendId;
    this.monitor = monitor;
    this.timer =
        Executors.newSingleThreadScheduledExecutor(
            task -> {
              Thread t = new Thread(task, "skerry-" + backendId + "-watch");
              t.setDaemon(true);
              return t;
            });
    long ms = Math.max(1, period.toMillis());
    timer.scheduleAtFixedRate(this::emit, ms, ms, TimeUnit.MILLISECONDS);
  }

  public Duration elapsed() {
    return Duration.ofNanos(System.nanoTime() - startNanos);
  }

  /** Records a new incumbent objective and tells the monitor at once, from the watchdog thread. */
  public void incumbent(double objective) {
    incumbent = objective;
    submit(this::emit);
  }

  /** Whether a backend has recorded an incumbent. */
  public boolean hasIncumbent() {
    return !Double.isNaN(incumbent);
  }

  /** Records a new best bound; it goes out with the next tick. */
  public void bound(double value) {
    bound = value;
  }

  /** Runs an action on the watchdog thread once the solve has run for {@code after}. */
  public void at(Duration after, Runnable action) {
    long delay = Math.max(0, after.minus(elapsed()).toMillis());
    try {
      timer.schedule(action, delay, TimeUnit.MILLISECONDS);
    } catch (RejectedExecutionException closed) {
      // the solve already ended: nothing left to act on
    }
  }

  /** Why the monitor failed, or null if it never threw. */
  public String monitorFailure() {
    return monitorFailure;
  }

  private void submit(Runnable r) {
    try {
      timer.execute(r);
    } catch (RejectedExecutionException closed) {
      // the solve already ended: the event is no longer news
    }
  }

  private void emit() {
    if (monitorFailure != null) {
      return;
    }
    try {
      monitor.onProgress(new SolveProgress(backendId, elapsed(), incumbent, bound));
    } catch (RuntimeException e) {
      monitorFailure = "progress monitor failed and was switched off: " + e;
    }
  }

  @Override
  public void close() {
    timer.shutdownNow();
  }
}
