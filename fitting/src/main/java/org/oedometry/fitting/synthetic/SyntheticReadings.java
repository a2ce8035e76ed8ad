package org.oedometry.fitting.synthetic;

import java.util.Arrays;
import java.util.Locale;
import java.util.SplittableRandom;
import org.oedometry.core.SettlementCurve;

/**
 * Invented readings of one increment: the forward model sampled at a schedule, with seeded Gaussian
 * noise and rounding to the gauge resolution. Same arguments, same readings.
 *
 * @param elapsedSeconds times, s
 * @param settlementMetres settlements, m
 */
public record SyntheticReadings(double[] elapsedSeconds, double[] settlementMetres) {

  /**
   * Creates readings from copies of the arrays.
   *
   * @param elapsedSeconds times, s, not null
   * @param settlementMetres settlements, m, not null, same length
   * @throws IllegalArgumentException if null or of different lengths
   */
  public SyntheticReadings {
    if (elapsedSeconds == null
        || settlementMetres == null
        || elapsedSeconds.length != settlementMetres.length) {
      throw new IllegalArgumentException("times and settlements must be given, of equal length");
    }
    elapsedSeconds = elapsedSeconds.clone();
    settlementMetres = settlementMetres.clone();
  }

  /**
   * Samples a model.
   *
   * @param model the forward model, not null
   * @param times the schedule, s, strictly increasing, &ge; 0
   * @param noiseMetres standard deviation of Gaussian reading noise, m, finite, &ge; 0 (the zero
   *     reading gets noise too)
   * @param resolutionMetres readings rounded to a multiple of this, m, finite, &ge; 0 (0: no
   *     rounding)
   * @param seed seed of the {@link SplittableRandom} that draws the noise (Box-Muller)
   * @return the readings
   * @throws IllegalArgumentException if noise or resolution is negative or not finite
   */
  public static SyntheticReadings sample(
      SyntheticIncrement model,
      double[] times,
      double noiseMetres,
      double resolutionMetres,
      long seed) {
    if (!(noiseMetres >= 0)
        || !(resolutionMetres >= 0)
        || !Double.isFinite(noiseMetres + resolutionMetres)) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "noise (%s m) and resolution (%s m) must be finite and >= 0",
              noiseMetres,
              resolutionMetres));
    }
    SplittableRandom random = new SplittableRandom(seed);
    double[] d = new double[times.length];
    for (int i = 0; i < times.length; i++) {
      double value = model.settlementAt(times[i]);
      if (noiseMetres > 0) {
        value += noiseMetres * gaussian(random);
      }
      if (resolutionMetres > 0) {
        value = Math.rint(value / resolutionMetres) * resolutionMetres;
      }
      d[i] = value;
    }
    return new SyntheticReadings(times, d);
  }

  /** Standard normal deviate by the Box-Muller transform (fixed algorithm on every JDK). */
  private static double gaussian(SplittableRandom random) {
    double u1 = 1.0 - random.nextDouble(); // in (0, 1]
    double u2 = random.nextDouble();
    return Math.sqrt(-2.0 * Math.log(u1)) * Math.cos(2.0 * Math.PI * u2);
  }

  /**
   * The readings with one value replaced (a wild reading).
   *
   * @param index the reading to change, 0 &le; index &lt; size
   * @param settlementMetres its new value, m
   * @return new readings
   * @throws IllegalArgumentException if the index is out of range
   */
  public SyntheticReadings withReading(int index, double settlementMetres) {
    if (index < 0 || index >= this.settlementMetres.length) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "reading index %d outside 0..%d", index, size() - 1));
    }
    double[] d = this.settlementMetres.clone();
    d[index] = settlementMetres;
    return new SyntheticReadings(elapsedSeconds, d);
  }

  /**
   * Number of readings.
   *
   * @return the count
   */
  public int size() {
    return elapsedSeconds.length;
  }

  /**
   * Times.
   *
   * @return a copy, s
   */
  @Override
  public double[] elapsedSeconds() {
    return elapsedSeconds.clone();
  }

  /**
   * Settlements.
   *
   * @return a copy, m
   */
  @Override
  public double[] settlementMetres() {
    return settlementMetres.clone();
  }

  /**
   * The readings as the curve type the methods take.
   *
   * @return a settlement curve
   * @throws IllegalArgumentException if the times are not valid for a curve
   */
  public SettlementCurve toCurve() {
    return SettlementCurve.of(elapsedSeconds, settlementMetres);
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof SyntheticReadings o
        && Arrays.equals(elapsedSeconds, o.elapsedSeconds)
        && Arrays.equals(settlementMetres, o.settlementMetres);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(elapsedSeconds) + Arrays.hashCode(settlementMetres);
  }

  @Override
  public String toString() {
    return "SyntheticReadings[elapsedSeconds="
        + Arrays.toString(elapsedSeconds)
        + ", settlementMetres="
        + Arrays.toString(settlementMetres)
        + "]";
  }
}
