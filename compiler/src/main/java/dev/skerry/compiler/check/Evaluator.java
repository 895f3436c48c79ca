package dev.skerry.compiler.check;

import dev.skerry.compiler.ast.Expr;
import dev.skerry.compiler.ast.Name;
import dev.skerry.compiler.ast.PointNode;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.compiler.units.Dim;
import dev.skerry.compiler.units.Quantity;
import dev.skerry.compiler.units.Unit;
import dev.skerry.compiler.units.Units;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.Map;

/**
 * Evaluates expressions to quantities and converts them to SI where a dimension is expected.
 * Errors are reported once, at the innermost culprit; a failed evaluation returns null and the
 * caller drops the property without a second message.
 */
final class Evaluator {
  private final SymbolTable symbols;
  private final Diagnostics sink;
  private final Map<String, Quantity> constants = new HashMap<>();

  Evaluator(SymbolTable symbols, Diagnostics sink) {
    this.symbols = symbols;
    this.sink = sink;
  }

  void defineConstant(String name, Quantity value) {
    constants.put(name, value);
  }

  Quantity constant(String name) {
    return constants.get(name);
  }

  /** The value of an expression, or null after reporting why there is none. */
  Quantity eval(Expr expr, Units units) {
    Deque<Expr.Binary> spine = new ArrayDeque<>();
    Expr left = expr;
    while (left instanceof Expr.Binary b) {
      spine.push(b);
      left = b.left();
    }
    Quantity result = leaf(left, units);
    while (result != null && !spine.isEmpty()) {
      Expr.Binary b = spine.pop();
      Quantity right = eval(b.right(), units);
      result = right == null ? null : combine(b, result, right, units);
    }
    return result;
  }

  private Quantity leaf(Expr expr, Units units) {
    if (expr instanceof Expr.Number n) {
      return number(n);
    } else if (expr instanceof Expr.Ref r) {
      return reference(r.name());
    } else if (expr instanceof Expr.Negate neg) {
      Quantity q = eval(neg.operand(), units);
      return q == null ? null : new Quantity(-q.value(), q.dim(), q.bare());
    }
    return eval(expr, units);
  }

  private Quantity number(Expr.Number n) {
    if (n.unit() == null) {
      return Quantity.bare(n.value());
    }
    Unit unit = Units.lookup(n.unit().text());
    if (unit == null) {
      sink.report(Code.UNKNOWN_UNIT, n.unit().range(), "unknown unit `" + n.unit().text() + "`; known units: "
          + String.join(", ", Units.simpleSymbols()) + " and quotients such as m/s, km/h, m/s^2");
      return null;
    }
    return Quantity.si(n.value() * unit.toSi(), unit.dim());
  }

  private Quantity reference(Name name) {
    Symbol symbol = symbols.lookup(name.text());
    if (symbol == null) {
      sink.report(Code.UNKNOWN_NAME, name.range(), "no constant named `" + name.text() + "` is declared");
      return null;
    }
    symbols.reference(name, symbol);
    if (symbol.kind() != Symbol.Kind.CONSTANT) {
      sink.report(Code.UNKNOWN_NAME, name.range(),
          "`" + name.text() + "` is a " + symbol.kind().word() + ", not a constant; only constants have values");
      return null;
    }
    Quantity value = constants.get(name.text());
    if (value == null && symbol.name().range().start() > name.range().start()
        && symbol.name().range().source() == name.range().source()) {
      sink.report(Code.UNKNOWN_NAME, name.range(),
          "constant `" + name.text() + "` is used before it is declared; move its `const` line up");
    }
    return value;
  }

