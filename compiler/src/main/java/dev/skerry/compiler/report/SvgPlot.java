package dev.skerry.compiler.report;

import dev.skerry.compiler.check.Format;
import dev.skerry.compiler.model.Bounds;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Shape;
import dev.skerry.compiler.model.Span;
import dev.skerry.compiler.model.Target;
import dev.skerry.compiler.model.Vec2;
import dev.skerry.compiler.model.Vehicle;
import dev.skerry.compiler.model.Waypoint;
import dev.skerry.compiler.model.Zone;
import dev.skerry.compiler.plan.ClusterBox;
import dev.skerry.compiler.plan.Sample;
import dev.skerry.compiler.plan.Trajectory;
import dev.skerry.compiler.verify.Verifier;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;

/**
 * A plan view of a scenario and its plan as a standalone SVG: keep-in area, zones as written and
 * grown by the radius, target and waypoints, clusters, the path with a marker per step, start and
 * arrival, axes in metres, a scale bar, a legend and the safety caution. Each used cluster has its
 * own hue: its dashed box and a tint over every zone it holds; an unused cluster (no zones, a
 * collapsed box) is not drawn.
 *
 * <p>With several vehicles each has its own hue from {@link #VEHICLE_HUES}, shared by its path,
 * step dots, start and arrival markers and its legend entry; targets carry their names. A 3-D
 * scenario adds a side elevation below the plan view on the same x scale: altitude upwards, zones
 * with a floor and ceiling as boxes, zones without as hatched full-height columns, the keep-in
 * floor and ceiling, the target bands and each vehicle's altitude against x.
 */
public final class SvgPlot {
  private static final int WIDTH = 900;
  private static final int MARGIN = 60;
  private static final int LEGEND = 190;
  private static final String INK = "#1f2a36";
  private static final String WATER = "#eef5f7";
  private static final String ZONE = "#6b5b4e";
  private static final String GROWN = "#b08968";
  private static final String PATH = "#d1495b";
  private static final String TARGET = "#2a9d8f";
  private static final String CLUSTER = "#5c6bc0";
  /** One hue per cluster, repeated past the eighth; chosen to stay apart from the path and target. */
  private static final List<String> CLUSTER_HUES = List.of("#5c6bc0", "#e09f3e", "#6a994e", "#9d4edd", "#00838f",
      "#c1666b", "#7d6b2f", "#3d5a80");
  /** One hue per vehicle, repeated past the eighth; the first is the single vehicle's path colour. */
  static final List<String> VEHICLE_HUES = List.of(PATH, "#1b6ca8", "#e36414", "#55a630", "#7b2cbf", "#9c6644",
      "#0f4c5c", "#c9184a");
  /** Height of the side elevation (3-D only) and the room above it for the plan view's x labels. */
  private static final int ELEV = 200;
  private static final int ELEV_GAP = 90;

  private final Scenario s;
  private final double scale;
  private final Bounds view;
  private final int plotHeight;
  private final StringBuilder out = new StringBuilder();
  /** Several vehicles (or several targets): hues per vehicle, target names shown. */
  private boolean multi;
  private double zlo;
  private double zhi;
  private double elevTop;

  private SvgPlot(Scenario scenario) {
    this.s = scenario;
    Bounds b = scenario.area().bounds();
    for (Zone z : scenario.zones()) {
      b = b.union(z.shape().bounds());
    }
    this.view = b;
    this.scale = (WIDTH - 2 * MARGIN - LEGEND) / Math.max(b.width(), 1e-9);
    this.plotHeight = (int) Math.ceil(b.height() * scale);
  }

  public static String render(Scenario scenario, Trajectory path, List<ClusterBox> clusters, String title) {
    return new SvgPlot(scenario).draw(path == null ? List.of() : List.of(path), List.of(),
        clusters == null ? List.of() : clusters, title);
  }

  /** The flown path with, dashed, the path predicted by the first plan. */
  public static String render(Scenario scenario, Trajectory flown, Trajectory predicted, List<ClusterBox> clusters,
      String title) {
    return new SvgPlot(scenario).draw(flown == null ? List.of() : List.of(flown),
        predicted == null ? List.of() : List.of(predicted), clusters == null ? List.of() : clusters, title);
  }

