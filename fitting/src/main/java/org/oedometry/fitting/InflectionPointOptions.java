package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;

/**
 * Options of {@link InflectionPointMethod}: immutable; start from {@link #defaults()} and change
 * with the {@code with...} methods.
 *
 * <p>Defaults: the steepest point is sought with local fits over &plusmn;0.2 log<sub>10</sub> cycle
 * of time; the inflection is then located with windows of half-width 0.2, 0.3, ... up to 1.2 cycle
 * (the one whose inflection has the smallest standard error is kept); every window is widened until
 * it holds at least 8 readings. Setting the widest equal to the narrowest half-width fixes the
 * window (the correction for the window's bias on Terzaghi's curve is still applied).
 *
 * @param windowHalfWidth narrowest half-width of the local fitting windows, log<sub>10</sub> cycles
 *     of time; in [0.05, 1]. It is also the half-width of the scan for the steepest point and how
 *     far the readings must reach beyond the inflection.
 * @param widestHalfWidth widest half-width tried, log<sub>10</sub> cycles; in [windowHalfWidth, 2]
 * @param minimumWindowReadings fewest readings a window holds (it is widened on sparse schedules
 *     until it does); in [8, 50] (the local polynomial of degree 5 leaves two degrees of freedom at
 *     8). A value comparable with the number of readings makes every window span most of the curve,
 *     and curves that only just complete primary consolidation may then be refused as showing no
 *     inflection (exact Terzaghi curves on the usual 14 lab readings with T = 1 at the last one:
 *     found with 8 to 12 a window, refused with 13; 3 of 3,000 random exact curves with half or
 *     more of their readings a window); such a refusal says so and names the default
 */
public record InflectionPointOptions(
    double windowHalfWidth, double widestHalfWidth, int minimumWindowReadings) {

  /**
   * Validates the options.
   *
   * @param windowHalfWidth log<sub>10</sub> cycles, in [0.05, 1]
   * @param widestHalfWidth log<sub>10</sub> cycles, in [windowHalfWidth, 2]
   * @param minimumWindowReadings in [8, 50]
   * @throws IllegalArgumentException if a value is out of range or NaN
   */
  public InflectionPointOptions {
    if (!(windowHalfWidth >= 0.05 && windowHalfWidth <= 1)) {
      throw new IllegalArgumentException(
          Checks.format(
              "window half-width (%s log10 cycles) must be in [0.05, 1]", windowHalfWidth));
    }
    if (!(widestHalfWidth >= windowHalfWidth && widestHalfWidth <= 2)) {
      throw new IllegalArgumentException(
          Checks.format(
              "widest window half-width (%s log10 cycles) must be in [%s, 2] (the narrowest"
                  + " half-width to 2)",
              widestHalfWidth, windowHalfWidth));
    }
    if (minimumWindowReadings < 8 || minimumWindowReadings > 50) {
      throw new IllegalArgumentException(
          Checks.format(
              "minimum readings in a window (%d) must be in [8, 50]", minimumWindowReadings));
    }
  }

  /**
   * The defaults listed in the class description.
   *
   * @return the default options
   */
  public static InflectionPointOptions defaults() {
    return new InflectionPointOptions(0.2, 1.2, 8);
  }

  /**
   * A copy with another narrowest window half-width; the widest is raised to it if it was smaller.
   *
   * @param value log<sub>10</sub> cycles, in [0.05, 1]
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public InflectionPointOptions withWindowHalfWidth(double value) {
    return new InflectionPointOptions(
        value,
        Double.isNaN(value) ? widestHalfWidth : Math.max(value, widestHalfWidth),
        minimumWindowReadings);
  }

  /**
   * A copy with another widest window half-width.
   *
   * @param value log<sub>10</sub> cycles, in [{@link #windowHalfWidth()}, 2]
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public InflectionPointOptions withWidestHalfWidth(double value) {
    return new InflectionPointOptions(windowHalfWidth, value, minimumWindowReadings);
  }

  /**
   * A copy with another fewest number of readings in a window.
   *
   * @param value in [8, 50]
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public InflectionPointOptions withMinimumWindowReadings(int value) {
    return new InflectionPointOptions(windowHalfWidth, widestHalfWidth, value);
  }
}
