package org.oedometry.fitting.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.theory.Terzaghi;

class MonotoneCubicTest {

  @Test
  @DisplayName("passes through the knots and reproduces a straight line exactly")
  void knotsAndLines() {
    double[] x = {0, 0.5, 2, 2.1, 5};
    double[] y = new double[x.length];
    for (int i = 0; i < x.length; i++) {
      y[i] = 3 - 2 * x[i];
    }
    MonotoneCubic c = MonotoneCubic.of(x, y);
    for (int i = 0; i < x.length; i++) {
      assertThat(c.value(x[i])).isEqualTo(y[i]);
    }
    for (double at = 0; at <= 5; at += 0.013) {
      assertThat(c.value(at)).isCloseTo(3 - 2 * at, within(1e-14));
    }
    assertThat(c.value(-1)).isEqualTo(3.0);
    assertThat(c.value(9)).isEqualTo(-7.0);
  }

  @Test
  @DisplayName(
      "monotone data give a monotone interpolant with no overshoot (Fritsch and Carlson 1980)")
  void monotone() {
    double[] x = {0, 1, 2, 3, 4, 5, 6};
    double[] y = {0, 0, 0.1, 5, 5.05, 5.05, 9};
    MonotoneCubic c = MonotoneCubic.of(x, y);
    double previous = Double.NEGATIVE_INFINITY;
    for (double at = 0; at <= 6; at += 0.001) {
      double v = c.value(at);
      // Monotone up to rounding (a few ulps in the flat stretch).
      assertThat(v).isGreaterThanOrEqualTo(previous - 1e-14);
      previous = v;
    }
    assertThat(c.value(0.5)).isEqualTo(0.0);
    assertThat(c.value(4.5)).isBetween(5.05, 5.05);
  }

  @Test
  @DisplayName(
      "on the exact consolidation curve at the 14 usual lab times (T at 24 h = 2 ... 20), error"
          + " at U = 90 % below 0.4 % of primary in sqrt time (independent: Terzaghi.averageDegree)")
  void accuracyOnConsolidationCurve() {
    double[] minutes = {0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440};
    for (double lastT : new double[] {2, 2.5, 3, 4, 5, 7, 10, 15, 20}) {
      double[] x = new double[minutes.length];
      double[] u = new double[minutes.length];
      for (int i = 0; i < x.length; i++) {
        double t = lastT * minutes[i] / 1440;
        x[i] = Math.sqrt(t);
        u[i] = Terzaghi.averageDegree(t);
      }
      MonotoneCubic c = MonotoneCubic.of(x, u);
      assertThat(c.value(Math.sqrt(Terzaghi.TIME_FACTOR_90))).isCloseTo(0.9, within(0.004));
    }
  }

  @Test
  @DisplayName("firstReaching inverts the interpolant of non-decreasing data")
  void inverse() {
    double[] x = {1, 2, 3, 4};
    double[] y = {0, 1, 1, 4};
    MonotoneCubic c = MonotoneCubic.of(x, y);
    for (double level : new double[] {0, 0.25, 0.9, 1, 2.5, 4}) {
      double at = c.firstReaching(level);
      assertThat(c.value(at)).isCloseTo(level, within(1e-12));
    }
    assertThat(c.firstReaching(1)).isCloseTo(2, within(1e-12));
    assertThat(c.firstReaching(-1)).isNaN();
    assertThat(c.firstReaching(5)).isNaN();
    assertThat(c.interval(3.5)).isEqualTo(2);
    assertThat(c.interval(4)).isEqualTo(2);
    assertThat(c.lowest()).isEqualTo(1);
    assertThat(c.highest()).isEqualTo(4);
  }

  @Test
  @DisplayName("two knots: the straight line; bad knots rejected with index and values")
  void edges() {
    MonotoneCubic two = MonotoneCubic.of(new double[] {0, 2}, new double[] {1, 5});
    assertThat(two.value(0.5)).isCloseTo(2, within(1e-15));
    assertThatThrownBy(() -> MonotoneCubic.of(new double[] {0}, new double[] {0}))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> MonotoneCubic.of(new double[] {0, 1, 1}, new double[] {0, 1, 2}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("knot abscissa at index 2 (1.0) is not after index 1 (1.0)");
    assertThatThrownBy(() -> MonotoneCubic.of(new double[] {0, 1}, new double[] {0, Double.NaN}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("knot at index 1 (1.0, NaN) must be finite");
  }

  @Test
  @DisplayName(
      "valuesInInterval gives the bits of valueInInterval point by point (the same expression in"
          + " the same order; IEEE 754 rounding is deterministic)")
  void valuesInIntervalSameBits() {
    java.util.SplittableRandom random = new java.util.SplittableRandom(7);
    double[] x = new double[30];
    double[] y = new double[30];
    for (int i = 1; i < x.length; i++) {
      x[i] = x[i - 1] + 0.01 + random.nextDouble();
      y[i] = y[i - 1] + random.nextDouble() * (random.nextBoolean() ? 1 : 1e-9);
    }
    MonotoneCubic cubic = MonotoneCubic.of(x, y);
    for (int i = 0; i < x.length - 1; i++) {
      double[] at = new double[12];
      for (int k = 0; k < at.length; k++) {
        at[k] = x[i] + (x[i + 1] - x[i]) * random.nextDouble();
      }
      double[] out = new double[at.length];
      cubic.valuesInInterval(i, at, 2, 10, out);
      for (int k = 2; k < 10; k++) {
        assertThat(out[k]).isEqualTo(cubic.valueInInterval(i, at[k]));
      }
      assertThat(out[0]).isZero();
      assertThat(out[11]).isZero();
    }
  }
}
