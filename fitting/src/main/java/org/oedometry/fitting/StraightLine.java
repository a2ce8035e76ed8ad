package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;

/**
 * A straight line of a construction, y = intercept + slope x, in the coordinates of its plot (see
 * {@link PlotPoint}), with the stretch of x over which a drawing should show it.
 *
 * @param slope dy/dx: m per log<sub>10</sub> cycle on the log-time plot, m per &radic;s on the
 *     root-time plot; finite
 * @param intercept y at x = 0, m; finite
 * @param fromX left end of the drawn stretch, finite
 * @param toX right end of the drawn stretch, finite, &ge; fromX
 */
public record StraightLine(double slope, double intercept, double fromX, double toX) {

  /**
   * Creates a line.
   *
   * @param slope slope, finite
   * @param intercept intercept, m, finite
   * @param fromX left end, finite
   * @param toX right end, finite, &ge; fromX
   * @throws IllegalArgumentException if a value is not finite, toX &lt; fromX, or the ordinate at
   *     either end overflows (so that {@link #start()} and {@link #end()} always give finite
   *     points)
   */
  public StraightLine {
    Checks.requireFinite("line slope", slope, "");
    Checks.requireFinite("line intercept", intercept, "m");
    Checks.requireFinite("line start", fromX, "");
    Checks.requireFinite("line end", toX, "");
    if (!(toX >= fromX)) {
      throw new IllegalArgumentException(
          Checks.format("line end (%s) must not be before line start (%s)", toX, fromX));
    }
    Checks.requireFinite("line ordinate at its start", intercept + slope * fromX, "m");
    Checks.requireFinite("line ordinate at its end", intercept + slope * toX, "m");
  }

  /**
   * Ordinate of the line.
   *
   * @param x abscissa in the plot's coordinate
   * @return intercept + slope x, m
   */
  public double valueAt(double x) {
    return intercept + slope * x;
  }

  /**
   * Left end point of the drawn stretch.
   *
   * @return (fromX, valueAt(fromX))
   */
  public PlotPoint start() {
    return new PlotPoint(fromX, valueAt(fromX));
  }

  /**
   * Right end point of the drawn stretch.
   *
   * @return (toX, valueAt(toX))
   */
  public PlotPoint end() {
    return new PlotPoint(toX, valueAt(toX));
  }
}
