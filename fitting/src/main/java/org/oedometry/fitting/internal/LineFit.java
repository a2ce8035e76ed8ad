package org.oedometry.fitting.internal;

/**
 * Ordinary least-squares straight line y = intercept + slope x, computed about the mean abscissa
 * (two passes) so that it keeps its accuracy when the abscissae are far from zero.
 *
 * @param slope dy/dx
 * @param intercept y at x = 0
 * @param centre mean abscissa of the points
 * @param valueAtCentre fitted y at the mean abscissa (the mean ordinate)
 * @param rootMeanSquare root-mean-square residual, units of y
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
    for (int i = from; i < to; i++) {
      double r = y[i] - my - slope * (x[i] - mx);
      ss += r * r;
    }
    return new LineFit(slope, my - slope * mx, mx, my, Math.sqrt(ss / n), n);
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
