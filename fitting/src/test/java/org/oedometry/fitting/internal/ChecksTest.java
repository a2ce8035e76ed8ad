package org.oedometry.fitting.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class ChecksTest {

  @Test
  void messagesNameFieldAndValue() {
    assertThat(Checks.requireDrainagePath(0.01)).isEqualTo(0.01);
    assertThatThrownBy(() -> Checks.requireDrainagePath(Double.NaN))
        .hasMessage("drainage path (NaN m) must be finite and > 0");
    assertThatThrownBy(() -> Checks.requireBetween("factor", 2.5, 1, 2))
        .hasMessage("factor (2.5) must be > 1.0 and < 2.0");
    assertThatThrownBy(() -> Checks.requireFinite("d0", Double.NEGATIVE_INFINITY, "m"))
        .hasMessage("d0 (-Infinity m) must be finite");
    assertThat(Checks.format("%.2f", 1.5)).isEqualTo("1.50");
  }

  @Test
  void countsAgreeWithTheirNoun() {
    // English agreement (from memory): singular after exactly one, plural after 0 and 2 or more.
    assertThat(Checks.count(1, "reading lies", "readings lie")).isEqualTo("1 reading lies");
    assertThat(Checks.count(0, "reading lies", "readings lie")).isEqualTo("0 readings lie");
    assertThat(Checks.count(2, "reading lies", "readings lie")).isEqualTo("2 readings lie");
    assertThat(Checks.count(11, "reading", "readings")).isEqualTo("11 readings");
  }
}
