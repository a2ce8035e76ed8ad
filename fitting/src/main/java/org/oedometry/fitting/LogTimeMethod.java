package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.fitting.internal.LineFit;
import org.oedometry.fitting.internal.MonotoneCubic;
import org.oedometry.fitting.internal.PreparedReadings;

/**
 * The log-time construction of Casagrande and Fadum (1940) for one load increment, made objective:
 * every choice a technician makes by eye is a documented rule, so the same readings always give the
 * same answer, and every choice is reported in {@link LogTimeGeometry} for review on a plot.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer; local codes
 * and standards govern (ASTM D2435, ISO 17892-5).
 *
 * <h2>Rules, in order</h2>
 *
 * <ol>
 *   <li><b>Readings.</b> The reading at t = 0, if any, is left out (it may hold a false
 *       deformation) and reported; it serves only as the reading before loading for the primary
 *       compression ratio. A swelling increment (last reading below the first) is negated, worked
 *       as a compression and turned back, and reported. A reading (not the first or the last)
 *       outside the range of its two neighbours by more than half that range, and by more than
 *       either neighbour, is replaced by interpolating them in log time (a single wild reading is
 *       removed; monotone readings are unchanged), and isotonic regression gives a non-decreasing
 *       copy. At least {@value #MINIMUM_READINGS} readings after loading are needed (else {@link
 *       IllegalArgumentException}, as for every method).
 *   <li><b>Interpolation.</b> The non-decreasing readings are interpolated by the shape-preserving
 *       monotone cubic of Fritsch and Carlson (1980) with Hyman's (1983) three-point knot
 *       derivatives, which never overshoots and reproduces straight stretches exactly: in x =
 *       log<sub>10</sub>(t) for the slopes, and in &radic;t for the parabola rule and t50, which
 *       lie in the early part where settlement is nearly straight in &radic;t (U = 2
 *       &radic;(T/&pi;) to 0.1 % up to 50 %), so that a wide gap between readings costs little
 *       there.
 *   <li><b>Local slopes.</b> On a grid of centres every {@value #GRID_STEP} log cycle, a
 *       least-squares line is fitted over the window centre &plusmn; {@value #WINDOW_HALF_WIDTH}
 *       cycle: to the readings themselves where the window holds at least {@value
 *       #DENSE_WINDOW_READINGS} of them (data-logger density: noise is averaged), otherwise to the
 *       interpolant sampled on a uniform grid, {@value #INTERPOLANT_SAMPLES} points to a full
 *       window (lab density). The window is cut at the first and last reading.
 *   <li><b>Inflection.</b> The centre of steepest slope, refined by a parabola through it and its
 *       two neighbours; the tangent is the local line fitted there. If the steepest slope lies
 *       within one window of the first or the last reading, the curve shows no inflection and
 *       {@link FitException} is thrown.
 *   <li><b>Secondary line.</b> After the inflection, the first centre whose slope has fallen to a
 *       fraction r of the tangent slope starts the secondary part, with r the strictest of 0.05,
 *       0.1, 0.2 and 0.3 whose part holds at least 2 readings spanning at least {@value
 *       #MINIMUM_SECONDARY_SPAN} log cycle and is straight: its slope at the last centre is at
 *       least {@value #STRAIGHT_TAIL_RATIO} of its slope at its first centre (or that first slope
 *       is already below 0.05 of the tangent slope). The strict fractions keep the bend at the end
 *       of primary out of the line; the looser ones admit secondary compression, whose slope stays
 *       constant. The line is the least-squares line through the part's readings (through two with
 *       a warning). When no part qualifies, the tail's slope is not determined (a bending tail
 *       would pull d100 down), so the line is horizontal at the level of the last readings (the
 *       least-squares value at the last reading of the strictest part that holds any reading, or
 *       the last reading itself), with a warning. If the slope never falls to 0.3 of the tangent
 *       slope: {@link FitException} (the secondary part was not reached: primary consolidation is
 *       incomplete).
 *   <li><b>d100</b> at the intersection of the tangent and the secondary line, which must lie after
 *       the inflection.
 *   <li><b>d0</b> by the parabola rule d0 = 2 d(t<sub>1</sub>) - d(4 t<sub>1</sub>), with
 *       t<sub>1</sub> the times of readings (at most {@value #MAXIMUM_PAIRS}, spread evenly in log
 *       time) such that 4 t<sub>1</sub> comes before the curve reaches 50 % of the current d0 -
 *       d100 estimate (d0 error below 0.05 % of the primary compression on an exact curve), d(4
 *       t<sub>1</sub>) interpolated in &radic;t; averaged; the estimate starts at the first reading
 *       and is iterated to a fixed point. If no reading qualifies the limit is relaxed to 60 %
 *       (error 0.39 %) with a warning; if none qualifies then, {@link FitException}.
 *   <li><b>t50</b> where the &radic;t interpolant reaches d50 = (d0 + d100)/2. It cannot lie before
 *       the first reading: every parabola pair has d(4t<sub>1</sub>) at or below its level (at most
 *       60 % of the way from the previous d0 to d100), so d0 &ge; 2 d<sub>first</sub> - level, and
 *       d50 &lt; d<sub>first</sub> would need that level, hence the previous d0, above d100.
 *       c<sub>v</sub> = T<sub>50</sub> H<sub>dr</sub><sup>2</sup> / t50.
 * </ol>
 *
 * <p>Self-check: {@link FitWarning.Kind#IMPLIED_CURVE_MISSES_READINGS} when the Terzaghi curve of
 * the result's own d<sub>0</sub>, d<sub>100</sub> and c<sub>v</sub> misses the readings up to 70 %
 * consolidation by more than {@link FitWarning#IMPLIED_CURVE_MISFIT_LIMIT} of the primary
 * compression (root mean square): never on exact curves; on small noisy increments it marks values
 * that may be far off.
 *
 * <p>Accuracy, measured in the tests: on exact Terzaghi curves c<sub>v</sub> within 0.5 % and d0
 * within 0.5 % of the primary compression with data-logger readings, and within 3 % on the usual
 * 14-reading schedule for T between 2 and 20 at the last reading; with 1 micrometre noise on 0.5 mm
 * of primary compression on that schedule, median error below 1.5 % and 90th percentile below 4 %.
 * Secondary compression of slope s per log cycle that starts at a kink at T<sub>k</sub> moves d100
 * by about -s log<sub>10</sub>(T<sub>k</sub> / 1.1013) (the secondary line extended back to where
 * the tangent reaches the end of primary, T = 1.1013): measured c<sub>v</sub> bias -0.8 % to +5.4 %
 * for T<sub>k</sub> from 1 to 2 and s from 2 % to 8 % of the primary compression. The synthetic
 * study (README) gives the spread over varied curves and schedules. Cost O(n) in the number of
 * readings. Thread-safe and deterministic.
 */
