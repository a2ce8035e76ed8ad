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
 *       starting from d<sub>0</sub> = 0 (the start of the increment); a line d = d<sub>0</sub> + S
 *       &radic;t fitted by ordinary least squares gives a new d<sub>0</sub>; repeated until the set
 *       does not change (at most 30 times). At least 3 readings are needed (a warning below 4).
 *   <li>d<sub>p</sub> = d<sub>100</sub> - d<sub>0</sub> and c<sub>v</sub> from the formula.
 * </ol>
 *
 * <p>Bias: c<sub>v</sub> goes with 1/d<sub>p</sub><sup>2</sup>, so an error of 1 % in d<sub>p</sub>
 * is 2 % in c<sub>v</sub>. With the hyperbola, d<sub>100</sub> rests on the 60-90 % part of the
 * curve and follows its accuracy (within 0.2 % on exact curves; secondary compression raises it a
 * little); with the last reading, secondary compression up to that reading is counted as primary
 * (c<sub>v</sub> low), and an unfinished curve gives too small a d<sub>p</sub> (c<sub>v</sub>
 * high). Accuracy on exact, densely read Terzaghi curves with the default: within 0.3 % (see the
 * tests).
 *
 * <h2>Errors and warnings</h2>
 *
 * {@link FitException}: the hyperbola fails (a curve that ends before 60 %: the default cannot find
 * d<sub>100</sub>), fewer than 3 readings before 50 %, an early line that does not rise, or
 * d<sub>p</sub> &le; 0. Warnings: those of the hyperbola, zero reading left out, swelling (treated
 * by its magnitude), few early readings, choice not settled.
 *
 * <p>Deterministic and thread-safe. Results feed engineering decisions and must be reviewed by a
 * qualified engineer; local codes and standards govern.
 */
public final class EarlySlopeMethod {

  private static final int MINIMUM_READINGS = 6;
  private static final int MAX_ITERATIONS = 30;

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
    if (options == null) {
      throw new IllegalArgumentException("options must not be null");
    }
    IncrementReadings readings =
        IncrementReadings.of(curve, drainagePathMetres, MINIMUM_READINGS, "early-slope");
    double[] t = readings.times;
    double[] d = readings.movement;
    int n = t.length;
    List<FitWarning> warnings = new ArrayList<>(readings.warnings);
    double d100;
    if (options.primaryEnd() == EarlySlopeOptions.PrimaryEnd.RECTANGULAR_HYPERBOLA) {
      RectangularHyperbolaResult hyperbola;
      try {
        hyperbola = RectangularHyperbolaMethod.fit(SettlementCurve.of(t, d), drainagePathMetres);
      } catch (FitException e) {
        throw new FitException(
            "the early-slope method takes d100 from the rectangular hyperbola, which failed: "
                + e.getMessage(),
            e);
      }
      d100 = hyperbola.d100();
      warnings.addAll(hyperbola.warnings());
    } else {
      d100 = d[n - 1];
    }
    double[] root = new double[n];
    for (int i = 0; i < n; i++) {
      root[i] = Math.sqrt(t[i]);
    }
    double d0 = 0;
    boolean[] chosen = choose(d, d0, d100);
    double[] line = null;
    boolean settled = false;
    for (int k = 0; k < MAX_ITERATIONS; k++) {
      line = fitLine(root, d, chosen);
      d0 = line[0];
      boolean[] next = choose(d, d0, d100);
      if (Arrays.equals(next, chosen)) {
        settled = true;
        break;
      }
      chosen = next;
    }
    if (!settled) {
      line = fitLine(root, d, chosen);
      d0 = line[0];
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
              Checks.format(
                  "the choice of early readings did not settle in %d steps", MAX_ITERATIONS)));
    }
    double slope = line[1];
    double primary = d100 - d0;
    if (!(primary > 0)) {
      throw new FitException(
          Checks.format(
              "the primary compression d100 - d0 (%s m) is not positive: d100 (%s m) lies below the"
                  + " early line's zero",
              primary, d100));
    }
    double ratio = slope / primary;
    double cv = Math.PI / 4 * drainagePathMetres * drainagePathMetres * ratio * ratio;
    double t50 = Math.pow(0.5 * primary / slope, 2);
    if (!(cv > 0) || !Double.isFinite(cv) || !(t50 > 0) || !Double.isFinite(t50)) {
      throw new FitException("the early slope gives no finite positive c_v");
    }
    int count = 0;
    double sign = readings.sign;
    List<PlotPoint> used = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      if (chosen[i]) {
        count++;
        used.add(new PlotPoint(root[i], sign * d[i]));
      }
    }
    if (count < 4) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_READINGS_IN_RANGE,
              Checks.format(
                  "the early line rests on %d readings before 50 %% consolidation", count)));
    }
    List<PlotPoint> drawn =
        List.of(new PlotPoint(0, sign * d0), new PlotPoint(primary / slope, sign * d100));
    return new EarlySlopeResult(
        cv,
        sign * slope,
        sign * d0,
        sign * d100,
        sign * primary,
        t50,
        options.primaryEnd(),
        used,
        drawn,
        drainagePathMetres,
        warnings);
  }

  private static boolean[] choose(double[] d, double d0, double d100) {
    boolean[] chosen = new boolean[d.length];
    double half = d0 + 0.5 * (d100 - d0);
    for (int i = 0; i < d.length; i++) {
      chosen[i] = d[i] <= half;
    }
    return chosen;
  }

  /** {d0, S} of d = d0 + S sqrt(t) over the chosen readings. */
  private static double[] fitLine(double[] root, double[] d, boolean[] chosen) {
    int count = 0;
    for (boolean c : chosen) {
      count += c ? 1 : 0;
    }
    if (count < 3) {
      throw new FitException(
          Checks.format(
              "only %d readings lie before 50 %% consolidation: the early slope needs at least 3"
                  + " (the first reading may be too late)",
              count));
    }
    double[] x = new double[count];
    double[] y = new double[count];
    int k = 0;
    for (int i = 0; i < d.length; i++) {
      if (chosen[i]) {
        x[k] = root[i];
        y[k] = d[i];
        k++;
      }
    }
    double[] line = SmallFits.line(x, y);
    if (line == null || !(line[1] > 0)) {
      throw new FitException(
          "the early readings do not rise against the square root of time: no early slope");
    }
    return line;
  }
}
