package dev.skerry.compiler.io;

import dev.skerry.compiler.milp.Milp;
import dev.skerry.compiler.milp.Row;
import java.util.List;

/**
 * The constraint matrix stored by column (MPS lists coefficients column after column), with zero
 * coefficients left out. Three flat arrays, so a million rows cost tens of megabytes, not millions
 * of objects.
 */
final class ColumnMajor {
  /** Entries of column j sit at positions {@code start[j] .. start[j+1]-1}. */
  final int[] start;

  final int[] rows;
  final double[] values;

  private ColumnMajor(int[] start, int[] rows, double[] values) {
    this.start = start;
    this.rows = rows;
    this.values = values;
  }

  static ColumnMajor of(Milp milp) {
    int n = milp.columnCount();
    List<Row> rowList = milp.rows();
    int[] start = new int[n + 1];
    for (Row r : rowList) {
      double[] coefs = r.coefs();
      int[] cols = r.cols();
      for (int k = 0; k < cols.length; k++) {
        if (coefs[k] != 0) {
          start[cols[k] + 1]++;
        }
      }
    }
    for (int j = 0; j < n; j++) {
      start[j + 1] += start[j];
    }
    int[] next = new int[n];
    System.arraycopy(start, 0, next, 0, n);
    int[] rows = new int[start[n]];
    double[] values = new double[start[n]];
    for (int i = 0; i < rowList.size(); i++) {
      Row r = rowList.get(i);
      double[] coefs = r.coefs();
      int[] cols = r.cols();
      for (int k = 0; k < cols.length; k++) {
        if (coefs[k] != 0) {
          int at = next[cols[k]]++;
          rows[at] = i;
          values[at] = coefs[k];
        }
      }
    }
    return new ColumnMajor(start, rows, values);
  }

  long nonZeros() {
    return rows.length;
  }
}
