package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Preconsolidation pressure as the intersection of two straight lines on the log(1 + e) &ndash; log
 * &sigma;' plot: natural logarithms after Butterfield (1979), decimal logarithms after Onitsuka et
 * al. (1995).
 *
 * <p>Construction: on the loading envelope, with X = log &sigma;' and Y = log(1 + e), the points
 * are split into an early group and a late group of at least two points each; a least-squares line
 * is fitted to each group; the split kept is the one with the smallest total residual sum of
 * squares among splits whose late line is steeper than the early line. &sigma;'<sub>p</sub> is the
 * stress at the intersection of the two lines. Choosing the split by least residual makes the
 * construction objective (our choice; the original papers pick the lines by eye).
 *
 * <p>The base of the logarithm cancels: changing it multiplies X and Y by the same constant, which
 * leaves every slope, every split's ranking and the intersection stress unchanged. So both variants
 * return the same &sigma;'<sub>p</sub> for the same points, to rounding.
 *
 * <p>Accuracy: exact (to rounding) on points that lie on two straight lines in these axes. On
 * invented curves that are two straight lines on e &ndash; log&sigma;' instead (C<sub>r</sub> =
 * 0.04, C<sub>c</sub> = 0.40, load ratio 2, transition 0.05 log cycle wide) the result lies 0 % to
 * 30 % above the break: a straight e &ndash; log&sigma;' virgin line is concave on log(1 + e), so
 * the late line is flatter than the curve just past the break. Absent when the envelope has fewer
 * than four points or no split gives a late line steeper beyond rounding (slopes that differ by
 * less than 1e-9 of the larger count as equal). References: {@link
 * PreconsolidationMethod#BUTTERFIELD}, {@link PreconsolidationMethod#ONITSUKA}. Results feed
 * engineering decisions: they must be reviewed by a qualified engineer, and local codes and
 * standards govern. Stateless and thread-safe.
 */
public final class BilinearVolumeMethod {

  private BilinearVolumeMethod() {}

  /**
   * Butterfield (1979): natural logarithms, ln(1 + e) against ln(&sigma;' / 1 Pa).
   *
   * @param curve the compression curve
   * @return the estimate with its construction in {@link
   *     PlotAxes#LN_STRESS_LN_ONE_PLUS_VOID_RATIO}, or absent with the reason
   * @throws IllegalArgumentException if the curve is null
   */
  public static PreconsolidationEstimate butterfield(CompressionCurve curve) {
    return estimate(
        curve, PreconsolidationMethod.BUTTERFIELD, PlotAxes.LN_STRESS_LN_ONE_PLUS_VOID_RATIO);
  }

  /**
   * Onitsuka et al. (1995): decimal logarithms, log<sub>10</sub>(1 + e) against
   * log<sub>10</sub>(&sigma;' / 1 Pa).
   *
   * @param curve the compression curve
   * @return the estimate with its construction in {@link
   *     PlotAxes#LOG10_STRESS_LOG10_ONE_PLUS_VOID_RATIO}, or absent with the reason
   * @throws IllegalArgumentException if the curve is null
   */
  public static PreconsolidationEstimate onitsuka(CompressionCurve curve) {
    return estimate(
        curve, PreconsolidationMethod.ONITSUKA, PlotAxes.LOG10_STRESS_LOG10_ONE_PLUS_VOID_RATIO);
  }

  private static PreconsolidationEstimate estimate(
      CompressionCurve curve, PreconsolidationMethod method, PlotAxes axes) {
    Checks.notNull("compression curve", curve);
    boolean natural = axes == PlotAxes.LN_STRESS_LN_ONE_PLUS_VOID_RATIO;
    LoadingEnvelope env = LoadingEnvelope.of(curve);
    int n = env.size();
    List<CompressibilityWarning> warnings = new ArrayList<>();
    if (n < 4) {
      return PreconsolidationEstimate.absent(
          method,
          String.format(
              Locale.ROOT,
              "the loading envelope has %d points; two lines of at least two points need 4",
              n),
          axes,
          List.of(),
          List.of(),
          env.idList(0, n),
          warnings);
    }
    double[] x = new double[n];
    double[] y = new double[n];
    for (int i = 0; i < n; i++) {
      x[i] = natural ? Math.log(env.stress[i]) : Math.log10(env.stress[i]);
      y[i] = natural ? Math.log1p(env.voidRatio[i]) : Math.log1p(env.voidRatio[i]) / Math.log(10);
    }
    Optional<TwoLineSplit> found = TwoLineSplit.best(x, y, TwoLineSplit.Bend.DOWN);
    if (found.isEmpty()) {
      return PreconsolidationEstimate.absent(
          method,
          "no split of the loading points gives a later line steeper than the earlier one: the"
              + " curve shows no yield",
          axes,
          List.of(),
          List.of(),
          env.idList(0, n),
          warnings);
    }
    TwoLineSplit two = found.get();
    int bestSplit = two.split();
    LineFit bestEarly = two.early();
    LineFit bestLate = two.late();
    LoadingEnvelope.lineWarnings("the early line", bestEarly, warnings);
    LoadingEnvelope.lineWarnings("the late line", bestLate, warnings);
    double xi = two.intersection();
    double yi = bestEarly.valueAt(xi);
    double pressure = natural ? Math.exp(xi) : Math.pow(10, xi);
    if (!(pressure > 0) || Double.isInfinite(pressure)) {
      return PreconsolidationEstimate.absent(
          method,
          "the two lines are nearly parallel: they meet outside the range of representable"
              + " stresses",
          axes,
          List.of(),
          List.of(),
          env.idList(0, n),
          warnings);
    }
    if (TwoLineSplit.outsideGap(pressure, env.stress[bestSplit - 1], env.stress[bestSplit])) {
      warnings.add(
          new CompressibilityWarning(
              WarningKind.INTERSECTION_AWAY_FROM_BREAK,
              String.format(
                  Locale.ROOT,
                  "the lines meet at %s Pa, outside the gap %s..%s Pa between the two groups",
                  pressure,
                  env.stress[bestSplit - 1],
                  env.stress[bestSplit])));
    }
    List<ConstructionLine> lines =
        List.of(
            ConstructionLine.along("early line", bestEarly, x[0], Math.max(xi, x[bestSplit - 1])),
            ConstructionLine.along("late line", bestLate, Math.min(xi, x[bestSplit]), x[n - 1]));
    List<ConstructionPoint> points = List.of(new ConstructionPoint("intersection", xi, yi));
    env.rangeWarning(pressure, warnings);
    return PreconsolidationEstimate.found(
        method, pressure, axes, points, lines, env.idList(0, n), warnings);
  }
}
