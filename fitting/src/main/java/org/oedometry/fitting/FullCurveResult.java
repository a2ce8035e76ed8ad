package org.oedometry.fitting;

import java.util.List;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.CurveParameters;

/**
 * Result of {@link FullCurveMethod}: c<sub>v</sub> with its confidence interval, the corrected zero
 * and end of primary consolidation, the secondary slope, the fit's statistics and its warnings. All
 * values are finite; settlements are in the sign of the input (negative for a swelling increment).
 *
 * <p>Results feed engineering decisions and must be reviewed by a qualified engineer; local codes
 * and standards govern.
 *
 * @param cv fitted coefficient of consolidation c<sub>v</sub>, m<sup>2</sup>/s
 * @param cvLow lower end of the c<sub>v</sub> confidence interval, m<sup>2</sup>/s
 * @param cvHigh upper end of the c<sub>v</sub> confidence interval, m<sup>2</sup>/s
 * @param confidenceLevel level of the interval, e.g. 0.95
 * @param d0 corrected zero d<sub>i</sub>, the settlement at t = 0+ without the instantaneous
 *     (false) deformation, m
 * @param d100 end of primary consolidation d<sub>i</sub> + d<sub>p</sub>, m
 * @param secondarySlope secondary compression per log<sub>10</sub> cycle of time after primary
 *     consolidation, m (0 when fixed by the options)
 * @param parameters the fitted model parameters (d<sub>i</sub>, d<sub>p</sub>, c<sub>v</sub>, s)
 * @param standardErrors standard errors of d<sub>i</sub> (m), d<sub>p</sub> (m), ln c<sub>v</sub>
 *     (dimensionless) and s (m), in that order (s is 0 when not fitted)
 * @param residuals reading minus fitted settlement for each reading used (t &gt; 0), m
 * @param rootMeanSquareResidual &radic;(&Sigma;r<sup>2</sup>/n) of the residuals, m
 * @param rSquared coefficient of determination of the unweighted residuals
 * @param iterations Levenberg-Marquardt iterations of the best start (plus the refinement steps on
 *     every reading when the readings were grouped; see {@link FullCurveMethod})
 * @param evaluations model evaluations of the best start (plus the passes over every reading when
 *     grouped)
 * @param starts number of starts tried
 * @param startsAtBest number of starts that reached the best fit (c<sub>v</sub> within 0.1 %)
 * @param drainagePath the drainage path H<sub>dr</sub> used, m
 * @param timeFactorAtLastReading T = c<sub>v</sub> t<sub>last</sub> / H<sub>dr</sub><sup>2</sup>
 * @param fittedCurve the fitted curve for plotting, x = log<sub>10</sub>(t / 1 s), y = settlement
 *     in m, 100 points log-spaced over the readings
 * @param warnings doubts about the result; empty when there are none
 */
public record FullCurveResult(
    double cv,
    double cvLow,
    double cvHigh,
    double confidenceLevel,
    double d0,
    double d100,
    double secondarySlope,
    CurveParameters parameters,
    List<Double> standardErrors,
    List<Double> residuals,
    double rootMeanSquareResidual,
    double rSquared,
    int iterations,
    int evaluations,
    int starts,
    int startsAtBest,
    double drainagePath,
    double timeFactorAtLastReading,
    List<PlotPoint> fittedCurve,
    List<FitWarning> warnings)
    implements CvEstimate {

  /**
   * Validates the result and copies the lists.
   *
   * @param cv c<sub>v</sub>, m<sup>2</sup>/s
   * @param cvLow lower end of the interval, m<sup>2</sup>/s
   * @param cvHigh upper end of the interval, m<sup>2</sup>/s
   * @param confidenceLevel level of the interval
   * @param d0 corrected zero, m
   * @param d100 end of primary, m
   * @param secondarySlope secondary slope, m per log<sub>10</sub> cycle
   * @param parameters fitted parameters
   * @param standardErrors standard errors of the four parameters
   * @param residuals residuals, m
   * @param rootMeanSquareResidual RMS residual, m
   * @param rSquared coefficient of determination
   * @param iterations iterations
   * @param evaluations evaluations
   * @param starts starts tried
   * @param startsAtBest starts that reached the best fit
   * @param drainagePath H<sub>dr</sub>, m
   * @param timeFactorAtLastReading T at the last reading
   * @param fittedCurve points of the fitted curve
   * @param warnings warnings
   * @throws IllegalArgumentException if a number is not finite, the interval does not contain
   *     c<sub>v</sub>, or a list is null
   */
  public FullCurveResult {
    Checks.requireFinite("cv", cv, "m^2/s");
    if (!(cvLow > 0 && cvLow <= cv && cv <= cvHigh && Double.isFinite(cvHigh))) {
      throw new IllegalArgumentException(
          Checks.format(
              "c_v interval [%s, %s] m^2/s must be positive, finite and contain c_v (%s m^2/s)",
              cvLow, cvHigh, cv));
    }
    Checks.requireFinite("d0", d0, "m");
    Checks.requireFinite("d100", d100, "m");
    Checks.requireFinite("secondary slope", secondarySlope, "m");
    Checks.requireFinite("RMS residual", rootMeanSquareResidual, "m");
    Checks.requireFinite("R^2", rSquared, "");
    Checks.requireFinite("time factor at the last reading", timeFactorAtLastReading, "");
    if (parameters == null) {
      throw new IllegalArgumentException("parameters must not be null");
    }
    standardErrors = List.copyOf(standardErrors);
    residuals = FrozenDoubles.copyOf(residuals);
    fittedCurve = List.copyOf(fittedCurve);
    warnings = List.copyOf(warnings);
  }

  /**
   * The method: {@link CvMethod#FULL_CURVE}.
   *
   * @return {@link CvMethod#FULL_CURVE}
   */
  @Override
  public CvMethod method() {
    return CvMethod.FULL_CURVE;
  }

  /**
   * A summary for JShell: c<sub>v</sub> in m<sup>2</sup>/yr (Julian year) with its interval,
   * d<sub>0</sub>, d<sub>100</sub> and s in mm, and the warnings' kinds.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    double year = 365.25 * 86_400;
    return Checks.format(
        "FullCurveResult[cv %.4g m^2/yr (%.0f %% interval %.4g to %.4g), d0 %s, d100 %s,"
            + " secondary %s, RMS %s, T at last reading %.3g, H_dr %s,"
            + " warnings %s]",
        cv * year,
        100 * confidenceLevel,
        cvLow * year,
        cvHigh * year,
        Results.millimetres(d0, ""),
        Results.millimetres(d100, ""),
        Results.millimetres(secondarySlope, "/log cycle"),
        Results.micrometres(rootMeanSquareResidual),
        timeFactorAtLastReading,
        Results.millimetres(drainagePath, ""),
        warnings.stream().map(FitWarning::kind).toList());
  }
}
