package dev.skerry.compiler.syntax;

import dev.skerry.compiler.ast.Decl;
import dev.skerry.compiler.ast.Expr;
import dev.skerry.compiler.ast.Name;
import dev.skerry.compiler.ast.PlanProp;
import dev.skerry.compiler.ast.PointNode;
import dev.skerry.compiler.ast.ScenarioFile;
import dev.skerry.compiler.ast.ShapeNode;
import dev.skerry.compiler.ast.VehicleProp;
import dev.skerry.compiler.diag.Code;
import dev.skerry.compiler.diag.Diagnostics;
import dev.skerry.compiler.source.SourceFile;
import dev.skerry.compiler.source.SourceRange;
import dev.skerry.grammar.SkerryParser;
import dev.skerry.grammar.SkerryParser.*;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.tree.TerminalNode;

/**
 * Builds the AST from ANTLR's parse tree, one method per grammar rule. After a syntax error the
 * tree may lack pieces; a declaration or property with a missing piece is dropped (its error is
 * already reported) and the rest of the file is kept.
 */
final class AstBuilder {
  private final SourceFile source;
  private final Offsets offsets;
  private final Diagnostics sink;

  AstBuilder(SourceFile source, Offsets offsets, Diagnostics sink) {
    this.source = source;
    this.offsets = offsets;
    this.sink = sink;
  }

  ScenarioFile file(FileContext ctx) {
    List<Decl> decls = new ArrayList<>();
    if (ctx.header() != null) {
      add(decls, header(ctx.header()));
    }
    for (StatementContext s : ctx.statement()) {
      add(decls, statement(s));
    }
    return new ScenarioFile(source, decls);
  }

  private static void add(List<Decl> decls, Decl decl) {
    if (decl != null) {
      decls.add(decl);
    }
  }

  private Decl header(HeaderContext ctx) {
    Name name = name(ctx.name());
    return name == null ? null : new Decl.Header(name, range(ctx));
  }

  private Decl statement(StatementContext ctx) {
    if (ctx.unitsDecl() != null) {
      return unitsDecl(ctx.unitsDecl());
    } else if (ctx.constDecl() != null) {
      return constDecl(ctx.constDecl());
    } else if (ctx.includeDecl() != null) {
      return includeDecl(ctx.includeDecl());
    } else if (ctx.vehicleDecl() != null) {
      return vehicleDecl(ctx.vehicleDecl());
    } else if (ctx.areaDecl() != null) {
      return areaDecl(ctx.areaDecl());
    } else if (ctx.zoneDecl() != null) {
      return zoneDecl(ctx.zoneDecl());
    } else if (ctx.targetDecl() != null) {
      return targetDecl(ctx.targetDecl());
    } else if (ctx.waypointDecl() != null) {
      return waypointDecl(ctx.waypointDecl());
    } else if (ctx.planDecl() != null) {
      return planDecl(ctx.planDecl());
    }
    return null;
  }

  private Decl unitsDecl(UnitsDeclContext ctx) {
    List<Name> units = new ArrayList<>();
    for (UnitRefContext u : ctx.unitRef()) {
      Name unit = unitRef(u);
      if (unit != null) {
        units.add(unit);
      }
    }
    return units.isEmpty() ? null : new Decl.UnitsDecl(units, range(ctx));
  }

  private Decl constDecl(ConstDeclContext ctx) {
    Name name = name(ctx.name());
    Expr value = expr(ctx.expr());
    return name == null || value == null ? null : new Decl.ConstDecl(name, value, range(ctx));
  }

  private Decl includeDecl(IncludeDeclContext ctx) {
    TerminalNode string = ctx.STRING();
    if (string == null || string.getSymbol().getTokenIndex() < 0) {
      return null;
    }
    String quoted = string.getText();
    String path = quoted.length() >= 2 ? quoted.substring(1, quoted.length() - 1) : "";
    return new Decl.IncludeDecl(path, offsets.range(string), range(ctx));
  }

  private Decl vehicleDecl(VehicleDeclContext ctx) {
    Name name = name(ctx.name());
    if (name == null) {
      return null;
    }
    List<VehicleProp> props = new ArrayList<>();
    for (VehicleItemContext item : ctx.vehicleItem()) {
      VehicleProp prop = vehicleItem(item);
      if (prop != null) {
        props.add(prop);
      }
    }
    return new Decl.VehicleDecl(name, props, range(ctx));
  }

