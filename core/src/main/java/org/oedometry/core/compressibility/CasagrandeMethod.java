package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Preconsolidation pressure by the construction of Casagrande (1936), made objective by locating
 * the point of maximum curvature on a smooth fit.
 *
 * <p>Construction, on the plot x = log<sub>10</sub>(&sigma;' / 1 Pa), y = e: (1) fit the smooth
 * curve below to the loading envelope; (2) find its point of maximum curvature P; (3) draw the
 * horizontal and the tangent at P; (4) draw the bisector of the angle between them; (5) fit the
 * virgin line through the last points of the envelope (see {@link PreconsolidationOptions});
 * &sigma;'<sub>p</sub> is the stress where the bisector meets the virgin line.
 *
 * <p><b>Normalisation.</b> Curvature and the bisector's angle depend on how the axes are scaled.
 * Here both use the natural units of the plot: one log<sub>10</sub> cycle of stress is drawn as
 * long as one unit of void ratio. The curvature is &kappa; = |e''| / (1 +
 * e'<sup>2</sup>)<sup>3/2</sup> with primes d/dlog<sub>10</sub>&sigma;'. Scaling all stresses by
 * one constant shifts x and leaves the result's ratio to the stresses unchanged.
 *
 * <p><b>Smooth fit.</b> e(x) = a + b u + c &radic;(u<sup>2</sup> + r<sup>2</sup>), u = x &minus;
 * x<sub>0</sub>, c &lt; 0: a hyperbola whose asymptotes are the recompression and virgin lines and
 * whose parameter r (log cycles) sets the width of the transition. It has five parameters, so the
 * envelope needs at least {@value #MINIMUM_POINTS} points. (a, b, c) are solved by linear least
 * squares for each (x<sub>0</sub>, r), which are found by a deterministic grid and compass search;
 * the maximum of &kappa; is then found on the fit by a dense scan refined by golden section, to
 * 10<sup>&minus;10</sup> log cycles. The fitted curve is returned as points for plotting.
 *
 * <p><b>Accuracy.</b> Measured on invented curves (C<sub>r</sub> = 0.04, C<sub>c</sub> = 0.40, ten
 * stresses at a load ratio of 2, break at 100, 150 and 210 kPa): for a sharp break, within 1 % of
 * the break (the point of maximum curvature is the corner, which lies on the virgin line; the fit
 * then ends at its smallest transition width and warns {@link WarningKind#FIT_AT_BOUND}). For a
 * softplus transition 0.05 log cycle wide, within 3.5 % of the same construction done on the exact
 * curve; that construction itself lies 9.7 % above the break (3.8 % for a 0.02 log cycle
 * transition), by about &delta; / (C<sub>c</sub> + s<sub>b</sub>) log cycles, &delta; the gap
 * between corner and curve and s<sub>b</sub> the bisector's slope: a property of Casagrande's
 * construction, not of the numerics. Absent when the envelope is too short, the curve shows no
 * downward break (a slope change below 10<sup>&minus;6</sup> per log cycle counts as none), the
 * virgin-line points admit no straight line (stresses a few ulps apart have equal logarithms), the
 * virgin line does not fall, or the bisector does not meet the virgin line. Reference: {@link
 * PreconsolidationMethod#CASAGRANDE}. Results feed engineering decisions: they must be reviewed by
 * a qualified engineer, and local codes and standards govern. Stateless and thread-safe.
 */
public final class CasagrandeMethod {

  /** Fewest loading-envelope points the smooth fit accepts: {@value}. */
  public static final int MINIMUM_POINTS = 6;

  /** Smallest change of slope, per log cycle, that counts as a break (rounding level). */
  private static final double MINIMUM_SLOPE_CHANGE = 1e-6;

  private static final PlotAxes AXES = PlotAxes.LOG10_STRESS_VOID_RATIO;
  private static final int SCAN_STEPS = 4000;
  private static final int FIT_PLOT_POINTS = 41;

  private CasagrandeMethod() {}

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
    PreconsolidationMethod method = PreconsolidationMethod.CASAGRANDE;
    LoadingEnvelope env = LoadingEnvelope.of(curve);
    int n = env.size();
    List<Integer> used = env.idList(0, n);
    List<CompressibilityWarning> warnings = new ArrayList<>();
    int needed = Math.max(MINIMUM_POINTS, options.virginLinePoints() + 1);
    if (n < needed) {
      return absent(
          String.format(
              Locale.ROOT,
              "the loading envelope has %d points; the smooth fit and virgin line need %d",
              n,
              needed),
          List.of(),
          List.of(),
          used,
          warnings);
    }
    double[] x = env.log10Stress;
    double[] e = env.voidRatio;
    SmoothCompressionFit fit = SmoothCompressionFit.of(x, e);
    if (fit == null || !(-2 * fit.c > MINIMUM_SLOPE_CHANGE)) {
      return absent(
          "the curve shows no downward break on the e - log stress plot: no smooth fit with a"
              + " steeper later slope exists",
          List.of(),
          List.of(),
          used,
          warnings);
    }
    if (fit.atBound) {
      warnings.add(
          new CompressibilityWarning(
              WarningKind.FIT_AT_BOUND,
              String.format(
                  Locale.ROOT,
                  "the smooth fit ended at a bound of its search (break at %s Pa, transition"
                      + " width %s log cycles)",
                  Math.pow(10, fit.x0),
                  fit.r)));
    }
    List<ConstructionPoint> points = new ArrayList<>();
    for (int i = 0; i < FIT_PLOT_POINTS; i++) {
      double xi = x[0] + (x[n - 1] - x[0]) * i / (FIT_PLOT_POINTS - 1);
      points.add(new ConstructionPoint("smooth fit", xi, fit.value(xi)));
    }
    double xm = maximumCurvature(fit, x[0], x[n - 1]);
    double em = fit.value(xm);
    double tangentSlope = fit.slope(xm);
    double bisectorSlope = Math.tan(0.5 * Math.atan(tangentSlope));
    points.add(new ConstructionPoint("maximum curvature", xm, em));
    LineFit virgin;
    try {
      virgin = env.virginLine(options.virginLinePoints());
    } catch (IllegalArgumentException noLine) {
      return absent(
          "the virgin-line points admit no straight line: " + noLine.getMessage(),
          points,
          List.of(),
          used,
          warnings);
    }
    LoadingEnvelope.lineWarnings("the virgin line", virgin, warnings);
    double half = 0.25 * (x[n - 1] - x[0]);
    List<ConstructionLine> lines = new ArrayList<>();
    lines.add(new ConstructionLine("horizontal at maximum curvature", xm, em, xm + half, em));
    lines.add(
        new ConstructionLine(
            "tangent at maximum curvature",
            xm - half,
            em - tangentSlope * half,
            xm + half,
            em + tangentSlope * half));
    if (!(virgin.slope() < bisectorSlope)) {
      lines.add(
          ConstructionLine.along(
              "virgin line", virgin, x[n - options.virginLinePoints()], x[n - 1]));
      return absent(
          String.format(
              Locale.ROOT,
              "the virgin line (slope %s per log cycle) is not steeper than the bisector (slope"
                  + " %s): they do not meet beyond the point of maximum curvature",
              virgin.slope(),
              bisectorSlope),
          points,
          lines,
          used,
          warnings);
    }
    double xp = (em - bisectorSlope * xm - virgin.intercept()) / (virgin.slope() - bisectorSlope);
    double ep = virgin.valueAt(xp);
    double pressure = Math.pow(10, xp);
    if (!(pressure > 0) || Double.isInfinite(pressure)) {
      return absent(
          "the construction leaves the range of representable stresses",
          points,
          lines,
          used,
          warnings);
    }
    lines.add(new ConstructionLine("bisector", xm, em, xp, ep));
    lines.add(ConstructionLine.along("virgin line", virgin, Math.min(xp, x[n - 1]), x[n - 1]));
    points.add(new ConstructionPoint("preconsolidation pressure on virgin line", xp, ep));
    env.rangeWarning(pressure, warnings);
    return PreconsolidationEstimate.found(method, pressure, AXES, points, lines, used, warnings);
  }

  /** Location of the largest curvature of the fit in [lo, hi], by scan and golden section. */
  static double maximumCurvature(SmoothCompressionFit fit, double lo, double hi) {
    double step = (hi - lo) / SCAN_STEPS;
    int best = 0;
    double bestK = -1;
    for (int i = 0; i <= SCAN_STEPS; i++) {
      double k = fit.curvature(lo + step * i);
      if (k > bestK) {
        bestK = k;
        best = i;
      }
    }
    double a = lo + step * Math.max(0, best - 1);
    double b = lo + step * Math.min(SCAN_STEPS, best + 1);
    double g = 0.5 * (Math.sqrt(5) - 1);
    double c = b - g * (b - a);
    double d = a + g * (b - a);
    while (b - a > 1e-10) {
      if (fit.curvature(c) > fit.curvature(d)) {
        b = d;
      } else {
        a = c;
      }
      c = b - g * (b - a);
      d = a + g * (b - a);
    }
    return 0.5 * (a + b);
  }

  private static PreconsolidationEstimate absent(
      String reason,
      List<ConstructionPoint> points,
      List<ConstructionLine> lines,
      List<Integer> used,
      List<CompressibilityWarning> warnings) {
    return PreconsolidationEstimate.absent(
        PreconsolidationMethod.CASAGRANDE, reason, AXES, points, lines, used, warnings);
  }
}
