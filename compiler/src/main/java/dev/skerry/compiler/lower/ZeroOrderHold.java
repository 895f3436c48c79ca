package dev.skerry.compiler.lower;

/**
 * Zero-order-hold discretisation of a continuous linear system ẋ = A_c x + B_c u: with u held
 * constant over a step T, x⁺ = A x + B u where A = e^{A_c T} and B = ∫₀ᵀ e^{A_c s} ds B_c. Both come
 * from one exponential of the augmented matrix [[A_c, B_c], [0, 0]]·T, computed by a Taylor series
 * with scaling and squaring. The lowering takes its dynamics coefficients from here rather than
 * from a typed-in formula, and a test compares the double integrator's result with the textbook
 * closed form.
 */
public final class ZeroOrderHold {
  private ZeroOrderHold() {}

  /** A discrete system x⁺ = a·x + b·u. */
  public record Discrete(double[][] a, double[][] b) {}

  /** The double integrator of one axis: state (p, v), input u = acceleration. */
  public static Discrete doubleIntegrator(double step) {
    return discretise(new double[][] {{0, 1}, {0, 0}}, new double[][] {{0}, {1}}, step);
  }

  public static Discrete discretise(double[][] ac, double[][] bc, double step) {
    int n = ac.length;
    int m = bc[0].length;
    int size = n + m;
    double[][] aug = new double[size][size];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        aug[i][j] = ac[i][j] * step;
      }
      for (int j = 0; j < m; j++) {
        aug[i][n + j] = bc[i][j] * step;
      }
    }
    double[][] e = exp(aug);
    double[][] a = new double[n][n];
    double[][] b = new double[n][m];
    for (int i = 0; i < n; i++) {
      System.arraycopy(e[i], 0, a[i], 0, n);
      System.arraycopy(e[i], n, b[i], 0, m);
    }
    return new Discrete(a, b);
  }

  private static double[][] exp(double[][] x) {
    double norm = 0;
    for (double[] row : x) {
      double s = 0;
      for (double v : row) {
        s += Math.abs(v);
      }
      norm = Math.max(norm, s);
    }
    int squarings = norm > 0.5 ? (int) Math.ceil(Math.log(norm / 0.5) / Math.log(2)) : 0;
    double scale = Math.pow(2, -squarings);
    int n = x.length;
    double[][] scaled = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        scaled[i][j] = x[i][j] * scale;
      }
    }
    double[][] sum = identity(n);
    double[][] term = identity(n);
    for (int k = 1; k <= 30; k++) {
      term = multiply(term, scaled);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          term[i][j] /= k;
          sum[i][j] += term[i][j];
        }
      }
    }
    for (int s = 0; s < squarings; s++) {
      sum = multiply(sum, sum);
    }
    return sum;
  }

  private static double[][] identity(int n) {
    double[][] id = new double[n][n];
    for (int i = 0; i < n; i++) {
      id[i][i] = 1;
    }
    return id;
  }

  private static double[][] multiply(double[][] p, double[][] q) {
    int n = p.length;
    double[][] r = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int k = 0; k < n; k++) {
        if (p[i][k] != 0) {
          for (int j = 0; j < n; j++) {
            r[i][j] += p[i][k] * q[k][j];
          }
        }
      }
    }
    return r;
  }
}
