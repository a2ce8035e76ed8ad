package org.oedometry.core.compressibility;

import java.util.Optional;

/**
 * The best split of ordered points into two straight lines, each of at least two points: the one
 * with the least total residual sum of squares among the splits where the later line bends the
 * required way. Used by the bilinear and work methods of sigma'<sub>p</sub>.
 *
 * @param split index of the first point of the later line (2 &le; split &le; n - 2)
 * @param early least-squares line through points [0, split)
 * @param late least-squares line through points [split, n)
 */
record TwoLineSplit(int split, LineFit early, LineFit late) {

  /** Which way the later line must bend relative to the earlier one. */
  enum Bend {
    /** The later line has the smaller slope (e.g. e against log stress steepening downwards). */
    DOWN,
    /** The later line has the larger slope (e.g. work against stress). */
    UP
  }

  /**
   * Finds the best split.
   *
   * @param x abscissae, ordered
   * @param y ordinates
   * @param bend the required bend
   * @return the best split, or empty if no split bends the required way (a split where a group
   *     admits no straight line, its abscissae all equal or its slope beyond the double range, is
   *     not a candidate)
   */
  static Optional<TwoLineSplit> best(double[] x, double[] y, Bend bend) {
    int n = x.length;
    TwoLineSplit best = null;
    double bestRss = Double.POSITIVE_INFINITY;
    for (int k = 2; k <= n - 2; k++) {
      LineFit early;
      LineFit late;
      try {
        early = LineFit.through(x, y, 0, k);
        late = LineFit.through(x, y, k, n);
      } catch (IllegalArgumentException noLine) {
        continue;
      }
      boolean bends =
          bend == Bend.DOWN ? late.slope() < early.slope() : late.slope() > early.slope();
      if (!bends) {
        continue;
      }
      double rss = early.residualSumOfSquares(x, y, 0, k) + late.residualSumOfSquares(x, y, k, n);
      if (rss < bestRss) {
        bestRss = rss;
        best = new TwoLineSplit(k, early, late);
      }
    }
    return Optional.ofNullable(best);
  }

  /**
   * Abscissa where the two lines meet.
   *
   * @return x of the intersection (infinite or NaN for parallel lines: the caller checks)
   */
  double intersection() {
    return (late.intercept() - early.intercept()) / (early.slope() - late.slope());
  }
}
