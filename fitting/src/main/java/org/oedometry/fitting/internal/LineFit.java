package org.oedometry.fitting.internal;

/**
 * Ordinary least-squares straight line y = intercept + slope x, computed about the mean abscissa
 * (two passes) so that it keeps its accuracy when the abscissae are far from zero.
 *
 * @param slope dy/dx
 * @param intercept y at x = 0
 * @param centre mean abscissa of the points
 * @param valueAtCentre fitted y at the mean abscissa (the mean ordinate)
 * @param rootMeanSquare root-mean-square residual, units of y (finite for finite residuals: sums of
 *     squares that overflow or underflow are taken on residuals scaled by the largest)
 * @param count number of points
 */
public record LineFit(
    double slope,
    double intercept,
    double centre,
    double valueAtCentre,
    double rootMeanSquare,
    int count) {

  /**
   * A sum of squared residuals below this (2<sup>-900</sup>) may have lost digits to underflow: the
   * root-mean-square is then taken on residuals scaled by the largest.
   */
  private static final double SMALLEST_PLAIN_SQUARES = 0x1.0p-900;

  /**
   * Fits points from to to-1 of the arrays; with one point the line is horizontal through it; with
   * abscissae all equal the slope is 0.
   *
   * @param x abscissae
   * @param y ordinates
   * @param from first index, inclusive
   * @param to last index, exclusive, &gt; from
   * @return the fit
   */
  public static LineFit of(double[] x, double[] y, int from, int to) {
    int n = to - from;
    double mx = 0;
    double my = 0;
    for (int i = from; i < to; i++) {
      mx += x[i];
      my += y[i];
    }
    mx /= n;
    my /= n;
    double sxx = 0;
    double sxy = 0;
    for (int i = from; i < to; i++) {
      double dx = x[i] - mx;
      sxx += dx * dx;
      sxy += dx * (y[i] - my);
    }
    double slope = sxx > 0 ? sxy / sxx : 0.0;
    double ss = 0;
    double largest = 0;
    for (int i = from; i < to; i++) {
      double r = y[i] - my - slope * (x[i] - mx);
      ss += r * r;
      largest = Math.max(largest, Math.abs(r));
    }
    double rootMeanSquare = Math.sqrt(ss / n);
    if (largest > 0 && (ss == Double.POSITIVE_INFINITY || ss < SMALLEST_PLAIN_SQUARES)) {
      // Squares beyond the double range (residuals above about 1e154 or below 1e-154 of the
      // unit): the same sum divided by the largest residual squared, then scaled back.
      double scaled = 0;
      for (int i = from; i < to; i++) {
        double r = (y[i] - my - slope * (x[i] - mx)) / largest;
        scaled += r * r;
      }
      rootMeanSquare = largest * Math.sqrt(scaled / n);
    }
    return new LineFit(slope, my - slope * mx, mx, my, rootMeanSquare, n);
  }

  /**
   * Fitted value.
   *
   * @param at abscissa
   * @return valueAtCentre + slope (at - centre)
   */
  public double valueAt(double at) {
    return valueAtCentre + slope * (at - centre);
  }
}
