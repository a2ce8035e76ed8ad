package org.oedometry.fitting;

import java.util.List;
import org.oedometry.fitting.internal.Checks;

/**
 * Result of {@link InflectionPointMethod}: c<sub>v</sub> from the time of the inflection of the
 * log-time curve, the inflection itself, the d<sub>0</sub> and d<sub>100</sub> its tangent implies,
 * and the geometry to draw it. Plot coordinates: x = log<sub>10</sub>(t / 1 s), y = settlement in
 * m. Settlements are in the sign of the input (negative for a swelling increment). All values are
 * finite.
 *
 * <p>Results feed engineering decisions and must be reviewed by a qualified engineer; local codes
 * and standards govern.
 *
 * @param cv c<sub>v</sub> = T<sub>I</sub> H<sub>dr</sub><sup>2</sup> / t<sub>I</sub>,
 *     m<sup>2</sup>/s
 * @param inflectionTime t<sub>I</sub>, the time of the steepest slope on log t, s
 * @param inflectionSettlement settlement at t<sub>I</sub> of the Terzaghi curve that gives the
 *     local fit, d<sub>0</sub> + U<sub>I</sub> (d<sub>100</sub> - d<sub>0</sub>), m
 * @param slopePerLogCycle slope of the curve at the inflection, m per log<sub>10</sub> cycle of
 *     time
 * @param d0 start of primary consolidation implied by the slope, d<sub>I</sub> - U<sub>I</sub>
 *     (d<sub>100</sub> - d<sub>0</sub>), m
 * @param d100 end of primary consolidation implied by the slope, d<sub>0</sub> + slope / 0.686845,
 *     m
 * @param windowHalfWidth half-width of the final local window, log<sub>10</sub> cycles
 * @param windowCorrection how far the final window's fit placed the inflection from where the same
 *     fit places it on Terzaghi's exact curve, log<sub>10</sub> cycles: subtracted from the fit's
 *     inflection to give {@link #inflectionTime()} (the spline of sparse readings gives only the
 *     first guess: every result is corrected)
 * @param inflectionPoint the inflection in plot coordinates
 * @param tangentLine the tangent at the inflection, from its crossing of d<sub>0</sub> to its
 *     crossing of d<sub>100</sub> (two points)
 * @param readingsUsed the readings of the final local window, in plot coordinates
 * @param drainagePath H<sub>dr</sub> used, m
 * @param warnings doubts about the result; empty when there are none
 */
public record InflectionPointResult(
    double cv,
    double inflectionTime,
    double inflectionSettlement,
    double slopePerLogCycle,
    double d0,
    double d100,
    double windowHalfWidth,
    double windowCorrection,
    PlotPoint inflectionPoint,
    List<PlotPoint> tangentLine,
    List<PlotPoint> readingsUsed,
    double drainagePath,
    List<FitWarning> warnings)
    implements CvEstimate {

  /**
   * Validates the result and copies the lists.
   *
   * @param cv c<sub>v</sub>, m<sup>2</sup>/s, finite and &gt; 0
   * @param inflectionTime t<sub>I</sub>, s, finite and &gt; 0
   * @param inflectionSettlement d<sub>I</sub>, m, finite
   * @param slopePerLogCycle m per log<sub>10</sub> cycle, finite
   * @param d0 m, finite
   * @param d100 m, finite
   * @param windowHalfWidth log<sub>10</sub> cycles, finite
   * @param windowCorrection log<sub>10</sub> cycles, finite
   * @param inflectionPoint not null
   * @param tangentLine two points
   * @param readingsUsed the readings of the window
   * @param drainagePath H<sub>dr</sub>, m, finite and &gt; 0
   * @param warnings the warnings
   * @throws IllegalArgumentException if a value is not finite or out of range
   * @throws NullPointerException if a list or the point is null
   */
  public InflectionPointResult {
    Results.requirePositive("cv", cv, "m^2/s");
    Results.requirePositive("inflection time", inflectionTime, "s");
    Checks.requireFinite("inflection settlement", inflectionSettlement, "m");
    Checks.requireFinite("slope per log cycle", slopePerLogCycle, "m");
    Checks.requireFinite("d0", d0, "m");
    Checks.requireFinite("d100", d100, "m");
    Checks.requireFinite("window half-width", windowHalfWidth, "log10 cycles");
    Checks.requireFinite("window correction", windowCorrection, "log10 cycles");
    Checks.requireDrainagePath(drainagePath);
    java.util.Objects.requireNonNull(inflectionPoint, "inflectionPoint");
    tangentLine = List.copyOf(tangentLine);
    readingsUsed = List.copyOf(readingsUsed);
    warnings = List.copyOf(warnings);
  }

  /**
   * The method: {@link CvMethod#INFLECTION_POINT}.
   *
   * @return {@link CvMethod#INFLECTION_POINT}
   */
  @Override
  public CvMethod method() {
    return CvMethod.INFLECTION_POINT;
  }

  /**
   * A summary for JShell: c<sub>v</sub> in m<sup>2</sup>/yr (Julian year), t<sub>I</sub> in min,
   * settlements in mm, the window and its correction, and the warnings' kinds.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Checks.format(
        "InflectionPointResult[cv %.4g m^2/yr, t_I %.4g min, d_I %s, slope %s,"
            + " d0 %s, d100 %s, %d readings in window of +/-%.3g log cycle (correction"
            + " %.3g cycle), H_dr %s, warnings %s]",
        cv * Results.JULIAN_YEAR_SECONDS,
        inflectionTime / 60,
        Results.millimetres(inflectionSettlement, ""),
        Results.millimetres(slopePerLogCycle, "/log cycle"),
        Results.millimetres(d0, ""),
        Results.millimetres(d100, ""),
        readingsUsed.size(),
        windowHalfWidth,
        windowCorrection,
        Results.millimetres(drainagePath, ""),
        warnings.stream().map(FitWarning::kind).toList());
  }
}
