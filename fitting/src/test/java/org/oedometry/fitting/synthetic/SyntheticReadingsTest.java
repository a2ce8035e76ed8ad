package org.oedometry.fitting.synthetic;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SyntheticReadingsTest {

  private static final SyntheticIncrement MODEL = SyntheticIncrement.terzaghi(5e-4, 1e-8, 0.01);

  @Test
  @DisplayName("same seed, same readings; rounding to the resolution; noise of the stated size")
  void seededNoiseAndRounding() {
    double[] t = ReadingSchedules.uniform(10, 86400);
    SyntheticReadings a = SyntheticReadings.sample(MODEL, t, 2e-6, 0, 5);
    assertThat(SyntheticReadings.sample(MODEL, t, 2e-6, 0, 5)).isEqualTo(a);
    assertThat(SyntheticReadings.sample(MODEL, t, 2e-6, 0, 6)).isNotEqualTo(a);
    double sum = 0;
    double sumSquares = 0;
    double[] d = a.settlementMetres();
    for (int i = 0; i < t.length; i++) {
      double e = d[i] - MODEL.settlementAt(t[i]);
      sum += e;
      sumSquares += e * e;
    }
    // 8,640 standard normal draws: sample sd within 3 % of 2 um, mean within 0.1 um.
    assertThat(Math.sqrt(sumSquares / t.length)).isCloseTo(2e-6, within(0.06e-6));
    assertThat(sum / t.length).isCloseTo(0, within(0.1e-6));
    SyntheticReadings rounded = SyntheticReadings.sample(MODEL, t, 0, 1e-6, 5);
    for (double v : rounded.settlementMetres()) {
      assertThat(Math.abs(v / 1e-6 - Math.rint(v / 1e-6))).isLessThan(1e-6);
    }
  }

  @Test
  void copiesAndCurve() {
    SyntheticReadings r = SyntheticReadings.sample(MODEL, new double[] {0, 60, 120}, 0, 0, 1);
    r.elapsedSeconds()[0] = 99;
    assertThat(r.elapsedSeconds()[0]).isZero();
    assertThat(r.size()).isEqualTo(3);
    assertThat(r.toCurve().size()).isEqualTo(3);
    assertThat(r.withReading(1, 7).settlementMetres()[1]).isEqualTo(7);
    assertThat(r.toString()).startsWith("SyntheticReadings[elapsedSeconds=[0.0, 60.0, 120.0]");
    assertThat(r.hashCode())
        .isEqualTo(SyntheticReadings.sample(MODEL, new double[] {0, 60, 120}, 0, 0, 1).hashCode());
    assertThatThrownBy(() -> r.withReading(3, 0)).hasMessage("reading index 3 outside 0..2");
    assertThatThrownBy(() -> SyntheticReadings.sample(MODEL, new double[] {1}, -1, 0, 1))
        .hasMessage("noise (-1.0 m) and resolution (0.0 m) must be finite and >= 0");
    assertThatThrownBy(() -> new SyntheticReadings(new double[1], new double[2]))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
