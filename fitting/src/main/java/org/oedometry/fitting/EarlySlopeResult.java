package org.oedometry.fitting;

import java.util.List;
import java.util.Objects;
import org.oedometry.fitting.internal.Checks;

/**
 * Result of {@link EarlySlopeMethod}: c<sub>v</sub> from the early slope on &radic;t and the
 * primary compression, with the line and the geometry to draw it. Plot coordinates: x = &radic;(t /
 * 1 s), y = settlement in m. Settlements are in the sign of the input (negative for a swelling
 * increment). All values are finite.
 *
 * <p>Results feed engineering decisions and must be reviewed by a qualified engineer; local codes
 * and standards govern.
 *
 * @param cv c<sub>v</sub> = (&pi;/4) H<sub>dr</sub><sup>2</sup> (S/d<sub>p</sub>)<sup>2</sup>,
 *     m<sup>2</sup>/s
 * @param earlySlope S, slope of settlement against &radic;t over the early readings, m/&radic;s
 * @param d0 intercept of the early line at t = 0 (the corrected zero), m
 * @param d100 end of primary consolidation, from the source chosen in the options, m
 * @param primaryCompression d<sub>p</sub> = d<sub>100</sub> - d<sub>0</sub>, m
 * @param t50 time at which the early line reaches d<sub>0</sub> + d<sub>p</sub>/2, s
 * @param primaryEnd where d<sub>100</sub> came from
 * @param readingsUsed the early readings on the line, in plot coordinates
 * @param earlyLine the early line from (0, d<sub>0</sub>) to its crossing of d<sub>100</sub> (two
 *     points)
 * @param drainagePath H<sub>dr</sub> used, m
 * @param warnings doubts about the result; empty when there are none
 */
public record EarlySlopeResult(
    double cv,
    double earlySlope,
    double d0,
    double d100,
    double primaryCompression,
    double t50,
    EarlySlopeOptions.PrimaryEnd primaryEnd,
    List<PlotPoint> readingsUsed,
    List<PlotPoint> earlyLine,
    double drainagePath,
    List<FitWarning> warnings)
    implements CvEstimate {

  /**
   * Validates the result and copies the lists.
   *
   * @param cv m<sup>2</sup>/s, finite and &gt; 0
   * @param earlySlope m/&radic;s, finite
   * @param d0 m, finite
   * @param d100 m, finite
   * @param primaryCompression m, finite
   * @param t50 s, finite and &gt; 0
   * @param primaryEnd not null
   * @param readingsUsed the early readings
   * @param earlyLine two points
   * @param drainagePath H<sub>dr</sub>, m, finite and &gt; 0
   * @param warnings the warnings
   * @throws IllegalArgumentException if a value is not finite or out of range
   * @throws NullPointerException if a list or the source is null
   */
  public EarlySlopeResult {
    Results.requirePositive("cv", cv, "m^2/s");
    Checks.requireFinite("early slope", earlySlope, "m/s^0.5");
    Checks.requireFinite("d0", d0, "m");
    Checks.requireFinite("d100", d100, "m");
    Checks.requireFinite("primary compression", primaryCompression, "m");
    Results.requirePositive("t50", t50, "s");
    Objects.requireNonNull(primaryEnd, "primaryEnd");
    Checks.requireDrainagePath(drainagePath);
    readingsUsed = List.copyOf(readingsUsed);
    earlyLine = List.copyOf(earlyLine);
    warnings = List.copyOf(warnings);
  }

  /**
   * The method: {@link CvMethod#EARLY_SLOPE}.
   *
   * @return {@link CvMethod#EARLY_SLOPE}
   */
  @Override
  public CvMethod method() {
    return CvMethod.EARLY_SLOPE;
  }

  /**
   * A summary for JShell: c<sub>v</sub> in m<sup>2</sup>/yr (Julian year), settlements in mm, t50
   * in min and the warnings' kinds.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Checks.format(
        "EarlySlopeResult[cv %.4g m^2/yr, slope %s, d0 %s, d100 %s (%s),"
            + " t50 %.4g min, %d early readings, H_dr %s, warnings %s]",
        cv * Results.JULIAN_YEAR_SECONDS,
        Results.millimetres(earlySlope, "/s^0.5"),
        Results.millimetres(d0, ""),
        Results.millimetres(d100, ""),
        primaryEnd,
        t50 / 60,
        readingsUsed.size(),
        Results.millimetres(drainagePath, ""),
        warnings.stream().map(FitWarning::kind).toList());
  }
}
