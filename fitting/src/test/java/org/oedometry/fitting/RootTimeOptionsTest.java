package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.theory.Terzaghi;

class RootTimeOptionsTest {

  @Test
  @DisplayName(
      "exact factor sqrt(T90) / (0.9 sqrt(pi) / 2) = 1.154602 (FACTS.md [exact]: sqrt(0.848085 /"
          + " 0.63617))")
  void exactFactor() {
    assertThat(RootTimeOptions.EXACT_FACTOR).isCloseTo(1.154602, within(5e-7));
    assertThat(RootTimeOptions.EXACT_FACTOR).isCloseTo(Math.sqrt(0.848085 / 0.63617), within(5e-6));
    // FACTS.md prints 0.63617, rounded from 0.81 pi / 4 = 0.6361725.
    assertThat(RootTimeOptions.EXACT_FACTOR)
        .isCloseTo(Math.sqrt(0.848085 / (0.81 * Math.PI / 4)), within(5e-7));
  }

  @Test
  void defaultsAndBuilder() {
    RootTimeOptions d = RootTimeOptions.defaults();
    assertThat(d.factor()).isEqualTo(1.15);
    assertThat(d.timeFactor90()).isEqualTo(Terzaghi.TIME_FACTOR_90);
    RootTimeOptions b =
        RootTimeOptions.builder().exactFactor().publishedRoundedTimeFactor().build();
    assertThat(b.factor()).isEqualTo(RootTimeOptions.EXACT_FACTOR);
    assertThat(b.timeFactor90()).isEqualTo(0.848);
    assertThat(b)
        .isEqualTo(
            RootTimeOptions.builder()
                .factor(RootTimeOptions.EXACT_FACTOR)
                .timeFactor90(0.848)
                .build());
    assertThat(b.hashCode()).isNotEqualTo(d.hashCode());
    assertThat(d.toString()).startsWith("RootTimeOptions[factor=1.15, timeFactor90=0.848");
    assertThatThrownBy(() -> RootTimeOptions.builder().factor(1.0))
        .hasMessage("root-time abscissa factor (1.0) must be > 1.0 and < 2.0");
    assertThatThrownBy(() -> RootTimeOptions.builder().timeFactor90(Double.NaN))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
