package org.oedometry.fitting.synthetic;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * The varied synthetic study of the c<sub>v</sub> constructions: seeded random increments in five
 * families on three reading schedules. Every case is a pure function of (family, schedule, seed),
 * so a failing case can be rebuilt from its seed alone. All curves are invented.
 *
 * <h2>How a case is drawn</h2>
 *
 * <ul>
 *   <li>c<sub>v</sub> log-uniform in [0.3, 30] m<sup>2</sup>/yr (Julian year), H<sub>dr</sub>
 *       uniform in [7, 13] mm, primary compression 1 % to 5 % of the specimen height 2
 *       H<sub>dr</sub> (0.5 % to 1.5 % for swelling, negative), a false deformation at t = 0+ of 0
 *       to 10 % of it, and a reading at t = 0 (settlement before loading) of 0 to 2 mm.
 *   <li>Time factor at the last reading log-uniform in [2, 20] for the complete families, [0.3,
 *       0.6] for {@link Family#INCOMPLETE_PRIMARY}. The schedule is stretched in time so that its
 *       last reading falls there (the usual schedule itself is 0.1 min to 24 h).
 *   <li>Schedules: {@link Schedule#USUAL_LAB} the 14 usual reading times; {@link
 *       Schedule#DATA_LOGGER} 10 readings per log cycle over the same span; {@link Schedule#SPARSE}
 *       the usual times with 3 of them (never the first two or last two) missing. Each has the zero
 *       reading in front.
 *   <li>Noise: Gaussian, standard deviation uniform in [0, 2] micrometres; readings rounded to 0.1
 *       or 1 micrometre (even odds).
 *   <li>Creep: {@link Family#CREEP_AFTER_PRIMARY} a kink at T uniform in [1, 2] and 2 % to 8 % of
 *       the primary compression per log cycle after it; {@link Family#SMOOTH_CREEP} s
 *       log<sub>10</sub>(1 + t / t<sub>s</sub>) with t<sub>s</sub> at T uniform in [0.5, 2] and s 2
 *       % to 6 % of the primary compression.
 * </ul>
 */
public final class SyntheticStudy {

  private static final double SECONDS_PER_JULIAN_YEAR = 365.25 * 86400.0;
  private static final double MICROMETRE = 1e-6;

  private SyntheticStudy() {}

  /** Kinds of invented increment. */
  public enum Family {
    /** Terzaghi primary consolidation only. */
    PURE_TERZAGHI,
    /** Secondary compression straight on log time from a kink near the end of primary. */
    CREEP_AFTER_PRIMARY,
    /** Secondary compression growing smoothly from the start. */
    SMOOTH_CREEP,
    /** An unloading increment: the settlement decreases. */
    SWELLING,
    /** The increment ends at T between 0.3 and 0.6, before primary consolidation is over. */
    INCOMPLETE_PRIMARY;

    /**
     * Whether primary consolidation is complete at the last reading.
     *
     * @return false only for {@link #INCOMPLETE_PRIMARY}
     */
    public boolean complete() {
      return this != INCOMPLETE_PRIMARY;
    }
  }

  /** Reading schedules of the study. */
  public enum Schedule {
    /** The usual 14 reading times, stretched. */
    USUAL_LAB,
    /** Ten readings per log cycle over the same span. */
    DATA_LOGGER,
    /** The usual times with three missing. */
    SPARSE
  }

  /**
   * One drawn case.
   *
   * @param family the family
   * @param schedule the schedule
   * @param seed the seed it was drawn from
   * @param increment the forward model (its c<sub>v</sub> is the true value)
   * @param readings the invented readings, zero reading first
   * @param lastTimeFactor T at the last reading
   * @param noiseMetres noise standard deviation, m
   * @param resolutionMetres rounding step, m
   */
  public record Case(
      Family family,
      Schedule schedule,
      long seed,
      SyntheticIncrement increment,
      SyntheticReadings readings,
      double lastTimeFactor,
      double noiseMetres,
      double resolutionMetres) {

    /**
     * Checks the case.
     *
     * @param family not null
     * @param schedule not null
     * @param seed any
     * @param increment not null
     * @param readings not null
     * @param lastTimeFactor &gt; 0
     * @param noiseMetres &ge; 0
     * @param resolutionMetres &ge; 0
     * @throws IllegalArgumentException if a value is null or out of range
     */
    public Case {
      if (family == null || schedule == null || increment == null || readings == null) {
        throw new IllegalArgumentException("study case: every part must be given");
      }
      if (!(lastTimeFactor > 0) || !(noiseMetres >= 0) || !(resolutionMetres >= 0)) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT,
                "study case: T (%s) > 0, noise (%s m) and resolution (%s m) >= 0 needed",
                lastTimeFactor,
                noiseMetres,
                resolutionMetres));
      }
    }

    @Override
    public String toString() {
      return String.format(
          Locale.ROOT,
          "Case[%s, %s, seed %d, cv %.4g m2/yr, Hdr %.2f mm, T_last %.3g, noise %.2f um,"
              + " resolution %.1f um, %d readings]",
          family,
          schedule,
          seed,
          increment.cv() * SECONDS_PER_JULIAN_YEAR,
          increment.drainagePath() * 1e3,
          lastTimeFactor,
          noiseMetres / MICROMETRE,
          resolutionMetres / MICROMETRE,
          readings.size());
    }
  }

  /**
   * Draws one case.
   *
   * @param family the family, not null
   * @param schedule the schedule, not null
   * @param seed the seed
   * @return the case, a pure function of the arguments
   * @throws IllegalArgumentException if family or schedule is null
   */
  public static Case draw(Family family, Schedule schedule, long seed) {
    if (family == null || schedule == null) {
      throw new IllegalArgumentException("family and schedule must not be null");
    }
    SplittableRandom random = new SplittableRandom(seed);
    double cvPerYear = Math.exp(uniform(random, Math.log(0.3), Math.log(30.0)));
    double cv = cvPerYear / SECONDS_PER_JULIAN_YEAR;
    double drainagePath = uniform(random, 7e-3, 13e-3);
    double strain =
        family == Family.SWELLING ? -uniform(random, 0.005, 0.015) : uniform(random, 0.01, 0.05);
    double primary = strain * 2 * drainagePath;
    double immediate = uniform(random, 0.0, 0.1) * primary;
    double initial = uniform(random, 0.0, 2e-3);
    double lastT =
        family.complete()
            ? Math.exp(uniform(random, Math.log(2.0), Math.log(20.0)))
            : uniform(random, 0.3, 0.6);
    double lastTime = lastT * drainagePath * drainagePath / cv;
    SyntheticIncrement.CreepShape shape = SyntheticIncrement.CreepShape.NONE;
    double creepSlope = 0.0;
    double creepStart = 1.0;
    if (family == Family.CREEP_AFTER_PRIMARY) {
      shape = SyntheticIncrement.CreepShape.AFTER_KINK;
      creepStart = uniform(random, 1.0, 2.0) * drainagePath * drainagePath / cv;
      creepSlope = uniform(random, 0.02, 0.08) * primary;
    } else if (family == Family.SMOOTH_CREEP) {
      shape = SyntheticIncrement.CreepShape.SMOOTH;
      creepStart = uniform(random, 0.5, 2.0) * drainagePath * drainagePath / cv;
      creepSlope = uniform(random, 0.02, 0.06) * primary;
    }
    SyntheticIncrement increment =
        new SyntheticIncrement(
            initial, immediate, primary, cv, drainagePath, shape, creepSlope, creepStart);
    double[] usual = ReadingSchedules.usualLab();
    double scale = lastTime / usual[usual.length - 1];
    double[] times =
        switch (schedule) {
          case USUAL_LAB -> ReadingSchedules.scaled(usual, scale);
          case DATA_LOGGER -> ReadingSchedules.logSpaced(usual[0] * scale, lastTime, 10);
          case SPARSE ->
              ReadingSchedules.withMissingReadings(
                  ReadingSchedules.scaled(usual, scale), 3, random.nextLong());
        };
    double noise = uniform(random, 0.0, 2.0) * MICROMETRE;
    double resolution = (random.nextBoolean() ? 0.1 : 1.0) * MICROMETRE;
    SyntheticReadings readings =
        SyntheticReadings.sample(
            increment,
            ReadingSchedules.withZeroReading(times),
            noise,
            resolution,
            random.nextLong());
    return new Case(family, schedule, seed, increment, readings, lastT, noise, resolution);
  }

  /**
   * Draws every family on every schedule, perCell cases each, seeds derived from one master seed.
   *
   * @param perCell cases per (family, schedule), &ge; 1
   * @param seed the master seed
   * @return the cases, family by family, schedule by schedule
   * @throws IllegalArgumentException if perCell &lt; 1
   */
  public static List<Case> cases(int perCell, long seed) {
    if (perCell < 1) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "cases per cell (%d) must be >= 1", perCell));
    }
    SplittableRandom master = new SplittableRandom(seed);
    List<Case> out = new ArrayList<>();
    for (Family family : Family.values()) {
      for (Schedule schedule : Schedule.values()) {
        for (int i = 0; i < perCell; i++) {
          out.add(draw(family, schedule, master.nextLong()));
        }
      }
    }
    return out;
  }

  private static double uniform(SplittableRandom random, double low, double high) {
    return low + (high - low) * random.nextDouble();
  }
}
