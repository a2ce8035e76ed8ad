package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Preconsolidation pressure by the work method of Becker et al. (1987): two straight lines on the
 * plot of work per unit volume against effective stress, both on arithmetic axes.
 *
 * <p>Work: along the loading envelope, starting from the seating state (stress
 * &sigma;'<sub>0</sub>, strain 0), W<sub>i</sub> = &Sigma;<sub>j&le;i</sub>
 * &frac12;(&sigma;'<sub>j&minus;1</sub> + &sigma;'<sub>j</sub>)(&epsilon;<sub>j</sub> &minus;
 * &epsilon;<sub>j&minus;1</sub>), with &epsilon; = (e<sub>0</sub> &minus; e) / (1 + e<sub>0</sub>)
 * the axial strain (trapezoidal rule in stress). W is in J/m^3 (= Pa). Across an
 * unloading-reloading loop the work is accumulated between envelope points only, so the loop's
 * hysteresis is left out.
 *
 * <p>Construction: the envelope points (seating state excluded) are split into an early group and a
 * late group of at least two points each; a least-squares line is fitted to each; the split kept is
 * the one with the smallest total residual sum of squares among splits whose late line is steeper
 * than the early line (our objective rule; the original picks the lines by eye).
 * &sigma;'<sub>p</sub> is the stress where the lines meet.
 *
 * <p>Accuracy: where the curve is a straight line on e &ndash; log<sub>10</sub>&sigma;' of slope
 * &minus;C, dW/d&sigma;' = &sigma;' d&epsilon;/d&sigma;' = C / ((1 + e<sub>0</sub>) ln 10) is
 * constant, so a curve of two straight lines gives a W &ndash; &sigma;' plot of two straight lines
 * meeting at the break (derived here). What moves the result is the trapezoidal rule, whose
 * relative error depends on each increment's load ratio and is largest over an increment that
 * straddles the break, and the rounding of a smooth transition; in the tests both push it above the
 * break. See the tests for the tolerance achieved. Absent when the envelope has fewer than four
 * loaded points, the work is beyond the double range (stresses near 10<sup>308</sup> Pa), or no
 * split gives a late line steeper beyond rounding (so a single straight e &ndash; log&sigma;' line
 * at a constant load ratio, whose W is exactly linear in &sigma;', shows no yield). Reference:
 * {@link PreconsolidationMethod#BECKER_WORK}. Results feed engineering decisions: they must be
 * reviewed by a qualified engineer, and local codes and standards govern. Stateless and
 * thread-safe.
 */
public final class WorkMethod {

  private static final PlotAxes AXES = PlotAxes.STRESS_WORK;

  private WorkMethod() {}

  /**
   * Estimate &sigma;'<sub>p</sub> from the work plot.
   *
   * @param curve the compression curve
   * @return the estimate with its construction in {@link PlotAxes#STRESS_WORK} (x in Pa, y in
   *     J/m^3), or absent with the reason
   * @throws IllegalArgumentException if the curve is null
   */
  public static PreconsolidationEstimate estimate(CompressionCurve curve) {
    Checks.notNull("compression curve", curve);
    PreconsolidationMethod method = PreconsolidationMethod.BECKER_WORK;
    LoadingEnvelope env = LoadingEnvelope.of(curve);
    int offset = env.size() > 0 && env.ids[0] < 0 ? 1 : 0;
    int n = env.size() - offset;
    List<Integer> used = env.idList(offset, env.size());
    List<CompressibilityWarning> warnings = new ArrayList<>();
    if (n < 4) {
      return PreconsolidationEstimate.absent(
          method,
          String.format(
              Locale.ROOT,
              "the loading envelope has %d loaded points; two lines of at least two points need 4",
              n),
          AXES,
          List.of(),
          List.of(),
          used,
          warnings);
    }
    double e0 = curve.initialVoidRatio();
    double[] x = new double[n];
    double[] w = new double[n];
    double previousStress = curve.seatingStress();
    double previousStrain = 0;
    double work = 0;
    for (int i = 0; i < n; i++) {
      double stress = env.stress[i + offset];
      double strain = (e0 - env.voidRatio[i + offset]) / (1.0 + e0);
      work += Checks.mean(previousStress, stress) * (strain - previousStrain);
      if (!Double.isFinite(work)) {
        return PreconsolidationEstimate.absent(
            method,
            String.format(
                Locale.ROOT,
                "the work per unit volume up to %s Pa is beyond the double range",
                stress),
            AXES,
            List.of(),
            List.of(),
            used,
            warnings);
      }
      x[i] = stress;
      w[i] = work;
      previousStress = stress;
      previousStrain = strain;
    }
    Optional<TwoLineSplit> found = TwoLineSplit.best(x, w, TwoLineSplit.Bend.UP);
    if (found.isEmpty()) {
      return PreconsolidationEstimate.absent(
          method,
          "no split of the loading points gives a later work line steeper than the earlier one:"
              + " the curve shows no yield",
          AXES,
          List.of(),
          List.of(),
          used,
          warnings);
    }
    TwoLineSplit two = found.get();
    int bestSplit = two.split();
    LineFit bestEarly = two.early();
    LineFit bestLate = two.late();
    LoadingEnvelope.lineWarnings("the early line", bestEarly, warnings);
    LoadingEnvelope.lineWarnings("the late line", bestLate, warnings);
    double pressure = two.intersection();
    if (!(pressure > 0) || Double.isInfinite(pressure)) {
      return PreconsolidationEstimate.absent(
          method,
          String.format(
              Locale.ROOT,
              "the two work lines meet at a stress that is not positive (%s Pa)",
              pressure),
          AXES,
          List.of(),
          List.of(),
          used,
          warnings);
    }
    if (TwoLineSplit.outsideGap(pressure, x[bestSplit - 1], x[bestSplit])) {
      warnings.add(
          new CompressibilityWarning(
              WarningKind.INTERSECTION_AWAY_FROM_BREAK,
              String.format(
                  Locale.ROOT,
                  "the lines meet at %s Pa, outside the gap %s..%s Pa between the two groups",
                  pressure,
                  x[bestSplit - 1],
                  x[bestSplit])));
    }
    List<ConstructionLine> lines =
        List.of(
            ConstructionLine.along(
                "early line", bestEarly, x[0], Math.max(pressure, x[bestSplit - 1])),
            ConstructionLine.along(
                "late line", bestLate, Math.min(pressure, x[bestSplit]), x[n - 1]));
    List<ConstructionPoint> points = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      points.add(new ConstructionPoint("work", x[i], w[i]));
    }
    points.add(new ConstructionPoint("intersection", pressure, bestEarly.valueAt(pressure)));
    env.rangeWarning(pressure, warnings);
    return PreconsolidationEstimate.found(method, pressure, AXES, points, lines, used, warnings);
  }
}
