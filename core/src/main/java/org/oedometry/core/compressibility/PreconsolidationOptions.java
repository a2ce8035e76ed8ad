package org.oedometry.core.compressibility;

import java.util.Locale;

/**
 * Options of the preconsolidation constructions. Immutable; build with {@link #builder()} or use
 * {@link #defaults()}.
 *
 * <p>Defaults: the virgin line is fitted through the last {@value #DEFAULT_VIRGIN_LINE_POINTS}
 * points of the loading envelope (common practice: the straight part of the curve at the highest
 * stresses).
 *
 * @param virginLinePoints number of points, counted back from the highest stress of the loading
 *     envelope, through which the virgin line is fitted (Casagrande, Pacheco Silva); &ge; 2
 */
public record PreconsolidationOptions(int virginLinePoints) {

  /** Default number of virgin-line points: {@value}. */
  public static final int DEFAULT_VIRGIN_LINE_POINTS = 3;

  /**
   * Validates the options.
   *
   * @param virginLinePoints number of points, counted back from the highest stress of the loading
   *     envelope, through which the virgin line is fitted (Casagrande, Pacheco Silva); &ge; 2
   * @throws IllegalArgumentException if the number of virgin-line points is below 2
   */
  public PreconsolidationOptions {
    if (virginLinePoints < 2) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "virgin line points (%d) must be >= 2", virginLinePoints));
    }
  }

  /**
   * The documented defaults.
   *
   * @return the default options
   */
  public static PreconsolidationOptions defaults() {
    return new PreconsolidationOptions(DEFAULT_VIRGIN_LINE_POINTS);
  }

  /**
   * A builder starting from the defaults.
   *
   * @return a new builder
   */
  public static Builder builder() {
    return new Builder();
  }

  /** Builder of {@link PreconsolidationOptions}; not thread-safe, the built value is. */
  public static final class Builder {
    private int virginLinePoints = DEFAULT_VIRGIN_LINE_POINTS;

    private Builder() {}

    /**
     * Sets the number of virgin-line points.
     *
     * @param count &ge; 2
     * @return this builder
     */
    public Builder virginLinePoints(int count) {
      this.virginLinePoints = count;
      return this;
    }

    /**
     * Builds the options.
     *
     * @return the options
     * @throws IllegalArgumentException if a value is out of range
     */
    public PreconsolidationOptions build() {
      return new PreconsolidationOptions(virginLinePoints);
    }
  }
}
