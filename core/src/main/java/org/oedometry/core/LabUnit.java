package org.oedometry.core;

import java.util.Optional;
import org.oedometry.core.internal.Checks;

/**
 * The one table of units the library knows: each unit's quantity, its symbol, the token that
 * declares it in a CSV header, and its exact relation to the SI unit of its quantity.
 *
 * <p>{@link Units} and the CSV reader and writer both convert through this table, so a unit means
 * the same everywhere. A unit converts to SI as {@code value * multiplier / divisor}, where one of
 * the two is 1 and the other an exact integer-valued double, so each conversion is a single
 * correctly rounded operation.
 *
 * <p>The year is the Julian year of 365.25 days = 31 557 600 s (the year of astronomy and of the
 * IAU; consolidation coefficients in m<sup>2</sup>/yr are quoted with it in this library).
 *
 * <p>Immutable and thread-safe, as every enum.
 */
public enum LabUnit {
  /** Second, the SI unit of time. */
  SECOND(Quantity.TIME, "s", "s", 1, 1),
  /** Minute, 60 s. */
  MINUTE(Quantity.TIME, "min", "min", 60, 1),
  /** Hour, 3600 s. */
  HOUR(Quantity.TIME, "h", "h", 3600, 1),
  /** Day, 86 400 s. */
  DAY(Quantity.TIME, "d", "d", 86_400, 1),
  /** Julian year, 365.25 d = 31 557 600 s. */
  JULIAN_YEAR(Quantity.TIME, "yr", "yr", 31_557_600, 1),

  /** Metre, the SI unit of length. */
  METRE(Quantity.LENGTH, "m", "m", 1, 1),
  /** Millimetre, 1e-3 m. */
  MILLIMETRE(Quantity.LENGTH, "mm", "mm", 1, 1e3),
  /** Micrometre, 1e-6 m (header token {@code um}). */
  MICROMETRE(Quantity.LENGTH, "um", "um", 1, 1e6),

  /** Square metre, the SI unit of area. */
  SQUARE_METRE(Quantity.AREA, "m2", "m^2", 1, 1),
  /** Square centimetre, 1e-4 m<sup>2</sup>. */
  SQUARE_CENTIMETRE(Quantity.AREA, "cm2", "cm^2", 1, 1e4),
  /** Square millimetre, 1e-6 m<sup>2</sup>. */
  SQUARE_MILLIMETRE(Quantity.AREA, "mm2", "mm^2", 1, 1e6),

  /** Pascal, the SI unit of stress. */
  PASCAL(Quantity.STRESS, "Pa", "Pa", 1, 1),
  /** Kilopascal, 1e3 Pa. */
  KILOPASCAL(Quantity.STRESS, "kPa", "kPa", 1e3, 1),
  /** Megapascal, 1e6 Pa. */
  MEGAPASCAL(Quantity.STRESS, "MPa", "MPa", 1e6, 1),

  /** Kilogram, the SI unit of mass. */
  KILOGRAM(Quantity.MASS, "kg", "kg", 1, 1),
  /** Gram, 1e-3 kg. */
  GRAM(Quantity.MASS, "g", "g", 1, 1e3),

  /** Kilogram per cubic metre, the SI unit of density. */
  KILOGRAM_PER_CUBIC_METRE(Quantity.DENSITY, "kg_m3", "kg/m^3", 1, 1),
  /** Megagram per cubic metre (= g/cm<sup>3</sup> = t/m<sup>3</sup>), 1e3 kg/m<sup>3</sup>. */
  MEGAGRAM_PER_CUBIC_METRE(Quantity.DENSITY, "Mg_m3", "Mg/m^3", 1e3, 1),

