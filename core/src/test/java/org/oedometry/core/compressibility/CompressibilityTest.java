package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class CompressibilityTest {

  @Test
  @DisplayName(
      "Worked check [published: Venkatramaiah, Geotechnical Engineering, Example 7.1]:"
          + " a_v = 0.001 m^2/kN, m_v = 5.88e-4 m^2/kN")
  void venkatramaiahExample() {
    // e from 0.70 to 0.65 for 50 -> 100 kPa; e0 = 0.75 at zero seating is invented and not used
    // by increment 1.
    CompressionCurve c =
        CompressionCurve.of(0.75, new double[] {50e3, 100e3}, new double[] {0.70, 0.65});
    IncrementCompressibility inc = Compressibility.increments(c, 40e3).get(1);
    // 1/Pa * 1000 = m^2/kN.
    assertThat(inc.coefficientOfCompressibility() * 1000).isCloseTo(0.001, withinPercentage(1e-9));
    assertThat(inc.mv() * 1000).isCloseTo(5.88e-4, withinPercentage(0.1));
    assertThat(inc.compressionSlope().getAsDouble()).isCloseTo(0.166, within(0.0005));
    // E_oed = 1 / m_v (FACTS): 1 / 5.88e-4 m^2/kN = 1700 kPa.
    assertThat(inc.oedometerModulus().getAsDouble()).isCloseTo(1.7e6, withinPercentage(0.1));
  }

  @Test
  @DisplayName("A swelling response on loading gives m_v < 0 and no oedometer modulus, no error")
  void negativeMv() {
    CompressionCurve c =
        CompressionCurve.of(0.75, new double[] {50e3, 100e3}, new double[] {0.70, 0.71});
    IncrementCompressibility inc = Compressibility.increments(c, 40e3).get(1);
    assertThat(inc.mv()).isNegative();
    assertThat(inc.oedometerModulus()).isEmpty();
  }

  @Test
  @DisplayName(
      "m_v in SI equals FACTS' lab form m_v [m^2/MN] = 1000 (e1 - e2) / ((1 + e1)(s2 - s1) [kPa])")
  void mvAgainstLabUnitFormula() {
    double[] s = {25e3, 50e3, 100e3, 200e3};
    double[] e = {0.95, 0.93, 0.88, 0.80};
    List<IncrementCompressibility> incs =
        Compressibility.increments(CompressionCurve.of(0.97, s, e), 60e3);
    for (int j = 1; j < s.length; j++) {
      double labMv = 1000 * (e[j - 1] - e[j]) / ((1 + e[j - 1]) * (s[j] / 1000 - s[j - 1] / 1000));
      // m^2/MN -> 1/Pa: divide by 1e6.
      assertThat(incs.get(j).mv()).isCloseTo(labMv / 1e6, withinPercentage(1e-9));
    }
  }

  @Test
  @DisplayName("Mid-increment stresses: log mean sqrt(s1 s2) and arithmetic mean (FACTS)")
  void midIncrementStresses() {
    CompressionCurve c =
        CompressionCurve.of(0.75, new double[] {50e3, 100e3}, new double[] {0.70, 0.65});
    List<IncrementCompressibility> incs = Compressibility.increments(c, 40e3);
    assertThat(incs.get(0).logMeanStress()).isEmpty();
    assertThat(incs.get(0).compressionSlope()).isEmpty();
    assertThat(incs.get(0).arithmeticMeanStress()).isEqualTo(25e3);
    // Hand arithmetic: sqrt(50 * 100) kPa = 70.7107 kPa.
    assertThat(incs.get(1).logMeanStress().getAsDouble()).isCloseTo(70710.678, within(1e-3));
    assertThat(incs.get(1).arithmeticMeanStress()).isEqualTo(75e3);
    assertThat(incs.get(1).endAxialStrain()).isCloseTo((0.75 - 0.65) / 1.75, within(1e-15));
    assertThat(incs.get(1).meanVoidRatio()).isCloseTo(0.675, within(1e-15));
  }

  @Test
  @DisplayName("Increment classes relative to the preconsolidation pressure and the test history")
  void classes() {
    // Invented load path (kPa): 25, 50, 100, 200, 400, 100 (unload), 200, 400 (reload), 800.
    double[] s = {25e3, 50e3, 100e3, 200e3, 400e3, 100e3, 200e3, 400e3, 800e3};
    double[] e = {0.98, 0.97, 0.95, 0.85, 0.75, 0.78, 0.77, 0.745, 0.66};
    List<IncrementClass> classes =
        Compressibility.increments(CompressionCurve.of(1.0, s, e), 75e3).stream()
            .map(IncrementCompressibility::stressHistory)
            .toList();
    assertThat(classes)
        .containsExactly(
            IncrementClass.RECOMPRESSION,
            IncrementClass.RECOMPRESSION,
            IncrementClass.CROSSES_PRECONSOLIDATION,
            IncrementClass.NORMALLY_CONSOLIDATED,
            IncrementClass.NORMALLY_CONSOLIDATED,
            IncrementClass.UNLOADING,
            IncrementClass.RELOADING,
            IncrementClass.RELOADING,
            IncrementClass.NORMALLY_CONSOLIDATED);
  }

  @Test
  @DisplayName("Bad input: messages name the field and the value")
  void badInput() {
    CompressionCurve c = CompressionCurve.of(0.75, new double[] {50e3}, new double[] {0.70});
    assertThatThrownBy(() -> Compressibility.increments(c, -1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("preconsolidation pressure (-1.0 Pa) must be finite and > 0");
    assertThatThrownBy(() -> Compressibility.increments(c, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("preconsolidation pressure (NaN Pa) must be finite and > 0");
    assertThatThrownBy(() -> Compressibility.increments(null, 1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("compression curve must not be null");
  }

  @Test
  @DisplayName(
      "Regression: stresses one ulp apart (1e5 Pa and the next double) give a finite e-log"
          + " slope, -de / log10(1 + x) = -de ln 10 / x to first order in x = ulp / stress [series"
          + " of log10(1 + x)], no longer infinity")
  void slopeOfStressesOneUlpApart() {
    double s1 = 1e5;
    double s2 = Math.nextUp(s1);
    CompressionCurve c = CompressionCurve.of(1.0, new double[] {s1, s2}, new double[] {0.9, 0.8});
    double x = (s2 - s1) / s1;
    assertThat(Compressibility.increments(c, s1).get(1).compressionSlope().getAsDouble())
        .isCloseTo(0.1 * Math.log(10) / x, withinPercentage(1e-10));
  }

  @Test
  @DisplayName(
      "Regression: a_v beyond the double range (e 0.9 to 0.8 over 1e-300 Pa and the next double):"
          + " an IllegalArgumentException naming the increment and its numbers, not 'Infinity'")
  void coefficientOfCompressibilityBeyondTheDoubleRange() {
    double s1 = 1e-300;
    CompressionCurve c =
        CompressionCurve.of(1.0, new double[] {s1, Math.nextUp(s1)}, new double[] {0.9, 0.8});
    assertThatThrownBy(() -> Compressibility.increments(c, s1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "increment at index 1: the coefficient of compressibility from void ratio 0.9 to 0.8"
                + " over stress 1.0E-300 Pa to 1.0000000000000002E-300 Pa is beyond the double"
                + " range");
  }

  @Test
  @DisplayName(
      "Regression: stresses near the top of the double range (1.6e308 and 1.7e308 Pa): the"
          + " arithmetic mean is their mean, 1.65e308 Pa, not an overflow of their sum")
  void arithmeticMeanOfHugeStresses() {
    CompressionCurve c =
        CompressionCurve.of(1.0, new double[] {1.6e308, 1.7e308}, new double[] {0.9, 0.8});
    assertThat(Compressibility.increments(c, 1.6e308).get(1).arithmeticMeanStress())
        .isCloseTo(1.65e308, withinPercentage(1e-12));
  }
}
