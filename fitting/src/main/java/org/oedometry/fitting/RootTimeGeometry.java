package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;

/**
 * What a host program needs to draw a {@link RootTimeMethod} construction, in plot coordinates x =
 * &radic;(t / 1 s) and y = settlement in m (the input's sign).
 *
 * @param earlyLine the straight line through the early readings; its value at x = 0 is d0; drawn
 *     from x = 0 to the crossing
 * @param factorLine the line from d0 with abscissae larger by the factor; drawn from x = 0 to the
 *     crossing
 * @param ninetyPoint its crossing with the curve: (&radic;t90, d90)
 * @param earlyLineFrom index in the input curve of the first reading of the early line
 * @param earlyLineTo index in the input curve after its last reading
 * @param factor the abscissa factor used, dimensionless
 * @param iterations rounds of the line - t90 - readings fixed point that were run, &ge; 1
 */
public record RootTimeGeometry(
    StraightLine earlyLine,
    StraightLine factorLine,
    PlotPoint ninetyPoint,
    int earlyLineFrom,
    int earlyLineTo,
    double factor,
    int iterations) {

  /**
   * Creates the geometry.
   *
   * @param earlyLine not null
   * @param factorLine not null
   * @param ninetyPoint not null
   * @param earlyLineFrom &ge; 0
   * @param earlyLineTo at least earlyLineFrom + 3
   * @param factor &gt; 1 and &lt; 2
   * @param iterations &ge; 1
   * @throws IllegalArgumentException if a value is null or out of range
   */
  public RootTimeGeometry {
    if (earlyLine == null || factorLine == null || ninetyPoint == null) {
      throw new IllegalArgumentException("root-time geometry: every part must be given");
    }
    if (earlyLineFrom < 0 || earlyLineTo < earlyLineFrom + 3) {
      throw new IllegalArgumentException(
          Checks.format(
              "early line readings from index %d to %d: need at least 3",
              earlyLineFrom, earlyLineTo));
    }
    Checks.requireBetween("root-time abscissa factor", factor, 1.0, 2.0);
    if (iterations < 1) {
      throw new IllegalArgumentException(Checks.format("iterations (%d) must be >= 1", iterations));
    }
  }
}
