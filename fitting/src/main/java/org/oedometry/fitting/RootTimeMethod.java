package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.Set;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.fitting.internal.LineFit;
import org.oedometry.fitting.internal.MonotoneCubic;
import org.oedometry.fitting.internal.PreparedReadings;

/**
 * The root-time construction of Taylor (1942, 1948) for one load increment, made objective: the
 * early straight line on the &radic;t plot is chosen by a documented fixed point, not by eye, and
 * every choice is reported in {@link RootTimeGeometry} for review on a plot.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer; local codes
 * and standards govern (ASTM D2435, ISO 17892-5).
 *
 * <h2>Rules, in order</h2>
 *
 * <ol>
 *   <li><b>Readings</b> as for the {@link LogTimeMethod}: zero reading left out and reported,
 *       swelling negated and reported, a single wild reading replaced by interpolating its
 *       neighbours, a non-decreasing copy by isotonic regression, interpolated in x = &radic;t by
 *       the monotone cubic of Fritsch and Carlson. At least {@value #MINIMUM_READINGS} readings
 *       after loading.
 *   <li><b>Early line by a fixed point.</b> Start with the readings (from the first) that lie below
 *       half-way between the first and the last reading (at least 3). Then repeat: fit a
 *       least-squares line to them against &radic;t (d0 = its value at t = 0); draw the factor line
 *       from d0 with abscissae larger by the factor (slope divided by it); find t90 where it
 *       crosses the interpolated curve, d90 there and d100 = d0 + (d90 - d0)/0.9; take as the new
 *       set the readings, from the first, below d0 + {@value #LINEAR_LIMIT} (d100 - d0) (the
 *       square-root law holds to 0.1 % of the primary compression up to 50 %). Stop when the set
 *       repeats (at most {@value #MAXIMUM_ITERATIONS} rounds; a cycle is reported). The line must
 *       rest on at least 3 readings, else {@link FitException}.
 *   <li><b>Crossing.</b> The first crossing after the early-line readings, found between two
 *       readings (there must be readings on both sides) and refined by bisection on the
 *       interpolant. No crossing before the last reading: {@link FitException} (primary
 *       consolidation not far enough for t90).
 *   <li><b>Checks.</b> A warning when the early-line residual exceeds {@value #LINEARITY_LIMIT} of
 *       d100 - d0 (no clear linear early part), and when the last reading lies more than {@value
 *       #BEYOND_LIMIT} of d100 - d0 beyond d100 (strong secondary compression).
 * </ol>
 *
 * <p>c<sub>v</sub> = T<sub>90</sub> H<sub>dr</sub><sup>2</sup> / t90. With the exact factor ({@link
 * RootTimeOptions#EXACT_FACTOR}) c<sub>v</sub> is within 0.5 % on exact Terzaghi curves; with the
 * published 1.15 (the default) it is about 1.5 % high, as theory predicts. Secondary compression
 * after the end of primary barely moves t90. Cost O(n) per round. Thread-safe and deterministic.
 */
public final class RootTimeMethod {

  /** Readings after loading needed by the construction. */
  public static final int MINIMUM_READINGS = 5;

  /** Fraction of d100 - d0 below which readings belong to the early line. */
  public static final double LINEAR_LIMIT = 0.5;

  /** Rounds of the fixed point at most. */
  public static final int MAXIMUM_ITERATIONS = 20;

  /** Root-mean-square residual of the early line, as a fraction of d100 - d0, that is warned. */
  public static final double LINEARITY_LIMIT = 0.02;

  /** Rise of the last reading beyond d100, as a fraction of d100 - d0, that is warned. */
  public static final double BEYOND_LIMIT = 0.25;

  private RootTimeMethod() {}

  /**
   * The construction with {@link RootTimeOptions#defaults()} (factor 1.15, exact T<sub>90</sub>).
   *
   * @param curve one increment's readings, not null
   * @param drainagePathMetres drainage path H<sub>dr</sub>, m, finite, &gt; 0
   * @return c<sub>v</sub>, t90, d0, d90, d100, geometry and warnings
   * @throws IllegalArgumentException if the drainage path is not finite and &gt; 0
   * @throws NullPointerException if the curve is null
   * @throws FitException if the curve does not admit the construction (too few readings, no linear
   *     early part, no crossing before the last reading)
   */
  public static RootTimeResult fit(SettlementCurve curve, double drainagePathMetres) {
    return fit(curve, drainagePathMetres, RootTimeOptions.defaults());
  }

  /**
   * The construction with the given options.
   *
   * @param curve one increment's readings, not null
   * @param drainagePathMetres drainage path H<sub>dr</sub>, m, finite, &gt; 0
   * @param options the options, not null
   * @return c<sub>v</sub>, t90, d0, d90, d100, geometry and warnings
   * @throws IllegalArgumentException if the drainage path is not finite and &gt; 0
   * @throws NullPointerException if the curve or the options are null
   * @throws FitException if the curve does not admit the construction
   */
  public static RootTimeResult fit(
      SettlementCurve curve, double drainagePathMetres, RootTimeOptions options) {
    Objects.requireNonNull(curve, "curve");
    Objects.requireNonNull(options, "options");
    Checks.requireDrainagePath(drainagePathMetres);
    return construct(curve.elapsedSeconds(), curve.settlementMetres(), drainagePathMetres, options);
  }