public final class LogTimeMethod {

  /** Readings after loading needed by the construction. */
  public static final int MINIMUM_READINGS = 5;

  /** Spacing of the local-slope grid, log10 cycles. */
  public static final double GRID_STEP = 0.02;

  /** Half width of a local-slope window, log10 cycles. */
  public static final double WINDOW_HALF_WIDTH = 0.1;

  /** Readings in a window from which the line is fitted to the readings themselves. */
  public static final int DENSE_WINDOW_READINGS = 8;

  /** Points of the interpolant in a full window with fewer readings (a uniform sample grid). */
  public static final int INTERPOLANT_SAMPLES = 21;

  /** Fractions of the tangent slope, strictest first, below which the secondary part may begin. */
  private static final double[] SECONDARY_SLOPE_RATIOS = {0.05, 0.1, 0.2, 0.3};

  /**
   * A tail whose slope at the last reading is below this fraction of its slope at its start is
   * still bending (unless its start slope is already below 0.05 of the tangent slope).
   */
  public static final double STRAIGHT_TAIL_RATIO = 0.5;

  /** Log cycles the secondary readings must span for their slope to be fitted. */
  public static final double MINIMUM_SECONDARY_SPAN = 0.3;

  /** Most parabola-rule pairs averaged. */
  public static final int MAXIMUM_PAIRS = 16;

  private static final int MAXIMUM_CENTRES = 4000;
  private static final int D0_ITERATIONS = 8;

  private LogTimeMethod() {}

