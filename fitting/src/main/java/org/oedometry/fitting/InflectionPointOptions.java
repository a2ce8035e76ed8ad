package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;

/**
 * Options of {@link InflectionPointMethod}: immutable; start from {@link #defaults()} and change
 * with the {@code with...} methods.
 *
 * <p>Defaults: local fits over at least &plusmn;0.2 log<sub>10</sub> cycle of time around each
 * point, widened until the window holds at least 7 readings.
 *
 * @param windowHalfWidth smallest half-width of the local fitting window, log<sub>10</sub> cycles
 *     of time; in [0.05, 1]
 * @param minimumWindowReadings fewest readings a window holds (it is widened on sparse schedules
 *     until it does); in [6, 50]
 */
public record InflectionPointOptions(double windowHalfWidth, int minimumWindowReadings) {

  /**
   * Validates the options.
   *
   * @param windowHalfWidth log<sub>10</sub> cycles, in [0.05, 1]
   * @param minimumWindowReadings in [6, 50]
   * @throws IllegalArgumentException if a value is out of range or NaN
   */
  public InflectionPointOptions {
    if (!(windowHalfWidth >= 0.05 && windowHalfWidth <= 1)) {
      throw new IllegalArgumentException(
          Checks.format(
              "window half-width (%s log10 cycles) must be in [0.05, 1]", windowHalfWidth));
    }
    if (minimumWindowReadings < 6 || minimumWindowReadings > 50) {
      throw new IllegalArgumentException(
          Checks.format(
              "minimum readings in a window (%d) must be in [6, 50]", minimumWindowReadings));
    }
  }

  /**
   * The defaults listed in the class description.
   *
   * @return the default options
   */
  public static InflectionPointOptions defaults() {
    return new InflectionPointOptions(0.2, 7);
  }

  /**
   * A copy with another smallest window half-width.
   *
   * @param value log<sub>10</sub> cycles, in [0.05, 1]
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public InflectionPointOptions withWindowHalfWidth(double value) {
    return new InflectionPointOptions(value, minimumWindowReadings);
  }

  /**
   * A copy with another fewest number of readings in a window.
   *
   * @param value in [6, 50]
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public InflectionPointOptions withMinimumWindowReadings(int value) {
    return new InflectionPointOptions(windowHalfWidth, value);
  }
}
