package org.oedometry.fitting;

import java.util.List;
import java.util.Objects;
import org.oedometry.fitting.internal.Checks;

/**
 * Result of {@link RectangularHyperbolaMethod}: c<sub>v</sub> from the line t/&delta; = m t + c
 * over 60-90 % consolidation, the line, t<sub>60</sub> and t<sub>90</sub>, d<sub>100</sub> and the
 * geometry to draw it. Plot coordinates: x = t in s, y = t/&delta; in s/m (&delta; the magnitude of
 * the settlement counted from d<sub>0</sub>). d<sub>0</sub> and d<sub>100</sub> are counted from
 * the start of the increment, in the sign of the input. All values are finite.
 *
 * <p>Results feed engineering decisions and must be reviewed by a qualified engineer; local codes
 * and standards govern.
 *
 * @param cv c<sub>v</sub> = (C/M) H<sub>dr</sub><sup>2</sup> m / c, m<sup>2</sup>/s
 * @param slope m, slope of t/&delta; against t, 1/m
 * @param intercept c, intercept of t/&delta; at t = 0, s/m
 * @param t60 time of 60 % consolidation on the fitted line, s
 * @param t90 time of 90 % consolidation on the fitted line, s
 * @param d0 the zero &delta; was counted from (the corrected zero of the early root-time line, or 0
 *     for the start of the increment), m
 * @param d100 end of primary consolidation, d<sub>0</sub> + M/m, m
 * @param zero where &delta; was counted from
 * @param resampled true if the line was fitted to settlements interpolated between sparse readings
 * @param readingsUsed the readings on the line (or the interpolated settlements when {@code
 *     resampled}), in plot coordinates
 * @param fittedLine the line from t<sub>60</sub> to t<sub>90</sub> (two points)
 * @param iterations choices of readings made until the set settled
 * @param drainagePath H<sub>dr</sub> used, m
 * @param warnings doubts about the result; empty when there are none
 */
public record RectangularHyperbolaResult(
    double cv,
    double slope,
    double intercept,
    double t60,
    double t90,
    double d0,
    double d100,
    RectangularHyperbolaOptions.Zero zero,
    boolean resampled,
    List<PlotPoint> readingsUsed,
    List<PlotPoint> fittedLine,
    int iterations,
    double drainagePath,
    List<FitWarning> warnings)
    implements CvEstimate {

  /**
   * Validates the result and copies the lists.
   *
   * @param cv m<sup>2</sup>/s, finite and &gt; 0
   * @param slope 1/m, finite and &gt; 0
   * @param intercept s/m, finite and &gt; 0
   * @param t60 s, finite and &gt; 0
   * @param t90 s, finite and &gt; 0
   * @param d0 m, finite
   * @param d100 m, finite
   * @param zero where &delta; was counted from; not null
   * @param resampled whether interpolated
   * @param readingsUsed the readings on the line
   * @param fittedLine two points
   * @param iterations &ge; 1
   * @param drainagePath H<sub>dr</sub>, m, finite and &gt; 0
   * @param warnings the warnings
   * @throws IllegalArgumentException if a value is not finite or out of range
   * @throws NullPointerException if a list or the zero is null
   */
  public RectangularHyperbolaResult {
    Results.requirePositive("cv", cv, "m^2/s");
    Results.requirePositive("slope of t/d", slope, "1/m");
    Results.requirePositive("intercept of t/d", intercept, "s/m");
    Results.requirePositive("t60", t60, "s");
    Results.requirePositive("t90", t90, "s");
    Checks.requireFinite("d0", d0, "m");
    Checks.requireFinite("d100", d100, "m");
    Objects.requireNonNull(zero, "zero");
    if (iterations < 1) {
      throw new IllegalArgumentException(Checks.format("iterations (%d) must be >= 1", iterations));
    }
    Checks.requireDrainagePath(drainagePath);
    readingsUsed = List.copyOf(readingsUsed);
    fittedLine = List.copyOf(fittedLine);
    warnings = List.copyOf(warnings);
  }

  /**
   * The method: {@link CvMethod#RECTANGULAR_HYPERBOLA}.
   *
   * @return {@link CvMethod#RECTANGULAR_HYPERBOLA}
   */
  @Override
  public CvMethod method() {
    return CvMethod.RECTANGULAR_HYPERBOLA;
  }

  /**
   * A summary for JShell: c<sub>v</sub> in m<sup>2</sup>/yr (Julian year), times in min,
   * d<sub>0</sub> and d<sub>100</sub> in mm and the warnings' kinds.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Checks.format(
        "RectangularHyperbolaResult[cv %.4g m^2/yr, t60 %.4g min, t90 %.4g min, d0 %s (%s),"
            + " d100 %s, %d %s on the line, H_dr %s, warnings %s]",
        cv * Results.JULIAN_YEAR_SECONDS,
        t60 / 60,
        t90 / 60,
        Results.millimetres(d0, ""),
        zero,
        Results.millimetres(d100, ""),
        readingsUsed.size(),
        resampled ? "interpolated settlements" : "readings",
        Results.millimetres(drainagePath, ""),
        warnings.stream().map(FitWarning::kind).toList());
  }
}
