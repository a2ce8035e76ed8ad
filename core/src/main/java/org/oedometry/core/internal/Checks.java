package org.oedometry.core.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/**
 * Argument checks shared by the value types. Internal: not part of the API, may change without
 * notice.
 *
 * <p>Every check is written in the negated form ({@code if (!(x > 0))}) so that NaN fails, and
 * every message names the argument, its value and its unit, formatted with {@link Locale#ROOT}.
 */
public final class Checks {

  private Checks() {}

  /**
   * Formats a number for a message: {@link Double#toString(double)}, which is locale-independent
   * and shows enough digits to tell two doubles apart.
   *
   * @param value any double
   * @return the text of the value
   */
  public static String number(double value) {
    return Double.toString(value);
  }

  /**
   * Formats a number for a summary ({@code toString}): rounded to 6 significant digits, then shown
   * as {@link Double#toString(double)} shows it ({@code 0.0187}, not {@code 0.018699999999999998}).
   *
   * @param value any double
   * @return the brief text of the value
   */
  public static String brief(double value) {
    if (!Double.isFinite(value) || value == 0) {
      return Double.toString(value);
    }
    return Double.toString(new BigDecimal(value).round(new MathContext(6)).doubleValue());
  }

  /**
   * A value followed by its unit symbol, or the value alone where the unit is empty
   * (dimensionless).
   *
   * @param value any double
   * @param unit a unit symbol, possibly empty
   * @return for example {@code "0.02 m"} or {@code "0.5"}
   */
  public static String withUnit(double value, String unit) {
    String symbol = unit.strip();
    return symbol.isEmpty() ? number(value) : number(value) + " " + symbol;
  }

  /**
   * Formats a message with {@link Locale#ROOT}.
   *
   * @param template a {@link String#format} template
   * @param args the arguments
   * @return the formatted message
   */
  public static String format(String template, Object... args) {
    return String.format(Locale.ROOT, template, args);
  }

  /**
   * Requires a finite value.
   *
   * @param value the value
   * @param name what the value is, for the message
   * @param unit its unit symbol, for the message
   * @return the value
   * @throws IllegalArgumentException if the value is NaN or infinite
   */
  public static double finite(double value, String name, String unit) {
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException(
          format("%s (%s) must be finite", name, withUnit(value, unit)));
    }
    return value;
  }

  /**
   * Requires a finite value &gt; 0.
   *
   * @param value the value
   * @param name what the value is, for the message
   * @param unit its unit symbol, for the message
   * @return the value
   * @throws IllegalArgumentException if the value is NaN, infinite or not &gt; 0
   */
  public static double positive(double value, String name, String unit) {
    if (!(value > 0) || value == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          format("%s (%s) must be finite and > 0", name, withUnit(value, unit)));
    }
    return value;
  }

  /**
   * Requires a finite value &ge; 0.
   *
   * @param value the value
   * @param name what the value is, for the message
   * @param unit its unit symbol, for the message
   * @return the value, with -0.0 turned into +0.0
   * @throws IllegalArgumentException if the value is NaN, infinite or negative
   */
  public static double nonNegative(double value, String name, String unit) {
    if (!(value >= 0) || value == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          format("%s (%s) must be finite and >= 0", name, withUnit(value, unit)));
    }
    return value + 0.0;
  }

  /**
   * Requires text that stays on one line and reads in its own order, and returns it with
   * surrounding white space removed. Rejected: control characters (U+0000 to U+001F, U+007F to
   * U+009F: line breaks, tabs and the like), the Unicode line and paragraph separators (U+2028,
   * U+2029), which many programs show as a line break, the bidirectional formatting controls
   * (U+061C, U+200E, U+200F, U+202A to U+202E, U+2066 to U+2069), which reorder the text after them
   * up to the end of the line, and unpaired surrogates, which no file encoding can carry.
   *
   * @param text the text; not null
   * @param name what the text is, for the message
   * @return the stripped text
   * @throws IllegalArgumentException if the text contains one of the characters above; the message
   *     names the character's code and its index
   * @throws NullPointerException if the text is null
   */
  public static String plainText(String text, String name) {
    if (text == null) {
      throw new NullPointerException(name + " must not be null");
    }
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      String what = null;
      if (Character.isISOControl(c)) {
        what = "a control character";
      } else if (c == 0x2028 || c == 0x2029) {
        what = "a line or paragraph separator";
      } else if (isBidiControl(c)) {
        what = "a bidirectional formatting control";
      } else if (Character.isHighSurrogate(c)
          && i + 1 < text.length()
          && Character.isLowSurrogate(text.charAt(i + 1))) {
        i++; // a well-formed pair: one supplementary character
      } else if (Character.isSurrogate(c)) {
        what = "an unpaired surrogate";
      }
      if (what != null) {
        throw new IllegalArgumentException(
            format("%s contains %s (U+%04X) at index %d", name, what, (int) c, i));
      }
    }
    return text.strip();
  }

  /** The characters of the Unicode property Bidi_Control (Unicode 15, from memory). */
  private static boolean isBidiControl(char c) {
    return c == 0x061C
        || c == 0x200E
        || c == 0x200F
        || (c >= 0x202A && c <= 0x202E)
        || (c >= 0x2066 && c <= 0x2069);
  }

  /** Smallest specific gravity of solids, exclusive: solids no denser than water. */
  public static final double SPECIFIC_GRAVITY_ABOVE = 1.0;

  /** Largest specific gravity of solids accepted. */
  public static final double SPECIFIC_GRAVITY_AT_MOST = 6.0;

  /**
   * Requires a specific gravity of solids in (1.0, 6.0].
   *
   * @param gs the specific gravity
   * @return the value
   * @throws IllegalArgumentException if it is NaN or outside the range
   */
  public static double specificGravity(double gs) {
    if (!(gs > SPECIFIC_GRAVITY_ABOVE && gs <= SPECIFIC_GRAVITY_AT_MOST)) {
      throw new IllegalArgumentException(
          format("specific gravity of solids (%s) must be > 1.0 and <= 6.0", number(gs)));
    }
    return gs;
  }
}
