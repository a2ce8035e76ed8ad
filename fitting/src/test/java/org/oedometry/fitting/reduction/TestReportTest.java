package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.compressibility.PreconsolidationMethod;

class TestReportTest {

  private static final TestReport R = ReductionFixtures.mixedReport();

  @Test
  @DisplayName("sigma'_p by construction reads the estimate of that construction")
  void preconsolidationByMethod() {
    for (PreconsolidationMethod m : PreconsolidationMethod.values()) {
      assertThat(R.preconsolidationPressure(m))
          .isEqualTo(R.preconsolidationEstimate(m).orElseThrow().preconsolidationPressure());
    }
    assertThat(R.toString()).contains("4 increments");
  }

  @Test
  @DisplayName("A report needs an increment and a positive e0")
  void validates() {
    assertThatThrownBy(
            () ->
                new TestReport(
                    R.identifiers(),
                    R.specimen(),
                    R.drainage(),
                    R.drainagePathRule(),
                    R.options(),
                    R.heightOfSolidsMetres(),
                    R.initialVoidRatio(),
                    R.seatingStressPascals(),
                    List.of(),
                    R.compressionCurve(),
                    R.preconsolidation(),
                    R.preconsolidationForClasses(),
                    R.compressionIndex(),
                    R.recompressionBranches(),
                    R.permeabilityChange()))
        .hasMessageContaining("at least one increment");
    assertThatThrownBy(
            () ->
                new TestReport(
                    R.identifiers(),
                    R.specimen(),
                    R.drainage(),
                    R.drainagePathRule(),
                    R.options(),
                    R.heightOfSolidsMetres(),
                    Double.NaN,
                    R.seatingStressPascals(),
                    R.increments(),
                    R.compressionCurve(),
                    R.preconsolidation(),
                    R.preconsolidationForClasses(),
                    R.compressionIndex(),
                    R.recompressionBranches(),
                    R.permeabilityChange()))
        .hasMessageContaining("initial void ratio (NaN)");
  }
}
