package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class FitWarningTest {

  @Test
  void kindAndMessage() {
    FitWarning w = new FitWarning(FitWarning.Kind.FEW_EARLY_READINGS, "d0 rests on 1 pair");
    assertThat(w.is(FitWarning.Kind.FEW_EARLY_READINGS)).isTrue();
    assertThat(w.is(FitWarning.Kind.SWELLING_INCREMENT)).isFalse();
    assertThatThrownBy(() -> new FitWarning(null, "x")).hasMessage("warning kind must not be null");
    assertThatThrownBy(() -> new FitWarning(FitWarning.Kind.SHORT_SECONDARY_PART, " "))
        .hasMessageContaining("SHORT_SECONDARY_PART");
  }
}
