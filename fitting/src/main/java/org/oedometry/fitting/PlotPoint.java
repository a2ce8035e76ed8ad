package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;

/**
 * A marked point of a construction in the coordinates of its plot (for the log-time method x =
 * log<sub>10</sub>(t / 1 s) and y = settlement in m; for the root-time method x = &radic;(t / 1 s)
 * and y = settlement in m).
 *
 * @param x abscissa in the plot's coordinate, finite
 * @param y ordinate, settlement in m, finite
 */
public record PlotPoint(double x, double y) {

  /**
   * Creates a point.
   *
   * @param x abscissa, finite
   * @param y ordinate, finite
   * @throws IllegalArgumentException if a coordinate is not finite
   */
  public PlotPoint {
    Checks.requireFinite("point abscissa", x, "");
    Checks.requireFinite("point ordinate", y, "m");
  }
}