  private Quantity combine(Expr.Binary b, Quantity l, Quantity r, Units units) {
    Quantity out;
    switch (b.op()) {
      case '+', '-' -> {
        Dim dim;
        if (l.bare() && r.bare()) {
          double v = b.op() == '+' ? l.value() + r.value() : l.value() - r.value();
          return finite(Quantity.bare(v), b.range());
        } else if (l.bare() || r.bare() || l.dim().equals(r.dim())) {
          dim = l.bare() ? r.dim() : l.dim();
        } else {
          sink.report(Code.UNIT_MISMATCH, b.range(), "cannot " + (b.op() == '+' ? "add " : "subtract ")
              + r.dim().describe() + (b.op() == '+' ? " to " : " from ") + l.dim().describe());
          return null;
        }
        double lv = l.bare() ? l.value() * units.defaultFactor(dim) : l.value();
        double rv = r.bare() ? r.value() * units.defaultFactor(dim) : r.value();
        out = Quantity.si(b.op() == '+' ? lv + rv : lv - rv, dim);
      }
      case '*' -> {
        if (l.bare() && r.bare()) {
          out = Quantity.bare(l.value() * r.value());
        } else {
          out = Quantity.si(l.value() * r.value(), l.bare() ? r.dim() : r.bare() ? l.dim() : l.dim().times(r.dim()));
        }
      }
      default -> {
        if (r.value() == 0) {
          sink.report(Code.DIVISION_BY_ZERO, b.right().range(), "division by zero");
          return null;
        }
        if (l.bare() && r.bare()) {
          out = Quantity.bare(l.value() / r.value());
        } else {
          out = Quantity.si(l.value() / r.value(), r.bare() ? l.dim() : l.bare() ? Dim.NONE.over(r.dim()) : l.dim().over(r.dim()));
        }
      }
    }
    return finite(out, b.range());
  }

  private Quantity finite(Quantity q, SourceRange range) {
    if (!Double.isFinite(q.value())) {
      sink.report(Code.DIVISION_BY_ZERO, range, "the result is too large to represent");
      return null;
    }
    return q;
  }

  /** The SI value of an expression that must have dimension {@code dim}, or null after a report. */
  Double expect(Expr expr, Dim dim, Units units, String what) {
    Quantity q = eval(expr, units);
    if (q == null) {
      return null;
    }
    Double value = q.as(dim, units);
    if (value == null) {
      sink.report(Code.UNIT_MISMATCH, expr.range(),
          what + " must be " + dim.describe() + " such as " + dim.example() + ", not " + q.dim().describe());
    }
    return value;
  }

  /** A whole number in [min, max], or null after a report. */
  Integer expectCount(Expr expr, Units units, String what, int min, int max) {
    Double value = expect(expr, Dim.NONE, units, what);
    if (value == null) {
      return null;
    }
    if (value != Math.rint(value) || value < min || value > max) {
      sink.report(Code.VALUE_OUT_OF_RANGE, expr.range(),
          what + " must be a whole number from " + min + " to " + max + ", not " + Format.number(value));
      return null;
    }
    return (int) Math.rint(value);
  }

  /** A 2-D point whose coordinates have dimension {@code dim}, or null after a report. */
  Vec2 point(PointNode point, Dim dim, Units units, String what) {
    double[] xy = coordinates(point, dim, units, what, 2, 2, null);
    return xy == null ? null : new Vec2(xy[0], xy[1]);
  }

  /**
   * The coordinates of a point, from {@code min} to {@code max} of them, each of dimension {@code
   * dim}, or null after a report. {@code advice} ends the message about a wrong count (may be null).
   */
  double[] coordinates(PointNode point, Dim dim, Units units, String what, int min, int max, String advice) {
    int n = point.coordinates().size();
    if (n < min || n > max) {
      String wanted = min == max ? (min == 2 ? "two coordinates (x, y)" : "three coordinates (x, y, z)")
          : "two or three coordinates";
      sink.report(Code.WRONG_DIMENSION, point.range(),
          what + " needs " + wanted + "; this one has " + n + (advice == null ? "" : advice));
      return null;
    }
    double bareFactor = units.defaultFactor(dim);
    if (point.unit() != null) {
      Unit unit = Units.lookup(point.unit().text());
      if (unit == null) {
        sink.report(Code.UNKNOWN_UNIT, point.unit().range(), "unknown unit `" + point.unit().text() + "`");
        return null;
      }
      if (!unit.dim().equals(dim)) {
        sink.report(Code.UNIT_MISMATCH, point.unit().range(),
            what + " must be " + dim.describe() + " such as " + dim.example() + ", not " + unit.dim().describe());
        return null;
      }
      bareFactor = unit.toSi();
    }
    double[] xy = new double[n];
    for (int i = 0; i < n; i++) {
      Expr e = point.coordinates().get(i);
      Quantity q = eval(e, units);
      if (q == null) {
        return null;
      }
      if (q.bare()) {
        xy[i] = q.value() * bareFactor;
      } else if (q.dim().equals(dim)) {
        xy[i] = q.value();
      } else {
        sink.report(Code.UNIT_MISMATCH, e.range(),
            what + " must be " + dim.describe() + " such as " + dim.example() + ", not " + q.dim().describe());
        return null;
      }
    }
    return xy;
  }
}
