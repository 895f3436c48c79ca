package dev.skerry.compiler.format;

import dev.skerry.grammar.SkerryParser.FileContext;
import dev.skerry.grammar.SkerryParser.NegateContext;
import dev.skerry.grammar.SkerryParser.PlanDeclContext;
import dev.skerry.grammar.SkerryParser.StatementContext;
import dev.skerry.grammar.SkerryParser.VehicleDeclContext;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.tree.ParseTree;

/**
 * The facts about a parse tree that layout needs, keyed by token index: where top-level
 * declarations and block items start, and which minus signs are unary. Collected by one walk with
 * an explicit stack, so long operator chains cannot overflow the call stack.
 */
final class Structure {
  /** Declaration kinds that are laid out as one group; a blank line separates different groups. */
  enum Group {
    PREAMBLE(false),
    CONST(false),
    INCLUDE(false),
    VEHICLE(true),
    AREA(false),
    ZONE(false),
    TARGET(false),
    WAYPOINT(false),
    PLAN(true);

    private final boolean block;

    Group(boolean block) {
      this.block = block;
    }

    /** True when a blank line must separate a declaration of this group from one of {@code next}. */
    boolean separatedFrom(Group next) {
      return this != next || block || next.block;
    }
  }

  private final Map<Integer, Group> declarationStarts = new HashMap<>();
  private final Set<Integer> itemStarts = new HashSet<>();
  private final Set<Integer> unaryMinus = new HashSet<>();

  private Structure() {}

  static Structure of(FileContext file) {
    Structure s = new Structure();
    if (file.header() != null) {
      s.declarationStarts.put(file.header().getStart().getTokenIndex(), Group.PREAMBLE);
    }
    for (StatementContext statement : file.statement()) {
      s.declarationStarts.put(statement.getStart().getTokenIndex(), groupOf(statement));
      if (statement.vehicleDecl() != null) {
        VehicleDeclContext v = statement.vehicleDecl();
        v.vehicleItem().forEach(item -> s.itemStarts.add(item.getStart().getTokenIndex()));
      } else if (statement.planDecl() != null) {
        PlanDeclContext p = statement.planDecl();
        p.planItem().forEach(item -> s.itemStarts.add(item.getStart().getTokenIndex()));
      }
    }
    Deque<ParseTree> stack = new ArrayDeque<>();
    stack.push(file);
    while (!stack.isEmpty()) {
      ParseTree node = stack.pop();
      if (node instanceof NegateContext negate) {
        s.unaryMinus.add(negate.getStart().getTokenIndex());
      }
      if (node instanceof ParserRuleContext) {
        for (int i = 0; i < node.getChildCount(); i++) {
          stack.push(node.getChild(i));
        }
      }
    }
    return s;
  }

  private static Group groupOf(StatementContext s) {
    if (s.unitsDecl() != null) {
      return Group.PREAMBLE;
    } else if (s.constDecl() != null) {
      return Group.CONST;
    } else if (s.includeDecl() != null) {
      return Group.INCLUDE;
    } else if (s.vehicleDecl() != null) {
      return Group.VEHICLE;
    } else if (s.areaDecl() != null) {
      return Group.AREA;
    } else if (s.zoneDecl() != null) {
      return Group.ZONE;
    } else if (s.targetDecl() != null) {
      return Group.TARGET;
    } else if (s.waypointDecl() != null) {
      return Group.WAYPOINT;
    }
    return Group.PLAN;
  }

  /** The group of the declaration that starts at this token, or null when none starts there. */
  Group declarationAt(int tokenIndex) {
    return declarationStarts.get(tokenIndex);
  }

  boolean itemAt(int tokenIndex) {
    return itemStarts.contains(tokenIndex);
  }

  boolean unaryMinusAt(int tokenIndex) {
    return unaryMinus.contains(tokenIndex);
  }
}
