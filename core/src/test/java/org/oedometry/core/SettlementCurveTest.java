package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SettlementCurveTest {

  private static final double[] T = {0, 6, 15, 30, 60};
  private static final double[] S = {1e-5, 5e-5, 8e-5, 1.1e-4, 1.4e-4};

  @Test
  @DisplayName("arrays are copied in and out")
  void defensiveCopies() {
    double[] t = T.clone();
    double[] s = S.clone();
    SettlementCurve c = SettlementCurve.of(t, s);
    t[1] = 99;
    s[1] = 99;
    c.elapsedSeconds()[2] = 99;
    c.settlementMetres()[2] = 99;
    assertThat(c.elapsedSeconds()).containsExactly(T);
    assertThat(c.settlementMetres()).containsExactly(S);
    assertThat(c.elapsedSeconds(1)).isEqualTo(6);
    assertThat(c.settlementMetres(4)).isEqualTo(1.4e-4);
  }

  @Test
  @DisplayName("a reading at t = 0 is kept and reported as the zero reading")
  void zeroReading() {
    SettlementCurve c = SettlementCurve.of(T, S);
    assertThat(c.hasZeroReading()).isTrue();
    assertThat(c.zeroReading()).hasValue(1e-5);
    assertThat(c.firstTimedIndex()).isEqualTo(1);
    assertThat(c.size()).isEqualTo(5);
    SettlementCurve without = SettlementCurve.of(new double[] {6, 15}, new double[] {1e-5, 2e-5});
    assertThat(without.hasZeroReading()).isFalse();
    assertThat(without.zeroReading()).isEmpty();
    assertThat(without.firstTimedIndex()).isZero();
  }

  @Test
  @DisplayName("final, maximum and duration; swelling is negative")
  void summaries() {
    SettlementCurve swelling =
        SettlementCurve.of(new double[] {0, 60, 600}, new double[] {0, -2e-5, -1e-5});
    assertThat(swelling.finalSettlementMetres()).isEqualTo(-1e-5);
    assertThat(swelling.maximumSettlementMetres()).isEqualTo(0);
    assertThat(swelling.durationSeconds()).isEqualTo(600);
  }

  @Test
  @DisplayName("-0.0 s is read as 0.0 s so equal curves have equal bits")
  void negativeZeroTime() {
    SettlementCurve a = SettlementCurve.of(new double[] {-0.0, 1}, new double[] {0, 1e-5});
    SettlementCurve b = SettlementCurve.of(new double[] {0.0, 1}, new double[] {0, 1e-5});
    assertThat(a).isEqualTo(b).hasSameHashCodeAs(b);
    assertThat(a.hasZeroReading()).isTrue();
  }

  @Test
  @DisplayName("value semantics and a readable toString")
  void valueSemantics() {
    SettlementCurve a = SettlementCurve.of(T, S);
    SettlementCurve b = SettlementCurve.of(T.clone(), S.clone());
    assertThat(a).isEqualTo(b).hasSameHashCodeAs(b).isNotEqualTo(SettlementCurve.of(S, S));
    assertThat(a.toString())
        .isEqualTo(
            "SettlementCurve[5 readings, t 0.0..60.0 s, final settlement 1.4E-4 m,"
                + " zero reading kept]");
  }

  @Test
  @DisplayName("bad input: each message names the index and the values")
  void badInput() {
    assertThatThrownBy(() -> SettlementCurve.of(new double[] {0, 1}, new double[] {0}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("elapsed times (2 values) and settlements (1 values) differ in length");
    assertThatThrownBy(() -> SettlementCurve.of(new double[] {1}, new double[] {0}))
        .hasMessage("a settlement curve needs at least 2 readings, got 1");
    assertThatThrownBy(
            () -> SettlementCurve.of(new double[] {0, 60, 120, 120}, new double[] {0, 1, 2, 3}))
        .hasMessage("elapsed time at index 3 (120.0 s) is not after index 2 (120.0 s)");
    assertThatThrownBy(() -> SettlementCurve.of(new double[] {0, 60, 30}, new double[] {0, 1, 2}))
        .hasMessage("elapsed time at index 2 (30.0 s) is not after index 1 (60.0 s)");
    assertThatThrownBy(() -> SettlementCurve.of(new double[] {-1, 60}, new double[] {0, 1}))
        .hasMessage("elapsed time at index 0 (-1.0 s) must be >= 0");
    assertThatThrownBy(() -> SettlementCurve.of(new double[] {0, Double.NaN}, new double[] {0, 1}))
        .hasMessage("elapsed time at index 1 (NaN s) must be finite");
    assertThatThrownBy(() -> SettlementCurve.of(new double[] {0, 1}, new double[] {0, Double.NaN}))
        .hasMessage("settlement at index 1 (NaN m) must be finite");
    assertThatThrownBy(
            () ->
                SettlementCurve.of(new double[] {0, 1}, new double[] {Double.NEGATIVE_INFINITY, 0}))
        .hasMessage("settlement at index 0 (-Infinity m) must be finite");
    SettlementCurve c = SettlementCurve.of(T, S);
    assertThatThrownBy(() -> c.elapsedSeconds(5)).hasMessage("reading index 5 is outside 0..4");
    assertThatThrownBy(() -> SettlementCurve.of(null, S)).isInstanceOf(NullPointerException.class);
  }
}
