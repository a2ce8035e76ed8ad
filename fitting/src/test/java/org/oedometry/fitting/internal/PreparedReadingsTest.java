package org.oedometry.fitting.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.fitting.FitException;

class PreparedReadingsTest {

  @Test
  @DisplayName(
      "isotonic regression by hand (pool adjacent violators): [1, 3, 2, 4] -> [1, 2.5, 2.5, 4];"
          + " [3, 2, 1] -> [2, 2, 2]")
  void isotonic() {
    assertThat(PreparedReadings.isotonic(new double[] {1, 3, 2, 4}))
        .containsExactly(1, 2.5, 2.5, 4);
    assertThat(PreparedReadings.isotonic(new double[] {3, 2, 1})).containsExactly(2, 2, 2);
    assertThat(PreparedReadings.isotonic(new double[] {1, 2, 3})).containsExactly(1, 2, 3);
  }

  @Test
  @DisplayName(
      "despiking keeps monotone data and the ends, replaces one wild reading by interpolation")
  void despike() {
    double[] x = {0, 1, 2, 3, 5};
    assertThat(PreparedReadings.despike(x, new double[] {0, 1, 2, 3, 4}))
        .containsExactly(0, 1, 2, 3, 4);
    // Wild reading 9 at x = 2 between 1 and 3: replaced by 2; its neighbour 3 (pushed out of its
    // own neighbours' range by the wild one) is kept.
    assertThat(PreparedReadings.despike(x, new double[] {0, 1, 9, 3, 4}))
        .containsExactly(0, 1, 2, 3, 4);
    // Uneven spacing: interpolation at x = 3 between (2, 2) and (5, 5) is 3.
    assertThat(PreparedReadings.despike(x, new double[] {0, 1, 2, -7, 5}))
        .containsExactly(0, 1, 2, 3, 5);
    assertThat(PreparedReadings.despike(x, new double[] {9, 1, 2, 3, -9}))
        .containsExactly(9, 1, 2, 3, -9);
  }

  @Test
  @DisplayName("zero reading set aside, swelling turned positive")
  void prepare() {
    PreparedReadings r =
        PreparedReadings.of(
            new double[] {0, 1, 4, 9}, new double[] {5, 4, 3, 2}, 3, "test", Math::sqrt);
    assertThat(r.size()).isEqualTo(3);
    assertThat(r.sign()).isEqualTo(-1.0);
    assertThat(r.zeroReading()).hasValue(-5.0);
    assertThat(r.time()).containsExactly(1, 4, 9);
    assertThat(r.abscissa()).containsExactly(1, 2, 3);
    assertThat(r.cleaned()).containsExactly(-4, -3, -2);
    assertThat(r.monotone()).containsExactly(-4, -3, -2);
  }

  @Test
  @DisplayName(
      "too few readings: IllegalArgumentException (invalid input); no change: FitException with"
          + " the reason")
  void rejects() {
    // ARCHITECTURE.md (Errors): invalid input is an IllegalArgumentException naming the value.
    assertThatThrownBy(
            () ->
                PreparedReadings.of(
                    new double[] {0, 1, 2}, new double[] {0, 1, 2}, 3, "log-time", Math::log10))
        .isExactlyInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "2 readings after t = 0 are too few for the log-time method (needs at least 3)");
    assertThatThrownBy(
            () ->
                PreparedReadings.of(
                    new double[] {1, 2, 3}, new double[] {1, 1, 1}, 3, "log-time", Math::log10))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("does not change");
  }
}
