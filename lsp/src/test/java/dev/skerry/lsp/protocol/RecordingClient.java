package dev.skerry.lsp.protocol;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;
import org.eclipse.lsp4j.MessageActionItem;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.ShowMessageRequestParams;
import org.eclipse.lsp4j.services.LanguageClient;

/** A client stub that records every diagnostics publication and lets a test wait for one. */
final class RecordingClient implements LanguageClient {
  private final List<PublishDiagnosticsParams> published = new ArrayList<>();

  @Override
  public synchronized void publishDiagnostics(PublishDiagnosticsParams params) {
    published.add(params);
    notifyAll();
  }

  synchronized List<PublishDiagnosticsParams> publishedFor(String uri) {
    return published.stream().filter(p -> p.getUri().equals(uri)).toList();
  }

  /** Waits for a publication for {@code uri} that matches, failing after a few seconds. */
  synchronized PublishDiagnosticsParams await(String uri, Predicate<PublishDiagnosticsParams> wanted)
      throws InterruptedException {
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
    while (true) {
      for (int i = published.size() - 1; i >= 0; i--) {
        PublishDiagnosticsParams p = published.get(i);
        if (p.getUri().equals(uri) && wanted.test(p)) {
          return p;
        }
      }
      long left = deadline - System.nanoTime();
      if (left <= 0) {
        throw new AssertionError("no matching diagnostics for " + uri + " within 10 s; got " + publishedFor(uri));
      }
      wait(Math.max(1, TimeUnit.NANOSECONDS.toMillis(left)));
    }
  }

  @Override
  public void telemetryEvent(Object object) {
    // Not used by the server.
  }

  @Override
  public void showMessage(MessageParams messageParams) {
    // Not used by the server.
  }

  @Override
  public CompletableFuture<MessageActionItem> showMessageRequest(ShowMessageRequestParams requestParams) {
    return CompletableFuture.completedFuture(null);
  }

  @Override
  public void logMessage(MessageParams message) {
    // Not used by the server.
  }
}