  /** Square metre per second, the SI unit of c<sub>v</sub>. */
  SQUARE_METRE_PER_SECOND(Quantity.CONSOLIDATION_COEFFICIENT, "m2_s", "m^2/s", 1, 1),
  /** Square metre per Julian year: 1 m<sup>2</sup>/yr = 1 / 31 557 600 m<sup>2</sup>/s. */
  SQUARE_METRE_PER_YEAR(Quantity.CONSOLIDATION_COEFFICIENT, "m2_yr", "m^2/yr", 1, 31_557_600),
  /** Square millimetre per minute: 1 mm<sup>2</sup>/min = 1 / 6e7 m<sup>2</sup>/s. */
  SQUARE_MILLIMETRE_PER_MINUTE(
      Quantity.CONSOLIDATION_COEFFICIENT, "mm2_min", "mm^2/min", 1, 60_000_000),
  /** Square centimetre per second: 1 cm<sup>2</sup>/s = 1e-4 m<sup>2</sup>/s. */
  SQUARE_CENTIMETRE_PER_SECOND(Quantity.CONSOLIDATION_COEFFICIENT, "cm2_s", "cm^2/s", 1, 1e4),

  /** Square metre per newton (= 1/Pa), the SI unit of m<sub>v</sub>. */
  SQUARE_METRE_PER_NEWTON(Quantity.COMPRESSIBILITY, "m2_N", "m^2/N", 1, 1),
  /** Square metre per kilonewton (= 1/kPa), 1e-3 m<sup>2</sup>/N. */
  SQUARE_METRE_PER_KILONEWTON(Quantity.COMPRESSIBILITY, "m2_kN", "m^2/kN", 1, 1e3),
  /** Square metre per meganewton (= 1/MPa), 1e-6 m<sup>2</sup>/N. */
  SQUARE_METRE_PER_MEGANEWTON(Quantity.COMPRESSIBILITY, "m2_MN", "m^2/MN", 1, 1e6),

  /** Metre per second, the SI unit of hydraulic conductivity k. */
  METRE_PER_SECOND(Quantity.HYDRAULIC_CONDUCTIVITY, "m_s", "m/s", 1, 1),
  /** Centimetre per second, 1e-2 m/s. */
  CENTIMETRE_PER_SECOND(Quantity.HYDRAULIC_CONDUCTIVITY, "cm_s", "cm/s", 1, 1e2),

  /** A plain ratio, such as a water content of 0.35. */
  RATIO(Quantity.DIMENSIONLESS, "ratio", "", 1, 1),
  /** Per cent: 35 % = 0.35. */
  PERCENT(Quantity.DIMENSIONLESS, "percent", "%", 1, 100);

  /** What a unit measures; each quantity has one SI unit, the one the API uses. */
  public enum Quantity {
    /** Time; SI unit s. */
    TIME("s"),
    /** Length (heights, settlements, gauge travel); SI unit m. */
    LENGTH("m"),
    /** Area (specimen cross-section); SI unit m<sup>2</sup>. */
    AREA("m^2"),
    /** Stress and pressure; SI unit Pa. */
    STRESS("Pa"),
    /** Mass; SI unit kg. */
    MASS("kg"),
    /** Density; SI unit kg/m<sup>3</sup>. */
    DENSITY("kg/m^3"),
    /** Coefficient of consolidation c<sub>v</sub>; SI unit m<sup>2</sup>/s. */
    CONSOLIDATION_COEFFICIENT("m^2/s"),
    /** Coefficient of volume compressibility m<sub>v</sub>; SI unit m<sup>2</sup>/N = 1/Pa. */
    COMPRESSIBILITY("m^2/N"),
    /** Hydraulic conductivity (coefficient of permeability) k; SI unit m/s. */
    HYDRAULIC_CONDUCTIVITY("m/s"),
    /** A pure number (ratio). */
    DIMENSIONLESS("");

    private final String siSymbol;

    Quantity(String siSymbol) {
      this.siSymbol = siSymbol;
    }

    /**
     * Symbol of the SI unit of this quantity, as used in messages.
     *
     * @return for example {@code "m^2/s"}; empty for {@link #DIMENSIONLESS}
     */
    public String siSymbol() {
      return siSymbol;
    }
  }

  private final Quantity quantity;
  private final String headerToken;
  private final String symbol;
  private final double multiplier;
  private final double divisor;

