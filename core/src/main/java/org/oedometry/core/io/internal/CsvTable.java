package org.oedometry.core.io.internal;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.oedometry.core.LabUnit;
import org.oedometry.core.io.TestDataException;

/**
 * One CSV file parsed into a header and rows, each row with its line number. Internal: not part of
 * the API.
 *
 * <p>Format: RFC 4180 as read by Commons CSV's default format, with {@code #} comment lines, blank
 * lines (empty, only spaces and tabs, or one quoted empty cell) ignored, white space around cells
 * removed and an optional byte-order mark. The first record is the header; every row must have as
 * many cells as the header. Every failure of Commons CSV is translated into a {@link
 * TestDataException}.
 */
public final class CsvTable {

  private static final CSVFormat FORMAT =
      CSVFormat.DEFAULT
          .builder()
          .setCommentMarker('#')
          .setIgnoreEmptyLines(true)
          .setIgnoreSurroundingSpaces(true)
          .get();

  /** Decimal numbers only: no NaN, Infinity, hexadecimal or type suffixes. */
  private static final Pattern DECIMAL =
      Pattern.compile("[+-]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?");

  private static final int MAX_SHOWN = 40;

  /**
   * One row of cells.
   *
   * @param line the 1-based line where the record ends
   * @param cells the cells, surrounding white space removed
   */
  public record Row(long line, List<String> cells) {
    /**
     * Copies the cells.
     *
     * @param line the 1-based line where the record ends
     * @param cells the cells, surrounding white space removed
     */
    public Row {
      cells = List.copyOf(cells);
    }
  }

  private final String source;
  private final Row header;
  private final List<Row> rows;

  private CsvTable(String source, Row header, List<Row> rows) {
    this.source = source;
    this.header = header;
    this.rows = List.copyOf(rows);
  }

  /**
   * Parses the text of one file.
   *
   * @param source the file name, for messages
   * @param text the file's text
   * @param firstColumn the name the header's first cell must have; if the first record does not
   *     start with it, the header is reported as missing
   * @param exampleHeader a header to show in the message when it is missing
   * @return the table
   * @throws TestDataException if the file is empty, malformed, has no header, a duplicate or empty
   *     header name, or a row whose number of cells differs from the header's
   */
  public static CsvTable parse(
      String source, String text, String firstColumn, String exampleHeader) {
    String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
    List<Row> records = new ArrayList<>();
    long lastLine = 0;
    try (CSVParser parser = CSVParser.parse(body, FORMAT)) {
      for (CSVRecord record : parser) {
        lastLine = parser.getCurrentLineNumber();
        if (record.size() == 1 && record.get(0).isEmpty()) {
          continue; // a line of only spaces or tabs: Commons CSV skips only empty lines
        }
        records.add(new Row(lastLine, record.toList()));
      }
    } catch (IOException | UncheckedIOException | IllegalStateException e) {
      throw new TestDataException(
          source,
          startOfNextRecord(body, lastLine),
          null,
          null,
          "malformed CSV (" + describe(e) + ")",
          e);
    }
    if (records.isEmpty()) {
      throw new TestDataException(
          source, 0, null, null, "the file is empty: expected a header " + exampleHeader, null);
    }
    Row header = records.get(0);
    if (!header.cells().get(0).equals(firstColumn)) {
      throw new TestDataException(
          source,
          header.line(),
          null,
          shorten(String.join(",", header.cells())),
          "missing header: the first row must be a header such as " + exampleHeader,
          null);
    }
    Set<String> seen = new HashSet<>();
    for (String name : header.cells()) {
      if (name.isEmpty()) {
        throw new TestDataException(
            source, header.line(), null, null, "the header has an empty column name", null);
      }
      if (!seen.add(name)) {
        throw new TestDataException(
            source, header.line(), name, null, "the header names this column twice", null);
      }
    }
    List<Row> rows = records.subList(1, records.size());
    for (Row row : rows) {
      if (row.cells().size() != header.cells().size()) {
        throw new TestDataException(
            source,
            row.line(),
            null,
            shorten(String.join(",", row.cells())),
            String.format(
                Locale.ROOT,
                "the row has %d cells, the header %d",
                row.cells().size(),
                header.cells().size()),
            null);
      }
    }
    return new CsvTable(source, header, rows);
  }

  /**
   * The line where the record after a given line starts: the first line after it that is neither
   * blank nor a comment.
   */
  private static long startOfNextRecord(String body, long lastLine) {
    String[] lines = body.split("\r\n|\r|\n", -1);
    for (int i = (int) Math.min(lastLine, lines.length); i < lines.length; i++) {
      if (!lines[i].isBlank() && !lines[i].startsWith("#")) {
        return i + 1;
      }
    }
    return lastLine + 1;
  }

