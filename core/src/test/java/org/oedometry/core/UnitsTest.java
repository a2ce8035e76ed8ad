package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class UnitsTest {

  @Test
  @DisplayName("1 mm^2/min = 0.52596 m^2/yr with the Julian year (FACTS.md, exact arithmetic)")
  void squareMillimetresPerMinuteInSquareMetresPerYear() {
    double si = Units.squareMillimetresPerMinuteToSquareMetresPerSecond(1);
    // Independent: 1e-6 m^2 / 60 s, times 365.25 * 86400 s.
    assertThat(si).isCloseTo(1e-6 / 60, within(1e-22));
    assertThat(Units.squareMetresPerSecondToSquareMetresPerYear(si))
        .isCloseTo(0.52596, within(1e-15));
  }

  @Test
  @DisplayName("1 cm^2/s = 3155.76 m^2/yr with the Julian year (FACTS.md, exact arithmetic)")
  void squareCentimetresPerSecondInSquareMetresPerYear() {
    double si = Units.squareCentimetresPerSecondToSquareMetresPerSecond(1);
    assertThat(si).isEqualTo(1e-4);
    assertThat(Units.squareMetresPerSecondToSquareMetresPerYear(si))
        .isCloseTo(3155.76, within(1e-11));
  }

  @Test
  @DisplayName("Julian year is 365.25 d of 86 400 s (IAU definition, from memory)")
  void julianYear() {
    assertThat(Units.julianYearsToSeconds(1)).isEqualTo(365.25 * 86_400);
    assertThat(Units.daysToSeconds(365.25)).isEqualTo(Units.julianYearsToSeconds(1));
    assertThat(Units.secondsToJulianYears(31_557_600)).isEqualTo(1);
  }

  @Test
  @DisplayName("time, length and stress factors are the SI definitions")
  void simpleFactors() {
    assertThat(Units.minutesToSeconds(1.5)).isEqualTo(90);
    assertThat(Units.hoursToSeconds(24)).isEqualTo(86_400);
    assertThat(Units.secondsToHours(7200)).isEqualTo(2);
    assertThat(Units.secondsToMinutes(30)).isEqualTo(0.5);
    assertThat(Units.secondsToDays(43_200)).isEqualTo(0.5);
    assertThat(Units.millimetresToMetres(19.05)).isEqualTo(0.01905);
    assertThat(Units.metresToMillimetres(0.02)).isEqualTo(20);
    assertThat(Units.micrometresToMetres(250)).isEqualTo(2.5e-4);
    assertThat(Units.metresToMicrometres(1e-3)).isCloseTo(1000, within(1e-12));
    assertThat(Units.kilopascalsToPascals(100)).isEqualTo(100_000);
    assertThat(Units.pascalsToKilopascals(25_000)).isEqualTo(25);
    assertThat(Units.megapascalsToPascals(1.6)).isEqualTo(1_600_000);
    assertThat(Units.pascalsToMegapascals(800_000)).isEqualTo(0.8);
    assertThat(Units.centimetresPerSecondToMetresPerSecond(1e-7)).isCloseTo(1e-9, within(1e-24));
    assertThat(Units.metresPerSecondToCentimetresPerSecond(1e-9)).isCloseTo(1e-7, within(1e-22));
  }

  @Test
  @DisplayName("1 m^2/MN = 1e-6 m^2/N = 1e-6 1/Pa; Venkatramaiah Ex. 7.1 m_v 5.88e-4 m^2/kN")
  void compressibility() {
    assertThat(Units.squareMetresPerMeganewtonToPerPascal(1)).isEqualTo(1e-6);
    assertThat(Units.perPascalToSquareMetresPerMeganewton(1e-6)).isEqualTo(1);
    // 5.88e-4 m^2/kN (FACTS.md, published example) is 0.588 m^2/MN.
    double perPascal = Units.squareMetresPerKilonewtonToPerPascal(5.88e-4);
    assertThat(Units.perPascalToSquareMetresPerMeganewton(perPascal))
        .isCloseTo(0.588, within(1e-15));
    // And back to m^2/kN (1 m^2/kN = 1e-3 m^2/N, the SI prefix).
    assertThat(Units.perPascalToSquareMetresPerKilonewton(perPascal))
        .isCloseTo(5.88e-4, within(1e-19));
  }

  @Test
  @DisplayName(
      "The reverse c_v conversions: 0.52596 m^2/yr is 1 mm^2/min and 3155.76 m^2/yr is 1 cm^2/s"
          + " (FACTS.md, exact arithmetic with the Julian year)")
  void coefficientOfConsolidationBackToLabUnits() {
    double fromYear = Units.squareMetresPerYearToSquareMetresPerSecond(0.52596);
    assertThat(Units.squareMetresPerSecondToSquareMillimetresPerMinute(fromYear))
        .isCloseTo(1, within(1e-14));
    double fromYearCm = Units.squareMetresPerYearToSquareMetresPerSecond(3155.76);
    assertThat(Units.squareMetresPerSecondToSquareCentimetresPerSecond(fromYearCm))
        .isCloseTo(1, within(1e-14));
  }

  @Test
  @DisplayName(
      "k = c_v m_v gamma_w: 3.109e-10 m/s per (m^2/yr)(m^2/MN) (FACTS.md, exact arithmetic)")
  void permeabilityShortcut() {
    double cv = Units.squareMetresPerYearToSquareMetresPerSecond(1);
    double mv = Units.squareMetresPerMeganewtonToPerPascal(1);
    double k = cv * mv * 9810; // gamma_w = 9.81 kN/m^3 = 9810 N/m^3
    assertThat(k).isCloseTo(3.109e-10, within(0.001e-10));
  }

  @Test
  @DisplayName("generic toSi/fromSi agree with the named conversions")
  void genericConversions() {
    assertThat(Units.toSi(2, LabUnit.HOUR)).isEqualTo(Units.hoursToSeconds(2));
    assertThat(Units.fromSi(2e-3, LabUnit.MILLIMETRE)).isEqualTo(2);
    assertThat(Units.toSi(35, LabUnit.PERCENT)).isEqualTo(0.35);
  }

  @Test
  @DisplayName("non-finite input and overflow are rejected with the value in the message")
  void rejectsNonFinite() {
    assertThatThrownBy(() -> Units.kilopascalsToPascals(Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("value (NaN kPa) must be finite");
    assertThatThrownBy(() -> Units.minutesToSeconds(Double.POSITIVE_INFINITY))
        .hasMessage("value (Infinity min) must be finite");
    assertThatThrownBy(() -> Units.megapascalsToPascals(1e305))
        .hasMessage("value (1.0E305 MPa) is too large to convert to Pa");
    assertThatThrownBy(() -> Units.metresToMicrometres(1e305))
        .hasMessage("value (1.0E305 m) is too large to convert to um");
  }
}