  LabUnit(Quantity quantity, String headerToken, String symbol, double multiplier, double divisor) {
    this.quantity = quantity;
    this.headerToken = headerToken;
    this.symbol = symbol;
    this.multiplier = multiplier;
    this.divisor = divisor;
  }

  /**
   * The quantity this unit measures.
   *
   * @return the quantity
   */
  public Quantity quantity() {
    return quantity;
  }

  /**
   * The token that declares this unit at the end of a CSV header, after an underscore: {@code
   * elapsed_min}, {@code settlement_mm}, {@code stress_after_kPa}. Case-sensitive ({@code MPa} is
   * not {@code mPa}).
   *
   * @return the header token, ASCII only
   */
  public String headerToken() {
    return headerToken;
  }

  /**
   * The unit's symbol for messages and reports (ASCII, {@code ^} for powers).
   *
   * @return for example {@code "mm^2/min"}; empty for {@link #RATIO}
   */
  public String symbol() {
    return symbol;
  }

  /**
   * Whether this unit is the SI unit of its quantity (the unit the API uses).
   *
   * @return true when the conversion factor is exactly 1
   */
  public boolean isSi() {
    return multiplier == 1 && divisor == 1;
  }

  /**
   * How many SI units one of this unit is, for display; conversions use {@link #toSi(double)},
   * which is correctly rounded.
   *
   * @return the factor, for example 60.0 for {@link #MINUTE} and 1.0e-3 for {@link #MILLIMETRE}
   */
  public double siFactor() {
    return multiplier / divisor;
  }

  /**
   * Converts a value in this unit to the SI unit of its quantity: {@code value * multiplier /
   * divisor}, one correctly rounded operation.
   *
   * @param value the value in this unit; finite
   * @return the value in SI units (see {@link Quantity#siSymbol()}); finite
   * @throws IllegalArgumentException if the value is not finite or its SI value overflows
   */
  public double toSi(double value) {
    Checks.finite(value, "value", symbol);
    double si = divisor == 1 ? value * multiplier : value / divisor;
    return checkResult(si, value, symbol);
  }

  /**
   * Converts a value in the SI unit of this unit's quantity to this unit: the inverse of {@link
   * #toSi(double)}, one correctly rounded operation. A round trip returns the value within one unit
   * in the last place.
   *
   * @param siValue the value in SI units; finite
   * @return the value in this unit; finite
   * @throws IllegalArgumentException if the value is not finite or the result overflows
   */
  public double fromSi(double siValue) {
    Checks.finite(siValue, "value", quantity.siSymbol());
    double value = divisor == 1 ? siValue / multiplier : siValue * divisor;
    return checkResult(value, siValue, quantity.siSymbol());
  }

  private double checkResult(double result, double input, String inputSymbol) {
    if (!Double.isFinite(result)) {
      throw new IllegalArgumentException(
          Checks.format(
              "value (%s %s) is too large to convert to %s",
              Checks.number(input),
              inputSymbol,
              inputSymbol.equals(symbol) ? quantity.siSymbol() : symbol));
    }
    return result;
  }

  /**
   * Finds the unit a CSV header token declares.
   *
   * @param token the token after the last underscore that starts a unit, e.g. {@code "kPa"};
   *     case-sensitive
   * @return the unit, or empty if no unit has this token
   */
  public static Optional<LabUnit> forHeaderToken(String token) {
    for (LabUnit unit : values()) {
      if (unit.headerToken.equals(token)) {
        return Optional.of(unit);
      }
    }
    return Optional.empty();
  }

  /**
   * The header tokens of every unit of a quantity, for messages that list what is accepted.
   *
   * @param quantity the quantity
   * @return the tokens, comma-separated, in the order of this enum
   */
  public static String headerTokens(Quantity quantity) {
    StringBuilder text = new StringBuilder();
    for (LabUnit unit : values()) {
      if (unit.quantity == quantity) {
        if (text.length() > 0) {
          text.append(", ");
        }
        text.append(unit.headerToken);
      }
    }
    return text.toString();
  }
}
