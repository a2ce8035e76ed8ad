package org.oedometry.core;

import org.oedometry.core.internal.Checks;
import org.oedometry.theory.Drainage;

/**
 * Which specimen height an increment's drainage path H<sub>dr</sub> is taken from.
 *
 * <p>The specimen gets thinner during a loading increment, so H<sub>dr</sub> (half the height for
 * double drainage, the height for single drainage) depends on the moment the height is taken. Since
 * c<sub>v</sub> = T H<sub>dr</sub><sup>2</sup> / t, the choice matters most for large increments of
 * soft soil. A report states the rule used.
 */
public enum DrainagePathRule {
  /** The height at the start of the increment (before the load is applied). */
  START_HEIGHT,
  /**
   * The height at 50 % primary consolidation, d<sub>50</sub> = (d<sub>0</sub> + d<sub>100</sub>) /
   * 2, the usual practice of ASTM D2435 (from memory). It needs the fitted d<sub>0</sub> and
   * d<sub>100</sub>, so a method that uses it iterates once: fit with the start height, then again
   * with the height at d<sub>50</sub>. The default of {@link OedometerTest}.
   */
  HEIGHT_AT_HALF_CONSOLIDATION,
  /**
   * The mean of the heights at the start and end of the increment, the usual practice of BS 1377
   * (from memory).
   */
  MEAN_HEIGHT;

  /**
   * The drainage path this rule gives, from the heights of one increment.
   *
   * @param drainage double or single drainage
   * @param heightAtStartMetres specimen height at the start of the increment, m; finite, &gt; 0
   * @param heightAtHalfConsolidationMetres specimen height at 50 % primary consolidation, m;
   *     finite, &gt; 0 (used only by {@link #HEIGHT_AT_HALF_CONSOLIDATION}, but always checked)
   * @param heightAtEndMetres specimen height at the end of the increment, m; finite, &gt; 0
   * @return H<sub>dr</sub>, m: half (double drainage) or all (single drainage) of the chosen height
   * @throws IllegalArgumentException if a height is not finite and positive
   * @throws NullPointerException if drainage is null
   */
  public double drainagePath(
      Drainage drainage,
      double heightAtStartMetres,
      double heightAtHalfConsolidationMetres,
      double heightAtEndMetres) {
    if (drainage == null) {
      throw new NullPointerException("drainage must not be null");
    }
    Checks.positive(heightAtStartMetres, "height at start", "m");
    Checks.positive(heightAtHalfConsolidationMetres, "height at half consolidation", "m");
    Checks.positive(heightAtEndMetres, "height at end", "m");
    double height =
        switch (this) {
          case START_HEIGHT -> heightAtStartMetres;
          case HEIGHT_AT_HALF_CONSOLIDATION -> heightAtHalfConsolidationMetres;
          case MEAN_HEIGHT -> mean(heightAtStartMetres, heightAtEndMetres);
        };
    return drainage.drainagePath(height);
  }

  /** The mean of two finite positive heights, without overflow when their sum exceeds a double. */
  private static double mean(double a, double b) {
    double sum = a + b;
    return Double.isFinite(sum) ? 0.5 * sum : 0.5 * a + 0.5 * b;
  }

  /**
   * Whether the rule needs the height at 50 % primary consolidation, which only a fitted curve
   * gives (d<sub>0</sub> and d<sub>100</sub>): true for {@link #HEIGHT_AT_HALF_CONSOLIDATION}.
   *
   * @return true if a fit must come before the drainage path is known
   */
  public boolean needsFittedCurve() {
    return this == HEIGHT_AT_HALF_CONSOLIDATION;
  }
}