  /** Every vehicle's flown path with, dashed in the same hue, its path predicted by the first plan. */
  public static String renderLoop(Scenario scenario, List<Trajectory> flown, List<Trajectory> predicted,
      List<ClusterBox> clusters, String title) {
    return new SvgPlot(scenario).draw(flown == null ? List.of() : flown, predicted == null ? List.of() : predicted,
        clusters == null ? List.of() : clusters, title);
  }

  /** Every vehicle's path (one per vehicle, the scenario's order), each in its own hue. */
  public static String renderPlan(Scenario scenario, List<Trajectory> paths, List<ClusterBox> clusters, String title) {
    return new SvgPlot(scenario).draw(paths == null ? List.of() : paths, List.of(),
        clusters == null ? List.of() : clusters, title);
  }

  /** The hue of the i-th vehicle's path. */
  public static String vehicleHue(int i) {
    return VEHICLE_HUES.get(i % VEHICLE_HUES.size());
  }

  private double x(double wx) {
    return MARGIN + (wx - view.xmin()) * scale;
  }

  private double y(double wy) {
    return MARGIN + (view.ymax() - wy) * scale;
  }

  private static String hue(int cluster) {
    return CLUSTER_HUES.get(cluster % CLUSTER_HUES.size());
  }

  private static String f(double v) {
    return String.format(Locale.ROOT, "%.2f", v);
  }

  private static String esc(String text) {
    return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
  }

