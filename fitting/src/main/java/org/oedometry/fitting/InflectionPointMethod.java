package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.Terzaghi;

/**
 * Inflection point method (Cour 1971; Mesri, Feng &amp; Shahien 1999): c<sub>v</sub> =
 * T<sub>I</sub> H<sub>dr</sub><sup>2</sup> / t<sub>I</sub>, with t<sub>I</sub> the time of the
 * inflection of the settlement against log t (its steepest point) and T<sub>I</sub> the time factor
 * of the inflection of Terzaghi's U against log T.
 *
 * <h2>The constants</h2>
 *
 * With x = ln T, dU/dx = T U'(T) and d<sup>2</sup>U/dx<sup>2</sup> = T (U'(T) + T U''(T)). From the
 * Fourier series U'(T) = 2 &Sigma; exp(-M<sup>2</sup>T), M = &pi;(2m+1)/2, the inflection is the
 * root of
 *
 * <pre>
 *   sum_{m&gt;=0} (1 - M^2 T) exp(-M^2 T) = 0,
 * </pre>
 *
 * found here by bisection to full double precision: {@link #INFLECTION_TIME_FACTOR} T<sub>I</sub> =
 * 0.404176, {@link #INFLECTION_DEGREE} U<sub>I</sub> = U(T<sub>I</sub>) = 70.098 %, and the slope
 * there, {@link #INFLECTION_SLOPE_PER_LOG_CYCLE} = ln(10) T<sub>I</sub> U'(T<sub>I</sub>) =
 * 0.686845 per log<sub>10</sub> cycle (U and U' from {@link Terzaghi}). Sources often quote 0.405
 * and 70.6 %; these are the exact values of the theory (checked against mpmath in the tests).
 *
 * <h2>Locating the inflection on the readings</h2>
 *
 * <ol>
 *   <li>Readings after t = 0 are used (the zero reading is left out, with a warning); a swelling
 *       increment is treated by its magnitude and reported in the input's sign.
 *   <li>With x = log<sub>10</sub>(t / 1 s), points every 0.02 cycle from the first to the last
 *       reading ({@link #SCAN_STEP}; a grid rather than every reading, so that a data logger's
 *       thousands of readings keep the cost linear) are each the centre of a local window: the
 *       readings within &plusmn;h of it, h being the option's half-width (default 0.2 cycle),
 *       widened where readings are sparse until the window holds the option's number of readings
 *       (default 7). So a data logger's dense readings give a narrow, local window and a lab
 *       schedule (about 3 readings a cycle) a wider one. A quadratic fitted by least squares over
 *       the window gives the slope at each centre; the steepest is the first guess.
 *   <li>A quartic fitted by least squares over the window around the guess, in u = x - centre,
 *       gives the inflection near u = -a<sub>2</sub>/(3a<sub>3</sub>); the window is moved there
 *       and the fit repeated until the move is below 10<sup>-6</sup> cycle (at most 20 times), so
 *       that at the end the second derivative of the local fit vanishes at the centre. The quartic
 *       term takes up the asymmetry of the curve about its inflection, which would otherwise shift
 *       the inflection of a cubic by 0.007 cycle (1.7 % in c<sub>v</sub>) at the default window.
 *       t<sub>I</sub>, d<sub>I</sub> = a<sub>0</sub> and the slope s<sub>I</sub> = a<sub>1</sub>
 *       come from the last fit.
 *   <li>d<sub>100</sub> - d<sub>0</sub> = s<sub>I</sub> / 0.686845 and d<sub>0</sub> =
 *       d<sub>I</sub> - U<sub>I</sub> (d<sub>100</sub> - d<sub>0</sub>), exact for Terzaghi's
 *       curve; secondary compression steepens the curve at the inflection a little and so raises
 *       both.
 * </ol>
 *
 * <p><b>Sparse readings.</b> First the steepest point of a natural cubic spline through the
 * readings on log<sub>10</sub> t (Commons Math {@code SplineInterpolator}) is found; if the local
 * window there would have to be wider than twice the option's half-width to hold its readings (as
 * on the usual lab schedule, about 3 readings a cycle), the spline's steepest point, level and
 * slope replace steps 2 and 3, with a warning: a local polynomial over more than two cycles of such
 * readings was measured up to 124 % off, the spline within 7 %. On sparse readings T at the last
 * reading (on the c<sub>v</sub> found) must reach 2, or FitException: with the lab schedule's 8 h
 * to 24 h gap just after the inflection the spline was up to 15 % off.
 *
 * <h2>Accuracy (measured; see the tests)</h2>
 *
 * <ul>
 *   <li>Exact Terzaghi curves read 80 times a cycle: c<sub>v</sub> within 0.1 %; 20 a cycle: within
 *       0.3 %. An instantaneous compression does not matter.
 *   <li>The usual 14 lab readings (0.1 min to 24 h), exact curves with T at 24 h from 2 to 50,
 *       d<sub>i</sub> up to 10 % of d<sub>p</sub>, secondary slope up to 2 % of d<sub>p</sub> a
 *       cycle: c<sub>v</sub> within 7 % (6.1 % seen), always with the sparse-readings warning; T at
 *       24 h below about 2: FitException.
 * </ul>
 *
 * <h2>Errors and warnings</h2>
 *
 * {@link FitException} when there is no inflection to find: the steepest local slope lies at the
 * first or last readings, the readings extend less than the window half-width beyond the inflection
 * (an incomplete curve: the steepest part may still lie ahead), the curve does not rise there, or
 * the local fit has no maximum of slope (no inflection, as with a small load-increment ratio or
 * strong secondary compression: Mesri's discussion in G&eacute;otechnique 63(10)), sparse readings
 * that end before T = 2. Warnings: zero reading left out, swelling, readings that end before 90 %
 * consolidation (T at the last reading below 0.848 on this c<sub>v</sub>), window not settled,
 * sparse readings (inflection from the spline).
 *
 * <p>Deterministic and thread-safe. Results feed engineering decisions and must be reviewed by a
 * qualified engineer; local codes and standards govern.
 */
