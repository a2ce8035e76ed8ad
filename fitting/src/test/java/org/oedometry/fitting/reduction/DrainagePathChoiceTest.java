package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.DrainagePathRule;

class DrainagePathChoiceTest {

  @Test
  @DisplayName("A choice keeps its values; a bad path, height or explanation is refused by name")
  void validates() {
    DrainagePathChoice c =
        new DrainagePathChoice(DrainagePathRule.START_HEIGHT, 0.01, 0.02, false, "half of 20 mm");
    assertThat(c.drainagePathMetres()).isEqualTo(0.01);
    assertThatThrownBy(
            () ->
                new DrainagePathChoice(DrainagePathRule.START_HEIGHT, Double.NaN, 0.02, false, "x"))
        .hasMessageContaining("drainage path (NaN m)");
    assertThatThrownBy(
            () -> new DrainagePathChoice(DrainagePathRule.START_HEIGHT, 0.01, -1, false, "x"))
        .hasMessageContaining("height (-1.0 m)");
    assertThatThrownBy(
            () -> new DrainagePathChoice(DrainagePathRule.START_HEIGHT, 0.01, 0.02, false, " "))
        .hasMessageContaining("explanation");
  }
}
