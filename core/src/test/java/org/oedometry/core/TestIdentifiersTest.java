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

  @Test
  @DisplayName(
      "characters that break a line (U+2028, U+2029: mandatory breaks, Unicode UAX #14), reorder"
          + " it (Bidi_Control, UAX #9) or cannot be encoded (unpaired surrogates, Unicode ch. 3)"
          + " are rejected; other scripts, emoji and joiners are kept (all from memory)")
  void labelsStayOnOneLineInTheirOwnOrder() {
    assertThatThrownBy(() -> TestIdentifiers.of("BH\u2028A", "", "", ""))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("project contains a line or paragraph separator (U+2028) at index 2");
    assertThatThrownBy(() -> TestIdentifiers.of("", "", "", "4.5 m\u2029"))
        .hasMessage("depth contains a line or paragraph separator (U+2029) at index 5");
    assertThatThrownBy(() -> TestIdentifiers.of("", "", "S\u202E1", ""))
        .hasMessage("sample contains a bidirectional formatting control (U+202E) at index 1");
    for (char bidi : new char[] {0x061C, 0x200E, 0x200F, 0x202A, 0x202D, 0x2066, 0x2069}) {
      assertThatThrownBy(() -> TestIdentifiers.of("", "a" + bidi, "", ""))
          .as("U+%04X", (int) bidi)
          .hasMessageContaining("bidirectional formatting control")
          .hasMessageEndingWith("at index 1");
    }
    assertThatThrownBy(() -> TestIdentifiers.of("", "", "U4\uD800", ""))
        .hasMessage("sample contains an unpaired surrogate (U+D800) at index 2");
    assertThatThrownBy(() -> TestIdentifiers.of("\uDC00x", "", "", ""))
        .hasMessage("project contains an unpaired surrogate (U+DC00) at index 0");
    assertThatThrownBy(() -> TestIdentifiers.of("\uD83D\uD83D\uDE00", "", "", ""))
        .hasMessage("project contains an unpaired surrogate (U+D83D) at index 0");
    // Kept: a well-formed pair (U+1F600), the zero-width joiner and non-joiner (needed by some
    // scripts), a no-break space inside, Arabic and Greek letters (their order is the reader's).
    TestIdentifiers kept =
        TestIdentifiers.of(
            "Invented \uD83D\uDE00", "\u0628\u0626\u0631 1", "S\u200D1\u200C", "4\u00A0m \u03B4");
    assertThat(kept.project()).isEqualTo("Invented \uD83D\uDE00");
    assertThat(kept.borehole()).isEqualTo("\u0628\u0626\u0631 1");
    assertThat(kept.sample()).isEqualTo("S\u200D1\u200C");
    assertThat(kept.depth()).isEqualTo("4\u00A0m \u03B4");
  }
}
