package org.oedometry.fitting;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;

class AsaokaMethodProperties {

  static final SettlementCurve BASE = ExactCurves.dense(2 / ExactCurves.YEAR, 0.01e-3);

  @Test
  @DisplayName("Time scaled by k: c_v scaled by 1/k (T = c_v t / H^2, Terzaghi)")
  void timeScaling() {
    EstimateInvariants.timeScaling(AsaokaMethod::fit, BASE, 40, 1e-6);
  }

  @Test
  @DisplayName("Settlement scaled by a: c_v unchanged (U is a ratio of settlements)")
  void settlementScaling() {
    EstimateInvariants.settlementScaling(AsaokaMethod::fit, BASE, 40, 1e-6);
  }

  @Test
  @DisplayName(
      "Noisy curves (0 to 10 um on 0.5 mm, lab-like 5 readings a cycle): a finite c_v or a"
          + " FitException, never another exception (ARCHITECTURE.md, errors)")
  void noisyCurvesGiveResultOrFitException() {
    EstimateInvariants.noisyCurvesGiveResultOrFitException(AsaokaMethod::fit);
  }

  @Test
  @DisplayName(
      "Settlements of any magnitude (scaled by 10^k, k from -300 to 300, exact curves read every"
          + " 10 s or log-spaced and resampled): c_v the same and the final settlement scaled, to"
          + " 1e-9, since s_n = b0 + b1 s_(n-1) is homogeneous in s and b1 alone gives c_v (the fit"
          + " once lost b1 below 1e-150 m and above 1e150 m)")
  void settlementsOfAnyMagnitude() {
    double cv = 2 / ExactCurves.YEAR;
    CurveParameters p = CurveParameters.of(0.01e-3, 0.5e-3, cv, 0);
    SettlementCurve[] bases = {
      ExactCurves.curve(ExactCurves.equalTimes(10, 8640), p), ExactCurves.dense(cv, 0.01e-3)
    };
    for (SettlementCurve base : bases) {
      EstimateInvariants.anyMagnitude(AsaokaMethod::fit, base, AsaokaResult::finalSettlement);
    }
  }
}
