package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;

class InflectionPointMethodProperties {

  static final SettlementCurve BASE = ExactCurves.dense(2 / ExactCurves.YEAR, 0.01e-3);

  @Test
  @DisplayName("Time scaled by k: c_v scaled by 1/k (T = c_v t / H^2, Terzaghi)")
  void timeScaling() {
    EstimateInvariants.timeScaling(InflectionPointMethod::fit, BASE, 25, 1e-6);
  }

  @Test
  @DisplayName("Settlement scaled by a: c_v unchanged (U is a ratio of settlements)")
  void settlementScaling() {
    EstimateInvariants.settlementScaling(InflectionPointMethod::fit, BASE, 25, 1e-6);
  }

  @Test
  @DisplayName(
      "Noisy curves (0 to 10 um on 0.5 mm, lab-like 5 readings a cycle): a finite c_v or a"
          + " FitException, never another exception (ARCHITECTURE.md, errors)")
  void noisyCurvesGiveResultOrFitException() {
    EstimateInvariants.noisyCurvesGiveResultOrFitException(InflectionPointMethod::fit);
  }

  @Test
  @DisplayName(
      "Any exact Terzaghi curve (c_v 0.1 to 100 m^2/yr, d_i 0 to 2 d_p, readings 8 to 120 a cycle"
          + " from T = 1e-3..0.05 to T = 1..50): c_v, d0 and d100 recovered to 1e-6, whatever window"
          + " is chosen (the window correction is exact on the theory's own curve)")
  void exactOnTerzaghiCurves() {
    qt().withFixedSeed(20261202L)
        .withExamples(150)
        .forAll(
            doubles().between(-1, 2),
            doubles().between(0, 2),
            integers().between(8, 120),
            doubles()
                .between(-3, Math.log10(0.05))
                .zip(
                    doubles().between(0, Math.log10(50)),
                    (first, last) -> new double[] {first, last}))
        .checkAssert(
            (logCv, initialRatio, perCycle, span) -> {
              double logFirstT = span[0];
              double logLastT = span[1];
              double cv = Math.pow(10, logCv) / ExactCurves.YEAR;
              double primary = 0.5e-3;
              CurveParameters truth = CurveParameters.of(initialRatio * primary, primary, cv, 0);
              SettlementCurve c =
                  ExactCurves.curve(
                      ExactCurves.logTimes(
                          cv, Math.pow(10, logFirstT), Math.pow(10, logLastT), perCycle),
                      truth);
              InflectionPointResult r = InflectionPointMethod.fit(c, ExactCurves.DRAINAGE_PATH);
              assertThat(r.cv() / cv - 1).isCloseTo(0, within(1e-6));
              assertThat(r.d0()).isCloseTo(truth.initialSettlement(), within(1e-6 * primary));
              assertThat(r.d100())
                  .isCloseTo(truth.initialSettlement() + primary, within(1e-6 * primary));
            });
  }

  @Test
  @DisplayName(
      "Settlements of any magnitude (scaled by 10^k, k from -300 to 300; exact dense curve and"
          + " the usual lab schedule): c_v the same to 1e-9 and d100 scaled by 10^k, since U"
          + " is a ratio of settlements (the local fits' sums once left the double range beyond"
          + " 1e150 m or below 1e-150 m)")
  void settlementsOfAnyMagnitude() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve[] bases = {
      ExactCurves.dense(cv, 0.02e-3),
      ExactCurves.curve(
          org.oedometry.fitting.synthetic.ReadingSchedules.usualLab(),
          CurveParameters.of(0.02e-3, 0.5e-3, cv, 5e-6))
    };
    for (SettlementCurve base : bases) {
      EstimateInvariants.anyMagnitude(
          InflectionPointMethod::fit, base, InflectionPointResult::d100);
    }
  }
}
