package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class PermeabilityTest {

  /** Julian year, s (FACTS: the year we use is 365.25 d). */
  private static final double YEAR = 365.25 * 86400;

  @Test
  @DisplayName(
      "FACTS [exact arithmetic]: c_v in m^2/yr, m_v in m^2/MN, gamma_w = 9.81 kN/m^3 give"
          + " k [m/s] = 3.109e-10 c_v m_v")
  void factsShortcut() {
    for (double[] cvMv : new double[][] {{1, 1}, {2.5, 0.3}, {0.4, 1.7}}) {
      double cvSi = cvMv[0] / YEAR;
      double mvSi = cvMv[1] / 1e6;
      double k = Permeability.fromConsolidation(cvSi, mvSi);
      // 3.109e-10 is rounded to four figures: 9810 / (31557600 * 1e6) = 3.10857e-10.
      assertThat(k).isCloseTo(3.109e-10 * cvMv[0] * cvMv[1], withinPercentage(0.02));
    }
  }

  @Test
  @DisplayName(
      "k = c_v m_v gamma_w agrees with the same product in kN-m-yr units, converted to m/s")
  void otherUnitSystem() {
    double cvPerYear = 1.8; // m^2/yr
    double mvPerKiloPascal = 4.2e-4; // m^2/kN
    double gammaKiloNewton = 9.81; // kN/m^3
    double kMetresPerYear = cvPerYear * mvPerKiloPascal * gammaKiloNewton;
    double k = Permeability.fromConsolidation(cvPerYear / YEAR, mvPerKiloPascal / 1000);
    assertThat(k).isCloseTo(kMetresPerYear / YEAR, withinPercentage(1e-12));
    // Round trip through cm/s (1 m/s = 100 cm/s).
    assertThat((k * 100) / 100).isCloseTo(k, withinPercentage(1e-13));
  }

  @Test
  @DisplayName("A settable unit weight of water scales k in proportion")
  void settableUnitWeight() {
    double k1 = Permeability.fromConsolidation(1e-8, 5e-7, 9810);
    double k2 = Permeability.fromConsolidation(1e-8, 5e-7, 10000);
    assertThat(k2 / k1).isCloseTo(10000.0 / 9810.0, within(1e-14));
    assertThat(Permeability.STANDARD_WATER_UNIT_WEIGHT).isEqualTo(9810.0);
  }

  @Test
  @DisplayName("Per increment: k from each c_v and m_v, plotted at the increment's mean e")
  void perIncrement() {
    CompressionCurve c =
        CompressionCurve.of(
            1.0, new double[] {50e3, 100e3, 200e3}, new double[] {0.95, 0.90, 0.80});
    List<IncrementCompressibility> incs = Compressibility.increments(c, 60e3);
    double[] cv = {3e-8, 2e-8, 1e-8};
    List<IncrementPermeability> ks = Permeability.perIncrement(incs, cv);
    for (int i = 0; i < 3; i++) {
      assertThat(ks.get(i).permeability())
          .isCloseTo(cv[i] * incs.get(i).mv() * 9810, withinPercentage(1e-12));
      assertThat(ks.get(i).meanVoidRatio()).isEqualTo(incs.get(i).meanVoidRatio());
      assertThat(ks.get(i).index()).isEqualTo(i);
    }
  }

  @Test
  @DisplayName("Bad input: messages name the field, the index and the value")
  void badInput() {
    assertThatThrownBy(() -> Permeability.fromConsolidation(Double.NaN, 1e-7))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("cv (NaN m^2/s) must be finite and > 0");
    assertThatThrownBy(() -> Permeability.fromConsolidation(1e-8, -1e-7))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("mv (-1.0E-7 1/Pa) must be finite and > 0");
    assertThatThrownBy(() -> Permeability.fromConsolidation(1e-8, 1e-7, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("unit weight of water (0.0 N/m^3) must be finite and > 0");
    CompressionCurve c =
        CompressionCurve.of(1.0, new double[] {50e3, 20e3}, new double[] {0.95, 0.96});
    List<IncrementCompressibility> incs = Compressibility.increments(c, 60e3);
    assertThatThrownBy(() -> Permeability.perIncrement(incs, new double[] {1e-8}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("increments has 2 values but cv has 1: the lengths must match");
    assertThatThrownBy(() -> Permeability.perIncrement(incs, new double[] {1e-8, 0}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("cv at index 1 (0.0 m^2/s) must be finite and > 0");
  }
}
