package dev.skerry.compiler.ast;

import dev.skerry.compiler.source.SourceRange;

/** One line of a vehicle block. {@code range} covers the line from its keyword. */
public sealed interface VehicleProp {
  SourceRange range();

  /** The keyword that starts the line, for messages ("speed given twice"). */
  String keyword();

  record Dynamics(Name model, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "dynamics";
    }
  }

  /** {@code start P}, with velocity as written: null (not given), at rest, a vector, or speed+heading. */
  record Start(PointNode position, Motion motion, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "start";
    }
  }

  record Speed(Expr max, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "speed";
    }
  }

  record Accel(Expr max, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "accel";
    }
  }

  record Radius(Expr value, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "radius";
    }
  }

  record Sides(Expr count, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "sides";
    }
  }

  /** {@code climb max SPEED}: the climb-rate limit of a 3-D vehicle. */
  record Climb(Expr max, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "climb max";
    }
  }

  /** {@code climb accel max ACCEL}: the vertical acceleration limit. */
  record ClimbAccel(Expr max, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "climb accel";
    }
  }

  /** {@code altitude LO to HI}: the vehicle's own altitude limits. */
  record Altitude(ShapeNode.AltitudeNode span, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "altitude";
    }
  }

  /** {@code target NAME}: the target this vehicle must reach. */
  record TargetRef(Name target, SourceRange range) implements VehicleProp {
    public String keyword() {
      return "target";
    }
  }

  /** How the vehicle moves at the start. */
  sealed interface Motion {
    record AtRest(SourceRange range) implements Motion {}

    record VelocityVector(PointNode velocity) implements Motion {}

    record SpeedHeading(Expr speed, Expr heading) implements Motion {}
  }
}
