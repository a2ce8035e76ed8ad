package org.oedometry.core.io;

import static java.nio.charset.StandardCharsets.UTF_8;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.assertj.core.api.ThrowableAssert.ThrowingCallable;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.InvalidReadingException;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;

/**
 * Values that pass the reader's own checks, row by row, but that {@link Specimen} or {@link
 * OedometerTest} refuses once the reader builds the test. The {@link TestDataException} must name
 * the file's path and the line of the row that holds the value (or list the rows of a check over
 * the whole test), keep the value type's message and keep its exception as the cause.
 *
 * <p>Sources of the expectations: the package documentation and the reader's class Javadoc ("errors
 * name the file, line, column and value"); line numbers counted by hand in the text blocks below;
 * the value type's message for the same SI values, obtained by calling the value type directly (not
 * through the reader); the limits of a double from IEEE 754 (largest finite about 1.8e308, smallest
 * positive about 4.9e-324, from memory). All data are invented.
 */
class OedometerTestCsvReaderRefusedValuesTest {

  @TempDir Path dir;

  /**
   * An invented specimen in the writer's SI format. Lines: 1 comment, 2 header, 3 initial_height_m,
   * 4 diameter_m, 5 specific_gravity, 6 dry_mass_kg; a property appended is on line 7.
   */
  private static final String PROPERTIES =
      """
      # invented example data
      property,value
      initial_height_m,0.02
      diameter_m,0.075
      specific_gravity,2.7
      dry_mass_kg,0.12
      """;

  private static final String INCREMENTS =
      """
      increment,stress_before_Pa,stress_after_Pa
      1,0,50000
      2,50000,100000
      3,100000,25000
      """;

  /** Lines: 1 header; increment 1 on lines 2-4, increment 2 on 5-7, increment 3 on 8-10. */
  private static final String READINGS =
      """
      increment,elapsed_s,settlement_m
      1,0,0
      1,60,0.0002
      1,86400,0.0005
      2,0,0
      2,60,0.0004
      2,86400,0.001
      3,0,0
      3,60,-0.0001
      3,86400,-0.0002
      """;

  private static final double[] TIMES = {0, 60, 86_400};

  /** The increments of INCREMENTS with the given settlements (m) at TIMES, built directly. */
  private static List<LoadIncrement> increments(double[] s1, double[] s2, double[] s3) {
    return List.of(
        LoadIncrement.of(0, 50_000, SettlementCurve.of(TIMES, s1)),
        LoadIncrement.of(50_000, 100_000, SettlementCurve.of(TIMES, s2)),
        LoadIncrement.of(100_000, 25_000, SettlementCurve.of(TIMES, s3)));
  }

  /** The specimen of PROPERTIES, built directly. */
  private static Specimen.Builder specimen() {
    return Specimen.builder().initialHeight(0.02).diameter(0.075).specificGravity(2.7);
  }

  private Path file(String name) {
    return dir.resolve(name);
  }

  /**
   * Writes the three files, reads the directory and returns the exception, after the checks every
   * case shares.
   */
  private TestDataException refused(String properties, String increments, String readings)
      throws IOException {
    Files.writeString(file(CsvTables.PROPERTIES_FILE), properties, UTF_8);
    Files.writeString(file(CsvTables.INCREMENTS_FILE), increments, UTF_8);
    Files.writeString(file(CsvTables.READINGS_FILE), readings, UTF_8);
    TestDataException e =
        assertThrows(TestDataException.class, () -> OedometerTestCsvReader.read(dir));
    // Project rule (RULES.md): no NaN or Infinity leaves the library, also not in messages.
    assertThat(e.getMessage()).doesNotContain("NaN").doesNotContain("Infinity");
    // Task: the value type's exception is kept as the cause (an IllegalArgumentException from the
    // value type, or its InvalidReadingException, not one of the reader's own).
    assertThat(e.getCause())
        .isInstanceOf(IllegalArgumentException.class)
        .isNotInstanceOf(TestDataException.class);
    return e;
  }

  /** The message of the value type's own refusal of the same values (called directly). */
  private static String modelMessage(ThrowingCallable build) {
    Throwable refusal = catchThrowable(build);
    assertThat(refusal)
        .isInstanceOf(IllegalArgumentException.class)
        .isNotInstanceOf(TestDataException.class);
    return refusal.getMessage();
  }

