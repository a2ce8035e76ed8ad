package org.oedometry.core.compressibility;

import java.util.Locale;

/**
 * A straight line y = intercept + slope &middot; x fitted by ordinary least squares, in the
 * coordinates of the plot it belongs to (stated where it is returned).
 *
 * <p>The fit uses the centred closed form slope = &Sigma;(x &minus; x&#772;)(y &minus; y&#772;) /
 * &Sigma;(x &minus; x&#772;)<sup>2</sup>, intercept = y&#772; &minus; slope &middot; x&#772;, which
 * is accurate to a few ulp of the data for well-spread abscissae. R<sup>2</sup> = 1 &minus;
 * SS<sub>res</sub> / SS<sub>tot</sub>; it is exactly 1 through two points and is taken as 1 when
 * all ordinates are equal (the horizontal fit is then exact).
 *
 * @param slope dy/dx in the plot's units; finite
 * @param intercept y at x = 0 in the plot's units; finite
 * @param rSquared coefficient of determination, in [0, 1]
 * @param pointCount number of points fitted, &ge; 2
 */
public record LineFit(double slope, double intercept, double rSquared, int pointCount) {

  /**
   * Validates the numbers.
   *
   * @param slope dy/dx in the plot's units; finite
   * @param intercept y at x = 0 in the plot's units; finite
   * @param rSquared coefficient of determination, in [0, 1]
   * @param pointCount number of points fitted, &ge; 2
   * @throws IllegalArgumentException if a number is not finite, R<sup>2</sup> is outside [0, 1] or
   *     fewer than two points are claimed
   */
  public LineFit {
    Checks.finite("slope", slope, "");
    Checks.finite("intercept", intercept, "");
    if (!(rSquared >= 0 && rSquared <= 1)) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "R squared (%s) must be in [0, 1]", rSquared));
    }
    if (pointCount < 2) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "point count (%d) must be >= 2", pointCount));
    }
  }

  /**
   * Ordinate of the line at an abscissa.
   *
   * @param x abscissa in the plot's units
   * @return intercept + slope &middot; x
   */
  public double valueAt(double x) {
    return intercept + slope * x;
  }

  /**
   * Least-squares line through the points (x[i], y[i]), i in [from, to).
   *
   * @throws IllegalArgumentException if fewer than two points are given or all x are equal
   */
  static LineFit through(double[] x, double[] y, int from, int to) {
    int n = to - from;
    if (n < 2) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "a straight-line fit needs >= 2 points (%d given)", n));
    }
    double meanX = 0;
    double meanY = 0;
    for (int i = from; i < to; i++) {
      meanX += x[i];
      meanY += y[i];
    }
    meanX /= n;
    meanY /= n;
    double sxx = 0;
    double sxy = 0;
    double syy = 0;
    for (int i = from; i < to; i++) {
      double dx = x[i] - meanX;
      double dy = y[i] - meanY;
      sxx += dx * dx;
      sxy += dx * dy;
      syy += dy * dy;
    }
    if (!(sxx > 0)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "a straight-line fit needs distinct abscissae (all %s)", meanX));
    }
    double slope = sxy / sxx;
    double intercept = meanY - slope * meanX;
    double rss = 0;
    for (int i = from; i < to; i++) {
      double r = y[i] - (intercept + slope * x[i]);
      rss += r * r;
    }
    double r2 = syy > 0 ? 1.0 - rss / syy : 1.0;
    r2 = Math.min(1.0, Math.max(0.0, r2));
    if (n == 2) {
      r2 = 1.0;
    }
    return new LineFit(slope, intercept, r2, n);
  }

  /** Residual sum of squares of this line over the points (x[i], y[i]), i in [from, to). */
  double residualSumOfSquares(double[] x, double[] y, int from, int to) {
    double rss = 0;
    for (int i = from; i < to; i++) {
      double r = y[i] - valueAt(x[i]);
      rss += r * r;
    }
    return rss;
  }
}