  private static RootTimeResult construct(
      double[] elapsed, double[] settlement, double drainagePath, RootTimeOptions options) {
    PreparedReadings r =
        PreparedReadings.of(elapsed, settlement, MINIMUM_READINGS, "root-time", Math::sqrt);
    List<FitWarning> warnings = new ArrayList<>();
    int offset = elapsed.length - r.size();
    if (offset == 1) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.ZERO_READING_IGNORED,
              Checks.format(
                  "the reading at t = 0 (%s m) was left out of the early line", settlement[0])));
    }
    if (r.sign() < 0) {
      warnings.add(LogTimeMethod.swellingWarning());
    }
    int n = r.size();
    double[] t = r.time();
    double[] y = r.cleaned();
    double[] ym = r.monotone();
    double[] x = r.abscissa();
    MonotoneCubic curve = MonotoneCubic.of(x, ym);
    double factor = options.factor();

    int k = Math.max(3, leadingBelow(ym, ym[0] + 0.5 * (ym[n - 1] - ym[0])));
    Set<Integer> seen = new HashSet<>();
    LineFit line = null;
    double x90 = 0;
    int iterations = 0;
    boolean settled = false;
    while (iterations < MAXIMUM_ITERATIONS) {
      iterations++;
      seen.add(k);
      line = LineFit.of(x, y, 0, k);
      if (!(line.slope() > 0)) {
        throw new FitException(
            "no linear early part: the line through the early readings does not rise");
      }
      x90 = crossing(x, ym, curve, line, factor, k);
      double a = line.intercept();
      double d90 = a + line.slope() / factor * x90;
      double d100 = a + (d90 - a) / 0.9;
      int next = leadingBelow(ym, a + LINEAR_LIMIT * (d100 - a));
      if (next < 3) {
        throw new FitException(
            Checks.format(
                "no linear early part: only %d reading%s before about %.0f %% consolidation (3"
                    + " needed)",
                next, next == 1 ? "" : "s", 100 * LINEAR_LIMIT));
      }
      if (next == k) {
        settled = true;
        break;
      }
      if (seen.contains(next)) {
        break;
      }
      k = next;
    }
    if (!settled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.LINE_CHOICE_NOT_SETTLED,
              Checks.format(
                  "the choice of early readings did not settle after %d rounds; the last one"
                      + " (%d readings) was used",
                  iterations, k)));
    }
    double d0 = line.intercept();
    double d90 = d0 + line.slope() / factor * x90;
    double d100 = d0 + (d90 - d0) / 0.9;
    if (!(d100 > d0) || !(x90 > 0)) {
      throw new FitException("no primary consolidation found on the root-time plot");
    }
    if (line.rootMeanSquare() > LINEARITY_LIMIT * (d100 - d0)) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.EARLY_PART_NOT_LINEAR,
              Checks.format(
                  "the early readings scatter about their line by %.2f %% of the primary"
                      + " compression (more than %.0f %%)",
                  100 * line.rootMeanSquare() / (d100 - d0), 100 * LINEARITY_LIMIT)));
    }
    if (ym[n - 1] - d100 > BEYOND_LIMIT * (d100 - d0)) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.CURVE_RISES_BEYOND_D100,
              Checks.format(
                  "the last reading lies %.0f %% of the primary compression beyond d100: strong"
                      + " secondary compression, or the early line is doubtful",
                  100 * (ym[n - 1] - d100) / (d100 - d0))));
    }
    double t90 = x90 * x90;
    double cv = options.timeFactor90() * drainagePath * drainagePath / t90;
    if (!(cv > 0) || !Double.isFinite(cv)) {
      throw new FitException(
          Checks.format("the construction gave no finite c_v (t90 = %s s)", t90));
    }
    OptionalDouble initialRatio = OptionalDouble.empty();
    OptionalDouble primaryRatio = OptionalDouble.empty();
    if (r.zeroReading().isPresent()) {
      double ds = r.zeroReading().getAsDouble();
      double total = y[n - 1] - ds;
      if (total > 0) {
        initialRatio = OptionalDouble.of((d0 - ds) / total);
        primaryRatio = OptionalDouble.of(10.0 * (d90 - d0) / (9.0 * total));
      }
    }
    double s = r.sign();
    RootTimeGeometry geometry =
        new RootTimeGeometry(
            new StraightLine(s * line.slope(), s * d0, 0.0, x90),
            new StraightLine(s * line.slope() / factor, s * d0, 0.0, x90),
            new PlotPoint(x90, s * d90),
            offset,
            offset + k,
            factor,
            iterations);
    return new RootTimeResult(
        cv,
        t90,
        s * d0,
        s * d90,
        s * d100,
        initialRatio,
        primaryRatio,
        drainagePath,
        options.timeFactor90(),
        geometry,
        warnings);
  }

  /** Number of leading readings whose non-decreasing value is at or below a level. */
  private static int leadingBelow(double[] ym, double level) {
    int i = 0;
    while (i < ym.length && ym[i] <= level) {
      i++;
    }
    return i;
  }

  /** Abscissa where the curve first falls to the factor line, after the early readings. */
  private static double crossing(
      double[] x, double[] ym, MonotoneCubic curve, LineFit line, double factor, int k) {
    double a = line.intercept();
    double b = line.slope() / factor;
    int n = x.length;
    int j = Math.max(1, k - 1);
    while (j < n && ym[j] - (a + b * x[j]) > 0) {
      j++;
    }
    if (j >= n) {
      throw new FitException(
          Checks.format(
              "the line with abscissae %.4f times larger does not cross the curve before the last"
                  + " reading: primary consolidation did not go far enough (about 90 %%) for t90",
              factor));
    }
    double lo = x[j - 1];
    double hi = x[j];
    if (ym[j - 1] - (a + b * lo) <= 0) {
      return lo;
    }
    for (int it = 0; it < 200 && hi - lo > 4 * Math.ulp(hi); it++) {
      double mid = 0.5 * (lo + hi);
      if (curve.valueInInterval(j - 1, mid) - (a + b * mid) > 0) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }
}
