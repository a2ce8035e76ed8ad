package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;
import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
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
 *       increment is treated by its magnitude and reported in the input's sign. x =
 *       log<sub>10</sub>(t / 1 s).
 *   <li><b>First guess.</b> A window around a centre holds the readings within &plusmn;h of it, h
 *       widened where readings are sparse until the window holds the option's number of readings
 *       (default 8). Points every 0.02 cycle from the first to the last reading ({@link
 *       #SCAN_STEP}; a grid rather than every reading, so that a data logger's thousands of
 *       readings keep the cost linear) are each the centre of a window of the narrowest half-width
 *       (default 0.2 cycle); a quadratic fitted by least squares over it (on every k-th reading
 *       where the window holds more than {@value #SCAN_READINGS}) gives the slope there; the
 *       steepest is the first guess. On sparse readings (a window of twice the narrowest half-width
 *       around it cannot hold the readings wanted, as on the usual lab schedule of about 3 readings
 *       a cycle) the steepest point of a natural cubic spline through the readings (Commons Math
 *       {@code SplineInterpolator}; sought on at most {@value #SPLINE_READINGS} readings) is the
 *       first guess instead: there a one-sided quadratic at the last readings can look steeper than
 *       the middle.
 *   <li><b>Local fits.</b> For each half-width h from the narrowest to the widest (default 1.2
 *       cycle) in steps of {@value #HALF_WIDTH_STEP} cycle, a polynomial of degree {@value #DEGREE}
 *       fitted by least squares over the window, in u = x - centre, gives the inflection near u =
 *       -a<sub>2</sub>/(3a<sub>3</sub>); the window is moved there and the fit repeated until the
 *       move is below 10<sup>-6</sup> cycle (at most 20 times; a window whose readings change from
 *       move to move may not settle, which is warned).
 *   <li><b>Choice of the window.</b> Of the half-widths whose fit has an inflection and leaves at
 *       least two degrees of freedom, the one whose inflection has the smallest standard error is
 *       kept: the delta-method variance var(a<sub>2</sub>) / (9 a<sub>3</sub><sup>2</sup>) from the
 *       residual variance of its own fit (noise and lack of fit alike), that residual variance
 *       taken at its 90 % upper confidence bound s<sup>2</sup> &nu; / &chi;<sup>2</sup><sub>0.10,
 *       &nu;</sub> so that a window with few degrees of freedom does not win by a lucky small
 *       residual. So dense, precise readings keep a narrow window and noisy ones a wide one. A
 *       half-width whose windows all reach beyond it to hold the readings wanted gives the same fit
 *       as the narrower one and is not fitted again.
 *   <li><b>Window correction.</b> A local polynomial does not follow Terzaghi's curve exactly: its
 *       inflection lies off the curve's, by 0.0032 cycle at &plusmn;0.4 cycle, 0.036 at &plusmn;0.8
 *       and 0.065 at &plusmn;1.0 (0.75 %, 8.6 % and 16 % in c<sub>v</sub>; exact curves read 80
 *       times a cycle, the same in an independent numpy computation, see the tests). A
 *       least-squares fit is linear in the readings, so on the chosen window (its readings and
 *       centre fixed) Terzaghi's curve U(T<sub>I</sub> 10<sup>x - c*</sup>) with its inflection at
 *       c* is fitted in the same way, and c* is moved (secant iteration) until that fit's
 *       inflection falls where the readings' fit has its own. Then c* is the inflection of the
 *       Terzaghi curve d<sub>0</sub> + d<sub>p</sub> U that gives the readings' fit, exactly when
 *       the readings are such a curve; d<sub>p</sub> is the ratio of the two fits' slopes and
 *       d<sub>0</sub> the readings' fit less d<sub>p</sub> times the exact curve's fit, at the
 *       inflection. If the correction cannot be made (no inflection in the exact curve's fit, or no
 *       convergence in 20 moves), the next window in order is corrected. The correction (the fit's
 *       inflection minus c*) is reported ({@link InflectionPointResult#windowCorrection()}).
 *   <li>The slope at the inflection is 0.686845 d<sub>p</sub> per cycle, the settlement there
 *       d<sub>0</sub> + 0.700980 d<sub>p</sub>, and d<sub>100</sub> = d<sub>0</sub> +
 *       d<sub>p</sub>: exact for Terzaghi's curve; secondary compression steepens the curve at the
 *       inflection a little and so raises d<sub>100</sub>.
 * </ol>
 *
 * <h2>Accuracy (measured; see the tests)</h2>
 *
 * <ul>
 *   <li>Exact Terzaghi curves read 10 to 1,000 times a cycle: c<sub>v</sub>, d<sub>0</sub> and
 *       d<sub>100</sub> to within 10<sup>-6</sup> (relative; the rounding of the fits), for any
 *       window; with a secondary slope of 1 to 2 % of d<sub>p</sub> a cycle c<sub>v</sub> within
 *       0.5 % (0.42 % seen: secondary compression moves the steepest point itself).
 *   <li>The usual 14 lab readings (0.1 min to 24 h), exact curves with T at 24 h from 1 to 50,
 *       d<sub>i</sub> up to 10 % of d<sub>p</sub>, secondary slope up to 2 % of d<sub>p</sub> a
 *       cycle: c<sub>v</sub> within 1 % (0.70 % seen), with the sparse-readings warning.
 *   <li>Invented noisy, rounded curves (the project's synthetic study, README): median and 90th
 *       percentile of the c<sub>v</sub> error 1.1 % and 3.7 % on a data logger's schedule, 1.5 %
 *       and 5.5 % on the usual lab schedule, 1.6 % and 4.5 % on 12 readings.
 * </ul>
 *
 * <h2>Errors and warnings</h2>
 *
 * {@link FitException} when there is no inflection to find: the steepest local slope lies at the
 * first or last readings, the readings extend less than the narrowest half-width beyond the
 * inflection (an incomplete curve: the steepest part may still lie ahead) or begin less than it
 * before, the curve does not rise, or no local fit has a maximum of slope (no inflection, as with a
 * small load-increment ratio or strong secondary compression: Mesri's discussion in
 * G&eacute;otechnique 63(10); or readings too sparse or noisy for a local fit of degree 5).
 * Warnings: zero reading left out, swelling, readings that end before 90 % consolidation (T at the
 * last reading below 0.848 on this c<sub>v</sub>), window not settled, sparse readings, and the
 * method's own Terzaghi curve missing the readings up to the inflection by more than {@link
 * FitWarning#IMPLIED_CURVE_MISFIT_LIMIT} of the primary compression (noise large against it, or a
 * misplaced inflection: with reading noise of 1 % of d<sub>p</sub> on the usual lab schedule the
 * c<sub>v</sub> error has a median of 5 % and a 90th percentile of 14 %, at 2 % 10 % and 27 %).
 *
 * <p>Settlements of any magnitude give the same c<sub>v</sub>: the readings are scaled by a power
 * of 2 (exact) before the fits (tested from 10<sup>-300</sup> to 10<sup>300</sup> times the same
 * curve).
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

  /** Degree of the local polynomial that locates the inflection. */
  static final int DEGREE = 5;

  /** Fewest degrees of freedom a local fit must leave to be a candidate window. */
  private static final int MINIMUM_DEGREES_OF_FREEDOM = 2;

  /**
   * Most readings for which the spline's steepest point is sought as the first guess on sparse
   * readings (a data logger's are dense: its thousands of readings go to the scan).
   */
  static final int SPLINE_READINGS = 400;

  /** Step between the candidate half-widths, log10 cycles. */
  static final double HALF_WIDTH_STEP = 0.1;

  /**
   * Lower-tail probability of the chi-squared quantile that turns a residual variance into its
   * upper confidence bound when windows are compared (0.10: the 90 % upper bound).
   */
  private static final double VARIANCE_BOUND_PROBABILITY = 0.10;

  private static final int MAX_ITERATIONS = 20;
  private static final double CONVERGED = 1e-6;

  /** Moves of the window correction (step 4), and the move below which it has converged. */
  private static final int CORRECTION_ITERATIONS = 20;

  private static final double CORRECTION_CONVERGED = 1e-9;

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
    // The movement scaled by a power of 2 (exact) so that its largest value is near 1: the local
    // fits' sums of powers and squares stay within the double range for settlements of any
    // magnitude, and every result scales back exactly (the same bits as without the scaling
    // wherever that did not matter).
    int exponent = readings.movementExponent();
    double[] d = readings.scaledMovement(exponent);

    double narrowest = options.windowHalfWidth();
    int wanted = options.minimumWindowReadings();
    // Sparse readings (a window of twice the narrowest half-width cannot hold the readings wanted
    // around the spline's steepest point): the spline's steepest point is the first guess, as a
    // one-sided quadratic at the ends of such readings can look steeper than the middle.
    double splineCentre = n <= SPLINE_READINGS ? splineSteepestPoint(x, d) : Double.NaN;
    boolean sparse =
        !Double.isNaN(splineCentre) && nearestReach(x, splineCentre, wanted) > 2 * narrowest;
    double start;
    try {
      start = sparse ? splineCentre : steepestOnGrid(x, d, narrowest, wanted);
    } catch (FitException refused) {
      String hint = windowHint(wanted, n);
      if (hint.isEmpty()) {
        throw refused;
      }
      throw new FitException(refused.getMessage() + hint, refused);
    }
    Located found = widthLadder(x, d, start, options);
    if (found == null) {
      throw new FitException(
          Checks.format(
              "no inflection on the log-time curve near t = %.4g s: no local fit of degree %d"
                  + " (half-widths %.3g to %.3g log cycle) has a maximum of slope there (small"
                  + " load-increment ratio, strong secondary compression, or readings too sparse"
                  + " or too noisy?)%s",
              Math.pow(10, start),
              DEGREE,
              narrowest,
              options.widestHalfWidth(),
              windowHint(wanted, n)));
    }
    double centre = found.centre;
    if (x[n - 1] - centre < narrowest) {
      throw new FitException(
          Checks.format(
              "the readings end %.3g log cycle after the steepest point (t = %.4g s), less than"
                  + " the window of %.3g: no inflection is established, primary consolidation may"
                  + " not be complete%s",
              x[n - 1] - centre, Math.pow(10, centre), narrowest, windowHint(wanted, n)));
    }
    if (centre - x[0] < narrowest) {
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
    List<FitWarning> warnings = new ArrayList<>(readings.warnings);
    double neededHalfWidth = Math.max(narrowest, nearestReach(x, centre, wanted));
    if (neededHalfWidth > 2 * narrowest) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_READINGS_IN_RANGE,
              Checks.format(
                  "the readings are sparse near the inflection (a local fit spans +/-%.3g log"
                      + " cycle to hold %d readings): on exact curves read at the usual 14 lab"
                      + " times c_v came within 1 %% (T at the last reading 1 to 50), but reading"
                      + " noise of 1 %% of the primary compression moved it by 5 %% (median) and"
                      + " 14 %% (90th percentile)",
                  neededHalfWidth, wanted)));
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
    if (!found.settled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
              Checks.format(
                  "the local window did not settle on the inflection in %d moves",
                  MAX_ITERATIONS)));
    }
    ImpliedCurve.check(readings.times, d, d0, d100, cv, drainagePathMetres, warnings);
    // The sign of the movement and the scale back to metres.
    double sign = Math.scalb(readings.sign, exponent);
    List<PlotPoint> used = new ArrayList<>();
    for (int i = found.first; i <= found.last; i++) {
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
        found.halfWidth,
        found.correction,
        new PlotPoint(centre, sign * level),
        tangent,
        used,
        drainagePathMetres,
        warnings);
  }

  /**
   * The sentence a refusal adds where the options ask each window to hold more than half of the
   * readings and more than the default: such windows span most of the curve, and on curves that
   * only just complete primary consolidation (T near 1 at the last reading) they can miss an
   * inflection that the default finds (seen on the usual 14 lab readings with 13 a window).
   */
  private static String windowHint(int wanted, int n) {
    int usual = InflectionPointOptions.defaults().minimumWindowReadings();
    return 2 * wanted > n && wanted > usual
        ? Checks.format(
            "; each local fit must hold at least %d of these %d readings (minimumWindowReadings),"
                + " so it spans most of the curve: the default, %d, may find the inflection",
            wanted, n, usual)
        : "";
  }

  /**
   * Where the inflection was found: centre (log10 s), the curve's level (m) and slope (m per log10
   * cycle) there, whether the window settled, the window's half-width and the correction subtracted
   * from its centre (log10 cycles), and its first and last reading.
   */
  private record Located(
      double centre,
      double level,
      double slope,
      boolean settled,
      double halfWidth,
      double correction,
      int first,
      int last) {}

  /**
   * Step 2 of the class description: the centre of the steepest quadratic on the scan grid.
   *
   * @throws FitException if the curve does not rise anywhere or is steepest at its ends
   */
  private static double steepestOnGrid(double[] x, double[] d, double halfWidth, int wanted) {
    // Candidate centres on a grid of SCAN_STEP log cycle (not at every reading: a data logger's
    // thousands of readings would make the scan quadratic in their number).
    double steepestCentre = Double.NaN;
    double steepestSlope = Double.NEGATIVE_INFINITY;
    int n = x.length;
    int scanSteps = (int) Math.ceil((x[n - 1] - x[0]) / SCAN_STEP);
    for (int k = 0; k <= scanSteps; k++) {
      double candidate = Math.min(x[n - 1], x[0] + k * SCAN_STEP);
      int[] window = window(x, candidate, halfWidth, wanted);
      double[] c = thinnedQuadratic(x, d, window, candidate);
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
    return steepestCentre;
  }

  /**
   * Steps 3 to 5 of the class description: the settled, corrected local fit of the half-width whose
   * inflection has the smallest bounded standard error.
   *
   * @return the best candidate, or null if no half-width gives one
   */
  private static Located widthLadder(
      double[] x, double[] d, double start, InflectionPointOptions options) {
    int wanted = options.minimumWindowReadings();
    int steps =
        (int)
            Math.floor(
                (options.widestHalfWidth() - options.windowHalfWidth()) / HALF_WIDTH_STEP + 1e-9);
    // The candidates in order of their bounded variance (the narrower first where equal); the
    // window correction, the costly part, is made for the best and, only if it fails there, for
    // the next.
    List<Settled> candidates = new ArrayList<>();
    List<Double> scores = new ArrayList<>();
    // The chi-squared quantile costs some 20 us: once per number of degrees of freedom (on sparse
    // readings every window holds the same readings).
    Map<Integer, Double> boundFactors = new HashMap<>();
    Settled previous = null;
    for (int k = 0; k <= steps; k++) {
      double h = options.windowHalfWidth() + k * HALF_WIDTH_STEP;
      if (previous != null && previous.narrowestReach >= h) {
        // Every window of the previous fit held the wanted readings only by reaching beyond h:
        // this half-width moves through the same windows to the same fit (sparse readings).
        continue;
      }
      Settled data = settle(x, i -> d[i], start, h, wanted);
      previous = data;
      if (data == null) {
        continue;
      }
      int freedom = data.last - data.first + 1 - (DEGREE + 1);
      if (freedom < MINIMUM_DEGREES_OF_FREEDOM) {
        continue;
      }
      candidates.add(data);
      scores.add(
          data.centreVariance
              * boundFactors.computeIfAbsent(freedom, InflectionPointMethod::varianceBoundFactor));
    }
    Integer[] order = new Integer[candidates.size()];
    for (int k = 0; k < order.length; k++) {
      order[k] = k;
    }
    Arrays.sort(order, (a, b) -> Double.compare(scores.get(a), scores.get(b)));
    for (int k : order) {
      Located located = corrected(x, candidates.get(k));
      if (located != null) {
        return located;
      }
    }
    return null;
  }

  /**
   * Step 4 of the class description. On the settled window (its readings and centre c fixed), the
   * exact curve U(T<sub>I</sub> 10<sup>x - c*</sup>) with its inflection at c* is fitted in the
   * same way, and c* is moved until that fit's inflection falls where the readings' fit has its
   * own: then, the fit being linear in the readings, c* is where Terzaghi's curve has the
   * inflection the readings show (exact for d<sub>0</sub> + d<sub>p</sub> U). A fixed-point
   * iteration; the exact fit's inflection moves almost one for one with c*.
   *
   * @return the corrected inflection, or null if a fit has no inflection near its centre or the
   *     iteration does not converge
   */
  private static Located corrected(double[] x, Settled data) {
    double[] u = abscissae(x, new int[] {data.first, data.last}, data.centre);
    double[] fitted = data.coefficients;
    double own = inflectionOf(fitted, data.halfWidth);
    if (Double.isNaN(own)) {
      return null;
    }
    // Secant iteration on g(p) = (inflection of the exact curve's fit, inflection placed at p) -
    // own; g moves nearly one for one with p (by 1.6 for 1 on the sparsest windows measured).
    double position = own;
    double residual = exactFitInflection(u, position, data.halfWidth) - own;
    if (Double.isNaN(residual)) {
      return null;
    }
    double previousPosition = position;
    double previousResidual = residual;
    position = own - residual;
    boolean converged = false;
    for (int k = 0; k < CORRECTION_ITERATIONS; k++) {
      residual = exactFitInflection(u, position, data.halfWidth) - own;
      if (Double.isNaN(residual)) {
        return null;
      }
      if (Math.abs(residual) < CORRECTION_CONVERGED) {
        converged = true;
        break;
      }
      double slope = (residual - previousResidual) / (position - previousPosition);
      if (!(slope > 0) || !Double.isFinite(slope)) {
        slope = 1;
      }
      previousPosition = position;
      previousResidual = residual;
      position -= residual / slope;
    }
    if (!converged || !(Math.abs(position - own) <= 0.5 * data.halfWidth)) {
      return null;
    }
    double[] exact = SmallFits.polynomial(u, exactCurve(u, position), DEGREE);
    if (exact == null) {
      return null;
    }
    double exactSlope = derivative(exact, own, 1);
    if (!(exactSlope > 0)) {
      return null;
    }
    double primary = derivative(fitted, own, 1) / exactSlope;
    if (!(primary > 0) || !Double.isFinite(primary)) {
      return null;
    }
    double start = derivative(fitted, own, 0) - primary * derivative(exact, own, 0);
    return new Located(
        data.centre + position,
        start + INFLECTION_DEGREE * primary,
        INFLECTION_SLOPE_PER_LOG_CYCLE * primary,
        data.settled,
        data.halfWidth,
        own - position,
        data.first,
        data.last);
  }

  /**
   * U(T<sub>I</sub> 10<sup>u - position</sup>) at each u: Terzaghi's curve, inflection at position.
   */
  private static double[] exactCurve(double[] u, double position) {
    double[] values = new double[u.length];
    for (int j = 0; j < u.length; j++) {
      values[j] = Terzaghi.averageDegree(INFLECTION_TIME_FACTOR * Math.pow(10, u[j] - position));
    }
    return values;
  }

  /**
   * The inflection ({@link #inflectionOf}) of the local polynomial fitted to Terzaghi's curve with
   * its inflection at the given position, sampled at u.
   *
   * @return u of the fit's inflection, or NaN
   */
  private static double exactFitInflection(double[] u, double position, double halfWidth) {
    double[] exact = SmallFits.polynomial(u, exactCurve(u, position), DEGREE);
    return exact == null ? Double.NaN : inflectionOf(exact, halfWidth);
  }

  /**
   * The inflection of a local polynomial nearest its centre: of the roots of its second derivative
   * within &plusmn;halfWidth where the slope is largest (the second derivative falls through zero),
   * the one nearest u = 0; bracketed on a grid of 200 steps and refined by bisection to the
   * rounding.
   *
   * @return u of the inflection, or NaN if there is none within the half-width
   */
  static double inflectionOf(double[] coefficients, double halfWidth) {
    int steps = 200;
    double best = Double.NaN;
    double previousU = -halfWidth;
    double previous = derivative(coefficients, previousU, 2);
    for (int k = 1; k <= steps; k++) {
      double u = -halfWidth + 2 * halfWidth * k / steps;
      double value = derivative(coefficients, u, 2);
      if (previous > 0 && value <= 0) {
        double low = previousU;
        double high = u;
        for (int j = 0; j < 200 && high - low > 2 * Math.ulp(Math.abs(low) + Math.abs(high)); j++) {
          double mid = 0.5 * (low + high);
          if (derivative(coefficients, mid, 2) > 0) {
            low = mid;
          } else {
            high = mid;
          }
        }
        double root = 0.5 * (low + high);
        if (Double.isNaN(best) || Math.abs(root) < Math.abs(best)) {
          best = root;
        }
      }
      previousU = u;
      previous = value;
    }
    return best;
  }

  /** The given derivative of a polynomial (coefficients in increasing powers) at u. */
  static double derivative(double[] coefficients, double u, int order) {
    double value = 0;
    for (int k = coefficients.length - 1; k >= order; k--) {
      double factor = 1;
      for (int j = 0; j < order; j++) {
        factor *= k - j;
      }
      value = value * u + factor * coefficients[k];
    }
    return value;
  }

  /** &nu; / &chi;<sup>2</sup><sub>0.10, &nu;</sub>: the 90 % upper bound of a variance over s^2. */
  static double varianceBoundFactor(int degreesOfFreedom) {
    return degreesOfFreedom
        / new ChiSquaredDistribution(null, degreesOfFreedom)
            .inverseCumulativeProbability(VARIANCE_BOUND_PROBABILITY);
  }

  /**
   * A local fit settled on its inflection: centre, coefficients in u = x - centre, the window, its
   * half-width, whether it settled within {@value #MAX_ITERATIONS} moves, the delta-method variance
   * of the centre, var(a<sub>2</sub>) / (9 a<sub>3</sub><sup>2</sup>), and the smallest reach of
   * the wanted nearest readings over the centres visited (a wider half-width up to it gives the
   * same windows, so the same fit).
   */
  private record Settled(
      double centre,
      double[] coefficients,
      int first,
      int last,
      double halfWidth,
      boolean settled,
      double centreVariance,
      double narrowestReach) {}

  /**
   * Step 3 of the class description: moves a window of the given half-width onto the zero of its
   * fit's second derivative.
   *
   * @return the settled fit, or null if a fit has no maximum of slope, the slope there is not
   *     positive, the centre leaves the readings, or the variance cannot be formed
   */
  private static Settled settle(
      double[] x, IntToDoubleFunction y, double start, double halfWidth, int wanted) {
    int n = x.length;
    double centre = start;
    boolean settled = false;
    double narrowestReach = Double.POSITIVE_INFINITY;
    for (int k = 0; k < MAX_ITERATIONS; k++) {
      double reach = nearestReach(x, centre, wanted);
      narrowestReach = Math.min(narrowestReach, reach);
      int[] window = within(x, centre, Math.max(halfWidth, reach));
      double[] local = fitAround(x, y, window, centre, DEGREE);
      if (local == null || !(local[3] < 0)) {
        return null;
      }
      double shift = -local[2] / (3 * local[3]);
      double limit = 0.5 * Math.max(centre - x[window[0]], x[window[1]] - centre);
      shift = Math.max(-limit, Math.min(limit, shift));
      centre += shift;
      if (Math.abs(shift) < CONVERGED) {
        settled = true;
        break;
      }
      if (centre < x[0] || centre > x[n - 1]) {
        return null;
      }
    }
    double finalReach = nearestReach(x, centre, wanted);
    narrowestReach = Math.min(narrowestReach, finalReach);
    int[] window = within(x, centre, Math.max(halfWidth, finalReach));
    double[] u = abscissae(x, window, centre);
    double[] values = values(y, window);
    double[] local = SmallFits.polynomial(u, values, DEGREE);
    if (local == null || !(local[1] > 0) || !(local[3] < 0)) {
      return null;
    }
    double variance = SmallFits.coefficientVariance(u, values, local, 2);
    double centreVariance = variance / (9 * local[3] * local[3]);
    if (!Double.isFinite(centreVariance)) {
      return null;
    }
    double reach = Math.max(centre - x[window[0]], x[window[1]] - centre);
    return new Settled(
        centre, local, window[0], window[1], reach, settled, centreVariance, narrowestReach);
  }

  /**
   * The steepest point of the natural cubic spline through (log10 t, d) (Commons Math {@link
   * SplineInterpolator}), the first guess on sparse readings: on each piece the slope b + 2 c u + 3
   * e u<sup>2</sup> is largest at an end or at u = -c/(3e) when e &lt; 0.
   *
   * @return x of the steepest point, or NaN when it lies in the first or last piece, the slope
   *     there is not positive, or the spline cannot be built
   */
  private static double splineSteepestPoint(double[] x, double[] d) {
    PolynomialSplineFunction spline;
    try {
      spline = new SplineInterpolator().interpolate(x, d);
    } catch (MathIllegalArgumentException | MathIllegalStateException e) {
      return Double.NaN;
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
      return Double.NaN;
    }
    double centre = knots[bestPiece] + bestU;
    return Double.isFinite(centre) ? centre : Double.NaN;
  }

  /**
   * The readings within the window around a centre: within &plusmn;h, h the larger of the given
   * half-width and {@link #nearestReach}.
   *
   * @return {first index, last index}, inclusive
   */
  static int[] window(double[] x, double centre, double halfWidth, int wanted) {
    return within(x, centre, Math.max(halfWidth, nearestReach(x, centre, wanted)));
  }

  /** The readings within &plusmn;h of the centre: {first index, last index}, inclusive. */
  private static int[] within(double[] x, double centre, double h) {
    int n = x.length;
    int first = insertionPoint(x, centre);
    int last = first - 1;
    while (first > 0 && centre - x[first - 1] <= h) {
      first--;
    }
    while (last < n - 1 && x[last + 1] - centre <= h) {
      last++;
    }
    return new int[] {first, last};
  }

  /**
   * Distance from the centre to the wanted-th nearest reading (all of them if there are fewer),
   * log10 cycles: the readings are in increasing x, so the nearest are found by walking outwards
   * from the centre.
   */
  static double nearestReach(double[] x, double centre, int wanted) {
    int n = x.length;
    int right = insertionPoint(x, centre);
    int left = right - 1;
    double reach = 0;
    for (int k = 0; k < Math.min(n, wanted); k++) {
      double toLeft = left >= 0 ? centre - x[left] : Double.POSITIVE_INFINITY;
      double toRight = right < n ? x[right] - centre : Double.POSITIVE_INFINITY;
      if (toLeft <= toRight) {
        reach = toLeft;
        left--;
      } else {
        reach = toRight;
        right++;
      }
    }
    return reach;
  }

  /** Index of the first reading at or after the centre (n if none). */
  private static int insertionPoint(double[] x, double centre) {
    int index = Arrays.binarySearch(x, centre);
    return index < 0 ? -index - 1 : index;
  }

  /** Most readings a scan window's quadratic uses (every k-th reading of a larger window). */
  static final int SCAN_READINGS = 256;

  /**
   * The quadratic of the scan (a first guess only) over a window, on every k-th reading where the
   * window holds more than {@value #SCAN_READINGS} (k the smallest stride that brings it to at most
   * that many): on a data logger's dense readings the scan's cost no longer grows with their
   * number.
   */
  private static double[] thinnedQuadratic(double[] x, double[] d, int[] window, double centre) {
    int count = window[1] - window[0] + 1;
    int stride = (count + SCAN_READINGS - 1) / SCAN_READINGS;
    int used = (count + stride - 1) / stride;
    double[] u = new double[used];
    double[] values = new double[used];
    for (int k = 0; k < used; k++) {
      u[k] = x[window[0] + k * stride] - centre;
      values[k] = d[window[0] + k * stride];
    }
    return SmallFits.polynomial(u, values, 2);
  }

  /** Polynomial of the given degree in u = x - centre over the window. */
  private static double[] fitAround(
      double[] x, IntToDoubleFunction y, int[] window, double centre, int degree) {
    return SmallFits.polynomial(abscissae(x, window, centre), values(y, window), degree);
  }

  /** u = x - centre for the window's readings. */
  private static double[] abscissae(double[] x, int[] window, double centre) {
    double[] u = new double[window[1] - window[0] + 1];
    for (int k = 0; k < u.length; k++) {
      u[k] = x[window[0] + k] - centre;
    }
    return u;
  }

  /** The values at the window's readings. */
  private static double[] values(IntToDoubleFunction y, int[] window) {
    double[] values = new double[window[1] - window[0] + 1];
    for (int k = 0; k < values.length; k++) {
      values[k] = y.applyAsDouble(window[0] + k);
    }
    return values;
  }
}
