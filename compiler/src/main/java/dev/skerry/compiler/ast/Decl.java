package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;
import java.util.List;

/** A top-level declaration. {@code range} covers the whole declaration. */
public sealed interface Decl {
  SourceRange range();

  /** The declared name, or null for unnamed declarations (units, include, plan). */
  default Name name() {
    return null;
  }

  record Header(Name name, SourceRange range) implements Decl {}

  record UnitsDecl(List<Name> units, SourceRange range) implements Decl {
    public UnitsDecl {
      units = List.copyOf(units);
    }
  }

  record ConstDecl(Name name, Expr value, SourceRange range) implements Decl {}

  /** {@code include "path"}; {@code path} is the text between the quotes. */
  record IncludeDecl(String path, SourceRange pathRange, SourceRange range) implements Decl {}

  record VehicleDecl(Name name, List<VehicleProp> props, SourceRange range) implements Decl {
    public VehicleDecl {
      props = List.copyOf(props);
    }
  }

  record AreaDecl(Name name, ShapeNode shape, SourceRange range) implements Decl {}

  record ZoneDecl(Name name, ShapeNode shape, SourceRange range) implements Decl {}

  record TargetDecl(Name name, ShapeNode shape, boolean atRest, SourceRange range) implements Decl {}

  record WaypointDecl(Name name, PointNode point, Expr tolerance, SourceRange range) implements Decl {}

  record PlanDecl(List<PlanProp> props, SourceRange range) implements Decl {
    public PlanDecl {
      props = List.copyOf(props);
    }
  }
}
