package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class JsonWriterTest {

  @Test
  @DisplayName(
      "Strings with quotes, backslashes, control characters, U+2028 and a lone surrogate read back"
          + " unchanged through an independent strict parser (RFC 8259 escapes)")
  void escapesEveryCharacterThatNeedsIt() {
    String nasty =
        "quote \" backslash \\ slash / newline \n return \r tab \t bell \u0007 nul \u0000"
            + " separator \u2028 emoji \uD83D\uDE00 lone \uD800 end";
    String text = new JsonWriter().beginObject().name("k\"ey").value(nasty).endObject().text();
    assertThat(text).doesNotContain("\u2028").doesNotContain("\u0007").doesNotContain("\u0000");
    assertThat(text).contains("\\u2028").contains("\\u0007").contains("\\ud800");
    assertThat(text).contains("\uD83D\uDE00");
    @SuppressWarnings("unchecked")
    Map<String, Object> back = (Map<String, Object>) MiniJson.parse(text);
    assertThat(back).containsEntry("k\"ey", nasty);
  }

  @Test
  @DisplayName("NaN, infinities and empty optionals are written as null, never as NaN or Infinity")
  void nonFiniteNumbersBecomeNull() {
    String text =
        new JsonWriter()
            .beginArray()
            .value(Double.NaN)
            .value(Double.POSITIVE_INFINITY)
            .value(Double.NEGATIVE_INFINITY)
            .value(OptionalDouble.empty())
            .value(1.0E-9)
            .value(-0.5)
            .value(42L)
            .value(true)
            .nullValue()
            .value((String) null)
            .endArray()
            .text();
    assertThat(text).doesNotContain("NaN").doesNotContain("Infinity");
    @SuppressWarnings("unchecked")
    List<Object> back = (List<Object>) MiniJson.parse(text);
    assertThat(back)
        .containsExactly(null, null, null, null, 1.0E-9, -0.5, 42.0, Boolean.TRUE, null, null);
  }

  @Test
  @DisplayName("Keys keep the order written; nested empty and filled containers parse back")
  void keepsKeyOrderAndNesting() {
    String text =
        new JsonWriter()
            .beginObject()
            .name("z")
            .value(1L)
            .name("a")
            .beginArray()
            .endArray()
            .name("m")
            .beginObject()
            .endObject()
            .name("b")
            .beginArray()
            .beginObject()
            .name("x")
            .value("y")
            .endObject()
            .endArray()
            .endObject()
            .text();
    @SuppressWarnings("unchecked")
    Map<String, Object> back = (Map<String, Object>) MiniJson.parse(text);
    assertThat(back.keySet()).containsExactly("z", "a", "m", "b");
    assertThat(back.get("b")).isEqualTo(List.of(Map.of("x", "y")));
    assertThat(back.get("a")).isEqualTo(List.of());
  }

  @Test
  @DisplayName("Misuse is caught: a value without a key, a key in an array, unbalanced ends")
  void rejectsMisuse() {
    assertThatThrownBy(() -> new JsonWriter().beginObject().value(1L))
        .isInstanceOf(IllegalStateException.class);
    assertThatThrownBy(() -> new JsonWriter().beginArray().name("k"))
        .isInstanceOf(IllegalStateException.class);
    assertThatThrownBy(() -> new JsonWriter().beginArray().endObject())
        .isInstanceOf(IllegalStateException.class);
    assertThatThrownBy(() -> new JsonWriter().beginObject().name("k").endObject())
        .isInstanceOf(IllegalStateException.class);
    assertThatThrownBy(() -> new JsonWriter().beginObject().text())
        .isInstanceOf(IllegalStateException.class);
    assertThatThrownBy(() -> new JsonWriter().value(1L).value(2L))
        .isInstanceOf(IllegalStateException.class);
  }
}
