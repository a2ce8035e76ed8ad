package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.fitting.internal.MonotoneCubic;
import org.oedometry.theory.Terzaghi;

/**
 * Rectangular hyperbola method (Sridharan &amp; Sreepada Rao 1981, Geotechnical Testing Journal
 * 4(4); Sridharan, Murthy &amp; Prakash 1987, G&eacute;otechnique 37(3)): between 60 % and 90 %
 * consolidation T/U is nearly linear in T, so t/&delta; is linear in t there.
 *
 * <h2>Formula</h2>
 *
 * With T/U = M T + C on 60-90 %, &delta; = d - d<sub>0</sub> = d<sub>p</sub> U (settlement counted
 * from the zero d<sub>0</sub>, see below) and T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>:
 *
 * <pre>
 *   t/&delta; = (H^2 / (c_v d_p)) T/U = (M / d_p) t + C H^2 / (c_v d_p) = m t + c,
 *   so  m = M / d_p,  c = C H^2 / (c_v d_p),  and
 *   c_v = (C / M) H_dr^2 m / c,   d_p = M / m,   t_U = T(U) (M / C) c / m.
 * </pre>
 *
 * <p>The constants {@link #HYPERBOLA_SLOPE} M = 0.82064 and {@link #HYPERBOLA_INTERCEPT} C =
 * 0.24409 are the least-squares line of T/U on T over U from 60 % to 90 %, U uniformly weighted
 * (integrals by 32-point Gauss-Legendre quadrature in U, T(U) from {@link Terzaghi}); the sampling
 * matters in the fourth digit (uniform in T gives 0.82116 and 0.24381; U at 1 % steps 0.82144 and
 * 0.24370), which moves c<sub>v</sub> by less than 0.3 %.
 *
 * <h2>Choice of readings</h2>
 *
 * Objective and iterative: start with the readings whose &delta; lies between 60 % and 90 % of the
 * last reading's; fit t/&delta; = m t + c by ordinary least squares; from m and c compute t<sub>60
 * </sub> and t<sub>90</sub>; take the readings with t<sub>60</sub> &le; t &le; t<sub>90</sub>;
 * repeat until the set does not change (at most 30 times). On dense readings the set can instead
 * cycle among ranges a reading apart at an end; where the sets of the cycle give c<sub>v</sub>
 * within {@value #CYCLE_TOLERANCE} of each other (below the method's accuracy on exact dense
 * curves) the choice counts as settled on the set of the cycle with the most readings (on 40 seeded
 * 8,640-reading curves with 1 micrometre of noise, 1 was then warned instead of 5); a cycle whose
 * sets differ more (a few readings, c<sub>v</sub> some percent apart) stays warned. At least 2
 * readings are needed (a warning below 4).
 *
 * <p>Where the readings are too sparse for this (fewer than 2 between t<sub>60</sub> and t<sub>90
 * </sub>, as on the usual lab schedule for about half of all c<sub>v</sub>), and the option allows
 * it (default), the line is fitted instead to settlements interpolated between the readings: a
 * monotone piecewise cubic of d against ln t through all readings ({@code internal.MonotoneCubic}),
 * evaluated at the times of the 32 Gauss-Legendre nodes in U over 60-90 % on the current
 * c<sub>v</sub> and weighted by the nodes' weights (the sampling that defines M and C, so an
 * exactly interpolated curve gives c<sub>v</sub> exactly), iterated from the time at which the
 * interpolant reaches 75 % of the movement; with a warning. It is refused (FitException) unless a
 * reading lies between t<sub>60</sub> and t<sub>90</sub> and two at or after t<sub>90</sub>: across
 * the 8 h to 24 h gap of the lab schedule the interpolated settlements moved c<sub>v</sub> by up to
 * 17 %.
 *
 * <h2>The zero of settlement</h2>
 *
 * The published method counts settlement from the start of the increment ({@link
 * RectangularHyperbolaOptions.Zero#START_OF_INCREMENT}): an instantaneous (false) compression on
 * loading, d<sub>i</sub> &gt; 0, makes &delta; too large at every reading and biases c<sub>v</sub>
 * high (measured on exact curves: about 9 % for d<sub>i</sub> = 4 % of d<sub>p</sub>, 24 % for 10
 * %). By default ({@link RectangularHyperbolaOptions.Zero#EARLY_ROOT_TIME_LINE}) &delta; is counted
 * from a corrected zero d<sub>0</sub>: the intercept at t = 0 of the straight line d =
 * d<sub>0</sub> + S &radic;t fitted by least squares to the readings before 50 % of d<sub>100</sub>
 * - d<sub>0</sub> (60 % when fewer than 3 lie before 50 %; Terzaghi's early curve is U = 2
 * &radic;(T/&pi;), within 0.1 % of U up to 50 %). It is objective and uses readings the hyperbola
 * does not. d<sub>0</sub> and the hyperbola are found together: a first early line taken from the
 * first timed reading as zero and the last reading as d<sub>100</sub> gives a first d<sub>0</sub>
 * (so a deformation on loading as large as the primary settlement does not stop the search; tested
 * up to 2 d<sub>p</sub>); then the hyperbola gives d<sub>100</sub> = d<sub>0</sub> + M/m and the
 * early line a new d<sub>0</sub>, until d<sub>0</sub> moves by less than 10<sup>-12</sup> of the
 * readings (at most 30 times). The result reports the d<sub>0</sub> used. Secondary compression
 * raises the late readings and lowers c<sub>v</sub> a little.
 *
 * <h2>Accuracy (measured; see the tests)</h2>
 *
 * <ul>
 *   <li>Exact Terzaghi curves read densely (80 a log cycle): c<sub>v</sub> within 0.3 % (0.12 %
 *       seen), with d<sub>i</sub> = 0, 4 % or 10 % of d<sub>p</sub>; d<sub>0</sub> within 0.1 % of
 *       d<sub>p</sub>.
 *   <li>The usual 14 lab readings (0.1 min to 24 h), exact curves with T at 24 h from 2 to 50,
 *       d<sub>i</sub> up to 10 % of d<sub>p</sub>, secondary slope up to 2 % of d<sub>p</sub> a
 *       cycle: c<sub>v</sub> within 3 % (2.8 % seen; 1.1 % where 2 readings lie in the range, up to
 *       2.8 % where the readings were resampled), always with a warning. With T at 24 h from 1.0 to
 *       1.6: FitException.
 * </ul>
 *
 * <h2>Errors and warnings</h2>
 *
 * {@link FitException}: fewer than 2 readings in the 60-90 % range and resampling refused or not
 * allowed (a curve that ends before 60 %, or a schedule too sparse), no early root-time line for
 * the corrected zero (fewer than 3 readings before 60 %), t/&delta; against t without a positive
 * slope and intercept, t/&delta; beyond the double range (times and settlements of very different
 * magnitudes, say 10<sup>170</sup> s over 10<sup>-200</sup> m), or readings that end before 80 %
 * consolidation on the c<sub>v</sub> found (an incomplete curve: there the iteration can settle on
 * the last few readings and give a c<sub>v</sub> several times too large). Warnings: zero reading
 * left out, swelling (treated by its magnitude), fewer than 4 readings on the line, readings
 * resampled, few early readings for d<sub>0</sub>, readings that end before t<sub>90</sub>, choice
 * or zero not settled.
 *
 * <p>Self-check: {@link FitWarning.Kind#IMPLIED_CURVE_MISSES_READINGS} when the Terzaghi curve of
 * the result's own d<sub>0</sub>, d<sub>100</sub> and c<sub>v</sub> misses the readings up to 70 %
 * consolidation by more than {@link FitWarning#IMPLIED_CURVE_MISFIT_LIMIT} of the primary
 * compression (root mean square): never on exact curves; on small noisy increments it marks values
 * that may be far off.
 *
 * <p>Settlements of any magnitude give the same c<sub>v</sub>: the movement is scaled by a power of
 * 2 (exact) before the fits, and each line's times likewise, with every result scaled back exactly
 * (tested from 10<sup>-300</sup> to 10<sup>300</sup> times the same curve; ordinary curves give the
 * same bits as without the scaling). The line and its points are reported in s/m, so the
 * FitException above remains where they themselves lie beyond the double range.
 *
 * <p>Deterministic and thread-safe. Results feed engineering decisions and must be reviewed by a
 * qualified engineer; local codes and standards govern.
 */
