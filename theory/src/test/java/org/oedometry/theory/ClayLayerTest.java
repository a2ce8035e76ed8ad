package org.oedometry.theory;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ClayLayerTest {

  private static final double YEAR = ClayLayer.SECONDS_PER_JULIAN_YEAR;

  @Test
  @DisplayName(
      "c_v = 0.32 m^2/yr, H_dr = 1 m: t50 = 0.61 yr, t90 = 2.65 yr"
          + " [published: a geotechnical handbook example, rounded; FACTS.md]")
  void handbookForecast() {
    ClayLayer layer = ClayLayer.of(2.0, Drainage.DOUBLE, 0.32 / YEAR, 0.1);
    assertThat(layer.drainagePath()).isEqualTo(1.0);
    assertThat(layer.timeToDegree(0.5) / YEAR).isCloseTo(0.61, within(0.005));
    assertThat(layer.timeToDegree(0.9) / YEAR).isCloseTo(2.65, within(0.005));
    ClayLayer single = ClayLayer.of(1.0, Drainage.SINGLE, 0.32 / YEAR, 0.1);
    assertThat(single.timeToDegree(0.9)).isEqualTo(layer.timeToDegree(0.9));
  }

  @Test
  @DisplayName("Settlement, degree and time are consistent: s(t(U)) = U s_ult")
  void roundTrip() {
    ClayLayer layer = ClayLayer.of(6.0, Drainage.SINGLE, 2.0 / YEAR, 0.35);
    for (double degree = 0.05; degree < 0.99; degree += 0.05) {
      double time = layer.timeToDegree(degree);
      assertThat(layer.degreeAt(time)).isCloseTo(degree, within(1e-14));
      assertThat(layer.settlementAt(time)).isCloseTo(0.35 * degree, within(1e-14));
      assertThat(layer.timeToSettlement(0.35 * degree) / time).isCloseTo(1.0, within(1e-12));
    }
    assertThat(layer.settlementAt(0)).isZero();
    // T = c_v t / H_dr^2 by hand: 2 m^2/yr over 10 years on a 6 m singly drained layer.
    assertThat(layer.timeFactorAt(10 * YEAR)).isCloseTo(2.0 * 10 / 36.0, within(1e-15));
  }

  @Test
  @DisplayName("toString reports c_v in m^2/yr and t50, t90 in years (JShell)")
  void readableSummary() {
    String text = ClayLayer.of(2.0, Drainage.DOUBLE, 0.32 / YEAR, 0.1).toString();
    assertThat(text)
        .contains("double drainage")
        .contains("0.3200 m^2/yr")
        .contains("t50 0.6148 yr")
        .contains("t90 2.650 yr");
  }

  @Test
  void rejectsBadLayers() {
    assertThatThrownBy(() -> ClayLayer.of(-1, Drainage.DOUBLE, 1e-8, 0.1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("thickness (-1.0 m) must be finite and > 0");
    assertThatThrownBy(() -> ClayLayer.of(1, Drainage.DOUBLE, Double.NaN, 0.1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("cv (NaN m^2/s) must be finite and > 0");
    assertThatThrownBy(() -> ClayLayer.of(1, Drainage.DOUBLE, 1e-8, -0.1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("ultimate settlement (-0.1 m) must be finite and >= 0");
    assertThatThrownBy(() -> ClayLayer.of(1, null, 1e-8, 0.1))
        .isInstanceOf(NullPointerException.class)
        .hasMessage("drainage");
  }

  @ParameterizedTest
  @ValueSource(doubles = {-1, Double.NaN})
  void rejectsBadTimes(double bad) {
    ClayLayer layer = ClayLayer.of(2.0, Drainage.DOUBLE, 1e-8, 0.1);
    assertThatThrownBy(() -> layer.settlementAt(bad))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("time since loading (" + bad + " s) must be >= 0");
  }

  @Test
  @DisplayName(
      "Extreme but legal layers: U(0) = 0 on a 1e-200 m layer (H_dr^2 underflows) and on the"
          + " thinnest, Double.MIN_VALUE m (H_dr stays > 0), U(+inf) = 1"
          + " on a 1e200 m layer (H_dr^2 overflows), and t50 = T50 H_dr^2 / c_v (Terzaghi's"
          + " closed form, evaluated here in BigDecimal) on the 1e200 m layer")
  void extremeLayers() {
    ClayLayer thin = ClayLayer.of(1e-200, Drainage.DOUBLE, 1e-8, 0.1);
    assertThat(thin.timeFactorAt(0)).isZero();
    assertThat(thin.degreeAt(0)).isZero();
    assertThat(thin.settlementAt(0)).isZero();
    // The thinnest legal layer, 2^-1074 m (Double.MIN_VALUE), double drainage: T = c_v t / H_dr^2
    // is 0 at t = 0 for any H_dr > 0 (Terzaghi's definition), so U(0) = 0. A drainage path of 0
    // (half of 2^-1074 rounded to even) made it 0 / 0 = NaN.
    ClayLayer thinnest = ClayLayer.of(Double.MIN_VALUE, Drainage.DOUBLE, 1e-8, 0.1);
    assertThat(thinnest.drainagePath()).isPositive();
    assertThat(thinnest.timeFactorAt(0)).isZero();
    assertThat(thinnest.degreeAt(0)).isZero();
    assertThat(thinnest.settlementAt(0)).isZero();
    ClayLayer thick = ClayLayer.of(1e200, Drainage.DOUBLE, 1e300, 0.1);
    assertThat(thick.degreeAt(Double.POSITIVE_INFINITY)).isEqualTo(1.0);
    java.math.BigDecimal path = new java.math.BigDecimal(thick.drainagePath());
    double t50 =
        new java.math.BigDecimal(Terzaghi.TIME_FACTOR_50)
            .multiply(path)
            .multiply(path)
            .divide(new java.math.BigDecimal(1e300), java.math.MathContext.DECIMAL128)
            .doubleValue();
    assertThat(thick.timeToDegree(0.5)).isCloseTo(t50, within(2 * Math.ulp(t50)));
    // U = 2 sqrt(T / pi) for small T (FACTS, short-time form), T = 1e300 * 1 s / (5e199 m)^2.
    assertThat(thick.degreeAt(1)).isCloseTo(2 * Math.sqrt(4e-100 / Math.PI), within(1e-63));
  }

  @Test
  @DisplayName(
      "A time beyond the double range is refused as documented (@throws), never returned as"
          + " infinity; toString says so without quoting infinity")
  void timeBeyondTheDoubleRange() {
    ClayLayer layer = ClayLayer.of(1e200, Drainage.DOUBLE, 1e-300, 0.1);
    assertThatThrownBy(() -> layer.timeToDegree(0.5))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "time to reach U = 0.5 exceeds the largest double (1.7976931348623157E308 s): cv"
                + " (1.0E-300 m^2/s) is too small for the drainage path (5.0E199 m)");
    assertThatThrownBy(() -> layer.timeToSettlement(0.05))
        .isInstanceOf(IllegalArgumentException.class);
    assertThat(layer.timeToDegree(0)).isZero();
    assertThat(layer.toString()).contains("t50 beyond 1.8e+308 yr").doesNotContain("Infinity");
  }

  @Test
  void rejectsUnreachableSettlement() {
    ClayLayer layer = ClayLayer.of(2.0, Drainage.DOUBLE, 1e-8, 0.1);
    assertThatThrownBy(() -> layer.timeToSettlement(0.1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("settlement (0.1 m) must be >= 0 and below the ultimate settlement (0.1 m)");
  }
}
