package org.oedometry.core.compressibility;

import java.util.Locale;

/**
 * Argument checks shared by the package. Every check is written in the negated form so that NaN
 * fails, and every message names the field, the index where there is one, the value and its unit.
 */
final class Checks {

  private Checks() {}

  static double finite(String field, double value, String unit) {
    return org.oedometry.core.internal.Checks.finite(value, field, unit);
  }

  static double positive(String field, double value, String unit) {
    return org.oedometry.core.internal.Checks.positive(value, field, unit);
  }

  static double nonNegative(String field, double value, String unit) {
    return org.oedometry.core.internal.Checks.nonNegative(value, field, unit);
  }

  static double positiveAt(String field, int index, double value, String unit) {
    if (!(value > 0) || value == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "%s at index %d (%s) must be finite and > 0",
              field,
              index,
              org.oedometry.core.internal.Checks.withUnit(value, unit)));
    }
    return value;
  }

  static void sameLength(String firstField, int first, String secondField, int second) {
    if (first != second) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "%s has %d values but %s has %d: the lengths must match",
              firstField,
              first,
              secondField,
              second));
    }
  }

  static <T> T notNull(String field, T value) {
    if (value == null) {
      throw new IllegalArgumentException(field + " must not be null");
    }
    return value;
  }

  /**
   * The value if it is finite; otherwise an IllegalArgumentException whose message is the formatted
   * description (naming the quantity and the numbers it came from) followed by "is beyond the
   * double range". For derived values whose inputs are finite but whose quotient or sum overflows.
   */
  static double representable(double value, String description, Object... numbers) {
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, description, numbers) + " is beyond the double range");
    }
    return value;
  }

  /**
   * (a + b) / 2 without overflow: the halved sum where the sum is finite (the same bits as before
   * this helper), else the sum of the halves (finite values near the top of the double range).
   */
  static double mean(double a, double b) {
    double sum = a + b;
    return Double.isFinite(sum) ? 0.5 * sum : 0.5 * a + 0.5 * b;
  }

  /**
   * A stress given by its log<sub>10</sub>, for a message: the stress in pascals where 10 to that
   * power is a positive finite double, else "10^x" (never "Infinity" or a false 0).
   */
  static String stressText(double log10Stress) {
    double stress = Math.pow(10, log10Stress);
    return stress > 0 && Double.isFinite(stress)
        ? String.valueOf(stress)
        : String.format(Locale.ROOT, "10^%s", log10Stress);
  }
}
