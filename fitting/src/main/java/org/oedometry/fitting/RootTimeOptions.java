package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.Terzaghi;

/**
 * Options of the {@link RootTimeMethod}: an immutable value made by {@link #defaults()} or {@link
 * #builder()}.
 *
 * <p>Defaults: the published abscissa factor {@value #PUBLISHED_FACTOR} (Taylor 1948) and the exact
 * time factor T<sub>90</sub> = {@link Terzaghi#TIME_FACTOR_90} (0.848085).
 *
 * <h2>The exact factor</h2>
 *
 * Early on U = (2/&radic;&pi;) &radic;T exactly (to 10<sup>-5</sup> up to T = 0.1), so the early
 * straight line on a &radic;t plot reaches U = 0.9 at &radic;T = 0.9 &radic;&pi; / 2, that is T =
 * 0.81 &pi;/4 = 0.636173. The true curve reaches U = 0.9 at &radic;T<sub>90</sub>; the line whose
 * abscissae are larger by F = &radic;T<sub>90</sub> / (0.9 &radic;&pi; / 2) = 1.154602 therefore
 * crosses the exact curve exactly at U = 90 %. {@link #EXACT_FACTOR} is computed by this formula
 * from {@link Terzaghi#TIME_FACTOR_90}, not typed. With the published 1.15 the crossing lands at U
 * = 89.68 % and c<sub>v</sub> comes out about 1.5 % high on an exact curve.
 */
public final class RootTimeOptions {

  /** The published abscissa factor, 1.15 (Taylor 1948). */
  public static final double PUBLISHED_FACTOR = 1.15;

  /**
   * The exact abscissa factor &radic;T<sub>90</sub> / (0.9 &radic;&pi; / 2) = 1.154602 (see the
   * class description).
   */
  public static final double EXACT_FACTOR =
      Math.sqrt(Terzaghi.TIME_FACTOR_90) / (0.9 * Math.sqrt(Math.PI) / 2.0);

  private static final RootTimeOptions DEFAULTS =
      new RootTimeOptions(PUBLISHED_FACTOR, Terzaghi.TIME_FACTOR_90);

  private final double factor;
  private final double timeFactor90;

  private RootTimeOptions(double factor, double timeFactor90) {
    this.factor = factor;
    this.timeFactor90 = timeFactor90;
  }

  /**
   * The documented defaults.
   *
   * @return options with factor 1.15 and the exact T<sub>90</sub>
   */
  public static RootTimeOptions defaults() {
    return DEFAULTS;
  }

  /**
   * A builder starting from the defaults.
   *
   * @return a new builder
   */
  public static Builder builder() {
    return new Builder();
  }

  /**
   * Ratio of the abscissae of the second line to those of the early line.
   *
   * @return the factor, dimensionless
   */
  public double factor() {
    return factor;
  }

  /**
   * Time factor used at 90 % consolidation.
   *
   * @return T<sub>90</sub>, dimensionless
   */
  public double timeFactor90() {
    return timeFactor90;
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof RootTimeOptions o
        && Double.compare(o.factor, factor) == 0
        && Double.compare(o.timeFactor90, timeFactor90) == 0;
  }

  @Override
  public int hashCode() {
    return 31 * Double.hashCode(factor) + Double.hashCode(timeFactor90);
  }

  @Override
  public String toString() {
    return "RootTimeOptions[factor=" + factor + ", timeFactor90=" + timeFactor90 + "]";
  }

  /** Builds {@link RootTimeOptions}; not thread-safe, use one builder per thread. */
  public static final class Builder {

    private double factor = PUBLISHED_FACTOR;
    private double timeFactor90 = Terzaghi.TIME_FACTOR_90;

    private Builder() {}

    /**
     * Sets the abscissa factor.
     *
     * @param value factor, dimensionless, &gt; 1 and &lt; 2
     * @return this builder
     * @throws IllegalArgumentException if out of that range or NaN
     */
    public Builder factor(double value) {
      factor = Checks.requireBetween("root-time abscissa factor", value, 1.0, 2.0);
      return this;
    }

    /**
     * Uses the exact factor {@link #EXACT_FACTOR}.
     *
     * @return this builder
     */
    public Builder exactFactor() {
      factor = EXACT_FACTOR;
      return this;
    }

    /**
     * Sets T<sub>90</sub>.
     *
     * @param value time factor at 90 % consolidation, dimensionless, &gt; 0.7 and &lt; 1
     * @return this builder
     * @throws IllegalArgumentException if out of that range or NaN
     */
    public Builder timeFactor90(double value) {
      timeFactor90 = Checks.requireBetween("time factor at 90 %", value, 0.7, 1.0);
      return this;
    }

    /**
     * Uses the published rounded T<sub>90</sub> = 0.848.
     *
     * @return this builder
     */
    public Builder publishedRoundedTimeFactor() {
      timeFactor90 = Terzaghi.ROUNDED_TIME_FACTOR_90;
      return this;
    }

    /**
     * Builds the options.
     *
     * @return the immutable options
     */
    public RootTimeOptions build() {
      return new RootTimeOptions(factor, timeFactor90);
    }
  }
}