public final class RectangularHyperbolaMethod {

  /** Lower end of the range of consolidation used, U = 60 %. */
  public static final double LOWER_DEGREE = 0.6;

  /** Upper end of the range of consolidation used, U = 90 %. */
  public static final double UPPER_DEGREE = 0.9;

  /** Slope M of T/U = M T + C fitted to the exact curve over 60-90 % (0.82064, computed). */
  public static final double HYPERBOLA_SLOPE;

  /** Intercept C of T/U = M T + C fitted to the exact curve over 60-90 % (0.24409, computed). */
  public static final double HYPERBOLA_INTERCEPT;

  static {
    double[] line = exactLine();
    HYPERBOLA_INTERCEPT = line[0];
    HYPERBOLA_SLOPE = line[1];
  }

  /** The readings must reach this degree of consolidation, 80 %, on the fitted line. */
  private static final double COMPLETE_ENOUGH = 0.8;

  private static final int MINIMUM_READINGS = 5;
  private static final int MAX_ITERATIONS = 30;

  /**
   * A choice of readings that cycles counts as settled where the choices of the cycle give
   * c<sub>v</sub> within this fraction of each other: 0.3 %, the method's own tolerance on exact
   * dense curves.
   */
  static final double CYCLE_TOLERANCE = 3e-3;

