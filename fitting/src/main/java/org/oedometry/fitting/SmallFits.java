package org.oedometry.fitting;

import org.oedometry.fitting.internal.LineFit;

/**
 * Small least-squares fits and a shape-preserving interpolation shared by the further methods. Pure
 * functions; they return null (never NaN) where the system is singular.
 */
final class SmallFits {

  private SmallFits() {}

  /**
   * Least-squares polynomial y = a<sub>0</sub> + a<sub>1</sub> u + ... + a<sub>k</sub> u<sup>k
   * </sup> through the points, by the normal equations on u / scale (scale = the largest |u|, which
   * keeps the system well conditioned for the low degrees used here), solved by Gaussian
   * elimination with partial pivoting.
   *
   * @return the coefficients in u (not in u / scale), or null if singular or not finite
   */
  static double[] polynomial(double[] u, double[] y, int degree) {
    int m = degree + 1;
    if (u.length < m) {
      return null;
    }
    double scale = 0;
    for (double value : u) {
      scale = Math.max(scale, Math.abs(value));
    }
    if (!(scale > 0)) {
      scale = 1;
    }
    // The normal matrix is a Hankel matrix: entry (r, c) is the power sum of order r + c, so 2m - 1
    // sums a point (added in the same order as entry by entry: the same bits).
    double[] powerSums = new double[2 * m - 1];
    double[] right = new double[m];
    for (int i = 0; i < u.length; i++) {
      double v = u[i] / scale;
      double p = 1;
      for (int k = 0; k < powerSums.length; k++) {
        powerSums[k] += p;
        if (k < m) {
          right[k] += p * y[i];
        }
        p *= v;
      }
    }
    double[][] a = new double[m][m + 1];
    for (int r = 0; r < m; r++) {
      for (int c = 0; c < m; c++) {
        a[r][c] = powerSums[r + c];
      }
      a[r][m] = right[r];
    }
    double[] solution = solve(a);
    if (solution == null) {
      return null;
    }
    double factor = 1;
    for (int k = 0; k < m; k++) {
      solution[k] /= factor;
      factor *= scale;
      if (!Double.isFinite(solution[k])) {
        return null;
      }
    }
    return solution;
  }

  /**
   * Variance of one coefficient of a least-squares polynomial ({@link #polynomial}): s<sup>2</sup>
   * [(V<sup>T</sup>V)<sup>-1</sup>]<sub>kk</sub>, with V the Vandermonde matrix of the points (in
   * u) and s<sup>2</sup> = RSS / (n - m) the residual variance, m = the number of coefficients.
   * Formed on u / scale as {@link #polynomial} is, and scaled back.
   *
   * @param u the abscissae
   * @param y the ordinates
   * @param coefficients the fitted coefficients in u, from {@link #polynomial}
   * @param index k, in [0, coefficients.length)
   * @return the variance, or positive infinity if n &le; m or the system is singular
   */
  static double coefficientVariance(double[] u, double[] y, double[] coefficients, int index) {
    int m = coefficients.length;
    int n = u.length;
    if (n <= m) {
      return Double.POSITIVE_INFINITY;
    }
    double scale = 0;
    for (double value : u) {
      scale = Math.max(scale, Math.abs(value));
    }
    if (!(scale > 0)) {
      scale = 1;
    }
    double squares = 0;
    double[] powerSums = new double[2 * m - 1];
    for (int i = 0; i < n; i++) {
      double fitted = 0;
      for (int k = m - 1; k >= 0; k--) {
        fitted = fitted * u[i] + coefficients[k];
      }
      double residual = y[i] - fitted;
      squares += residual * residual;
      double v = u[i] / scale;
      double p = 1;
      for (int k = 0; k < powerSums.length; k++) {
        powerSums[k] += p;
        p *= v;
      }
    }
    double[][] a = new double[m][m + 1];
    for (int r = 0; r < m; r++) {
      for (int c = 0; c < m; c++) {
        a[r][c] = powerSums[r + c];
      }
    }
    a[index][m] = 1;
    double[] column = solve(a);
    if (column == null) {
      return Double.POSITIVE_INFINITY;
    }
    // [(V^T V)^-1]_kk in u = the same in u / scale divided by scale^(2k).
    double inverse = column[index] / Math.pow(scale, 2.0 * index);
    double variance = squares / (n - m) * inverse;
    return Double.isFinite(variance) && variance >= 0 ? variance : Double.POSITIVE_INFINITY;
  }

