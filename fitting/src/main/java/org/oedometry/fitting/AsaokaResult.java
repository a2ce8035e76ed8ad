package org.oedometry.fitting;

import java.util.List;
import java.util.Objects;
import org.oedometry.fitting.internal.Checks;

/**
 * Result of {@link AsaokaMethod}: c<sub>v</sub> and the final settlement from the line s<sub>n
 * </sub> = b<sub>0</sub> + b<sub>1</sub> s<sub>n-1</sub>, the window and time step, and the
 * geometry to draw it. The Asaoka plot has x = s<sub>n-1</sub> and y = s<sub>n</sub>, both in m;
 * the sampled settlements are given as x = t in s, y = settlement in m. Settlements are in the sign
 * of the input (negative for a swelling increment). All values are finite.
 *
 * <p>Results feed engineering decisions and must be reviewed by a qualified engineer; local codes
 * and standards govern.
 *
 * @param cv c<sub>v</sub> = -4 H<sub>dr</sub><sup>2</sup> ln(b<sub>1</sub>) / (&pi;<sup>2</sup>
 *     &Delta;t), m<sup>2</sup>/s
 * @param b0 intercept b<sub>0</sub> of the line, m
 * @param b1 slope b<sub>1</sub> of the line, in (0, 1)
 * @param finalSettlement b<sub>0</sub> / (1 - b<sub>1</sub>), the settlement the primary
 *     consolidation tends to, m
 * @param timeStep &Delta;t, s
 * @param windowStart time of the first sampled settlement, s
 * @param windowEnd time of the last sampled settlement, s
 * @param t50 time of 50 % consolidation on this c<sub>v</sub>, T<sub>50</sub> H<sub>dr</sub>
 *     <sup>2</sup> / c<sub>v</sub>, s
 * @param resampled true if the settlements were interpolated, false if they are readings
 * @param sampledSettlements the equally spaced settlements used (x = t in s, y = m)
 * @param asaokaPoints the pairs (s<sub>n-1</sub>, s<sub>n</sub>) the line was fitted to, m:
 *     consecutive sampled settlements when resampled; for equally spaced readings every reading of
 *     the window with the one a time step later (so more pairs than sampled settlements)
 * @param fittedLine the line over the pairs, from the smallest s<sub>n-1</sub> to the final
 *     settlement on the 45&deg; line (two points)
 * @param drainagePath H<sub>dr</sub> used, m
 * @param warnings doubts about the result; empty when there are none
 */
public record AsaokaResult(
    double cv,
    double b0,
    double b1,
    double finalSettlement,
    double timeStep,
    double windowStart,
    double windowEnd,
    double t50,
    boolean resampled,
    List<PlotPoint> sampledSettlements,
    List<PlotPoint> asaokaPoints,
    List<PlotPoint> fittedLine,
    double drainagePath,
    List<FitWarning> warnings)
    implements CvEstimate {

  /**
   * Validates the result and copies the lists.
   *
   * @param cv m<sup>2</sup>/s, finite and &gt; 0
   * @param b0 m, finite
   * @param b1 in (0, 1)
   * @param finalSettlement m, finite
   * @param timeStep s, finite and &gt; 0
   * @param windowStart s, finite and &gt; 0
   * @param windowEnd s, finite and &gt; windowStart
   * @param t50 s, finite and &gt; 0
   * @param resampled whether interpolated
   * @param sampledSettlements the settlements used
   * @param asaokaPoints the pairs
   * @param fittedLine two points
   * @param drainagePath H<sub>dr</sub>, m, finite and &gt; 0
   * @param warnings the warnings
   * @throws IllegalArgumentException if a value is not finite or out of range
   * @throws NullPointerException if a list is null
   */
  public AsaokaResult {
    Results.requirePositive("cv", cv, "m^2/s");
    Checks.requireFinite("b0", b0, "m");
    Checks.requireBetween("b1", b1, 0, 1);
    Checks.requireFinite("final settlement", finalSettlement, "m");
    Results.requirePositive("time step", timeStep, "s");
    Results.requirePositive("window start", windowStart, "s");
    Results.requirePositive("window end", windowEnd, "s");
    if (!(windowEnd > windowStart)) {
      throw new IllegalArgumentException(
          Checks.format(
              "window end (%s s) must be after window start (%s s)", windowEnd, windowStart));
    }
    Results.requirePositive("t50", t50, "s");
    Checks.requireDrainagePath(drainagePath);
    sampledSettlements = List.copyOf(Objects.requireNonNull(sampledSettlements));
    asaokaPoints = List.copyOf(asaokaPoints);
    fittedLine = List.copyOf(fittedLine);
    warnings = List.copyOf(warnings);
  }

  /**
   * The method: {@link CvMethod#ASAOKA}.
   *
   * @return {@link CvMethod#ASAOKA}
   */
  @Override
  public CvMethod method() {
    return CvMethod.ASAOKA;
  }

  /**
   * A summary for JShell: c<sub>v</sub> in m<sup>2</sup>/yr (Julian year), b<sub>0</sub> in mm,
   * b<sub>1</sub>, final settlement in mm, times in min and the warnings' kinds.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Checks.format(
        "AsaokaResult[cv %.4g m^2/yr, b0 %s, b1 %.5f, final %s, step %.4g min, window"
            + " %.4g to %.4g min, %s, H_dr %s, warnings %s]",
        cv * Results.JULIAN_YEAR_SECONDS,
        Results.millimetres(b0, ""),
        b1,
        Results.millimetres(finalSettlement, ""),
        timeStep / 60,
        windowStart / 60,
        windowEnd / 60,
        resampled ? "resampled" : "readings",
        Results.millimetres(drainagePath, ""),
        warnings.stream().map(FitWarning::kind).toList());
  }
}
