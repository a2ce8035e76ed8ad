package org.oedometry.fitting;

import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.fitting.synthetic.SyntheticIncrement;
import org.oedometry.fitting.synthetic.SyntheticReadings;

/** Test curves from our own forward model (Terzaghi U(T) from the theory module). */
final class Curves {

  static final double MICROMETRE = 1e-6;
  static final double DAY = 86400.0;

  private Curves() {}

  /** A pure Terzaghi model whose time factor at one day is lastT. */
  static SyntheticIncrement terzaghi(double primary, double drainagePath, double lastT) {
    return SyntheticIncrement.terzaghi(
        primary, lastT * drainagePath * drainagePath / DAY, drainagePath);
  }

  /** Readings of a model at times (zero reading in front), noise-free. */
  static SettlementCurve exact(SyntheticIncrement model, double[] times) {
    return SyntheticReadings.sample(model, ReadingSchedules.withZeroReading(times), 0, 0, 1)
        .toCurve();
  }

  /** One reading per 10 s for 24 h: 8,640 readings and the zero reading. */
  static double[] logger() {
    return ReadingSchedules.uniform(10, DAY);
  }

  /** The same curve with every settlement multiplied by k and shifted by c. */
  static SettlementCurve transform(SettlementCurve curve, double timeScale, double k, double c) {
    double[] t = curve.elapsedSeconds();
    double[] d = curve.settlementMetres();
    for (int i = 0; i < t.length; i++) {
      t[i] *= timeScale;
      d[i] = k * d[i] + c;
    }
    return SettlementCurve.of(t, d);
  }

  static double relativeError(double value, double truth) {
    return Math.abs(value / truth - 1);
  }
}
