package org.oedometry.core.compressibility;

import java.util.Optional;

/**
 * The best split of ordered points into two straight lines, each of at least two points: the one
 * with the least total residual sum of squares among the splits where the later line bends the
 * required way. Used by the bilinear and work methods of sigma'<sub>p</sub>.
 *
 * <p>Rounding: two slopes that differ by no more than {@link #BEND_TOLERANCE} of the larger
 * magnitude do not count as a bend, so collinear points (whose line fits differ by a few ulps) show
 * none; and a meeting point within {@link #GAP_TOLERANCE} (relative) of an end of the gap between
 * the groups counts as in the gap, so lines that meet at a point shared by both groups are not
 * reported as meeting away from the break.
 *
 * @param split index of the first point of the later line (2 &le; split &le; n - 2)
 * @param early least-squares line through points [0, split)
 * @param late least-squares line through points [split, n)
 */
record TwoLineSplit(int split, LineFit early, LineFit late) {

  /**
   * Slopes that differ by no more than this fraction of the larger magnitude count as equal: the
   * least-squares fits through collinear points differ by rounding (about 1e-15 relative), which
   * must not decide a bend. Far below the bend of any measured curve.
   */
  static final double BEND_TOLERANCE = 1e-9;

  /**
   * A meeting stress within this fraction of an end of the gap between the groups counts as in the
   * gap (rounding of the intersection of two fitted lines, about 1e-13 relative).
   */
  static final double GAP_TOLERANCE = 1e-9;

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
      double change =
          bend == Bend.DOWN ? early.slope() - late.slope() : late.slope() - early.slope();
      boolean bends =
          change > BEND_TOLERANCE * Math.max(Math.abs(early.slope()), Math.abs(late.slope()));
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
   * Whether a meeting stress lies outside the gap between the two groups, beyond rounding.
   *
   * @param stress where the lines meet, Pa
   * @param lastEarly stress of the last point of the early group, Pa, &gt; 0
   * @param firstLate stress of the first point of the late group, Pa, &gt; lastEarly
   * @return true if stress is below lastEarly or above firstLate by more than {@link
   *     #GAP_TOLERANCE} of that stress
   */
  static boolean outsideGap(double stress, double lastEarly, double firstLate) {
    return stress < lastEarly * (1 - GAP_TOLERANCE) || stress > firstLate * (1 + GAP_TOLERANCE);
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
