package dev.skerry.compiler.semdiff;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;

/** A diff report as one JSON document for tools. */
public final class DiffJson {
  private DiffJson() {}

  public static JsonObject of(DiffReport report) {
    JsonObject doc = new JsonObject();
    doc.addProperty("old", report.oldLabel());
    doc.addProperty("new", report.newLabel());
    doc.addProperty("identical", report.identical());
    JsonArray changes = new JsonArray();
    for (Change c : report.changes()) {
      JsonObject o = new JsonObject();
      o.addProperty("kind", c.kind());
      o.addProperty("name", c.name());
      o.addProperty("status", c.status().word());
      if (c.newName() != null) {
        o.addProperty("newName", c.newName());
      }
      JsonArray details = new JsonArray();
      for (Change.Detail d : c.details()) {
        JsonObject detail = new JsonObject();
        detail.addProperty("field", d.field());
        detail.addProperty("before", d.before());
        detail.addProperty("after", d.after());
        detail.addProperty("text", d.phrase());
        details.add(detail);
      }
      o.add("details", details);
      o.addProperty("text", DiffText.line(c));
      changes.add(o);
    }
    doc.add("changes", changes);
    if (report.hasSizes()) {
      JsonObject sizes = new JsonObject();
      sizes.add("before", figures(report.sizesBefore()));
      sizes.add("after", figures(report.sizesAfter()));
      doc.add("sizes", sizes);
    } else {
      doc.add("sizes", JsonNull.INSTANCE);
    }
    return doc;
  }

  public static String text(DiffReport report) {
    return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().serializeNulls().create().toJson(of(report));
  }

  private static JsonObject figures(SizeFigures f) {
    JsonObject o = new JsonObject();
    o.addProperty("binaries", f.binaries());
    o.addProperty("continuous", f.continuous());
    o.addProperty("rows", f.rows());
    return o;
  }
}
