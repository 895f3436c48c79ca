package dev.skerry.compiler.semdiff;

import dev.skerry.compiler.model.Area;
import dev.skerry.compiler.model.Scenario;
import dev.skerry.compiler.model.Zone;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.BiFunction;
import java.util.function.Function;

/**
 * Compares two checked scenarios by meaning. Entities are matched by name; an entity that
 * disappears while one of the same kind and identical content appears under another name is a
 * rename. Either scenario may be null, meaning "no scenario" (a file added or deleted).
 */
public final class ScenarioDiff {
  private final Scenario before;
  private final Scenario after;
  private final List<Change> changes = new ArrayList<>();

  private ScenarioDiff(Scenario before, Scenario after) {
    this.before = before;
    this.after = after;
  }

  public static DiffReport compare(String oldLabel, Scenario before, String newLabel, Scenario after, SizeSource sizes) {
    ScenarioDiff diff = new ScenarioDiff(before, after);
    diff.run();
    SizeFigures was = before == null ? null : sizes.sizes(before);
    SizeFigures now = after == null ? null : sizes.sizes(after);
    return new DiffReport(oldLabel, newLabel, diff.changes, was, now);
  }

  private void run() {
    String oldName = before == null ? null : before.name();
    String newName = after == null ? null : after.name();
    if (oldName != null && newName != null && !oldName.equals(newName)) {
      changes.add(new Change("scenario", oldName, Change.Status.RENAMED, newName, List.of()));
    }
    entities("vehicle", list(before, Scenario::vehicles), list(after, Scenario::vehicles), v -> v.name(),
        EntityDetails::vehicle);
    area();
    entities("zone", list(before, Scenario::zones), list(after, Scenario::zones), Zone::name, this::zoneDetails);
    zoneOrder();
    entities("target", list(before, Scenario::targets), list(after, Scenario::targets), t -> t.name(),
        EntityDetails::target);
    entities("waypoint", list(before, Scenario::waypoints), list(after, Scenario::waypoints), w -> w.name(),
        EntityDetails::waypoint);
    if (before != null && after != null) {
      List<Change.Detail> plan = new ArrayList<>(PlanDetails.of(before.plan(), after.plan()));
      if (before.dimensions() != after.dimensions()) {
        plan.add(0, new Change.Detail("dimensions", Integer.toString(before.dimensions()),
            Integer.toString(after.dimensions()), "dimensions " + before.dimensions() + " → " + after.dimensions()));
      }
      if (!plan.isEmpty()) {
        changes.add(new Change("plan", "", Change.Status.CHANGED, null, plan));
      }
    } else if (after != null) {
      changes.add(new Change("plan", "", Change.Status.ADDED, null, List.of()));
    } else if (before != null) {
      changes.add(new Change("plan", "", Change.Status.REMOVED, null, List.of()));
    }
  }

  private static <T> List<T> list(Scenario s, Function<Scenario, List<T>> get) {
    return s == null ? List.of() : get.apply(s);
  }

  private <T> void entities(String kind, List<T> olds, List<T> news, Function<T, String> name,
      BiFunction<T, T, List<Change.Detail>> details) {
    Map<String, T> oldByName = byName(olds, name);
    Map<String, T> newByName = byName(news, name);
    List<T> removed = new ArrayList<>(olds.stream().filter(e -> !newByName.containsKey(name.apply(e))).toList());
    for (T now : news) {
      String n = name.apply(now);
      T was = oldByName.get(n);
      if (was != null) {
        if (!ModelView.sameMeaning(was, now)) {
          List<Change.Detail> found = details.apply(was, now);
          changes.add(new Change(kind, n, Change.Status.CHANGED, null, found.isEmpty() ? generic(was, now) : found));
        }
        continue;
      }
      T renamedFrom = removed.stream()
          .filter(old -> ModelView.without(old, "name").equals(ModelView.without(now, "name")))
          .findFirst().orElse(null);
      if (renamedFrom != null) {
        removed.remove(renamedFrom);
        changes.add(new Change(kind, name.apply(renamedFrom), Change.Status.RENAMED, n, List.of()));
      } else {
        List<Change.Detail> added = new ArrayList<>();
        added.add(EntityDetails.added("summary", EntityDetails.summary(now)));
        if (now instanceof Zone zone) {
          Set<String> overlaps = overlapping(zone, after);
          if (!overlaps.isEmpty()) {
            added.add(EntityDetails.added("overlaps", "overlaps " + String.join(", ", overlaps)));
          }
        }
        changes.add(new Change(kind, n, Change.Status.ADDED, null, added));
      }
    }
    for (T gone : removed) {
      changes.add(new Change(kind, name.apply(gone), Change.Status.REMOVED, null, List.of()));
    }
  }

