package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Supplier;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.fitting.synthetic.SyntheticIncrement;
import org.oedometry.fitting.synthetic.SyntheticReadings;
import org.oedometry.theory.Drainage;

/**
 * Every c<sub>v</sub> method with random legal options on random curves (invented: Terzaghi curves
 * with creep, noise, rounding, a wild reading or nanometre movements; noise only; flat; straight in
 * log time): a finite positive c<sub>v</sub> whose result and warnings print no NaN or infinity, or
 * a {@link FitException} whose reason prints none, or (too few readings after t = 0 only) an {@link
 * IllegalArgumentException}. ARCHITECTURE.md (Errors): "No NaN or infinity in any result"; a valid
 * curve that admits no construction is a FitException.
 */
class MethodOptionsFuzzProperties {

  private static final double YEAR = 365.25 * 86_400;

  @Test
  @DisplayName(
      "seven methods, random options, random curves: a finite c_v, a FitException or (too few"
          + " readings) an IllegalArgumentException; no NaN or Infinity in any text")
  void anyOptionsAnyCurve() {
    int[] found = new int[7];
    qt().withFixedSeed(2_026_120_201L)
        .withExamples(300)
        .forAll(longs().all())
        .checkAssert(
            seed -> {
              SplittableRandom random = new SplittableRandom(seed);
              SettlementCurve curve = randomCurve(random);
              double h = 0.004 + 0.02 * random.nextDouble();
              List<Supplier<CvEstimate>> methods = methods(curve, h, random);
              for (int m = 0; m < methods.size(); m++) {
                try {
                  CvEstimate r = methods.get(m).get();
                  found[m]++;
                  assertThat(r.cv()).isPositive().isFinite();
                  assertThat(r.toString()).doesNotContain("NaN").doesNotContain("Infinity");
                  for (FitWarning w : r.warnings()) {
                    assertThat(w.message()).doesNotContain("NaN").doesNotContain("Infinity");
                  }
                } catch (FitException e) {
                  assertThat(e.getMessage())
                      .isNotBlank()
                      .doesNotContain("NaN")
                      .doesNotContain("Infinity");
                } catch (IllegalArgumentException e) {
                  assertThat(e.getMessage()).contains("readings after t = 0 are too few");
                }
              }
            });
    // Each method gave a value on some of the curves (the check above is not vacuous).
    assertThat(java.util.Arrays.stream(found).min().orElseThrow()).isPositive();
  }

  private static List<Supplier<CvEstimate>> methods(
      SettlementCurve c, double h, SplittableRandom random) {
    LogTimeOptions.Builder log = LogTimeOptions.builder();
    if (random.nextBoolean()) {
      log.timeFactor50(0.11 + 0.18 * random.nextDouble());
    }
    RootTimeOptions.Builder root = RootTimeOptions.builder();
    if (random.nextBoolean()) {
      root.factor(1.01 + 0.98 * random.nextDouble());
    }
    if (random.nextBoolean()) {
      root.timeFactor90(0.71 + 0.28 * random.nextDouble());
    }
    double narrow = 0.05 + 0.95 * random.nextDouble();
    InflectionPointOptions inflection =
        new InflectionPointOptions(
            narrow, narrow + (2 - narrow) * random.nextDouble(), 8 + random.nextInt(43));
    AsaokaOptions asaoka = AsaokaOptions.defaults().withSteps(4 + random.nextInt(197));
    RectangularHyperbolaOptions hyperbola =
        RectangularHyperbolaOptions.defaults()
            .withZero(
                RectangularHyperbolaOptions.Zero.values()[
                    random.nextInt(RectangularHyperbolaOptions.Zero.values().length)])
            .withResampleSparseReadings(random.nextBoolean());
    EarlySlopeOptions early =
        EarlySlopeOptions.defaults()
            .withPrimaryEnd(
                EarlySlopeOptions.PrimaryEnd.values()[
                    random.nextInt(EarlySlopeOptions.PrimaryEnd.values().length)]);
    FullCurveOptions full =
        FullCurveOptions.defaults()
            .withWeights(
                FullCurveOptions.ReadingWeights.values()[
                    random.nextInt(FullCurveOptions.ReadingWeights.values().length)])
            .withSecondary(random.nextBoolean())
            .withSecondaryOnset(Math.pow(10, -2 + 4 * random.nextDouble()))
            .withConfidenceLevel(0.5 + 0.499 * random.nextDouble())
            .withMaxIterations(10 + random.nextInt(200));
    LogTimeOptions logOptions = log.build();
    RootTimeOptions rootOptions = root.build();
    return List.of(
        () -> LogTimeMethod.fit(c, h, logOptions),
        () -> RootTimeMethod.fit(c, h, rootOptions),
        () -> InflectionPointMethod.fit(c, h, inflection),
        () -> AsaokaMethod.fit(c, h, asaoka),
        () -> RectangularHyperbolaMethod.fit(c, h, hyperbola),
        () -> EarlySlopeMethod.fit(c, h, early),
        () -> FullCurveMethod.fit(c, h, full));
  }

  /** One increment's readings, mostly a Terzaghi curve; every value invented. */
  private static SettlementCurve randomCurve(SplittableRandom random) {
    double[] times =
        switch (random.nextInt(4)) {
          case 0 -> ReadingSchedules.usualLab();
          case 1 ->
              ReadingSchedules.logSpaced(
                  1 + 10 * random.nextDouble(),
                  3_600 * (1 + 47 * random.nextDouble()),
                  2 + random.nextInt(20));
          case 2 -> ReadingSchedules.uniform(60 + 240 * random.nextDouble(), 86_400);
          default ->
              ReadingSchedules.withMissingReadings(
                  ReadingSchedules.logSpaced(6, 86_400, 10), random.nextInt(10), random.nextLong());
        };
    if (random.nextBoolean()) {
      times = ReadingSchedules.withZeroReading(times);
    }
    double size = (5e-6 + 1e-3 * random.nextDouble()) * (random.nextInt(5) == 0 ? 1e-3 : 1);
    double primary = random.nextInt(4) == 0 ? -0.3 * size : size;
    double noise = random.nextInt(3) == 0 ? 0 : 3e-6 * random.nextDouble();
    double resolution = random.nextBoolean() ? 0 : 1e-6;
    int kind = random.nextInt(10);
    if (kind >= 3) {
      double cv = 0.01 * Math.pow(10, 4.5 * random.nextDouble()) / YEAR;
      SyntheticIncrement.CreepShape creep =
          SyntheticIncrement.CreepShape.values()[
              random.nextInt(SyntheticIncrement.CreepShape.values().length)];
      double path = Drainage.DOUBLE.drainagePath(0.02);
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
        int wild = random.nextInt(times.length);
        readings =
            readings.withReading(
                wild,
                readings.settlementMetres()[wild] + 3 * size * (random.nextBoolean() ? 1 : -1));
      }
      return readings.toCurve();
    }
    List<Double> values = new ArrayList<>();
    double first = times[0] > 0 ? times[0] : times[1];
    for (double t : times) {
      double value =
          switch (kind) {
            case 0 -> noise * Math.sin(12.9898 * values.size() + random.nextDouble());
            case 1 -> 0.001 * size;
            default -> t > 0 ? primary * 0.2 * Math.log10(t / first) : 0;
          };
      values.add(resolution > 0 ? Math.rint(value / resolution) * resolution : value);
    }
    return SettlementCurve.of(times, values.stream().mapToDouble(Double::doubleValue).toArray());
  }
}
