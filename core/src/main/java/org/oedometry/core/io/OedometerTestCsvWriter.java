package org.oedometry.core.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;

/**
 * Writes an {@link OedometerTest} as the three CSV files described in the {@linkplain
 * org.oedometry.core.io package documentation}.
 *
 * <p>All values are written in SI units (headers {@code initial_height_m}, {@code
 * stress_before_Pa}, {@code elapsed_s}, {@code settlement_m}) with the shortest decimal text that
 * reads back to the same double ({@link Double#toString(double)}), so that {@link
 * OedometerTestCsvReader} returns a test equal to the one written. Settlements are written as the
 * test holds them: already corrected, with no gauge or apparatus columns. Line separator {@code
 * \n}; UTF-8.
 *
 * <p>Stateless and thread-safe.
 */
public final class OedometerTestCsvWriter {

  private static final CSVFormat FORMAT =
      CSVFormat.DEFAULT.builder().setRecordSeparator('\n').setCommentMarker('#').get();

  private OedometerTestCsvWriter() {}

  /**
   * Formats a test as the texts of the three files.
   *
   * @param test the test; not null
   * @return the three texts
   * @throws NullPointerException if the test is null
   */
  public static CsvTables format(OedometerTest test) {
    return new CsvTables(properties(test), increments(test), readings(test));
  }

  /**
   * Writes a test as three UTF-8 files in a directory, replacing files of the same names.
   *
   * @param test the test; not null
   * @param directory an existing directory
   * @throws IOException if a file cannot be written
   * @throws NullPointerException if an argument is null
   */
  public static void write(OedometerTest test, Path directory) throws IOException {
    CsvTables tables = format(test);
    Files.writeString(
        directory.resolve(CsvTables.PROPERTIES_FILE), tables.properties(), StandardCharsets.UTF_8);
    Files.writeString(
        directory.resolve(CsvTables.INCREMENTS_FILE), tables.increments(), StandardCharsets.UTF_8);
    Files.writeString(
        directory.resolve(CsvTables.READINGS_FILE), tables.readings(), StandardCharsets.UTF_8);
  }

  private static String properties(OedometerTest test) {
    Specimen s = test.specimen();
    TestIdentifiers ids = test.identifiers();
    StringBuilder out = new StringBuilder();
    try (CSVPrinter p = new CSVPrinter(out, FORMAT)) {
      p.printComment("oedometer test: specimen and test properties, SI units");
      p.printRecord("property", "value");
      p.printRecord("project", ids.project());
      p.printRecord("borehole", ids.borehole());
      p.printRecord("sample", ids.sample());
      p.printRecord("depth", ids.depth());
      p.printRecord("initial_height_m", number(s.initialHeightMetres()));
      if (s.diameterMetres().isPresent()) {
        p.printRecord("diameter_m", number(s.diameterMetres().getAsDouble()));
      } else {
        p.printRecord("area_m2", number(s.areaSquareMetres()));
      }
      p.printRecord("specific_gravity", number(s.specificGravity()));
      if (s.dryMassKilograms().isPresent()) {
        p.printRecord("dry_mass_kg", number(s.dryMassKilograms().getAsDouble()));
      }
      if (s.finalWaterContent().isPresent()) {
        p.printRecord("final_water_content_ratio", number(s.finalWaterContent().getAsDouble()));
      }
      if (s.initialWaterContent().isPresent()) {
        p.printRecord("initial_water_content_ratio", number(s.initialWaterContent().getAsDouble()));
      }
      if (s.bulkDensityKilogramsPerCubicMetre().isPresent()) {
        p.printRecord(
            "bulk_density_kg_m3", number(s.bulkDensityKilogramsPerCubicMetre().getAsDouble()));
      }
      p.printRecord("drainage", test.drainage().name().toLowerCase(Locale.ROOT));
      p.printRecord("drainage_path_rule", test.drainagePathRule().name().toLowerCase(Locale.ROOT));
    } catch (IOException e) {
      throw new UncheckedIOException(e); // a StringBuilder does not fail
    }
    return out.toString();
  }

  private static String increments(OedometerTest test) {
    StringBuilder out = new StringBuilder();
    try (CSVPrinter p = new CSVPrinter(out, FORMAT)) {
      p.printComment("oedometer test: load increments, stresses in Pa");
      p.printRecord("increment", "stress_before_Pa", "stress_after_Pa");
      List<LoadIncrement> increments = test.increments();
      for (int i = 0; i < increments.size(); i++) {
        LoadIncrement inc = increments.get(i);
        p.printRecord(
            Integer.toString(i + 1),
            number(inc.stressBeforePascals()),
            number(inc.stressAfterPascals()));
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toString();
  }

  private static String readings(OedometerTest test) {
    StringBuilder out = new StringBuilder();
    try (CSVPrinter p = new CSVPrinter(out, FORMAT)) {
      p.printComment(
          "oedometer test: readings; settlement from the start of each increment, compression"
              + " positive");
      p.printRecord("increment", "elapsed_s", "settlement_m");
      List<LoadIncrement> increments = test.increments();
      for (int i = 0; i < increments.size(); i++) {
        SettlementCurve c = increments.get(i).curve();
        for (int j = 0; j < c.size(); j++) {
          p.printRecord(
              Integer.toString(i + 1), number(c.elapsedSeconds(j)), number(c.settlementMetres(j)));
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toString();
  }

  private static String number(double value) {
    return Double.toString(value);
  }
}