  private String draw(List<Trajectory> paths, List<Trajectory> predictions, List<ClusterBox> clusters,
      String title) {
    multi = paths.size() > 1 || s.fleet() || s.targets().size() > 1;
    int height = plotHeight + 2 * MARGIN + 40 + (s.threeD() ? ELEV_GAP + ELEV : 0);
    out.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
    out.append("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"").append(WIDTH).append("\" height=\"").append(height)
        .append("\" viewBox=\"0 0 ").append(WIDTH).append(' ').append(height).append("\" font-family=\"sans-serif\">\n");
    out.append("<title>").append(esc(title)).append("</title>\n");
    out.append("<rect width=\"100%\" height=\"100%\" fill=\"white\"/>\n");
    if (s.threeD()) {
      out.append("<defs><pattern id=\"column-hatch\" width=\"6\" height=\"6\" patternUnits=\"userSpaceOnUse\"")
          .append(" patternTransform=\"rotate(45)\"><rect width=\"6\" height=\"6\" fill=\"").append(ZONE)
          .append("\" fill-opacity=\"0.08\"/><line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"6\" stroke=\"").append(ZONE)
          .append("\" stroke-width=\"1.5\" stroke-opacity=\"0.45\"/></pattern></defs>\n");
    }
    out.append("<text x=\"").append(MARGIN).append("\" y=\"30\" font-size=\"16\" fill=\"").append(INK).append("\">")
        .append(esc(title)).append("</text>\n");
    out.append("<g id=\"area\">").append(shape(s.area().shape(), WATER, INK, "1.5", null)).append("</g>\n");
    axes();
    double r = s.vehicles().stream().mapToDouble(Vehicle::radius).max().orElse(0);
    List<ClusterBox> used = clusters.stream().filter(c -> !c.zones().isEmpty()).toList();
    Map<String, Integer> member = new HashMap<>();
    for (int i = 0; i < used.size(); i++) {
      for (String zone : used.get(i).zones()) {
        member.put(zone, i);
      }
    }
    out.append("<g id=\"zones\">\n");
    for (Zone z : s.zones()) {
      if (r > 0) {
        out.append(shape(z.shape().inflate(r), "none", GROWN, "1", "4 3"));
      }
      out.append(shape(z.shape(), ZONE, ZONE, "1", null));
      Integer in = member.get(z.name());
      if (in != null) {
        String hue = hue(in);
        out.append(shape(z.shape(), hue, hue, "2", null).replace("<polygon ", "<polygon class=\"cluster-member\" data-cluster=\""
            + esc(used.get(in).name()) + "\" fill-opacity=\"0.55\" "));
      }
      Bounds zb = z.shape().bounds();
      out.append("<text class=\"zone-label\" x=\"").append(f(x(zb.center().x()))).append("\" y=\"")
          .append(f(y(zb.ymax() + r) - 3)).append("\" font-size=\"9\" fill=\"").append(ZONE)
          .append("\" text-anchor=\"middle\">").append(esc(z.name())).append("</text>\n");
    }
    out.append("</g>\n");
    if (!used.isEmpty()) {
      out.append("<g id=\"clusters\">\n");
      for (int i = 0; i < used.size(); i++) {
        ClusterBox c = used.get(i);
        String hue = hue(i);
        out.append(shape(new Shape.Box(c.box()), hue, hue, "1.5", "8 4").replace("fill=\"" + hue + "\"",
            "fill=\"" + hue + "\" fill-opacity=\"0.10\""));
        out.append("<text x=\"").append(f(x(c.box().xmin()) + 3)).append("\" y=\"").append(f(y(c.box().ymax()) - 4))
            .append("\" font-size=\"10\" fill=\"").append(hue).append("\">").append(esc(c.name() + " (" + c.zones().size()
                + " zones)")).append("</text>\n");
      }
      out.append("</g>\n");
    }
    out.append("<g id=\"target\">");
    for (Target t : multi ? s.targets() : List.of(s.target())) {
      out.append(shape(t.region(), TARGET, TARGET, "1.5", null)
          .replace("fill=\"" + TARGET + "\"", "fill=\"" + TARGET + "\" fill-opacity=\"0.25\""));
      if (multi) {
        Bounds tb = t.region().bounds();
        out.append("<text class=\"target-label\" x=\"").append(f(x(tb.center().x()))).append("\" y=\"")
            .append(f(y(tb.ymin()) + 11)).append("\" font-size=\"10\" fill=\"").append(TARGET)
            .append("\" text-anchor=\"middle\">").append(esc(t.name())).append("</text>\n");
      }
    }
    out.append("</g>\n");
    for (Waypoint w : s.waypoints()) {
      out.append("<g class=\"waypoint\">").append(shape(new Shape.Box(w.region()), "none", TARGET, "1.5", "2 2"))
          .append("</g>\n");
    }
    if (!predictions.isEmpty()) {
      out.append("<g id=\"predicted\">");
      for (int i = 0; i < predictions.size(); i++) {
        out.append("<polyline fill=\"none\" stroke=\"").append(multi ? vehicleHue(i) : PATH)
            .append("\" stroke-width=\"1.5\" stroke-dasharray=\"5 4\" stroke-opacity=\"0.6\" points=\"");
        for (Sample p : predictions.get(i).flown()) {
          out.append(f(x(p.position().x()))).append(',').append(f(y(p.position().y()))).append(' ');
        }
        out.append("\"/>");
      }
      out.append("</g>\n");
    }
    if (!multi) {
      if (!paths.isEmpty()) {
        path(paths.get(0));
      }
      Vec2 start = s.vehicle().start();
      out.append("<circle id=\"start\" cx=\"").append(f(x(start.x()))).append("\" cy=\"").append(f(y(start.y())))
          .append("\" r=\"5\" fill=\"white\" stroke=\"").append(INK).append("\" stroke-width=\"2\"/>\n");
    } else {
      fleetPaths(paths);
    }
    scaleBar();
    if (s.threeD()) {
      elevation(paths, predictions);
    }
    legend(paths, !used.isEmpty(), !predictions.isEmpty());
    out.append("<text x=\"").append(MARGIN).append("\" y=\"").append(height - 12).append("\" font-size=\"10\" fill=\"#555\">")
        .append("Planning aid, not certified guidance: check local aviation or maritime rules and licensed practice; ")
        .append("the radius margin is the user's choice.</text>\n");
    out.append("</svg>\n");
    return out.toString();
  }

  private String shape(Shape shape, String fill, String stroke, String width, String dash) {
    StringBuilder b = new StringBuilder("<polygon points=\"");
    for (Vec2 p : shape.corners()) {
      b.append(f(x(p.x()))).append(',').append(f(y(p.y()))).append(' ');
    }
    b.setLength(b.length() - 1);
    b.append("\" fill=\"").append(fill).append("\" stroke=\"").append(stroke).append("\" stroke-width=\"").append(width)
        .append('"');
    if (dash != null) {
      b.append(" stroke-dasharray=\"").append(dash).append('"');
    }
    return b.append("/>\n").toString();
  }

