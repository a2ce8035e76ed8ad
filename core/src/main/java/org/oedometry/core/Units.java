package org.oedometry.core;

/**
 * Conversions both ways between the SI units of the API and the units of the laboratory.
 *
 * <p>Every {@code double} in this library's API is SI: seconds, metres, square metres, pascals,
 * kilograms, kg/m<sup>3</sup>, m<sup>2</sup>/s (c<sub>v</sub>), m<sup>2</sup>/N = 1/Pa
 * (m<sub>v</sub>) and m/s (k). These helpers convert at the edges. They all go through the one
 * table of units, {@link LabUnit}, which the CSV headers use too.
 *
 * <p>The year is the <b>Julian year</b>, 365.25 days = 31 557 600 s. With it, 1 mm<sup>2</sup>/min
 * = 0.52596 m<sup>2</sup>/yr and 1 cm<sup>2</sup>/s = 3155.76 m<sup>2</sup>/yr exactly.
 *
 * <p>Accuracy: each conversion is one correctly rounded multiplication or division by an exact
 * factor; a round trip returns the value within one unit in the last place. Non-finite input, and
 * results that would overflow, are rejected: no NaN or infinity leaves these methods.
 */
public final class Units {

  private Units() {}

  /**
   * Converts a value from any unit of the table to SI.
   *
   * @param value the value in {@code unit}; finite
   * @param unit the unit of the value
   * @return the value in the SI unit of the unit's quantity; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double toSi(double value, LabUnit unit) {
    return unit.toSi(value);
  }

  /**
   * Converts an SI value to any unit of the table.
   *
   * @param siValue the value in the SI unit of the unit's quantity; finite
   * @param unit the unit wanted
   * @return the value in {@code unit}; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double fromSi(double siValue, LabUnit unit) {
    return unit.fromSi(siValue);
  }

  /**
   * Converts minutes to s.
   *
   * @param value the value in minutes; finite
   * @return the value in s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double minutesToSeconds(double value) {
    return LabUnit.MINUTE.toSi(value);
  }

  /**
   * Converts s to minutes.
   *
   * @param value the value in s; finite
   * @return the value in minutes; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double secondsToMinutes(double value) {
    return LabUnit.MINUTE.fromSi(value);
  }

  /**
   * Converts hours to s.
   *
   * @param value the value in hours; finite
   * @return the value in s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double hoursToSeconds(double value) {
    return LabUnit.HOUR.toSi(value);
  }

  /**
   * Converts s to hours.
   *
   * @param value the value in s; finite
   * @return the value in hours; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double secondsToHours(double value) {
    return LabUnit.HOUR.fromSi(value);
  }

  /**
   * Converts days to s.
   *
   * @param value the value in days; finite
   * @return the value in s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double daysToSeconds(double value) {
    return LabUnit.DAY.toSi(value);
  }

  /**
   * Converts s to days.
   *
   * @param value the value in s; finite
   * @return the value in days; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double secondsToDays(double value) {
    return LabUnit.DAY.fromSi(value);
  }

  /**
   * Converts Julian years (365.25 d) to s.
   *
   * @param value the value in Julian years (365.25 d); finite
   * @return the value in s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double julianYearsToSeconds(double value) {
    return LabUnit.JULIAN_YEAR.toSi(value);
  }

  /**
   * Converts s to Julian years (365.25 d).
   *
   * @param value the value in s; finite
   * @return the value in Julian years (365.25 d); finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double secondsToJulianYears(double value) {
    return LabUnit.JULIAN_YEAR.fromSi(value);
  }

  /**
   * Converts mm to m.
   *
   * @param value the value in mm; finite
   * @return the value in m; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double millimetresToMetres(double value) {
    return LabUnit.MILLIMETRE.toSi(value);
  }

  /**
   * Converts m to mm.
   *
   * @param value the value in m; finite
   * @return the value in mm; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double metresToMillimetres(double value) {
    return LabUnit.MILLIMETRE.fromSi(value);
  }

  /**
   * Converts micrometres to m.
   *
   * @param value the value in micrometres; finite
   * @return the value in m; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double micrometresToMetres(double value) {
    return LabUnit.MICROMETRE.toSi(value);
  }

  /**
   * Converts m to micrometres.
   *
   * @param value the value in m; finite
   * @return the value in micrometres; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double metresToMicrometres(double value) {
    return LabUnit.MICROMETRE.fromSi(value);
  }

  /**
   * Converts kPa to Pa.
   *
   * @param value the value in kPa; finite
   * @return the value in Pa; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double kilopascalsToPascals(double value) {
    return LabUnit.KILOPASCAL.toSi(value);
  }

  /**
   * Converts Pa to kPa.
   *
   * @param value the value in Pa; finite
   * @return the value in kPa; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double pascalsToKilopascals(double value) {
    return LabUnit.KILOPASCAL.fromSi(value);
  }

  /**
   * Converts MPa to Pa.
   *
   * @param value the value in MPa; finite
   * @return the value in Pa; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double megapascalsToPascals(double value) {
    return LabUnit.MEGAPASCAL.toSi(value);
  }

  /**
   * Converts Pa to MPa.
   *
   * @param value the value in Pa; finite
   * @return the value in MPa; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double pascalsToMegapascals(double value) {
    return LabUnit.MEGAPASCAL.fromSi(value);
  }

  /**
   * Converts m^2/yr (Julian year) to m^2/s.
   *
   * @param value the value in m^2/yr (Julian year); finite
   * @return the value in m^2/s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareMetresPerYearToSquareMetresPerSecond(double value) {
    return LabUnit.SQUARE_METRE_PER_YEAR.toSi(value);
  }

  /**
   * Converts m^2/s to m^2/yr (Julian year).
   *
   * @param value the value in m^2/s; finite
   * @return the value in m^2/yr (Julian year); finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareMetresPerSecondToSquareMetresPerYear(double value) {
    return LabUnit.SQUARE_METRE_PER_YEAR.fromSi(value);
  }

  /**
   * Converts mm^2/min to m^2/s.
   *
   * @param value the value in mm^2/min; finite
   * @return the value in m^2/s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareMillimetresPerMinuteToSquareMetresPerSecond(double value) {
    return LabUnit.SQUARE_MILLIMETRE_PER_MINUTE.toSi(value);
  }

  /**
   * Converts m^2/s to mm^2/min.
   *
   * @param value the value in m^2/s; finite
   * @return the value in mm^2/min; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareMetresPerSecondToSquareMillimetresPerMinute(double value) {
    return LabUnit.SQUARE_MILLIMETRE_PER_MINUTE.fromSi(value);
  }

  /**
   * Converts cm^2/s to m^2/s.
   *
   * @param value the value in cm^2/s; finite
   * @return the value in m^2/s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareCentimetresPerSecondToSquareMetresPerSecond(double value) {
    return LabUnit.SQUARE_CENTIMETRE_PER_SECOND.toSi(value);
  }

  /**
   * Converts m^2/s to cm^2/s.
   *
   * @param value the value in m^2/s; finite
   * @return the value in cm^2/s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareMetresPerSecondToSquareCentimetresPerSecond(double value) {
    return LabUnit.SQUARE_CENTIMETRE_PER_SECOND.fromSi(value);
  }

  /**
   * Converts m^2/MN to m^2/N = 1/Pa.
   *
   * @param value the value in m^2/MN; finite
   * @return the value in m^2/N = 1/Pa; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareMetresPerMeganewtonToPerPascal(double value) {
    return LabUnit.SQUARE_METRE_PER_MEGANEWTON.toSi(value);
  }

  /**
   * Converts m^2/N = 1/Pa to m^2/MN.
   *
   * @param value the value in m^2/N = 1/Pa; finite
   * @return the value in m^2/MN; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double perPascalToSquareMetresPerMeganewton(double value) {
    return LabUnit.SQUARE_METRE_PER_MEGANEWTON.fromSi(value);
  }

  /**
   * Converts m^2/kN to m^2/N = 1/Pa.
   *
   * @param value the value in m^2/kN; finite
   * @return the value in m^2/N = 1/Pa; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double squareMetresPerKilonewtonToPerPascal(double value) {
    return LabUnit.SQUARE_METRE_PER_KILONEWTON.toSi(value);
  }

  /**
   * Converts m^2/N = 1/Pa to m^2/kN.
   *
   * @param value the value in m^2/N = 1/Pa; finite
   * @return the value in m^2/kN; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double perPascalToSquareMetresPerKilonewton(double value) {
    return LabUnit.SQUARE_METRE_PER_KILONEWTON.fromSi(value);
  }

  /**
   * Converts cm/s to m/s.
   *
   * @param value the value in cm/s; finite
   * @return the value in m/s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double centimetresPerSecondToMetresPerSecond(double value) {
    return LabUnit.CENTIMETRE_PER_SECOND.toSi(value);
  }

  /**
   * Converts m/s to cm/s.
   *
   * @param value the value in m/s; finite
   * @return the value in cm/s; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public static double metresPerSecondToCentimetresPerSecond(double value) {
    return LabUnit.CENTIMETRE_PER_SECOND.fromSi(value);
  }
}
