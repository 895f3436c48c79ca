package dev.skerry.compiler.units;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

/**
 * The units Skerry knows, and the scenario's default units for bare numbers. Factors: the metre
 * and second are SI; 1 km = 1000 m; 1 nautical mile = 1852 m and 1 knot = 1852 m/h (both by
 * international definition, 1929); 1 ft = 0.3048 m (international yard and pound, 1959).
 */
public final class Units {
  private static final Map<String, Unit> SIMPLE = new LinkedHashMap<>();

  static {
    simple("m", Dim.LENGTH, 1);
    simple("km", Dim.LENGTH, 1000);
    simple("cm", Dim.LENGTH, 0.01);
    simple("nmi", Dim.LENGTH, 1852);
    simple("ft", Dim.LENGTH, 0.3048);
    simple("s", Dim.TIME, 1);
    simple("ms", Dim.TIME, 0.001);
    simple("min", Dim.TIME, 60);
    simple("h", Dim.TIME, 3600);
    simple("kn", Dim.SPEED, 1852.0 / 3600.0);
    simple("deg", Dim.ANGLE, Math.PI / 180);
    simple("rad", Dim.ANGLE, 1);
    simple("%", Dim.NONE, 0.01);
  }

  private static void simple(String symbol, Dim dim, double factor) {
    SIMPLE.put(symbol, new Unit(symbol, dim, factor));
  }

  private final Unit length;
  private final Unit time;

  private Units(Unit length, Unit time) {
    this.length = length;
    this.time = time;
  }

  /** Metres and seconds. */
  public static Units si() {
    return new Units(SIMPLE.get("m"), SIMPLE.get("s"));
  }

  /** The same defaults with one default replaced; null when {@code unit} is not a length or time. */
  public Units withDefault(Unit unit) {
    if (unit.dim().equals(Dim.LENGTH)) {
      return new Units(unit, time);
    }
    if (unit.dim().equals(Dim.TIME)) {
      return new Units(length, unit);
    }
    return null;
  }

  public Unit defaultLength() {
    return length;
  }

  public Unit defaultTime() {
    return time;
  }

  /** The factor to SI for a bare number that stands for a quantity of dimension {@code dim}. */
  public double defaultFactor(Dim dim) {
    double angle = dim.angle() == 0 ? 1 : Math.pow(Math.PI / 180, dim.angle());
    return Math.pow(length.toSi(), dim.length()) * Math.pow(time.toSi(), dim.time()) * angle;
  }

  /** Simple symbols, for completion and the docs. */
  public static Set<String> simpleSymbols() {
    return SIMPLE.keySet();
  }

  /** Compound symbols offered in completion and the docs (any `a/b`, `a/b^2` of known units works). */
  public static Set<String> commonCompounds() {
    return Set.of("m/s", "km/h", "ft/s", "m/s^2", "ft/s^2");
  }

  /**
   * Looks up a unit symbol: a simple unit, or a compound {@code num/den}, {@code num/den^p} or
   * {@code num/denP} of simple units. Null when unknown.
   */
  public static Unit lookup(String symbol) {
    Unit simple = SIMPLE.get(symbol);
    if (simple != null) {
      return simple;
    }
    int slash = symbol.indexOf('/');
    if (slash <= 0) {
      return null;
    }
    Unit num = SIMPLE.get(symbol.substring(0, slash));
    String rest = symbol.substring(slash + 1);
    int power = 1;
    int caret = rest.indexOf('^');
    if (caret >= 0) {
      power = rest.charAt(rest.length() - 1) - '0';
      rest = rest.substring(0, caret);
    } else if (!rest.isEmpty() && Character.isDigit(rest.charAt(rest.length() - 1))) {
      power = rest.charAt(rest.length() - 1) - '0';
      rest = rest.substring(0, rest.length() - 1);
    }
    Unit den = SIMPLE.get(rest);
    if (num == null || den == null || power < 1 || power > 3 || symbol.contains("%")) {
      return null;
    }
    Dim dim = num.dim();
    double factor = num.toSi();
    for (int i = 0; i < power; i++) {
      dim = dim.over(den.dim());
      factor /= den.toSi();
    }
    return new Unit(symbol, dim, factor);
  }
}