public final class InflectionPointMethod {

  /** Time factor of the inflection of U against log T, T<sub>I</sub> = 0.404176 (computed). */
  public static final double INFLECTION_TIME_FACTOR = inflectionTimeFactor();

  /** Degree of consolidation at the inflection, U<sub>I</sub> = 0.700980 (computed). */
  public static final double INFLECTION_DEGREE = Terzaghi.averageDegree(INFLECTION_TIME_FACTOR);

  /**
   * Slope of U against log<sub>10</sub> T at the inflection, ln(10) T<sub>I</sub> U'(T<sub>I</sub>)
   * = 0.686845 (computed): the settlement curve falls by this fraction of d<sub>100</sub> -
   * d<sub>0</sub> per log<sub>10</sub> cycle there.
   */
  public static final double INFLECTION_SLOPE_PER_LOG_CYCLE =
      Math.log(10)
          * INFLECTION_TIME_FACTOR
          * Terzaghi.averageDegreeDerivative(INFLECTION_TIME_FACTOR);

  /** Step of the grid of candidate centres for the steepest slope, in log10 cycles. */
  static final double SCAN_STEP = 0.02;

  private static final int MINIMUM_READINGS = 8;

  /**
   * On sparse readings, T at the last reading (on the c<sub>v</sub> found) must reach this value,
   * 2.
   */
  static final double SPARSE_END_FACTOR = 2.0;

  /** Degree of the local polynomial that locates the inflection. */
  private static final int DEGREE = 4;

  private static final int MAX_ITERATIONS = 20;
  private static final double CONVERGED = 1e-6;

  private InflectionPointMethod() {}

  /**
   * The second derivative of U against ln T divided by 2T: &Sigma; (1 - M<sup>2</sup>T)
   * exp(-M<sup>2</sup>T), zero at the inflection. Exposed for the tests.
   *
   * @param timeFactor T &gt; 0
   * @return the sum
   */
  static double inflectionCondition(double timeFactor) {
    double sum = 0;
    for (int m = 0; m < 1000; m++) {
      double big = Math.PI * (2 * m + 1) / 2;
      double mt = big * big * timeFactor;
      double term = (1 - mt) * Math.exp(-mt);
      sum += term;
      if (Math.abs(term) < 1e-18 && mt > 1) {
        break;
      }
    }
    return sum;
  }

