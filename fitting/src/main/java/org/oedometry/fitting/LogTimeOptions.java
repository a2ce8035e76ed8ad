package org.oedometry.fitting;

import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.Terzaghi;

/**
 * Options of the {@link LogTimeMethod}: an immutable value made by {@link #defaults()} or {@link
 * #builder()}.
 *
 * <p>Default: the exact time factor T<sub>50</sub> = {@link Terzaghi#TIME_FACTOR_50} (0.1967307).
 * The published rounded 0.197 ({@link Terzaghi#ROUNDED_TIME_FACTOR_50}), printed in every standard
 * table, makes c<sub>v</sub> 0.137 % higher; choose it with {@link
 * Builder#publishedRoundedTimeFactor()} to match a worksheet that uses it.
 */
public final class LogTimeOptions {

  private static final LogTimeOptions DEFAULTS = new LogTimeOptions(Terzaghi.TIME_FACTOR_50);

  private final double timeFactor50;

  private LogTimeOptions(double timeFactor50) {
    this.timeFactor50 = timeFactor50;
  }

  /**
   * The documented defaults.
   *
   * @return options with the exact T<sub>50</sub>
   */
  public static LogTimeOptions defaults() {
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
   * Time factor used at 50 % consolidation.
   *
   * @return T<sub>50</sub>, dimensionless
   */
  public double timeFactor50() {
    return timeFactor50;
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof LogTimeOptions o && Double.compare(o.timeFactor50, timeFactor50) == 0;
  }

  @Override
  public int hashCode() {
    return Double.hashCode(timeFactor50);
  }

  @Override
  public String toString() {
    return "LogTimeOptions[timeFactor50=" + timeFactor50 + "]";
  }

  /** Builds {@link LogTimeOptions}; not thread-safe, use one builder per thread. */
  public static final class Builder {

    private double timeFactor50 = Terzaghi.TIME_FACTOR_50;

    private Builder() {}

    /**
     * Sets T<sub>50</sub>.
     *
     * @param value time factor at 50 % consolidation, dimensionless, &gt; 0.1 and &lt; 0.3
     * @return this builder
     * @throws IllegalArgumentException if out of that range or NaN
     */
    public Builder timeFactor50(double value) {
      timeFactor50 = Checks.requireBetween("time factor at 50 %", value, 0.1, 0.3);
      return this;
    }

    /**
     * Uses the published rounded T<sub>50</sub> = 0.197.
     *
     * @return this builder
     */
    public Builder publishedRoundedTimeFactor() {
      timeFactor50 = Terzaghi.ROUNDED_TIME_FACTOR_50;
      return this;
    }

    /**
     * Builds the options.
     *
     * @return the immutable options
     */
    public LogTimeOptions build() {
      return new LogTimeOptions(timeFactor50);
    }
  }
}
