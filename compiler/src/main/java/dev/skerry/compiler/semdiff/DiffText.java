package dev.skerry.compiler.semdiff;

import java.util.ArrayList;
import java.util.List;

/** A diff report as lines of text: one line per changed entity, then the sizes. */
public final class DiffText {
  private DiffText() {}

  public static List<String> lines(DiffReport report) {
    List<String> out = new ArrayList<>();
    for (Change c : report.changes()) {
      out.add(line(c));
    }
    if (report.identical()) {
      out.add("no differences in meaning");
    }
    if (report.hasSizes() && !report.identical()) {
      SizeFigures a = report.sizesBefore();
      SizeFigures b = report.sizesAfter();
      out.add("sizes: " + String.join("; ", figure("binaries", a.binaries(), b.binaries()),
          figure("continuous", a.continuous(), b.continuous()), figure("rows", a.rows(), b.rows())));
    }
    return out;
  }

  static String line(Change c) {
    List<String> phrases = new ArrayList<>();
    for (Change.Detail d : c.details()) {
      phrases.add(d.phrase());
    }
    String subject = c.subject() + ": ";
    if (c.status() == Change.Status.ADDED) {
      return subject + "added" + (phrases.isEmpty() ? "" : ", " + String.join("; ", phrases));
    } else if (c.status() == Change.Status.REMOVED) {
      return subject + "removed";
    } else if (c.status() == Change.Status.RENAMED) {
      return subject + "renamed to " + c.newName();
    }
    return subject + String.join("; ", phrases);
  }

  private static String figure(String what, long before, long after) {
    String text = what + " " + before + " → " + after;
    return before == after ? text : text + " (" + Words.signed(after - before) + ")";
  }
}
