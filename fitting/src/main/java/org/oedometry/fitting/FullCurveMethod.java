package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.fitting.internal.StudentT;
import org.oedometry.fitting.internal.WeightedLeastSquares;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Terzaghi;

/**
 * Least-squares fit of the whole time-settlement curve of one increment to Terzaghi's theory with
 * secondary compression ({@link ConsolidationCurveModel}: d(t) = d<sub>i</sub> + d<sub>p</sub> U(T)
 * + s log<sub>10</sub>(1 + T/T<sub>s</sub>)), with a confidence interval on c<sub>v</sub>; after
 * Barros &amp; Pinto (2008, Geotechnical Testing Journal 31(1)), who fit initial, primary and
 * secondary compression together (from the abstract; the secondary term here is our own, documented
 * in the model).
 *
 * <h2>Procedure</h2>
 *
 * <ol>
 *   <li>The reading at t = 0 (if any) is left out, with a warning ({@link
 *       FitWarning.Kind#ZERO_READING_IGNORED}, as in the constructions); it may hold the
 *       instantaneous (false) deformation, which d<sub>i</sub> absorbs. A swelling increment (final
 *       reading below the first) is fitted on the magnitude and reported in the input's sign.
 *       Settlements whose movement lies outside 10<sup>-18</sup> m to 2 x 10<sup>6</sup> m (far
 *       outside any specimen, but what a unit mistake can give) are fitted divided by a power of 2,
 *       exactly, and the results scaled back.
 *   <li>Weights ({@link FullCurveOptions.ReadingWeights}): by default each reading weighs the span
 *       of log t it represents, normalised to a mean of 1.
 *   <li>Grouping (data loggers): above 400 readings the search of the next step runs on 100 equal
 *       bins of log t, each bin's readings represented by two points that carry their weighted
 *       mean, spread and within-bin slope (see {@code ReadingGroups}: the grouped sum of squares
 *       then depends on the parameters as the sum over every reading does, up to terms of third
 *       order in the bin width); the profile and the constructions, which only give start values,
 *       use the weighted means of coarser bins (three bins merged, about 8 a decade of time). Up to
 *       the limit every reading is its own group.
 *   <li>Starts: for 31 trial values of c<sub>v</sub>, log-spaced so that T at the last reading runs
 *       from 0.02 to 20 000, the model is linear in (d<sub>i</sub>, d<sub>p</sub>, s) and is solved
 *       exactly under d<sub>p</sub> &ge; 0, s &ge; 0 (a profile of the residual over c<sub>v
 *       </sub>). The lowest local minima of that profile (up to three, each within a factor of 4 of
 *       the lowest residual, and with a primary settlement), and the c<sub>v</sub> of the log-time
 *       and root-time constructions (on the groups) where they succeed and lie more than half a
 *       profile step away (their linear parameters solved the same way), start Levenberg-Marquardt
 *       (commons-math3, analytic Jacobian from {@link ConsolidationCurveModel}, parameters d<sub>i
 *       </sub>, d<sub>p</sub>, ln c<sub>v</sub>, s, with d<sub>p</sub> &ge; 0 and s &ge; 0 in the
 *       direction of movement: a large primary term cancelled by a negative secondary term cannot
 *       mimic a slow curve). The best fit is kept; the result says how many starts reached it.
 *   <li>Every reading: when the readings were grouped, the best grouped fit is finished on every
 *       reading by Gauss-Newton steps, one pass over the readings each, until the optimum of the
 *       weighted least squares over all readings is nearer than 0.01 standard errors (Levenberg-
 *       Marquardt takes over if a step fails); the grouped optimum usually passes this check at
 *       once, so one pass (Levenberg-Marquardt on the groups therefore stops at a relative
 *       tolerance of 10<sup>-8</sup>, against 10<sup>-12</sup> on up to 400 readings). The reported
 *       fit is therefore the fit to every reading, to well within its statistical uncertainty
 *       (tested against Levenberg-Marquardt on all readings). Iterations and evaluations count
 *       those of the best start plus these steps and passes.
 *   <li>Interval: the standard error of ln c<sub>v</sub> from the covariance of the parameters,
 *       with the readings' noise variance estimated from the unweighted residuals (&Sigma;r<sup>2
 *       </sup>/(n - p)), by the sandwich A<sup>-1</sup>BA<sup>-1</sup> (A = J<sup>T</sup>WJ, B =
 *       J<sup>T</sup>W<sup>2</sup>J; A<sup>-1</sup> alone for unit weights), then widened for
 *       residuals that follow each other (lag-1 autocorrelation &rho; &gt; 0, a sign of model error
 *       such as creep the secondary term does not follow) by the factor &radic;((1 + &rho;)/(1 -
 *       &rho;)) of an AR(1) series (not where the residuals are the rounding of an exact curve,
 *       {@link #ROUNDING_RESIDUAL_FRACTION}); the interval is exp(ln c<sub>v</sub> &plusmn;
 *       t<sub>n-p</sub> SE) with Student's t.
 * </ol>
 *
 * <h2>Warnings and errors</h2>
 *
 * Warnings: swelling increment, secondary slope at its bound 0, interval wider than a factor of 2
 * (an interval that is not refused, see below, misses one end of the c<sub>v</sub> searched and so
 * spans less than the square of its range, 10<sup>22</sup>), residuals with structure (a runs test
 * on their signs, z &lt; -2.58; not on rounding residuals), more than half of primary consolidation
 * before the first reading (U &gt; 50 % there: d<sub>0</sub> and d<sub>p</sub> are extrapolated),
 * primary consolidation incomplete (T at the last reading below 1 for the lower end of the
 * c<sub>v</sub> interval: c<sub>v</sub> then rests on an unfinished curve and must not be used
 * without review), fewer than half the starts at the best fit, outlying readings (an externally
 * studentized residual beyond the 1 % Bonferroni bound, with the leverage of each reading taken
 * into account; the warning names the readings). Measured on the invented study curves: a reading
 * 10 noise deviations off in the middle of the increment is flagged in 95 % of curves, on clean
 * curves the warning appears in 2 to 4 %; the last reading of a lab schedule, on which the
 * secondary slope rests almost alone, is flagged only when far off. {@link FitException}: the
 * readings do not move, primary consolidation was over before the first reading (c<sub>v</sub> at
 * the fast edge of the search, or U above 99 % at the first reading, {@value
 * #FIRST_READING_REMAINING_LIMIT} of d<sub>p</sub> left to see) or is not seen at all
 * (c<sub>v</sub> at the slow edge of the search, or d<sub>p</sub> at its bound 0, where
 * c<sub>v</sub> would rest only on the onset of the secondary term), the c<sub>v</sub> searched (T
 * at the last reading 10<sup>-4</sup> to 10<sup>7</sup>) is not a finite positive double for this
 * drainage path and these times (H<sub>dr</sub><sup>2</sup> beyond the range of doubles), the
 * optimiser failed from every start (the message adds that primary consolidation seems far from
 * complete where the best start puts T at the last reading below 0.2: such readings follow U = 2
 * &radic;(T/&pi;) and fix only d<sub>p</sub> &radic;c<sub>v</sub>), or c<sub>v</sub> is not
 * determined: its interval covers every c<sub>v</sub> searched, or an end of it lies outside the
 * normal double range (below 2.2 x 10<sup>-308</sup> m<sup>2</sup>/s, or above the largest value
 * that is finite in m<sup>2</sup>/yr).
 *
 * <p>Deterministic (same readings, same bits) and thread-safe. Results feed engineering decisions
 * and must be reviewed by a qualified engineer; local codes and standards govern.
 */
