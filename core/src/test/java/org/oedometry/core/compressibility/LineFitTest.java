package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LineFitTest {

  @Test
  @DisplayName("Slope, intercept and R^2 agree with Commons Math SimpleRegression")
  void againstSimpleRegression() {
    double[] x = {4.7, 5.0, 5.3, 5.6, 5.9, 6.2};
    double[] y = {1.02, 0.97, 0.88, 0.79, 0.66, 0.58};
    LineFit fit = LineFit.through(x, y, 0, x.length);
    SimpleRegression reg = new SimpleRegression();
    for (int i = 0; i < x.length; i++) {
      reg.addData(x[i], y[i]);
    }
    assertThat(fit.slope()).isCloseTo(reg.getSlope(), within(1e-13));
    assertThat(fit.intercept()).isCloseTo(reg.getIntercept(), within(1e-12));
    assertThat(fit.rSquared()).isCloseTo(reg.getRSquare(), within(1e-13));
    assertThat(fit.residualSumOfSquares(x, y, 0, x.length))
        .isCloseTo(reg.getSumSquaredErrors(), within(1e-15));
  }

  @Test
  @DisplayName("Two points: R^2 = 1; equal ordinates: R^2 = 1 (documented conventions)")
  void conventions() {
    assertThat(LineFit.through(new double[] {1, 2}, new double[] {3, 5}, 0, 2).rSquared())
        .isEqualTo(1.0);
    LineFit flat = LineFit.through(new double[] {1, 2, 3}, new double[] {4, 4, 4}, 0, 3);
    assertThat(flat.rSquared()).isEqualTo(1.0);
    assertThat(flat.slope()).isZero();
  }

  @Test
  @DisplayName("Bad input: messages name the field and the value")
  void badInput() {
    assertThatThrownBy(() -> new LineFit(Double.NaN, 0, 1, 2))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("slope (NaN) must be finite");
    assertThatThrownBy(() -> new LineFit(1, 0, 1.5, 2))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("R squared (1.5) must be in [0, 1]");
    assertThatThrownBy(() -> new LineFit(1, 0, 1, 1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("point count (1) must be >= 2");
    assertThatThrownBy(() -> LineFit.through(new double[] {2, 2}, new double[] {1, 3}, 0, 2))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("a straight-line fit needs distinct abscissae (all 2.0)");
  }

  @Test
  @DisplayName(
      "Regression: ordinates near 1e307, whose squares overflow, fit as the same points divided by"
          + " 1e306 do: y = (10, 6, 0) e306 at x = 0, 1, 2 gives slope -5e306, intercept 31/3 e306"
          + " and R^2 = 75/76 (exact rational arithmetic by hand), no longer R^2 = NaN; a slope"
          + " beyond the double range is named with the points' ranges")
  void ordinatesNearTheTopOfTheDoubleRange() {
    LineFit line = LineFit.through(new double[] {0, 1, 2}, new double[] {1e307, 6e306, 0}, 0, 3);
    assertThat(line.slope()).isCloseTo(-5e306, within(1e-14 * 5e306));
    assertThat(line.intercept()).isCloseTo(31.0 / 3 * 1e306, within(1e-14 * 1e307));
    assertThat(line.rSquared()).isCloseTo(75.0 / 76, within(1e-14));
    assertThatThrownBy(
            () -> LineFit.through(new double[] {0, 1e-10}, new double[] {0, 1e300}, 0, 2))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "the straight line through 2 points (x from 0.0 to 1.0E-10, y from 0.0 to 1.0E300) has"
                + " a slope or intercept beyond the double range");
  }
}
