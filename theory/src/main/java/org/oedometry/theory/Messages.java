package org.oedometry.theory;

import java.util.Locale;

/** Formats the messages of this package's exceptions the same way everywhere (Locale.ROOT). */
final class Messages {

  private Messages() {}

  /**
   * Formats a message with {@link Locale#ROOT}, so that numbers read the same on every machine.
   *
   * @param template a {@link String#format} template
   * @param values the values to insert
   * @return the message
   */
  static String format(String template, Object... values) {
    return String.format(Locale.ROOT, template, values);
  }

  /**
   * Checks that a value is finite and strictly positive.
   *
   * @param name the field's name as the user knows it, with its unit after the value
   * @param value the value
   * @param unit the unit printed after the value, e.g. "m"
   * @return the value
   * @throws IllegalArgumentException naming the field and value otherwise
   */
  static double requirePositiveFinite(String name, double value, String unit) {
    if (!(value > 0) || value == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          format("%s (%s) must be finite and > 0", name, withUnit(value, unit)));
    }
    return value;
  }

  /**
   * Checks that a value is finite.
   *
   * @param name the field's name as the user knows it
   * @param value the value
   * @param unit the unit printed after the value, e.g. "m"
   * @return the value
   * @throws IllegalArgumentException naming the field and value otherwise
   */
  static double requireFinite(String name, double value, String unit) {
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException(
          format("%s (%s) must be finite", name, withUnit(value, unit)));
    }
    return value;
  }

  private static String withUnit(double value, String unit) {
    return unit.isEmpty() ? String.valueOf(value) : value + " " + unit;
  }
}
