package org.oedometry.core.io;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalLong;

/**
 * Test data that cannot be read: malformed CSV, a missing or unknown header, an unknown unit, a
 * cell that is not a number, or values that do not make a valid test. The message names the file,
 * the line, the column and the value where there is one, e.g. {@code readings.csv line 7, column
 * elapsed_min, value 'abc': not a decimal number}.
 *
 * <p>Reading is all or nothing: when this is thrown, no test is returned.
 */
public class TestDataException extends IllegalArgumentException {

  private static final long serialVersionUID = 1L;

  /** File name or other description of the source. */
  private final String source;

  /** 1-based line, or 0 when the problem concerns the whole file. */
  private final long line;

  /** Column header, or null when the problem concerns no single column. */
  private final String column;

  /** Offending cell text, or null when there is none. */
  private final String value;

  /** The problem, without the location. */
  private final String problem;

  /**
   * Creates the exception.
   *
   * @param source the file name or a description of the source; not null
   * @param line the 1-based line, or 0 when the problem concerns the whole file
   * @param column the column header, or null when none applies
   * @param value the offending cell text, or null when none applies
   * @param problem what is wrong, one sentence without the location; not null
   * @param cause the exception that revealed the problem, or null
   */
  public TestDataException(
      String source, long line, String column, String value, String problem, Throwable cause) {
    super(message(source, line, column, value, problem), cause);
    this.source = Objects.requireNonNull(source, "source");
    this.line = Math.max(0, line);
    this.column = column;
    this.value = value;
    this.problem = Objects.requireNonNull(problem, "problem");
  }

  private static String message(
      String source, long line, String column, String value, String problem) {
    StringBuilder text = new StringBuilder(String.valueOf(source));
    if (line > 0) {
      text.append(" line ").append(line);
    }
    if (column != null) {
      text.append(", column ").append(column);
    }
    if (value != null) {
      text.append(", value '").append(value).append('\'');
    }
    return text.append(": ").append(problem).toString();
  }

  /**
   * The file name or description of the source.
   *
   * @return the source, never null
   */
  public String source() {
    return source;
  }

  /**
   * The 1-based line of the record (for a record that spans several lines, the line where it ends).
   *
   * @return the line, or empty when the problem concerns the whole file
   */
  public OptionalLong line() {
    return line > 0 ? OptionalLong.of(line) : OptionalLong.empty();
  }

  /**
   * The column header.
   *
   * @return the column, or empty when the problem concerns no single column
   */
  public Optional<String> column() {
    return Optional.ofNullable(column);
  }

  /**
   * The offending cell text.
   *
   * @return the value, or empty when there is none
   */
  public Optional<String> value() {
    return Optional.ofNullable(value);
  }

  /**
   * What is wrong, without the location.
   *
   * @return the problem, in English, numbers formatted with {@link Locale#ROOT}
   */
  public String problem() {
    return problem;
  }
}
