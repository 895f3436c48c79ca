package dev.skerry.lsp.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.check.SymbolTable;
import dev.skerry.lsp.document.Document;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

@Timeout(30)
class AnalysisSchedulerTest {
  private static final String URI = "untitled:a.skerry";

  private static AnalysisResult empty(Document d) {
    return new AnalysisResult(d, new CheckResult(List.of(new ScenarioFile(d.source(), List.of())), new SymbolTable(),
        null, List.of()), Set.of(), null);
  }

  @Test
  void aRunOvertakenByAnEditIsNeverPublished() throws Exception {
    CountDownLatch firstStarted = new CountDownLatch(1);
    CountDownLatch releaseFirst = new CountDownLatch(1);
    Function<Document, AnalysisResult> slowFirst = d -> {
      if (d.version() == 1) {
        firstStarted.countDown();
        await(releaseFirst);
      }
      return empty(d);
    };
    List<Integer> published = new CopyOnWriteArrayList<>();
    try (AnalysisScheduler s = new AnalysisScheduler(slowFirst, Duration.ofMillis(50), r -> published.add(r.document().version()))) {
      Document v1 = new Document(URI, 1, "a");
      s.update(v1);
      assertTrue(firstStarted.await(5, TimeUnit.SECONDS), "an edit after a quiet spell starts at once");
      s.update(v1.replace(2, "ab"));
      releaseFirst.countDown();
      assertEquals(2, s.current(URI).get(5, TimeUnit.SECONDS).document().version());
      long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
      while (s.discarded() < 1 && System.nanoTime() < deadline) {
        Thread.sleep(5);
      }
      assertEquals(1, s.discarded(), "the overtaken run finished and was thrown away");
      assertEquals(List.of(2), published);
    }
  }

  @Test
  void anEditArrivingWhileAResultIsPublishedIsCheckedAndAnsweredToo() throws Exception {
    CountDownLatch publishing = new CountDownLatch(1);
    CountDownLatch release = new CountDownLatch(1);
    List<Integer> published = new CopyOnWriteArrayList<>();
    try (AnalysisScheduler s = new AnalysisScheduler(AnalysisSchedulerTest::empty, Duration.ofMillis(10), r -> {
      if (r.document().version() == 1) {
        publishing.countDown();
        await(release);
      }
      published.add(r.document().version());
    })) {
      Document v1 = new Document(URI, 1, "a");
      s.update(v1);
      assertTrue(publishing.await(5, TimeUnit.SECONDS));
      s.update(v1.replace(2, "ab"));
      release.countDown();
      assertEquals(2, s.current(URI).get(5, TimeUnit.SECONDS).document().version(), "a request after the edit sees it");
      assertEquals(List.of(1, 2), published);
    }
  }

  @Test
  void aBurstOfEditsIsCheckedOnceAfterItsLastEdit() throws Exception {
    List<Integer> checked = new CopyOnWriteArrayList<>();
    try (AnalysisScheduler s = new AnalysisScheduler(d -> {
      checked.add(d.version());
      return empty(d);
    }, Duration.ofMillis(300), r -> { })) {
      Document d = new Document(URI, 1, "");
      s.update(d);
      s.current(URI).get(5, TimeUnit.SECONDS);
      for (int v = 2; v <= 6; v++) {
        s.update(d.replace(v, "x".repeat(v)));
      }
      Thread.sleep(100);
      assertEquals(List.of(1), checked, "the burst is still waiting for its timer");
      assertEquals(6, s.current(URI).get(5, TimeUnit.SECONDS).document().version(), "a request skips the timer");
      assertEquals(List.of(1, 6), checked);
    }
  }

  @Test
  void aCheckThatThrowsFailsItsWaitersAndTheNextEditRecovers() throws Exception {
    try (AnalysisScheduler s = new AnalysisScheduler(d -> {
      if (d.text().contains("boom")) {
        throw new AssertionError("the checker broke");
      }
      return empty(d);
    }, Duration.ofMillis(10), r -> { })) {
      Document d = new Document(URI, 1, "boom");
      s.update(d);
      ExecutionException e = assertThrows(ExecutionException.class, () -> s.current(URI).get(5, TimeUnit.SECONDS));
      assertTrue(e.getCause().getMessage().contains("the checker broke"), e.getCause().getMessage());
      assertThrows(ExecutionException.class, () -> s.current(URI).get(5, TimeUnit.SECONDS), "still failed, not hanging");
      s.update(d.replace(2, "fine"));
      assertEquals(2, s.current(URI).get(5, TimeUnit.SECONDS).document().version());
    }
  }

  @Test
  void closedDocumentsAnswerNull() throws Exception {
    try (AnalysisScheduler s = new AnalysisScheduler(AnalysisSchedulerTest::empty, Duration.ofMillis(10), r -> { })) {
      assertNull(s.current("untitled:never").get(1, TimeUnit.SECONDS));
      s.update(new Document(URI, 1, ""));
      s.close(URI);
      assertNull(s.current(URI).get(1, TimeUnit.SECONDS));
    }
  }

  private static void await(CountDownLatch latch) {
    try {
      latch.await(10, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }
}