  /** The checks of an error at one row: source, line, column, value, message and cause. */
  private static void assertAtRow(
      TestDataException e, Path source, long line, String column, String value, String text) {
    // Package documentation: the message names the file, line, column and value, in the form
    // "<file> line <n>, column <c>, value '<v>': <problem>" (TestDataException Javadoc).
    assertThat(e)
        .hasMessage(
            source + " line " + line + ", column " + column + ", value '" + value + "': " + text);
    assertThat(e.source()).isEqualTo(source.toString());
    assertThat(e.line()).hasValue(line);
    assertThat(e.column()).hasValue(column);
    assertThat(e.value()).hasValue(value);
  }

  @Test
  @DisplayName(
      "a diameter whose area pi D^2 / 4 leaves the double range (1e200 m: 7.9e399 m^2 above"
          + " 1.8e308; 1e-170 m: 7.9e-341 m^2 below 4.9e-324) names the diameter's row")
  void diameterWithAreaOutOfRange() throws IOException {
    for (String diameter : List.of("1e200", "1e-170")) {
      TestDataException e =
          refused(
              PROPERTIES.replace("diameter_m,0.075", "diameter_m," + diameter),
              INCREMENTS,
              READINGS);
      String model =
          modelMessage(
              () ->
                  Specimen.builder()
                      .initialHeight(0.02)
                      .diameter(Double.parseDouble(diameter))
                      .specificGravity(2.7)
                      .dryMass(0.12)
                      .build());
      // Line 4 holds diameter_m (counted by hand); Specimen's message kept as it is.
      assertAtRow(e, file(CsvTables.PROPERTIES_FILE), 4, "diameter_m", diameter, model);
      assertThat(e.getCause()).hasMessage(model);
    }
  }

  @Test
  @DisplayName("both a diameter and an area: the later row named, the other listed with its line")
  void diameterAndArea() throws IOException {
    TestDataException e = refused(PROPERTIES + "area_m2,0.0044\n", INCREMENTS, READINGS);
    String model = modelMessage(() -> specimen().area(0.0044).dryMass(0.12).build());
    // Line 7 holds area_m2, line 4 diameter_m (by hand); "(with ... at line n)" follows the
    // reader's "(also at line n)" for a property given twice.
    assertAtRow(
        e,
        file(CsvTables.PROPERTIES_FILE),
        7,
        "area_m2",
        "0.0044",
        model + " (with diameter_m at line 4)");
    assertThat(e.getCause()).hasMessage(model);
  }

  @Test
  @DisplayName(
      "a final water content above Specimen.MAX_WATER_CONTENT (15000 % = 150 as a ratio) names"
          + " its row")
  void finalWaterContentTooLarge() throws IOException {
    TestDataException e =
        refused(PROPERTIES + "final_water_content_percent,15000\n", INCREMENTS, READINGS);
    // 15000 % is 150 as a ratio (definition of per cent), above the documented limit of 100.
    String model = modelMessage(() -> specimen().dryMass(0.12).finalWaterContent(150).build());
    assertAtRow(
        e, file(CsvTables.PROPERTIES_FILE), 7, "final_water_content_percent", "15000", model);
    assertThat(e.getCause()).hasMessage(model);
  }

  @Test
  @DisplayName("an initial water content above Specimen.MAX_WATER_CONTENT (101) names its row")
  void initialWaterContentTooLarge() throws IOException {
    TestDataException e =
        refused(PROPERTIES + "initial_water_content_ratio,101\n", INCREMENTS, READINGS);
    String model = modelMessage(() -> specimen().dryMass(0.12).initialWaterContent(101).build());
    assertAtRow(e, file(CsvTables.PROPERTIES_FILE), 7, "initial_water_content_ratio", "101", model);
    assertThat(e.getCause()).hasMessage(model);
  }