  private VehicleProp vehicleItem(VehicleItemContext ctx) {
    SourceRange r = range(ctx);
    if (ctx instanceof DynamicsItemContext c) {
      Name model = name(c.name());
      return model == null ? null : new VehicleProp.Dynamics(model, r);
    } else if (ctx instanceof StartItemContext c) {
      PointNode p = point(c.point());
      if (p == null) {
        return null;
      }
      VehicleProp.Motion motion = null;
      if (c.startMotion() != null) {
        motion = startMotion(c.startMotion());
        if (motion == null) {
          return null;
        }
      }
      return new VehicleProp.Start(p, motion, r);
    } else if (ctx instanceof SpeedItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new VehicleProp.Speed(e, r);
    } else if (ctx instanceof AccelItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new VehicleProp.Accel(e, r);
    } else if (ctx instanceof RadiusItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new VehicleProp.Radius(e, r);
    } else if (ctx instanceof SidesItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new VehicleProp.Sides(e, r);
    } else if (ctx instanceof ClimbItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new VehicleProp.Climb(e, r);
    } else if (ctx instanceof ClimbAccelItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new VehicleProp.ClimbAccel(e, r);
    } else if (ctx instanceof AltitudeItemContext c) {
      ShapeNode.AltitudeNode span = altitudeRange(c.altitudeRange());
      return span == null ? null : new VehicleProp.Altitude(span, r);
    } else if (ctx instanceof VehicleTargetItemContext c) {
      Name target = name(c.name());
      return target == null ? null : new VehicleProp.TargetRef(target, r);
    }
    return null;
  }

  private ShapeNode.AltitudeNode altitudeRange(AltitudeRangeContext ctx) {
    if (ctx == null || ctx.getChildCount() == 0 || ctx.expr().size() < 2) {
      return null;
    }
    Expr low = expr(ctx.expr(0));
    Expr high = expr(ctx.expr(1));
    return low == null || high == null ? null : new ShapeNode.AltitudeNode(low, high, range(ctx));
  }

  private VehicleProp.Motion startMotion(StartMotionContext ctx) {
    if (ctx instanceof AtRestContext c) {
      return c.REST() == null ? null : new VehicleProp.Motion.AtRest(range(c));
    } else if (ctx instanceof VelocityVectorContext c) {
      PointNode v = point(c.point());
      return v == null ? null : new VehicleProp.Motion.VelocityVector(v);
    } else if (ctx instanceof SpeedHeadingContext c) {
      Expr speed = expr(c.expr(0));
      Expr heading = c.expr().size() > 1 ? expr(c.expr(1)) : null;
      return speed == null || heading == null ? null : new VehicleProp.Motion.SpeedHeading(speed, heading);
    }
    return null;
  }

  private Decl areaDecl(AreaDeclContext ctx) {
    Name name = name(ctx.name());
    ShapeNode shape = shape(ctx.shape());
    return name == null || shape == null ? null : new Decl.AreaDecl(name, shape, range(ctx));
  }

  private Decl zoneDecl(ZoneDeclContext ctx) {
    Name name = name(ctx.name());
    ShapeNode shape = shape(ctx.shape());
    return name == null || shape == null ? null : new Decl.ZoneDecl(name, shape, range(ctx));
  }

  private Decl targetDecl(TargetDeclContext ctx) {
    Name name = name(ctx.name());
    ShapeNode shape = targetShape(ctx.targetShape());
    boolean atRest = ctx.arrival() != null && ctx.arrival().REST() != null;
    return name == null || shape == null ? null : new Decl.TargetDecl(name, shape, atRest, range(ctx));
  }

  private ShapeNode targetShape(TargetShapeContext ctx) {
    if (ctx instanceof TargetRegionContext c) {
      return shape(c.shape());
    } else if (ctx instanceof TargetPointContext c) {
      PointNode p = point(c.point());
      Expr tolerance = expr(c.expr());
      return p == null || tolerance == null ? null : new ShapeNode.PointWithin(p, tolerance, range(c));
    }
    return null;
  }

  private Decl waypointDecl(WaypointDeclContext ctx) {
    Name name = name(ctx.name());
    PointNode p = point(ctx.point());
    Expr tolerance = expr(ctx.expr());
    return name == null || p == null || tolerance == null
        ? null
        : new Decl.WaypointDecl(name, p, tolerance, range(ctx));
  }

