package dev.skerry.compiler.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.skerry.compiler.model.Vec2;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The inscribed limit polygon never admits more than the 2-norm limit and always admits
 * cos(π/S) of it (elementary geometry of the regular polygon: apothem = r·cos(π/S)).
 */
class LimitPolygonTest {

  @ParameterizedTest
  @ValueSource(ints = {3, 4, 5, 8, 16, 32})
  void inscribedBetweenApothemAndRadius(int sides) {
    double r = 2.5;
    LimitPolygon p = LimitPolygon.inscribed(r, sides);
    for (int i = 0; i < 3600; i++) {
      double a = 2 * Math.PI * i / 3600;
      Vec2 dir = new Vec2(Math.cos(a), Math.sin(a));
      double reach = Double.POSITIVE_INFINITY;
      for (Vec2 n : p.normals()) {
        double c = n.dot(dir);
        if (c > 0) {
          reach = Math.min(reach, p.offset() / c);
        }
      }
      assertTrue(reach <= r * (1 + 1e-12), "admits more than the limit along " + a);
      assertTrue(reach >= r * Math.cos(Math.PI / sides) * (1 - 1e-12), "admits less than r·cos(π/S) along " + a);
    }
    assertEquals(Math.cos(Math.PI / sides), p.conservatism(), 1e-15);
    assertTrue(p.xmax() <= r && p.xmin() >= -r && p.ymax() <= r && p.ymin() >= -r);
  }

  @ParameterizedTest
  @ValueSource(ints = {4, 8, 16})
  void axisNormalsHaveExactZeros(int sides) {
    LimitPolygon p = LimitPolygon.inscribed(1, sides);
    assertEquals(new Vec2(1, 0), p.normals().get(0));
    assertEquals(new Vec2(0, 1), p.normals().get(sides / 4));
    assertEquals(2 * sides - 4, p.termCount());
  }
}
