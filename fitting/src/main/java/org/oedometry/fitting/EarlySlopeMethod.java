package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;

/**
 * Early-slope method (Al-Zoubi 2008, Geotechnical Testing Journal 31(6)): c<sub>v</sub> = (&pi;/4)
 * H<sub>dr</sub><sup>2</sup> (S / d<sub>p</sub>)<sup>2</sup>, with S the slope of the early,
 * straight part of settlement against &radic;t and d<sub>p</sub> the primary compression.
 *
 * <p>Where the formula comes from: early on U = 2 &radic;(T/&pi;) exactly to 10<sup>-5</sup> for T
 * &le; 0.1 (Terzaghi's short-time form), so d = d<sub>0</sub> + d<sub>p</sub> (2/&radic;&pi;)
 * (&radic;c<sub>v</sub> / H<sub>dr</sub>) &radic;t, the slope S = 2 d<sub>p</sub> &radic;c<sub>v
 * </sub> / (&radic;&pi; H<sub>dr</sub>), and c<sub>v</sub> follows. Up to U = 50 % (T = 0.197) the
 * line is still within 0.1 % of U.
 *
 * <h2>Procedure</h2>
 *
 * <ol>
 *   <li>d<sub>100</sub>, by default from {@link RectangularHyperbolaMethod} (d<sub>100</sub> = M/m)
 *       on the same readings, or the last reading ({@link EarlySlopeOptions.PrimaryEnd}).
 *   <li>The early readings: those with d - d<sub>0</sub> &le; (d<sub>100</sub> - d<sub>0</sub>)/2,
 *       starting from d<sub>0</sub> = 0 (the start of the increment; with the hyperbola, from its
 *       corrected zero); when fewer than 3 readings lie there, those before 60 % instead, with a
 *       warning (the square-root law is 1.3 % off at 60 %); a line d = d<sub>0</sub> + S &radic;t
 *       fitted by ordinary least squares gives a new d<sub>0</sub>; repeated until the set does not
 *       change (at most 30 times). At least 3 readings are needed (a warning below 4).
 *   <li>d<sub>p</sub> = d<sub>100</sub> - d<sub>0</sub> and c<sub>v</sub> from the formula.
 * </ol>
 *
 * <p>Bias: c<sub>v</sub> goes with 1/d<sub>p</sub><sup>2</sup>, so an error of 1 % in d<sub>p</sub>
 * is 2 % in c<sub>v</sub>. With the hyperbola, d<sub>100</sub> rests on the 60-90 % part of the
 * curve and follows its accuracy (within 0.2 % on exact curves; secondary compression raises it a
 * little); with the last reading, secondary compression up to that reading is counted as primary
 * (c<sub>v</sub> low), and an unfinished curve gives too small a d<sub>p</sub> (c<sub>v</sub>
 * high).
 *
 * <h2>Accuracy (measured; see the tests)</h2>
 *
 * <ul>
 *   <li>Exact Terzaghi curves read densely (80 a log cycle): c<sub>v</sub> within 0.3 % with the
 *       default (the hyperbola now counts from the same corrected zero, so an instantaneous
 *       compression of up to 10 % of d<sub>p</sub> does not matter), within 0.1 % with the last
 *       reading on a curve without creep.
 *   <li>The usual 14 lab readings (0.1 min to 24 h), exact curves with T at 24 h from 2 to 50,
 *       d<sub>i</sub> up to 10 % of d<sub>p</sub>, secondary slope up to 2 % of d<sub>p</sub> a
 *       cycle: c<sub>v</sub> within 2.5 % (2.2 % seen) with the default, with the hyperbola's
 *       warning; FitException where the hyperbola fails (T at 24 h from 1.0 to 1.6).
 * </ul>
 *
 * <h2>Errors and warnings</h2>
 *
 * {@link FitException}: the hyperbola fails (a curve that ends before 60 %: the default cannot find
 * d<sub>100</sub>), fewer than 3 readings before 60 %, an early line that does not rise, or
 * d<sub>p</sub> &le; 0. Warnings: those of the hyperbola, zero reading left out, swelling (treated
 * by its magnitude), fewer than 3 early readings before 50 % (the 60 % window used), fewer than 4
 * readings on the line, choice not settled.
 *
 * <p>Self-check: {@link FitWarning.Kind#IMPLIED_CURVE_MISSES_READINGS} when the Terzaghi curve of
 * the result's own d<sub>0</sub>, d<sub>100</sub> and c<sub>v</sub> misses the readings up to 70 %
 * consolidation by more than {@link FitWarning#IMPLIED_CURVE_MISFIT_LIMIT} of the primary
 * compression (root mean square): never on exact curves; on small noisy increments it marks values
 * that may be far off.
 *
 * <p>Settlements of any magnitude give the same c<sub>v</sub>: the movement is scaled by a power of
 * 2 (exact) before the fits, the hyperbola's d<sub>100</sub> included, and every settlement is
 * scaled back exactly (tested from 10<sup>-300</sup> to 10<sup>300</sup> times the same curve, with
 * either d<sub>100</sub>; ordinary curves give the same bits as without the scaling).
 *
 * <p>Deterministic and thread-safe. Results feed engineering decisions and must be reviewed by a
 * qualified engineer; local codes and standards govern.
 */
