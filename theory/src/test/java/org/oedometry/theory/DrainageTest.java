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

  @Test
  @DisplayName(
      "The smallest positive thickness still drains: H = 2^-1074 m (Double.MIN_VALUE) gives a"
          + " positive H_dr, where H / 2 = 2^-1075 lies halfway between 0 and 2^-1074 and IEEE 754"
          + " division (round half to even) gives 0")
  void smallestThicknessGivesPositivePath() {
    // IEEE 754 binary64: the smallest subnormal is 2^-1074 (Double.MIN_VALUE); the doubles nearest
    // 2^-1075 are 0 and 2^-1074. Division alone rounds to 0 (the even one):
    assertThat(Double.MIN_VALUE / 2).isZero();
    assertThat(Drainage.DOUBLE.drainagePath(Double.MIN_VALUE))
        .isEqualTo(Math.scalb(1.0, -1074))
        .isPositive();
    assertThat(Drainage.SINGLE.drainagePath(Double.MIN_VALUE)).isEqualTo(Math.scalb(1.0, -1074));
    // 2^-1073 / 2 = 2^-1074 exactly, and 3 * 2^-1074 / 2 = 1.5 * 2^-1074 rounds to even, 2^-1073
    // (IEEE 754): the exact halving is kept wherever the division does not give 0.
    assertThat(Drainage.DOUBLE.drainagePath(Math.scalb(1.0, -1073)))
        .isEqualTo(Math.scalb(1.0, -1074));
    assertThat(Drainage.DOUBLE.drainagePath(3 * Double.MIN_VALUE))
        .isEqualTo(Math.scalb(1.0, -1073));
  }

  @ParameterizedTest
  @ValueSource(doubles = {0, -0.02, Double.NaN, Double.POSITIVE_INFINITY})
  void rejectsBadThickness(double bad) {
    assertThatThrownBy(() -> Drainage.DOUBLE.drainagePath(bad))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("thickness (" + bad + " m) must be finite and > 0");
  }
}
