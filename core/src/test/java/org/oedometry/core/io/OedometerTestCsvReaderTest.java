package org.oedometry.core.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.assertj.core.api.AbstractThrowableAssert;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.DataWarning;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.core.Units;
import org.oedometry.theory.Drainage;

/** The documented format read from an invented example, and the catalogue of bad input. */
class OedometerTestCsvReaderTest {

  static final String PROPERTIES =
      """
      # invented example data
      property,value
      project,Invented demo
      sample,S1
      initial_height_mm,20.0
      diameter_mm,75.0
      specific_gravity,2.70
      dry_mass_g,120.0
      initial_water_content_percent,36
      drainage,double
      drainage_path_rule,mean_height
      """;

  static final String INCREMENTS =
      """
      increment,stress_before_kPa,stress_after_kPa
      1,0,50
      2,50,100
      3,100,25
      """;

  static final String READINGS =
      """
      increment,elapsed_min,settlement_mm
      1,0,0
      1,1,0.2
      1,1440,0.5
      2,0,0
      2,1,0.4
      2,1440,1.0
      3,0,0
      3,1,-0.1
      3,1440,-0.2
      """;

  private static OedometerTest parse(String properties, String increments, String readings) {
    return OedometerTestCsvReader.parse(new CsvTables(properties, increments, readings));
  }

  private static AbstractThrowableAssert<?, ? extends Throwable> assertBad(
      String properties, String increments, String readings) {
    return assertThatThrownBy(() -> parse(properties, increments, readings))
        .isInstanceOf(TestDataException.class);
  }

  private static SettlementCurve curveMm(double... settlementMm) {
    double[] s = new double[settlementMm.length];
    for (int i = 0; i < s.length; i++) {
      s[i] = Units.millimetresToMetres(settlementMm[i]);
    }
    return SettlementCurve.of(new double[] {0, 60, 86_400}, s);
  }

  @Test
  @DisplayName("the documented example reads to the test built by hand in SI units")
  void readsExample() {
    OedometerTest expected =
        OedometerTest.builder(
                Specimen.builder()
                    .initialHeight(0.020)
                    .diameter(0.075)
                    .specificGravity(2.70)
                    .dryMass(0.120)
                    .initialWaterContent(0.36)
                    .build())
            .drainage(Drainage.DOUBLE)
            .drainagePathRule(DrainagePathRule.MEAN_HEIGHT)
            .identifiers(TestIdentifiers.of("Invented demo", "", "S1", ""))
            .addIncrement(LoadIncrement.of(0, 50e3, curveMm(0, 0.2, 0.5)))
            .addIncrement(LoadIncrement.of(50e3, 100e3, curveMm(0, 0.4, 1.0)))
            .addIncrement(LoadIncrement.of(100e3, 25e3, curveMm(0, -0.1, -0.2)))
            .build();
    assertThat(parse(PROPERTIES, INCREMENTS, READINGS)).isEqualTo(expected);
  }

  @Test
  @DisplayName("other units, CRLF line ends, a byte-order mark and defaults")
  void otherUnits() {
    String properties =
        "\uFEFFproperty,value\r\ninitial_height_m,0.02\r\narea_cm2,44.1786\r\n"
            + "specific_gravity,2.65\r\nfinal_water_content_ratio,0.31\r\n";
    String increments = "increment,stress_before_MPa,stress_after_Pa\r\n1,0.0,6000\r\n";
    String readings = "increment,elapsed_h,settlement_um\r\n1,0.5,12\r\n1,24,80\r\n";
    OedometerTest t = parse(properties, increments, readings);
    assertThat(t.specimen().areaSquareMetres()).isCloseTo(44.1786e-4, within(1e-12));
    assertThat(t.increments().get(0).curve().elapsedSeconds()).containsExactly(1800, 86_400);
    assertThat(t.increments().get(0).curve().settlementMetres())
        .containsExactly(new double[] {12e-6, 80e-6}, within(1e-18));
    assertThat(t.drainage()).isEqualTo(Drainage.DOUBLE);
    assertThat(t.drainagePathRule()).isEqualTo(DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION);
  }

