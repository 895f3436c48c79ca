package dev.skerry.compiler.cli;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import dev.skerry.compiler.diag.Diagnostic;
import dev.skerry.compiler.source.SourceRange;
import java.util.List;

/** Diagnostics as JSON objects for machines: positions 1-based, as the text output prints them. */
final class DiagnosticJson {
  private DiagnosticJson() {}

  static JsonArray of(List<Diagnostic> diagnostics) {
    JsonArray array = new JsonArray();
    for (Diagnostic d : diagnostics) {
      JsonObject o = new JsonObject();
      o.addProperty("severity", d.severity().label());
      o.addProperty("code", d.code().id());
      o.addProperty("message", d.message());
      o.add("range", range(d.range()));
      JsonArray related = new JsonArray();
      for (Diagnostic.Related r : d.related()) {
        JsonObject ro = new JsonObject();
        ro.addProperty("message", r.message());
        ro.add("range", range(r.range()));
        related.add(ro);
      }
      o.add("related", related);
      array.add(o);
    }
    return array;
  }

  static JsonObject range(SourceRange r) {
    JsonObject o = new JsonObject();
    o.addProperty("file", r.source().displayName());
    o.addProperty("line", r.line());
    o.addProperty("column", r.column());
    o.addProperty("endLine", r.endLine());
    o.addProperty("endColumn", r.endColumn());
    return o;
  }
}
