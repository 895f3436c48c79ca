package dev.skerry.compiler.semdiff;

import dev.skerry.compiler.source.SourceRange;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A model value without its source positions: records become ordered maps of their components
 * (ranges left out), lists stay lists, everything else stays as it is. Two models mean the same
 * thing exactly when their views are equal, whatever the layout of the text they came from.
 */
public final class ModelView {
  private ModelView() {}

  public static Object of(Object value) {
    if (value instanceof Record record) {
      Map<String, Object> fields = new LinkedHashMap<>();
      fields.put("@", record.getClass().getSimpleName());
      for (RecordComponent c : record.getClass().getRecordComponents()) {
        if (c.getType() != SourceRange.class) {
          fields.put(c.getName(), of(read(record, c)));
        }
      }
      return fields;
    }
    if (value instanceof List<?> list) {
      List<Object> out = new ArrayList<>(list.size());
      list.forEach(item -> out.add(of(item)));
      return out;
    }
    if (value instanceof Double d && d == 0) {
      return 0.0;
    }
    return value;
  }

  /** The view without the component {@code name} (for telling a rename from a change). */
  public static Object without(Object value, String name) {
    Object view = of(value);
    if (view instanceof Map<?, ?> map) {
      Map<Object, Object> copy = new LinkedHashMap<>(map);
      copy.remove(name);
      return copy;
    }
    return view;
  }

  public static boolean sameMeaning(Object a, Object b) {
    return of(a).equals(of(b));
  }

  private static Object read(Record record, RecordComponent c) {
    try {
      return c.getAccessor().invoke(record);
    } catch (IllegalAccessException | InvocationTargetException e) {
      throw new IllegalStateException("cannot read " + c.getName() + " of " + record.getClass().getSimpleName(), e);
    }
  }
}
