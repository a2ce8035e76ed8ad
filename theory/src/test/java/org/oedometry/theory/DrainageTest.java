package org.oedometry.theory;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class DrainageTest {

  @Test
  @DisplayName("H_dr = H/2 for double drainage, H for single [FACTS.md; any soil-mechanics text]")
  void drainagePath() {
    assertThat(Drainage.DOUBLE.drainagePath(0.02)).isEqualTo(0.01);
    assertThat(Drainage.SINGLE.drainagePath(0.02)).isEqualTo(0.02);
    assertThat(Drainage.DOUBLE.drainedFaces()).isEqualTo(2);
    assertThat(Drainage.SINGLE.drainedFaces()).isEqualTo(1);
  }

  @Test
  @DisplayName("A drainage mistake is a factor of 4 on the time factor [FACTS.md]")
  void drainageMistakeIsFactorFour() {
    double single = Drainage.SINGLE.drainagePath(0.019);
    double dual = Drainage.DOUBLE.drainagePath(0.019);
    assertThat((single * single) / (dual * dual)).isEqualTo(4.0);
  }

  @ParameterizedTest
  @ValueSource(doubles = {0, -0.02, Double.NaN, Double.POSITIVE_INFINITY})
  void rejectsBadThickness(double bad) {
    assertThatThrownBy(() -> Drainage.DOUBLE.drainagePath(bad))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("thickness (" + bad + " m) must be finite and > 0");
  }
}
