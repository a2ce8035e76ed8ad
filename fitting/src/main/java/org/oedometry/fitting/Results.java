package org.oedometry.fitting;

import java.util.OptionalDouble;
import org.oedometry.fitting.internal.Checks;

/** Checks and constants shared by the result records of this package. */
final class Results {

  /** Seconds in a Julian year (365.25 d), for the m<sup>2</sup>/yr of the summaries. */
  static final double JULIAN_YEAR_SECONDS = 365.25 * 86_400;

  private Results() {}

  /** Checks that a value is finite and &gt; 0. */
  static double requirePositive(String name, double value, String unit) {
    if (!(value > 0) || value == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          Checks.format("%s (%s %s) must be finite and > 0", name, value, unit));
    }
    return value;
  }

  /** Checks that an optional value, where present, is finite. */
  static void requireFiniteIfPresent(String name, OptionalDouble value) {
    if (value == null) {
      throw new IllegalArgumentException(name + " must not be null (use OptionalDouble.empty())");
    }
    if (value.isPresent()) {
      Checks.requireFinite(name, value.getAsDouble(), "");
    }
  }
}
