package org.oedometry.fitting.reduction;

import java.util.Locale;
import java.util.OptionalDouble;
import org.oedometry.core.Units;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.fitting.CvMethod;

/** Lab units and short names shared by the renderings. */
final class ReportUnits {

  private ReportUnits() {}

  static double kilopascals(double pascals) {
    return Units.pascalsToKilopascals(pascals);
  }

  static double millimetres(double metres) {
    return Units.metresToMillimetres(metres);
  }

  static double minutes(double seconds) {
    return Units.secondsToMinutes(seconds);
  }

  /** m^2/s to m^2/yr (Julian year, 365.25 d). */
  static double squareMetresPerYear(double squareMetresPerSecond) {
    return Units.squareMetresPerSecondToSquareMetresPerYear(squareMetresPerSecond);
  }

  /** 1/Pa to m^2/MN. */
  static double squareMetresPerMeganewton(double perPascal) {
    return Units.perPascalToSquareMetresPerMeganewton(perPascal);
  }

  /** A short plain name of a method, for column headings. */
  static String shortName(CvMethod method) {
    return switch (method) {
      case LOG_TIME -> "log-time";
      case ROOT_TIME -> "root-time";
      case FULL_CURVE -> "full-curve";
      case INFLECTION_POINT -> "inflection";
      case RECTANGULAR_HYPERBOLA -> "hyperbola";
      case EARLY_SLOPE -> "early-slope";
      case ASAOKA -> "Asaoka";
    };
  }

  /** OC / NC in a few characters: OC, OC rel, OC unl, OC>NC, NC. */
  static String shortClass(IncrementClass c) {
    return switch (c) {
      case RECOMPRESSION -> "OC";
      case RELOADING -> "OC rel";
      case UNLOADING -> "OC unl";
      case CROSSES_PRECONSOLIDATION -> "OC>NC";
      case NORMALLY_CONSOLIDATED -> "NC";
    };
  }

  /** Formats a present value, or returns the placeholder. */
  static String format(String template, OptionalDouble value, String absent) {
    return value.isPresent() ? String.format(Locale.ROOT, template, value.getAsDouble()) : absent;
  }

  /** Maps a present value. */
  /**
   * A value in a lab unit, or empty where it is absent or its lab unit leaves the double range (the
   * unit conversions of {@link Units} refuse to overflow: m_v of stresses near 1e-306 Pa in m^2/MN,
   * say); the report then shows it as absent instead of failing.
   */
  static OptionalDouble map(OptionalDouble value, java.util.function.DoubleUnaryOperator f) {
    if (value.isEmpty()) {
      return value;
    }
    try {
      return OptionalDouble.of(f.applyAsDouble(value.getAsDouble()));
    } catch (IllegalArgumentException beyondTheRange) {
      return OptionalDouble.empty();
    }
  }
}
