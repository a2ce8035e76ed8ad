package org.oedometry.examples.bench;

import java.util.SplittableRandom;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;

/**
 * The invented increment of the per-increment benchmarks: H<sub>dr</sub> 9.5 mm, c<sub>v</sub> 1.5
 * m<sup>2</sup>/yr (Julian year), d<sub>i</sub> 0.015 mm, d<sub>p</sub> 0.5 mm, secondary slope
 * 0.02 mm a cycle, 1 micrometre of Gaussian noise (seed 42), read on the usual 14-reading lab
 * schedule (0.1 min to 24 h) or by a data logger every 10 s for 24 h. Invented data: no real soil
 * or site.
 */
final class BenchmarkIncrement {

  /** Drainage path, m. */
  static final double DRAINAGE_PATH = 0.0095;

  private static final double YEAR = 365.25 * 86_400;
  private static final double[] LAB_MINUTES = {
    0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440
  };

  private BenchmarkIncrement() {}

  /**
   * Elapsed times, s: the lab schedule for 14 readings, otherwise one reading every 10 s.
   *
   * @param readings 14, or the number of 10 s readings
   * @return the times
   */
  static double[] times(int readings) {
    double[] times = new double[readings];
    for (int i = 0; i < readings; i++) {
      times[i] = readings == LAB_MINUTES.length ? 60 * LAB_MINUTES[i] : 10.0 * (i + 1);
    }
    return times;
  }

  /**
   * Settlements of the invented curve at the given times, m, with the seeded noise.
   *
   * @param times elapsed times, s
   * @return the settlements
   */
  static double[] settlements(double[] times) {
    CurveParameters truth = CurveParameters.of(0.015e-3, 0.5e-3, 1.5 / YEAR, 0.02e-3);
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    SplittableRandom random = new SplittableRandom(42);
    double[] settlements = new double[times.length];
    for (int i = 0; i < times.length; i++) {
      settlements[i] = model.settlement(times[i], truth) + 1e-6 * random.nextGaussian();
    }
    return settlements;
  }

  /**
   * The increment as a curve.
   *
   * @param readings 14, or the number of 10 s readings
   * @return the curve
   */
  static SettlementCurve curve(int readings) {
    double[] times = times(readings);
    return SettlementCurve.of(times, settlements(times));
  }
}
