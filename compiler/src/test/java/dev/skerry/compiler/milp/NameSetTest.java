package dev.skerry.compiler.milp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

class NameSetTest {
  @Test
  void addsOnceAndFindsWhatItHolds() {
    NameSet set = new NameSet();
    assertTrue(set.add("px_0"));
    assertFalse(set.add("px_0"));
    assertFalse(set.add(new String("px_0")), "equal strings, not only the same object");
    assertTrue(set.contains("px_0"));
    assertFalse(set.contains("px_1"));
    assertEquals(1, set.size());
  }

  @Test
  void tellsApartNamesWithTheSameHashCode() {
    // "Aa" and "BB" share a hash code, as do their concatenations.
    assertEquals("Aa".hashCode(), "BB".hashCode());
    NameSet set = new NameSet();
    for (String s : new String[] {"Aa", "BB", "AaAa", "AaBB", "BBAa", "BBBB"}) {
      assertTrue(set.add(s), s);
    }
    for (String s : new String[] {"Aa", "BB", "AaAa", "AaBB", "BBAa", "BBBB"}) {
      assertFalse(set.add(s), s);
      assertTrue(set.contains(s), s);
    }
    assertEquals(6, set.size());
  }

  @Test
  void hashCodeZeroIsAName() {
    assertEquals(0, "".hashCode());
    NameSet set = new NameSet();
    assertFalse(set.contains(""));
    assertTrue(set.add(""));
    assertTrue(set.contains(""));
    assertFalse(set.add(""));
  }

  @Test
  void agreesWithHashSetWhileGrowing() {
    Random random = new Random(3);
    NameSet set = new NameSet(4);
    Set<String> reference = new HashSet<>();
    for (int i = 0; i < 200_000; i++) {
      String name = "r" + random.nextInt(120_000);
      assertEquals(reference.add(name), set.add(name), name);
    }
    assertEquals(reference.size(), set.size());
    for (int i = 0; i < 130_000; i++) {
      String name = "r" + i;
      assertEquals(reference.contains(name), set.contains(name), name);
    }
  }
}