  private void path(Trajectory path) {
    List<Sample> flown = path.flown();
    out.append("<g id=\"path\">\n<polyline fill=\"none\" stroke=\"").append(PATH).append("\" stroke-width=\"2\" points=\"");
    for (Sample p : flown) {
      out.append(f(x(p.position().x()))).append(',').append(f(y(p.position().y()))).append(' ');
    }
    out.append("\"/>\n");
    for (Sample p : flown) {
      out.append("<circle class=\"step\" cx=\"").append(f(x(p.position().x()))).append("\" cy=\"")
          .append(f(y(p.position().y()))).append("\" r=\"2.5\" fill=\"").append(PATH).append("\"><title>step ")
          .append(p.step()).append(", t = ").append(Format.number(p.time())).append(" s</title></circle>\n");
    }
    Sample end = flown.get(flown.size() - 1);
    out.append("<rect id=\"arrival\" x=\"").append(f(x(end.position().x()) - 5)).append("\" y=\"")
        .append(f(y(end.position().y()) - 5)).append("\" width=\"10\" height=\"10\" fill=\"white\" stroke=\"").append(PATH)
        .append("\" stroke-width=\"2\"/>\n</g>\n");
  }

  /** Each vehicle's path, dots, start and arrival in its own hue. */
  private void fleetPaths(List<Trajectory> paths) {
    for (int i = 0; i < paths.size(); i++) {
      Trajectory p = paths.get(i);
      String hue = vehicleHue(i);
      List<Sample> flown = p.flown();
      out.append("<g class=\"vehicle-path\" id=\"path-").append(i).append("\" data-vehicle=\"").append(esc(p.vehicle()))
          .append("\" data-hue=\"").append(hue).append("\">\n<polyline fill=\"none\" stroke=\"").append(hue)
          .append("\" stroke-width=\"2\" points=\"");
      for (Sample q : flown) {
        out.append(f(x(q.position().x()))).append(',').append(f(y(q.position().y()))).append(' ');
      }
      out.append("\"/>\n");
      for (Sample q : flown) {
        out.append("<circle class=\"step\" cx=\"").append(f(x(q.position().x()))).append("\" cy=\"")
            .append(f(y(q.position().y()))).append("\" r=\"2.5\" fill=\"").append(hue).append("\"><title>")
            .append(esc(p.vehicle())).append(", step ").append(q.step()).append(", t = ").append(Format.number(q.time()))
            .append(" s</title></circle>\n");
      }
      Sample end = flown.get(flown.size() - 1);
      out.append("<rect class=\"arrival\" x=\"").append(f(x(end.position().x()) - 5)).append("\" y=\"")
          .append(f(y(end.position().y()) - 5)).append("\" width=\"10\" height=\"10\" fill=\"white\" stroke=\"").append(hue)
          .append("\" stroke-width=\"2\"/>\n</g>\n");
    }
    out.append("<g id=\"start\">\n");
    int count = paths.isEmpty() ? s.vehicles().size() : paths.size();
    for (int i = 0; i < count; i++) {
      Vehicle v = paths.isEmpty() ? s.vehicles().get(i) : Verifier.vehicleOf(s, paths.get(i));
      out.append("<circle class=\"start\" data-vehicle=\"").append(esc(v.name())).append("\" cx=\"")
          .append(f(x(v.start().x()))).append("\" cy=\"").append(f(y(v.start().y()))).append("\" r=\"5\" fill=\"white\" stroke=\"")
          .append(vehicleHue(i)).append("\" stroke-width=\"2\"/>\n");
    }
    out.append("</g>\n");
  }