  @Test
  @DisplayName(
      "a dry mass whose height of solids H_s = M_s / (G_s rho_w A) is not below the height,"
          + " beyond the double range, or too small for a void ratio names the dry mass's row and"
          + " lists the rows of height, diameter and G_s")
  void dryMassRefused() throws IOException {
    // By hand: A = pi 0.075^2 / 4 = 4.418e-3 m^2, G_s rho_w A = 11.93 kg/m.
    // 0.5 kg: H_s = 0.0419 m, not below H_0 = 0.02 m.
    // 1e308 kg with D = 1e-6 m (G_s rho_w A = 2.1e-9 kg/m): H_s about 4.7e316 m, above 1.8e308.
    // 1e-320 kg: H_s about 8.4e-322 m, and H_0 / H_s about 2.4e319, above 1.8e308.
    String[][] cases = {{"0.075", "0.5"}, {"1e-6", "1e308"}, {"0.075", "1e-320"}};
    for (String[] c : cases) {
      TestDataException e =
          refused(
              PROPERTIES
                  .replace("diameter_m,0.075", "diameter_m," + c[0])
                  .replace("dry_mass_kg,0.12", "dry_mass_kg," + c[1]),
              INCREMENTS,
              READINGS);
      String model =
          modelMessage(
              () ->
                  Specimen.builder()
                      .initialHeight(0.02)
                      .diameter(Double.parseDouble(c[0]))
                      .specificGravity(2.7)
                      .dryMass(Double.parseDouble(c[1]))
                      .build());
      // Lines 6, 3, 4, 5 hold dry_mass_kg, initial_height_m, diameter_m, specific_gravity.
      assertAtRow(
          e,
          file(CsvTables.PROPERTIES_FILE),
          6,
          "dry_mass_kg",
          c[1],
          model
              + " (with initial_height_m at line 3, diameter_m at line 4, specific_gravity at"
              + " line 5)");
      assertThat(e.getCause()).hasMessage(model);
    }
  }

  @Test
  @DisplayName(
      "a bulk density that with w_0 and G_s gives e_0 <= 0 names the bulk density's row and lists"
          + " the rows of w_0 and G_s")
  void bulkDensityRefused() throws IOException {
    // Phase relation (soil mechanics textbooks, from memory): e_0 = G_s rho_w (1 + w_0) / rho - 1
    // = 2.7 x 1000 x 1.36 / 10000 - 1 = -0.633 (by hand), not > 0.
    TestDataException e =
        refused(
            PROPERTIES + "initial_water_content_ratio,0.36\nbulk_density_kg_m3,10000\n",
            INCREMENTS,
            READINGS);
    String model =
        modelMessage(
            () -> specimen().dryMass(0.12).initialWaterContent(0.36).bulkDensity(10_000).build());
    assertAtRow(
        e,
        file(CsvTables.PROPERTIES_FILE),
        8,
        "bulk_density_kg_m3",
        "10000",
        model + " (with initial_water_content_ratio at line 7, specific_gravity at line 5)");
    assertThat(e.getCause()).hasMessage(model);
  }

  @Test
  @DisplayName(
      "a reading that takes the specimen height beyond the double range (1e308 m less -1e308 m)"
          + " names the reading's row")
  void readingHeightBeyondTheDoubleRange() throws IOException {
    String properties =
        """
        property,value
        initial_height_m,1e308
        area_m2,1
        specific_gravity,2.65
        final_water_content_ratio,0.5
        """;
    String increments = "increment,stress_before_Pa,stress_after_Pa\n1,0,50000\n";
    // Line 3 holds the reading -1e308 m: H = 1e308 + 1e308 = 2e308, above 1.8e308.
    String readings = "increment,elapsed_s,settlement_m\n1,0,0\n1,60,-1e308\n";
    TestDataException e = refused(properties, increments, readings);
    String model =
        modelMessage(
            () ->
                OedometerTest.of(
                    Specimen.builder()
                        .initialHeight(1e308)
                        .area(1)
                        .specificGravity(2.65)
                        .finalWaterContent(0.5)
                        .build(),
                    List.of(
                        LoadIncrement.of(
                            0,
                            50_000,
                            SettlementCurve.of(new double[] {0, 60}, new double[] {0, -1e308})))));
    assertAtRow(e, file(CsvTables.READINGS_FILE), 3, "settlement_m", "-1e308", model);
    assertThat(e.getCause()).hasMessage(model);
    // The value type points at the reading itself: increment 0, reading 1 (the row on line 3).
    assertThat(e.getCause()).isInstanceOf(InvalidReadingException.class);
    assertThat(((InvalidReadingException) e.getCause()).incrementIndex()).isZero();
    assertThat(((InvalidReadingException) e.getCause()).readingIndex()).isEqualTo(1);
  }

