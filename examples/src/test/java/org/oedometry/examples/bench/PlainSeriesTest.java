package org.oedometry.examples.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.theory.Terzaghi;

/** The benchmark's baseline computes the same function, so that the comparison is fair. */
class PlainSeriesTest {

  @Test
  @DisplayName("Baseline agrees with the library where 100 terms converge (T >= 0.01)")
  void baselineAgreesWhereItConverges() {
    for (double t = 0.01; t < 3; t *= 1.3) {
      assertThat(PlainSeries.averageDegree(t)).isCloseTo(Terzaghi.averageDegree(t), within(1e-14));
      assertThat(PlainSeries.timeFactor(Terzaghi.averageDegree(t))).isCloseTo(t, within(1e-12 * t));
      assertThat(PlainSeries.porePressureRatio(0.7, t))
          .isCloseTo(Terzaghi.porePressureRatio(0.7, t), within(1e-13));
    }
  }

  @Test
  @DisplayName("Baseline is wrong near T = 0 where U = 2 sqrt(T/pi) [short-time asymptote]")
  void baselineFailsAtShortTimes() {
    double t = 1e-6;
    double exact = 2 * Math.sqrt(t / Math.PI);
    assertThat(Math.abs(PlainSeries.averageDegree(t) - exact)).isGreaterThan(1e-3);
    assertThat(Terzaghi.averageDegree(t)).isCloseTo(exact, within(1e-18));
  }
}