  /** Altitude range of the side elevation: everything bounded that is drawn, padded a little. */
  private void altitudeRange(List<Trajectory> paths, List<Trajectory> predictions) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    List<Span> spans = new ArrayList<>();
    spans.add(s.area().altitude());
    for (Zone z : s.zones()) {
      spans.add(z.altitude());
    }
    for (Target t : s.targets()) {
      spans.add(t.altitude());
    }
    for (Vehicle v : s.vehicles()) {
      if (v.vertical() != null) {
        spans.add(new Span(v.vertical().start(), v.vertical().start()));
      }
    }
    List<Trajectory> all = new ArrayList<>(paths);
    all.addAll(predictions);
    for (Trajectory p : all) {
      for (Sample q : p.flown()) {
        spans.add(new Span(q.altitude(), q.altitude()));
      }
    }
    for (Span sp : spans) {
      if (sp != null) {
        if (Double.isFinite(sp.lo())) {
          lo = Math.min(lo, sp.lo());
          hi = Math.max(hi, sp.lo());
        }
        if (Double.isFinite(sp.hi())) {
          lo = Math.min(lo, sp.hi());
          hi = Math.max(hi, sp.hi());
        }
      }
    }
    if (!(hi >= lo)) {
      lo = 0;
      hi = 100;
    }
    double pad = Math.max(hi - lo, 10) * 0.06;
    zlo = lo - pad;
    zhi = hi + pad;
  }

  private double z(double altitude) {
    double a = Math.max(zlo, Math.min(zhi, altitude));
    return elevTop + (zhi - a) * ELEV / (zhi - zlo);
  }

  /** A rectangle x-extent × altitude band in the elevation (an unbounded band fills the panel). */
  private String band(double x0, double x1, Span span, String attrs) {
    Span sp = Span.orAll(span);
    double top = z(sp.hi());
    double bottom = z(sp.lo());
    return "<rect x=\"" + f(x(x0)) + "\" y=\"" + f(top) + "\" width=\"" + f(Math.max(0.5, x(x1) - x(x0)))
        + "\" height=\"" + f(Math.max(0.5, bottom - top)) + "\" " + attrs + "/>\n";
  }

  /** The side elevation below the plan view: x across (the plan's scale), altitude up. */
  private void elevation(List<Trajectory> paths, List<Trajectory> predictions) {
    altitudeRange(paths, predictions);
    elevTop = MARGIN + plotHeight + ELEV_GAP;
    double left = x(view.xmin());
    double right = x(view.xmax());
    out.append("<g id=\"elevation\">\n");
    out.append("<text x=\"").append(MARGIN).append("\" y=\"").append(f(elevTop - 10)).append("\" font-size=\"12\" fill=\"")
        .append(INK).append("\">side elevation: altitude against x</text>\n");
    out.append("<rect class=\"panel\" x=\"").append(f(left)).append("\" y=\"").append(f(elevTop)).append("\" width=\"")
        .append(f(right - left)).append("\" height=\"").append(ELEV).append("\" fill=\"white\" stroke=\"").append(INK)
        .append("\" stroke-width=\"0.5\"/>\n");
    Bounds ab = s.area().bounds();
    out.append(band(ab.xmin(), ab.xmax(), s.area().altitude(), "class=\"keep-in\" fill=\"" + WATER + "\""));
    if (s.area().altitude() != null) {
      for (String which : List.of("floor", "ceiling")) {
        double alt = which.equals("floor") ? s.area().altitude().lo() : s.area().altitude().hi();
        if (Double.isFinite(alt)) {
          out.append("<line class=\"keep-in-").append(which).append("\" x1=\"").append(f(x(ab.xmin()))).append("\" y1=\"")
              .append(f(z(alt))).append("\" x2=\"").append(f(x(ab.xmax()))).append("\" y2=\"").append(f(z(alt)))
              .append("\" stroke=\"").append(INK).append("\" stroke-width=\"1.2\" stroke-dasharray=\"6 3\"/>\n");
        }
      }
    }
    for (Zone zone : s.zones()) {
      Bounds zb = zone.shape().bounds();
      String tip = "<title>" + esc(zone.name()) + "</title>";
      if (zone.hasAltitude()) {
        out.append(band(zb.xmin(), zb.xmax(), zone.altitude(), "class=\"zone-span\" data-zone=\"" + esc(zone.name())
            + "\" fill=\"" + ZONE + "\" fill-opacity=\"0.75\" stroke=\"" + ZONE + "\"").replace("/>\n", ">" + tip + "</rect>\n"));
      } else {
        out.append(band(zb.xmin(), zb.xmax(), null, "class=\"zone-column\" data-zone=\"" + esc(zone.name())
            + "\" fill=\"url(#column-hatch)\" stroke=\"" + ZONE + "\" stroke-width=\"0.5\"").replace("/>\n", ">" + tip + "</rect>\n"));
      }
    }
    for (Target t : s.targets()) {
      Bounds tb = t.region().bounds();
      out.append(band(tb.xmin(), tb.xmax(), t.altitude(), "class=\"target-band\" data-target=\"" + esc(t.name())
          + "\" fill=\"" + TARGET + "\" fill-opacity=\"0.25\" stroke=\"" + TARGET + "\""));
    }
    for (Waypoint w : s.waypoints()) {
      Bounds wb = w.region();
      out.append(band(wb.xmin(), wb.xmax(), w.altitude(), "class=\"waypoint-band\" fill=\"none\" stroke=\"" + TARGET
          + "\" stroke-dasharray=\"2 2\""));
    }
    for (int i = 0; i < predictions.size(); i++) {
      out.append("<polyline class=\"elevation-predicted\" fill=\"none\" stroke=\"").append(multi ? vehicleHue(i) : PATH)
          .append("\" stroke-width=\"1.5\" stroke-dasharray=\"5 4\" stroke-opacity=\"0.6\" points=\"");
      for (Sample q : predictions.get(i).flown()) {
        out.append(f(x(q.position().x()))).append(',').append(f(z(q.altitude()))).append(' ');
      }
      out.append("\"/>\n");
    }
    for (int i = 0; i < paths.size(); i++) {
      Trajectory p = paths.get(i);
      String hue = vehicleHue(i);
      out.append("<g class=\"elevation-path\" data-vehicle=\"").append(esc(p.vehicle())).append("\" data-hue=\"")
          .append(hue).append("\"><polyline fill=\"none\" stroke=\"").append(hue).append("\" stroke-width=\"2\" points=\"");
      for (Sample q : p.flown()) {
        out.append(f(x(q.position().x()))).append(',').append(f(z(q.altitude()))).append(' ');
      }
      out.append("\"/>\n");
      for (Sample q : p.flown()) {
        out.append("<circle class=\"elevation-step\" cx=\"").append(f(x(q.position().x()))).append("\" cy=\"")
            .append(f(z(q.altitude()))).append("\" r=\"2\" fill=\"").append(hue).append("\"><title>")
            .append(esc(p.vehicle())).append(", step ").append(q.step()).append(", altitude ")
            .append(Format.number(q.altitude())).append(" m</title></circle>\n");
      }
      Sample end = p.flown().get(p.flown().size() - 1);
      out.append("<rect class=\"elevation-arrival\" x=\"").append(f(x(end.position().x()) - 4)).append("\" y=\"")
          .append(f(z(end.altitude()) - 4)).append("\" width=\"8\" height=\"8\" fill=\"white\" stroke=\"").append(hue)
          .append("\" stroke-width=\"2\"/></g>\n");
    }
    // Axes of the panel: x as in the plan view, altitude on the left, both in metres.
    double bottom = elevTop + ELEV;
    double xstep = niceStep(view.width() / 6);
    out.append("<g class=\"elevation-axes\" font-size=\"10\" fill=\"").append(INK).append("\">\n");
    for (double v = Math.ceil(view.xmin() / xstep) * xstep; v <= view.xmax() + 1e-9; v += xstep) {
      out.append("<line x1=\"").append(f(x(v))).append("\" y1=\"").append(f(bottom)).append("\" x2=\"").append(f(x(v)))
          .append("\" y2=\"").append(f(bottom + 4)).append("\" stroke=\"").append(INK).append("\"/>");
      out.append("<text x=\"").append(f(x(v))).append("\" y=\"").append(f(bottom + 16)).append("\" text-anchor=\"middle\">")
          .append(Format.number(v)).append("</text>\n");
    }
    double zstep = niceStep((zhi - zlo) / 5);
    for (double v = Math.ceil(zlo / zstep) * zstep; v <= zhi + 1e-9; v += zstep) {
      out.append("<line x1=\"").append(f(left - 4)).append("\" y1=\"").append(f(z(v))).append("\" x2=\"").append(f(left))
          .append("\" y2=\"").append(f(z(v))).append("\" stroke=\"").append(INK).append("\"/>");
      out.append("<text x=\"").append(f(left - 6)).append("\" y=\"").append(f(z(v) + 3)).append("\" text-anchor=\"end\">")
          .append(Format.number(v)).append("</text>\n");
    }
    out.append("<text x=\"").append(f(right)).append("\" y=\"").append(f(bottom + 30))
        .append("\" text-anchor=\"end\">x (m)</text>\n");
    out.append("<text x=\"").append(f(Math.max(4, left - 50))).append("\" y=\"").append(f(elevTop - 26))
        .append("\">altitude (m)</text>\n");
    out.append("</g>\n</g>\n");
  }

  private void axes() {
    double step = niceStep(view.width() / 6);
    out.append("<g id=\"axes\" font-size=\"10\" fill=\"").append(INK).append("\">\n");
    double bottom = MARGIN + plotHeight;
    for (double v = Math.ceil(view.xmin() / step) * step; v <= view.xmax() + 1e-9; v += step) {
      out.append("<line x1=\"").append(f(x(v))).append("\" y1=\"").append(f(bottom)).append("\" x2=\"").append(f(x(v)))
          .append("\" y2=\"").append(f(bottom + 4)).append("\" stroke=\"").append(INK).append("\"/>");
      out.append("<text x=\"").append(f(x(v))).append("\" y=\"").append(f(bottom + 16)).append("\" text-anchor=\"middle\">")
          .append(Format.number(v)).append("</text>\n");
    }
    for (double v = Math.ceil(view.ymin() / step) * step; v <= view.ymax() + 1e-9; v += step) {
      out.append("<line x1=\"").append(MARGIN - 4).append("\" y1=\"").append(f(y(v))).append("\" x2=\"").append(MARGIN)
          .append("\" y2=\"").append(f(y(v))).append("\" stroke=\"").append(INK).append("\"/>");
      out.append("<text x=\"").append(MARGIN - 6).append("\" y=\"").append(f(y(v) + 3)).append("\" text-anchor=\"end\">")
          .append(Format.number(v)).append("</text>\n");
    }
    out.append("<text x=\"").append(f(x(view.xmax()))).append("\" y=\"").append(f(bottom + 30))
        .append("\" text-anchor=\"end\">x (m)</text>\n");
    out.append("<text x=\"").append(MARGIN - 6).append("\" y=\"").append(MARGIN - 8).append("\" text-anchor=\"end\">y (m)</text>\n");
    out.append("</g>\n");
  }

  static double niceStep(double raw) {
    double p = Math.pow(10, Math.floor(Math.log10(Math.max(raw, 1e-9))));
    for (double m : new double[] {1, 2, 5, 10}) {
      if (m * p >= raw) {
        return m * p;
      }
    }
    return 10 * p;
  }

  private void scaleBar() {
    double length = niceStep(view.width() / 5);
    double x0 = MARGIN + 160;
    double y0 = MARGIN + plotHeight + 40;
    out.append("<g id=\"scale-bar\"><line x1=\"").append(f(x0)).append("\" y1=\"").append(f(y0)).append("\" x2=\"")
        .append(f(x0 + length * scale)).append("\" y2=\"").append(f(y0)).append("\" stroke=\"").append(INK)
        .append("\" stroke-width=\"3\"/><text x=\"").append(f(x0)).append("\" y=\"").append(f(y0 - 5))
        .append("\" font-size=\"10\" fill=\"").append(INK).append("\">").append(Format.number(length)).append(" m</text></g>\n");
  }

  private void legend(List<Trajectory> paths, boolean hasClusters, boolean hasPrediction) {
    boolean hasPath = !paths.isEmpty();
    double lx = WIDTH - LEGEND + 10;
    double ly = MARGIN;
    out.append("<g id=\"legend\" font-size=\"11\" fill=\"").append(INK).append("\">\n");
    ly = legendRow(lx, ly, "<rect width=\"14\" height=\"10\" fill=\"" + WATER + "\" stroke=\"" + INK + "\"/>", "keep-in area");
    ly = legendRow(lx, ly, "<rect width=\"14\" height=\"10\" fill=\"" + ZONE + "\"/>", "zone");
    double radius = s.vehicles().stream().mapToDouble(Vehicle::radius).max().orElse(0);
    ly = legendRow(lx, ly, "<rect width=\"14\" height=\"10\" fill=\"none\" stroke=\"" + GROWN
        + "\" stroke-dasharray=\"4 3\"/>", (s.fleet() ? "zone + largest radius " : "zone + radius ")
        + Format.number(radius) + " m");
    ly = legendRow(lx, ly, "<rect width=\"14\" height=\"10\" fill=\"" + TARGET + "\" fill-opacity=\"0.25\" stroke=\""
        + TARGET + "\"/>", "target");
    if (!s.waypoints().isEmpty()) {
      ly = legendRow(lx, ly, "<rect width=\"14\" height=\"10\" fill=\"none\" stroke=\"" + TARGET
          + "\" stroke-dasharray=\"2 2\"/>", "waypoint");
    }
    if (hasClusters) {
      ly = legendRow(lx, ly, "<rect width=\"14\" height=\"10\" fill=\"" + CLUSTER + "\" fill-opacity=\"0.12\" stroke=\""
          + CLUSTER + "\" stroke-dasharray=\"8 4\"/>", "cluster, its zones tinted");
    }
    if (s.threeD()) {
      ly = legendRow(lx, ly, "<rect width=\"14\" height=\"10\" fill=\"url(#column-hatch)\" stroke=\"" + ZONE
          + "\" stroke-width=\"0.5\"/>", "zone at every altitude");
      ly = legendRow(lx, ly, "<line x1=\"0\" y1=\"5\" x2=\"14\" y2=\"5\" stroke=\"" + INK
          + "\" stroke-dasharray=\"6 3\"/>", "keep-in floor, ceiling");
    }
    if (hasPath && !multi) {
      ly = legendRow(lx, ly, "<line x1=\"0\" y1=\"5\" x2=\"14\" y2=\"5\" stroke=\"" + PATH + "\" stroke-width=\"2\"/>",
          "path, dot per step");
      ly = legendRow(lx, ly, "<rect x=\"2\" width=\"10\" height=\"10\" fill=\"white\" stroke=\"" + PATH + "\"/>", "arrival");
    } else if (hasPath) {
      for (int i = 0; i < paths.size(); i++) {
        Trajectory p = paths.get(i);
        Target t = Verifier.targetOf(s, p);
        String hue = vehicleHue(i);
        int before = out.length();
        ly = legendRow(lx, ly, "<line x1=\"0\" y1=\"5\" x2=\"14\" y2=\"5\" stroke=\"" + hue + "\" stroke-width=\"2\"/>",
            p.vehicle() + (t == null ? "" : " → " + t.name()));
        out.insert(before + 2, " class=\"vehicle-entry\" data-vehicle=\"" + esc(p.vehicle()) + "\" data-hue=\"" + hue + "\"");
      }
      ly = legendRow(lx, ly, "<rect x=\"2\" width=\"10\" height=\"10\" fill=\"white\" stroke=\"" + INK + "\"/>",
          "arrival (vehicle's hue)");
    }
    if (hasPrediction) {
      ly = legendRow(lx, ly, "<line x1=\"0\" y1=\"5\" x2=\"14\" y2=\"5\" stroke=\"" + PATH
          + "\" stroke-dasharray=\"5 4\"/>", "first prediction");
    }
    legendRow(lx, ly, "<circle cx=\"7\" cy=\"5\" r=\"5\" fill=\"white\" stroke=\"" + INK + "\"/>", "start");
    out.append("</g>\n");
  }

  private double legendRow(double lx, double ly, String symbol, String label) {
    out.append("<g transform=\"translate(").append(f(lx)).append(',').append(f(ly)).append(")\">").append(symbol)
        .append("<text x=\"20\" y=\"9\">").append(esc(label)).append("</text></g>\n");
    return ly + 18;
  }
}