  /**
   * The construction with {@link LogTimeOptions#defaults()}.
   *
   * @param curve one increment's readings, not null
   * @param drainagePathMetres drainage path H<sub>dr</sub>, m, finite, &gt; 0
   * @return c<sub>v</sub>, t50, d0, d50, d100, geometry and warnings
   * @throws IllegalArgumentException if the drainage path is not finite and &gt; 0, or fewer than
   *     {@value #MINIMUM_READINGS} readings follow t = 0
   * @throws NullPointerException if the curve is null
   * @throws FitException if the curve does not admit the construction (no inflection, secondary
   *     part not reached, first reading too late, d50 not reached)
   */
  public static LogTimeResult fit(SettlementCurve curve, double drainagePathMetres) {
    return fit(curve, drainagePathMetres, LogTimeOptions.defaults());
  }

  /**
   * The construction with the given options.
   *
   * @param curve one increment's readings, not null
   * @param drainagePathMetres drainage path H<sub>dr</sub>, m, finite, &gt; 0
   * @param options the options, not null
   * @return c<sub>v</sub>, t50, d0, d50, d100, geometry and warnings
   * @throws IllegalArgumentException if the drainage path is not finite and &gt; 0, or fewer than
   *     {@value #MINIMUM_READINGS} readings follow t = 0
   * @throws NullPointerException if the curve or the options are null
   * @throws FitException if the curve does not admit the construction
   */
  public static LogTimeResult fit(
      SettlementCurve curve, double drainagePathMetres, LogTimeOptions options) {
    Objects.requireNonNull(curve, "curve");
    Objects.requireNonNull(options, "options");
    Checks.requireDrainagePath(drainagePathMetres);
    return construct(curve.elapsedSeconds(), curve.settlementMetres(), drainagePathMetres, options);
  }

