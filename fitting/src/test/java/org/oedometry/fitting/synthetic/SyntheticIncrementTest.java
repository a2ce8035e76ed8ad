package org.oedometry.fitting.synthetic;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SyntheticIncrementTest {

  @Test
  @DisplayName(
      "forward model: d = d_i + jump + dp U(T) with FACTS.md [exact] U(0.01) = 0.1128379167,"
          + " U(0.5) = 0.7639503307, U(1) = 0.931260")
  void terzaghi() {
    double h = 0.01;
    double cv = 1e-8;
    SyntheticIncrement m =
        new SyntheticIncrement(1e-3, 2e-5, 4e-4, cv, h, SyntheticIncrement.CreepShape.NONE, 0, 1);
    assertThat(m.settlementAt(0)).isEqualTo(1e-3);
    assertThat(m.settlementAt(m.timeAt(0.01)))
        .isCloseTo(1.02e-3 + 4e-4 * 0.1128379167, within(1e-13));
    assertThat(m.settlementAt(m.timeAt(0.5)))
        .isCloseTo(1.02e-3 + 4e-4 * 0.7639503307, within(1e-13));
    assertThat(m.settlementAt(m.timeAt(1))).isCloseTo(1.02e-3 + 4e-4 * 0.931260, within(1e-9));
    assertThat(m.timeAt(1)).isCloseTo(h * h / cv, within(1e-9));
  }

  @Test
  @DisplayName("creep terms by hand: kink s log10(t / t_k) after t_k; smooth s log10(1 + t / t_s)")
  void creep() {
    SyntheticIncrement kink =
        new SyntheticIncrement(
            0, 0, 1e-4, 1e-3, 1, SyntheticIncrement.CreepShape.AFTER_KINK, 2e-5, 1000);
    SyntheticIncrement plain = SyntheticIncrement.terzaghi(1e-4, 1e-3, 1);
    assertThat(kink.settlementAt(500)).isEqualTo(plain.settlementAt(500));
    assertThat(kink.settlementAt(10000) - plain.settlementAt(10000)).isCloseTo(2e-5, within(1e-18));
    SyntheticIncrement smooth =
        new SyntheticIncrement(
            0, 0, 1e-4, 1e-3, 1, SyntheticIncrement.CreepShape.SMOOTH, 2e-5, 1000);
    assertThat(smooth.settlementAt(9000) - plain.settlementAt(9000)).isCloseTo(2e-5, within(1e-18));
  }

  @Test
  void rejectsBadValues() {
    assertThatThrownBy(() -> SyntheticIncrement.terzaghi(0, 1, 1))
        .hasMessage("primary settlement (0.0 m) must not be 0");
    assertThatThrownBy(() -> SyntheticIncrement.terzaghi(1, Double.NaN, 1))
        .hasMessage("c_v (NaN) must be finite and > 0");
    assertThatThrownBy(() -> SyntheticIncrement.terzaghi(1, 1, 1).settlementAt(-1))
        .hasMessage("elapsed time (-1.0 s) must be finite and >= 0");
    assertThatThrownBy(() -> new SyntheticIncrement(0, 0, 1, 1, 1, null, 0, 1))
        .hasMessage("creep shape must not be null");
  }
}
