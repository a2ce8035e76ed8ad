package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ConstructionLineTest {

  @Test
  @DisplayName("A segment along a line has its ends on the line, y = a + b x (the line's equation)")
  void endsOnTheLine() {
    LineFit line = new LineFit(-0.3, 2.1, 0.99, 4);
    ConstructionLine segment = ConstructionLine.along("virgin line", line, 4.0, 6.0);
    assertThat(segment.y1()).isEqualTo(2.1 + -0.3 * 4.0);
    assertThat(segment.y2()).isEqualTo(2.1 + -0.3 * 6.0);
    assertThat(segment.label()).isEqualTo("virgin line");
  }

  @Test
  @DisplayName(
      "Regression: an end ordinate beyond the double range (void ratios near 1e308) is refused"
          + " naming the line, its slope and intercept, not as 'y1 of virgin line (Infinity)'")
  void ordinateBeyondTheDoubleRange() {
    LineFit line = new LineFit(-1e307, 1.5e308, 0.9, 5);
    assertThatThrownBy(() -> ConstructionLine.along("virgin line", line, -10.0, 8.0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("the virgin line (slope -1.0E307, intercept 1.5E308) at abscissa")
        .hasMessageEndingWith("is beyond the double range")
        .hasMessageNotContaining("Infinity");
  }
}