public final class FullCurveMethod {

  /** Trial c<sub>v</sub> values of the profile. */
  private static final int PROFILE_POINTS = 31;

  /** Range of T at the last reading covered by the profile. */
  private static final double PROFILE_LOWEST_END_FACTOR = 0.02;

  private static final double PROFILE_HIGHEST_END_FACTOR = 20_000;

  /** Bounds of T at the last reading that the fit may reach; beyond them c_v is not seen. */
  private static final double LOWEST_END_FACTOR = 1e-4;

  private static final double HIGHEST_END_FACTOR = 1e7;

  private static final int MAX_STARTS = 3;

  /**
   * T at the last reading below which the early-time form U = 2 &radic;(T/&pi;) holds to within
   * 0.11 % (4 x 10<sup>-6</sup> at T = 0.1, 10<sup>-23</sup> at T = 0.02; Terzaghi's series,
   * checked with mpmath): readings that end there fix little more than d<sub>p</sub>
   * &radic;c<sub>v</sub>. Used only to explain a failed fit.
   */
  static final double EARLY_TIME_END_FACTOR = 0.2;

  /**
   * Largest upper end of the c<sub>v</sub> interval, m<sup>2</sup>/s, that is still finite in
   * m<sup>2</sup>/yr (the unit of the reports and of {@code toString}).
   */
  static final double LARGEST_REPORTED_CV = Double.MAX_VALUE / Results.JULIAN_YEAR_SECONDS;

  /** Above this many readings (after t = 0) the search runs on log-time groups of readings. */
  static final int GROUPING_LIMIT = 400;

  /** Number of equal log-time bins the readings are grouped into above the limit. */
  static final int GROUPS = 100;

  /** Bins merged for the means that give start values (34 means from 100 bins). */
  static final int GROUPS_MERGED = 3;

  /**
   * The fit on every reading is finished when the optimum is nearer than this many standard errors
   * (see {@link WeightedLeastSquares#refineStreamed}).
   */
  private static final double REFINEMENT_STANDARD_ERRORS = 0.01;

  /**
   * Relative tolerance of Levenberg-Marquardt on the groups (above {@link #GROUPING_LIMIT}); the
   * fit is then finished on every reading.
   */
  private static final double SEARCH_TOLERANCE = 1e-8;

  /**
   * Starts whose ln c_v differ by less than half a step of the profile (the profile's c_v grow by a
   * factor of about 1.58 a step) are one start as far as the profile can tell: the later is
   * skipped.
   */
  private static final double SAME_START = 0.25;

  /** A profile minimum whose residual exceeds the lowest by more than this is not a start. */
  private static final double START_RESIDUAL_FACTOR = 4.0;

  private static final int CURVE_POINTS = 100;

  private static final double RUNS_TEST_CRITICAL_Z = -2.576;

  /**
   * Root-mean-square residual, as a fraction of the largest settlement fitted, at or below which
   * the residuals are the rounding of an exact curve (some 10<sup>-16</sup> of it; a dial gauge's
   * resolution is 10<sup>-3</sup> of a typical increment): their signs are not read for structure
   * and the interval is not widened for their autocorrelation. Our choice: {@value}.
   */
  static final double ROUNDING_RESIDUAL_FRACTION = 1e-12;

  /**
   * Fraction of primary consolidation still to come at the first reading below which the fit is
   * refused: 0.01 (U &gt; 99 % there, T &gt; 1.78). The readings then see at most 1 % of
   * d<sub>p</sub>, so d<sub>0</sub> and d<sub>p</sub> would be extrapolated a hundredfold; our
   * choice, stated so it can be reviewed.
   */
  static final double FIRST_READING_REMAINING_LIMIT = 0.01;

  /**
   * Fraction of primary consolidation still to come at the first reading below which the fit warns
   * {@link FitWarning.Kind#PRIMARY_BEFORE_FIRST_READING}: 0.5 (U &gt; 50 % there, T &gt; 0.197).
   * The log-time construction needs readings before 50 to 60 % consolidation for its corrected zero
   * (Casagrande's parabola rule, FACTS.md); past that no reading supports d<sub>0</sub>.
   */
  static final double FIRST_READING_WARNING_REMAINING = 0.5;

  private FullCurveMethod() {}

  /**
   * Fits with {@link FullCurveOptions#defaults()}.
   *
   * @param curve one increment's readings
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @return the fit
   * @throws IllegalArgumentException if the drainage path is not finite and positive, or there are
   *     too few readings after t = 0 for the parameters
   * @throws FitException if the curve admits no honest fit (see the class description)
   */
  public static FullCurveResult fit(SettlementCurve curve, double drainagePathMetres) {
    return fit(curve, drainagePathMetres, FullCurveOptions.defaults());
  }

