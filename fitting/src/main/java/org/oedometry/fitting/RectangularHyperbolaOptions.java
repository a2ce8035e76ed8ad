package org.oedometry.fitting;

import java.util.Objects;

/**
 * Options of {@link RectangularHyperbolaMethod}: immutable; start from {@link #defaults()} and
 * change with the {@code with...} methods.
 *
 * <p>Defaults: settlement counted from the corrected zero of the early root-time line ({@link
 * Zero#EARLY_ROOT_TIME_LINE}); readings too sparse for the 60-90 % line resampled ({@code
 * resampleSparseReadings} true).
 *
 * @param zero where settlement &delta; in t/&delta; is counted from
 * @param resampleSparseReadings whether, when fewer than 2 readings lie between 60 % and 90 %
 *     consolidation, the line is fitted to settlements interpolated between the readings (with a
 *     warning) rather than refused with a {@link FitException}
 */
public record RectangularHyperbolaOptions(Zero zero, boolean resampleSparseReadings) {

  /** Where the settlement &delta; of t/&delta; is counted from. */
  public enum Zero {
    /**
     * From d<sub>0</sub>, the intercept at t = 0 of the straight line d = d<sub>0</sub> + S
     * &radic;t fitted to the readings before 50 % consolidation (60 % when fewer than 3 lie before
     * 50 %): Terzaghi's early curve is U = 2 &radic;(T/&pi;), so an instantaneous compression on
     * loading shows as the intercept and is taken away. Needs at least 3 readings before 60 %.
     */
    EARLY_ROOT_TIME_LINE,
    /**
     * From the start of the increment, as published (Sridharan &amp; Sreepada Rao 1981): an
     * instantaneous compression d<sub>i</sub> biases c<sub>v</sub> high (about 9 % for
     * d<sub>i</sub> = 4 % of d<sub>p</sub>, 24 % for 10 %, measured on exact curves).
     */
    START_OF_INCREMENT
  }

  /**
   * Validates the options.
   *
   * @param zero where settlement is counted from; not null
   * @param resampleSparseReadings whether sparse readings are resampled
   * @throws NullPointerException if zero is null
   */
  public RectangularHyperbolaOptions {
    Objects.requireNonNull(zero, "zero");
  }

  /**
   * The defaults listed in the class description.
   *
   * @return the default options
   */
  public static RectangularHyperbolaOptions defaults() {
    return new RectangularHyperbolaOptions(Zero.EARLY_ROOT_TIME_LINE, true);
  }

  /**
   * A copy with another zero of settlement.
   *
   * @param value where settlement is counted from; not null
   * @return the new options
   * @throws NullPointerException if null
   */
  public RectangularHyperbolaOptions withZero(Zero value) {
    return new RectangularHyperbolaOptions(value, resampleSparseReadings);
  }

  /**
   * A copy that resamples sparse readings, or refuses them.
   *
   * @param value true to resample (with a warning), false to throw {@link FitException}
   * @return the new options
   */
  public RectangularHyperbolaOptions withResampleSparseReadings(boolean value) {
    return new RectangularHyperbolaOptions(zero, value);
  }
}
