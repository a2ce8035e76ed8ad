package org.oedometry.theory;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A reference CSV from the test resources: '#' comment lines (provenance), one header line, then
 * rows of decimal numbers, kept as {@link BigDecimal} so that expected values are not rounded to
 * double before the comparison.
 */
final class ReferenceTable {

  private final List<String> columns;
  private final List<BigDecimal[]> rows;

  private ReferenceTable(List<String> columns, List<BigDecimal[]> rows) {
    this.columns = columns;
    this.rows = rows;
  }

  static ReferenceTable load(String resource) {
    try (InputStream in = ReferenceTable.class.getResourceAsStream(resource)) {
      if (in == null) {
        throw new IllegalStateException("missing test resource " + resource);
      }
      BufferedReader reader =
          new BufferedReader(new InputStreamReader(in, StandardCharsets.US_ASCII));
      List<String> header = null;
      List<BigDecimal[]> data = new ArrayList<>();
      String line;
      while ((line = reader.readLine()) != null) {
        if (line.isBlank() || line.startsWith("#")) {
          continue;
        }
        String[] cells = line.split(",");
        if (header == null) {
          header = Arrays.stream(cells).map(String::trim).toList();
          continue;
        }
        BigDecimal[] row = new BigDecimal[cells.length];
        for (int i = 0; i < cells.length; i++) {
          row[i] = new BigDecimal(cells[i].trim());
        }
        data.add(row);
      }
      if (header == null || data.isEmpty()) {
        throw new IllegalStateException("empty reference table " + resource);
      }
      return new ReferenceTable(header, data);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  int column(String name) {
    int index = columns.indexOf(name);
    if (index < 0) {
      throw new IllegalStateException("no column " + name + " in " + columns);
    }
    return index;
  }

  List<BigDecimal[]> rows() {
    return rows;
  }

  /** |actual - expected| evaluated exactly, then rounded to double. */
  static double absoluteError(double actual, BigDecimal expected) {
    return new BigDecimal(actual).subtract(expected).abs().doubleValue();
  }

  /** |actual - expected| / |expected|, exact difference. */
  static double relativeError(double actual, BigDecimal expected) {
    return absoluteError(actual, expected) / expected.abs().doubleValue();
  }
}
