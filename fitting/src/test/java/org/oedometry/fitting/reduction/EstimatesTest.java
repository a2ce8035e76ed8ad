package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.RootTimeResult;

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
}