  /**
   * Fits with the given options.
   *
   * @param curve one increment's readings
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @param options the options
   * @return the fit
   * @throws IllegalArgumentException if the drainage path is not finite and positive, or there are
   *     too few readings after t = 0 for the parameters
   * @throws FitException if the curve admits no honest fit (see the class description)
   */
  public static FullCurveResult fit(
      SettlementCurve curve, double drainagePathMetres, FullCurveOptions options) {
    Checks.requireDrainagePath(drainagePathMetres);
    if (curve == null || options == null) {
      throw new IllegalArgumentException("curve and options must not be null");
    }
    final int parameterCount = options.fitSecondary() ? 4 : 3;
    final double[] allTimes = curve.elapsedSeconds();
    final double[] allSettlements = curve.settlementMetres();
    final int first = allTimes[0] == 0.0 ? 1 : 0;
    final int n = allTimes.length - first;
    if (n < parameterCount + 2) {
      throw new IllegalArgumentException(
          Checks.format(
              "%d readings after t = 0 are too few for the full-curve fit of %d parameters (needs"
                  + " at least %d)",
              n, parameterCount, parameterCount + 2));
    }
    // The curve's accessors return copies already: copy again only to drop a zero reading.
    final double[] t = first == 0 ? allTimes : Arrays.copyOfRange(allTimes, first, allTimes.length);
    final double[] y =
        first == 0
            ? allSettlements
            : Arrays.copyOfRange(allSettlements, first, allSettlements.length);
    double lowest = y[0];
    double highest = y[0];
    double sum = 0;
    for (double value : y) {
      // The readings are finite (SettlementCurve): plain comparisons suffice.
      if (value < lowest) {
        lowest = value;
      }
      if (value > highest) {
        highest = value;
      }
      sum += value;
    }
    if (!(highest > lowest)) {
      throw new FitException(
          "the readings do not move (every settlement is "
              + y[0]
              + " m): there is no consolidation to fit");
    }
    final double sign = y[n - 1] >= y[0] ? 1.0 : -1.0;
    // Settlements of extreme magnitude are fitted scaled by a power of 2 (exactly); ordinary ones
    // are not scaled at all. toInput takes fitted settlements back to the input's sign and unit.
    final int scale = settlementScale(lowest, highest);
    final double toInput = Math.scalb(sign, scale);
    // Mean of the fitted (magnitude) settlements, for R^2.
    final double mean = Math.scalb(sign * sum / n, -scale);
    if (toInput != 1.0) {
      // Fitted on the magnitude (the array is this method's own copy).
      for (int i = 0; i < n; i++) {
        y[i] = Math.scalb(sign * y[i], -scale);
      }
    }
    final double[] w = weights(t, options.weights());
    final ConsolidationCurveModel model =
        new ConsolidationCurveModel(drainagePathMetres, options.secondaryOnset());
    final double pathSquared = drainagePathMetres * drainagePathMetres;
    final double lastTime = t[n - 1];
    final double lowestLogCv = Math.log(LOWEST_END_FACTOR * pathSquared / lastTime);
    final double highestLogCv = Math.log(HIGHEST_END_FACTOR * pathSquared / lastTime);
    if (!(Math.exp(lowestLogCv) > 0) || !(Math.exp(highestLogCv) < Double.POSITIVE_INFINITY)) {
      throw new FitException(
          Checks.format(
              "the c_v searched (T at the last reading %s to %s, with H_dr = %s m and the last"
                  + " reading at %s s) lies outside the range of double-precision numbers",
              LOWEST_END_FACTOR, HIGHEST_END_FACTOR, drainagePathMetres, lastTime));
    }

    // 1. Many readings are grouped into log-time bins for the search (start values, profile and
    // the multi-start Levenberg-Marquardt); the fit is then finished on every reading.
    final ReadingGroups groups = ReadingGroups.of(t, y, w, GROUPING_LIMIT, GROUPS, GROUPS_MERGED);
    final double[] profileTimes = groups.meanTimes();
    final double[] profileY = groups.meanSettlements();
    final double[] profileWeights = groups.meanWeights();
    final double[] groupTimes = groups.times();
    // Profile of the residual over trial c_v, linear parameters solved exactly, on the bin means
    // (start values only).
    double[] profileLogCv = new double[PROFILE_POINTS];
    double[] profileRss = new double[PROFILE_POINTS];
    double[][] profileLinear = new double[PROFILE_POINTS][];
    for (int k = 0; k < PROFILE_POINTS; k++) {
      double endFactor =
          PROFILE_LOWEST_END_FACTOR
              * Math.pow(
                  PROFILE_HIGHEST_END_FACTOR / PROFILE_LOWEST_END_FACTOR,
                  k / (double) (PROFILE_POINTS - 1));
      double cv = endFactor * pathSquared / lastTime;
      profileLogCv[k] = Math.log(cv);
      profileLinear[k] =
          linearFit(model, cv, profileTimes, profileY, profileWeights, options.fitSecondary());
      profileRss[k] = profileLinear[k] == null ? Double.NaN : profileLinear[k][3];
    }
    // A trial c_v whose best linear fit has no primary settlement cannot start a search for c_v
    // (the residual does not depend on c_v there): such points are not starts.
    for (int k = 0; k < PROFILE_POINTS; k++) {
      if (profileLinear[k] == null || !(profileLinear[k][1] > 0)) {
        profileRss[k] = Double.NaN;
      }
    }
    List<Integer> startIndices = lowestLocalMinima(profileRss, MAX_STARTS);
    if (startIndices.isEmpty()) {
      throw new FitException(
          "no primary consolidation is seen in these readings: at every trial c_v the best fit"
              + " has no primary settlement");
    }

    // 2. Levenberg-Marquardt from each start; keep the best.
    WeightedLeastSquares solver =
        WeightedLeastSquares.withDefaults().withMaxIterations(options.maxIterations());
    WeightedLeastSquares.Model groupModel =
        (p, values, jacobian) -> {
          ConsolidationCurveModel.Curve at =
              model.curve(
                  new CurveParameters(
                      p[0], p[1], Math.exp(p[2]), parameterCount == 4 ? p[3] : 0.0));
          double[] full = new double[4];
          for (int i = 0; i < values.length; i++) {
            values[i] = at.settlementAndGradient(groupTimes[i], full);
            System.arraycopy(full, 0, jacobian[i], 0, parameterCount);
          }
        };
    // On groups the search only has to come near enough for the pass over every reading to finish
    // it (which keeps the solver's own tolerance): a looser tolerance saves iterations there.
    WeightedLeastSquares searchSolver = solver.withTolerance(SEARCH_TOLERANCE);
    ParameterValidator bounds =
        point -> {
          point.setEntry(1, Math.max(0.0, point.getEntry(1)));
          point.setEntry(2, Math.min(highestLogCv, Math.max(lowestLogCv, point.getEntry(2))));
          if (parameterCount == 4) {
            point.setEntry(3, Math.max(0.0, point.getEntry(3)));
          }
          return point;
        };
    WeightedLeastSquares.Solution best = null;
    List<Double> reachedLogCv = new ArrayList<>();
    FitException lastFailure = null;
    List<double[]> starts = new ArrayList<>();
    for (int index : startIndices) {
      starts.add(startVector(profileLinear[index], profileLogCv[index], parameterCount));
    }
    // The log-time and root-time constructions, where they succeed, give further starts.
    for (double constructionCv :
        constructionCvs(groups.asCurve(curve, first, toInput), drainagePathMetres)) {
      double[] linear =
          linearFit(
              model,
              constructionCv,
              profileTimes,
              profileY,
              profileWeights,
              options.fitSecondary());
      double logCv = Math.log(constructionCv);
      boolean near = starts.stream().anyMatch(st -> Math.abs(st[2] - logCv) < SAME_START);
      if (linear != null && linear[1] > 0 && !near) {
        starts.add(startVector(linear, logCv, parameterCount));
      }
    }
    for (double[] start : starts) {
      try {
        WeightedLeastSquares.Solution solution =
            groups.grouped()
                ? searchSolver.solveStreamed(
                    new CurvePoints(model, groupTimes, parameterCount),
                    groups.settlements(),
                    groups.weights(),
                    start,
                    bounds)
                : solver.solve(groupModel, groups.settlements(), groups.weights(), start, bounds);
        reachedLogCv.add(solution.parameters()[2]);
        if (best == null
            || solution.weightedResidualSumOfSquares() < best.weightedResidualSumOfSquares()) {
          best = solution;
        }
      } catch (FitException e) {
        lastFailure = e;
      }
    }
    if (best == null) {
      // T at the last reading for the lowest point of the profile: far below 1, the readings
      // follow U = 2 sqrt(T / pi) and fix only d_p sqrt(c_v), and Levenberg-Marquardt wanders
      // along that valley.
      double bestStartEndFactor =
          Math.exp(profileLogCv[startIndices.get(0)]) * lastTime / pathSquared;
      String hint =
          bestStartEndFactor < EARLY_TIME_END_FACTOR
              ? Checks.format(
                  " (the best start puts T at the last reading at %.2g: primary consolidation"
                      + " seems far from complete, and such readings fix only d_p sqrt(c_v), not"
                      + " c_v)",
                  bestStartEndFactor)
              : "";
      throw new FitException(
          "the least-squares fit failed from every start: " + lastFailure.getMessage() + hint,
          lastFailure);
    }
    int iterations = best.iterations();
    int evaluations = best.evaluations();
    final double searchLogCv = best.parameters()[2];
    if (groups.grouped()) {
      // Finish on every reading from the best grouped fit.
      WeightedLeastSquares.PointModel readingModel = new CurvePoints(model, t, parameterCount);
      best =
          solver.refineStreamed(
              readingModel, y, w, best.parameters(), bounds, REFINEMENT_STANDARD_ERRORS);
      iterations += best.iterations();
      evaluations += best.evaluations();
    }
    final double[] p = best.parameters();
    final double logCv = p[2];
    if (logCv <= lowestLogCv + 1e-9) {
      throw new FitException(
          Checks.format(
              "primary consolidation is not seen in these readings: the best fit runs to the"
                  + " slowest c_v searched (T at the last reading %s)",
              LOWEST_END_FACTOR));
    }
    if (logCv >= highestLogCv - 1e-9) {
      throw new FitException(
          "primary consolidation was over before the first reading (the best fit runs to the"
              + " fastest c_v searched): c_v cannot be found from these readings");
    }
    final double cv = Math.exp(logCv);
    final double secondary = parameterCount == 4 ? p[3] : 0.0;
    int atBest = 0;
    for (double reached : reachedLogCv) {
      if (Math.abs(reached - searchLogCv) < 1e-3) {
        atBest++;
      }
    }

    // 3. Covariance: sandwich with noise variance from unweighted residuals, AR(1) widening.
    double[] residuals = best.residuals();
    // One pass: the residuals' sum of squares and lag-1 products, and the total sum of squares of
    // the settlements about their mean (for R^2).
    double sumSquares = residuals[0] * residuals[0];
    double lagProduct = 0;
    double total = (y[0] - mean) * (y[0] - mean);
    for (int i = 1; i < n; i++) {
      sumSquares += residuals[i] * residuals[i];
      lagProduct += residuals[i] * residuals[i - 1];
      total += (y[i] - mean) * (y[i] - mean);
    }
    // Residuals at the rounding level of an exact curve (from the fitted magnitudes, scaled like
    // the residuals): no structure to read, nothing to widen.
    double largestFitted = Math.scalb(Math.max(Math.abs(lowest), Math.abs(highest)), -scale);
    boolean roundingOnly = Math.sqrt(sumSquares / n) <= ROUNDING_RESIDUAL_FRACTION * largestFitted;
    double autocorrelation = sumSquares > 0 && !roundingOnly ? lagProduct / sumSquares : 0.0;
    double clipped = Math.min(0.95, Math.max(0.0, autocorrelation));
    double widening = (1 + clipped) / (1 - clipped);
    CurveParameters fitted = new CurveParameters(p[0], p[1], cv, secondary);
    // The sandwich A^-1 B A^-1 with the noise variance of the unweighted residuals (A^-1 alone,
    // scaled the same way, for unit weights).
    double[][] covariance = best.equalNoiseCovariance();
    double[] errors = new double[4];
    for (int j = 0; j < parameterCount; j++) {
      errors[j] = Math.sqrt(Math.max(0.0, covariance[j][j] * widening));
    }
    // d_i, d_p and s in metres of the input (ln c_v has no unit).
    errors[0] = Math.scalb(errors[0], scale);
    errors[1] = Math.scalb(errors[1], scale);
    errors[3] = Math.scalb(errors[3], scale);
    double quantile = StudentT.quantile(0.5 + options.confidenceLevel() / 2, n - parameterCount);
    double halfWidth = quantile * errors[2];
    double cvLow = Math.exp(logCv - halfWidth);
    double cvHigh = Math.exp(logCv + halfWidth);
    if (!(cvLow >= Double.MIN_NORMAL) || !(cvHigh <= LARGEST_REPORTED_CV)) {
      throw new FitException(
          Checks.format(
              "c_v is not determined by these readings: its %.0f %% confidence interval runs"
                  + " beyond the range of numbers (about 1e-308 to 1e300 m^2/s)",
              100 * options.confidenceLevel()));
    }
    if (logCv - halfWidth <= lowestLogCv && logCv + halfWidth >= highestLogCv) {
      throw new FitException(
          Checks.format(
              "c_v is not determined by these readings: its %.0f %% confidence interval, %s to %s"
                  + " m^2/s, covers every c_v searched (T at the last reading from %s to %s)",
              100 * options.confidenceLevel(),
              cvLow,
              cvHigh,
              LOWEST_END_FACTOR,
              HIGHEST_END_FACTOR));
    }

    // As for a best fit at the fast edge of the search: a best fit inside the range that puts
    // nearly all of primary consolidation before the first reading fits the readings with the last
    // traces of the exponential tail, d_p (1 - U) = d_p (8 / pi^2) exp(-pi^2 T / 4), and d_p and
    // d_i grow without physical meaning (seen: d_p = 2.6e9 m and d_i = -2.6e9 m on a 19 mm
    // specimen).
    double firstTimeFactor = cv * t[0] / pathSquared;
    double remainingAtFirst = Terzaghi.remainingFraction(firstTimeFactor);
    if (remainingAtFirst < FIRST_READING_REMAINING_LIMIT) {
      throw new FitException(
          Checks.format(
              "primary consolidation was over before the first reading: the best fit puts U at"
                  + " %.4f %% there (T = %.3g at t = %.4g s), so d0 and d_p would be extrapolated"
                  + " from the last %.2g %% of primary: c_v cannot be found from these readings",
              100 * (1 - remainingAtFirst), firstTimeFactor, t[0], 100 * remainingAtFirst));
    }
    if (p[1] == 0.0) {
      // As for the trial c_v of the profile: without primary settlement c_v enters the fit only
      // through the onset of the secondary term, T_s H^2 / c_v, which is no consolidation.
      throw new FitException(
          "no primary consolidation is seen in these readings: the best fit has no primary"
              + " settlement (d_p at its bound 0), so c_v would rest only on where the secondary"
              + " term begins");
    }

    // 4. Statistics, warnings and the plotted curve.
    double rSquared = total > 0 ? 1 - sumSquares / total : 0.0;
    double endFactor = cv * lastTime / pathSquared;
    List<FitWarning> warnings = new ArrayList<>();
    if (first == 1) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.ZERO_READING_IGNORED,
              Checks.format(
                  "the reading at t = 0 (%s m) was left out of the fit; d0 is the fitted"
                      + " settlement at t = 0+",
                  allSettlements[0])));
    }
    if (sign < 0) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.SWELLING_INCREMENT,
              "settlement decreases (swelling): the fit used the magnitude; swelling c_v is"
                  + " usually reported for information only"));
    }
    if (parameterCount == 4 && secondary == 0.0) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.PARAMETER_AT_BOUND,
              "the secondary slope is at its bound 0: no secondary compression is seen"));
    }
    // The spread is finite: the refusal above leaves an interval that misses one end of the search
    // range, ln c_v - halfWidth > lowestLogCv or ln c_v + halfWidth < highestLogCv, with ln c_v
    // inside that range; so halfWidth is below its width, ln(HIGHEST_END_FACTOR /
    // LOWEST_END_FACTOR) = ln 1e11, and cvHigh / cvLow = exp(2 halfWidth) < 1e22.
    double spread = cvHigh / cvLow;
    if (spread > 2) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.WIDE_INTERVAL,
              Checks.format(
                  "the %.0f %% interval of c_v spans a factor of %.3g (%.4g to %.4g m^2/s)",
                  100 * options.confidenceLevel(), spread, cvLow, cvHigh)));
    }
    double runsZ = roundingOnly ? 0.0 : runsTestZ(residuals);
    if (runsZ < RUNS_TEST_CRITICAL_Z) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.RESIDUALS_SHOW_STRUCTURE,
              Checks.format(
                  "the residuals change sign too rarely (runs test z = %.2f, lag-1"
                      + " autocorrelation %.2f): the model misses part of the curve; the interval"
                      + " was widened by %.2f",
                  runsZ, autocorrelation, Math.sqrt(widening))));
    }
    double lowEndFactor = cvLow * lastTime / pathSquared;
    if (lowEndFactor < 1) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.PRIMARY_INCOMPLETE,
              Checks.format(
                  "T at the last reading is %.3g (%.3g at the lower end of the c_v interval):"
                      + " primary consolidation may not be complete, and c_v rests on an"
                      + " unfinished curve",
                  endFactor, lowEndFactor)));
    }
    if (remainingAtFirst < FIRST_READING_WARNING_REMAINING) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.PRIMARY_BEFORE_FIRST_READING,
              Checks.format(
                  "the fit puts U at %.1f %% at the first reading (T = %.3g at t = %.4g s): most of"
                      + " primary consolidation happened before it, so d0 and d_p are"
                      + " extrapolated and c_v rests on the last %.1f %% of primary; earlier"
                      + " readings would support them",
                  100 * (1 - remainingAtFirst), firstTimeFactor, t[0], 100 * remainingAtFirst)));
    }
    List<double[]> outlying =
        outlyingReadings(t, residuals, sumSquares, w, model.curve(fitted), best, parameterCount);
    if (!outlying.isEmpty()) {
      StringBuilder list = new StringBuilder();
      for (int k = 0; k < Math.min(outlying.size(), 5); k++) {
        int index = (int) outlying.get(k)[0];
        list.append(k == 0 ? "" : "; ")
            .append(
                Checks.format(
                    "index %d (t = %.4g s, %.3g standard deviations)",
                    index + first, t[index], outlying.get(k)[1]));
      }
      if (outlying.size() > 5) {
        list.append(Checks.format("; and %d more", outlying.size() - 5));
      }
      warnings.add(
          new FitWarning(
              FitWarning.Kind.OUTLYING_READING,
              Checks.format(
                  "%d reading%s lie%s further from the fitted curve than the scatter of the others"
                      + " allows (externally studentized residual beyond the %.2g %% Bonferroni"
                      + " bound): %s; check %s, a wild reading pulls the fit",
                  outlying.size(),
                  outlying.size() == 1 ? "" : "s",
                  outlying.size() == 1 ? "s" : "",
                  100 * OUTLIER_FAMILY_PROBABILITY,
                  list,
                  outlying.size() == 1 ? "it" : "them")));
    }
    if (2 * atBest < starts.size()) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.STARTS_DISAGREE,
              Checks.format(
                  "only %d of %d least-squares starts reached the best fit",
                  atBest, starts.size())));
    }
    List<PlotPoint> plotted = new ArrayList<>(CURVE_POINTS);
    ConsolidationCurveModel.Curve fittedCurve = model.curve(fitted);
    double logFirst = Math.log10(t[0]);
    double logLast = Math.log10(lastTime);
    for (int k = 0; k < CURVE_POINTS; k++) {
      double logTime = logFirst + (logLast - logFirst) * k / (CURVE_POINTS - 1);
      plotted.add(new PlotPoint(logTime, toInput * fittedCurve.settlement(Math.pow(10, logTime))));
    }
    // The residuals array is this method's own copy: the list takes it over, negated in place for a
    // swelling increment (and scaled back for settlements of extreme magnitude).
    if (toInput != 1.0) {
      for (int i = 0; i < n; i++) {
        residuals[i] = toInput * residuals[i];
      }
    }
    List<Double> residualList = FrozenDoubles.owning(residuals);
    CurveParameters reported =
        new CurveParameters(toInput * p[0], toInput * p[1], cv, toInput * secondary);
    return new FullCurveResult(
        cv,
        cvLow,
        cvHigh,
        options.confidenceLevel(),
        reported.initialSettlement(),
        reported.endOfPrimarySettlement(),
        reported.secondarySlope(),
        reported,
        List.of(errors[0], errors[1], errors[2], errors[3]),
        residualList,
        Math.scalb(Math.sqrt(sumSquares / n), scale),
        rSquared,
        iterations,
        evaluations,
        starts.size(),
        atBest,
        drainagePathMetres,
        endFactor,
        plotted,
        warnings);
  }

  /** Family-wise probability of the Bonferroni test for outlying readings (1 %). */
  static final double OUTLIER_FAMILY_PROBABILITY = 0.01;

  /** Fraction of the bound (times sigma) a residual must exceed to be examined, many readings. */
  static final double OUTLIER_SCREEN = 0.8;

  /** Weight (mean 1) above which a reading is always examined on many readings. */
  static final double OUTLIER_HEAVY_WEIGHT = 100.0;

  /** Readings at each end always checked for outlying on many readings (high leverage there). */
  private static final int OUTLIER_END_READINGS = 10;

  /**
   * Step of the grid of log<sub>10</sub> t on which the screen bounds the leverage (cycles): the
   * model's gradient changes by a small fraction over it.
   */
  static final double OUTLIER_LEVERAGE_STEP = 0.01;

  /** Weighted leverage that may be exceeded only by readings examined on many readings. */
  static final double OUTLIER_LEVERAGE_SCREEN = 0.1;

  /**
   * Readings whose externally studentized residual ({@link #studentizedResiduals}) exceeds the
   * Bonferroni bound: Student's t quantile at 1 - {@value #OUTLIER_FAMILY_PROBABILITY}/(2n) for n -
   * p - 1 degrees of freedom (Cook &amp; Weisberg 1982, Residuals and Influence in Regression, ch.
   * 2: the Bonferroni outlier test). Above {@link #GROUPING_LIMIT} readings only these are
   * examined: the first and last ten, those whose weight exceeds {@value #OUTLIER_HEAVY_WEIGHT}
   * times the mean, those whose weighted leverage h<sub>ii</sub> = w<sub>i</sub> J<sub>i</sub>
   * A<sup>-1</sup>J<sub>i</sub><sup>T</sup> may exceed {@value #OUTLIER_LEVERAGE_SCREEN} (J
   * A<sup>-1</sup>J<sup>T</sup> taken as twice the larger of its values at the ends of the step of
   * a grid of {@value #OUTLIER_LEVERAGE_STEP} log cycle that holds the reading; the leverages sum
   * to p, so few readings qualify: those alone on a stretch of log time that fixes a parameter),
   * and those whose residual exceeds {@value #OUTLIER_SCREEN} of the bound times &sigma;&#770;. Any
   * other reading has c<sub>i</sub> &ge; 1 - 2h<sub>ii</sub> &ge; 0.8, and reaches the bound only
   * if c<sub>i</sub> (&sigma;<sub>(i)</sub>/&sigma;&#770;)<sup>2</sup> &lt; 0.64, that is if
   * leaving it out removes a fifth of the residual variance, which takes |r<sub>i</sub>| &gt; 0.4
   * &radic;(n - p) &sigma;&#770; &ge; 8 &sigma;&#770;: beyond the screen. Where the grid would have
   * as many nodes as half the readings, every reading is examined. The test checks that the screen
   * changes nothing on logger increments and on increments with few readings in a gap.
   *
   * @param sumSquares &Sigma; r<sup>2</sup> of the residuals
   * @return {index, studentized residual} of each outlying reading, in time order
   */
  static List<double[]> outlyingReadings(
      double[] t,
      double[] residuals,
      double sumSquares,
      double[] weights,
      ConsolidationCurveModel.Curve curve,
      WeightedLeastSquares.Solution solution,
      int parameterCount) {
    int n = residuals.length;
    List<double[]> found = new ArrayList<>();
    Studentized studentized =
        Studentized.of(t, residuals, sumSquares, weights, curve, solution, parameterCount);
    if (studentized == null) {
      return found;
    }
    double bound =
        StudentT.quantile(1 - OUTLIER_FAMILY_PROBABILITY / (2.0 * n), n - parameterCount - 1);
    // Every reading is examined (the screen at minus infinity) up to GROUPING_LIMIT readings, and
    // where the leverage grid would cost as much.
    double screen = Double.NEGATIVE_INFINITY;
    double[] nodeTimes = null;
    double[] nodeFactors = null;
    if (n > GROUPING_LIMIT) {
      double low = Math.log10(t[0]);
      double steps = Math.max(1, Math.ceil((Math.log10(t[n - 1]) - low) / OUTLIER_LEVERAGE_STEP));
      if (steps < n / 2) {
        screen = OUTLIER_SCREEN * bound * Math.sqrt(studentized.noiseVariance);
        int last = (int) steps;
        nodeTimes = new double[last + 1];
        nodeFactors = new double[last + 1];
        // Node times by a product of steps (within a few hundred ulp of 10^(low + k step): they
        // only
        // place the grid).
        double ratio = Math.pow(10, OUTLIER_LEVERAGE_STEP);
        double time = t[0];
        for (int k = 0; k <= last; k++) {
          nodeTimes[k] = k == last ? t[n - 1] : time;
          nodeFactors[k] = studentized.leverageFactor(nodeTimes[k]);
          time *= ratio;
        }
      }
    }
    int ends = Math.min(OUTLIER_END_READINGS, n);
    int inside = Math.max(ends, n - ends);
    for (int i = 0; i < ends; i++) {
      addIfOutlying(found, i, studentized.at(i), bound);
    }
    // Inside the increment only the readings that pass the screen, node interval by node interval
    // (a reading at a node's time belongs to the interval that ends there).
    if (nodeTimes == null) {
      for (int i = ends; i < inside; i++) {
        addIfOutlying(found, i, studentized.at(i), bound);
      }
    } else {
      int i = ends;
      for (int node = 0; node + 1 < nodeTimes.length; node++) {
        double factor = 2 * Math.max(nodeFactors[node], nodeFactors[node + 1]);
        boolean lastInterval = node + 2 == nodeTimes.length;
        for (; i < inside && (lastInterval || t[i] <= nodeTimes[node + 1]); i++) {
          if (Math.abs(residuals[i]) > screen
              || weights[i] > OUTLIER_HEAVY_WEIGHT
              || !(weights[i] * factor <= OUTLIER_LEVERAGE_SCREEN)) {
            addIfOutlying(found, i, studentized.at(i), bound);
          }
        }
      }
    }
    for (int i = inside; i < n; i++) {
      addIfOutlying(found, i, studentized.at(i), bound);
    }
    return found;
  }

  private static void addIfOutlying(List<double[]> found, int index, double value, double bound) {
    if (Math.abs(value) > bound) {
      found.add(new double[] {index, value});
    }
  }

  /**
   * Externally studentized residuals of the fit, every reading (see {@link Studentized}).
   *
   * @return t<sub>i</sub> for each reading (0 where it cannot be formed)
   */
  static double[] studentizedResiduals(
      double[] t,
      double[] residuals,
      double[] weights,
      ConsolidationCurveModel.Curve curve,
      WeightedLeastSquares.Solution solution,
      int parameterCount) {
    double sumSquares = 0;
    for (double r : residuals) {
      sumSquares += r * r;
    }
    double[] out = new double[residuals.length];
    Studentized studentized =
        Studentized.of(t, residuals, sumSquares, weights, curve, solution, parameterCount);
    if (studentized != null) {
      for (int i = 0; i < out.length; i++) {
        out[i] = studentized.at(i);
      }
    }
    return out;
  }

  /**
   * Externally studentized residuals for equal noise &sigma; on every reading and the design
   * weights W: the residuals are r = (I - P) &epsilon; with P = J A<sup>-1</sup>J<sup>T</sup>W
   * (linearised at the optimum), so var r<sub>i</sub> = &sigma;<sup>2</sup> c<sub>i</sub>,
   * c<sub>i</sub> = 1 - 2 w<sub>i</sub> J<sub>i</sub>A<sup>-1</sup>J<sub>i</sub><sup>T</sup> +
   * J<sub>i</sub>A<sup>-1</sup>BA<sup>-1</sup>J<sub>i</sub><sup>T</sup> (1 - h<sub>ii</sub> for
   * unit weights; A<sup>-1</sup> and A<sup>-1</sup>BA<sup>-1</sup> from the solution's two
   * covariances); &sigma;<sub>(i)</sub><sup>2</sup> = ((n - p) &sigma;&#770;<sup>2</sup> -
   * r<sub>i</sub><sup>2</sup>/c<sub>i</sub>) / (n - p - 1) leaves the reading out, &sigma;&#770;
   * <sup>2</sup> = &Sigma; r<sup>2</sup>/(n - p), and t<sub>i</sub> = r<sub>i</sub> /
   * (&sigma;<sub>(i)</sub> &radic;c<sub>i</sub>). Confined to one call's thread (a gradient
   * buffer).
   */
  private static final class Studentized {
    private final double[] t;
    private final double[] residuals;
    private final double[] weights;
    private final ConsolidationCurveModel.Curve curve;
    private final double[][] covariance;
    private final double[][] sandwich;
    private final int parameterCount;
    private final double noiseVariance;
    private final double weightedVariance;
    private final double[] gradient = new double[4];

    private Studentized(
        double[] t,
        double[] residuals,
        double[] weights,
        ConsolidationCurveModel.Curve curve,
        WeightedLeastSquares.Solution solution,
        int parameterCount,
        double noiseVariance,
        double weightedVariance) {
      this.t = t;
      this.residuals = residuals;
      this.weights = weights;
      this.curve = curve;
      this.covariance = solution.covariance();
      this.sandwich = solution.equalNoiseCovariance();
      this.parameterCount = parameterCount;
      this.noiseVariance = noiseVariance;
      this.weightedVariance = weightedVariance;
    }

    /** The calculator, or null if there are too few readings or no scatter at all. */
    static Studentized of(
        double[] t,
        double[] residuals,
        double sumSquares,
        double[] weights,
        ConsolidationCurveModel.Curve curve,
        WeightedLeastSquares.Solution solution,
        int parameterCount) {
      int n = residuals.length;
      double noiseVariance = sumSquares / (n - parameterCount);
      double weightedVariance = solution.weightedResidualSumOfSquares() / (n - parameterCount);
      if (n - parameterCount - 1 < 1 || !(noiseVariance > 0) || !(weightedVariance > 0)) {
        return null;
      }
      return new Studentized(
          t, residuals, weights, curve, solution, parameterCount, noiseVariance, weightedVariance);
    }

    /**
     * J A<sup>-1</sup>J<sup>T</sup> at a time (J the model's gradient there): the weighted leverage
     * a reading of weight 1 would have there.
     */
    double leverageFactor(double seconds) {
      curve.settlementAndGradient(seconds, gradient);
      double q = 0;
      for (int j = 0; j < parameterCount; j++) {
        double[] row = covariance[j];
        double sum = 0;
        for (int k = 0; k < parameterCount; k++) {
          sum += row[k] * gradient[k];
        }
        q += gradient[j] * sum;
      }
      return q / weightedVariance;
    }

    /** t<sub>i</sub>, or 0 where c<sub>i</sub> or &sigma;<sub>(i)</sub> is not positive. */
    double at(int i) {
      int n = residuals.length;
      curve.settlementAndGradient(t[i], gradient);
      double q = 0;
      double g = 0;
      for (int j = 0; j < parameterCount; j++) {
        for (int k = 0; k < parameterCount; k++) {
          q += gradient[j] * covariance[j][k] * gradient[k];
          g += gradient[j] * sandwich[j][k] * gradient[k];
        }
      }
      double c = 1 - 2 * weights[i] * q / weightedVariance + g / noiseVariance;
      double leftOut = (n - parameterCount) * noiseVariance - residuals[i] * residuals[i] / c;
      if (!(c > 1e-12) || !(leftOut > 0)) {
        return 0.0;
      }
      double value = residuals[i] / Math.sqrt(leftOut / (n - parameterCount - 1) * c);
      return Double.isFinite(value) ? value : 0.0;
    }
  }

  /** Exponent of 2 of the movement below which (and above which) settlements are scaled. */
  private static final int LEAST_ORDINARY_EXPONENT = -60;

  private static final int GREATEST_ORDINARY_EXPONENT = 20;

  /** Exponent of 2 of the movement of scaled settlements (about a millimetre). */
  private static final int SCALED_EXPONENT = -10;

  /**
   * The power of 2 by which the fit divides settlements: 0 for a movement (highest - lowest
   * reading) from 2<sup>-60</sup> m (10<sup>-18</sup>) to 2<sup>21</sup> m, else the one that
   * brings the movement to about 2<sup>-10</sup> m, so that sums of squared residuals neither
   * underflow nor overflow. Dividing by a power of 2 is exact, and the fit's tolerances are
   * relative, so the result scales back with the settlements.
   */
  static int settlementScale(double lowest, double highest) {
    // Half the movement: no overflow between readings of opposite sign near the double range.
    int exponent = Math.getExponent(0.5 * highest - 0.5 * lowest) + 1;
    if (exponent >= LEAST_ORDINARY_EXPONENT && exponent <= GREATEST_ORDINARY_EXPONENT) {
      return 0;
    }
    return exponent - SCALED_EXPONENT;
  }

  /**
   * The curve model at given times as a point model for the streamed solver, with the curve's
   * parameters built once per parameter vector (the solver passes the same array for a whole pass).
   * Confined to one fit, on one thread.
   */
  private static final class CurvePoints implements WeightedLeastSquares.PointModel {
    private final ConsolidationCurveModel model;
    private final double[] times;
    private final int parameterCount;
    private final double[] scratch = new double[ConsolidationCurveModel.PARAMETER_COUNT];
    private double[] builtFor;
    private ConsolidationCurveModel.Curve built;

    CurvePoints(ConsolidationCurveModel model, double[] times, int parameterCount) {
      this.model = model;
      this.times = times;
      this.parameterCount = parameterCount;
    }

    @Override
    public double valueAndGradient(int index, double[] q, double[] gradient) {
      if (q != builtFor) {
        builtFor = q;
        built =
            model.curve(
                new CurveParameters(q[0], q[1], Math.exp(q[2]), parameterCount == 4 ? q[3] : 0.0));
      }
      if (parameterCount == 4) {
        return built.settlementAndGradient(times[index], gradient);
      }
      double value = built.settlementAndGradient(times[index], scratch);
      System.arraycopy(scratch, 0, gradient, 0, parameterCount);
      return value;
    }
  }

  /** A start (d_i, d_p, ln c_v[, s]) from a linear solution {d_i, d_p, s, rss}. */
  private static double[] startVector(double[] linear, double logCv, int parameterCount) {
    return parameterCount == 4
        ? new double[] {linear[0], linear[1], logCv, linear[2]}
        : new double[] {linear[0], linear[1], logCv};
  }

  /** c_v of the log-time and root-time constructions, those that succeed, m^2/s. */
  private static List<Double> constructionCvs(SettlementCurve curve, double drainagePath) {
    List<Double> values = new ArrayList<>(2);
    try {
      values.add(LogTimeMethod.fit(curve, drainagePath).cv());
    } catch (FitException | IllegalArgumentException e) {
      // No construction start from this method: the profile starts remain.
    }
    try {
      values.add(RootTimeMethod.fit(curve, drainagePath).cv());
    } catch (FitException | IllegalArgumentException e) {
      // As above.
    }
    return values;
  }

  /**
   * Weights of the readings: the span of log t each represents (half the distance to its
   * neighbours, ln(t<sub>i+1</sub>/t<sub>i-1</sub>)/2; the first and last reading the distance to
   * their one neighbour), normalised to a mean of 1 (so the base of the logarithm does not matter);
   * or 1 each. A floor of 10<sup>-6</sup> keeps every reading in the fit.
   */
  static double[] weights(double[] t, FullCurveOptions.ReadingWeights kind) {
    int n = t.length;
    double[] w = new double[n];
    if (kind == FullCurveOptions.ReadingWeights.UNIT) {
      Arrays.fill(w, 1.0);
      return w;
    }
    w[0] = logRatio(t[1], t[0]);
    double sum = w[0];
    for (int i = 1; i < n - 1; i++) {
      double span = 0.5 * logRatio(t[i + 1], t[i - 1]);
      w[i] = span;
      sum += span;
    }
    w[n - 1] = logRatio(t[n - 1], t[n - 2]);
    sum += w[n - 1];
    double scale = n / sum;
    for (int i = 0; i < n; i++) {
      double normalised = w[i] * scale;
      w[i] = normalised > 1e-6 ? normalised : 1e-6;
    }
    return w;
  }

  /** z below which {@link #logRatio} sums the series of atanh z (eight terms). */
  private static final double ATANH_SERIES_LIMIT = 0.0625;

  /**
   * z below which three terms of the atanh series suffice (z<sup>6</sup>/7 &lt; 2<sup>-56</sup>).
   */
  private static final double SHORT_ATANH_SERIES_LIMIT = 0x1.0p-9;

  /**
   * ln(a/b) for a &gt; b &gt; 0 without a logarithm where a and b are close (dense readings):
   * ln(a/b) = 2 atanh z with z = (a - b)/(a + b) (a - b is exact for b &le; a &le; 2b, Sterbenz's
   * lemma), and for z &lt; 1/16 atanh z = z (1 + z<sup>2</sup>/3 + z<sup>4</sup>/5 + ... +
   * z<sup>14</sup>/15) with a truncation error below z<sup>16</sup>/17 &lt; 2<sup>-68</sup>
   * relative (below z = 2<sup>-9</sup> the first three terms, the rest being below 2<sup>-56</sup>
   * relative); up to a = 2b ln(1 + x) with x = (a - b)/b by Goldberg's theorem 4 (ln u x/(u - 1), u
   * = 1 + x rounded; see {@code ConsolidationCurveModel}); beyond, Math.log(a/b) (ln(a/b) &gt; ln
   * 2, so the rounding of a/b costs at most 0.72 ulp). The result is within a few ulp of ln(a/b)
   * (tested against StrictMath.log1p).
   */
  static double logRatio(double a, double b) {
    double z = (a - b) / (a + b);
    if (z < SHORT_ATANH_SERIES_LIMIT) {
      // Readings close together (a data logger): z^6/7 < 2^-56 is below the rounding.
      double z2 = z * z;
      return 2.0 * z * (1.0 + z2 * (1.0 / 3 + z2 * (1.0 / 5)));
    }
    if (z < ATANH_SERIES_LIMIT) {
      double z2 = z * z;
      double series =
          1.0
              + z2
                  * (1.0 / 3
                      + z2
                          * (1.0 / 5
                              + z2
                                  * (1.0 / 7
                                      + z2
                                          * (1.0 / 9
                                              + z2
                                                  * (1.0 / 11
                                                      + z2 * (1.0 / 13 + z2 * (1.0 / 15)))))));
      return 2.0 * z * series;
    }
    if (a <= 2 * b) {
      double x = (a - b) / b;
      double u = 1.0 + x;
      return Math.log(u) * (x / (u - 1.0));
    }
    return Math.log(a / b);
  }

  /**
   * Weighted least squares of (d_i, d_p, s) for a fixed c_v, under d_p &ge; 0 and s &ge; 0: one
   * pass sums the weighted cross products of the columns (1, U, secondary shape) and the readings;
   * each subset of free parameters is solved from those sums; the residual of the best feasible
   * subset is then summed directly over the readings (no cancellation in the reported residual).
   *
   * @return {d_i, d_p, s, weighted RSS}, or null if no subset is feasible
   */
  private static double[] linearFit(
      ConsolidationCurveModel model,
      double cv,
      double[] t,
      double[] y,
      double[] w,
      boolean fitSecondary) {
    int n = t.length;
    double[] degree = new double[n];
    double[] shape = new double[n];
    double[] gradient = new double[4];
    ConsolidationCurveModel.Curve unit = model.curve(new CurveParameters(0, 1, cv, 1));
    // Cross products of the columns x = (1, U, shape) and of y, weighted (sums in local variables,
    // which the compiler keeps in registers).
    double c00 = 0;
    double c01 = 0;
    double c02 = 0;
    double c11 = 0;
    double c12 = 0;
    double c22 = 0;
    double y0 = 0;
    double y1 = 0;
    double y2 = 0;
    double yy = 0;
    for (int i = 0; i < n; i++) {
      unit.settlementAndGradient(t[i], gradient);
      double u = gradient[1];
      double v = gradient[3];
      degree[i] = u;
      shape[i] = v;
      double wi = w[i];
      double yi = y[i];
      c00 += wi;
      c01 += wi * u;
      c02 += wi * v;
      c11 += wi * u * u;
      c12 += wi * u * v;
      c22 += wi * v * v;
      y0 += wi * yi;
      y1 += wi * u * yi;
      y2 += wi * v * yi;
      yy += wi * yi * yi;
    }
    double[][] cross = {{c00, c01, c02}, {c01, c11, c12}, {c02, c12, c22}};
    double[] crossY = {y0, y1, y2};
    double[] best = null;
    double bestRss = Double.POSITIVE_INFINITY;
    // Subsets of (d_p, s) that are free; d_i is always free. Feasible solutions only.
    int[][] subsets =
        fitSecondary ? new int[][] {{0, 1, 2}, {0, 1}, {0, 2}, {0}} : new int[][] {{0, 1}, {0}};
    for (int[] use : subsets) {
      int m = use.length;
      double[][] a = new double[m][m + 1];
      for (int r = 0; r < m; r++) {
        for (int c = 0; c < m; c++) {
          a[r][c] = cross[use[r]][use[c]];
        }
        a[r][m] = crossY[use[r]];
      }
      double[] x = SmallFits.solve(a);
      if (x == null) {
        continue;
      }
      double[] solution = new double[4];
      double explained = 0;
      for (int r = 0; r < m; r++) {
        solution[use[r]] = x[r];
        explained += x[r] * crossY[use[r]];
      }
      // At a least-squares solution the residual is y'Wy - x'X'Wy: used only to rank subsets.
      double rss = yy - explained;
      if (!(solution[1] >= 0 && solution[2] >= 0 && Double.isFinite(rss))) {
        continue;
      }
      if (best == null || rss < bestRss) {
        best = solution;
        bestRss = rss;
      }
      if (use.length == subsets[0].length) {
        // The unconstrained solution is feasible: it is the least-squares optimum, and no subset
        // with parameters held at 0 can do better.
        break;
      }
    }
    if (best == null) {
      return null;
    }
    double rss = 0;
    for (int i = 0; i < n; i++) {
      double r = y[i] - best[0] - best[1] * degree[i] - best[2] * shape[i];
      rss += w[i] * r * r;
    }
    for (int k = 0; k < 3; k++) {
      if (!Double.isFinite(best[k])) {
        return null;
      }
    }
    best[3] = rss;
    return Double.isFinite(rss) ? best : null;
  }

  /**
   * Indices of up to {@code count} lowest local minima of a profile (ends count as minima), keeping
   * only those within {@link #START_RESIDUAL_FACTOR} of the lowest: the profile is the exact
   * minimum over the linear parameters at each trial c<sub>v</sub>, so a minimum far above the
   * lowest cannot lead to the best fit and would only cost iterations.
   */
  private static List<Integer> lowestLocalMinima(double[] profile, int count) {
    List<Integer> minima = new ArrayList<>();
    for (int k = 0; k < profile.length; k++) {
      // NaN neighbours (points that are not starts) do not block a minimum.
      boolean lowerThanLeft = k == 0 || !(profile[k] >= profile[k - 1]);
      boolean lowerThanRight = k == profile.length - 1 || !(profile[k] > profile[k + 1]);
      if (lowerThanLeft && lowerThanRight && Double.isFinite(profile[k])) {
        minima.add(k);
      }
    }
    minima.sort((a, b) -> Double.compare(profile[a], profile[b]));
    if (!minima.isEmpty()) {
      double lowest = profile[minima.get(0)];
      minima.removeIf(k -> profile[k] > START_RESIDUAL_FACTOR * lowest);
    }
    return List.copyOf(minima.subList(0, Math.min(count, minima.size())));
  }

  /** z statistic of the Wald-Wolfowitz runs test on the residuals' signs (0 if too few). */
  static double runsTestZ(double[] residuals) {
    int negatives = 0;
    int changes = 0;
    int zeros = 0;
    int previous = -1;
    // Residual signs are random by design: count with bit arithmetic, not branches. A residual of
    // exactly zero (rare) is skipped by the slower loop below.
    for (double r : residuals) {
      long bits = Double.doubleToRawLongBits(r);
      int negative = (int) (bits >>> 63);
      zeros += (bits << 1) == 0 ? 1 : 0;
      negatives += negative;
      changes += previous < 0 ? 0 : negative ^ previous;
      previous = negative;
    }
    int positives = residuals.length - negatives;
    int runs = residuals.length == 0 ? 0 : changes + 1;
    if (zeros > 0) {
      positives = 0;
      negatives = 0;
      runs = 0;
      int sign = 0;
      for (double r : residuals) {
        int s = r > 0 ? 1 : r < 0 ? -1 : 0;
        if (s == 0) {
          continue;
        }
        if (s > 0) {
          positives++;
        } else {
          negatives++;
        }
        if (s != sign) {
          runs++;
          sign = s;
        }
      }
    }
    int total = positives + negatives;
    if (positives < 2 || negatives < 2 || total < 10) {
      return 0.0;
    }
    double product = 2.0 * positives * negatives;
    double mean = product / total + 1;
    double variance = product * (product - total) / ((double) total * total * (total - 1));
    return variance > 0 ? (runs - mean) / Math.sqrt(variance) : 0.0;
  }
}
