package org.oedometry.fitting.synthetic;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ReadingSchedulesTest {

  @Test
  @DisplayName("usual schedule: 0.1 min ... 24 h, 14 readings (FACTS.md, common practice)")
  void usual() {
    double[] t = ReadingSchedules.usualLab();
    assertThat(t).hasSize(14);
    assertThat(t[0]).isEqualTo(6.0);
    assertThat(t[13]).isEqualTo(86400.0);
    t[0] = 1;
    assertThat(ReadingSchedules.usualLab()[0]).isEqualTo(6.0);
  }

  @Test
  void logAndUniform() {
    double[] log = ReadingSchedules.logSpaced(10, 1000, 10);
    assertThat(log).hasSize(21);
    assertThat(log[10]).isCloseTo(100, within(1e-9));
    assertThat(log[20]).isEqualTo(1000.0);
    assertThat(ReadingSchedules.logSpaced(1, 5, 1)).containsExactly(1, 5);
    double[] uniform = ReadingSchedules.uniform(10, 86400);
    assertThat(uniform).hasSize(8640);
    assertThat(uniform[8639]).isEqualTo(86400.0);
    assertThat(ReadingSchedules.scaled(new double[] {1, 2}, 3)).containsExactly(3, 6);
    assertThat(ReadingSchedules.withZeroReading(new double[] {1, 2})).containsExactly(0, 1, 2);
  }

  @Test
  void missingReadings() {
    double[] t = ReadingSchedules.usualLab();
    double[] sparse = ReadingSchedules.withMissingReadings(t, 3, 7);
    assertThat(sparse).hasSize(11);
    assertThat(sparse[0]).isEqualTo(t[0]);
    assertThat(sparse[1]).isEqualTo(t[1]);
    assertThat(sparse[10]).isEqualTo(t[13]);
    assertThat(ReadingSchedules.withMissingReadings(t, 3, 7)).containsExactly(sparse);
    assertThatThrownBy(() -> ReadingSchedules.withMissingReadings(t, 11, 1))
        .hasMessage("cannot drop 11 of 14 readings (the first two and last two stay)");
    assertThatThrownBy(() -> ReadingSchedules.uniform(0, 1))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> ReadingSchedules.logSpaced(1, 1, 1))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> ReadingSchedules.scaled(t, Double.NaN))
        .hasMessage("time scale factor (NaN) must be finite and > 0");
  }
}