  /** Bisection on [0.2, 0.8], where the condition falls from positive to negative. */
  private static double inflectionTimeFactor() {
    double low = 0.2;
    double high = 0.8;
    for (int k = 0; k < 200 && high - low > Math.ulp(low); k++) {
      double mid = 0.5 * (low + high);
      if (inflectionCondition(mid) > 0) {
        low = mid;
      } else {
        high = mid;
      }
    }
    return 0.5 * (low + high);
  }

  /**
   * Applies the method with {@link InflectionPointOptions#defaults()}.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve is
   *     null, or there are fewer than 8 readings after t = 0
   * @throws FitException if the curve shows no inflection (see the class description)
   */
  public static InflectionPointResult fit(SettlementCurve curve, double drainagePathMetres) {
    return fit(curve, drainagePathMetres, InflectionPointOptions.defaults());
  }

  /**
   * Applies the method with the given options.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @param options the options; not null
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve or
   *     options are null, or there are fewer than 8 readings after t = 0
   * @throws FitException if the curve shows no inflection (see the class description)
   */
  public static InflectionPointResult fit(
      SettlementCurve curve, double drainagePathMetres, InflectionPointOptions options) {
    if (options == null) {
      throw new IllegalArgumentException("options must not be null");
    }
    IncrementReadings readings =
        IncrementReadings.of(curve, drainagePathMetres, MINIMUM_READINGS, "inflection point");
    int n = readings.size();
    double[] x = new double[n];
    for (int i = 0; i < n; i++) {
      x[i] = Math.log10(readings.times[i]);
    }
    double[] d = readings.movement;

    Located spline = splineInflection(x, d);
    boolean sparse =
        spline != null && halfWidthNear(x, spline.centre, options) > 2 * options.windowHalfWidth();
    Located found = sparse ? spline : dense(x, d, options);
    double centre = found.centre;
    boolean settled = found.settled;
    int[] window = window(x, centre, options);
    double halfWidth = Math.max(centre - x[window[0]], x[window[1]] - centre);
    double minimumHalfWidth = options.windowHalfWidth();
    if (x[n - 1] - centre < minimumHalfWidth) {
      throw new FitException(
          Checks.format(
              "the readings end %.3g log cycle after the steepest point (t = %.4g s), less than"
                  + " the window of %.3g: no inflection is established, primary consolidation may"
                  + " not be complete",
              x[n - 1] - centre, Math.pow(10, centre), minimumHalfWidth));
    }
    if (centre - x[0] < minimumHalfWidth) {
      throw new FitException(
          Checks.format(
              "the steepest point (t = %.4g s) lies within %.3g log cycle of the first reading:"
                  + " the readings start too late to show the inflection",
              Math.pow(10, centre), centre - x[0]));
    }
    double inflectionTime = Math.pow(10, centre);
    double slope = found.slope;
    double level = found.level;
    double primary = slope / INFLECTION_SLOPE_PER_LOG_CYCLE;
    double d0 = level - INFLECTION_DEGREE * primary;
    double d100 = d0 + primary;
    double cv = INFLECTION_TIME_FACTOR * drainagePathMetres * drainagePathMetres / inflectionTime;
    if (!(cv > 0) || !Double.isFinite(cv)) {
      throw new FitException("c_v from the inflection is not a finite positive number");
    }
    double endFactor = INFLECTION_TIME_FACTOR * readings.lastTime() / inflectionTime;
    if (sparse && endFactor < SPARSE_END_FACTOR) {
      throw new FitException(
          Checks.format(
              "the readings are sparse near the inflection and end at T = %.3g on the c_v of a"
                  + " spline through them: on sparse readings the inflection needs readings to T"
                  + " = %.3g (on the usual lab schedule curves ending between T = 1.6 and 1.8 put"
                  + " the spline's inflection up to 15 %% off)",
              endFactor, SPARSE_END_FACTOR));
    }

    List<FitWarning> warnings = new ArrayList<>(readings.warnings);
    if (sparse) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_READINGS_IN_RANGE,
              Checks.format(
                  "the readings are sparse near the inflection (a local fit would span +/-%.3g"
                      + " log cycle to hold %d readings): the inflection was taken from a natural"
                      + " cubic spline through the readings on log time; on exact curves read at"
                      + " the usual 14 lab times c_v came within 7 %% (T at the last reading 2 to"
                      + " 50)",
                  halfWidth, options.minimumWindowReadings())));
    }
    if (endFactor < Terzaghi.TIME_FACTOR_90) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READINGS_END_BEFORE_RANGE,
              Checks.format(
                  "the readings end at T = %.3g on this c_v, before 90 %% consolidation (T ="
                      + " 0.848): primary consolidation may not be complete",
                  endFactor)));
    }
    if (!settled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
              Checks.format(
                  "the local window did not settle on the inflection in %d moves",
                  MAX_ITERATIONS)));
    }
    double sign = readings.sign;
    List<PlotPoint> used = new ArrayList<>();
    for (int i = window[0]; i <= window[1]; i++) {
      used.add(new PlotPoint(x[i], sign * d[i]));
    }
    double xStart = centre - INFLECTION_DEGREE * primary / slope;
    double xEnd = centre + (1 - INFLECTION_DEGREE) * primary / slope;
    List<PlotPoint> tangent =
        List.of(new PlotPoint(xStart, sign * d0), new PlotPoint(xEnd, sign * d100));
    return new InflectionPointResult(
        cv,
        inflectionTime,
        sign * level,
        sign * slope,
        sign * d0,
        sign * d100,
        halfWidth,
        new PlotPoint(centre, sign * level),
        tangent,
        used,
        drainagePathMetres,
        warnings);
  }

  /** Where the inflection was found, the curve's level and slope (per log10 cycle) there. */
  private record Located(double centre, double level, double slope, boolean settled) {}

  /** Steps 1 and 2 of the class description: local polynomial fits. */
  private static Located dense(double[] x, double[] d, InflectionPointOptions options) {
    // 1. Steepest local slope from quadratic fits centred on each reading.
    // Candidate centres on a grid of SCAN_STEP log cycle (not at every reading: a data logger's
    // thousands of readings would make the scan quadratic in their number).
    double steepestCentre = Double.NaN;
    double steepestSlope = Double.NEGATIVE_INFINITY;
    int n = x.length;
    int scanSteps = (int) Math.ceil((x[n - 1] - x[0]) / SCAN_STEP);
    for (int k = 0; k <= scanSteps; k++) {
      double candidate = Math.min(x[n - 1], x[0] + k * SCAN_STEP);
      int[] window = window(x, candidate, options);
      double[] c = fitAround(x, d, window, candidate, 2);
      if (c != null && c[1] > steepestSlope) {
        steepestSlope = c[1];
        steepestCentre = candidate;
      }
    }
    if (Double.isNaN(steepestCentre) || !(steepestSlope > 0)) {
      throw new FitException(
          "the settlement does not rise against log time anywhere: no inflection to find");
    }
    boolean atStart = steepestCentre <= x[1];
    if (atStart || steepestCentre >= x[n - 2]) {
      throw new FitException(
          Checks.format(
              "no inflection on the log-time curve: the steepest part is at the %s readings (t ="
                  + " %.4g s); %s",
              atStart ? "first" : "last",
              Math.pow(10, steepestCentre),
              atStart
                  ? "primary consolidation may have passed its steepest point before the first"
                      + " reading"
                  : "primary consolidation may not be complete"));
    }

    // 2. Cubic fits, moved onto the zero of their second derivative.
    double centre = steepestCentre;
    double[] local = null;
    int[] window = null;
    boolean settled = false;
    for (int k = 0; k < MAX_ITERATIONS; k++) {
      window = window(x, centre, options);
      local = fitAround(x, d, window, centre, DEGREE);
      if (local == null || !(local[3] < 0)) {
        throw new FitException(
            Checks.format(
                "no inflection on the log-time curve near t = %.4g s: the slope has no maximum"
                    + " there (small load-increment ratio or strong secondary compression?)",
                Math.pow(10, centre)));
      }
      double shift = -local[2] / (3 * local[3]);
      double halfWidth = Math.max(centre - x[window[0]], x[window[1]] - centre);
      shift = Math.max(-0.5 * halfWidth, Math.min(0.5 * halfWidth, shift));
      centre += shift;
      if (Math.abs(shift) < CONVERGED) {
        settled = true;
        break;
      }
      if (centre < x[0] || centre > x[n - 1]) {
        throw new FitException("no inflection within the readings on the log-time curve");
      }
    }
    window = window(x, centre, options);
    local = fitAround(x, d, window, centre, DEGREE);
    if (local == null || !(local[1] > 0) || !(local[3] < 0)) {
      throw new FitException(
          Checks.format(
              "no inflection on the log-time curve near t = %.4g s", Math.pow(10, centre)));
    }
    return new Located(centre, local[0], local[1], settled);
  }

  /** Half-width of the adaptive window around a centre, log10 cycles. */
  private static double halfWidthNear(double[] x, double centre, InflectionPointOptions options) {
    int[] window = window(x, centre, options);
    return Math.max(centre - x[window[0]], x[window[1]] - centre);
  }

  /**
   * The steepest point of the natural cubic spline through (log10 t, d) (Commons Math {@link
   * SplineInterpolator}): on each piece the slope b + 2 c u + 3 e u<sup>2</sup> is largest at an
   * end or at u = -c/(3e) when e &lt; 0.
   *
   * @return the steepest point, or null when it lies in the first or last piece, the slope there is
   *     not positive, or the spline cannot be built
   */
  private static Located splineInflection(double[] x, double[] d) {
    PolynomialSplineFunction spline;
    try {
      spline = new SplineInterpolator().interpolate(x, d);
    } catch (MathIllegalArgumentException | MathIllegalStateException e) {
      return null;
    }
    PolynomialFunction[] pieces = spline.getPolynomials();
    double[] knots = spline.getKnots();
    double bestSlope = Double.NEGATIVE_INFINITY;
    int bestPiece = -1;
    double bestU = 0;
    for (int k = 0; k < pieces.length; k++) {
      double[] c = pieces[k].getCoefficients();
      double h = knots[k + 1] - knots[k];
      double[] candidates = {0, h, Double.NaN};
      if (c.length > 3 && c[3] < 0) {
        double u = -c[2] / (3 * c[3]);
        if (u > 0 && u < h) {
          candidates[2] = u;
        }
      }
      for (double u : candidates) {
        if (!Double.isNaN(u)) {
          double slope = pieces[k].derivative().value(u);
          if (slope > bestSlope) {
            bestSlope = slope;
            bestPiece = k;
            bestU = u;
          }
        }
      }
    }
    if (bestPiece <= 0 || bestPiece >= pieces.length - 1 || !(bestSlope > 0)) {
      return null;
    }
    double centre = knots[bestPiece] + bestU;
    double level = pieces[bestPiece].value(bestU);
    if (!Double.isFinite(centre) || !Double.isFinite(level) || !Double.isFinite(bestSlope)) {
      return null;
    }
    return new Located(centre, level, bestSlope, true);
  }

  /**
   * The readings within the adaptive window around a centre: within &plusmn;h, h at least the
   * option's half-width and widened to hold the option's number of readings.
   *
   * @return {first index, last index}, inclusive
   */
  private static int[] window(double[] x, double centre, InflectionPointOptions options) {
    int n = x.length;
    double[] distance = new double[n];
    for (int i = 0; i < n; i++) {
      distance[i] = Math.abs(x[i] - centre);
    }
    double[] sorted = distance.clone();
    Arrays.sort(sorted);
    int wanted = Math.min(n, options.minimumWindowReadings());
    double h = Math.max(options.windowHalfWidth(), sorted[wanted - 1]);
    int first = n;
    int last = -1;
    for (int i = 0; i < n; i++) {
      if (distance[i] <= h) {
        first = Math.min(first, i);
        last = Math.max(last, i);
      }
    }
    return new int[] {first, last};
  }

  /** Polynomial of the given degree in u = x - centre over the window. */
  private static double[] fitAround(
      double[] x, double[] d, int[] window, double centre, int degree) {
    int count = window[1] - window[0] + 1;
    double[] u = new double[count];
    double[] y = new double[count];
    for (int k = 0; k < count; k++) {
      u[k] = x[window[0] + k] - centre;
      y[k] = d[window[0] + k];
    }
    return SmallFits.polynomial(u, y, degree);
  }
}
