package org.oedometry.fitting;

import java.util.Objects;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.ConsolidationCurveModel;

/**
 * Options of {@link FullCurveMethod}: immutable; start from {@link #defaults()} and change with the
 * {@code with...} methods.
 *
 * <p>Defaults: readings weighted to balance log-time ({@link ReadingWeights#LOG_TIME_BALANCE}),
 * secondary compression fitted, secondary onset T<sub>s</sub> = 2 (see {@link
 * ConsolidationCurveModel}), 95 % confidence interval, at most 200 Levenberg-Marquardt iterations
 * per start.
 *
 * @param weights how the readings are weighted
 * @param fitSecondary true to fit the secondary slope s; false fixes s = 0 (pure Terzaghi)
 * @param secondaryOnset T<sub>s</sub> of the secondary term, &gt; 0
 * @param confidenceLevel level of the c<sub>v</sub> interval, in [0.5, 0.999]
 * @param maxIterations Levenberg-Marquardt iterations per start, &ge; 10
 */
public record FullCurveOptions(
    ReadingWeights weights,
    boolean fitSecondary,
    double secondaryOnset,
    double confidenceLevel,
    int maxIterations) {

  /** How readings are weighted in the least-squares fit. */
  public enum ReadingWeights {
    /**
     * Each reading weighs the span of log<sub>10</sub> t it represents (half the distance to its
     * neighbours on log t), normalised to a mean of 1: every decade of time counts about equally,
     * so a data logger's thousands of late readings do not swamp the early, primary part. The
     * readings' noise is still taken as equal for the confidence interval (a sandwich estimate of
     * the covariance).
     */
    LOG_TIME_BALANCE,
    /** Every reading weighs 1 (ordinary least squares). */
    UNIT
  }

  /**
   * Validates the options.
   *
   * @param weights how the readings are weighted; not null
   * @param fitSecondary true to fit the secondary slope
   * @param secondaryOnset T<sub>s</sub>, finite and &gt; 0
   * @param confidenceLevel in [0.5, 0.999]
   * @param maxIterations &ge; 10
   * @throws IllegalArgumentException if a value is out of range or NaN
   * @throws NullPointerException if weights is null
   */
  public FullCurveOptions {
    Objects.requireNonNull(weights, "weights");
    if (!(secondaryOnset > 0) || secondaryOnset == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          Checks.format("secondary onset time factor (%s) must be finite and > 0", secondaryOnset));
    }
    if (!(confidenceLevel >= 0.5 && confidenceLevel <= 0.999)) {
      throw new IllegalArgumentException(
          Checks.format("confidence level (%s) must be in [0.5, 0.999]", confidenceLevel));
    }
    if (maxIterations < 10) {
      throw new IllegalArgumentException(
          Checks.format("maximum iterations (%d) must be >= 10", maxIterations));
    }
  }

  /**
   * The defaults listed in the class description.
   *
   * @return the default options
   */
  public static FullCurveOptions defaults() {
    return new FullCurveOptions(
        ReadingWeights.LOG_TIME_BALANCE,
        true,
        ConsolidationCurveModel.DEFAULT_SECONDARY_ONSET,
        0.95,
        200);
  }

  /**
   * A copy with other reading weights.
   *
   * @param value the weights; not null
   * @return the new options
   */
  public FullCurveOptions withWeights(ReadingWeights value) {
    return new FullCurveOptions(
        value, fitSecondary, secondaryOnset, confidenceLevel, maxIterations);
  }

  /**
   * A copy that fits the secondary slope or fixes it at zero.
   *
   * @param value true to fit s, false for pure Terzaghi (s = 0)
   * @return the new options
   */
  public FullCurveOptions withSecondary(boolean value) {
    return new FullCurveOptions(weights, value, secondaryOnset, confidenceLevel, maxIterations);
  }

  /**
   * A copy with another secondary onset time factor.
   *
   * @param value T<sub>s</sub>, finite and &gt; 0
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public FullCurveOptions withSecondaryOnset(double value) {
    return new FullCurveOptions(weights, fitSecondary, value, confidenceLevel, maxIterations);
  }

  /**
   * A copy with another confidence level.
   *
   * @param value in [0.5, 0.999]
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public FullCurveOptions withConfidenceLevel(double value) {
    return new FullCurveOptions(weights, fitSecondary, secondaryOnset, value, maxIterations);
  }

  /**
   * A copy with another iteration limit.
   *
   * @param value &ge; 10
   * @return the new options
   * @throws IllegalArgumentException if out of range
   */
  public FullCurveOptions withMaxIterations(int value) {
    return new FullCurveOptions(weights, fitSecondary, secondaryOnset, confidenceLevel, value);
  }
}
