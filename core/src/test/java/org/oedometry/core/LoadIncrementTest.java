package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LoadIncrementTest {

  private static final SettlementCurve CURVE =
      SettlementCurve.of(new double[] {0, 60, 3600}, new double[] {0, 1e-4, 3e-4});

  @Test
  @DisplayName("direction is derived from the stresses")
  void direction() {
    assertThat(LoadIncrement.of(50e3, 100e3, CURVE).direction()).isEqualTo(LoadDirection.LOADING);
    assertThat(LoadIncrement.of(100e3, 25e3, CURVE).direction()).isEqualTo(LoadDirection.UNLOADING);
    assertThat(LoadIncrement.of(0, 6e3, CURVE).direction()).isEqualTo(LoadDirection.LOADING);
  }

  @Test
  @DisplayName("load-increment ratio: doubling the stress gives 1 (ASTM D2435 scope, published)")
  void loadIncrementRatio() {
    assertThat(LoadIncrement.of(50e3, 100e3, CURVE).loadIncrementRatio()).hasValue(1.0);
    assertThat(LoadIncrement.of(100e3, 25e3, CURVE).loadIncrementRatio()).hasValue(-0.75);
    assertThat(LoadIncrement.of(0, 6e3, CURVE).loadIncrementRatio()).isEmpty();
    assertThat(LoadIncrement.of(Double.MIN_VALUE, 6e3, CURVE).loadIncrementRatio()).isEmpty();
    assertThat(LoadIncrement.of(100e3, 25e3, CURVE).stressChangePascals()).isEqualTo(-75e3);
  }

  @Test
  @DisplayName("bad input: equal stresses, negative or non-finite stresses")
  void badInput() {
    assertThatThrownBy(() -> LoadIncrement.of(100e3, 100e3, CURVE))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "stress after (100000.0 Pa) equals the stress before (100000.0 Pa): an increment must"
                + " change the stress");
    assertThatThrownBy(() -> LoadIncrement.of(-1, 100e3, CURVE))
        .hasMessage("stress before (-1.0 Pa) must be finite and >= 0");
    assertThatThrownBy(() -> LoadIncrement.of(100e3, 0, CURVE))
        .hasMessage("stress after (0.0 Pa) must be finite and > 0");
    assertThatThrownBy(() -> LoadIncrement.of(Double.NaN, 1, CURVE))
        .hasMessage("stress before (NaN Pa) must be finite and >= 0");
    assertThatThrownBy(() -> LoadIncrement.of(0, 1, null)).isInstanceOf(NullPointerException.class);
  }

  @Test
  @DisplayName("value semantics and toString")
  void valueSemantics() {
    LoadIncrement a = LoadIncrement.of(50e3, 100e3, CURVE);
    LoadIncrement b =
        LoadIncrement.of(
            50e3,
            100e3,
            SettlementCurve.of(new double[] {0, 60, 3600}, new double[] {0, 1e-4, 3e-4}));
    assertThat(a).isEqualTo(b).hasSameHashCodeAs(b);
    assertThat(a.toString())
        .isEqualTo(
            "LoadIncrement[LOADING 50000.0 -> 100000.0 Pa, 3 readings, final settlement 3.0E-4"
                + " m]");
  }
}
