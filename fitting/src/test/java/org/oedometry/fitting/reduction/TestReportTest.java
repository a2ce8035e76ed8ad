package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

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
  @DisplayName(
      "Stresses of 2e-306 to 8e-306 Pa (legal): m_v is beyond the double range in m^2/MN (IEEE 754"
          + " largest double 1.8e308), so the text, CSV and AGS4 reports show it absent instead of"
          + " failing, and no report quotes NaN or infinity")
  void valuesBeyondTheRangeOfTheirLabUnitAreAbsent() {
    TestReport r = TestReduction.reduce(ReductionFixtures.tinyStresses());
    double mv = r.increments().get(0).mv().orElseThrow();
    assertThat(mv * 1e6).isInfinite();
    for (String report : List.of(r.toText(), r.toCsv(), r.toAgs4(), r.toJson(), r.toString())) {
      assertThat(report).doesNotContain("Infinity").doesNotContain("NaN");
    }
    String[] firstRow = r.toCsv().lines().skip(1).findFirst().orElseThrow().split(",", -1);
    String[] header = r.toCsv().lines().findFirst().orElseThrow().split(",", -1);
    int mvColumn = List.of(header).indexOf("mv (m2/MN)");
    assertThat(mvColumn).as("m_v column in %s", List.of(header)).isNotNegative();
    assertThat(firstRow[mvColumn]).isEmpty();
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
                    R.initialDegreeOfSaturation(),
                    R.finalDegreeOfSaturation(),
                    R.dataWarnings(),
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
                    R.initialDegreeOfSaturation(),
                    R.finalDegreeOfSaturation(),
                    R.dataWarnings(),
                    R.increments(),
                    R.compressionCurve(),
                    R.preconsolidation(),
                    R.preconsolidationForClasses(),
                    R.compressionIndex(),
                    R.recompressionBranches(),
                    R.permeabilityChange()))
        .hasMessageContaining("initial void ratio (NaN)");
  }

  @Test
  @DisplayName("Initial dry density G_s rho_w / (1 + e0) equals M_s / (A H0), the definition")
  void initialDryDensity() {
    double massOverVolume =
        R.specimen().dryMassKilograms().getAsDouble()
            / (R.specimen().areaSquareMetres() * R.specimen().initialHeightMetres());
    assertThat(R.initialDryDensityKilogramsPerCubicMetre())
        .isCloseTo(massOverVolume, within(1e-12 * massOverVolume));
  }
}
