package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Supplier;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;

/**
 * Every c<sub>v</sub> method with random legal options on random curves ({@link FuzzCurves},
 * invented): a finite positive c<sub>v</sub> whose result and warnings print no NaN or infinity, or
 * a {@link FitException} whose reason prints none, or (too few readings after t = 0 only) an {@link
 * IllegalArgumentException}. ARCHITECTURE.md (Errors): "No NaN or infinity in any result"; a valid
 * curve that admits no construction is a FitException.
 */
class MethodOptionsFuzzProperties {

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
              SettlementCurve curve = FuzzCurves.curve(random, 0.02, random.nextInt(4) == 0);
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
}
