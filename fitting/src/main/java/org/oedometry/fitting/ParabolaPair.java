package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;

/**
 * One pair of the log-time parabola rule (Casagrande and Fadum 1940): a reading at t<sub>1</sub>,
 * the interpolated curve at t<sub>2</sub> = 4 t<sub>1</sub>, and the d0 they imply, d0 =
 * d<sub>1</sub> - (d<sub>2</sub> - d<sub>1</sub>) (settlement proportional to &radic;t early on).
 *
 * @param earlyTime t<sub>1</sub>, s, &gt; 0 (a reading's time)
 * @param earlySettlement d<sub>1</sub>, m
 * @param laterTime t<sub>2</sub> = 4 t<sub>1</sub>, s
 * @param laterSettlement d<sub>2</sub>, m, interpolated
 * @param d0 2 d<sub>1</sub> - d<sub>2</sub>, m
 */
public record ParabolaPair(
    double earlyTime, double earlySettlement, double laterTime, double laterSettlement, double d0) {

  /**
   * Creates a pair.
   *
   * @param earlyTime t<sub>1</sub>, s, finite, &gt; 0
   * @param earlySettlement d<sub>1</sub>, m, finite
   * @param laterTime t<sub>2</sub>, s, finite, &gt; earlyTime
   * @param laterSettlement d<sub>2</sub>, m, finite
   * @param d0 m, finite
   * @throws IllegalArgumentException if a value is not finite or the times are not ordered
   */
  public ParabolaPair {
    if (!(earlyTime > 0) || !(laterTime > earlyTime) || laterTime == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          Checks.format(
              "parabola pair times (%s s, %s s) must be finite, > 0 and increasing",
              earlyTime, laterTime));
    }
    Checks.requireFinite("early settlement", earlySettlement, "m");
    Checks.requireFinite("later settlement", laterSettlement, "m");
    Checks.requireFinite("d0 of the pair", d0, "m");
  }
}
