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
  void rejectsUnreachableSettlement() {
    ClayLayer layer = ClayLayer.of(2.0, Drainage.DOUBLE, 1e-8, 0.1);
    assertThatThrownBy(() -> layer.timeToSettlement(0.1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("settlement (0.1 m) must be >= 0 and below the ultimate settlement (0.1 m)");
  }
}
