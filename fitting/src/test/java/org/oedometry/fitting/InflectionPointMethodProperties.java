package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.longs;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;

class InflectionPointMethodProperties {

  static final long SEED = 20261201L;
  static final SettlementCurve BASE = ExactCurves.dense(2 / ExactCurves.YEAR, 0.01e-3);
  static final double CV = InflectionPointMethod.fit(BASE, ExactCurves.DRAINAGE_PATH).cv();

  @Test
  @DisplayName("Time scaled by k: c_v scaled by 1/k (T = c_v t / H^2, Terzaghi)")
  void timeScaling() {
    qt().withFixedSeed(SEED)
        .withExamples(25)
        .forAll(doubles().between(0.01, 100))
        .checkAssert(
            k -> {
              double cv =
                  InflectionPointMethod.fit(
                          ExactCurves.scaled(BASE, k, 1), ExactCurves.DRAINAGE_PATH)
                      .cv();
              assertThat(cv * k).isCloseTo(CV, within(1e-6 * CV));
            });
  }

  @Test
  @DisplayName("Settlement scaled by a: c_v unchanged (U is a ratio of settlements)")
  void settlementScaling() {
    qt().withFixedSeed(SEED)
        .withExamples(25)
        .forAll(doubles().between(0.01, 100))
        .checkAssert(
            a -> {
              double cv =
                  InflectionPointMethod.fit(
                          ExactCurves.scaled(BASE, 1, a), ExactCurves.DRAINAGE_PATH)
                      .cv();
              assertThat(cv).isCloseTo(CV, within(1e-6 * CV));
            });
  }

  @Test
  @DisplayName(
      "Noisy curves (0 to 10 um on 0.5 mm, lab-like 5 readings a cycle): a finite c_v or a"
          + " FitException, never another exception (ARCHITECTURE.md, errors)")
  void noisyCurvesGiveResultOrFitException() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve exact =
        ExactCurves.curve(
            ExactCurves.logTimes(cv, 1e-3, 5, 5),
            org.oedometry.theory.CurveParameters.of(0.01e-3, 0.5e-3, cv, 0.02e-3));
    qt().withFixedSeed(SEED)
        .withExamples(60)
        .forAll(doubles().between(0, 10e-6), longs().all())
        .checkAssert(
            (sigma, seed) -> {
              SettlementCurve c = ExactCurves.noisy(exact, sigma, seed);
              ExactCurves.resultOrFitException(
                  () -> InflectionPointMethod.fit(c, ExactCurves.DRAINAGE_PATH));
            });
  }
}
