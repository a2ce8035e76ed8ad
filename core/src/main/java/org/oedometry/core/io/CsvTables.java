package org.oedometry.core.io;

import java.util.Objects;

/**
 * The text of the three CSV files that describe one test (see the package documentation for their
 * layout).
 *
 * @param properties the text of {@value #PROPERTIES_FILE}
 * @param increments the text of {@value #INCREMENTS_FILE}
 * @param readings the text of {@value #READINGS_FILE}
 */
public record CsvTables(String properties, String increments, String readings) {

  /** File name of the specimen and test properties (key/value). */
  public static final String PROPERTIES_FILE = "properties.csv";

  /** File name of the table of increments. */
  public static final String INCREMENTS_FILE = "increments.csv";

  /** File name of the readings, one row per reading. */
  public static final String READINGS_FILE = "readings.csv";

  /**
   * Validates the texts.
   *
   * @param properties the text of {@value #PROPERTIES_FILE}
   * @param increments the text of {@value #INCREMENTS_FILE}
   * @param readings the text of {@value #READINGS_FILE}
   * @throws NullPointerException if a text is null
   */
  public CsvTables {
    Objects.requireNonNull(properties, "properties must not be null");
    Objects.requireNonNull(increments, "increments must not be null");
    Objects.requireNonNull(readings, "readings must not be null");
  }

  /**
   * A short summary (the full texts are long).
   *
   * @return the sizes of the three texts
   */
  @Override
  public String toString() {
    return "CsvTables[properties "
        + properties.length()
        + " chars, increments "
        + increments.length()
        + " chars, readings "
        + readings.length()
        + " chars]";
  }
}