public final class EarlySlopeMethod {

  private static final int MINIMUM_READINGS = 6;
  private static final int MAX_ITERATIONS = 30;

  /** Fewest readings on the early line. */
  static final int EARLY_MINIMUM = 3;

  /** The early line's readings lie before this degree of consolidation, 50 %. */
  static final double EARLY_FRACTION = 0.5;

  /** ... or before this one, 60 %, when fewer than 3 lie before 50 %. */
  static final double WIDER_EARLY_FRACTION = 0.6;

  private EarlySlopeMethod() {}

  /**
   * Applies the method with {@link EarlySlopeOptions#defaults()}.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve is
   *     null, or there are fewer than 6 readings after t = 0
   * @throws FitException if no early line or no d<sub>100</sub> is found (see the class
   *     description)
   */
  public static EarlySlopeResult fit(SettlementCurve curve, double drainagePathMetres) {
    return fit(curve, drainagePathMetres, EarlySlopeOptions.defaults());
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
   * @throws FitException if no early line or no d<sub>100</sub> is found (see the class
   *     description)
   */
  public static EarlySlopeResult fit(
      SettlementCurve curve, double drainagePathMetres, EarlySlopeOptions options) {
    return fit(curve, drainagePathMetres, options, true);
  }

  /**
   * Applies the method, on the movement scaled by a power of 2 (as the public method) or, for the
   * tests' comparison with the arithmetic before the scaling, unscaled.
   *
   * @param scaled whether the movement is scaled ({@link IncrementReadings#movementExponent})
   */
  static EarlySlopeResult fit(
      SettlementCurve curve, double drainagePathMetres, EarlySlopeOptions options, boolean scaled) {
    if (options == null) {
      throw new IllegalArgumentException("options must not be null");
    }
    IncrementReadings readings =
        IncrementReadings.of(curve, drainagePathMetres, MINIMUM_READINGS, "early-slope");
    double[] t = readings.times;
    // The movement scaled by a power of 2 (exact) so that its largest value is near 1: the
    // hyperbola's t/d and the lines' sums stay within the double range for settlements of any
    // magnitude, and every settlement scales back exactly.
    RectangularHyperbolaMethod.Scale scale =
        scaled
            ? RectangularHyperbolaMethod.Scale.of(readings)
            : RectangularHyperbolaMethod.Scale.NONE;
    int exponent = scale.movement();
    double[] d = readings.scaledMovement(exponent);
    int n = t.length;
    List<FitWarning> warnings = new ArrayList<>(readings.warnings);
    double d100;
    double startZero = 0;
    if (options.primaryEnd() == EarlySlopeOptions.PrimaryEnd.RECTANGULAR_HYPERBOLA) {
      RectangularHyperbolaMethod.ScaledFit hyperbola;
      // On the same scaled movement; its warnings quote the corrected zero in the input's sign,
      // as this method's d0.
      try {
        hyperbola =
            RectangularHyperbolaMethod.fitScaled(
                readings, scale, drainagePathMetres, RectangularHyperbolaOptions.defaults());
      } catch (FitException e) {
        throw new FitException(
            "the early-slope method takes d100 from the rectangular hyperbola, which failed: "
                + e.getMessage(),
            e);
      }
      d100 = hyperbola.d100();
      startZero = hyperbola.d0();
      // The early line below raises its own warning about few early readings.
      hyperbola.warnings().stream()
          .filter(w -> !w.is(FitWarning.Kind.FEW_EARLY_READINGS))
          .forEach(warnings::add);
    } else {
      d100 = d[n - 1];
    }
    double[] root = new double[n];
    for (int i = 0; i < n; i++) {
      root[i] = Math.sqrt(t[i]);
    }
    EarlyLine early = earlyLine(root, d, d100, startZero);
    boolean[] chosen = early.chosen();
    double d0 = early.d0;
    if (!early.settled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
              Checks.format(
                  "the choice of early readings did not settle in %d steps", MAX_ITERATIONS)));
    }
    if (early.widened) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_EARLY_READINGS,
              Checks.format(
                  "fewer than %d readings lie before 50 %% consolidation: the early line was fitted"
                      + " to the %d readings before 60 %% (the square-root law is 1.3 %% off"
                      + " there)",
                  EARLY_MINIMUM, early.count)));
    }
    double slope = early.slope;
    double primary = d100 - d0;
    if (!(primary > 0)) {
      throw new FitException(
          Checks.format(
              "the primary compression d100 - d0 (%s m) is not positive: d100 (%s m) lies below the"
                  + " early line's zero",
              IncrementReadings.metresText(primary, exponent, "%s"),
              IncrementReadings.metresText(d100, exponent, "%s")));
    }
    double ratio = slope / primary;
    double cv = Math.PI / 4 * drainagePathMetres * drainagePathMetres * ratio * ratio;
    double t50 = Math.pow(0.5 * primary / slope, 2);
    if (!(cv > 0) || !Double.isFinite(cv) || !(t50 > 0) || !Double.isFinite(t50)) {
      throw new FitException("the early slope gives no finite positive c_v");
    }
    ImpliedCurve.check(t, d, d0, d100, cv, drainagePathMetres, warnings);
    // The sign of the movement and the scale back to metres (exact, a power of 2).
    double sign = readings.sign;
    double metresSlope =
        IncrementReadings.inMetres(sign * slope, exponent, "the early slope", "m/s^0.5");
    double metresD0 = IncrementReadings.inMetres(sign * d0, exponent, "d0", "m");
    double metresD100 = IncrementReadings.inMetres(sign * d100, exponent, "d100", "m");
    double metresPrimary =
        IncrementReadings.inMetres(sign * primary, exponent, "the primary compression", "m");
    int count = 0;
    List<PlotPoint> used = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      if (chosen[i]) {
        count++;
        used.add(new PlotPoint(root[i], sign * readings.movement[i]));
      }
    }
    if (count < 4) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_READINGS_IN_RANGE,
              Checks.format("the early line rests on %d readings", count)));
    }
    List<PlotPoint> drawn =
        List.of(new PlotPoint(0, metresD0), new PlotPoint(primary / slope, metresD100));
    return new EarlySlopeResult(
        cv,
        metresSlope,
        metresD0,
        metresD100,
        metresPrimary,
        t50,
        options.primaryEnd(),
        used,
        drawn,
        drainagePathMetres,
        warnings);
  }

  /**
   * The early straight line d = d<sub>0</sub> + S &radic;t over the readings before 50 % of the
   * primary compression (60 % when fewer than 3 lie before 50 %). Package-private, immutable.
   */
  static final class EarlyLine {
    /** Intercept d<sub>0</sub>, m. */
    final double d0;

    /** Slope S, m/&radic;s. */
    final double slope;

    private final boolean[] chosen;

    /** Number of readings on the line. */
    final int count;

    /** Whether the choice of readings settled. */
    final boolean settled;

    /** Whether the 60 % window was used. */
    final boolean widened;

    EarlyLine(
        double d0, double slope, boolean[] chosen, int count, boolean settled, boolean widened) {
      this.d0 = d0;
      this.slope = slope;
      this.chosen = chosen.clone();
      this.count = count;
      this.settled = settled;
      this.widened = widened;
    }

    /** Which readings lie on the line (a copy). */
    boolean[] chosen() {
      return chosen.clone();
    }
  }

  /**
   * Fits the early line: readings with d - d<sub>0</sub> &le; f (d<sub>100</sub> - d<sub>0</sub>),
   * f = 0.5, starting from the given d<sub>0</sub>; a least-squares line on &radic;t gives a new
   * d<sub>0</sub>, and the choice is repeated until it does not change (at most 30 times). When
   * fewer than 3 readings are chosen, the same with f = 0.6. Shared with {@link
   * RectangularHyperbolaMethod}, whose corrected zero is this line's d<sub>0</sub>.
   *
   * @param root &radic;t of the readings
   * @param d settlements in the direction of movement, m
   * @param d100 end of primary consolidation, m
   * @param startZero first d<sub>0</sub>, m
   * @return the line
   * @throws FitException if fewer than 3 readings lie before 60 % or the line does not rise
   */
  static EarlyLine earlyLine(double[] root, double[] d, double d100, double startZero) {
    EarlyLine line = earlyLine(root, d, d100, startZero, EARLY_FRACTION);
    if (line != null) {
      return line;
    }
    line = earlyLine(root, d, d100, startZero, WIDER_EARLY_FRACTION);
    if (line != null) {
      return new EarlyLine(line.d0, line.slope, line.chosen, line.count, line.settled, true);
    }
    throw new FitException(
        Checks.format(
            "only %d readings lie before 50 %% consolidation and %d before 60 %%: the early line"
                + " needs at least %d (the first reading may be too late)",
            choose(d, startZero, d100, EARLY_FRACTION).length,
            choose(d, startZero, d100, WIDER_EARLY_FRACTION).length,
            EARLY_MINIMUM));
  }

  /** The iteration for one window; null when fewer than 3 readings are chosen at some step. */
  private static EarlyLine earlyLine(
      double[] root, double[] d, double d100, double startZero, double fraction) {
    double d0 = startZero;
    int[] chosen = choose(d, d0, d100, fraction);
    double[] line = null;
    for (int k = 0; k < MAX_ITERATIONS; k++) {
      if (chosen.length < EARLY_MINIMUM) {
        return null;
      }
      line = fitLine(root, d, chosen);
      d0 = line[0];
      int[] next = choose(d, d0, d100, fraction);
      if (Arrays.equals(next, chosen)) {
        return new EarlyLine(d0, line[1], mask(chosen, d.length), chosen.length, true, false);
      }
      chosen = next;
    }
    if (chosen.length < EARLY_MINIMUM) {
      return null;
    }
    line = fitLine(root, d, chosen);
    return new EarlyLine(line[0], line[1], mask(chosen, d.length), chosen.length, false, false);
  }

  private static boolean[] mask(int[] indices, int n) {
    boolean[] out = new boolean[n];
    for (int i : indices) {
      out[i] = true;
    }
    return out;
  }

  /** Indices of the readings with d - d0 at most the fraction of d100 - d0. */
  private static int[] choose(double[] d, double d0, double d100, double fraction) {
    double limit = d0 + fraction * (d100 - d0);
    int count = 0;
    int[] chosen = new int[d.length];
    for (int i = 0; i < d.length; i++) {
      if (d[i] <= limit) {
        chosen[count++] = i;
      }
    }
    return Arrays.copyOf(chosen, count);
  }

  /** {d0, S} of d = d0 + S sqrt(t) over the chosen readings. */
  private static double[] fitLine(double[] root, double[] d, int[] chosen) {
    double[] x = new double[chosen.length];
    double[] y = new double[chosen.length];
    for (int k = 0; k < chosen.length; k++) {
      x[k] = root[chosen[k]];
      y[k] = d[chosen[k]];
    }
    double[] line = SmallFits.line(x, y);
    if (line == null || !(line[1] > 0)) {
      throw new FitException(
          "the early readings do not rise against the square root of time: no early slope");
    }
    return line;
  }
}
