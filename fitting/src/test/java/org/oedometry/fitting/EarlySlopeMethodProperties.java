package org.oedometry.fitting;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.CurveParameters;

class EarlySlopeMethodProperties {

  static final SettlementCurve BASE = ExactCurves.dense(2 / ExactCurves.YEAR, 0.01e-3);

  @Test
  @DisplayName("Time scaled by k: c_v scaled by 1/k (T = c_v t / H^2, Terzaghi)")
  void timeScaling() {
    EstimateInvariants.timeScaling(EarlySlopeMethod::fit, BASE, 40, 1e-9);
  }

  @Test
  @DisplayName("Settlement scaled by a: c_v unchanged (U is a ratio of settlements)")
  void settlementScaling() {
    EstimateInvariants.settlementScaling(EarlySlopeMethod::fit, BASE, 40, 1e-9);
  }

  @Test
  @DisplayName(
      "Noisy curves (0 to 10 um on 0.5 mm, lab-like 5 readings a cycle): a finite c_v or a"
          + " FitException, never another exception (ARCHITECTURE.md, errors)")
  void noisyCurvesGiveResultOrFitException() {
    EstimateInvariants.noisyCurvesGiveResultOrFitException(EarlySlopeMethod::fit);
  }

  @Test
  @DisplayName(
      "Settlements of any magnitude (scaled by 10^k, k from -300 to 300; exact dense curve and"
          + " the usual lab schedule; d100 from the hyperbola or the last reading): c_v the same to"
          + " 1e-9 and d100 scaled by 10^k, since U is a ratio of settlements (the hyperbola's t/d"
          + " once left the double range for settlements near 1e-300 m or 1e300 m)")
  void settlementsOfAnyMagnitude() {
    // Source: Terzaghi's theory, U = (d - d0) / (d100 - d0) is a ratio of settlements, so c_v
    // does not depend on their unit and d100 scales with them (the same curve in other units).
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve[] bases = {
      BASE,
      ExactCurves.curve(ReadingSchedules.usualLab(), CurveParameters.of(0.02e-3, 0.5e-3, cv, 5e-6))
    };
    EarlySlopeOptions lastReading =
        EarlySlopeOptions.defaults().withPrimaryEnd(EarlySlopeOptions.PrimaryEnd.LAST_READING);
    for (SettlementCurve base : bases) {
      EstimateInvariants.anyMagnitude(EarlySlopeMethod::fit, base, EarlySlopeResult::d100);
      EstimateInvariants.anyMagnitude(
          (c, h) -> EarlySlopeMethod.fit(c, h, lastReading), base, EarlySlopeResult::d100);
    }
  }

  @Test
  @DisplayName(
      "The scaling by a power of 2 changes no bit on 200 seeded ordinary curves (IEEE 754: exact"
          + " scaling commutes with correctly rounded operations): the same result as without it,"
          + " d100 from the hyperbola or the last reading, and readings times 2^k give c_v bit for"
          + " bit and d100 times 2^k exactly")
  void scalingChangesNoBitOnOrdinaryCurves() {
    for (EarlySlopeOptions.PrimaryEnd end : EarlySlopeOptions.PrimaryEnd.values()) {
      EarlySlopeOptions options = EarlySlopeOptions.defaults().withPrimaryEnd(end);
      EstimateInvariants.sameBitsAsUnscaled(
          (c, h) -> EarlySlopeMethod.fit(c, h, options),
          (c, h) -> EarlySlopeMethod.fit(c, h, options, false),
          EarlySlopeResult::d100);
    }
  }
}
