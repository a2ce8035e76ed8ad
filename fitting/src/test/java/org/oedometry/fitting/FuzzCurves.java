package org.oedometry.fitting;

import java.util.SplittableRandom;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.fitting.synthetic.SyntheticIncrement;
import org.oedometry.fitting.synthetic.SyntheticReadings;
import org.oedometry.theory.Drainage;

/**
 * Random increments for the fuzz properties (every value invented): mostly Terzaghi curves
 * (c<sub>v</sub> 0.01 to 300 m<sup>2</sup>/yr, primary complete or far from it, with or without
 * creep and immediate settlement, swelling on unloading, dial-gauge noise and rounding, a wild
 * reading, movements of nanometres), and curves no method should trust (noise only, flat, straight
 * in log time), on four schedules (the usual lab one, log-spaced, a data logger's uniform one, with
 * readings missing), with or without a zero reading.
 */
public final class FuzzCurves {

  private static final double YEAR = 365.25 * 86_400;

  private FuzzCurves() {}

  /**
   * One increment's readings: a Terzaghi curve (mostly) or a curve no method should trust.
   *
   * @param random the source of every choice
   * @param height the specimen's height, m: primary movement 0.05 % to 2 % of it (a fifth of that,
   *     negative, when unloading), sometimes a thousandth of that
   * @param unload whether the specimen swells
   * @return the readings
   */
  public static SettlementCurve curve(SplittableRandom random, double height, boolean unload) {
    double[] times = schedule(random);
    double size =
        height * (0.0005 + 0.02 * random.nextDouble()) * (random.nextInt(5) == 0 ? 1e-3 : 1);
    double primary = unload ? -0.2 * size : size;
    double noise = random.nextInt(3) == 0 ? 0 : 1e-6 * 3 * random.nextDouble();
    double resolution = random.nextBoolean() ? 0 : (random.nextBoolean() ? 1e-6 : 2e-6);
    int kind = random.nextInt(10);
    if (kind >= 3) {
      double cv = 0.01 * Math.pow(10, 4.5 * random.nextDouble()) / YEAR;
      SyntheticIncrement.CreepShape creep =
          SyntheticIncrement.CreepShape.values()[
              random.nextInt(SyntheticIncrement.CreepShape.values().length)];
      double path = Drainage.DOUBLE.drainagePath(height);
      double slope =
          creep == SyntheticIncrement.CreepShape.NONE ? 0 : 0.05 * primary * random.nextDouble();
      SyntheticIncrement model =
          new SyntheticIncrement(
              0,
              random.nextBoolean() ? 0 : 0.1 * primary * random.nextDouble(),
              primary,
              cv,
              path,
              creep,
              slope,
              path * path / cv);
      SyntheticReadings readings =
          SyntheticReadings.sample(model, times, noise, resolution, random.nextLong());
      if (random.nextInt(5) == 0) {
        // A wild reading (a knocked gauge): three times the increment's movement either way.
        int wild = random.nextInt(times.length);
        readings =
            readings.withReading(
                wild,
                readings.settlementMetres()[wild] + 3 * size * (random.nextBoolean() ? 1 : -1));
      }
      return readings.toCurve();
    }
    double[] d = new double[times.length];
    double first = times[0] > 0 ? times[0] : times[1];
    for (int i = 0; i < times.length; i++) {
      double value =
          switch (kind) {
            case 0 -> noise * Math.sin(12.9898 * i + random.nextDouble()); // noise only
            case 1 -> 0.001 * size; // flat
            default -> times[i] > 0 ? primary * 0.2 * Math.log10(times[i] / first) : 0; // straight
          };
      d[i] = resolution > 0 ? Math.rint(value / resolution) * resolution : value;
    }
    return SettlementCurve.of(times, d);
  }

  /**
   * A reading schedule, s.
   *
   * @param random the source of every choice
   * @return the times
   */
  public static double[] schedule(SplittableRandom random) {
    double[] times =
        switch (random.nextInt(4)) {
          case 0 -> ReadingSchedules.usualLab();
          case 1 ->
              ReadingSchedules.logSpaced(
                  1 + 10 * random.nextDouble(),
                  3_600 * (1 + 47 * random.nextDouble()),
                  2 + random.nextInt(20));
          case 2 -> ReadingSchedules.uniform(30 + 270 * random.nextDouble(), 86_400);
          default ->
              ReadingSchedules.withMissingReadings(
                  ReadingSchedules.logSpaced(6, 86_400, 10), random.nextInt(10), random.nextLong());
        };
    return random.nextBoolean() ? ReadingSchedules.withZeroReading(times) : times;
  }
}