  @Test
  @DisplayName("gauge readings with a falling dial and an apparatus calibration (worked by hand)")
  void gaugeReadings() {
    String properties =
        PROPERTIES + "gauge_zero_mm,10.000\ngauge_direction,decreases_with_compression\n";
    String increments =
        """
        increment,stress_before_kPa,stress_after_kPa,apparatus_deflection_um
        1,0,50,10
        2,50,100,25
        """;
    String readings =
        """
        increment,elapsed_min,gauge_mm
        1,0,9.990
        1,1440,9.500
        2,0.1,9.400
        2,1440,8.600
        """;
    OedometerTest t = parse(properties, increments, readings);
    // By hand: increment 1 travels 10.000 - 9.500 = 0.500 mm, less 0.010 mm of apparatus
    // = 0.490 mm; the zero reading 0.010 - 0.010 = 0. Increment 2 starts at 9.500:
    // 9.500 - 8.600 = 0.900 mm, less (0.025 - 0.010) mm = 0.885 mm.
    SettlementCurve c1 = t.increments().get(0).curve();
    SettlementCurve c2 = t.increments().get(1).curve();
    assertThat(c1.settlementMetres()).containsExactly(new double[] {0, 0.490e-3}, within(1e-15));
    assertThat(c2.settlementMetres())
        .containsExactly(new double[] {0.085e-3, 0.885e-3}, within(1e-15));
    assertThat(t.finalHeightMetres()).isCloseTo(0.020 - 1.375e-3, within(1e-15));
  }

  @Test
  @DisplayName("apparatus correction applies to settlement readings too")
  void apparatusWithSettlements() {
    String increments =
        """
        increment,stress_before_kPa,stress_after_kPa,apparatus_deflection_mm
        1,0,50,0.01
        2,50,100,0.02
        3,100,25,0.005
        """;
    OedometerTest t = parse(PROPERTIES, increments, READINGS);
    assertThat(t.increments().get(0).curve().finalSettlementMetres())
        .isCloseTo(0.49e-3, within(1e-15));
    assertThat(t.increments().get(1).curve().finalSettlementMetres())
        .isCloseTo(0.99e-3, within(1e-15));
    assertThat(t.increments().get(2).curve().finalSettlementMetres())
        .isCloseTo(-0.185e-3, within(1e-15));
  }

