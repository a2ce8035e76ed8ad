package org.oedometry.fitting.synthetic;

import java.util.Arrays;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Elapsed reading times of invented increments, in s, strictly increasing, without the reading at t
 * = 0 (add it with {@link #withZeroReading(double[])}).
 */
public final class ReadingSchedules {

  /**
   * The usual 14 reading times of a 24 h increment: 0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30 min, 1, 2,
   * 4, 8, 24 h (common practice).
   */
  private static final double[] USUAL_LAB = {
    6, 15, 30, 60, 120, 240, 480, 900, 1800, 3600, 7200, 14400, 28800, 86400
  };

  private ReadingSchedules() {}

  /**
   * The usual 14-reading schedule (0.1 min to 24 h).
   *
   * @return times, s
   */
  public static double[] usualLab() {
    return USUAL_LAB.clone();
  }

  /**
   * A data-logger schedule equally spaced in log time.
   *
   * @param first first time, s, &gt; 0
   * @param last last time, s, &gt; first
   * @param perCycle readings per log<sub>10</sub> cycle, &ge; 1
   * @return times first, first 10<sup>1/perCycle</sup>, ..., up to last (last included)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double[] logSpaced(double first, double last, int perCycle) {
    if (!(first > 0) || !(last > first) || last == Double.POSITIVE_INFINITY || perCycle < 1) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "log schedule: first (%s s) > 0, last (%s s) > first and per cycle (%d) >= 1 needed",
              first,
              last,
              perCycle));
    }
    int count = (int) Math.floor(Math.log10(last / first) * perCycle + 1e-9) + 1;
    double[] t = new double[count];
    for (int i = 0; i < count; i++) {
      t[i] = first * Math.pow(10.0, (double) i / perCycle);
    }
    if (t[count - 1] < last * (1 - 1e-12)) {
      t = Arrays.copyOf(t, count + 1);
      t[count] = last;
    } else {
      t[count - 1] = last;
    }
    return t;
  }

  /**
   * Readings at a fixed interval (a data logger with a clock): interval, 2 interval, ..., last.
   *
   * @param interval s, &gt; 0
   * @param last s, &ge; interval
   * @return times, s
   * @throws IllegalArgumentException if an argument is out of range or the count exceeds 10 million
   */
  public static double[] uniform(double interval, double last) {
    if (!(interval > 0) || !(last >= interval) || last / interval > 1e7) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "uniform schedule: interval (%s s) > 0 and last (%s s) >= interval, at most 1e7"
                  + " readings",
              interval,
              last));
    }
    int count = (int) Math.floor(last / interval + 1e-9);
    double[] t = new double[count];
    for (int i = 0; i < count; i++) {
      t[i] = (i + 1) * interval;
    }
    return t;
  }

  /**
   * A schedule stretched in time.
   *
   * @param times times, s
   * @param factor multiplier, finite, &gt; 0
   * @return times times factor
   * @throws IllegalArgumentException if the factor is out of range
   */
  public static double[] scaled(double[] times, double factor) {
    if (!(factor > 0) || factor == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "time scale factor (%s) must be finite and > 0", factor));
    }
    double[] out = times.clone();
    for (int i = 0; i < out.length; i++) {
      out[i] *= factor;
    }
    return out;
  }

  /**
   * The schedule with some readings missing, chosen by a seeded generator; the first two and the
   * last two readings are kept.
   *
   * @param times times, s, at least missing + 4
   * @param missing how many readings to drop, &ge; 0
   * @param seed the seed
   * @return the remaining times, in order
   * @throws IllegalArgumentException if too many readings would be dropped
   */
  public static double[] withMissingReadings(double[] times, int missing, long seed) {
    if (missing < 0 || times.length < missing + 4) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "cannot drop %d of %d readings (the first two and last two stay)",
              missing,
              times.length));
    }
    boolean[] drop = new boolean[times.length];
    SplittableRandom random = new SplittableRandom(seed);
    int dropped = 0;
    while (dropped < missing) {
      int i = 2 + random.nextInt(times.length - 4);
      if (!drop[i]) {
        drop[i] = true;
        dropped++;
      }
    }
    double[] out = new double[times.length - missing];
    int k = 0;
    for (int i = 0; i < times.length; i++) {
      if (!drop[i]) {
        out[k++] = times[i];
      }
    }
    return out;
  }

  /**
   * The schedule with a reading at t = 0 in front.
   *
   * @param times times, s, all &gt; 0
   * @return 0 followed by the times
   */
  public static double[] withZeroReading(double[] times) {
    double[] out = new double[times.length + 1];
    System.arraycopy(times, 0, out, 1, times.length);
    return out;
  }
}
