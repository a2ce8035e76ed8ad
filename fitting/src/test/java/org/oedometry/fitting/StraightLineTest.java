package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class StraightLineTest {

  @Test
  void endsAndValidation() {
    StraightLine l = new StraightLine(2, 1, 0, 3);
    assertThat(l.valueAt(1.5)).isEqualTo(4.0);
    assertThat(l.start()).isEqualTo(new PlotPoint(0, 1));
    assertThat(l.end()).isEqualTo(new PlotPoint(3, 7));
    assertThatThrownBy(() -> new StraightLine(Double.NaN, 1, 0, 3))
        .hasMessage("line slope (NaN ) must be finite");
    assertThatThrownBy(() -> new StraightLine(1, 1, 3, 0))
        .hasMessage("line end (0.0) must not be before line start (3.0)");
    assertThatThrownBy(() -> new PlotPoint(1, Double.POSITIVE_INFINITY))
        .hasMessage("point ordinate (Infinity m) must be finite");
  }

  @Test
  @DisplayName(
      "Regression: a line whose ordinate overflows at an end (slope 1e300 out to x = 1e10) is"
          + " refused when made, so start() and end() never throw on a line that exists")
  void endOrdinateBeyondTheDoubleRange() {
    assertThatThrownBy(() -> new StraightLine(1e300, 0, 0, 1e10))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("line ordinate at its end (Infinity m) must be finite");
    assertThatThrownBy(() -> new StraightLine(1e300, 0, -1e10, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("line ordinate at its start (-Infinity m) must be finite");
  }
}
