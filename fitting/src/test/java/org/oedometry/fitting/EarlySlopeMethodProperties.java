package org.oedometry.fitting;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;

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
}
