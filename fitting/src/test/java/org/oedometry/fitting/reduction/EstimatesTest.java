package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.AsaokaMethod;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.EarlySlopeMethod;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.InflectionPointMethod;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.RectangularHyperbolaMethod;
import org.oedometry.fitting.RootTimeMethod;
import org.oedometry.fitting.RootTimeResult;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;

class EstimatesTest {

  @Test
  @DisplayName("d0, d100 and the secondary slope are read from each result's own components")
  void readsEachResult() {
    IncrementReport row = ReductionFixtures.mixedReport().increments().get(0);
    RootTimeResult root = (RootTimeResult) row.estimate(CvMethod.ROOT_TIME).orElseThrow();
    assertThat(Estimates.d0(root)).hasValue(root.d0());
    assertThat(Estimates.d100(root)).hasValue(root.d100());
    assertThat(Estimates.secondarySlope(root)).isEmpty();
    FullCurveResult full = (FullCurveResult) row.estimate(CvMethod.FULL_CURVE).orElseThrow();
    assertThat(Estimates.secondarySlope(full)).hasValue(full.secondarySlope());
    for (CvMethod m : CvMethod.values()) {
      for (CvEstimate e : row.estimate(m).stream().toList()) {
        assertThat(Estimates.d100(e)).isPresent();
      }
    }
  }

  @Test
  @DisplayName(
      "Every method's d0 and d100 as the reduction reads them, on an exact curve read every 10 s"
          + " for 24 h (ConsolidationCurveModel, d_i 0.02 mm, d_p 0.5 mm, T at 24 h 10): d100"
          + " within 3 % of d_i + d_p (Asaoka: its final settlement), d0 within 1 % of d_p of d_i"
          + " where the method has one; none for the rectangular hyperbola and Asaoka")
  void everyMethodAgainstTheGeneratingCurve() {
    double path = 0.0095;
    double[] t = new double[8640];
    for (int i = 0; i < t.length; i++) {
      t[i] = 10.0 * (i + 1);
    }
    double dp = 0.5e-3;
    double di = 0.02e-3;
    CurveParameters truth = CurveParameters.of(di, dp, 10 * path * path / 86_400, 0);
    ConsolidationCurveModel model = ConsolidationCurveModel.of(path);
    double[] d = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      d[i] = model.settlement(t[i], truth);
    }
    SettlementCurve curve = SettlementCurve.of(t, d);
    List<CvEstimate> results =
        List.of(
            LogTimeMethod.fit(curve, path),
            RootTimeMethod.fit(curve, path),
            FullCurveMethod.fit(curve, path),
            InflectionPointMethod.fit(curve, path),
            RectangularHyperbolaMethod.fit(curve, path),
            EarlySlopeMethod.fit(curve, path),
            AsaokaMethod.fit(curve, path));
    for (CvEstimate e : results) {
      assertThat(Estimates.d100(e).getAsDouble())
          .as("d100 of %s", e.method())
          .isCloseTo(di + dp, within(0.03 * (di + dp)));
      boolean hasZero =
          e.method() != CvMethod.RECTANGULAR_HYPERBOLA && e.method() != CvMethod.ASAOKA;
      assertThat(Estimates.d0(e).isPresent()).as("d0 of %s", e.method()).isEqualTo(hasZero);
      if (hasZero) {
        assertThat(Estimates.d0(e).getAsDouble())
            .as("d0 of %s", e.method())
            .isCloseTo(di, within(0.01 * dp));
      }
    }
  }
}
