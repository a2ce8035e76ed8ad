package org.oedometry.fitting;

import java.util.List;
import java.util.OptionalDouble;
import org.oedometry.fitting.internal.Checks;

/**
 * Result of the {@link LogTimeMethod} (Casagrande) construction on one increment. Settlements are
 * in the input's sign (negative changes for a swelling increment). Results feed engineering
 * decisions: they must be reviewed by a qualified engineer; local codes and standards govern.
 *
 * @param cv coefficient of consolidation c<sub>v</sub> = T<sub>50</sub> H<sub>dr</sub><sup>2</sup>
 *     / t50, m<sup>2</sup>/s, &gt; 0
 * @param t50 elapsed time at 50 % primary consolidation, s, &gt; 0
 * @param d0 settlement at 0 % primary consolidation (parabola rule), m
 * @param d50 (d0 + d100) / 2, m
 * @param d100 settlement at 100 % primary consolidation (tangent and secondary line), m
 * @param secondarySlope slope of the secondary line, m per log<sub>10</sub> cycle of time (the
 *     input's sign)
 * @param primaryRatio (d100 - d0) / (final reading - zero reading), dimensionless; empty when the
 *     curve has no reading at t = 0
 * @param drainagePath H<sub>dr</sub> used, m
 * @param timeFactor50 T<sub>50</sub> used, dimensionless
 * @param geometry the construction's lines and points
 * @param warnings doubts about the result; empty when there is nothing to say
 */
public record LogTimeResult(
    double cv,
    double t50,
    double d0,
    double d50,
    double d100,
    double secondarySlope,
    OptionalDouble primaryRatio,
    double drainagePath,
    double timeFactor50,
    LogTimeGeometry geometry,
    List<FitWarning> warnings)
    implements CvEstimate {

  /**
   * Creates a result.
   *
   * @param cv m<sup>2</sup>/s, finite, &gt; 0
   * @param t50 s, finite, &gt; 0
   * @param d0 m, finite
   * @param d50 m, finite
   * @param d100 m, finite
   * @param secondarySlope m per cycle, finite
   * @param primaryRatio finite when present; not null
   * @param drainagePath m, finite, &gt; 0
   * @param timeFactor50 finite, &gt; 0
   * @param geometry not null
   * @param warnings not null (copied)
   * @throws IllegalArgumentException if a value is null, not finite or out of range
   */
  public LogTimeResult {
    Results.requirePositive("c_v", cv, "m^2/s");
    Results.requirePositive("t50", t50, "s");
    Checks.requireFinite("d0", d0, "m");
    Checks.requireFinite("d50", d50, "m");
    Checks.requireFinite("d100", d100, "m");
    Checks.requireFinite("secondary slope", secondarySlope, "m per log10 cycle");
    Results.requireFiniteIfPresent("primary compression ratio", primaryRatio);
    Checks.requireDrainagePath(drainagePath);
    Results.requirePositive("time factor at 50 %", timeFactor50, "");
    if (geometry == null || warnings == null) {
      throw new IllegalArgumentException("geometry and warnings must not be null");
    }
    warnings = List.copyOf(warnings);
  }

  /**
   * The method: {@link CvMethod#LOG_TIME}.
   *
   * @return {@link CvMethod#LOG_TIME}
   */
  @Override
  public CvMethod method() {
    return CvMethod.LOG_TIME;
  }
}