  /** The corrected zero has settled when it moves by less than this fraction of the readings. */
  private static final double ZERO_SETTLED = 1e-12;

  /** T at the 32 Gauss-Legendre nodes in U over [0.6, 0.9], for resampling. */
  private static final double[] NODE_TIME_FACTORS;

  /** The nodes' weights. */
  private static final double[] NODE_WEIGHTS;

  static {
    GaussIntegrator rule = new GaussIntegratorFactory().legendre(32, LOWER_DEGREE, UPPER_DEGREE);
    NODE_TIME_FACTORS = new double[rule.getNumberOfPoints()];
    NODE_WEIGHTS = new double[rule.getNumberOfPoints()];
    for (int j = 0; j < NODE_TIME_FACTORS.length; j++) {
      NODE_TIME_FACTORS[j] = Terzaghi.timeFactor(rule.getPoint(j));
      NODE_WEIGHTS[j] = rule.getWeight(j);
    }
  }

  private RectangularHyperbolaMethod() {}

  /** {C, M}: least squares of T/U on T with U uniform over [0.6, 0.9]. */
  private static double[] exactLine() {
    GaussIntegrator rule = new GaussIntegratorFactory().legendre(32, LOWER_DEGREE, UPPER_DEGREE);
    double s0 = rule.integrate(u -> 1.0);
    double s1 = rule.integrate(Terzaghi::timeFactor);
    double s2 = rule.integrate(u -> Math.pow(Terzaghi.timeFactor(u), 2));
    double y0 = rule.integrate(u -> Terzaghi.timeFactor(u) / u);
    double y1 = rule.integrate(u -> Math.pow(Terzaghi.timeFactor(u), 2) / u);
    double det = s0 * s2 - s1 * s1;
    return new double[] {(s2 * y0 - s1 * y1) / det, (s0 * y1 - s1 * y0) / det};
  }

  /**
   * Applies the method with {@link RectangularHyperbolaOptions#defaults()}.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve is
   *     null, or there are fewer than 5 readings after t = 0
   * @throws FitException if the curve admits no hyperbola (see the class description)
   */
  public static RectangularHyperbolaResult fit(SettlementCurve curve, double drainagePathMetres) {
    return fit(curve, drainagePathMetres, RectangularHyperbolaOptions.defaults());
  }

  /**
   * Applies the method with the given options.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @param options the options; not null
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve or
   *     options are null, or there are fewer than 5 readings after t = 0
   * @throws FitException if the curve admits no hyperbola (see the class description)
   */
  public static RectangularHyperbolaResult fit(
      SettlementCurve curve, double drainagePathMetres, RectangularHyperbolaOptions options) {
    return fit(curve, drainagePathMetres, options, true);
  }

  /**
   * Applies the method, on the movement scaled by a power of 2 (as the public method) or, for the
   * tests' comparison with the arithmetic before the scaling, unscaled.
   *
   * @param scaled whether the movement is scaled ({@link IncrementReadings#movementExponent})
   */
  static RectangularHyperbolaResult fit(
      SettlementCurve curve,
      double drainagePathMetres,
      RectangularHyperbolaOptions options,
      boolean scaled) {
    if (options == null) {
      throw new IllegalArgumentException("options must not be null");
    }
    IncrementReadings readings =
        IncrementReadings.of(curve, drainagePathMetres, MINIMUM_READINGS, "rectangular hyperbola");
    Scale scale = scaled ? Scale.of(readings) : Scale.NONE;
    int exponent = scale.movement();
    ScaledFit f = fitScaled(readings, scale, drainagePathMetres, options);
    List<FitWarning> warnings = new ArrayList<>(readings.warnings);
    warnings.addAll(f.warnings);
    ImpliedCurve.check(
        readings.times,
        readings.scaledMovement(exponent),
        f.d0,
        f.d100,
        f.cv,
        drainagePathMetres,
        warnings);
    // Back to metres (d0, d100) and to s/m and 1/m (the line and its points): exact, a power of 2,
    // so the same bits as a fit on the movement itself wherever that stays within the range.
    double sign = readings.sign;
    double d0 = IncrementReadings.inMetres(sign * f.d0, exponent, "d0", "m");
    double d100 = IncrementReadings.inMetres(sign * f.d100, exponent, "d100", "m");
    double slope = perMetre(f.slope, exponent, "the slope of t/d against t", "1/m");
    double intercept = perMetre(f.intercept, exponent, "the intercept of t/d", "s/m");
    List<PlotPoint> used = new ArrayList<>();
    for (PlotPoint p : f.line.used) {
      used.add(new PlotPoint(p.x(), perMetre(p.y(), exponent, "t/d on the line", "s/m")));
    }
    List<PlotPoint> fitted =
        List.of(
            new PlotPoint(
                f.t60, perMetre(f.slope * f.t60 + f.intercept, exponent, "t/d at t60", "s/m")),
            new PlotPoint(
                f.t90, perMetre(f.slope * f.t90 + f.intercept, exponent, "t/d at t90", "s/m")));
    return new RectangularHyperbolaResult(
        f.cv,
        slope,
        intercept,
        f.t60,
        f.t90,
        d0,
        d100,
        options.zero(),
        f.line.resampled,
        used,
        fitted,
        f.line.iterations,
        drainagePathMetres,
        warnings);
  }

