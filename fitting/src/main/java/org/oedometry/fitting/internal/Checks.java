package org.oedometry.fitting.internal;

import java.util.Locale;

/** Argument checks and message formatting shared by the constructions (Locale.ROOT). */
public final class Checks {

  private Checks() {}

  /**
   * Formats a message with {@link Locale#ROOT}.
   *
   * @param template a {@link String#format} template
   * @param values the values
   * @return the message
   */
  public static String format(String template, Object... values) {
    return String.format(Locale.ROOT, template, values);
  }

  /**
   * A count with its noun and verb in agreement, for messages: "1 reading lies", "3 readings lie".
   *
   * @param count the count
   * @param one the words after a count of exactly 1, e.g. "reading lies"
   * @param many the words after any other count, e.g. "readings lie"
   * @return the count and the matching words
   */
  public static String count(int count, String one, String many) {
    return count + " " + (count == 1 ? one : many);
  }

  /**
   * Checks a drainage path.
   *
   * @param drainagePathMetres H<sub>dr</sub>, m
   * @return the value
   * @throws IllegalArgumentException unless finite and &gt; 0
   */
  public static double requireDrainagePath(double drainagePathMetres) {
    if (!(drainagePathMetres > 0) || drainagePathMetres == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          format("drainage path (%s m) must be finite and > 0", drainagePathMetres));
    }
    return drainagePathMetres;
  }

  /**
   * Checks that a value lies in an open interval.
   *
   * @param name the field's name
   * @param value the value
   * @param low lower bound, excluded
   * @param high upper bound, excluded
   * @return the value
   * @throws IllegalArgumentException unless low &lt; value &lt; high
   */
  public static double requireBetween(String name, double value, double low, double high) {
    if (!(value > low && value < high)) {
      throw new IllegalArgumentException(
          format("%s (%s) must be > %s and < %s", name, value, low, high));
    }
    return value;
  }

  /**
   * Checks that a value is finite.
   *
   * @param name the field's name
   * @param value the value
   * @param unit unit printed after the value
   * @return the value
   * @throws IllegalArgumentException if NaN or infinite
   */
  public static double requireFinite(String name, double value, String unit) {
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException(format("%s (%s %s) must be finite", name, value, unit));
    }
    return value;
  }
}