  /**
   * Solves a small augmented system [A | b] in place by Gaussian elimination with partial pivoting.
   *
   * @return the solution, or null if the system is singular
   */
  static double[] solve(double[][] a) {
    int m = a.length;
    for (int col = 0; col < m; col++) {
      int pivot = col;
      for (int r = col + 1; r < m; r++) {
        if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) {
          pivot = r;
        }
      }
      double[] swap = a[col];
      a[col] = a[pivot];
      a[pivot] = swap;
      if (!(Math.abs(a[col][col]) > 1e-300)) {
        return null;
      }
      for (int r = 0; r < m; r++) {
        if (r != col) {
          double factor = a[r][col] / a[col][col];
          for (int c = col; c <= m; c++) {
            a[r][c] -= factor * a[col][c];
          }
        }
      }
    }
    double[] x = new double[m];
    for (int r = 0; r < m; r++) {
      x[r] = a[r][m] / a[r][r];
    }
    return x;
  }

  /**
   * Straight line y = intercept + slope x by ordinary least squares ({@link LineFit#of}, centred
   * sums), as an array.
   *
   * @return {intercept, slope}, or null if there are fewer than 2 points, the x values do not vary,
   *     or a result is not finite
   */
  static double[] line(double[] x, double[] y) {
    int n = x.length;
    if (n < 2) {
      return null;
    }
    boolean varies = false;
    for (double value : x) {
      if (value != x[0]) {
        varies = true;
        break;
      }
    }
    if (!varies) {
      return null;
    }
    LineFit fit = LineFit.of(x, y, 0, n);
    if (!Double.isFinite(fit.slope()) || !Double.isFinite(fit.intercept())) {
      return null;
    }
    return new double[] {fit.intercept(), fit.slope()};
  }

  /**
   * Monotone piecewise cubic Hermite interpolation (Fritsch &amp; Carlson 1980, SIAM J. Numer.
   * Anal. 17(2)), with the weighted harmonic mean of the neighbouring secants at interior knots and
   * the one-sided three-point shape-preserving formula at the ends: between two knots the
   * interpolant stays within the two values, and it is monotone wherever the data are.
   *
   * @param x knots, strictly increasing (at least 2)
   * @param y values at the knots
   * @param at where to evaluate, within [x<sub>0</sub>, x<sub>n-1</sub>] (clamped)
   * @return the interpolated values
   */
  static double[] monotoneCubic(double[] x, double[] y, double[] at) {
    int n = x.length;
    double[] h = new double[n - 1];
    double[] secant = new double[n - 1];
    for (int k = 0; k < n - 1; k++) {
      h[k] = x[k + 1] - x[k];
      secant[k] = (y[k + 1] - y[k]) / h[k];
    }
    double[] slope = new double[n];
    if (n == 2) {
      slope[0] = secant[0];
      slope[1] = secant[0];
    } else {
      for (int k = 1; k < n - 1; k++) {
        // Same sign, by the signs themselves: the product of two tiny secants underflows to 0.
        if (Math.signum(secant[k - 1]) * Math.signum(secant[k]) > 0) {
          double w1 = 2 * h[k] + h[k - 1];
          double w2 = h[k] + 2 * h[k - 1];
          slope[k] = (w1 + w2) / (w1 / secant[k - 1] + w2 / secant[k]);
        }
      }
      slope[0] = endSlope(h[0], h[1], secant[0], secant[1]);
      slope[n - 1] = endSlope(h[n - 2], h[n - 3], secant[n - 2], secant[n - 3]);
    }
    double[] out = new double[at.length];
    for (int j = 0; j < at.length; j++) {
      double v = Math.min(x[n - 1], Math.max(x[0], at[j]));
      int k = java.util.Arrays.binarySearch(x, v);
      if (k >= 0) {
        out[j] = y[k];
        continue;
      }
      k = Math.min(n - 2, -k - 2);
      double s = (v - x[k]) / h[k];
      double s2 = s * s;
      double s3 = s2 * s;
      out[j] =
          (2 * s3 - 3 * s2 + 1) * y[k]
              + (s3 - 2 * s2 + s) * h[k] * slope[k]
              + (-2 * s3 + 3 * s2) * y[k + 1]
              + (s3 - s2) * h[k] * slope[k + 1];
    }
    return out;
  }

  /** Shape-preserving three-point end slope (as in Moler's pchip). */
  private static double endSlope(double h0, double h1, double del0, double del1) {
    double d = ((2 * h0 + h1) * del0 - h0 * del1) / (h0 + h1);
    if (Math.signum(d) != Math.signum(del0)) {
      return 0;
    }
    if (Math.signum(del0) != Math.signum(del1) && Math.abs(d) > Math.abs(3 * del0)) {
      return 3 * del0;
    }
    return d;
  }
}
