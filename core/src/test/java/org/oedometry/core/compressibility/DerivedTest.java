package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class DerivedTest {

  @Test
  @DisplayName("Exactly one of value and reason")
  void valueOrReason() {
    assertThat(Derived.of(1.5).value()).contains(1.5);
    assertThat(Derived.of(1.5).absenceReason()).isEmpty();
    assertThat(Derived.absent("why").isPresent()).isFalse();
    assertThatThrownBy(() -> new Derived<>(Optional.of(1), "why"))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "a derived quantity needs either a value or a non-empty absence reason, not both");
    assertThatThrownBy(() -> Derived.absent(""))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("absence reason must not be empty");
  }
}
