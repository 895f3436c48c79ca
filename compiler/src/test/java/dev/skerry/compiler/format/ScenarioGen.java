package dev.skerry.compiler.format;

import java.util.Random;

/**
 * Random valid scenarios for property tests: constants, a vehicle with each kind of start,
 * box and polygon zones written with arithmetic (unary minus, brackets, constants), an optional
 * waypoint and a plan with random options.
 */
public final class ScenarioGen {
  private ScenarioGen() {}

  public static String scenario(long seed) {
    Random r = new Random(seed);
    StringBuilder s = new StringBuilder();
    s.append("scenario gen_").append(Math.abs(seed % 1000)).append('\n');
    s.append(r.nextBoolean() ? "units m, s\n" : "units m\n");
    s.append("const w = ").append(2 + r.nextInt(5)).append(" m\n");
    s.append("const half = w / 2\n");
    s.append("vehicle boat {\n");
    if (r.nextBoolean()) {
      s.append("dynamics double_integrator\n");
    }
    s.append("start (5, 5) ").append(start(r)).append('\n');
    s.append("speed max ").append(4 + r.nextInt(4)).append(r.nextBoolean() ? " m/s\n" : " kn\n");
    s.append("accel max ").append(1 + r.nextInt(2)).append(" m/s^2\n");
    int radius = r.nextInt(9) + 1;
    s.append("radius ").append(r.nextBoolean() ? radius + "0 cm\n" : "0." + radius + " m\n");
    if (r.nextBoolean()) {
      s.append("sides ").append(r.nextBoolean() ? 8 : 16).append('\n');
    }
    s.append("}\n");
    s.append("area sea box (0, 0) to (0.2 km, 200)\n");
    int zones = 1 + r.nextInt(6);
    for (int i = 0; i < zones; i++) {
      int x = 20 + r.nextInt(140);
      int y = 20 + r.nextInt(140);
      if (r.nextBoolean()) {
        s.append("zone z").append(i).append(" box (").append(x).append(", -(-").append(y).append(")) to (")
            .append(x).append(" + w, ").append(y).append(" + (w * 3) / 2)\n");
      } else {
        s.append("zone p").append(i).append(" polygon (").append(x).append(", ").append(y).append(") (")
            .append(x + 6).append(", ").append(y).append(") (").append(x).append(" + 6, ").append(y)
            .append(" + half) (").append(x).append(", ").append(y).append(" + 3 - -1)\n");
      }
    }
    s.append("target home box (190, 190) to (195, 195)").append(r.nextBoolean() ? " at rest\n" : "\n");
    if (r.nextBoolean()) {
      s.append("waypoint mark (100, 180) within 2 m\n");
    }
    s.append("plan {\nstep 1 s\nhorizon ").append(60 + r.nextInt(20)).append('\n');
    s.append("minimize time").append(r.nextBoolean() ? " + 0.1 fuel\n" : "\n");
    if (zones > 1 && r.nextBoolean()) {
      s.append("clusters 2 ordered\n");
    }
    if (r.nextBoolean()) {
      s.append("guard on\n");
    }
    if (r.nextBoolean()) {
      s.append("solver default time_limit 30 s gap 1 %\n");
    }
    return s.append("}\n").toString();
  }

  private static String start(Random r) {
    switch (r.nextInt(3)) {
      case 0:
        return "at rest";
      case 1:
        return "velocity (1, -0.5) m/s";
      default:
        return "moving 1 m/s heading 45 deg";
    }
  }
}