  private ShapeNode shape(ShapeContext ctx) {
    if (ctx instanceof BoxShapeContext c) {
      if (c.point().size() < 2) {
        return null;
      }
      PointNode from = point(c.point(0));
      PointNode to = point(c.point(1));
      ShapeNode.AltitudeNode altitude = altitudeRange(c.altitudeRange());
      if (from == null || to == null || (c.altitudeRange() != null && altitude == null)) {
        return null;
      }
      return new ShapeNode.BoxNode(from, to, altitude, range(c));
    } else if (ctx instanceof PolygonShapeContext c) {
      List<PointNode> corners = new ArrayList<>();
      for (PointContext p : c.point()) {
        PointNode corner = point(p);
        if (corner == null) {
          return null;
        }
        corners.add(corner);
      }
      ShapeNode.AltitudeNode altitude = altitudeRange(c.altitudeRange());
      if (corners.isEmpty() || (c.altitudeRange() != null && altitude == null)) {
        return null;
      }
      return new ShapeNode.PolygonNode(corners, altitude, range(c));
    }
    return null;
  }

  private Decl planDecl(PlanDeclContext ctx) {
    List<PlanProp> props = new ArrayList<>();
    for (PlanItemContext item : ctx.planItem()) {
      PlanProp prop = planItem(item);
      if (prop != null) {
        props.add(prop);
      }
    }
    return new Decl.PlanDecl(props, range(ctx));
  }

  private PlanProp planItem(PlanItemContext ctx) {
    SourceRange r = range(ctx);
    if (ctx instanceof StepItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new PlanProp.Step(e, r);
    } else if (ctx instanceof HorizonItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new PlanProp.Horizon(e, r);
    } else if (ctx instanceof MinimizeItemContext c) {
      List<PlanProp.Term> terms = new ArrayList<>();
      for (ObjectiveTermContext t : c.objectiveTerm()) {
        String what = t.TIME() != null ? "time" : t.FUEL() != null ? "fuel" : null;
        if (what == null) {
          return null;
        }
        Expr weight = t.simpleValue() == null ? null : simpleValue(t.simpleValue());
        if (t.simpleValue() != null && weight == null) {
          return null;
        }
        terms.add(new PlanProp.Term(weight, what, t.LATEST() != null, range(t)));
      }
      return terms.isEmpty() ? null : new PlanProp.Minimize(terms, r);
    } else if (ctx instanceof ClustersItemContext c) {
      Expr count = c.simpleValue() == null ? null : simpleValue(c.simpleValue());
      return count == null ? null : new PlanProp.Clusters(count, name(c.name()), r);
    } else if (ctx instanceof ClosedLoopItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new PlanProp.ClosedLoop(e, r);
    } else if (ctx instanceof SolverItemContext c) {
      return solverItem(c, r);
    } else if (ctx instanceof GuardItemContext c) {
      return c.onOff() == null || c.onOff().getChildCount() == 0 ? null : new PlanProp.Guard(c.onOff().ON() != null, r);
    } else if (ctx instanceof PruningItemContext c) {
      return c.onOff() == null || c.onOff().getChildCount() == 0
          ? null
          : new PlanProp.Pruning(c.onOff().ON() != null, r);
    } else if (ctx instanceof PlanSidesItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new PlanProp.Sides(e, r);
    } else if (ctx instanceof DimensionsItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new PlanProp.Dimensions(e, r);
    } else if (ctx instanceof SeparationItemContext c) {
      Expr e = expr(c.expr());
      return e == null ? null : new PlanProp.Separation(e, r);
    }
    return null;
  }

  private PlanProp solverItem(SolverItemContext c, SourceRange r) {
    Name engine = name(c.name());
    if (engine == null) {
      return null;
    }
    Expr timeLimit = null;
    Expr gap = null;
    Expr threads = null;
    for (SolverOptionContext option : c.solverOption()) {
      if (option instanceof TimeLimitOptionContext o) {
        timeLimit = once(timeLimit, expr(o.expr()), o, "time_limit");
      } else if (option instanceof GapOptionContext o) {
        gap = once(gap, expr(o.expr()), o, "gap");
      } else if (option instanceof ThreadsOptionContext o) {
        threads = once(threads, expr(o.expr()), o, "threads");
      }
    }
    return new PlanProp.Solver(engine, timeLimit, gap, threads, r);
  }