  /**
   * The powers of 2 (exact) of the method's arithmetic: the movement is divided by
   * 2<sup>movement</sup>, and where {@code times}, a line's times by the power of 2 that brings
   * their largest into [1, 2) (its slope scaled back), so that t/d and the lines' sums stay within
   * the double range for settlements of any magnitude (and the sums of squares of the times for
   * times of any magnitude).
   *
   * @param movement the exponent the movement is divided by
   * @param times whether the lines' times are scaled
   */
  record Scale(int movement, boolean times) {

    /** No scaling: the arithmetic on the readings as they are. */
    static final Scale NONE = new Scale(0, false);

    /** The scaling of the methods: the movement's largest value brought near 1, times scaled. */
    static Scale of(IncrementReadings readings) {
      return new Scale(readings.movementExponent(), true);
    }

    /** The exponent by which a line's times are divided: that of the largest, or 0. */
    int timeExponent(double[] x) {
      if (!times) {
        return 0;
      }
      double largest = 0;
      for (double value : x) {
        largest = Math.max(largest, Math.abs(value));
      }
      return Math.getExponent(largest);
    }
  }

  /**
   * The method on the movement divided by 2<sup>e</sup> (e = {@link Scale#movement}): settlements
   * (d0, d100) in those units, the line's slope and intercept and the points' t/d times
   * 2<sup>e</sup>, c_v and times as they are; the warnings of the method itself (not those of the
   * readings).
   */
  record ScaledFit(
      double cv,
      double slope,
      double intercept,
      double t60,
      double t90,
      double d0,
      double d100,
      Hyperbola line,
      List<FitWarning> warnings) {}

