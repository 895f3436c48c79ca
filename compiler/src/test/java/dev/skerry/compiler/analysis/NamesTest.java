package dev.skerry.compiler.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class NamesTest {

  @Test
  void sanitisesAndKeepsCollidingNamesApart() {
    Names names = new Names();
    String a = names.tag("zone", "reef north");
    String b = names.tag("zone", "reef_north");
    assertEquals("reef_north", a);
    assertNotEquals(a, b);
    assertTrue(b.matches("[A-Za-z0-9_]+"));
    assertEquals(a, names.tag("zone", "reef north"), "a tag is stable");
    assertNotEquals(names.tag("zone", "x"), names.tag("waypoint", "x"));
  }

  @Test
  void longNamesAreCutAndStillDistinct() {
    Names names = new Names();
    String longName = "hull_".repeat(30);
    String a = names.tag("zone", longName);
    String b = names.tag("zone", longName + "x");
    assertTrue(a.length() <= Names.MAX_TAG && b.length() <= Names.MAX_TAG);
    assertNotEquals(a, b);
  }
}