  @Test
  @DisplayName(
      "a reading whose height is not above the height of solids, or too large for a void ratio,"
          + " names the reading's row")
  void readingHeightRefused() throws IOException {
    // By hand: H_s = 0.12 / 11.93 = 0.01006 m; 0.02 - 0.012 = 0.008 m is not above it.
    TestDataException e =
        refused(PROPERTIES, INCREMENTS, READINGS.replace("1,60,0.0002", "1,60,0.012"));
    String model =
        modelMessage(
            () ->
                OedometerTest.of(
                    specimen().dryMass(0.12).build(),
                    increments(
                        new double[] {0, 0.012, 0.0005},
                        new double[] {0, 0.0004, 0.001},
                        new double[] {0, -0.0001, -0.0002})));
    assertAtRow(e, file(CsvTables.READINGS_FILE), 3, "settlement_m", "0.012", model);
    assertThat(e.getCause()).hasMessage(model).isInstanceOf(InvalidReadingException.class);

    // By hand: 1e-300 kg gives H_s = 8.4e-302 m (H_0 / H_s = 2.4e299, finite); a swelling of
    // 1e10 m gives H = 1e10 m and H / H_s = 1.2e311, above 1.8e308.
    e =
        refused(
            PROPERTIES.replace("dry_mass_kg,0.12", "dry_mass_kg,1e-300"),
            INCREMENTS,
            READINGS.replace("1,60,0.0002", "1,60,-1e10"));
    String tooLarge =
        modelMessage(
            () ->
                OedometerTest.of(
                    specimen().dryMass(1e-300).build(),
                    increments(
                        new double[] {0, -1e10, 0.0005},
                        new double[] {0, 0.0004, 0.001},
                        new double[] {0, -0.0001, -0.0002})));
    assertAtRow(e, file(CsvTables.READINGS_FILE), 3, "settlement_m", "-1e10", tooLarge);
    assertThat(e.getCause()).hasMessage(tooLarge);
  }

  @Test
  @DisplayName(
      "final settlements adding up to more than the initial height (a check over the whole test)"
          + " list the last reading of each increment and the initial height with their lines")
  void finalHeightNotPositive() throws IOException {
    // By hand: 0.02 - 0.025 - 0.001 + 0.0002 = -0.0058 m.
    TestDataException e =
        refused(PROPERTIES, INCREMENTS, READINGS.replace("1,86400,0.0005", "1,86400,0.025"));
    String model =
        modelMessage(
            () ->
                OedometerTest.of(
                    specimen().dryMass(0.12).build(),
                    increments(
                        new double[] {0, 0.0002, 0.025},
                        new double[] {0, 0.0004, 0.001},
                        new double[] {0, -0.0001, -0.0002})));
    // Task: a check that no single row fails names the rows involved; last readings on lines 4,
    // 7 and 10 of readings.csv, initial_height_m on line 3 of properties.csv (by hand).
    assertThat(e)
        .hasMessage(
            file(CsvTables.READINGS_FILE)
                + ": "
                + model
                + " (rows involved: the last reading of each increment, lines 4, 7, 10, and"
                + " initial_height_m at "
                + file(CsvTables.PROPERTIES_FILE)
                + " line 3)");
    assertThat(e.source()).isEqualTo(file(CsvTables.READINGS_FILE).toString());
    assertThat(e.line()).isEmpty();
    assertThat(e.getCause()).hasMessage(model);
  }

  @Test
  @DisplayName(
      "an initial height not above the height of solids from the final water content (a check"
          + " over the whole test) lists the rows of H_0, G_s, w_f and the last readings")
  void initialHeightNotAboveSolidsFromFinalWaterContent() throws IOException {
    String properties = PROPERTIES.replace("dry_mass_kg,0.12", "final_water_content_ratio,0.1");
    // By hand: H_f = 0.02 - 0.0005 - 0.001 + 0.007 = 0.0255 m; e_f = w_f G_s = 0.27 (saturated
    // specimen, phase relation); H_s = H_f / (1 + e_f) = 0.02008 m, not below H_0 = 0.02 m.
    TestDataException e =
        refused(properties, INCREMENTS, READINGS.replace("3,86400,-0.0002", "3,86400,-0.007"));
    String model =
        modelMessage(
            () ->
                OedometerTest.of(
                    specimen().finalWaterContent(0.1).build(),
                    increments(
                        new double[] {0, 0.0002, 0.0005},
                        new double[] {0, 0.0004, 0.001},
                        new double[] {0, -0.0001, -0.007})));
    assertThat(e)
        .hasMessage(
            file(CsvTables.PROPERTIES_FILE)
                + ": "
                + model
                + " (rows involved: initial_height_m at line 3, specific_gravity at line 5,"
                + " final_water_content_ratio at line 6, and the last reading of each increment"
                + " at "
                + file(CsvTables.READINGS_FILE)
                + " lines 4, 7, 10)");
    assertThat(e.source()).isEqualTo(file(CsvTables.PROPERTIES_FILE).toString());
    assertThat(e.line()).isEmpty();
    assertThat(e.getCause()).hasMessage(model);
  }
}
