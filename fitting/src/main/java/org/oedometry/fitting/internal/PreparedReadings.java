package org.oedometry.fitting.internal;

import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

/**
 * One increment's readings made ready for a construction: the zero reading (t = 0) set aside, the
 * sign turned so that the settlement increases (swelling increments are negated), single wild
 * readings replaced by interpolating their neighbours, and a non-decreasing copy made by isotonic
 * regression.
 *
 * <p>Despiking: a reading (other than the first and the last) that lies outside the range of its
 * two neighbours by more than half that range (a wild reading, not the scatter of a steep part),
 * and by more than either neighbour lies outside the range of its own (so that the neighbour of a
 * wild reading, pushed out of range by it, is kept), is replaced by the straight-line interpolation
 * between them in the plot coordinate (log time or root time). This is the rule of a running median
 * of three (J. W. Tukey, <i>Exploratory Data Analysis</i>, 1977), which leaves every monotone
 * sequence unchanged, with interpolation instead of the nearer neighbour's value so that a removed
 * reading does not bend an early straight line. The first and the last reading are kept: an end
 * rule would have to extrapolate over the uneven intervals of a consolidation schedule, so a wild
 * first or last reading is not detected. Isotonic regression by pool-adjacent-violators (R. E.
 * Barlow et al., <i>Statistical Inference under Order Restrictions</i>, 1972): the non-decreasing
 * sequence nearest in least squares, O(n). Both leave exact monotone data untouched.
 */
public final class PreparedReadings {

  private final double[] time;
  private final double[] abscissa;
  private final double[] cleaned;
  private final double[] monotone;
  private final double sign;
  private final OptionalDouble zeroReading;

  private PreparedReadings(
      double[] time,
      double[] abscissa,
      double[] cleaned,
      double[] monotone,
      double sign,
      OptionalDouble zero) {
    this.time = time;
    this.abscissa = abscissa;
    this.cleaned = cleaned;
    this.monotone = monotone;
    this.sign = sign;
    this.zeroReading = zero;
  }

  /**
   * Prepares readings.
   *
   * @param elapsedSeconds times, s, strictly increasing, &ge; 0
   * @param settlementMetres settlements, m
   * @param minimumReadings readings after t = 0 needed by the caller's construction
   * @param methodName the construction's name, for the message
   * @param plotAbscissa the plot coordinate of a time, e.g. log10 or sqrt; strictly increasing
   * @return the prepared readings
   * @throws IllegalArgumentException if fewer than minimumReadings readings remain after the zero
   *     reading (invalid input, as for every other method of the package)
   * @throws org.oedometry.fitting.FitException if the settlement does not change
   */
  public static PreparedReadings of(
      double[] elapsedSeconds,
      double[] settlementMetres,
      int minimumReadings,
      String methodName,
      DoubleUnaryOperator plotAbscissa) {
    int start = elapsedSeconds[0] == 0.0 ? 1 : 0;
    int n = elapsedSeconds.length - start;
    if (n < minimumReadings) {
      throw new IllegalArgumentException(
          Checks.format(
              "%d readings after t = 0 are too few for the %s method (needs at least %d)",
              n, methodName, minimumReadings));
    }
    double[] t = new double[n];
    double[] d = new double[n];
    System.arraycopy(elapsedSeconds, start, t, 0, n);
    System.arraycopy(settlementMetres, start, d, 0, n);
    double[] x = new double[n];
    for (int i = 0; i < n; i++) {
      x[i] = plotAbscissa.applyAsDouble(t[i]);
    }
    double[] cleaned = despike(x, d);
    double change = cleaned[n - 1] - cleaned[0];
    if (!(change != 0.0)) {
      throw new org.oedometry.fitting.FitException(
          Checks.format(
              "the settlement does not change between the first and the last reading (%s m)",
              cleaned[0]));
    }
    double sign = change > 0 ? 1.0 : -1.0;
    if (sign < 0) {
      for (int i = 0; i < n; i++) {
        cleaned[i] = -cleaned[i];
      }
    }
    OptionalDouble zero =
        start == 1 ? OptionalDouble.of(sign * settlementMetres[0]) : OptionalDouble.empty();
    return new PreparedReadings(t, x, cleaned, isotonic(cleaned), sign, zero);
  }

  /**
   * Replaces every reading (but the first and the last) that lies outside the range of its two
   * neighbours by more than half that range, and by more than either neighbour does, by the
   * straight-line interpolation between them in the plot coordinate.
   *
   * @param x plot abscissae, strictly increasing
   * @param y values
   * @return smoothed copy
   */
  public static double[] despike(double[] x, double[] y) {
    int n = y.length;
    double[] excursion = new double[n];
    for (int i = 1; i < n - 1; i++) {
      double lo = Math.min(y[i - 1], y[i + 1]);
      double hi = Math.max(y[i - 1], y[i + 1]);
      double outside = Math.max(lo - y[i], y[i] - hi);
      excursion[i] = outside > 0.5 * (hi - lo) ? outside : 0.0;
    }
    double[] out = y.clone();
    for (int i = 1; i < n - 1; i++) {
      if (excursion[i] > 0
          && excursion[i] >= excursion[i - 1]
          && excursion[i] >= excursion[i + 1]) {
        double w = (x[i] - x[i - 1]) / (x[i + 1] - x[i - 1]);
        out[i] = y[i - 1] + w * (y[i + 1] - y[i - 1]);
      }
    }
    return out;
  }

  /**
   * Isotonic (non-decreasing) least-squares regression by pool-adjacent-violators, O(n).
   *
   * @param y values
   * @return the nearest non-decreasing sequence
   */
  public static double[] isotonic(double[] y) {
    int n = y.length;
    double[] mean = new double[n];
    int[] size = new int[n];
    int blocks = 0;
    for (int i = 0; i < n; i++) {
      mean[blocks] = y[i];
      size[blocks] = 1;
      blocks++;
      while (blocks > 1 && mean[blocks - 2] > mean[blocks - 1]) {
        int s = size[blocks - 2] + size[blocks - 1];
        mean[blocks - 2] =
            (mean[blocks - 2] * size[blocks - 2] + mean[blocks - 1] * size[blocks - 1]) / s;
        size[blocks - 2] = s;
        blocks--;
      }
    }
    double[] out = new double[n];
    int k = 0;
    for (int b = 0; b < blocks; b++) {
      for (int j = 0; j < size[b]; j++) {
        out[k++] = mean[b];
      }
    }
    return out;
  }

  /**
   * Number of readings after t = 0.
   *
   * @return count
   */
  public int size() {
    return time.length;
  }

  /**
   * Times after loading (zero reading removed).
   *
   * @return the internal array (not copied; callers must not modify it)
   */
  public double[] time() {
    return time;
  }

  /**
   * Plot abscissae of {@link #time()}.
   *
   * @return the internal array (not copied)
   */
  public double[] abscissa() {
    return abscissa;
  }

  /**
   * Settlements turned positive-increasing, wild readings removed.
   *
   * @return the internal array (not copied)
   */
  public double[] cleaned() {
    return cleaned;
  }

  /**
   * Non-decreasing copy of {@link #cleaned()}.
   *
   * @return the internal array (not copied)
   */
  public double[] monotone() {
    return monotone;
  }

  /**
   * +1 for compression (settlement increases), -1 for swelling.
   *
   * @return the sign that turned the input into {@link #cleaned()}
   */
  public double sign() {
    return sign;
  }

  /**
   * The reading at t = 0, turned by {@link #sign()}, when there is one.
   *
   * @return the zero reading, m
   */
  public OptionalDouble zeroReading() {
    return zeroReading;
  }
}
