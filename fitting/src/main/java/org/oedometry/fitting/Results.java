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

  /**
   * A length (or a length per some unit) for a summary, in millimetres: four decimals from
   * 10<sup>-4</sup> to 10<sup>6</sup> mm (a lab's values, as "12.3456 mm"), four significant digits
   * beyond (as "1.000e+303 mm", not hundreds of digits), in metres where the millimetres would
   * overflow (as "1.000e+306 m"). Never "NaN" or "Infinity" for a finite value.
   *
   * @param metres a finite value, m (or m per the given unit)
   * @param per what follows the unit, e.g. {@code "/log cycle"}, or ""
   * @return the text with its unit
   */
  static String millimetres(double metres, String per) {
    double mm = metres * 1e3;
    if (!Double.isFinite(mm)) {
      return Checks.format("%.4g m%s", metres, per);
    }
    double size = Math.abs(mm);
    return Checks.format(
        size == 0 || (size >= 1e-4 && size < 1e6) ? "%.4f mm%s" : "%.4g mm%s", mm, per);
  }

  /**
   * A small length for a summary, in micrometres to three significant digits (as "1.02 um"), in
   * metres where the micrometres would overflow.
   *
   * @param metres a finite value, m
   * @return the text with its unit
   */
  static String micrometres(double metres) {
    double um = metres * 1e6;
    return Double.isFinite(um) ? Checks.format("%.3g um", um) : Checks.format("%.4g m", metres);
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
