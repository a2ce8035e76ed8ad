package org.oedometry.core.compressibility;

import java.util.Arrays;
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
   * Least-squares line through the points (x[i], y[i]), i in [from, to). The abscissae and the
   * ordinates are each scaled by a power of 2 (exactly) to the order of 1 for the sums, and the
   * line scaled back, so that the sums of squares neither overflow nor underflow: for points of
   * ordinary size the result is bit for bit that of the unscaled sums.
   *
   * @throws IllegalArgumentException if fewer than two points are given, all x are equal, or the
   *     slope or intercept is beyond the double range (the message names the points' ranges)
   */
  static LineFit through(double[] x, double[] y, int from, int to) {
    int n = to - from;
    if (n < 2) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "a straight-line fit needs >= 2 points (%d given)", n));
    }
    int shiftX = scaleShift(x, from, to);
    int shiftY = scaleShift(y, from, to);
    double meanX = 0;
    double meanY = 0;
    for (int i = from; i < to; i++) {
      meanX += Math.scalb(x[i], shiftX);
      meanY += Math.scalb(y[i], shiftY);
    }
    meanX /= n;
    meanY /= n;
    double sxx = 0;
    double sxy = 0;
    double syy = 0;
    for (int i = from; i < to; i++) {
      double dx = Math.scalb(x[i], shiftX) - meanX;
      double dy = Math.scalb(y[i], shiftY) - meanY;
      sxx += dx * dx;
      sxy += dx * dy;
      syy += dy * dy;
    }
    if (!(sxx > 0)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "a straight-line fit needs distinct abscissae (all %s)",
              Math.scalb(meanX, -shiftX)));
    }
    double scaledSlope = sxy / sxx;
    double scaledIntercept = meanY - scaledSlope * meanX;
    double rss = 0;
    for (int i = from; i < to; i++) {
      double r =
          Math.scalb(y[i], shiftY) - (scaledIntercept + scaledSlope * Math.scalb(x[i], shiftX));
      rss += r * r;
    }
    double r2 = syy > 0 ? 1.0 - rss / syy : 1.0;
    r2 = Math.min(1.0, Math.max(0.0, r2));
    if (n == 2) {
      r2 = 1.0;
    }
    double slope = Math.scalb(scaledSlope, shiftX - shiftY);
    double intercept = Math.scalb(scaledIntercept, -shiftY);
    if (!Double.isFinite(slope) || !Double.isFinite(intercept)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "the straight line through %d points (x from %s to %s, y from %s to %s) has a slope"
                  + " or intercept beyond the double range",
              n,
              Arrays.stream(x, from, to).min().orElseThrow(),
              Arrays.stream(x, from, to).max().orElseThrow(),
              Arrays.stream(y, from, to).min().orElseThrow(),
              Arrays.stream(y, from, to).max().orElseThrow()));
    }
    return new LineFit(slope, intercept, r2, n);
  }

  /** The power of 2 that brings the largest magnitude in [from, to) to [1, 2); 0 if all are 0. */
  private static int scaleShift(double[] values, int from, int to) {
    double largest = 0;
    for (int i = from; i < to; i++) {
      largest = Math.max(largest, Math.abs(values[i]));
    }
    return largest > 0 ? -Math.getExponent(largest) : 0;
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
