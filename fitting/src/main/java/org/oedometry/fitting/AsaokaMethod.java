package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.Terzaghi;

/**
 * Asaoka's method (Asaoka 1978, Soils and Foundations 18(4)) for settlements at equal time steps:
 * s<sub>n</sub> = b<sub>0</sub> + b<sub>1</sub> s<sub>n-1</sub>, final settlement b<sub>0</sub> /
 * (1 - b<sub>1</sub>), and c<sub>v</sub> = -4 H<sub>dr</sub><sup>2</sup> ln(b<sub>1</sub>) /
 * (&pi;<sup>2</sup> &Delta;t).
 *
 * <p>Where the formula comes from: once T exceeds about 0.29 (U &gt; 60 %) Terzaghi's series is its
 * first term, 1 - U = (8/&pi;<sup>2</sup>) exp(-&pi;<sup>2</sup>T/4) (the second term is below 0.04
 * % of the first), so s(t) = s<sub>&infin;</sub> - A exp(-&pi;<sup>2</sup> c<sub>v</sub> t / (4
 * H<sub>dr</sub><sup>2</sup>)) and successive settlements &Delta;t apart obey s<sub>n</sub> =
 * b<sub>0</sub> + b<sub>1</sub> s<sub>n-1</sub> with b<sub>1</sub> = exp(-&pi;<sup>2</sup>
 * c<sub>v</sub> &Delta;t / (4 H<sub>dr</sub><sup>2</sup>)). H<sub>dr</sub> is the drainage path
 * (half the height for double drainage, the height for one drained face).
 *
 * <h2>Window and time step</h2>
 *
 * The line is fitted on the part of the curve where the one-term solution holds: from t<sub>60
 * </sub> to t<sub>95</sub> (T = 0.286 to 1.129; starting at t<sub>50</sub> instead makes
 * c<sub>v</sub> 0.7 % high on an exact curve), or to the last reading if that comes first, in a
 * fixed number of equal steps (option, default 10: b<sub>1</sub> about 0.8, well away from 0 and 1
 * so that ln b<sub>1</sub> is well conditioned, whatever the reading schedule). The window is found
 * by iteration: the first window runs from the first reading past half of the movement between the
 * first and the last reading to the first reading past 95 % of it; each fit gives c<sub>v </sub>,
 * hence t<sub>60</sub> and t<sub>95</sub>, hence the next window; until the window moves by less
 * than 10<sup>-9</sup> of itself (at most 30 times).
 *
 * <p><b>Equally spaced readings</b> (every step within 10<sup>-6</sup> of the first) are used as
 * they are: &Delta;t is the whole multiple of their spacing nearest to the window divided by the
 * number of steps, starting at the first reading in the window, and the line is fitted to every
 * pair of readings &Delta;t apart in the window (each reading with the one a step later), not only
 * to the steps' own readings: a data logger's hundreds of readings average the noise that ten would
 * leave. <b>Other schedules are resampled</b> at equal steps over the window by a monotone
 * piecewise cubic Hermite interpolation (Fritsch &amp; Carlson 1980) of settlement against ln t
 * through all readings: it keeps the shape of the curve (no overshoot between readings, monotone
 * where the readings are), and on ln t the curve is smooth at both ends; a warning says so.
 *
 * <p><b>The line</b> is fitted by orthogonal (total) least squares: s<sub>n-1</sub> and
 * s<sub>n</sub> are both readings with the same noise, and ordinary least squares of s<sub>n</sub>
 * on s<sub>n-1</sub> flattens the line (regression dilution: b<sub>1</sub> low, c<sub>v</sub> high;
 * measured +17 % on average on the noisy logger curves of the tests).
 *
 * <h2>Accuracy (measured; see the tests)</h2>
 *
 * <ul>
 *   <li>Exact Terzaghi curves read densely, log-spaced (resampled) or every 10 s for 24 h (as
 *       read): c<sub>v</sub> within 0.3 %; an instantaneous compression does not matter.
 *   <li>Noisy readings every 10 s for 24 h (noise 0.5 to 3 % of d<sub>p</sub>, T at 24 h from 2 to
 *       50, 200 seeded curves): 197 found, median error 2.0 %, 90th percentile 6.4 %, mean error
 *       0.0 % (ordinary least squares on the same pairs: mean +17.5 %).
 *   <li>The usual 14 lab readings (0.1 min to 24 h): no value. With T at 24 h from 2 to 50 only 2
 *       or 3 readings lie between 60 % and 95 %, too few to resample honestly; FitException every
 *       time (tested). The method is meant for equally spaced or data-logger readings.
 * </ul>
 *
 * <p>Secondary compression bends the late part of the curve away from the exponential and lowers
 * c<sub>v</sub>; an instantaneous compression does not matter.
 *
 * <h2>Errors and warnings</h2>
 *
 * {@link FitException}: the readings end before 80 % consolidation on the c<sub>v</sub> found (an
 * incomplete curve: Asaoka's line can forecast the final settlement of such a curve, but its
 * c<sub>v</sub> is then unreliable: with a window that started at 50 %, curves ending at 60 % and
 * 25 % gave c<sub>v</sub> 8 % and more than 300 % high), fewer than 4 settlements in the window, or
 * b<sub>1</sub> not in (0, 1) (the curve does not approach a final value). Warnings: zero reading
 * left out, swelling (treated by its magnitude), readings resampled, readings that end before 90 %
 * consolidation, window not settled.
 *
 * <p>Settlements of any magnitude give the same c<sub>v</sub>: the line is fitted to the pairs
 * scaled by a power of 2 (exact), and the interpolation compares the signs of slopes rather than
 * their product (tested from 10<sup>-300</sup> to 10<sup>300</sup> times the same curve).
 *
 * <p>Deterministic and thread-safe. Results feed engineering decisions and must be reviewed by a
 * qualified engineer; local codes and standards govern.
 */