  /**
   * The method on the readings' movement divided by 2<sup>e</sup> (exact; e = {@link
   * Scale#movement}), every settlement quoted in a message back in metres. Shared with {@link
   * EarlySlopeMethod}, which takes d0 and d100 from it.
   *
   * @throws FitException if the curve admits no hyperbola (see the class description)
   */
  static ScaledFit fitScaled(
      IncrementReadings readings,
      Scale scale,
      double drainagePathMetres,
      RectangularHyperbolaOptions options) {
    double[] t = readings.times;
    double[] d = readings.scaledMovement(scale.movement());
    int n = t.length;
    boolean resample = options.resampleSparseReadings();
    List<FitWarning> warnings = new ArrayList<>();
    double d0 = 0;
    Hyperbola line;
    if (options.zero() == RectangularHyperbolaOptions.Zero.START_OF_INCREMENT) {
      line = hyperbola(t, d, d0, resample, scale);
    } else {
      double[] root = new double[n];
      double largest = 0;
      for (int i = 0; i < n; i++) {
        root[i] = Math.sqrt(t[i]);
        largest = Math.max(largest, Math.abs(d[i]));
      }
      // The first early line takes the first timed reading as the zero and the last as d100, so
      // that a large deformation on loading (which the zero reading carries and the published form
      // would count as consolidation) does not stop the iteration before it starts.
      EarlySlopeMethod.EarlyLine early = earlyLine(root, d, d[n - 1], d[0]);
      d0 = early.d0;
      line = hyperbola(t, d, d0, resample, scale);
      boolean settled = false;
      for (int k = 0; k < MAX_ITERATIONS && !settled; k++) {
        early = earlyLine(root, d, d0 + line.primary(), d0);
        settled = Math.abs(early.d0 - d0) <= ZERO_SETTLED * largest;
        d0 = early.d0;
        line = hyperbola(t, d, d0, resample, scale);
      }
      if (early.widened) {
        warnings.add(
            new FitWarning(
                FitWarning.Kind.FEW_EARLY_READINGS,
                Checks.format(
                    "fewer than %d readings lie before 50 %% consolidation: the corrected zero"
                        + " comes from the %d readings before 60 %%",
                    EarlySlopeMethod.EARLY_MINIMUM, early.count)));
      }
      if (!settled || !early.settled) {
        warnings.add(
            new FitWarning(
                FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
                Checks.format(
                    "the corrected zero (%s m) did not settle in %d steps",
                    IncrementReadings.metresText(readings.sign * d0, scale.movement(), "%s"),
                    MAX_ITERATIONS)));
      }
    }
    double intercept = line.intercept;
    double slope = line.slope;
    double ratio = (HYPERBOLA_SLOPE / HYPERBOLA_INTERCEPT) * intercept / slope;
    double cv = drainagePathMetres * drainagePathMetres / ratio;
    double t60 = Terzaghi.timeFactor(LOWER_DEGREE) * ratio;
    double t90 = Terzaghi.timeFactor(UPPER_DEGREE) * ratio;
    double d100 = d0 + line.primary();
    if (!(cv > 0)
        || !Double.isFinite(cv)
        || !Double.isFinite(d100)
        || !Double.isFinite(t90)
        || !Double.isFinite(slope * t90 + intercept)) {
      throw new FitException("the hyperbola gives no finite positive c_v");
    }
    double t80 = Terzaghi.timeFactor(COMPLETE_ENOUGH) * ratio;
    if (readings.lastTime() < t80) {
      throw new FitException(
          Checks.format(
              "the readings end (%.4g s) before 80 %% consolidation on the hyperbola's own c_v"
                  + " (t80 = %.4g s): the 60-90 %% line is not established, primary consolidation"
                  + " is not complete enough for the rectangular hyperbola",
              readings.lastTime(), t80));
    }
    int inRange = 0;
    for (double time : t) {
      inRange += time >= t60 && time <= t90 ? 1 : 0;
    }
    if (line.resampled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READINGS_RESAMPLED,
              Checks.format(
                  "%d reading(s) lie between 60 %% and 90 %% consolidation (%.4g s to %.4g s): the"
                      + " line was fitted to %d settlements interpolated between the readings"
                      + " (monotone cubic on log time); on exact curves read at the usual 14 lab"
                      + " times this moved c_v by up to 3 %%",
                  inRange, t60, t90, line.used.size())));
    } else if (inRange < 4) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_READINGS_IN_RANGE,
              Checks.format(
                  "the line of t/d against t rests on %d readings between 60 %% and 90 %%"
                      + " consolidation",
                  line.used.size())));
    }
    if (readings.lastTime() < t90) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READINGS_END_BEFORE_RANGE,
              Checks.format(
                  "the readings end at %.4g s, before t90 = %.4g s on this c_v: primary"
                      + " consolidation may not be complete",
                  readings.lastTime(), t90)));
    }
    if (!line.settled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
              Checks.format(
                  "the choice of readings between t60 and t90 did not settle in %d steps",
                  MAX_ITERATIONS)));
    }
    return new ScaledFit(cv, slope, intercept, t60, t90, d0, d100, line, warnings);
  }

  /** A line t/&delta; = m t + c (&delta; = d - d<sub>0</sub>) and how it was found. */
  record Hyperbola(
      double intercept,
      double slope,
      boolean settled,
      int iterations,
      boolean resampled,
      List<PlotPoint> used) {

    /** d<sub>100</sub> - d<sub>0</sub> = M/m, m. */
    double primary() {
      return HYPERBOLA_SLOPE / slope;
    }
  }

  /** The early root-time line for the corrected zero, with this method's message if it fails. */
  private static EarlySlopeMethod.EarlyLine earlyLine(
      double[] root, double[] d, double d100, double startZero) {
    try {
      return EarlySlopeMethod.earlyLine(root, d, d100, startZero);
    } catch (FitException e) {
      throw new FitException(
          "the corrected zero of the rectangular hyperbola comes from the early root-time line,"
              + " which failed ("
              + e.getMessage()
              + "); the option Zero.START_OF_INCREMENT counts settlement from the start of the"
              + " increment instead",
          e);
    }
  }

  /**
   * The line for a given zero: from the readings between t60 and t90 (iterated), or, when fewer
   * than 2 readings lie there and resampling is allowed, from interpolated settlements.
   */
  private static Hyperbola hyperbola(
      double[] t, double[] d, double d0, boolean resample, Scale scale) {
    int n = t.length;
    double last = d[n - 1] - d0;
    if (!(last > 0)) {
      throw new FitException(
          Checks.format(
              "the last reading (%s m) does not lie beyond the corrected zero (%s m): no"
                  + " consolidation to analyse",
              IncrementReadings.metresText(d[n - 1], scale.movement(), "%s"),
              IncrementReadings.metresText(d0, scale.movement(), "%s")));
    }
    // The chosen readings, by index in time order: first by the degree of movement, then (the
    // times being increasing) the index range between t60 and t90, found by binary search.
    int[] chosen =
        IntStream.range(0, n)
            .filter(i -> d[i] - d0 >= LOWER_DEGREE * last && d[i] - d0 <= UPPER_DEGREE * last)
            .toArray();
    int iterations = 0;
    // The choices so far, their lines and time scales (for a cycle among choices).
    List<int[]> choices = new ArrayList<>();
    List<double[]> lines = new ArrayList<>();
    List<Double> ratios = new ArrayList<>();
    for (int k = 0; k < MAX_ITERATIONS; k++) {
      if (chosen.length < 2) {
        if (resample) {
          return resampled(t, d, d0, iterations, scale);
        }
        throw tooFew(t, d, scale);
      }
      iterations++;
      double[] line = fitLine(t, d, d0, chosen, scale);
      double ratio = (HYPERBOLA_SLOPE / HYPERBOLA_INTERCEPT) * line[0] / line[1];
      double t60 = Terzaghi.timeFactor(LOWER_DEGREE) * ratio;
      double t90 = Terzaghi.timeFactor(UPPER_DEGREE) * ratio;
      int[] next = IntStream.range(firstAtOrAfter(t, t60), firstAfter(t, t90)).toArray();
      if (Arrays.equals(next, chosen)) {
        return new Hyperbola(
            line[0], line[1], true, iterations, false, used(t, d, d0, chosen, scale));
      }
      choices.add(chosen);
      lines.add(line);
      ratios.add(ratio);
      int cycleStart = indexOf(choices, next);
      if (cycleStart >= 0) {
        // The choice cycles (dense readings: a reading entering and leaving at an end of the
        // range). Settled if the cycle's choices give c_v within CYCLE_TOLERANCE of each other:
        // the one with the most readings (the first of those) is kept.
        double lowest = Double.POSITIVE_INFINITY;
        double highest = 0;
        int kept = cycleStart;
        for (int j = cycleStart; j < choices.size(); j++) {
          lowest = Math.min(lowest, ratios.get(j));
          highest = Math.max(highest, ratios.get(j));
          if (choices.get(j).length > choices.get(kept).length) {
            kept = j;
          }
        }
        if (highest / lowest - 1 < CYCLE_TOLERANCE) {
          double[] keptLine = lines.get(kept);
          return new Hyperbola(
              keptLine[0],
              keptLine[1],
              true,
              iterations,
              false,
              used(t, d, d0, choices.get(kept), scale));
        }
      }
      chosen = next;
    }
    if (chosen.length < 2) {
      if (resample) {
        return resampled(t, d, d0, iterations, scale);
      }
      throw tooFew(t, d, scale);
    }
    double[] line = fitLine(t, d, d0, chosen, scale);
    return new Hyperbola(line[0], line[1], false, iterations, false, used(t, d, d0, chosen, scale));
  }

  /**
   * The line fitted to settlements interpolated (monotone cubic on ln t through all readings) at
   * the times of the 32 Gauss-Legendre nodes in U over [0.6, 0.9] on the current c<sub>v</sub>,
   * weighted by the nodes' weights: the same sampling that defines M and C, so that an exactly
   * interpolated Terzaghi curve gives c<sub>v</sub> exactly. Iterated from the time at which the
   * interpolant reaches 75 % of the movement until the time scale settles.
   */
  private static Hyperbola resampled(double[] t, double[] d, double d0, int previous, Scale scale) {
    int n = t.length;
    double[] logT = new double[n];
    for (int i = 0; i < n; i++) {
      logT[i] = Math.log(t[i]);
    }
    MonotoneCubic interpolant = MonotoneCubic.of(logT, d);
    double reach = interpolant.firstReaching(d0 + 0.75 * (d[n - 1] - d0));
    if (!Double.isFinite(reach)) {
      throw new FitException(
          "the readings do not pass 75 % of their movement in order: no hyperbola to resample");
    }
    double ratio = Math.exp(reach) / Terzaghi.timeFactor(0.75);
    double[] line = null;
    List<PlotPoint> used = new ArrayList<>();
    boolean settled = false;
    int iterations = previous;
    for (int k = 0; k < MAX_ITERATIONS && !settled; k++) {
      iterations++;
      used = new ArrayList<>();
      List<double[]> points = new ArrayList<>();
      for (int j = 0; j < NODE_TIME_FACTORS.length; j++) {
        double time = NODE_TIME_FACTORS[j] * ratio;
        if (time < t[0] || time > t[n - 1]) {
          continue;
        }
        double delta = interpolant.value(Math.log(time)) - d0;
        if (!(delta > 0)) {
          throw new FitException(
              Checks.format(
                  "the interpolated settlement at %.4g s has not moved from the corrected zero",
                  time));
        }
        double ordinate = timeOverMovement(time, delta, scale);
        points.add(new double[] {time, ordinate, NODE_WEIGHTS[j]});
        used.add(new PlotPoint(time, ordinate));
      }
      if (points.size() < 2) {
        throw new FitException(
            Checks.format(
                "the 60-90 %% part of the curve (from %.4g s) lies outside the readings (%.4g s to"
                    + " %.4g s)",
                NODE_TIME_FACTORS[0] * ratio, t[0], t[n - 1]));
      }
      line = weightedLine(points, scale);
      double next = (HYPERBOLA_SLOPE / HYPERBOLA_INTERCEPT) * line[0] / line[1];
      settled = Math.abs(next - ratio) <= 1e-12 * ratio;
      ratio = next;
    }
    double t60 = Terzaghi.timeFactor(LOWER_DEGREE) * ratio;
    double t90 = Terzaghi.timeFactor(UPPER_DEGREE) * ratio;
    int inside = 0;
    int after = 0;
    for (double time : t) {
      inside += time >= t60 && time <= t90 ? 1 : 0;
      after += time >= t90 ? 1 : 0;
    }
    if (inside < 1 || after < 2) {
      throw new FitException(
          Checks.format(
              "fewer than 2 readings lie between 60 %% and 90 %% consolidation (t60 = %.4g s, t90"
                  + " = %.4g s) and they are too sparse to interpolate: resampling needs a reading"
                  + " inside that range and two at or after t90 (found %d and %d)",
              t60, t90, inside, after));
    }
    return new Hyperbola(line[0], line[1], settled, iterations, true, used);
  }

  /**
   * {c, m} of a weighted least-squares line through {x, y, w} points (centred sums), the times x
   * divided by a power of 2 ({@link Scale#timeExponent}) and the slope scaled back: exact, so the
   * same line wherever the sums stay within the double range without it.
   */
  private static double[] weightedLine(List<double[]> points, Scale scale) {
    double[] x = new double[points.size()];
    for (int k = 0; k < x.length; k++) {
      x[k] = points.get(k)[0];
    }
    int timeExponent = scale.timeExponent(x);
    for (int k = 0; k < x.length; k++) {
      x[k] = Math.scalb(x[k], -timeExponent);
    }
    double sw = 0;
    double mx = 0;
    double my = 0;
    for (int k = 0; k < x.length; k++) {
      double[] p = points.get(k);
      sw += p[2];
      mx += p[2] * x[k];
      my += p[2] * p[1];
    }
    mx /= sw;
    my /= sw;
    double sxx = 0;
    double sxy = 0;
    for (int k = 0; k < x.length; k++) {
      double[] p = points.get(k);
      sxx += p[2] * (x[k] - mx) * (x[k] - mx);
      sxy += p[2] * (x[k] - mx) * (p[1] - my);
    }
    double scaledSlope = sxy / sxx;
    double intercept = my - scaledSlope * mx;
    double slope = Math.scalb(scaledSlope, -timeExponent);
    if (!(sxx > 0) || !(slope > 0) || !(intercept > 0) || !Double.isFinite(slope + intercept)) {
      throw new FitException(
          "t/d against t has no positive slope and intercept over the interpolated settlements:"
              + " the curve is not a rectangular hyperbola there");
    }
    return new double[] {intercept, slope};
  }

  /**
   * t/&delta; of one point of the line, for &delta; &gt; 0 on the movement divided by 2<sup>e</sup>
   * (e = {@link Scale#movement}; so t/&delta; times 2<sup>e</sup>, s/m); a FitException where the
   * quotient overflows or underflows the normal doubles (times and settlements of very different
   * magnitudes), since the line could not be fitted then.
   */
  private static double timeOverMovement(double time, double delta, Scale scale) {
    double ratio = time / delta;
    if (!(ratio >= Double.MIN_NORMAL) || ratio == Double.POSITIVE_INFINITY) {
      throw new FitException(
          Checks.format(
              "t/d at %.4g s (%s m from the zero) is beyond the range of double precision: the"
                  + " times and settlements are too far apart in magnitude for the rectangular"
                  + " hyperbola",
              time, IncrementReadings.metresText(delta, scale.movement(), "%.4g")));
    }
    return ratio;
  }

  /**
   * A value per metre (t/&delta; in s/m, the slope in 1/m) computed on the movement scaled by
   * 2<sup>-exponent</sup>, back in its own units (exact); a FitException where it leaves the normal
   * doubles, as t/&delta; itself would (times and settlements of very different magnitudes).
   */
  private static double perMetre(double scaled, int exponent, String what, String unit) {
    double value = Math.scalb(scaled, -exponent);
    if (!(value >= Double.MIN_NORMAL) || value == Double.POSITIVE_INFINITY) {
      throw new FitException(
          Checks.format(
              "%s (%s %s) is beyond the range of double precision: the times and settlements are"
                  + " too far apart in magnitude for the rectangular hyperbola",
              what, IncrementReadings.decimal(scaled, -exponent), unit));
    }
    return value;
  }

  /** Position of the first choice equal to the given one, or -1. */
  private static int indexOf(List<int[]> choices, int[] choice) {
    for (int j = 0; j < choices.size(); j++) {
      if (Arrays.equals(choices.get(j), choice)) {
        return j;
      }
    }
    return -1;
  }

  /** Index of the first time at or after the limit (t increasing; n if none). */
  static int firstAtOrAfter(double[] t, double limit) {
    int low = 0;
    int high = t.length;
    while (low < high) {
      int mid = (low + high) >>> 1;
      if (t[mid] >= limit) {
        high = mid;
      } else {
        low = mid + 1;
      }
    }
    return low;
  }

  /** Index of the first time after the limit (t increasing; n if none). */
  static int firstAfter(double[] t, double limit) {
    int low = 0;
    int high = t.length;
    while (low < high) {
      int mid = (low + high) >>> 1;
      if (t[mid] > limit) {
        high = mid;
      } else {
        low = mid + 1;
      }
    }
    return low;
  }

  private static FitException tooFew(double[] t, double[] d, Scale scale) {
    return new FitException(
        Checks.format(
            "fewer than 2 readings lie between 60 %% and 90 %% consolidation (last reading at"
                + " %.4g s, %s m): the curve may end before 60 %% or the readings are too sparse"
                + " for the rectangular hyperbola",
            t[t.length - 1],
            IncrementReadings.metresText(d[d.length - 1], scale.movement(), "%s")));
  }

  private static List<PlotPoint> used(
      double[] t, double[] d, double d0, int[] chosen, Scale scale) {
    List<PlotPoint> used = new ArrayList<>();
    for (int i : chosen) {
      used.add(new PlotPoint(t[i], timeOverMovement(t[i], d[i] - d0, scale)));
    }
    return used;
  }

  /** {c, m} of t/(d - d0) = m t + c over the chosen readings. */
  private static double[] fitLine(double[] t, double[] d, double d0, int[] chosen, Scale scale) {
    int count = chosen.length;
    double[] x = new double[count];
    double[] y = new double[count];
    for (int k = 0; k < count; k++) {
      int i = chosen[k];
      if (!(d[i] - d0 > 0)) {
        throw new FitException(
            Checks.format(
                "the reading at %.4g s (%s m) in the 60-90 %% range has not moved from the zero"
                    + " (%s m)",
                t[i],
                IncrementReadings.metresText(d[i], scale.movement(), "%s"),
                IncrementReadings.metresText(d0, scale.movement(), "%s")));
      }
      x[k] = t[i];
      y[k] = timeOverMovement(t[i], d[i] - d0, scale);
    }
    // The times divided by a power of 2 (exact) and the slope scaled back: the same line wherever
    // the sums of squares of the times stay within the double range without it.
    int timeExponent = scale.timeExponent(x);
    for (int k = 0; k < count; k++) {
      x[k] = Math.scalb(x[k], -timeExponent);
    }
    double[] line = SmallFits.line(x, y);
    if (line != null) {
      line[1] = Math.scalb(line[1], -timeExponent);
    }
    if (line == null || !(line[1] > 0) || !(line[0] > 0) || !Double.isFinite(line[1])) {
      throw new FitException(
          "t/d against t has no positive slope and intercept over the chosen readings: the curve"
              + " is not a rectangular hyperbola there");
    }
    return line;
  }
}
