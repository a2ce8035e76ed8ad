package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Preconsolidation pressure by the construction of Pacheco Silva (1970), on the e &ndash;
 * log<sub>10</sub>&sigma;' plot.
 *
 * <p>Construction: (1) fit the virgin line through the last points of the loading envelope (see
 * {@link PreconsolidationOptions}); (2) extend it up to the horizontal e = e<sub>0</sub> (the
 * initial void ratio), point A; (3) go vertically from A down to the compression curve, point B;
 * (4) go horizontally from B to the virgin line, point C. &sigma;'<sub>p</sub> is the stress at C.
 * The curve between test points is the straight segment joining them on the e &ndash;
 * log<sub>10</sub>&sigma;' plot. The construction is deterministic: it needs no judgement beyond
 * the choice of virgin-line points.
 *
 * <p>Accuracy on an ideal curve: when the curve is exactly two straight lines, slopes
 * &minus;C<sub>r</sub> and &minus;C<sub>c</sub> meeting at log<sub>10</sub>&sigma;'<sub>b</sub>,
 * with e<sub>0</sub> on the first line at log<sub>10</sub>&sigma;'<sub>0</sub>, and A and B fall on
 * the first line, the construction returns log<sub>10</sub>&sigma;'<sub>p</sub> =
 * log<sub>10</sub>&sigma;'<sub>b</sub> &minus; (C<sub>r</sub>/C<sub>c</sub>)<sup>2</sup>
 * (log<sub>10</sub>&sigma;'<sub>b</sub> &minus; log<sub>10</sub>&sigma;'<sub>0</sub>) (derived
 * here; verified in the tests): exact for C<sub>r</sub> = 0, and low by a few per cent for usual
 * ratios C<sub>r</sub>/C<sub>c</sub> &asymp; 0.1. When a sharp corner falls between two test
 * stresses, the chord joining them cuts the corner, B falls lower and the result moves to a higher
 * stress.
 *
 * <p>On invented curves with a softplus transition 0.05 log cycle wide (C<sub>r</sub> = 0.04,
 * C<sub>c</sub> = 0.40, load ratio 2) the result lies within 6 % of the break.
 *
 * <p>Absent when the loading envelope has fewer points than the virgin line needs plus one, when
 * the virgin-line points admit no straight line (stresses a few ulps apart have equal logarithms),
 * when the virgin line does not fall with stress, or when A lies at a stress below the first point
 * of the envelope (the curve is not known there). Reference: {@link
 * PreconsolidationMethod#PACHECO_SILVA}. Results feed engineering decisions: they must be reviewed
 * by a qualified engineer, and local codes and standards govern. Stateless and thread-safe.
 */
public final class PachecoSilvaMethod {

  private static final PlotAxes AXES = PlotAxes.LOG10_STRESS_VOID_RATIO;

  private PachecoSilvaMethod() {}

  /**
   * Estimate with the default options.
   *
   * @param curve the compression curve
   * @return the estimate with its construction, or absent with the reason
   * @throws IllegalArgumentException if the curve is null
   */
  public static PreconsolidationEstimate estimate(CompressionCurve curve) {
    return estimate(curve, PreconsolidationOptions.defaults());
  }

  /**
   * Estimate with the given options.
   *
   * @param curve the compression curve
   * @param options the number of virgin-line points
   * @return the estimate with its construction (x = log<sub>10</sub>(&sigma;' / 1 Pa), y = e), or
   *     absent with the reason
   * @throws IllegalArgumentException if an argument is null
   */
  public static PreconsolidationEstimate estimate(
      CompressionCurve curve, PreconsolidationOptions options) {
    Checks.notNull("compression curve", curve);
    Checks.notNull("options", options);
    PreconsolidationMethod method = PreconsolidationMethod.PACHECO_SILVA;
    List<CompressibilityWarning> warnings = new ArrayList<>();
    LoadingEnvelope env = LoadingEnvelope.of(curve);
    int n = env.size();
    int count = options.virginLinePoints();
    if (n < count + 1) {
      return PreconsolidationEstimate.absent(
          method,
          String.format(
              Locale.ROOT,
              "the loading envelope has %d points; the construction needs %d for the virgin line"
                  + " and at least one before it",
              n,
              count),
          AXES,
          List.of(),
          List.of(),
          env.idList(0, n),
          warnings);
    }
    LineFit virgin;
    try {
      virgin = env.virginLine(count);
    } catch (IllegalArgumentException noLine) {
      return PreconsolidationEstimate.absent(
          method,
          "the virgin-line points admit no straight line: " + noLine.getMessage(),
          AXES,
          List.of(),
          List.of(),
          env.idList(0, n),
          warnings);
    }
    LoadingEnvelope.lineWarnings("the virgin line", virgin, warnings);
    double[] x = env.log10Stress;
    double[] e = env.voidRatio;
    List<ConstructionLine> lines = new ArrayList<>();
    if (!(virgin.slope() < 0)) {
      lines.add(ConstructionLine.along("virgin line", virgin, x[n - count], x[n - 1]));
      return PreconsolidationEstimate.absent(
          method,
          String.format(
              Locale.ROOT,
              "the virgin line does not fall with stress (slope %s per log cycle)",
              virgin.slope()),
          AXES,
          List.of(),
          lines,
          env.idList(0, n),
          warnings);
    }
    double e0 = curve.initialVoidRatio();
    double xa = abscissaAt(virgin, e0);
    if (!Double.isFinite(xa)) {
      lines.add(ConstructionLine.along("virgin line", virgin, x[n - count], x[n - 1]));
      return PreconsolidationEstimate.absent(
          method,
          String.format(
              Locale.ROOT,
              "the virgin line (slope %s, intercept %s per log cycle) reaches the initial void"
                  + " ratio %s only beyond the range of numbers, far outside the loaded range"
                  + " %s..%s Pa",
              virgin.slope(),
              virgin.intercept(),
              e0,
              env.stress[0],
              env.stress[n - 1]),
          AXES,
          List.of(),
          lines,
          env.idList(0, n),
          warnings);
    }
    // Drawn down to where it meets e0, or over its own points where the line's ordinate there is
    // beyond the double range (only with void ratios near 1e308: the estimate is absent then).
    double drawnFrom = Math.min(xa, x[n - 1]);
    if (!Double.isFinite(virgin.valueAt(drawnFrom))) {
      drawnFrom = x[n - count];
    }
    lines.add(ConstructionLine.along("virgin line", virgin, drawnFrom, x[n - 1]));
    lines.add(new ConstructionLine("initial void ratio", x[0], e0, Math.max(xa, x[0]), e0));
    List<ConstructionPoint> points = new ArrayList<>();
    points.add(new ConstructionPoint("virgin line at initial void ratio", xa, e0));
    if (xa < x[0] || xa > x[n - 1]) {
      return PreconsolidationEstimate.absent(
          method,
          String.format(
              Locale.ROOT,
              "the virgin line reaches the initial void ratio %s at %s Pa, outside the loaded"
                  + " range %s..%s Pa where the curve is known",
              e0,
              Checks.stressText(xa),
              env.stress[0],
              env.stress[n - 1]),
          AXES,
          points,
          lines,
          env.idList(0, n),
          warnings);
    }
    double eb = interpolate(x, e, xa);
    double xc = abscissaAt(virgin, eb);
    if (!Double.isFinite(xc)) {
      return PreconsolidationEstimate.absent(
          method,
          "the construction leaves the range of representable stresses",
          AXES,
          points,
          lines,
          env.idList(0, n),
          warnings);
    }
    points.add(new ConstructionPoint("curve below that point", xa, eb));
    points.add(new ConstructionPoint("preconsolidation pressure on virgin line", xc, eb));
    lines.add(new ConstructionLine("vertical to the curve", xa, e0, xa, eb));
    lines.add(new ConstructionLine("horizontal to the virgin line", xa, eb, xc, eb));
    double pressure = Math.pow(10, xc);
    if (!(pressure > 0) || Double.isInfinite(pressure)) {
      return PreconsolidationEstimate.absent(
          method,
          "the construction leaves the range of representable stresses",
          AXES,
          List.of(),
          lines,
          env.idList(0, n),
          warnings);
    }
    env.rangeWarning(pressure, warnings);
    return PreconsolidationEstimate.found(
        method, pressure, AXES, points, lines, env.idList(0, n), warnings);
  }

  /**
   * The abscissa where the line reaches y, (y - b)/m; taken term by term, y/m - b/m, where y - b
   * overflows (void ratios near 10<sup>308</sup>). Infinite only where the abscissa itself is
   * beyond the double range.
   */
  static double abscissaAt(LineFit line, double y) {
    double x = (y - line.intercept()) / line.slope();
    return Double.isFinite(x) ? x : y / line.slope() - line.intercept() / line.slope();
  }

  /** Piecewise-linear interpolation of y(x), x strictly increasing, x[0] <= t <= x[n-1]. */
  static double interpolate(double[] x, double[] y, double t) {
    int n = x.length;
    for (int i = 1; i < n; i++) {
      if (t <= x[i]) {
        double f = (t - x[i - 1]) / (x[i] - x[i - 1]);
        return y[i - 1] + f * (y[i] - y[i - 1]);
      }
    }
    return y[n - 1];
  }
}
