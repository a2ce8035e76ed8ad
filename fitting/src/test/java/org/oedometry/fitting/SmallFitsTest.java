package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SmallFitsTest {

  @Test
  @DisplayName("A polynomial of the fitted degree is reproduced exactly (least squares property)")
  void polynomialReproducesItsOwnDegree() {
    double[] u = new double[15];
    double[] y = new double[15];
    for (int i = 0; i < u.length; i++) {
      u[i] = -0.35 + 0.05 * i;
      y[i] = 2 - 3 * u[i] + 0.5 * u[i] * u[i] - 4 * u[i] * u[i] * u[i] + 7 * Math.pow(u[i], 4);
    }
    double[] c = SmallFits.polynomial(u, y, 4);
    double[] expected = {2, -3, 0.5, -4, 7};
    for (int k = 0; k < expected.length; k++) {
      assertThat(c[k]).isCloseTo(expected[k], within(1e-9));
    }
    assertThat(SmallFits.polynomial(new double[] {1, 1, 1}, new double[] {1, 2, 3}, 1)).isNull();
  }

  @Test
  @DisplayName(
      "Coefficient variance of a quintic fit: the same as Commons Math OLSMultipleLinearRegression"
          + " (estimateRegressionParametersVariance times the error variance) to 1e-8")
  void coefficientVarianceMatchesCommonsMath() {
    java.util.SplittableRandom random = new java.util.SplittableRandom(5);
    int n = 40;
    double[] u = new double[n];
    double[] y = new double[n];
    double[][] design = new double[n][5];
    for (int i = 0; i < n; i++) {
      u[i] = -1.1 + 2.3 * i / (n - 1);
      y[i] = Math.tanh(2 * u[i] - 0.3) + 0.01 * random.nextGaussian();
      for (int k = 1; k <= 5; k++) {
        design[i][k - 1] = Math.pow(u[i], k);
      }
    }
    double[] c = SmallFits.polynomial(u, y, 5);
    var reference = new org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression();
    reference.newSampleData(y, design);
    double[][] covariance = reference.estimateRegressionParametersVariance();
    double errorVariance = reference.estimateErrorVariance();
    double[] parameters = reference.estimateRegressionParameters();
    for (int k = 0; k <= 5; k++) {
      assertThat(c[k]).isCloseTo(parameters[k], within(1e-8 * (1 + Math.abs(parameters[k]))));
      double expected = covariance[k][k] * errorVariance;
      assertThat(SmallFits.coefficientVariance(u, y, c, k))
          .as("coefficient %d", k)
          .isCloseTo(expected, within(1e-8 * expected));
    }
    // No degree of freedom left: infinite.
    double[] six = java.util.Arrays.copyOf(u, 6);
    double[] sixY = java.util.Arrays.copyOf(y, 6);
    assertThat(SmallFits.coefficientVariance(six, sixY, SmallFits.polynomial(six, sixY, 5), 2))
        .isInfinite();
  }

  @Test
  @DisplayName(
      "Monotone cubic (Fritsch & Carlson 1980): through the knots, exact on a line, no overshoot"
          + " on step-like data")
  void monotoneCubic() {
    double[] x = {0, 1, 2, 3, 4, 5};
    double[] line = {1, 3, 5, 7, 9, 11};
    double[] at = {0, 0.3, 1.5, 2.25, 4.9, 5};
    double[] out = SmallFits.monotoneCubic(x, line, at);
    for (int j = 0; j < at.length; j++) {
      assertThat(out[j]).isCloseTo(1 + 2 * at[j], within(1e-12));
    }
    double[] step = {0, 0, 0, 1, 1, 1};
    double previous = Double.NEGATIVE_INFINITY;
    for (int j = 0; j <= 500; j++) {
      double v = SmallFits.monotoneCubic(x, step, new double[] {j / 100.0})[0];
      assertThat(v).isBetween(0.0, 1.0).isGreaterThanOrEqualTo(previous);
      previous = v;
    }
    assertThat(SmallFits.monotoneCubic(x, step, new double[] {3})[0]).isEqualTo(1.0);
  }

  @Test
  @DisplayName("Line: ordinary least squares slope and intercept of y = 2 + 0.5 x")
  void line() {
    double[] fit = SmallFits.line(new double[] {1, 2, 3, 4}, new double[] {2.5, 3, 3.5, 4});
    assertThat(fit[0]).isCloseTo(2, within(1e-14));
    assertThat(fit[1]).isCloseTo(0.5, within(1e-14));
    assertThat(SmallFits.line(new double[] {1, 1}, new double[] {2, 3})).isNull();
  }
}
