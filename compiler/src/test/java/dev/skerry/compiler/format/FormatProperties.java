package dev.skerry.compiler.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.check.CheckResult;
import dev.skerry.compiler.semdiff.ModelView;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * The formatter's promises over the examples and generated scenarios, each laid out with random
 * whitespace and comments: one pass is enough (idempotence), the checked model does not change,
 * and every comment survives, in its place and on its own line or after code as before.
 */
class FormatProperties {
  record Case(Path place, String text) {}

  @Property(tries = 80)
  void formattingTwiceChangesNothing(@ForAll("cases") Case c) {
    String once = Formatter.format(c.text());
    assertEquals(once, Formatter.format(once));
  }

  @Property(tries = 80)
  void formattingKeepsTheMeaning(@ForAll("cases") Case c) {
    CheckResult before = Texts.check(c.place(), c.text());
    CheckResult after = Texts.check(c.place(), Formatter.format(c.text()));
    assertNotNull(before.scenario(), () -> "the case should check cleanly: " + before.diagnostics());
    assertEquals(ModelView.of(before.scenario()), ModelView.of(after.scenario()));
  }

  @Property(tries = 80)
  void everyCommentSurvivesInItsPlace(@ForAll("cases") Case c) {
    String formatted = Formatter.format(c.text());
    List<String> was = new ArrayList<>(Texts.comments(c.text()));
    List<String> now = new ArrayList<>(Texts.comments(formatted));
    Collections.sort(was);
    Collections.sort(now);
    assertEquals(was, now, "the multiset of comments");
    assertEquals(Texts.significant(c.text()), Texts.significant(formatted), "code and comments in order");
    assertEquals(Texts.commentOwnsLine(c.text()), Texts.commentOwnsLine(formatted), "own-line versus trailing");
  }

  @Property(tries = 60)
  void canonicalLayoutHasNoTrailingSpacesOrTabs(@ForAll("cases") Case c) {
    String formatted = Formatter.format(c.text());
    for (String line : formatted.split("\n", -1)) {
      assertTrue(line.equals(line.stripTrailing()) || line.contains("/*") || line.contains("//") || line.contains("#"),
          () -> "trailing blanks in: [" + line + "]");
    }
    assertTrue(formatted.isEmpty() || formatted.endsWith("\n") && !formatted.endsWith("\n\n"), "one final newline");
  }

  @Provide
  Arbitrary<Case> cases() {
    List<Path> examples = Texts.examples();
    Arbitrary<Case> fromExamples = Arbitraries.of(examples).flatMap(p -> Arbitraries.longs()
        .map(seed -> new Case(p, Texts.withNoise(Texts.read(p), seed))));
    Path place = Texts.EXAMPLES.resolve("generated.skerry");
    Arbitrary<Case> generated = Arbitraries.longs().flatMap(shape -> Arbitraries.longs()
        .map(seed -> new Case(place, Texts.withNoise(ScenarioGen.scenario(shape), seed))));
    Arbitrary<Case> plainExamples = Arbitraries.of(examples).map(p -> new Case(p, Texts.read(p)));
    return Arbitraries.frequencyOf(
        net.jqwik.api.Tuple.of(4, fromExamples), net.jqwik.api.Tuple.of(4, generated), net.jqwik.api.Tuple.of(1, plainExamples));
  }
}
