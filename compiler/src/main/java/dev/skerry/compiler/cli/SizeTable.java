package dev.skerry.compiler.cli;

import com.google.gson.JsonObject;
import dev.skerry.compiler.check.CheckResult;
import java.io.PrintWriter;

/** The predicted MILP sizes of a checked scenario, as a text table and as JSON. */
final class SizeTable {
  private SizeTable() {}

  static void print(PrintWriter out, CheckResult result) {
    if (result.scenario() == null) {
      return;
    }
  }

  static void addJson(JsonObject report, CheckResult result) {
    if (result.scenario() == null) {
      return;
    }
  }
}
