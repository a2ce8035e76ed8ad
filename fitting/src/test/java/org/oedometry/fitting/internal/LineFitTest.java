package org.oedometry.fitting.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LineFitTest {

  @Test
  @DisplayName(
      "least squares by hand: (0, 0), (1, 1), (2, 3) gives slope 1.5, intercept -1/6, residuals"
          + " 1/6, -1/3, 1/6")
  void byHand() {
    LineFit f = LineFit.of(new double[] {9, 0, 1, 2}, new double[] {9, 0, 1, 3}, 1, 4);
    assertThat(f.slope()).isCloseTo(1.5, within(1e-15));
    assertThat(f.intercept()).isCloseTo(-1.0 / 6, within(1e-15));
    assertThat(f.count()).isEqualTo(3);
    assertThat(f.rootMeanSquare())
        .isCloseTo(Math.sqrt((1.0 / 36 + 1.0 / 9 + 1.0 / 36) / 3), within(1e-15));
    assertThat(f.valueAt(2)).isCloseTo(2.8333333333333335, within(1e-15));
  }

  @Test
  @DisplayName("far from the origin the fit keeps its accuracy (centred sums); one point is flat")
  void conditioning() {
    double[] x = {1e8, 1e8 + 1, 1e8 + 2};
    double[] y = {5, 7, 9};
    LineFit f = LineFit.of(x, y, 0, 3);
    assertThat(f.slope()).isCloseTo(2, within(1e-9));
    assertThat(f.valueAt(1e8 + 1)).isCloseTo(7, within(1e-9));
    LineFit one = LineFit.of(x, y, 1, 2);
    assertThat(one.slope()).isZero();
    assertThat(one.valueAt(0)).isEqualTo(7);
  }
}