  private static LogTimeResult construct(
      double[] elapsed, double[] settlement, double drainagePath, LogTimeOptions options) {
    PreparedReadings r =
        PreparedReadings.of(elapsed, settlement, MINIMUM_READINGS, "log-time", Math::log10);
    List<FitWarning> warnings = new ArrayList<>();
    int offset = elapsed.length - r.size();
    if (offset == 1) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.ZERO_READING_IGNORED,
              Checks.format(
                  "the reading at t = 0 (%s m) was left out of the construction", settlement[0])));
    }
    if (r.sign() < 0) {
      warnings.add(swellingWarning());
    }
    int n = r.size();
    double[] t = r.time();
    double[] y = r.cleaned();
    double[] ym = r.monotone();
    double[] x = r.abscissa();
    MonotoneCubic curve = MonotoneCubic.of(x, ym);
    double[] root = new double[n];
    for (int i = 0; i < n; i++) {
      root[i] = Math.sqrt(t[i]);
    }
    MonotoneCubic early = MonotoneCubic.of(root, ym);

    // Local slopes on a grid.
    double span = x[n - 1] - x[0];
    if (!(span >= 4 * WINDOW_HALF_WIDTH)) {
      throw new FitException(
          Checks.format(
              "the readings span %.3f log cycles of time; the log-time construction needs at"
                  + " least %.1f",
              span, 4 * WINDOW_HALF_WIDTH));
    }
    double step = Math.max(GRID_STEP, span / MAXIMUM_CENTRES);
    int centres = (int) Math.floor(span / step) + 1;
    double[] slope = new double[centres];
    LocalFitter fitter = new LocalFitter(x, y, curve);
    int lo = 0;
    int hi = 0;
    boolean[] dense = new boolean[centres];
    int[] windowFrom = new int[centres];
    int[] windowTo = new int[centres];
    for (int k = 0; k < centres; k++) {
      double c = x[0] + k * step;
      while (lo < n && x[lo] < c - WINDOW_HALF_WIDTH) {
        lo++;
      }
      while (hi < n && x[hi] <= c + WINDOW_HALF_WIDTH) {
        hi++;
      }
      fitter.window(c, lo, hi, k, dense, windowFrom, windowTo);
    }
    fitter.slopes(dense, windowFrom, windowTo, slope);
    int best = 0;
    for (int k = 1; k < centres; k++) {
      if (slope[k] > slope[best]) {
        best = k;
      }
    }
    double bestCentre = x[0] + best * step;
    if (bestCentre > x[n - 1] - WINDOW_HALF_WIDTH) {
      throw new FitException(
          "no inflection on the log-time curve: the settlement is still speeding up (per log"
              + " cycle) at the last reading, so primary consolidation is not complete");
    }
    if (bestCentre < x[0] + WINDOW_HALF_WIDTH) {
      throw new FitException(
          "no inflection on the log-time curve: it is steepest at the first readings (concave"
              + " throughout: primary consolidation over before the first readings, or strong"
              + " secondary compression)");
    }
    double shift = 0.0;
    double curvature = slope[best - 1] - 2 * slope[best] + slope[best + 1];
    if (curvature < 0) {
      shift = Math.max(-0.5, Math.min(0.5, 0.5 * (slope[best - 1] - slope[best + 1]) / curvature));
    }
    double xi = bestCentre + shift * step;
    lo = 0;
    while (x[lo] < xi - WINDOW_HALF_WIDTH) {
      lo++;
    }
    hi = lo;
    while (hi < n && x[hi] <= xi + WINDOW_HALF_WIDTH) {
      hi++;
    }
    LineFit tangent = fitter.fit(xi, lo, hi);
    double mi = tangent.slope();
    double yi = tangent.valueAt(xi);
    if (!(mi > 0)) {
      throw new FitException("no inflection on the log-time curve: no rising stretch found");
    }
    double bt = yi - mi * xi;

    // Secondary part: the strictest slope ratio whose readings span enough time, else the
    // strictest that leaves any reading.
    int from = -1;
    boolean fitted = false;
    for (double ratio : SECONDARY_SLOPE_RATIOS) {
      int centre = firstCentreBelow(slope, best, ratio * mi);
      if (centre >= 0) {
        int start = Math.min(n - 1, firstReadingAtOrAfter(x, x[0] + (centre - 0.5) * step));
        boolean straight =
            slope[centre] <= SECONDARY_SLOPE_RATIOS[0] * mi
                || slope[centres - 1] >= STRAIGHT_TAIL_RATIO * slope[centre];
        if (n - start >= 2 && x[n - 1] - x[start] >= MINIMUM_SECONDARY_SPAN && straight) {
          from = start;
          fitted = true;
          break;
        }
        if (from < 0) {
          from = start;
        }
      }
    }
    if (from < 0) {
      throw new FitException(
          Checks.format(
              "secondary part not reached: after the inflection the slope never falls to %.0f %%"
                  + " of the tangent slope, so primary consolidation is not complete and no"
                  + " honest d100 (or c_v) exists",
              100 * SECONDARY_SLOPE_RATIOS[SECONDARY_SLOPE_RATIOS.length - 1]));
    }
    int count = n - from;
    double ss;
    double bs;
    if (fitted) {
      LineFit sec = LineFit.of(x, y, from, n);
      ss = sec.slope();
      bs = sec.intercept();
    } else {
      ss = 0.0;
      bs = count >= 3 ? LineFit.of(x, y, from, n).valueAt(x[n - 1]) : y[n - 1];
    }
    if (count < 3) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_SECONDARY_READINGS,
              Checks.format(
                  "the secondary line rests on %d reading%s (3 wanted)%s",
                  count, count == 1 ? "" : "s", fitted ? "" : ", drawn horizontal")));
    }
    if (!fitted) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.SHORT_SECONDARY_PART,
              Checks.format(
                  "no straight secondary part spanning %.1f log cycles: the secondary line is"
                      + " drawn horizontal at the level of the last readings and d100 is"
                      + " uncertain",
                  MINIMUM_SECONDARY_SPAN)));
    }
    if (!(mi > ss)) {
      throw new FitException(
          "the tangent at the inflection and the secondary line do not intersect: no honest"
              + " d100");
    }
    double x100 = (bs - bt) / (mi - ss);
    if (!(x100 > xi)) {
      throw new FitException(
          "the tangent and the secondary line cross before the inflection: the secondary part is"
              + " not reached, no honest d100");
    }
    double d100 = bt + mi * x100;

    // d0 by the parabola rule.
    double d0 = ym[0];
    List<Integer> pairs = List.of();
    boolean relaxed = false;
    for (int iteration = 0; iteration < D0_ITERATIONS; iteration++) {
      double limit = 0.5;
      List<Integer> chosen = parabolaReadings(x, root, ym, early, d0, d100, limit);
      if (chosen.isEmpty()) {
        limit = 0.6;
        chosen = parabolaReadings(x, root, ym, early, d0, d100, limit);
      }
      if (chosen.isEmpty()) {
        throw new FitException(
            Checks.format(
                "too few early readings for the parabola rule: the first reading (%s s) is later"
                    + " than a quarter of the time to about 60 %% consolidation, so d0 cannot be"
                    + " found",
                t[0]));
      }
      relaxed = limit > 0.5;
      double sum = 0;
      for (int i : chosen) {
        sum += 2 * ym[i] - early.value(2 * root[i]);
      }
      double next = sum / chosen.size();
      boolean same = chosen.equals(pairs);
      pairs = chosen;
      d0 = next;
      if (same) {
        break;
      }
    }
    if (relaxed || pairs.size() < 2) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_EARLY_READINGS,
              Checks.format(
                  "d0 rests on %d parabola pair%s%s",
                  pairs.size(),
                  pairs.size() == 1 ? "" : "s",
                  relaxed ? " reaching beyond 50 % consolidation (up to 60 %)" : "")));
    }
    if (!(d100 > d0)) {
      throw new FitException(
          Checks.format(
              "d100 (%s m) is not beyond d0 (%s m): no primary consolidation found",
              r.sign() * d100, r.sign() * d0));
    }
    List<ParabolaPair> pairGeometry = new ArrayList<>();
    double minD0 = Double.POSITIVE_INFINITY;
    double maxD0 = Double.NEGATIVE_INFINITY;
    for (int i : pairs) {
      double later = early.value(2 * root[i]);
      double pd0 = 2 * ym[i] - later;
      minD0 = Math.min(minD0, pd0);
      maxD0 = Math.max(maxD0, pd0);
      pairGeometry.add(
          new ParabolaPair(t[i], r.sign() * ym[i], 4 * t[i], r.sign() * later, r.sign() * pd0));
    }

    // t50.
    double d50 = 0.5 * (d0 + d100);
    double t50;
    if (d50 < ym[0]) {
      // Not reached (the class description shows why: the parabola rule keeps d0 at or above
      // 2 d_first - level, with the level below d100); kept so that a broken invariant fails
      // cleanly instead of giving a t50 outside the readings.
      throw new FitException("t50 lies before the first reading: no t50 within the readings");
    } else if (d50 > ym[n - 1]) {
      throw new FitException("the curve does not reach d50: no honest t50");
    } else {
      double r50 = early.firstReaching(d50);
      t50 = r50 * r50;
    }
    double cv = options.timeFactor50() * drainagePath * drainagePath / t50;
    if (!(cv > 0) || !Double.isFinite(cv) || !(t50 > 0)) {
      throw new FitException(
          Checks.format("the construction gave no finite c_v (t50 = %s s)", t50));
    }

    OptionalDouble primaryRatio = OptionalDouble.empty();
    if (r.zeroReading().isPresent()) {
      double total = y[n - 1] - r.zeroReading().getAsDouble();
      if (total > 0) {
        primaryRatio = OptionalDouble.of((d100 - d0) / total);
      }
    }
    ImpliedCurve.check(t, y, d0, d100, cv, drainagePath, warnings);
    double s = r.sign();
    double x0Line = (d0 - bt) / mi;
    LogTimeGeometry geometry =
        new LogTimeGeometry(
            new StraightLine(s * mi, s * bt, Math.min(x0Line, xi), x100),
            new PlotPoint(xi, s * yi),
            new StraightLine(s * ss, s * bs, x100, Math.max(x100, x[n - 1])),
            new PlotPoint(x100, s * d100),
            new PlotPoint(Math.log10(t50), s * d50),
            pairGeometry,
            maxD0 - minD0,
            from + offset,
            n + offset);
    return new LogTimeResult(
        cv,
        t50,
        s * d0,
        s * d50,
        s * d100,
        s * ss,
        primaryRatio,
        drainagePath,
        options.timeFactor50(),
        geometry,
        warnings);
  }

  static FitWarning swellingWarning() {
    return new FitWarning(
        FitWarning.Kind.SWELLING_INCREMENT,
        "settlement decreases (swelling increment): c_v from swelling is usually reported for"
            + " information only");
  }

  private static int firstCentreBelow(double[] slope, int after, double threshold) {
    for (int k = after + 1; k < slope.length; k++) {
      if (slope[k] <= threshold) {
        return k;
      }
    }
    return -1;
  }

  private static int firstReadingAtOrAfter(double[] x, double at) {
    int i = java.util.Arrays.binarySearch(x, at);
    return i >= 0 ? i : -i - 1;
  }

  /** Readings usable as t1: 4 t1 before the curve reaches d0 + limit (d100 - d0). */
  private static List<Integer> parabolaReadings(
      double[] x,
      double[] root,
      double[] ym,
      MonotoneCubic early,
      double d0,
      double d100,
      double limit) {
    double level = Math.min(d0 + limit * (d100 - d0), ym[ym.length - 1]);
    double rootMax = early.firstReaching(level);
    if (!(rootMax >= root[0])) {
      return List.of();
    }
    int m = 0;
    while (m < root.length && 2 * root[m] <= rootMax) {
      m++;
    }
    List<Integer> chosen = new ArrayList<>();
    if (m <= MAXIMUM_PAIRS) {
      for (int i = 0; i < m; i++) {
        chosen.add(i);
      }
      return chosen;
    }
    int i = 0;
    for (int j = 0; j < MAXIMUM_PAIRS; j++) {
      double target = x[0] + j * (x[m - 1] - x[0]) / (MAXIMUM_PAIRS - 1);
      while (i < m - 1 && Math.abs(x[i + 1] - target) <= Math.abs(x[i] - target)) {
        i++;
      }
      if (chosen.isEmpty() || chosen.get(chosen.size() - 1) != i) {
        chosen.add(i);
      }
    }
    return chosen;
  }

  /**
   * Local straight-line fits on the readings, or on the interpolant sampled once on a uniform grid
   * (spacing a tenth of the window half width, so a full window holds 21 samples).
   */
  static final class LocalFitter {
    private final double[] x;
    private final double[] y;
    private final double[] gridX;
    private final double[] gridY;
    private final double gridStep;

    /** Window ends fall on grid points in exact arithmetic: round them the same way every time. */
    private static final double GRID_TOLERANCE = 1e-6;

    LocalFitter(double[] x, double[] y, MonotoneCubic curve) {
      this.x = x;
      this.y = y;
      double low = curve.lowest();
      double high = curve.highest();
      gridStep =
          Math.max(
              WINDOW_HALF_WIDTH / ((INTERPOLANT_SAMPLES - 1) / 2.0),
              (high - low) / (20.0 * MAXIMUM_CENTRES));
      int count = (int) Math.floor((high - low) / gridStep) + 1;
      gridX = new double[count];
      gridY = new double[count];
      int interval = 0;
      int last = x.length - 2;
      int k = 0;
      while (k < count) {
        // The grid points in one interval of the interpolant (its polynomial evaluated in a loop
        // of its own, free of the search for the interval).
        int first = k;
        double at = Math.min(low + k * gridStep, high);
        while (interval < last && x[interval + 1] <= at) {
          interval++;
        }
        double end = interval < last ? x[interval + 1] : Double.POSITIVE_INFINITY;
        do {
          gridX[k] = at;
          k++;
          at = k < count ? Math.min(low + k * gridStep, high) : Double.POSITIVE_INFINITY;
        } while (k < count && at < end);
        curve.valuesInInterval(interval, gridX, first, k, gridY);
      }
    }

    /**
     * The window of centre k: the readings lo..hi where they are dense enough, else the points of
     * the sampled interpolant within the window (stored as dense[k], from[k], to[k]).
     */
    void window(double centre, int lo, int hi, int k, boolean[] dense, int[] from, int[] to) {
      if (hi - lo >= DENSE_WINDOW_READINGS) {
        dense[k] = true;
        from[k] = lo;
        to[k] = hi;
      } else {
        from[k] = gridFrom(centre);
        to[k] = gridTo(centre, from[k]);
      }
    }

    /**
     * Slopes of the local lines only (two passes, no residuals): the grid loop's hot path. Runs of
     * four neighbouring centres whose windows have the same source and length are computed in one
     * loop, each with its own sums in the same order as alone (the same bits): their four chains of
     * additions then overlap instead of waiting on each other.
     */
    void slopes(boolean[] dense, int[] from, int[] to, double[] out) {
      int k = 0;
      int count = out.length;
      while (k < count) {
        int length = to[k] - from[k];
        if (k + 3 < count
            && dense[k + 1] == dense[k]
            && dense[k + 2] == dense[k]
            && dense[k + 3] == dense[k]
            && to[k + 1] - from[k + 1] == length
            && to[k + 2] - from[k + 2] == length
            && to[k + 3] - from[k + 3] == length) {
          slopesOfFour(dense[k] ? x : gridX, dense[k] ? y : gridY, from, k, length, out);
          k += 4;
        } else {
          out[k] = slope(dense[k] ? x : gridX, dense[k] ? y : gridY, from[k], to[k]);
          k++;
        }
      }
    }

    private static double slope(double[] px, double[] py, int from, int to) {
      double mx = 0;
      double my = 0;
      for (int i = from; i < to; i++) {
        mx += px[i];
        my += py[i];
      }
      mx /= to - from;
      my /= to - from;
      double sxx = 0;
      double sxy = 0;
      for (int i = from; i < to; i++) {
        double dx = px[i] - mx;
        sxx += dx * dx;
        sxy += dx * (py[i] - my);
      }
      return sxx > 0 ? sxy / sxx : 0.0;
    }

    /** {@link #slope} of centres k to k + 3, windows of the same length, sums interleaved. */
    private static void slopesOfFour(
        double[] px, double[] py, int[] from, int k, int length, double[] out) {
      int a = from[k];
      int b = from[k + 1];
      int c = from[k + 2];
      int d = from[k + 3];
      double mxa = 0;
      double mya = 0;
      double mxb = 0;
      double myb = 0;
      double mxc = 0;
      double myc = 0;
      double mxd = 0;
      double myd = 0;
      for (int i = 0; i < length; i++) {
        mxa += px[a + i];
        mya += py[a + i];
        mxb += px[b + i];
        myb += py[b + i];
        mxc += px[c + i];
        myc += py[c + i];
        mxd += px[d + i];
        myd += py[d + i];
      }
      mxa /= length;
      mya /= length;
      mxb /= length;
      myb /= length;
      mxc /= length;
      myc /= length;
      mxd /= length;
      myd /= length;
      double sxxa = 0;
      double sxya = 0;
      double sxxb = 0;
      double sxyb = 0;
      double sxxc = 0;
      double sxyc = 0;
      double sxxd = 0;
      double sxyd = 0;
      for (int i = 0; i < length; i++) {
        double dxa = px[a + i] - mxa;
        sxxa += dxa * dxa;
        sxya += dxa * (py[a + i] - mya);
        double dxb = px[b + i] - mxb;
        sxxb += dxb * dxb;
        sxyb += dxb * (py[b + i] - myb);
        double dxc = px[c + i] - mxc;
        sxxc += dxc * dxc;
        sxyc += dxc * (py[c + i] - myc);
        double dxd = px[d + i] - mxd;
        sxxd += dxd * dxd;
        sxyd += dxd * (py[d + i] - myd);
      }
      out[k] = sxxa > 0 ? sxya / sxxa : 0.0;
      out[k + 1] = sxxb > 0 ? sxyb / sxxb : 0.0;
      out[k + 2] = sxxc > 0 ? sxyc / sxxc : 0.0;
      out[k + 3] = sxxd > 0 ? sxyd / sxxd : 0.0;
    }

    private int gridFrom(double centre) {
      int from =
          Math.max(
              0,
              (int) Math.ceil((centre - WINDOW_HALF_WIDTH - gridX[0]) / gridStep - GRID_TOLERANCE));
      return Math.max(0, Math.min(from, gridX.length - 3));
    }

    private int gridTo(double centre, int from) {
      int to =
          Math.min(
              gridX.length,
              (int) Math.floor((centre + WINDOW_HALF_WIDTH - gridX[0]) / gridStep + GRID_TOLERANCE)
                  + 1);
      return Math.max(to, Math.min(gridX.length, from + 3));
    }

    LineFit fit(double centre, int lo, int hi) {
      if (hi - lo >= DENSE_WINDOW_READINGS) {
        return LineFit.of(x, y, lo, hi);
      }
      int from = gridFrom(centre);
      int to = gridTo(centre, from);
      return LineFit.of(gridX, gridY, from, to);
    }
  }
}
