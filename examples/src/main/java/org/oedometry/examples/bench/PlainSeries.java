package org.oedometry.examples.bench;

/**
 * The baseline for the benchmarks: Terzaghi's Fourier series summed over a fixed 100 terms, one
 * {@code Math.exp} (and one {@code Math.sin}) a term, as it is often coded by hand. Not accurate
 * near T = 0 (the truncated series misses about 2 x 10<sup>-3</sup> of U at T = 10<sup>-6</sup>).
 */
public final class PlainSeries {

  /** Terms summed. */
  public static final int TERMS = 100;

  private PlainSeries() {}

  /**
   * U(T) by the 100-term Fourier series.
   *
   * @param timeFactor T &ge; 0
   * @return U
   */
  public static double averageDegree(double timeFactor) {
    double sum = 0;
    for (int m = 0; m < TERMS; m++) {
      double eigen = Math.PI * (2 * m + 1) / 2;
      sum += 2 / (eigen * eigen) * Math.exp(-eigen * eigen * timeFactor);
    }
    return 1 - sum;
  }

  /**
   * dU/dT by the 100-term Fourier series.
   *
   * @param timeFactor T &gt; 0
   * @return dU/dT
   */
  public static double averageDegreeDerivative(double timeFactor) {
    double sum = 0;
    for (int m = 0; m < TERMS; m++) {
      double eigen = Math.PI * (2 * m + 1) / 2;
      sum += 2 * Math.exp(-eigen * eigen * timeFactor);
    }
    return sum;
  }

  /**
   * T(U) by Newton's method on the 100-term series, from T = &pi;U<sup>2</sup>/4, stopping at a
   * relative step of 10<sup>-14</sup>.
   *
   * @param averageDegree U in (0, 1)
   * @return T
   */
  public static double timeFactor(double averageDegree) {
    double t = Math.PI * averageDegree * averageDegree / 4;
    for (int i = 0; i < 100; i++) {
      double step = (averageDegree(t) - averageDegree) / averageDegreeDerivative(t);
      t -= step;
      if (Math.abs(step) < 1e-14 * t) {
        break;
      }
    }
    return t;
  }

  /**
   * u/u<sub>0</sub>(Z, T) by the 100-term Fourier series.
   *
   * @param depthRatio Z in [0, 2]
   * @param timeFactor T &ge; 0
   * @return u/u<sub>0</sub>
   */
  public static double porePressureRatio(double depthRatio, double timeFactor) {
    double sum = 0;
    for (int m = 0; m < TERMS; m++) {
      double eigen = Math.PI * (2 * m + 1) / 2;
      sum += 2 / eigen * Math.sin(eigen * depthRatio) * Math.exp(-eigen * eigen * timeFactor);
    }
    return sum;
  }
}
