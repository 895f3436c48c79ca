package dev.skerry.lsp.analysis;

import dev.skerry.lsp.document.Document;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * Runs analyses off the request threads. The first edit after a quiet spell is checked at once;
 * an edit that follows another within the delay (re)starts a timer, so a burst of typing is
 * checked once, the delay after its last key. Checks run on a worker. A run whose document changed meanwhile is thrown away
 * and never published. A request that needs the result now skips the timer.
 */
public final class AnalysisScheduler implements AutoCloseable {
  private final Function<Document, AnalysisResult> analyzer;
  private final Duration delay;
  private final Consumer<AnalysisResult> onResult;
  private final ScheduledExecutorService timers;
  private final ExecutorService workers;
  private final Map<String, Slot> slots = new HashMap<>();
  private final AtomicLong runs = new AtomicLong();
  private final AtomicLong discarded = new AtomicLong();
  private boolean closed;

  /** The state of one open document; guarded by the scheduler. */
  private static final class Slot {
    Document document;
    long generation;
    /** The generation a run has already started for; a second run of it stops at once. */
    long started;
    /** The generation whose finished run has claimed {@link #promise}; a newer edit needs a new one. */
    long claimed;
    /** The newest generation published; guarded by the slot itself, so publications never go back in time. */
    long published;
    ScheduledFuture<?> timer;
    long lastEdit = Long.MIN_VALUE / 2;
    CompletableFuture<AnalysisResult> promise = new CompletableFuture<>();
    AnalysisResult last;
  }

  /** {@code analyzer} checks one version (see {@link Analyzer#analyze}); {@code onResult} publishes a fresh result. */
  public AnalysisScheduler(Function<Document, AnalysisResult> analyzer, Duration delay, Consumer<AnalysisResult> onResult) {
    this.analyzer = analyzer;
    this.delay = delay;
    this.onResult = onResult;
    this.timers = Executors.newSingleThreadScheduledExecutor(daemon("skerry-debounce", 0));
    this.workers = Executors.newFixedThreadPool(2, daemon("skerry-analysis", 32L << 20));
  }

  private static java.util.concurrent.ThreadFactory daemon(String name, long stack) {
    AtomicInteger count = new AtomicInteger();
    return r -> {
      Thread t = new Thread(null, r, name + "-" + count.incrementAndGet(), stack);
      t.setDaemon(true);
      return t;
    };
  }

  /** A new version of a document: check it after the delay, and re-check open files that include it. */
  public synchronized void update(Document document) {
    if (closed) {
      return;
    }
    schedule(slots.computeIfAbsent(document.uri(), k -> new Slot()), document);
    if (document.path() == null) {
      return;
    }
    for (Slot other : slots.values()) {
      if (other.document != document && other.last != null && other.last.filesRead().contains(document.path())) {
        schedule(other, other.document);
      }
    }
  }

  private void schedule(Slot slot, Document document) {
    slot.document = document;
    if (slot.promise.isDone() || slot.claimed == slot.generation) {
      slot.promise = new CompletableFuture<>();
    }
    long generation = ++slot.generation;
    if (slot.timer != null) {
      slot.timer.cancel(false);
    }
    long now = System.nanoTime();
    boolean quiet = now - slot.lastEdit >= delay.toNanos();
    slot.lastEdit = now;
    slot.timer = timers.schedule(() -> workers.execute(() -> run(document, generation)), quiet ? 0 : delay.toMillis(),
        TimeUnit.MILLISECONDS);
  }

  public synchronized void close(String uri) {
    Slot slot = slots.remove(uri);
    if (slot != null) {
      if (slot.timer != null) {
        slot.timer.cancel(false);
      }
      slot.promise.complete(null);
    }
  }

  /**
   * The analysis of the latest version of a document, starting it at once if it is still waiting
   * for its timer; completes with null for a document that is not open.
   */
  public synchronized CompletableFuture<AnalysisResult> current(String uri) {
    Slot slot = uri == null ? null : slots.get(uri);
    if (slot == null) {
      return CompletableFuture.completedFuture(null);
    }
    if (!slot.promise.isDone() && slot.started != slot.generation) {
      if (slot.timer != null) {
        slot.timer.cancel(false);
      }
      Document document = slot.document;
      long generation = slot.generation;
      workers.execute(() -> run(document, generation));
    }
    return slot.promise;
  }

  /** The newest finished analysis of a document, possibly of an older version; null if none yet. */
  public synchronized AnalysisResult last(String uri) {
    Slot slot = uri == null ? null : slots.get(uri);
    return slot == null ? null : slot.last;
  }

  private void run(Document document, long generation) {
    synchronized (this) {
      Slot slot = slots.get(document.uri());
      if (slot == null || slot.generation != generation) {
        discarded.incrementAndGet();
        return;
      }
      if (slot.started == generation) {
        return;
      }
      slot.started = generation;
    }
    runs.incrementAndGet();
    AnalysisResult result;
    try {
      result = analyzer.apply(document);
    } catch (RuntimeException | Error e) {
      failed(document, generation, e);
      throw e;
    }
    CompletableFuture<AnalysisResult> promise;
    Slot slot;
    synchronized (this) {
      slot = slots.get(document.uri());
      if (slot == null || slot.generation != generation) {
        discarded.incrementAndGet();
        return;
      }
      slot.last = result;
      slot.claimed = generation;
      promise = slot.promise;
    }
    synchronized (slot) {
      if (generation > slot.published) {
        slot.published = generation;
        try {
          onResult.accept(result);
        } catch (RuntimeException e) {
          System.err.println("skerry-lsp: publishing the analysis of " + document.uri() + " failed: " + e);
        }
      }
    }
    promise.complete(result);
  }

  /** Fails the waiting requests of a run that threw, so none of them hangs. */
  private void failed(Document document, long generation, Throwable e) {
    CompletableFuture<AnalysisResult> promise;
    synchronized (this) {
      Slot slot = slots.get(document.uri());
      if (slot == null || slot.generation != generation) {
        return;
      }
      slot.claimed = generation;
      promise = slot.promise;
    }
    promise.completeExceptionally(new IllegalStateException("checking " + document.uri() + " failed: " + e, e));
  }

  /** Analyses run to the end (published or not). */
  public long runs() {
    return runs.get();
  }

  /** Analyses thrown away because a newer edit arrived. */
  public long discarded() {
    return discarded.get();
  }

  @Override
  public void close() {
    timers.shutdownNow();
    // No interrupt: a run that is publishing finishes its message; queued runs find no slot and stop.
    workers.shutdown();
    List<Slot> open;
    synchronized (this) {
      closed = true;
      open = List.copyOf(slots.values());
      slots.clear();
    }
    for (Slot s : open) {
      s.promise.complete(null);
    }
  }
}
