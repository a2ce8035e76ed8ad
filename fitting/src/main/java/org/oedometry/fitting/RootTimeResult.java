package org.oedometry.fitting;

import java.util.List;
import java.util.OptionalDouble;
import org.oedometry.fitting.internal.Checks;

/**
 * Result of the {@link RootTimeMethod} (Taylor) construction on one increment. Settlements are in
 * the input's sign. Results feed engineering decisions: they must be reviewed by a qualified
 * engineer; local codes and standards govern.
 *
 * @param cv coefficient of consolidation c<sub>v</sub> = T<sub>90</sub> H<sub>dr</sub><sup>2</sup>
 *     / t90, m<sup>2</sup>/s, &gt; 0
 * @param t90 elapsed time at 90 % primary consolidation, s, &gt; 0
 * @param d0 intercept of the early line at t = 0, m
 * @param d90 settlement where the factor line crosses the curve, m
 * @param d100 d0 + (d90 - d0) / 0.9, m
 * @param initialRatio (d0 - zero reading) / (final reading - zero reading), dimensionless; empty
 *     without a reading at t = 0
 * @param primaryRatio 10 (d90 - d0) / (9 (final reading - zero reading)), dimensionless; empty
 *     without a reading at t = 0 (common textbook definitions, from memory: Craig)
 * @param drainagePath H<sub>dr</sub> used, m
 * @param timeFactor90 T<sub>90</sub> used, dimensionless
 * @param geometry the construction's lines and points
 * @param warnings doubts about the result; empty when there is nothing to say
 */
public record RootTimeResult(
    double cv,
    double t90,
    double d0,
    double d90,
    double d100,
    OptionalDouble initialRatio,
    OptionalDouble primaryRatio,
    double drainagePath,
    double timeFactor90,
    RootTimeGeometry geometry,
    List<FitWarning> warnings)
    implements CvEstimate {

  /**
   * Creates a result.
   *
   * @param cv m<sup>2</sup>/s, finite, &gt; 0
   * @param t90 s, finite, &gt; 0
   * @param d0 m, finite
   * @param d90 m, finite
   * @param d100 m, finite
   * @param initialRatio finite when present; not null
   * @param primaryRatio finite when present; not null
   * @param drainagePath m, finite, &gt; 0
   * @param timeFactor90 finite, &gt; 0
   * @param geometry not null
   * @param warnings not null (copied)
   * @throws IllegalArgumentException if a value is null, not finite or out of range
   */
  public RootTimeResult {
    Results.requirePositive("c_v", cv, "m^2/s");
    Results.requirePositive("t90", t90, "s");
    Checks.requireFinite("d0", d0, "m");
    Checks.requireFinite("d90", d90, "m");
    Checks.requireFinite("d100", d100, "m");
    Results.requireFiniteIfPresent("initial compression ratio", initialRatio);
    Results.requireFiniteIfPresent("primary compression ratio", primaryRatio);
    Checks.requireDrainagePath(drainagePath);
    Results.requirePositive("time factor at 90 %", timeFactor90, "");
    if (geometry == null || warnings == null) {
      throw new IllegalArgumentException("geometry and warnings must not be null");
    }
    warnings = List.copyOf(warnings);
  }

  /**
   * The method: {@link CvMethod#ROOT_TIME}.
   *
   * @return {@link CvMethod#ROOT_TIME}
   */
  @Override
  public CvMethod method() {
    return CvMethod.ROOT_TIME;
  }
}
