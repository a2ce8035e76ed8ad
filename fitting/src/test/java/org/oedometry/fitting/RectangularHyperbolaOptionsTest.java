package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class RectangularHyperbolaOptionsTest {

  @Test
  @DisplayName("Defaults: corrected zero from the early root-time line, sparse readings resampled")
  void defaults() {
    RectangularHyperbolaOptions options = RectangularHyperbolaOptions.defaults();
    assertThat(options.zero()).isEqualTo(RectangularHyperbolaOptions.Zero.EARLY_ROOT_TIME_LINE);
    assertThat(options.resampleSparseReadings()).isTrue();
  }

  @Test
  @DisplayName("with... methods change one option and keep the other; a null zero is refused")
  void copies() {
    RectangularHyperbolaOptions published =
        RectangularHyperbolaOptions.defaults()
            .withZero(RectangularHyperbolaOptions.Zero.START_OF_INCREMENT);
    assertThat(published.zero()).isEqualTo(RectangularHyperbolaOptions.Zero.START_OF_INCREMENT);
    assertThat(published.resampleSparseReadings()).isTrue();
    RectangularHyperbolaOptions strict = published.withResampleSparseReadings(false);
    assertThat(strict.zero()).isEqualTo(RectangularHyperbolaOptions.Zero.START_OF_INCREMENT);
    assertThat(strict.resampleSparseReadings()).isFalse();
    assertThatThrownBy(() -> RectangularHyperbolaOptions.defaults().withZero(null))
        .isInstanceOf(NullPointerException.class)
        .hasMessage("zero");
  }
}
