package org.oedometry.fitting;

import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;

/**
 * Exact curves on the usual 14-reading lab schedule (0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30 min, 1, 2,
 * 4, 8, 24 h: FACTS.md, "Reading schedules", from memory), made with the exact Terzaghi curve of
 * the {@code theory} module ({@link org.oedometry.theory.ConsolidationCurveModel}, checked against
 * mpmath there) through {@link ExactCurves}, with d<sub>p</sub> = 0.5 mm and H<sub>dr</sub> = 9.5
 * mm.
 */
final class LabScheduleCurves {

  static final double PRIMARY = 0.5e-3;
  static final double LAST_MINUTES = 1440;

  private static final double[] MINUTES = {
    0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, LAST_MINUTES
  };

  private LabScheduleCurves() {}

  /** The 14 elapsed times, s. */
  static double[] times() {
    double[] t = new double[MINUTES.length];
    for (int i = 0; i < t.length; i++) {
      t[i] = 60 * MINUTES[i];
    }
    return t;
  }

  /** c<sub>v</sub> that puts T = lastT at the last reading (24 h), m^2/s. */
  static double cv(double lastT) {
    double h = ExactCurves.DRAINAGE_PATH;
    return lastT * h * h / (60 * LAST_MINUTES);
  }

  /**
   * The exact curve with T = lastT at 24 h, an instantaneous compression of {@code initial} d_p and
   * a secondary slope of {@code secondary} d_p per log10 cycle.
   */
  static SettlementCurve curve(double lastT, double initial, double secondary) {
    return ExactCurves.curve(
        times(), CurveParameters.of(initial * PRIMARY, PRIMARY, cv(lastT), secondary * PRIMARY));
  }

  /** {@code count} values of T at the last reading, log-spaced from low to high. */
  static double[] lastTimeFactors(double low, double high, int count) {
    double[] out = new double[count];
    for (int i = 0; i < count; i++) {
      out[i] = low * Math.pow(high / low, i / (double) (count - 1));
    }
    return out;
  }
}
