package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.fitting.CvMethod;

class CsvReportTest {

  /** Julian year, s (FACTS: name the year). */
  private static final double YEAR = 365.25 * 86_400;

  private static final TestReport REPORT = ReductionFixtures.mixedReport();

  private static List<CSVRecord> parse(String text) throws IOException {
    try (CSVParser p =
        CSVParser.parse(
            new StringReader(text),
            CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get())) {
      return p.getRecords();
    }
  }

  /** Checks a field against a value converted here with the literal factor. */
  private static void check(CSVRecord row, String column, OptionalDouble si, double factor) {
    String field = row.get(column);
    if (si.isEmpty()) {
      assertThat(field).as(column).isEmpty();
    } else {
      double expected = si.getAsDouble() * factor;
      assertThat(Double.parseDouble(field))
          .as(column)
          .isCloseTo(expected, within(1e-12 * Math.abs(expected)));
    }
  }

  private static OptionalDouble none() {
    return OptionalDouble.empty();
  }

  private static OptionalDouble of(double v) {
    return OptionalDouble.of(v);
  }

  @Test
  @DisplayName(
      "Read back with Commons CSV (RFC 4180), every field equals the report's value in the unit its"
          + " header names (kPa = Pa/1000, mm = m*1000, min = s/60, m2/yr = m2/s * 31557600 for a"
          + " Julian year, m2/MN = 1e6 / Pa); absent values are empty")
  void everyValueReadsBack() throws IOException {
    assertThat(readsBack(REPORT)).isTrue();
  }

  static Stream<Arguments> unusualShapes() {
    return IntStream.range(0, ReductionFixtures.SHAPE_NAMES.size())
        .mapToObj(
            i ->
                Arguments.of(
                    ReductionFixtures.SHAPE_NAMES.get(i),
                    ReductionFixtures.unusualShapes().get(i)));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("unusualShapes")
  @DisplayName(
      "Unusual tests (one increment; load, unload, reload; swelling; flat readings) read back with"
          + " Commons CSV (RFC 4180) to the report's values cell by cell, as above")
  void unusualShapesReadBack(String name, TestReport report) throws IOException {
    readsBack(report);
  }

  /**
   * Reads the CSV of a report back and checks every cell against the report.
   *
   * @return whether some c_v was absent
   */
  private static boolean readsBack(TestReport report) throws IOException {
    String text = report.toCsv();
    List<CSVRecord> rows = parse(text);
    assertThat(rows).hasSize(report.increments().size());
    try (CSVParser p = CSVParser.parse(new StringReader(text), CSVFormat.RFC4180)) {
      List<CSVRecord> all = p.getRecords();
      assertThat(all.get(0).toList()).isEqualTo(report.csvHeaders());
      for (CSVRecord r : all) {
        assertThat(r.size()).isEqualTo(report.csvHeaders().size());
      }
    }
    boolean sawAbsentCv = false;
    for (int j = 0; j < rows.size(); j++) {
      CSVRecord row = rows.get(j);
      IncrementReport inc = report.increments().get(j);
      assertThat(row.get("increment")).isEqualTo(Integer.toString(j + 1));
      check(row, "stress before (kPa)", of(inc.stressBeforePascals()), 1e-3);
      check(row, "stress after (kPa)", of(inc.stressAfterPascals()), 1e-3);
      assertThat(row.get("direction")).isEqualTo(inc.direction().name());
      assertThat(row.get("stress history"))
          .isEqualTo(inc.stressHistory().value().map(Enum::name).orElse(""));
      assertThat(row.get("drainage path rule")).isEqualTo(inc.drainagePath().rule().name());
      check(row, "drainage path (mm)", of(inc.drainagePath().drainagePathMetres()), 1000);
      check(row, "height for drainage path (mm)", of(inc.drainagePath().heightMetres()), 1000);
      check(row, "t50 log-time (min)", inc.t50(), 1 / 60.0);
      check(row, "t90 root-time (min)", inc.t90(), 1 / 60.0);
      for (CvMethod m : report.options().methods()) {
        String column = "cv " + ReportUnits.shortName(m) + " (m2/yr)";
        check(row, column, inc.cv(m), YEAR);
        sawAbsentCv |= inc.cv(m).isEmpty();
        String k = "k " + ReportUnits.shortName(m) + " (m/s)";
        Double kValue = inc.outcome(m).orElseThrow().permeability().value().orElse(null);
        check(row, k, kValue == null ? OptionalDouble.empty() : of(kValue), 1);
      }
      assertThat(row.get("preferred method"))
          .isEqualTo(inc.preferredMethod().map(Enum::name).orElse(""));
      check(row, "d0 (mm)", inc.d0(), 1000);
      check(row, "d100 (mm)", inc.d100(), 1000);
      check(row, "primary ratio", inc.primaryRatio(), 1);
      assertThat(row.get("e - log stress point at")).isEqualTo(inc.deformationBasis().name());
      IncrementCompressibility c = inc.compressibility().value().orElse(null);
      check(row, "void ratio at start", c == null ? none() : of(c.startVoidRatio()), 1);
      check(row, "void ratio at end", c == null ? none() : of(c.endVoidRatio()), 1);
      check(row, "av (m2/MN)", c == null ? none() : of(c.coefficientOfCompressibility()), 1e6);
      check(row, "mv (m2/MN)", c == null ? none() : of(c.mv()), 1e6);
      var sc = inc.secondaryCompression().value();
      check(
          row,
          "C_alpha_e",
          sc.isPresent() ? of(sc.get().secondaryCompressionIndex()) : OptionalDouble.empty(),
          1);
      check(
          row,
          "C_alpha_eps",
          sc.isPresent()
              ? of(sc.get().modifiedSecondaryCompressionIndex())
              : OptionalDouble.empty(),
          1);
      for (ReductionWarning w : inc.warnings()) {
        assertThat(row.get("warnings")).contains(w.message());
      }
    }
    return sawAbsentCv;
  }

  @Test
  @DisplayName("Headers are trade terms or plain words, each quantity with its unit in parentheses")
  void headersNameTheirUnits() {
    for (String h : REPORT.csvHeaders()) {
      assertThat(h).matches("[A-Za-z0-9_ ()/.%-]+");
    }
    assertThat(REPORT.csvHeaders())
        .contains("cv log-time (m2/yr)", "mv (m2/MN)", "k log-time (m/s)", "t50 log-time (min)");
  }

  @Test
  @DisplayName("RFC 4180 quoting: commas, quotes and line breaks are quoted, quotes doubled")
  void quotesFieldsThatNeedIt() {
    assertThat(CsvReport.quote("plain")).isEqualTo("plain");
    assertThat(CsvReport.quote("a,b")).isEqualTo("\"a,b\"");
    assertThat(CsvReport.quote("say \"x\"")).isEqualTo("\"say \"\"x\"\"\"");
    assertThat(CsvReport.quote("two\nlines")).isEqualTo("\"two\nlines\"");
  }
}