public final class AsaokaMethod {

  /** Degree of consolidation at the start of the window, 60 %. */
  public static final double WINDOW_START_DEGREE = 0.6;

  /** The readings must reach this degree of consolidation, 80 %, on the c<sub>v</sub> found. */
  public static final double COMPLETE_ENOUGH = 0.8;

  /** Degree of consolidation at the end of the window, 95 % (or the last reading). */
  public static final double WINDOW_END_DEGREE = 0.95;

  private static final int MINIMUM_READINGS = 6;

  /** Readings (not resampled points) needed inside the window when the readings are resampled. */
  static final int MINIMUM_READINGS_IN_WINDOW = 5;

  /**
   * Largest final settlement, as a multiple of the movement seen, that Asaoka's line may imply: at
   * the end of its window (80 % consolidation or more) at most a quarter of the seen primary
   * movement remains; a larger value means the late readings are dominated by creep.
   */
  static final double FINAL_MOVEMENT_LIMIT = 1.5;

  /**
   * Largest relative distance between an unsettled window's start and the t60 of its own c_v that
   * is still taken as jitter of the window's edge rather than a wrong fixed point.
   */
  static final double UNSETTLED_WINDOW_TOLERANCE = 0.25;

  private static final int MAX_ITERATIONS = 30;
  private static final double SPACING_TOLERANCE = 1e-6;

  private AsaokaMethod() {}

  /**
   * Applies the method with {@link AsaokaOptions#defaults()}.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve is
   *     null, or there are fewer than 6 readings after t = 0
   * @throws FitException if the readings admit no Asaoka line (see the class description)
   */
  public static AsaokaResult fit(SettlementCurve curve, double drainagePathMetres) {
    return fit(curve, drainagePathMetres, AsaokaOptions.defaults());
  }

