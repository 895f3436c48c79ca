package dev.skerry.compiler.milp;

import java.util.Arrays;

/**
 * A set of strings for checking that the names of a model are unique. A {@code HashSet} spends a
 * 32-byte node on each name; with a million rows those nodes were tens of megabytes of live objects
 * for the collector to copy, and following them from the table was the largest single cost of
 * lowering and writing a large model. Here the names sit in one array in the order they came, and
 * the table is one array of longs, each a name's hash code beside its position (open addressing,
 * linear probing): adding a new name reads one table entry, or a few neighbours, and compares
 * strings only when hash codes agree.
 */
public final class NameSet {
  private static final int MIN_TABLE = 16;

  /** {@code hash << 32 | (position + 1)}; 0 marks an empty slot. */
  private long[] table;

  private String[] names;
  private int size;
  private int shift;

  /** A set sized for about {@code expected} names (it grows as needed). */
  public NameSet(int expected) {
    int capacity = MIN_TABLE;
    while (capacity < 2L * expected && capacity < (1 << 30)) {
      capacity <<= 1;
    }
    allocate(capacity);
    names = new String[Math.max(8, expected)];
  }

  public NameSet() {
    this(8);
  }

  public int size() {
    return size;
  }

  /** Adds {@code name}; false (and no change) when it is already in the set. */
  public boolean add(String name) {
    int h = name.hashCode();
    int mask = table.length - 1;
    for (int i = slot(h); ; i = (i + 1) & mask) {
      long there = table[i];
      if (there == 0) {
        if (size == names.length) {
          names = Arrays.copyOf(names, size * 2);
        }
        names[size] = name;
        size++;
        table[i] = ((long) h << 32) | size;
        if (size > table.length >>> 1) {
          grow();
        }
        return true;
      }
      if ((int) (there >>> 32) == h && names[(int) there - 1].equals(name)) {
        return false;
      }
    }
  }

  public boolean contains(String name) {
    int h = name.hashCode();
    int mask = table.length - 1;
    for (int i = slot(h); ; i = (i + 1) & mask) {
      long there = table[i];
      if (there == 0) {
        return false;
      }
      if ((int) (there >>> 32) == h && names[(int) there - 1].equals(name)) {
        return true;
      }
    }
  }

  /** Fibonacci hashing: the top bits of hash × 2^32/φ, so similar names spread over the table. */
  private int slot(int h) {
    return (h * 0x9E3779B9) >>> shift;
  }

  private void allocate(int capacity) {
    table = new long[capacity];
    shift = 32 - Integer.numberOfTrailingZeros(capacity);
  }

  private void grow() {
    long[] old = table;
    allocate(old.length << 1);
    int mask = table.length - 1;
    for (long entry : old) {
      if (entry != 0) {
        int i = slot((int) (entry >>> 32));
        while (table[i] != 0) {
          i = (i + 1) & mask;
        }
        table[i] = entry;
      }
    }
  }
}
