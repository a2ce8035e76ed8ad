package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;
import org.oedometry.theory.Terzaghi;

/**
 * Rectangular hyperbola method (Sridharan &amp; Sreepada Rao 1981, Geotechnical Testing Journal
 * 4(4); Sridharan, Murthy &amp; Prakash 1987, G&eacute;otechnique 37(3)): between 60 % and 90 %
 * consolidation T/U is nearly linear in T, so t/&delta; is linear in t there.
 *
 * <h2>Formula</h2>
 *
 * With T/U = M T + C on 60-90 %, &delta; = d<sub>p</sub> U (settlement counted from the start of
 * the increment) and T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>:
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
 * repeat until the set does not change (at most 30 times). At least 2 readings are needed (a
 * warning below 4).
 *
 * <p>Settlement is counted from the start of the increment, as published: an instantaneous
 * compression on loading (d<sub>i</sub> &gt; 0) makes &delta; too large at every reading and biases
 * c<sub>v</sub>; secondary compression raises the late readings and lowers c<sub>v</sub>. Accuracy
 * on exact, densely read Terzaghi curves without instantaneous compression: c<sub>v</sub> within
 * 0.3 % (see the tests).
 *
 * <h2>Errors and warnings</h2>
 *
 * {@link FitException}: fewer than 2 readings in the 60-90 % range (a curve that ends before 60 %,
 * or a schedule too sparse), t/&delta; against t without a positive slope and intercept, or
 * readings that end before 80 % consolidation on the c<sub>v</sub> found (an incomplete curve:
 * there the iteration can settle on the last few readings and give a c<sub>v</sub> several times
 * too large). Warnings: zero reading left out, swelling (treated by its magnitude), fewer than 4
 * readings on the line, readings that end before t<sub>90</sub>, choice not settled.
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
   * Applies the method.
   *
   * @param curve one increment's readings; not null
   * @param drainagePathMetres H<sub>dr</sub>, m; finite and &gt; 0
   * @return the result
   * @throws IllegalArgumentException if the drainage path is not finite and positive, the curve is
   *     null, or there are fewer than 5 readings after t = 0
   * @throws FitException if the curve admits no hyperbola (see the class description)
   */
  public static RectangularHyperbolaResult fit(SettlementCurve curve, double drainagePathMetres) {
    IncrementReadings readings =
        IncrementReadings.of(curve, drainagePathMetres, MINIMUM_READINGS, "rectangular hyperbola");
    double[] t = readings.times;
    double[] d = readings.movement;
    int n = t.length;
    double last = d[n - 1];
    boolean[] chosen = new boolean[n];
    for (int i = 0; i < n; i++) {
      chosen[i] = d[i] >= LOWER_DEGREE * last && d[i] <= UPPER_DEGREE * last;
    }
    double[] line = null;
    double t60 = 0;
    double t90 = 0;
    boolean settled = false;
    int iterations = 0;
    for (int k = 0; k < MAX_ITERATIONS; k++) {
      iterations++;
      line = fitLine(t, d, chosen, last);
      double ratio = (HYPERBOLA_SLOPE / HYPERBOLA_INTERCEPT) * line[0] / line[1];
      t60 = Terzaghi.timeFactor(LOWER_DEGREE) * ratio;
      t90 = Terzaghi.timeFactor(UPPER_DEGREE) * ratio;
      boolean[] next = new boolean[n];
      for (int i = 0; i < n; i++) {
        next[i] = t[i] >= t60 && t[i] <= t90;
      }
      if (Arrays.equals(next, chosen)) {
        settled = true;
        break;
      }
      chosen = next;
    }
    if (!settled) {
      line = fitLine(t, d, chosen, last);
    }
    double intercept = line[0];
    double slope = line[1];
    double cv =
        (HYPERBOLA_INTERCEPT / HYPERBOLA_SLOPE)
            * drainagePathMetres
            * drainagePathMetres
            * slope
            / intercept;
    double ratio = (HYPERBOLA_SLOPE / HYPERBOLA_INTERCEPT) * intercept / slope;
    t60 = Terzaghi.timeFactor(LOWER_DEGREE) * ratio;
    t90 = Terzaghi.timeFactor(UPPER_DEGREE) * ratio;
    double d100 = HYPERBOLA_SLOPE / slope;
    if (!(cv > 0) || !Double.isFinite(cv) || !Double.isFinite(d100) || !Double.isFinite(t90)) {
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
    List<FitWarning> warnings = new ArrayList<>(readings.warnings);
    int count = 0;
    double sign = readings.sign;
    List<PlotPoint> used = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      if (chosen[i]) {
        count++;
        used.add(new PlotPoint(t[i], t[i] / d[i]));
      }
    }
    if (count < 4) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.FEW_READINGS_IN_RANGE,
              Checks.format(
                  "the line of t/d against t rests on %d readings between 60 %% and 90 %%"
                      + " consolidation",
                  count)));
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
    if (!settled) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.READING_CHOICE_NOT_SETTLED,
              Checks.format(
                  "the choice of readings between t60 and t90 did not settle in %d steps",
                  MAX_ITERATIONS)));
    }
    List<PlotPoint> fitted =
        List.of(
            new PlotPoint(t60, slope * t60 + intercept),
            new PlotPoint(t90, slope * t90 + intercept));
    return new RectangularHyperbolaResult(
        cv,
        slope,
        intercept,
        t60,
        t90,
        sign * d100,
        used,
        fitted,
        iterations,
        drainagePathMetres,
        warnings);
  }

  /** {c, m} of t/d = m t + c over the chosen readings. */
  private static double[] fitLine(double[] t, double[] d, boolean[] chosen, double last) {
    int count = 0;
    for (boolean c : chosen) {
      count += c ? 1 : 0;
    }
    if (count < 2) {
      throw new FitException(
          Checks.format(
              "fewer than 2 readings lie between 60 %% and 90 %% consolidation (last reading at"
                  + " %.4g s, %s m): the curve may end before 60 %% or the readings are too sparse"
                  + " for the rectangular hyperbola",
              t[t.length - 1], last));
    }
    double[] x = new double[count];
    double[] y = new double[count];
    int k = 0;
    for (int i = 0; i < t.length; i++) {
      if (chosen[i]) {
        if (!(d[i] > 0)) {
          throw new FitException(
              Checks.format(
                  "the reading at %.4g s (%s m) in the 60-90 %% range has not moved from the"
                      + " start of the increment",
                  t[i], d[i]));
        }
        x[k] = t[i];
        y[k] = t[i] / d[i];
        k++;
      }
    }
    double[] line = SmallFits.line(x, y);
    if (line == null || !(line[1] > 0) || !(line[0] > 0)) {
      throw new FitException(
          "t/d against t has no positive slope and intercept over the chosen readings: the curve"
              + " is not a rectangular hyperbola there");
    }
    return line;
  }
}
