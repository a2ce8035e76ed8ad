package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class UnitsProperties {

  @Test
  @DisplayName("fromSi(toSi(x)) returns x within 1 ulp for every unit (two correctly rounded ops)")
  void roundTripWithinOneUlp() {
    LabUnit[] units = LabUnit.values();
    qt().forAll(integers().between(0, units.length - 1), doubles().between(-1e12, 1e12))
        .checkAssert(
            (index, x) -> {
              LabUnit unit = units[index];
              double back = Units.fromSi(Units.toSi(x, unit), unit);
              assertThat(Math.abs(back - x)).isLessThanOrEqualTo(Math.ulp(x));
            });
  }

  @Test
  @DisplayName("minutes round trip through seconds exactly for whole and binary fractions")
  void minutesRoundTripExactly() {
    qt().forAll(integers().between(-1_000_000, 1_000_000))
        .checkAssert(
            n -> {
              double minutes = n / 4.0;
              assertThat(Units.secondsToMinutes(Units.minutesToSeconds(minutes)))
                  .isEqualTo(minutes);
            });
  }

  @Test
  @DisplayName("conversion is monotonic: larger lab value, larger SI value")
  void monotonic() {
    LabUnit[] units = LabUnit.values();
    qt().forAll(
            integers().between(0, units.length - 1),
            doubles().between(-1e9, 1e9),
            doubles().between(-1e9, 1e9))
        .checkAssert(
            (index, a, b) -> {
              LabUnit unit = units[index];
              if (a <= b) {
                assertThat(unit.toSi(a)).isLessThanOrEqualTo(unit.toSi(b));
              }
            });
  }
}
