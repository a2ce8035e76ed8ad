package org.oedometry.theory;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class TerzaghiTest {

  private static final ReferenceTable AVERAGE_DEGREE = ReferenceTable.load("average_degree.csv");
  private static final ReferenceTable TIME_FACTOR = ReferenceTable.load("time_factor.csv");
  private static final ReferenceTable PORE_PRESSURE = ReferenceTable.load("pore_pressure.csv");

  // ---------------------------------------------------------------------------------------------
  // Published tables and values

  @ParameterizedTest(name = "U = {0}: T = {1}")
  @DisplayName(
      "Published U-T table, 3 decimals [published: ASTM D2435 / soil-mechanics texts;"
          + " the 10 %-step values from memory, 0.197 and 0.848 in every standard table]")
  @CsvSource({
    "0.1, 0.008",
    "0.2, 0.031",
    "0.3, 0.071",
    "0.4, 0.126",
    "0.5, 0.197",
    "0.6, 0.286",
    "0.7, 0.403",
    "0.8, 0.567",
    "0.9, 0.848"
  })
  void publishedTableToThreeDecimals(double degree, double published) {
    // Some texts print 0.287 at 60 %; the exact value 0.286399 rounds to 0.286 (FACTS.md).
    assertThat(Terzaghi.timeFactor(degree)).isCloseTo(published, within(0.0011));
  }

  @ParameterizedTest(name = "U = {0}: T = {1}")
  @DisplayName("Exact time factors [exact: FACTS.md, Terzaghi's series at high precision]")
  @CsvSource({
    "0.10, 0.0078540", "0.20, 0.0314159", "0.30, 0.0706858", "0.40, 0.1256731",
    "0.50, 0.1967307", "0.60, 0.286399", "0.70, 0.402850", "0.80, 0.567164",
    "0.90, 0.848085", "0.95, 1.129007", "0.99, 1.781288"
  })
  void exactTimeFactorsFromFacts(double degree, double expected) {
    // The table is printed to 7 significant digits or 6 decimals: half a unit in the last digit.
    double halfUnit = expected < 0.1 ? 5e-8 : 5e-7;
    assertThat(Terzaghi.timeFactor(degree)).isCloseTo(expected, within(halfUnit));
  }

  @ParameterizedTest(name = "U({0}) = {1}")
  @DisplayName("Forward values [exact: FACTS.md]")
  @CsvSource({
    "0.01, 0.1128379167, 5e-11",
    "0.1, 0.3568234005, 5e-11",
    "0.5, 0.7639503307, 5e-11",
    "1, 0.931260, 5e-7",
    "2, 0.994170, 5e-7"
  })
  void forwardValuesFromFacts(double timeFactor, double expected, double halfUnit) {
    assertThat(Terzaghi.averageDegree(timeFactor)).isCloseTo(expected, within(halfUnit));
  }

  @ParameterizedTest(name = "Z = {0}, T = {1}: u/u0 = {2}")
  @DisplayName("Mid-plane and quarter-depth pore pressure [exact: FACTS.md]")
  @CsvSource({"1, 0.2, 0.7723116", "1, 0.5, 0.3707774", "1, 1, 0.1079770", "0.5, 0.2, 0.5531759"})
  void porePressureFromFacts(double depth, double timeFactor, double expected) {
    assertThat(Terzaghi.porePressureRatio(depth, timeFactor)).isCloseTo(expected, within(5e-8));
  }

  @Test
  @DisplayName(
      "Named constants equal the inverse at 50 % and 90 %, and match the published"
          + " rounded values 0.197 and 0.848 [published: ASTM D2435]")
  void namedConstants() {
    assertThat(Terzaghi.TIME_FACTOR_50).isEqualTo(Terzaghi.timeFactor(0.5));
    assertThat(Terzaghi.TIME_FACTOR_90).isEqualTo(Terzaghi.timeFactor(0.9));
    assertThat(Terzaghi.TIME_FACTOR_50).isCloseTo(Terzaghi.ROUNDED_TIME_FACTOR_50, within(0.0005));
    assertThat(Terzaghi.TIME_FACTOR_90).isCloseTo(Terzaghi.ROUNDED_TIME_FACTOR_90, within(0.0005));
    // FACTS.md [exact]: using 0.197 instead of the exact T50 makes c_v 0.137 % high.
    assertThat(Terzaghi.ROUNDED_TIME_FACTOR_50 / Terzaghi.TIME_FACTOR_50 - 1)
        .isCloseTo(0.00137, within(0.000005));
  }

  // ---------------------------------------------------------------------------------------------
  // High-precision reference tables (mpmath, 50 digits; generator in the test resources)

  @Test
  @DisplayName("U(T): absolute error <= 5e-16 for T in [1e-12, 100] [reference: mpmath table]")
  void averageDegreeAgainstMpmath() {
    int t = AVERAGE_DEGREE.column("time_factor");
    int u = AVERAGE_DEGREE.column("average_degree");
    double worst = 0;
    for (BigDecimal[] row : AVERAGE_DEGREE.rows()) {
      double error =
          ReferenceTable.absoluteError(Terzaghi.averageDegree(row[t].doubleValue()), row[u]);
      worst = Math.max(worst, error);
    }
    assertThat(worst).as("largest absolute error of U").isLessThanOrEqualTo(5e-16);
  }

  @Test
  @DisplayName(
      "1 - U(T): relative error <= max(1e-14, 2.2e-16 pi^2 T/4) for T in [1e-12, 100] [reference:"
          + " mpmath]")
  void remainingFractionAgainstMpmath() {
    int t = AVERAGE_DEGREE.column("time_factor");
    int q = AVERAGE_DEGREE.column("complement");
    double worst = 0;
    for (BigDecimal[] row : AVERAGE_DEGREE.rows()) {
      double error =
          ReferenceTable.relativeError(Terzaghi.remainingFraction(row[t].doubleValue()), row[q]);
      worst = Math.max(worst, error / allowedTailError(row[t].doubleValue()));
    }
    assertThat(worst).as("largest relative error of 1 - U over its bound").isLessThanOrEqualTo(1);
  }

  @Test
  @DisplayName(
      "dU/dT: relative error <= max(1e-14, 2.2e-16 pi^2 T/4) for T in [1e-12, 100] [reference:"
          + " mpmath table]")
  void derivativeAgainstMpmath() {
    int t = AVERAGE_DEGREE.column("time_factor");
    int d = AVERAGE_DEGREE.column("derivative");
    double worst = 0;
    for (BigDecimal[] row : AVERAGE_DEGREE.rows()) {
      double error =
          ReferenceTable.relativeError(
              Terzaghi.averageDegreeDerivative(row[t].doubleValue()), row[d]);
      worst = Math.max(worst, error / allowedTailError(row[t].doubleValue()));
    }
    assertThat(worst).as("largest relative error of dU/dT over its bound").isLessThanOrEqualTo(1);
  }

  /**
   * Relative error allowed for 1 - U and dU/dT: 1e-14, or, for late times, one unit of double
   * rounding times the condition number &pi;<sup>2</sup>T/4 of exp(-&pi;<sup>2</sup>T/4) (the
   * rounding of the argument alone costs that much; numerical analysis, from memory).
   */
  private static double allowedTailError(double timeFactor) {
    return Math.max(1e-14, 2.2e-16 * Math.PI * Math.PI * timeFactor / 4);
  }

  @Test
  @DisplayName("T(U): relative error <= 4e-15 for U in [1e-8, 1 - 1e-12] [reference: mpmath]")
  void timeFactorAgainstMpmath() {
    int u = TIME_FACTOR.column("average_degree");
    int t = TIME_FACTOR.column("time_factor");
    double worst = 0;
    for (BigDecimal[] row : TIME_FACTOR.rows()) {
      double error =
          ReferenceTable.relativeError(Terzaghi.timeFactor(row[u].doubleValue()), row[t]);
      worst = Math.max(worst, error);
    }
    assertThat(worst).as("largest relative error of T(U)").isLessThanOrEqualTo(4e-15);
  }

  @Test
  @DisplayName("u/u0(Z, T): absolute error <= 1e-15 for T in [1e-6, 100] [reference: mpmath]")
  void porePressureAgainstMpmath() {
    int z = PORE_PRESSURE.column("depth_ratio");
    int t = PORE_PRESSURE.column("time_factor");
    int p = PORE_PRESSURE.column("pore_pressure_ratio");
    double worst = 0;
    for (BigDecimal[] row : PORE_PRESSURE.rows()) {
      double error =
          ReferenceTable.absoluteError(
              Terzaghi.porePressureRatio(row[z].doubleValue(), row[t].doubleValue()), row[p]);
      worst = Math.max(worst, error);
    }
    assertThat(worst).as("largest absolute error of u/u0").isLessThanOrEqualTo(1e-15);
  }

  // ---------------------------------------------------------------------------------------------
  // Asymptotes and limits

  @ParameterizedTest
  @DisplayName("Short times: U = 2 sqrt(T/pi) [image form, Carslaw & Jaeger 3.3]")
  @ValueSource(doubles = {1e-300, 1e-12, 1e-6, 1e-3, 0.01, 0.02})
  void shortTimeAsymptote(double timeFactor) {
    double expected = 2 * Math.sqrt(timeFactor / Math.PI);
    assertThat(Terzaghi.averageDegree(timeFactor)).isCloseTo(expected, within(1e-16 * 2));
  }

  @ParameterizedTest
  @DisplayName("Long times: 1 - U -> (8/pi^2) exp(-pi^2 T/4) [first term of the Fourier series]")
  @ValueSource(doubles = {2, 3, 5, 10, 20, 50})
  void longTimeAsymptote(double timeFactor) {
    double oneTerm = 8 / (Math.PI * Math.PI) * Math.exp(-Math.PI * Math.PI * timeFactor / 4);
    // The next term is (1/9) exp(-2 pi^2 T) relative: 3e-9 at T = 2.
    double nextTerm = Math.exp(-2 * Math.PI * Math.PI * timeFactor) / 9;
    assertThat(Terzaghi.remainingFraction(timeFactor) / oneTerm - 1)
        .isCloseTo(0.0, within(nextTerm * 1.01 + 1e-15));
  }

  @Test
  @DisplayName("Limits: U(0) = 0, U(inf) = 1, u/u0 = 1 inside at T = 0 and 0 on drained faces")
  void limits() {
    assertThat(Terzaghi.averageDegree(0)).isZero();
    assertThat(Terzaghi.averageDegree(Double.POSITIVE_INFINITY)).isEqualTo(1.0);
    assertThat(Terzaghi.remainingFraction(Double.POSITIVE_INFINITY)).isZero();
    assertThat(Terzaghi.averageDegreeDerivative(Double.POSITIVE_INFINITY)).isZero();
    assertThat(Terzaghi.timeFactor(0)).isZero();
    assertThat(Terzaghi.porePressureRatio(1, 0)).isEqualTo(1.0);
    assertThat(Terzaghi.porePressureRatio(0.3, 0)).isEqualTo(1.0);
    assertThat(Terzaghi.porePressureRatio(0, 0.3)).isZero();
    assertThat(Terzaghi.porePressureRatio(2, 0.3)).isZero();
    assertThat(Terzaghi.porePressureRatio(1, Double.POSITIVE_INFINITY)).isZero();
    // Inside the layer at a tiny time factor the pressure has not yet started to fall.
    assertThat(Terzaghi.porePressureRatio(0.5, 1e-6)).isEqualTo(1.0);
    // At very large T everything has drained and nothing underflows into NaN.
    assertThat(Terzaghi.averageDegree(1e6)).isEqualTo(Math.nextDown(1.0));
    assertThat(Terzaghi.porePressureRatio(1, 1e6)).isZero();
  }

  @Test
  @DisplayName("The two forms meet at the switch point T = 1/36 [image vs Fourier, mpmath-free]")
  void continuityAtTheSwitchPoint() {
    double below = Math.nextDown(Terzaghi.SHORT_TIME_LIMIT);
    double at = Terzaghi.SHORT_TIME_LIMIT;
    assertThat(Terzaghi.averageDegree(at) - Terzaghi.averageDegree(below)).isBetween(0.0, 1e-15);
    assertThat(Terzaghi.averageDegreeDerivative(below) / Terzaghi.averageDegreeDerivative(at))
        .isCloseTo(1.0, within(1e-14));
    assertThat(Terzaghi.porePressureRatio(0.2, below))
        .isCloseTo(Terzaghi.porePressureRatio(0.2, at), within(1e-14));
  }

  // ---------------------------------------------------------------------------------------------
  // Bad input

  @ParameterizedTest
  @ValueSource(doubles = {-1e-300, -1, Double.NEGATIVE_INFINITY, Double.NaN})
  void averageDegreeRejectsBadTimeFactor(double bad) {
    assertThatThrownBy(() -> Terzaghi.averageDegree(bad))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("time factor T (" + bad + ") must be >= 0");
    assertThatThrownBy(() -> Terzaghi.remainingFraction(bad))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("time factor T (" + bad + ")");
  }

  @ParameterizedTest
  @ValueSource(doubles = {0, -1, Double.NaN, Double.NEGATIVE_INFINITY})
  void derivativeRejectsNonPositiveTimeFactor(double bad) {
    assertThatThrownBy(() -> Terzaghi.averageDegreeDerivative(bad))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("time factor T (" + bad + ") must be > 0 for dU/dT (unbounded at T = 0)");
  }

  @ParameterizedTest
  @ValueSource(doubles = {1.0, 1.5, -0.1, Double.NaN, Double.POSITIVE_INFINITY})
  void timeFactorRejectsDegreeOutsideRange(double bad) {
    assertThatThrownBy(() -> Terzaghi.timeFactor(bad))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("average degree of consolidation U (" + bad + ") must be >= 0 and < 1");
  }

  @ParameterizedTest
  @ValueSource(doubles = {-0.1, 2.0000001, Double.NaN, Double.POSITIVE_INFINITY})
  void porePressureRejectsDepthOutsideLayer(double bad) {
    assertThatThrownBy(() -> Terzaghi.porePressureRatio(bad, 0.1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("depth ratio Z (" + bad + ") must be >= 0 and <= 2");
  }

  @Test
  void porePressureRejectsBadTimeFactor() {
    assertThatThrownBy(() -> Terzaghi.porePressureRatio(1, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("time factor T (NaN) must be >= 0");
  }

  @Test
  @DisplayName(
      "U and dU/dT together: U bit for bit, dU/dT to 1e-15 relative, for T in [1e-12, 100]")
  void degreeAndRateTogether() {
    double[] rate = new double[1];
    for (double e = -12; e <= Math.log10(20); e += 0.01) {
      double t = Math.pow(10, e);
      assertThat(Terzaghi.averageDegreeAndRate(t, rate)).isEqualTo(Terzaghi.averageDegree(t));
      assertThat(rate[0] / Terzaghi.averageDegreeDerivative(t) - 1).isCloseTo(0, within(1e-15));
    }
    assertThat(Terzaghi.averageDegreeAndRate(Double.POSITIVE_INFINITY, rate)).isEqualTo(1.0);
    assertThat(rate[0]).isZero();
    assertThatThrownBy(() -> Terzaghi.averageDegreeAndRate(0, rate))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  @DisplayName(
      "Shortcuts without an exponential give the bits of the full formulas: U = min(1 - (8/pi^2)"
          + " exp(-pi^2 T/4), largest double below 1) from T = 16, dU/dT = (1 - 2 exp(-1/T))"
          + " / sqrt(pi T) below T = 1/38.5 [the formulas of the class description, evaluated"
          + " here]")
  void shortcutsKeepTheBits() {
    double largestBelowOne = Math.nextDown(1.0);
    for (double t = 14; t < 1e6; t *= 1.0007) {
      double full =
          Math.min(
              1.0 - 8.0 / (Math.PI * Math.PI) * Math.exp(-Math.PI * Math.PI / 4.0 * t),
              largestBelowOne);
      if (t >= 16) {
        assertThat(Terzaghi.averageDegree(t)).as("U at T = %s", t).isEqualTo(full);
        assertThat(full).isEqualTo(largestBelowOne);
      } else {
        assertThat(Terzaghi.averageDegree(t)).isCloseTo(full, within(2e-16));
      }
    }
    double[] rate = new double[1];
    for (double t = 1e-6; t < Terzaghi.SHORT_TIME_LIMIT; t *= 1.0003) {
      double full = (1.0 - 2.0 * Math.exp(-1.0 / t)) / Math.sqrt(Math.PI * t);
      assertThat(Terzaghi.averageDegreeDerivative(t)).as("dU/dT at T = %s", t).isEqualTo(full);
      Terzaghi.averageDegreeAndRate(t, rate);
      assertThat(rate[0]).isEqualTo(full);
    }
  }
}