  @Test
  @DisplayName(
      "blank lines of spaces or tabs (a hand-edited file, CRLF or LF) are ignored, as the package"
          + " documentation says of blank lines: the same test as the clean files")
  void blankLinesOfSpaces() {
    OedometerTest clean = parse(PROPERTIES, INCREMENTS, READINGS);
    assertThat(
            parse(
                PROPERTIES + "   \n\t\n",
                INCREMENTS.replace("1,0,50\n", "1,0,50\n  \t \n").replace("\n", "\r\n"),
                READINGS.replace("2,0,0\n", " \n2,0,0\n") + "\n \n"))
        .isEqualTo(clean);
    // A row with cells still counts: spaces around commas do not make a blank line.
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("2,0,0\n", " , , \n2,0,0\n"))
        .hasMessage(
            "readings.csv line 5, column increment, value '': not an increment number (a"
                + " whole number >= 1)");
  }

  @Test
  @DisplayName("G_s outside 2.0-3.2 reads with a warning (peat-like 1.8)")
  void unusualSpecificGravityWarns() {
    OedometerTest t =
        parse(
            PROPERTIES.replace("specific_gravity,2.70", "specific_gravity,1.8"),
            INCREMENTS,
            READINGS);
    // With G_s 1.8 the 120 g of solids fill H_s = 0.120 / (1.8 x 1000 x 4.4179e-3 m^2) = 15.09 mm
    // of the 20 mm, so e0 = 0.325 and S0 = 0.36 x 1.8 / 0.325 = 1.99 (by hand): the phase check
    // notices the inconsistency too.
    assertThat(t.warnings())
        .extracting(DataWarning::kind)
        .containsExactly(
            DataWarning.Kind.UNUSUAL_SPECIFIC_GRAVITY, DataWarning.Kind.SATURATION_ABOVE_ONE);
    assertThat(t.warnings().get(1).message()).contains("= 1.99");
  }

  @Test
  @DisplayName("bad input: empty file, comments only, missing header")
  void emptyAndMissingHeader() {
    assertBad("", INCREMENTS, READINGS)
        .hasMessage("properties.csv: the file is empty: expected a header property,value");
    assertBad(PROPERTIES, "# nothing here\n\n", READINGS)
        .hasMessageStartingWith("increments.csv: the file is empty");
    assertBad(PROPERTIES, "1,0,50\n2,50,100\n", READINGS)
        .hasMessage(
            "increments.csv line 1, value '1,0,50': missing header: the first row must be a"
                + " header such as increment,stress_before_kPa,stress_after_kPa");
    assertBad("key,value\ninitial_height_mm,20\n", INCREMENTS, READINGS)
        .hasMessageContaining("missing header");
  }

  @Test
  @DisplayName("bad input: unknown unit, missing unit, unit of the wrong quantity")
  void unknownUnit() {
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("elapsed_min", "elapsed_fortnight"))
        .hasMessage(
            "readings.csv line 1, column elapsed_fortnight: unknown unit 'fortnight' for elapsed:"
                + " use one of: elapsed_s, elapsed_min, elapsed_h, elapsed_d, elapsed_yr");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("settlement_mm", "settlement"))
        .hasMessage(
            "readings.csv line 1, column settlement: no unit declared: use one of: settlement_m,"
                + " settlement_mm, settlement_um");
    assertBad(PROPERTIES, INCREMENTS.replace("stress_after_kPa", "stress_after_mm"), READINGS)
        .hasMessageStartingWith(
            "increments.csv line 1, column stress_after_mm: unknown unit 'mm' for stress_after");
    assertBad(PROPERTIES.replace("initial_height_mm", "initial_height_MM"), INCREMENTS, READINGS)
        .hasMessageStartingWith(
            "properties.csv line 5, column initial_height_MM: unknown unit 'MM'");
  }

  @Test
  @DisplayName("bad input: non-numeric cell, NaN, infinity, hexadecimal, empty, overflow")
  void nonNumeric() {
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "1,1,abc"))
        .hasMessage("readings.csv line 3, column settlement_mm, value 'abc': not a decimal number");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "1,1,NaN"))
        .hasMessage("readings.csv line 3, column settlement_mm, value 'NaN': not a decimal number");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "1,Infinity,0.2"))
        .hasMessage(
            "readings.csv line 3, column elapsed_min, value 'Infinity': not a decimal number");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "2,50,0x64"), READINGS)
        .hasMessageContaining("value '0x64': not a decimal number");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "2,50,"), READINGS)
        .hasMessage(
            "increments.csv line 3, column stress_after_kPa, value '': empty cell: a"
                + " number is needed");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "2,50,1e400"), READINGS)
        .hasMessageContaining("value '1e400': number out of range");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "2,50,1e307"), READINGS)
        .hasMessageContaining("value '1e307': number out of range");
  }

  @Test
  @DisplayName("bad input: negative height, G_s outside (1.0, 6.0], inconsistent specimen")
  void badSpecimen() {
    assertBad(
            PROPERTIES.replace("initial_height_mm,20.0", "initial_height_mm,-20"),
            INCREMENTS,
            READINGS)
        .hasMessage("properties.csv line 5, column initial_height_mm, value '-20': must be > 0");
    assertBad(
            PROPERTIES.replace("specific_gravity,2.70", "specific_gravity,7.1"),
            INCREMENTS,
            READINGS)
        .hasMessage(
            "properties.csv line 7, column specific_gravity, value '7.1': must be > 1.0 and <="
                + " 6.0");
    assertBad(PROPERTIES.replace("dry_mass_g,120.0", "dry_mass_g,500"), INCREMENTS, READINGS)
        .hasMessageStartingWith(
            "properties.csv line 8, column dry_mass_g, value '500': height of solids (0.0419");
    assertBad(PROPERTIES.replace("diameter_mm,75.0\n", ""), INCREMENTS, READINGS)
        .hasMessage("properties.csv: the specimen needs a diameter or an area");
    assertBad(PROPERTIES.replace("initial_height_mm,20.0\n", ""), INCREMENTS, READINGS)
        .hasMessage(
            "properties.csv: missing property initial_height_<unit>, e.g. initial_height_mm");
  }

  @Test
  @DisplayName("bad input: unknown, duplicate or badly chosen properties")
  void badProperties() {
    assertBad(PROPERTIES + "colour,grey\n", INCREMENTS, READINGS)
        .hasMessageStartingWith(
            "properties.csv line 12, column property, value 'colour':"
                + " unknown property; known: specific_gravity, drainage");
    assertBad(PROPERTIES + "initial_height_m,0.02\n", INCREMENTS, READINGS)
        .hasMessage(
            "properties.csv line 12, column property, value 'initial_height_m': given twice"
                + " (also at line 5)");
    assertBad(PROPERTIES.replace("drainage,double", "drainage,both"), INCREMENTS, READINGS)
        .hasMessage(
            "properties.csv line 10, column drainage, value 'both': unknown choice; use one of:"
                + " double, single");
    assertBad(PROPERTIES.replace("sample,S1", "sample,\"S\n1\""), INCREMENTS, READINGS)
        .hasMessage(
            "properties.csv line 5, column sample, value 'S\n1': sample contains a control"
                + " character (U+000A) at index 1");
    assertBad(PROPERTIES + "gauge_zero_mm,5\n", INCREMENTS, READINGS)
        .hasMessageStartingWith(
            "properties.csv line 12, column gauge_zero_mm: gauge properties are given but the"
                + " readings are settlements");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("settlement_mm", "gauge_mm"))
        .hasMessage(
            "readings.csv line 1, column gauge_mm: gauge readings need the properties"
                + " gauge_zero_<unit> and gauge_direction");
  }

  @Test
  @DisplayName("bad input: increments out of order, missing, stress unchanged or discontinuous")
  void badIncrements() {
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "3,50,100"), READINGS)
        .hasMessage(
            "increments.csv line 3, column increment, value '3': increments out of order:"
                + " expected increment 2");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "2,50,50"), READINGS)
        .hasMessage(
            "increments.csv line 3, column stress_after_kPa, value '50': stress after equals the"
                + " stress before: an increment must change the stress");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "2,60,100"), READINGS)
        .hasMessage(
            "increments.csv line 3, column stress_before_kPa, value '60': stress before is not"
                + " the stress after the previous increment (50000.0 Pa)");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "2,50,-100"), READINGS)
        .hasMessageContaining("value '-100': stress after must be > 0");
    assertBad(PROPERTIES, INCREMENTS.replace("2,50,100", "two,50,100"), READINGS)
        .hasMessageContaining("value 'two': not an increment number");
    assertBad(PROPERTIES, "increment,stress_before_kPa,stress_after_kPa\n", READINGS)
        .hasMessage("increments.csv: no increments");
    assertBad(PROPERTIES, INCREMENTS.replace("stress_before_kPa", "load_kN"), READINGS)
        .hasMessageStartingWith("increments.csv line 1, column load_kN: unknown column");
  }

  @Test
  @DisplayName("bad input: duplicate and decreasing times, readings out of order or missing")
  void badReadings() {
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("2,1,0.4", "2,0,0.4"))
        .hasMessage(
            "readings.csv line 6, column elapsed_min, value '0': duplicate elapsed time (also at"
                + " line 5)");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("2,1440,1.0", "2,0.5,1.0"))
        .hasMessage(
            "readings.csv line 7, column elapsed_min, value '0.5': elapsed time is before that of"
                + " the previous reading (line 6)");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("2,1,0.4", "1,2000,0.4"))
        .hasMessageContaining("line 6, column increment, value '1': readings out of order");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("3,", "4,"))
        .hasMessage(
            "readings.csv line 8, column increment, value '4': no such increment: the increments"
                + " file lists 3");
    assertBad(PROPERTIES, INCREMENTS, READINGS.substring(0, READINGS.indexOf("3,0,0")))
        .hasMessage("readings.csv: increment 3 has no readings");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("2,", "3,"))
        .hasMessageContaining("increment 2 has no readings");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("3,1,-0.1\n3,1440,-0.2\n", ""))
        .hasMessage(
            "readings.csv line 8, column increment, value '3': increment 3 has 1 reading; a"
                + " settlement curve needs at least 2");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "1,-1,0.2"))
        .hasMessageContaining("value '-1': elapsed time must be >= 0");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1440,0.5", "1,1440,12"))
        .hasMessageStartingWith(
            "readings.csv line 4, column settlement_mm, value '12': specimen height at reading"
                + " 2");
  }

  @Test
  @DisplayName("bad input: malformed CSV and ragged rows")
  void malformed() {
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "1,1,\"0.2"))
        .hasMessageStartingWith("readings.csv line 3: malformed CSV");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "\n# note\n1,1,\"0.2\"x"))
        .hasMessageStartingWith("readings.csv line 5: malformed CSV (Invalid character");
    assertBad(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "1,1"))
        .hasMessage("readings.csv line 3, value '1,1': the row has 2 cells, the header 3");
    assertBad(PROPERTIES, "increment,increment\n", READINGS)
        .hasMessage("increments.csv line 1, column increment: the header names this column twice");
  }

  @Test
  @DisplayName("exception parts are available to a host program")
  void exceptionParts() {
    TestDataException e =
        org.junit.jupiter.api.Assertions.assertThrows(
            TestDataException.class,
            () -> parse(PROPERTIES, INCREMENTS, READINGS.replace("1,1,0.2", "1,1,abc")));
    assertThat(e.source()).isEqualTo("readings.csv");
    assertThat(e.line()).hasValue(3);
    assertThat(e.column()).hasValue("settlement_mm");
    assertThat(e.value()).hasValue("abc");
    assertThat(e.problem()).isEqualTo("not a decimal number");
    assertThat(e).isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  @DisplayName("read(Path): files by name; missing file is an IOException; bad UTF-8 is data")
  void readsDirectory(@TempDir Path dir) throws IOException {
    Files.writeString(dir.resolve("properties.csv"), PROPERTIES, StandardCharsets.UTF_8);
    Files.writeString(dir.resolve("increments.csv"), INCREMENTS, StandardCharsets.UTF_8);
    assertThatThrownBy(() -> OedometerTestCsvReader.read(dir))
        .isInstanceOf(NoSuchFileException.class);
    Files.writeString(dir.resolve("readings.csv"), READINGS, StandardCharsets.UTF_8);
    assertThat(OedometerTestCsvReader.read(dir)).isEqualTo(parse(PROPERTIES, INCREMENTS, READINGS));
    Files.write(dir.resolve("readings.csv"), new byte[] {'a', (byte) 0xff, (byte) 0xfe, '\n'});
    assertThatThrownBy(() -> OedometerTestCsvReader.read(dir))
        .isInstanceOf(TestDataException.class)
        .hasMessageEndingWith("readings.csv: not UTF-8 text");
    Files.writeString(
        dir.resolve("readings.csv"), READINGS.replace("1,1,0.2", "1,1,x"), StandardCharsets.UTF_8);
    assertThatThrownBy(() -> OedometerTestCsvReader.read(dir))
        .isInstanceOf(TestDataException.class)
        .hasMessage(
            dir.resolve("readings.csv")
                + " line 3, column settlement_mm, value 'x': not a"
                + " decimal number");
  }

  @Test
  @DisplayName(
      "read(Path) names the path in every IOException: a directory where readings.csv should be,"
          + " a regular file or a missing path given as the directory (java.nio.file"
          + " FileSystemException: getFile() is the file involved, getMessage() starts with it)")
  void readNamesThePathThatCannotBeRead(@TempDir Path dir) throws IOException {
    Files.writeString(dir.resolve("properties.csv"), PROPERTIES, StandardCharsets.UTF_8);
    Files.writeString(dir.resolve("increments.csv"), INCREMENTS, StandardCharsets.UTF_8);
    Path readings = Files.createDirectory(dir.resolve("readings.csv"));
    assertThatThrownBy(() -> OedometerTestCsvReader.read(dir))
        .isInstanceOf(FileSystemException.class)
        .hasMessage(readings + ": is a directory, not a file")
        .hasCauseInstanceOf(IOException.class)
        .satisfies(
            e -> assertThat(((FileSystemException) e).getFile()).isEqualTo(readings.toString()));
    Path file = dir.resolve("properties.csv");
    assertThatThrownBy(() -> OedometerTestCsvReader.read(file))
        .isInstanceOf(FileSystemException.class)
        .hasMessageStartingWith(file + ": not a directory")
        .satisfies(e -> assertThat(((FileSystemException) e).getFile()).isEqualTo(file.toString()));
    Path missing = dir.resolve("no-such-folder");
    assertThatThrownBy(() -> OedometerTestCsvReader.read(missing))
        .isInstanceOf(NoSuchFileException.class)
        .hasMessage(missing + ": no such directory")
        .satisfies(
            e -> assertThat(((FileSystemException) e).getFile()).isEqualTo(missing.toString()));
  }

  @Test
  @DisplayName(
      "apparatus deflections and readings near 1e308 m whose difference passes the largest double"
          + " (about 1.8e308, IEEE 754): refused with the file, line, column and value as written"
          + " (package documentation), never quoting Infinity (project rule)")
  void deflectionBeyondTheDoubleRange() {
    String settlements =
        """
        increment,elapsed_min,settlement_m
        1,0,0
        1,1,1e308
        2,0,0
        2,1,0.001
        """;
    // Change of deflection 1e308 m -> -1e308 m: -2e308 m.
    assertBad(
            PROPERTIES,
            """
            increment,stress_before_kPa,stress_after_kPa,apparatus_deflection_m
            1,0,50,1e308
            2,50,100,-1e308
            """,
            settlements)
        .hasMessage(
            "increments.csv line 3, column apparatus_deflection_m, value '-1e308': the change from"
                + " the apparatus deflection of increment 1 (line 2, value '1e308') is beyond the"
                + " range of a double")
        .hasMessageNotContaining("Infinity");
    // Settlement 1e308 m less a deflection change of -1e308 m: 2e308 m.
    String increments =
        """
        increment,stress_before_kPa,stress_after_kPa,apparatus_deflection_m
        1,0,50,-1e308
        2,50,100,-1e308
        """;
    assertBad(PROPERTIES, increments, settlements)
        .hasMessage(
            "readings.csv line 3, column settlement_m, value '1e308': the settlement (1.0E308 m)"
                + " less the change of the apparatus deflection over increment 1 (-1.0E308 m,"
                + " increments.csv line 2) is beyond the range of a double")
        .hasMessageNotContaining("Infinity");
    // Gauge travel 1e308 m from a zero of 0 (the dial rises with compression), less -1e308 m.
    String gaugeProperties =
        PROPERTIES + "gauge_zero_m,0\ngauge_direction,increases_with_compression\n";
    String gauge = settlements.replace("settlement_m", "gauge_m").replace("2,0,0", "2,0,1e308");
    assertBad(gaugeProperties, increments, gauge)
        .hasMessage(
            "readings.csv line 3, column gauge_m, value '1e308': the gauge travel (1.0E308 m)"
                + " less the change of the apparatus deflection over increment 1 (-1.0E308 m,"
                + " increments.csv line 2) is beyond the range of a double")
        .hasMessageNotContaining("Infinity");
    // Gauge travel itself beyond the range: from 1e308 (the last reading of increment 1) to
    // -1e308 in increment 2.
    assertBad(
            gaugeProperties,
            increments
                .replace("1,0,50,-1e308", "1,0,50,0")
                .replace("2,50,100,-1e308", "2,50,100,0"),
            gauge.replace("2,1,0.001", "2,1,-1e308"))
        .hasMessage(
            "readings.csv line 5, column gauge_m, value '-1e308': gauge travel from the reference"
                + " reading (1.0E308 m) to the reading (-1.0E308 m) is beyond the range of a"
                + " double")
        .hasMessageNotContaining("Infinity");
  }
}