  private void area() {
    Area was = before == null ? null : before.area();
    Area now = after == null ? null : after.area();
    if (was != null && now != null) {
      if (!ModelView.sameMeaning(was, now)) {
        changes.add(new Change("area", was.name(), Change.Status.CHANGED, null, EntityDetails.area(was, now)));
      }
    } else if (now != null) {
      changes.add(new Change("area", now.name(), Change.Status.ADDED, null,
          List.of(EntityDetails.added("summary", EntityDetails.summary(now)))));
    } else if (was != null) {
      changes.add(new Change("area", was.name(), Change.Status.REMOVED, null, List.of()));
    }
  }

  /** A zone's own changes plus the zones (present in both versions) it now meets or no longer meets. */
  private List<Change.Detail> zoneDetails(Zone was, Zone now) {
    List<Change.Detail> out = new ArrayList<>(EntityDetails.zone(was, now));
    Set<String> common = new TreeSet<>();
    before.zones().forEach(z -> common.add(z.name()));
    common.retainAll(after.zones().stream().map(Zone::name).toList());
    Set<String> then = overlapping(was, before);
    Set<String> nowSet = overlapping(now, after);
    then.retainAll(common);
    nowSet.retainAll(common);
    Set<String> gained = new TreeSet<>(nowSet);
    gained.removeAll(then);
    Set<String> lost = new TreeSet<>(then);
    lost.removeAll(nowSet);
    if (!gained.isEmpty()) {
      out.add(new Change.Detail("overlaps", null, String.join(", ", gained), "now overlaps " + String.join(", ", gained)));
    }
    if (!lost.isEmpty()) {
      out.add(new Change.Detail("overlaps", String.join(", ", lost), null, "no longer overlaps " + String.join(", ", lost)));
    }
    return out;
  }

  private static Set<String> overlapping(Zone zone, Scenario in) {
    Set<String> names = new TreeSet<>();
    for (Zone other : in.zones()) {
      if (!other.name().equals(zone.name()) && ShapeChanges.overlap(zone.shape(), other.shape())) {
        names.add(other.name());
      }
    }
    return names;
  }

  /** Zone order is part of the meaning: ordered clusters assign zones by their position. */
  private void zoneOrder() {
    if (before == null || after == null) {
      return;
    }
    List<String> then = before.zones().stream().map(Zone::name).toList();
    List<String> now = after.zones().stream().map(Zone::name).toList();
    List<String> keptThen = then.stream().filter(now::contains).toList();
    List<String> keptNow = now.stream().filter(then::contains).toList();
    if (!keptThen.equals(keptNow)) {
      changes.add(new Change("zones", "", Change.Status.CHANGED, null, List.of(new Change.Detail("order",
          String.join(" ", keptThen), String.join(" ", keptNow), "listed in another order (matters for ordered clusters)"))));
    }
  }

  /** Differences no phrase covers, component by component, so no change ever goes unreported. */
  static List<Change.Detail> generic(Object was, Object now) {
    List<Change.Detail> out = new ArrayList<>();
    Object a = ModelView.of(was);
    Object b = ModelView.of(now);
    if (a instanceof Map<?, ?> ma && b instanceof Map<?, ?> mb) {
      for (Object key : ma.keySet()) {
        if (!java.util.Objects.equals(ma.get(key), mb.get(key))) {
          String before = String.valueOf(ma.get(key));
          String after = String.valueOf(mb.get(key));
          out.add(new Change.Detail(key.toString(), before, after, key + " " + before + " → " + after));
        }
      }
    }
    if (out.isEmpty()) {
      out.add(new Change.Detail("value", String.valueOf(a), String.valueOf(b), "changed"));
    }
    return out;
  }

  private static <T> Map<String, T> byName(List<T> items, Function<T, String> name) {
    Map<String, T> map = new LinkedHashMap<>();
    items.forEach(item -> map.putIfAbsent(name.apply(item), item));
    return map;
  }
}
