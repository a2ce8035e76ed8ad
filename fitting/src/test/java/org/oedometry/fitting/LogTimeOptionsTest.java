package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.oedometry.theory.Terzaghi;

class LogTimeOptionsTest {

  @Test
  void defaultsAndBuilder() {
    assertThat(LogTimeOptions.defaults().timeFactor50()).isEqualTo(Terzaghi.TIME_FACTOR_50);
    LogTimeOptions rounded = LogTimeOptions.builder().publishedRoundedTimeFactor().build();
    assertThat(rounded.timeFactor50()).isEqualTo(0.197);
    assertThat(rounded).isEqualTo(LogTimeOptions.builder().timeFactor50(0.197).build());
    assertThat(rounded.hashCode())
        .isEqualTo(LogTimeOptions.builder().timeFactor50(0.197).build().hashCode());
    assertThat(rounded).isNotEqualTo(LogTimeOptions.defaults());
    assertThat(rounded.toString()).isEqualTo("LogTimeOptions[timeFactor50=0.197]");
    assertThatThrownBy(() -> LogTimeOptions.builder().timeFactor50(Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("time factor at 50 % (NaN) must be > 0.1 and < 0.3");
  }
}