  private Expr once(Expr earlier, Expr value, ParserRuleContext ctx, String keyword) {
    if (earlier != null) {
      sink.report(Code.DUPLICATE_PROPERTY, range(ctx), "`" + keyword + "` is given twice for this solver");
      return earlier;
    }
    return value;
  }

  private Expr simpleValue(SimpleValueContext ctx) {
    if (ctx.NUMBER() != null) {
      Token t = ctx.NUMBER().getSymbol();
      Double value = number(t);
      return value == null ? null : new Expr.Number(value, null, offsets.range(t));
    } else if (ctx.name() != null) {
      Name n = name(ctx.name());
      return n == null ? null : new Expr.Ref(n);
    } else if (ctx.expr() != null) {
      return expr(ctx.expr());
    }
    return null;
  }

  private PointNode point(PointContext ctx) {
    if (ctx == null || ctx.getChildCount() == 0 || ctx.exception != null) {
      return null;
    }
    List<Expr> coordinates = new ArrayList<>();
    for (ExprContext e : ctx.expr()) {
      Expr coordinate = expr(e);
      if (coordinate == null) {
        return null;
      }
      coordinates.add(coordinate);
    }
    Name unit = ctx.unitRef() == null ? null : unitRef(ctx.unitRef());
    return coordinates.isEmpty() ? null : new PointNode(coordinates, unit, range(ctx));
  }

  /**
   * Builds an expression. Chains of binary operators are walked down their left spine in a loop,
   * so `1 + 1 + ... + 1` of any length does not exhaust the stack.
   */
  private Expr expr(ExprContext ctx) {
    if (ctx == null || ctx.getChildCount() == 0) {
      return null;
    }
    Deque<ExprContext> spine = new ArrayDeque<>();
    ExprContext left = ctx;
    while (left instanceof MulDivContext || left instanceof AddSubContext) {
      spine.push(left);
      left = left.getChild(0) instanceof ExprContext e ? e : null;
      if (left == null) {
        return null;
      }
    }
    Expr result = leaf(left);
    while (result != null && !spine.isEmpty()) {
      ExprContext op = spine.pop();
      ExprContext rightCtx = op.getChildCount() > 2 && op.getChild(2) instanceof ExprContext e ? e : null;
      Expr right = expr(rightCtx);
      if (right == null) {
        return null;
      }
      Token operator = op instanceof MulDivContext m ? m.op : ((AddSubContext) op).op;
      if (operator == null) {
        return null;
      }
      result = new Expr.Binary(operator.getText().charAt(0), result, right, range(op));
    }
    return result;
  }

  private Expr leaf(ExprContext ctx) {
    if (ctx instanceof NegateContext c) {
      Expr operand = expr(c.expr());
      return operand == null ? null : new Expr.Negate(operand, range(c));
    } else if (ctx instanceof ParensContext c) {
      return expr(c.expr());
    } else if (ctx instanceof QuantityContext c) {
      Double value = number(c.NUMBER().getSymbol());
      if (value == null) {
        return null;
      }
      Name unit = c.unitRef() == null ? null : unitRef(c.unitRef());
      return new Expr.Number(value, unit, range(c));
    } else if (ctx instanceof ConstRefContext c) {
      Name n = name(c.name());
      return n == null ? null : new Expr.Ref(n);
    }
    return null;
  }

  private Double number(Token token) {
    if (token == null || token.getTokenIndex() < 0) {
      return null;
    }
    double value = Double.parseDouble(token.getText());
    if (Double.isInfinite(value)) {
      sink.report(Code.VALUE_OUT_OF_RANGE, offsets.range(token), "this number is too large to represent");
      return null;
    }
    return value;
  }

  private Name unitRef(UnitRefContext ctx) {
    if (ctx == null || ctx.getStart() == null || ctx.getChildCount() == 0) {
      return null;
    }
    Token t = ctx.getStart();
    return new Name(t.getText(), offsets.range(t));
  }

  private Name name(NameContext ctx) {
    if (ctx == null || ctx.getChildCount() == 0 || ctx.getStart() == null || ctx.getStart().getTokenIndex() < 0) {
      return null;
    }
    Token t = ctx.getStart();
    if (t.getType() == SkerryParser.EOF) {
      return null;
    }
    return new Name(t.getText(), offsets.range(t));
  }

  private SourceRange range(ParserRuleContext ctx) {
    return offsets.range(ctx.getStart(), ctx.getStop());
  }
}
