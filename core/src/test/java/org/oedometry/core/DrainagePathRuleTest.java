package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.theory.Drainage;

class DrainagePathRuleTest {

  @Test
  @DisplayName("each rule picks its height; double drainage halves it (Terzaghi, FACTS.md)")
  void rules() {
    double start = 0.020;
    double half = 0.0196;
    double end = 0.0190;
    assertThat(DrainagePathRule.START_HEIGHT.drainagePath(Drainage.DOUBLE, start, half, end))
        .isEqualTo(0.010);
    assertThat(
            DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION.drainagePath(
                Drainage.DOUBLE, start, half, end))
        .isEqualTo(0.0098);
    assertThat(DrainagePathRule.MEAN_HEIGHT.drainagePath(Drainage.DOUBLE, start, half, end))
        .isEqualTo((0.020 + 0.019) / 4);
    assertThat(DrainagePathRule.MEAN_HEIGHT.drainagePath(Drainage.SINGLE, start, half, end))
        .isEqualTo((0.020 + 0.019) / 2);
    assertThat(DrainagePathRule.START_HEIGHT.drainagePath(Drainage.SINGLE, start, half, end))
        .isEqualTo(0.020);
  }

  @Test
  @DisplayName("single instead of double drainage is a factor of 4 on H_dr^2, hence on c_v")
  void factorOfFour() {
    for (DrainagePathRule rule : DrainagePathRule.values()) {
      double hDouble = rule.drainagePath(Drainage.DOUBLE, 0.02, 0.0195, 0.019);
      double hSingle = rule.drainagePath(Drainage.SINGLE, 0.02, 0.0195, 0.019);
      // c_v = T H_dr^2 / t (Terzaghi): same T and t, so c_v scales with H_dr^2.
      assertThat(hSingle * hSingle / (hDouble * hDouble)).as(rule.name()).isEqualTo(4.0);
    }
  }

  @Test
  @DisplayName("only the half-consolidation rule needs a fitted curve; bad heights are named")
  void badInput() {
    assertThat(DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION.needsFittedCurve()).isTrue();
    assertThat(DrainagePathRule.START_HEIGHT.needsFittedCurve()).isFalse();
    assertThat(DrainagePathRule.MEAN_HEIGHT.needsFittedCurve()).isFalse();
    assertThatThrownBy(
            () -> DrainagePathRule.START_HEIGHT.drainagePath(Drainage.DOUBLE, -0.02, 0.02, 0.019))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("height at start (-0.02 m) must be finite and > 0");
    assertThatThrownBy(
            () ->
                DrainagePathRule.MEAN_HEIGHT.drainagePath(Drainage.DOUBLE, 0.02, 0.02, Double.NaN))
        .hasMessage("height at end (NaN m) must be finite and > 0");
    assertThatThrownBy(() -> DrainagePathRule.MEAN_HEIGHT.drainagePath(null, 0.02, 0.02, 0.02))
        .isInstanceOf(NullPointerException.class);
  }

  @Test
  @DisplayName(
      "mean height of two heights whose sum exceeds the largest double (IEEE 754): still their"
          + " mean, (a + b) / 2, not an overflow")
  void meanOfVeryLargeHeights() {
    double start = 1.7e308;
    double end = 1.5e308;
    assertThat(DrainagePathRule.MEAN_HEIGHT.drainagePath(Drainage.SINGLE, start, start, end))
        .isEqualTo(1.6e308);
    assertThat(DrainagePathRule.MEAN_HEIGHT.drainagePath(Drainage.DOUBLE, start, start, end))
        .isEqualTo(0.8e308);
  }
}
