package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class ParabolaPairTest {

  @Test
  void validation() {
    ParabolaPair p = new ParabolaPair(60, 1e-4, 240, 1.5e-4, 0.5e-4);
    assertThat(p.d0()).isEqualTo(0.5e-4);
    assertThatThrownBy(() -> new ParabolaPair(0, 1e-4, 240, 1.5e-4, 0.5e-4))
        .hasMessage("parabola pair times (0.0 s, 240.0 s) must be finite, > 0 and increasing");
    assertThatThrownBy(() -> new ParabolaPair(60, Double.NaN, 240, 1.5e-4, 0.5e-4))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