  /**
   * Applies the method with the given options.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @param options the options; not null
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve or
   *     options are null, or there are fewer than 6 readings after t = 0
   * @throws FitException if the readings admit no Asaoka line (see the class description)
   */
  public static AsaokaResult fit(
      SettlementCurve curve, double drainagePathMetres, AsaokaOptions options) {
    if (options == null) {
      throw new IllegalArgumentException("options must not be null");
    }
    IncrementReadings readings =
        IncrementReadings.of(curve, drainagePathMetres, MINIMUM_READINGS, "Asaoka");
    double[] t = readings.times;
    double[] d = readings.movement;
    int n = t.length;
    double lastTime = t[n - 1];
    boolean equallySpaced = equallySpaced(t);
    double[] logT = new double[n];
    for (int i = 0; i < n; i++) {
      logT[i] = Math.log(t[i]);
    }
    double half = 0.5 * (d[0] + d[n - 1]);
    double start = lastTime;
    for (int i = 0; i < n; i++) {
      if (d[i] >= half) {
        start = t[i];
        break;
      }
    }
    // The first window ends where 95 % of the movement seen is reached (not at the last reading,
    // where a fast curve leaves only flat, noisy readings with no slope to fit).
    double end = lastTime;
    double mostOfTheMovement = d[0] + 0.95 * (d[n - 1] - d[0]);
    for (int i = 0; i < n; i++) {
      if (d[i] >= mostOfTheMovement && t[i] > start) {
        end = t[i];
        break;
      }
    }
    double startFactor = Terzaghi.timeFactor(WINDOW_START_DEGREE);
    double endFactor = Terzaghi.timeFactor(WINDOW_END_DEGREE);
    Sample sample = null;
    double[] fit = null;
    double rate = 0; // c_v / H_dr^2, 1/s
    boolean settled = false;
    for (int k = 0; k < MAX_ITERATIONS; k++) {
      sample =
          equallySpaced
              ? pickReadings(t, d, start, end, options.steps())
              : resample(logT, d, start, end, options.steps());
      fit = line(sample.previous, sample.next);
      rate = -4 * Math.log(fit[1]) / (Math.PI * Math.PI * sample.step);
      double nextStart = startFactor / rate;
      double nextEnd = Math.min(lastTime, endFactor / rate);
      if (!(nextStart < lastTime)) {
        throw new FitException(
            Checks.format(
                "the readings end (%.4g s) before 60 %% consolidation on the c_v they give (t60 ="
                    + " %.4g s): Asaoka's one-term line does not hold yet, primary consolidation is"
                    + " far from complete",
                lastTime, nextStart));
      }
      nextStart = Math.max(t[0], nextStart);
      boolean still =
          Math.abs(nextStart - start) <= 1e-9 * start && Math.abs(nextEnd - end) <= 1e-9 * end;
      start = nextStart;
      end = nextEnd;
      if (still) {
        settled = true;
        break;
      }
    }
    if (!settled) {
      sample =
          equallySpaced
              ? pickReadings(t, d, start, end, options.steps())
              : resample(logT, d, start, end, options.steps());
      fit = line(sample.previous, sample.next);
      rate = -4 * Math.log(fit[1]) / (Math.PI * Math.PI * sample.step);
      double t60 = Math.max(t[0], startFactor / rate);
      if (Math.abs(sample.start() - t60) > UNSETTLED_WINDOW_TOLERANCE * t60) {
        throw new FitException(
            Checks.format(
                "the window of readings did not settle: it starts at %.4g s, but its own c_v puts"
                    + " 60 %% consolidation at %.4g s (secondary compression or noise dominate the"
                    + " readings that Asaoka's one-term line needs)",
                sample.start(), t60));
      }
    }
    double b0 = fit[0];
    double b1 = fit[1];
    double cv = rate * drainagePathMetres * drainagePathMetres;
    double finalSettlement = b0 / (1 - b1);
    if (!(cv > 0) || !Double.isFinite(cv) || !Double.isFinite(finalSettlement)) {
      throw new FitException("Asaoka's line gives no finite positive c_v");
    }
    double movement = d[n - 1] - d[0];
    if (finalSettlement - d[0] > FINAL_MOVEMENT_LIMIT * movement) {
      throw new FitException(
          Checks.format(
              "Asaoka's line implies a final settlement %.3g times the movement seen: the late"
                  + " readings keep settling (secondary compression), which the one-term solution"
                  + " behind the method cannot follow",
              (finalSettlement - d[0]) / movement));
    }
    if (!equallySpaced) {
      int inside = 0;
      for (double time : t) {
        if (time >= sample.start() && time <= sample.end()) {
          inside++;
        }
      }
      if (inside < MINIMUM_READINGS_IN_WINDOW) {
        throw new FitException(
            Checks.format(
                "only %s between 60 %% and 95 %% consolidation (%.4g s to %.4g s): resampling"
                    + " them at equal steps would invent the curve Asaoka's method needs; it wants"
                    + " equally spaced or dense readings",
                Checks.count(inside, "reading lies", "readings lie"),
                sample.start(),
                sample.end()));
      }
    }
    double t80 = Terzaghi.timeFactor(COMPLETE_ENOUGH) / rate;
    if (lastTime < t80) {
      throw new FitException(
          Checks.format(
              "the readings end (%.4g s) before 80 %% consolidation on the c_v they give (t80 ="
                  + " %.4g s): too little of the one-term part of the curve is seen for Asaoka's"
                  + " c_v",
              lastTime, t80));
    }
    List<FitWarning> warnings = new ArrayList<>(readings.warnings);
    if (!equallySpaced) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READINGS_RESAMPLED,
              Checks.format(
                  "the readings are not equally spaced in time: %d settlements %.4g s apart were"
                      + " interpolated (monotone cubic on log time) between %.4g s and %.4g s",
                  sample.values.length, sample.step, sample.start, sample.end())));
    }
    double t90 = Terzaghi.TIME_FACTOR_90 / rate;
    if (lastTime < t90) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READINGS_END_BEFORE_RANGE,
              Checks.format(
                  "the readings end at %.4g s, before t90 = %.4g s on this c_v: the line rests on"
                      + " an unfinished curve",
                  lastTime, t90)));
    }
    if (!settled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
              Checks.format("the window did not settle in %d steps", MAX_ITERATIONS)));
    }
    double sign = readings.sign;
    List<PlotPoint> sampled = new ArrayList<>();
    for (int j = 0; j < sample.values.length; j++) {
      sampled.add(new PlotPoint(sample.start + j * sample.step, sign * sample.values[j]));
    }
    List<PlotPoint> pairs = new ArrayList<>();
    double smallest = Double.POSITIVE_INFINITY;
    for (int j = 0; j < sample.previous.length; j++) {
      pairs.add(new PlotPoint(sign * sample.previous[j], sign * sample.next[j]));
      smallest = Math.min(smallest, sample.previous[j]);
    }
    List<PlotPoint> drawn =
        List.of(
            new PlotPoint(sign * smallest, sign * (b0 + b1 * smallest)),
            new PlotPoint(sign * finalSettlement, sign * finalSettlement));
    return new AsaokaResult(
        cv,
        sign * b0,
        b1,
        sign * finalSettlement,
        sample.step,
        sample.start,
        sample.end(),
        Terzaghi.TIME_FACTOR_50 / rate,
        !equallySpaced,
        sampled,
        pairs,
        drawn,
        drainagePathMetres,
        warnings);
  }

  /**
   * Settlements at equal steps (start time, step and values), and the pairs (s<sub>n-1</sub>,
   * s<sub>n</sub>) the line is fitted to: consecutive values for resampled settlements, every pair
   * of readings one step apart in the window for equally spaced readings.
   */
  private record Sample(
      double start, double step, double[] values, double[] previous, double[] next) {
    double end() {
      return start + (values.length - 1) * step;
    }

    static Sample consecutive(double start, double step, double[] values) {
      return new Sample(
          start,
          step,
          values,
          Arrays.copyOfRange(values, 0, values.length - 1),
          Arrays.copyOfRange(values, 1, values.length));
    }
  }

  private static boolean equallySpaced(double[] t) {
    double spacing = t[1] - t[0];
    for (int i = 2; i < t.length; i++) {
      if (Math.abs(t[i] - t[i - 1] - spacing) > SPACING_TOLERANCE * spacing) {
        return false;
      }
    }
    return true;
  }

  /**
   * Equally spaced readings: every stride-th reading from the first in the window as the sampled
   * settlements, and as pairs every reading in the window with the one a stride later.
   */
  private static Sample pickReadings(double[] t, double[] d, double start, double end, int steps) {
    int n = t.length;
    double spacing = (t[n - 1] - t[0]) / (n - 1);
    int stride = (int) Math.max(1, Math.round((end - start) / (steps * spacing)));
    int first = 0;
    while (first < n && t[first] < start * (1 - 1e-12)) {
      first++;
    }
    List<Double> values = new ArrayList<>();
    for (int i = first; i < n && t[i] <= end * (1 + 1e-12); i += stride) {
      values.add(d[i]);
    }
    if (values.size() < 4) {
      throw new FitException(
          Checks.format(
              "only %s between %.4g s and %.4g s: Asaoka's line needs at least 4",
              Checks.count(
                  values.size(), "equally spaced reading lies", "equally spaced readings lie"),
              start,
              end));
    }
    double[] out = values.stream().mapToDouble(Double::doubleValue).toArray();
    int last = first + (out.length - 1) * stride; // the last sampled reading
    int pairCount = last - stride - first + 1;
    double[] previous = new double[pairCount];
    double[] next = new double[pairCount];
    for (int j = 0; j < pairCount; j++) {
      previous[j] = d[first + j];
      next[j] = d[first + j + stride];
    }
    return new Sample(first < n ? t[first] : start, stride * spacing, out, previous, next);
  }

  /** Monotone cubic interpolation on ln t at steps + 1 equally spaced times. */
  private static Sample resample(double[] logT, double[] d, double start, double end, int steps) {
    if (!(end > start)) {
      throw new FitException(
          Checks.format(
              "the window from 50 %% consolidation (%.4g s) to the last reading (%.4g s) is empty",
              start, end));
    }
    double step = (end - start) / steps;
    double[] at = new double[steps + 1];
    for (int j = 0; j <= steps; j++) {
      at[j] = Math.log(j == steps ? end : start + j * step);
    }
    return Sample.consecutive(start, step, SmallFits.monotoneCubic(logT, d, at));
  }

  /**
   * {b0, b1} of s<sub>n</sub> = b<sub>0</sub> + b<sub>1</sub> s<sub>n-1</sub> by orthogonal (total)
   * least squares: both coordinates are settlements read with the same noise, so the line that
   * minimises the perpendicular distances is the consistent one (Deming regression with an error
   * variance ratio of 1), b<sub>1</sub> = (S<sub>yy</sub> - S<sub>xx</sub> +
   * &radic;((S<sub>yy</sub> - S<sub>xx</sub>)<sup>2</sup> + 4 S<sub>xy</sub><sup>2</sup>)) / (2
   * S<sub>xy</sub>) with sums of squares and products about the means. Ordinary least squares of
   * s<sub>n</sub> on s<sub>n-1</sub> is biased by the noise of s<sub>n-1</sub> (regression
   * dilution): b<sub>1</sub> low, c<sub>v</sub> high.
   */
  static double[] line(double[] previous, double[] next) {
    double[] fit = orthogonalLine(previous, next);
    if (fit == null || !(fit[1] > 0 && fit[1] < 1)) {
      throw new FitException(
          Checks.format(
              "Asaoka's line s_n = b0 + b1 s_(n-1) has b1 = %s, not between 0 and 1: the"
                  + " settlements do not approach a final value at a steady rate",
              fit == null ? "undefined" : Checks.format("%.6g", fit[1])));
    }
    return fit;
  }

  /**
   * {intercept, slope} of the orthogonal-regression line, or null if it is undefined. The points
   * are scaled by a power of 2 (exact) so that the largest coordinate is near 1: the sums of
   * squares neither overflow nor underflow for settlements of any magnitude, and the slope is the
   * same to the bit as without the scaling wherever that did not matter.
   */
  static double[] orthogonalLine(double[] x, double[] y) {
    int n = x.length;
    if (n < 2) {
      return null;
    }
    double largest = 0;
    for (int i = 0; i < n; i++) {
      largest = Math.max(largest, Math.max(Math.abs(x[i]), Math.abs(y[i])));
    }
    if (!(largest > 0) || !Double.isFinite(largest)) {
      return null;
    }
    int exponent = Math.getExponent(largest);
    double[] xs = new double[n];
    double[] ys = new double[n];
    for (int i = 0; i < n; i++) {
      xs[i] = Math.scalb(x[i], -exponent);
      ys[i] = Math.scalb(y[i], -exponent);
    }
    double[] line = scaledOrthogonalLine(xs, ys);
    if (line == null) {
      return null;
    }
    double intercept = Math.scalb(line[0], exponent);
    return Double.isFinite(intercept) ? new double[] {intercept, line[1]} : null;
  }

  /** {@link #orthogonalLine} on points whose largest coordinate is near 1. */
  private static double[] scaledOrthogonalLine(double[] x, double[] y) {
    int n = x.length;
    double meanX = 0;
    double meanY = 0;
    for (int i = 0; i < n; i++) {
      meanX += x[i];
      meanY += y[i];
    }
    meanX /= n;
    meanY /= n;
    double sxx = 0;
    double syy = 0;
    double sxy = 0;
    for (int i = 0; i < n; i++) {
      double dx = x[i] - meanX;
      double dy = y[i] - meanY;
      sxx += dx * dx;
      syy += dy * dy;
      sxy += dx * dy;
    }
    if (sxy == 0 || !Double.isFinite(sxy)) {
      return null; // no direction: the pairs show no linear association
    }
    double difference = syy - sxx;
    // The root of b1^2 Sxy - b1 (Syy - Sxx) - Sxy = 0 that minimises the perpendicular distances,
    // written so that neither branch subtracts nearly equal numbers (either sign of Sxy).
    double slope =
        difference >= 0
            ? (difference + Math.hypot(difference, 2 * sxy)) / (2 * sxy)
            : 2 * sxy / (Math.hypot(difference, 2 * sxy) - difference);
    double intercept = meanY - slope * meanX;
    if (!Double.isFinite(slope) || !Double.isFinite(intercept)) {
      return null;
    }
    return new double[] {intercept, slope};
  }
}