  private static String describe(Exception e) {
    Throwable t = e instanceof UncheckedIOException && e.getCause() != null ? e.getCause() : e;
    String message = t.getMessage();
    return message == null ? t.getClass().getSimpleName() : message;
  }

  /**
   * Shortens a text for a message.
   *
   * @param text any text
   * @return the text, cut to at most 40 characters with an ellipsis
   */
  public static String shorten(String text) {
    return text.length() <= MAX_SHOWN ? text : text.substring(0, MAX_SHOWN) + "...";
  }

  /**
   * The file name, for messages.
   *
   * @return the source
   */
  public String source() {
    return source;
  }

  /**
   * The header row.
   *
   * @return the header
   */
  public Row header() {
    return header;
  }

  /**
   * The data rows, in file order.
   *
   * @return an unmodifiable list
   */
  public List<Row> rows() {
    return rows;
  }

  private TestDataException numberError(Row row, String column, String cell, String problem) {
    return new TestDataException(source, row.line(), column, shorten(cell), problem, null);
  }

  /**
   * Parses a decimal number strictly (digits, optional point, optional exponent).
   *
   * @param row the row
   * @param column the column header, for messages
   * @param cell the cell text
   * @return the number, finite
   * @throws TestDataException if the cell is empty, not a decimal number (NaN and Infinity
   *     included), or out of the range of a double
   */
  public double number(Row row, String column, String cell) {
    if (cell.isEmpty()) {
      throw numberError(row, column, cell, "empty cell: a number is needed");
    }
    if (!DECIMAL.matcher(cell).matches()) {
      throw numberError(row, column, cell, "not a decimal number");
    }
    double value = Double.parseDouble(cell);
    if (!Double.isFinite(value)) {
      throw numberError(row, column, cell, "number out of range");
    }
    return value;
  }

  /**
   * Parses a number in a declared unit and converts it to SI.
   *
   * @param row the row
   * @param column the column header, for messages
   * @param cell the cell text
   * @param unit the declared unit
   * @return the value in SI units, finite
   * @throws TestDataException as {@link #number}, or if the SI value overflows
   */
  public double si(Row row, String column, String cell, LabUnit unit) {
    double value = number(row, column, cell);
    try {
      return unit.toSi(value);
    } catch (IllegalArgumentException e) {
      throw numberError(row, column, cell, "number out of range");
    }
  }

  /**
   * An error about one cell.
   *
   * @param row the row
   * @param column the column header
   * @param cell the cell text
   * @param problem what is wrong
   * @return the exception, to throw
   */
  public TestDataException error(Row row, String column, String cell, String problem) {
    return error(row, column, cell, problem, null);
  }

  /**
   * An error about one cell, revealed by another exception (a value type refusing the value).
   *
   * @param row the row
   * @param column the column header
   * @param cell the cell text
   * @param problem what is wrong
   * @param cause the exception that revealed the problem, or null
   * @return the exception, to throw
   */
  public TestDataException error(
      Row row, String column, String cell, String problem, Throwable cause) {
    return new TestDataException(
        source, row.line(), column, cell == null ? null : shorten(cell), problem, cause);
  }

  /**
   * Splits a column or property name into a known base and a declared unit: {@code elapsed_min}
   * into {@code elapsed} and {@link LabUnit#MINUTE}.
   *
   * @param name the name, e.g. {@code stress_after_kPa}
   * @param base the base it must start with, e.g. {@code stress_after}
   * @param quantity the quantity the unit must measure
   * @param line the line of the name, for messages
   * @return the unit
   * @throws TestDataException if the unit is missing, unknown or of another quantity
   */
  public LabUnit unitOf(String name, String base, LabUnit.Quantity quantity, long line) {
    String accepted =
        "use one of: "
            + LabUnit.headerTokens(quantity)
                .replace(", ", ", " + base + "_")
                .replaceFirst("^", base + "_");
    if (name.equals(base)) {
      throw new TestDataException(source, line, name, null, "no unit declared: " + accepted, null);
    }
    String token = name.substring(base.length() + 1);
    LabUnit unit = LabUnit.forHeaderToken(token).orElse(null);
    if (unit == null || unit.quantity() != quantity) {
      throw new TestDataException(
          source,
          line,
          name,
          null,
          "unknown unit '" + shorten(token) + "' for " + base + ": " + accepted,
          null);
    }
    return unit;
  }
}
