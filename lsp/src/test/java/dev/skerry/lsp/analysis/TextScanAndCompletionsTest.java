package dev.skerry.lsp.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class TextScanAndCompletionsTest {
  @Test
  void bracesInsideCommentsAndStringsDoNotCount() {
    String text = "vehicle v { # } not a close\n  /* { */ start \"}\" \n}\nplan {";
    TextScan scan = TextScan.of(text);
    assertEquals(1, scan.braces().size());
    assertEquals(text.indexOf('{'), scan.braces().get(0).start());
    assertEquals(text.lastIndexOf('}'), scan.braces().get(0).end());
    assertEquals(List.of(text.lastIndexOf('{')), TextScan.at(text, text.length()).openBraces());
  }

  @Test
  void knowsWhenTheCursorIsInACommentOrString() {
    String text = "zone a box (0, 0) to (1, 1) // note\ninclude \"sh\"\n";
    assertTrue(TextScan.at(text, text.indexOf("note") + 2).inCommentOrString());
    assertTrue(TextScan.at(text, text.indexOf("sh") + 1).inCommentOrString());
    assertFalse(TextScan.at(text, text.indexOf("box")).inCommentOrString());
    assertFalse(TextScan.at(text, text.length()).inCommentOrString());
  }

  private static List<String> labels(String marked) {
    int at = marked.indexOf('|');
    String text = marked.substring(0, at) + marked.substring(at + 1);
    return Completions.at(text, at, null).stream().map(Completions.Item::label).toList();
  }

  @Test
  void followWordsDependOnTheLineSoFar() {
    assertEquals(List.of("at", "velocity", "moving"), labels("vehicle v {\n  start (1, 2) |\n}"));
    assertEquals(List.of("rest"), labels("vehicle v {\n  start (1, 2) at |\n}"));
    assertEquals(List.of("to"), labels("zone z box (1, 2) |"));
    assertEquals(List.of("within"), labels("target t point (1, 2) |"));
    assertEquals(List.of("on", "off"), labels("plan {\n  guard |\n}"));
    assertEquals(List.of("time", "fuel", "latest"), labels("plan {\n  minimize time + 0.1 |\n}"), "a weight has no unit");
    assertEquals(List.of("time"), labels("plan {\n  minimize latest |\n}"));
    assertEquals(List.of(), labels("plan {\n  horizon 4|\n}"), "a horizon is a count: no units");
    assertTrue(labels("vehicle v {\n  radius 4 |\n}").contains("cm"));
  }

  @Test
  void followWordsForFleetsAndAltitude() {
    assertEquals(List.of("max", "accel"), labels("vehicle v {\n  climb |\n}"));
    assertEquals(List.of("max"), labels("vehicle v {\n  climb accel |\n}"));
    assertEquals(List.of("to"), labels("vehicle v {\n  altitude lo |\n}"));
    assertEquals(List.of("altitude"), labels("zone z box (1, 2) to (3, 4) |"));
    assertEquals(List.of("altitude"), labels("zone z polygon (1, 2) (3, 4) (0, 5) |"));
    assertEquals(List.of("to"), labels("zone z polygon (1, 2) (3, 4) (0, 5) altitude lo |"));
    assertEquals(List.of("at", "altitude"), labels("target t box (1, 2) to (3, 4) |"));
    assertEquals(List.of("at"), labels("target t box (1, 2) to (3, 4) altitude lo to hi |"));
    assertEquals(List.of("2", "3"), labels("plan {\n  dimensions |\n}"));
    assertEquals(List.of(), labels("vehicle v {\n  target |\n}"), "no analysis: no target names");
  }
}
