package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class TestIdentifiersTest {

  @Test
  @DisplayName("labels are stripped; control characters are rejected with their index")
  void labels() {
    TestIdentifiers ids = TestIdentifiers.of(" Invented demo ", "BH-A", "S1", "4.50-4.95 m");
    assertThat(ids.project()).isEqualTo("Invented demo");
    assertThat(TestIdentifiers.none().sample()).isEmpty();
    assertThatThrownBy(() -> TestIdentifiers.of("a\nb", "", "", ""))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("project contains a control character (U+000A) at index 1");
    assertThatThrownBy(() -> TestIdentifiers.of("", null, "", ""))
        .isInstanceOf(NullPointerException.class)
        .hasMessage("borehole must not be null");
  }
}
