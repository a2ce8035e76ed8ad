package org.oedometry.core.io;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.GaugeConversion;
import org.oedometry.core.GaugeDirection;
import org.oedometry.core.InvalidReadingException;
import org.oedometry.core.LabUnit;
import org.oedometry.core.LabUnit.Quantity;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.core.internal.Checks;
import org.oedometry.core.io.internal.CsvTable;
import org.oedometry.core.io.internal.CsvTable.Row;
import org.oedometry.theory.Drainage;

/**
 * Reads an {@link OedometerTest} from the three CSV files described in the {@linkplain
 * org.oedometry.core.io package documentation}: {@value CsvTables#PROPERTIES_FILE}, {@value
 * CsvTables#INCREMENTS_FILE} and {@value CsvTables#READINGS_FILE}.
 *
 * <p>Every value is converted to SI through the unit its header declares ({@link LabUnit}). Reading
 * is all or nothing: any problem throws a {@link TestDataException} naming the file, line, column
 * and value, and no test is returned.
 *
 * <p>Reading checks the form and consistency of the data, not its truth: results derived from a
 * test must be reviewed by a qualified engineer, and local codes and standards govern.
 *
 * <p>Stateless and thread-safe.
 */
public final class OedometerTestCsvReader {

  private static final Pattern INTEGER = Pattern.compile("[0-9]{1,9}");
  private static final double STRESS_MATCH_TOLERANCE = 1e-9;

  private static final String INCREMENT = "increment";
  private static final String STRESS_BEFORE = "stress_before";
  private static final String STRESS_AFTER = "stress_after";
  private static final String APPARATUS_DEFLECTION = "apparatus_deflection";
  private static final String ELAPSED = "elapsed";
  private static final String SETTLEMENT = "settlement";
  private static final String GAUGE = "gauge";

  private static final String PROPERTIES_HEADER = "property,value";
  private static final String INCREMENTS_HEADER = "increment,stress_before_kPa,stress_after_kPa";
  private static final String READINGS_HEADER = "increment,elapsed_min,settlement_mm";

  /** Properties given as a number in a declared unit, with the quantity of that unit. */
  private static final Map<String, Quantity> UNIT_PROPERTIES =
      Map.of(
          "initial_height", Quantity.LENGTH,
          "diameter", Quantity.LENGTH,
          "area", Quantity.AREA,
          "dry_mass", Quantity.MASS,
          "final_water_content", Quantity.DIMENSIONLESS,
          "initial_water_content", Quantity.DIMENSIONLESS,
          "bulk_density", Quantity.DENSITY,
          "gauge_zero", Quantity.LENGTH);

  /** Properties given as text or as a plain number. */
  private static final List<String> PLAIN_PROPERTIES =
      List.of(
          "specific_gravity",
          "drainage",
          "drainage_path_rule",
          "gauge_direction",
          "project",
          "borehole",
          "sample",
          "depth");

  /**
   * Values that each pass every check of {@link Specimen} and together make a specimen (1 m high, 1
   * m^2, G_s 2.65, saturated at a final water content of 0.5, so no dry mass is checked against the
   * height): a group of values from the file put in their place is refused only for what the group
   * itself holds.
   */
  private static final Map<String, Double> NEUTRAL_SPECIMEN =
      Map.of(
          "initial_height", 1.0,
          "area", 1.0,
          "specific_gravity", 2.65,
          "final_water_content", 0.5);

  private OedometerTestCsvReader() {}

  /**
   * Reads a test from a directory holding the three files, UTF-8 encoded.
   *
   * @param directory the directory
   * @return the test
   * @throws IOException if the directory or a file cannot be read (missing, not a directory, a
   *     directory where a file should be, unreadable): always a {@link FileSystemException} whose
   *     {@link FileSystemException#getFile() file} and message name the path (a {@link
   *     NoSuchFileException} where it does not exist), with the JDK's exception as the cause where
   *     the JDK's own did not name the path
   * @throws TestDataException if a file is not UTF-8 text or does not describe a valid test; the
   *     source named is the file's path. The message names the line of the row that holds the
   *     offending value, with its column and value as written, also where the value passes the
   *     reader's own checks and {@link Specimen}, {@link LoadIncrement}, {@link SettlementCurve} or
   *     {@link OedometerTest} refuses it: that type's message is kept, followed by the lines of the
   *     other rows its check involved, and its exception is the cause. A check over the whole test
   *     (final height; height of solids from the final water content) names no single line but
   *     lists the rows involved; a missing property names the file alone.
   */
  public static OedometerTest read(Path directory) throws IOException {
    if (Files.notExists(directory)) {
      throw new NoSuchFileException(directory.toString(), null, "no such directory");
    }
    if (Files.exists(directory) && !Files.isDirectory(directory)) {
      throw new FileSystemException(
          directory.toString(),
          null,
          "not a directory: a test is read from the directory holding "
              + CsvTables.PROPERTIES_FILE
              + ", "
              + CsvTables.INCREMENTS_FILE
              + " and "
              + CsvTables.READINGS_FILE);
    }
    Path properties = directory.resolve(CsvTables.PROPERTIES_FILE);
    Path increments = directory.resolve(CsvTables.INCREMENTS_FILE);
    Path readings = directory.resolve(CsvTables.READINGS_FILE);
    return parse(
        properties.toString(),
        readText(properties),
        increments.toString(),
        readText(increments),
        readings.toString(),
        readText(readings));
  }

  /**
   * The text of one file. The JDK names the file in a {@link FileSystemException} (missing, access
   * denied) but not in every IOException (reading a directory gives a bare "Is a directory" on
   * Linux): those are wrapped in a FileSystemException that names the file.
   */
  private static String readText(Path file) throws IOException {
    try {
      return Files.readString(file, StandardCharsets.UTF_8);
    } catch (CharacterCodingException e) {
      throw new TestDataException(file.toString(), 0, null, null, "not UTF-8 text", e);
    } catch (FileSystemException e) {
      if (e.getFile() != null) {
        throw e;
      }
      throw named(file, e);
    } catch (IOException e) {
      throw named(file, e);
    }
  }

  /** A FileSystemException naming the file, with the JDK's reason and exception as the cause. */
  private static FileSystemException named(Path file, IOException cause) {
    String reason =
        Files.isDirectory(file)
            ? "is a directory, not a file"
            : cause.getMessage() == null ? cause.getClass().getSimpleName() : cause.getMessage();
    FileSystemException named = new FileSystemException(file.toString(), null, reason);
    named.initCause(cause);
    return named;
  }

  /**
   * Parses a test from the texts of the three files; messages name the files by their usual names
   * ({@value CsvTables#PROPERTIES_FILE} and so on).
   *
   * @param tables the three texts
   * @return the test
   * @throws TestDataException if the texts do not describe a valid test; the message names the
   *     file, and the line, column and value of the offending row, as {@link #read(Path)} describes
   *     (also for a value the value types refuse, their message kept and their exception the cause)
   * @throws NullPointerException if tables is null
   */
  public static OedometerTest parse(CsvTables tables) {
    return parse(
        CsvTables.PROPERTIES_FILE,
        tables.properties(),
        CsvTables.INCREMENTS_FILE,
        tables.increments(),
        CsvTables.READINGS_FILE,
        tables.readings());
  }

  private static OedometerTest parse(
      String propertiesName,
      String propertiesText,
      String incrementsName,
      String incrementsText,
      String readingsName,
      String readingsText) {
    Properties properties =
        readProperties(
            CsvTable.parse(propertiesName, propertiesText, "property", PROPERTIES_HEADER));
    List<IncrementRow> increments =
        readIncrements(
            CsvTable.parse(incrementsName, incrementsText, INCREMENT, INCREMENTS_HEADER));
    CsvTable readingsTable = CsvTable.parse(readingsName, readingsText, INCREMENT, READINGS_HEADER);
    Readings readings = readCurves(readingsTable, increments, incrementsName, properties);
    List<LoadIncrement> loadIncrements = new ArrayList<>();
    for (int i = 0; i < increments.size(); i++) {
      IncrementRow row = increments.get(i);
      try {
        loadIncrements.add(new LoadIncrement(row.before, row.after, readings.curves.get(i)));
      } catch (IllegalArgumentException e) {
        // Not reached: readIncrements checks the same stresses row by row; kept so that no
        // refusal leaves the reader without its file and line.
        throw new TestDataException(incrementsName, row.line, null, null, e.getMessage(), e);
      }
    }
    try {
      return OedometerTest.builder(properties.specimen)
          .drainage(properties.drainage)
          .drainagePathRule(properties.rule)
          .identifiers(properties.identifiers)
          .increments(loadIncrements)
          .build();
    } catch (IllegalArgumentException e) {
      throw testError(e, properties, readings);
    }
  }

  /**
   * The error for a test that {@link OedometerTest} refuses although every row passed: the row of
   * the reading an {@link InvalidReadingException} points at, or the rows involved in a check over
   * the whole test (the final height; the height of solids from the final water content). The
   * stress continuity and the count of increments are checked row by row before (not reached here).
   */
  private static TestDataException testError(
      IllegalArgumentException e, Properties properties, Readings readings) {
    if (e instanceof InvalidReadingException reading) {
      return readings.error(reading.incrementIndex(), reading.readingIndex(), e);
    }
    // A check over the whole test: the final height (the initial height less every increment's
    // last reading), or the height of solids that the final water content gives from it.
    Specimen specimen = properties.specimen;
    double finalHeight = specimen.initialHeightMetres();
    for (SettlementCurve curve : readings.curves) {
      finalHeight -= curve.finalSettlementMetres();
    }
    if (!(finalHeight > 0)) {
      return new TestDataException(
          readings.source,
          0,
          null,
          null,
          e.getMessage()
              + " (rows involved: the last reading of each increment, "
              + lines(readings.lastRows())
              + ", and "
              + rowList(properties, List.of("initial_height"), properties.source)
              + ")",
          e);
    }
    if (specimen.solidsBasis() == Specimen.SolidsBasis.FINAL_WATER_CONTENT) {
      return new TestDataException(
          properties.source,
          0,
          null,
          null,
          e.getMessage()
              + " (rows involved: "
              + rowList(
                  properties,
                  List.of("initial_height", "specific_gravity", "final_water_content"),
                  null)
              + ", and the last reading of each increment at "
              + readings.source
              + " "
              + lines(readings.lastRows())
              + ")",
          e);
    }
    return new TestDataException(readings.source, 0, null, null, e.getMessage(), e);
  }

  /** "line 4" or "lines 4, 7, 10". */
  private static String lines(List<Row> rows) {
    List<String> numbers = new ArrayList<>();
    for (Row row : rows) {
      numbers.add(Long.toString(row.line()));
    }
    return (rows.size() == 1 ? "line " : "lines ") + String.join(", ", numbers);
  }

  /**
   * The properties given among some base names, each as its name in the file and its line: {@code
   * initial_height_mm at line 5}, or {@code initial_height_mm at properties.csv line 5} when the
   * file is named (the message is about another file).
   */
  private static String rowList(Properties properties, List<String> bases, String file) {
    List<String> parts = new ArrayList<>();
    for (String base : bases) {
      Row row = properties.rows.get(base);
      if (row != null) {
        parts.add(
            row.cells().get(0) + " at " + (file == null ? "" : file + " ") + "line " + row.line());
      }
    }
    return String.join(", ", parts);
  }

  // ---------------------------------------------------------------- properties

  /** What the properties file gives. */
  private static final class Properties {
    String source;

    /** The row of each property given, by base name ({@code initial_height}). */
    Map<String, Row> rows;

    Specimen specimen;
    Drainage drainage = Drainage.DOUBLE;
    DrainagePathRule rule = DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION;
    TestIdentifiers identifiers;
    Double gaugeZeroMetres;
    GaugeDirection gaugeDirection;
    Row gaugeRow;
  }

  private static Properties readProperties(CsvTable table) {
    if (!String.join(",", table.header().cells()).equals(PROPERTIES_HEADER)) {
      throw table.error(
          table.header(),
          null,
          String.join(",", table.header().cells()),
          "the header must be " + PROPERTIES_HEADER);
    }
    Map<String, Row> seen = new HashMap<>();
    Map<String, String> text = new HashMap<>();
    Map<String, Double> numbers = new HashMap<>();
    for (Row row : table.rows()) {
      String key = row.cells().get(0);
      String cell = row.cells().get(1);
      String base = baseOf(key);
      if (base == null) {
        throw table.error(
            row,
            "property",
            key,
            "unknown property; known: "
                + String.join(", ", PLAIN_PROPERTIES)
                + ", and with a unit: "
                + String.join(", ", UNIT_PROPERTIES.keySet().stream().sorted().toList()));
      }
      Row earlier = seen.put(base, row);
      if (earlier != null) {
        throw table.error(
            row, "property", key, "given twice (also at line " + earlier.line() + ")");
      }
      Quantity quantity = UNIT_PROPERTIES.get(base);
      if (quantity != null) {
        LabUnit unit = table.unitOf(key, base, quantity, row.line());
        double value = table.si(row, key, cell, unit);
        checkPropertyRange(table, row, key, cell, base, value);
        numbers.put(base, value);
      } else if (base.equals("specific_gravity")) {
        double gs = table.number(row, key, cell);
        try {
          Checks.specificGravity(gs);
        } catch (IllegalArgumentException e) {
          throw table.error(row, key, cell, "must be > 1.0 and <= 6.0");
        }
        numbers.put(base, gs);
      } else {
        try {
          text.put(base, Checks.plainText(cell, key));
        } catch (IllegalArgumentException e) {
          throw table.error(row, key, cell, e.getMessage());
        }
      }
    }
    Properties p = new Properties();
    p.source = table.source();
    p.rows = seen;
    requireProperty(table, seen, "initial_height");
    requireProperty(table, seen, "specific_gravity");
    try {
      p.specimen = specimenBuilder(numbers).build();
    } catch (IllegalArgumentException e) {
      throw specimenError(table, p, numbers, e);
    }
    if (text.containsKey("drainage")) {
      p.drainage = choice(table, seen.get("drainage"), "drainage", Drainage.class);
    }
    if (text.containsKey("drainage_path_rule")) {
      p.rule =
          choice(
              table, seen.get("drainage_path_rule"), "drainage_path_rule", DrainagePathRule.class);
    }
    if (text.containsKey("gauge_direction")) {
      p.gaugeDirection =
          choice(table, seen.get("gauge_direction"), "gauge_direction", GaugeDirection.class);
    }
    if (numbers.containsKey("gauge_zero")) {
      p.gaugeZeroMetres = numbers.get("gauge_zero");
      p.gaugeRow = seen.get("gauge_zero");
    } else if (seen.containsKey("gauge_direction")) {
      p.gaugeRow = seen.get("gauge_direction");
    }
    try {
      p.identifiers =
          TestIdentifiers.of(
              text.getOrDefault("project", ""),
              text.getOrDefault("borehole", ""),
              text.getOrDefault("sample", ""),
              text.getOrDefault("depth", ""));
    } catch (IllegalArgumentException e) {
      // Not reached: every label passed Checks.plainText above, the only check of the labels.
      throw new TestDataException(
          table.source(),
          0,
          null,
          null,
          e.getMessage()
              + " (rows involved: "
              + rowList(p, List.of("project", "borehole", "sample", "depth"), null)
              + ")",
          e);
    }
    return p;
  }

  /** A specimen builder holding the given values (SI, by base name); other names are skipped. */
  private static Specimen.Builder specimenBuilder(Map<String, Double> values) {
    Specimen.Builder b = Specimen.builder();
    values.forEach(
        (base, value) -> {
          switch (base) {
            case "initial_height" -> b.initialHeight(value);
            case "diameter" -> b.diameter(value);
            case "area" -> b.area(value);
            case "specific_gravity" -> b.specificGravity(value);
            case "dry_mass" -> b.dryMass(value);
            case "final_water_content" -> b.finalWaterContent(value);
            case "initial_water_content" -> b.initialWaterContent(value);
            case "bulk_density" -> b.bulkDensity(value);
            default -> {
              // gauge_zero: not a property of the specimen
            }
          }
        });
    return b;
  }

  /**
   * The error for a specimen that {@link Specimen} refuses although every property passed the
   * reader's checks. Specimen's checks each concern one value or one group of values; in its order
   * each group given in the file is tried alone, with {@link #NEUTRAL_SPECIMEN} for the rest, and
   * the first refused names its row (with the other rows of the group). A specimen missing a
   * diameter and an area, or a dry mass and a final water content, has no row to name: the file
   * alone is named.
   */
  private static TestDataException specimenError(
      CsvTable table, Properties p, Map<String, Double> numbers, IllegalArgumentException e) {
    if (numbers.containsKey("diameter") && numbers.containsKey("area")) {
      Row diameter = p.rows.get("diameter");
      Row area = p.rows.get("area");
      boolean areaLater = area.line() > diameter.line();
      return rowError(
          table, p, areaLater ? List.of("area", "diameter") : List.of("diameter", "area"), e);
    }
    String shape = numbers.containsKey("diameter") ? "diameter" : "area";
    List<List<String>> groups =
        List.of(
            List.of("initial_height"),
            List.of(shape),
            List.of("specific_gravity"),
            List.of("final_water_content"),
            List.of("dry_mass", "initial_height", shape, "specific_gravity"),
            List.of("initial_water_content"),
            List.of("bulk_density"),
            List.of("bulk_density", "initial_water_content", "specific_gravity"));
    for (List<String> group : groups) {
      if (!numbers.keySet().containsAll(group)) {
        continue;
      }
      Map<String, Double> values = new HashMap<>(NEUTRAL_SPECIMEN);
      if (group.contains("diameter")) {
        values.remove("area");
      }
      for (String base : group) {
        values.put(base, numbers.get(base));
      }
      try {
        specimenBuilder(values).build();
      } catch (IllegalArgumentException refused) {
        return rowError(table, p, group, e);
      }
    }
    return new TestDataException(table.source(), 0, null, null, e.getMessage(), e);
  }

  /**
   * An error at the row of the first property of a group, the others listed with their lines, the
   * value type's message kept and its exception the cause.
   */
  private static TestDataException rowError(
      CsvTable table, Properties p, List<String> group, IllegalArgumentException e) {
    Row row = p.rows.get(group.get(0));
    String others = rowList(p, group.subList(1, group.size()), null);
    return table.error(
        row,
        row.cells().get(0),
        row.cells().get(1),
        others.isEmpty() ? e.getMessage() : e.getMessage() + " (with " + others + ")",
        e);
  }

  private static String baseOf(String key) {
    if (PLAIN_PROPERTIES.contains(key)) {
      return key;
    }
    for (String base : UNIT_PROPERTIES.keySet()) {
      if (key.equals(base) || key.startsWith(base + "_")) {
        return base;
      }
    }
    return null;
  }

  private static void checkPropertyRange(
      CsvTable table, Row row, String key, String cell, String base, double value) {
    if (base.equals("gauge_zero")) {
      return; // any reading can be the zero of a gauge
    }
    boolean zeroAllowed = base.equals("initial_water_content");
    if (zeroAllowed ? !(value >= 0) : !(value > 0)) {
      throw table.error(row, key, cell, zeroAllowed ? "must be >= 0" : "must be > 0");
    }
  }

  private static void requireProperty(CsvTable table, Map<String, Row> seen, String base) {
    if (!seen.containsKey(base)) {
      throw new TestDataException(
          table.source(),
          0,
          null,
          null,
          "missing property "
              + base
              + (UNIT_PROPERTIES.containsKey(base) ? "_<unit>, e.g. " + base + "_mm" : ""),
          null);
    }
  }

  private static <E extends Enum<E>> E choice(CsvTable table, Row row, String key, Class<E> type) {
    String cell = row.cells().get(1);
    for (E e : type.getEnumConstants()) {
      if (e.name().equalsIgnoreCase(cell)) {
        return e;
      }
    }
    List<String> names = new ArrayList<>();
    for (E e : type.getEnumConstants()) {
      names.add(e.name().toLowerCase(Locale.ROOT));
    }
    throw table.error(row, key, cell, "unknown choice; use one of: " + String.join(", ", names));
  }

  // ---------------------------------------------------------------- increments

  /**
   * One row of the increments file, in SI units: the apparatus deflection (0 without the column),
   * its cell as written (null without the column) and its change from the increment before (from 0
   * for the first), finite.
   */
  private record IncrementRow(
      long line,
      double before,
      double after,
      double deflection,
      String deflectionCell,
      double deflectionChange) {}

  private static List<IncrementRow> readIncrements(CsvTable table) {
    List<String> header = table.header().cells();
    long line = table.header().line();
    int beforeColumn = -1;
    int afterColumn = -1;
    int deflectionColumn = -1;
    LabUnit[] units = new LabUnit[header.size()];
    for (int c = 1; c < header.size(); c++) {
      String name = header.get(c);
      if (name.equals(STRESS_BEFORE) || name.startsWith(STRESS_BEFORE + "_")) {
        beforeColumn = c;
        units[c] = table.unitOf(name, STRESS_BEFORE, Quantity.STRESS, line);
      } else if (name.equals(STRESS_AFTER) || name.startsWith(STRESS_AFTER + "_")) {
        afterColumn = c;
        units[c] = table.unitOf(name, STRESS_AFTER, Quantity.STRESS, line);
      } else if (name.equals(APPARATUS_DEFLECTION) || name.startsWith(APPARATUS_DEFLECTION + "_")) {
        deflectionColumn = c;
        units[c] = table.unitOf(name, APPARATUS_DEFLECTION, Quantity.LENGTH, line);
      } else {
        throw table.error(
            table.header(),
            name,
            null,
            "unknown column; the columns are increment, stress_before_<unit>,"
                + " stress_after_<unit> and optionally apparatus_deflection_<unit>");
      }
    }
    if (beforeColumn < 0 || afterColumn < 0) {
      throw table.error(
          table.header(),
          null,
          null,
          "the header needs the columns stress_before_<unit> and stress_after_<unit>, e.g. "
              + INCREMENTS_HEADER);
    }
    if (table.rows().isEmpty()) {
      throw new TestDataException(table.source(), 0, null, null, "no increments", null);
    }
    List<IncrementRow> rows = new ArrayList<>();
    for (Row row : table.rows()) {
      int number = integer(table, row, 0);
      if (number != rows.size() + 1) {
        throw table.error(
            row,
            INCREMENT,
            row.cells().get(0),
            "increments out of order: expected increment " + (rows.size() + 1));
      }
      String beforeName = header.get(beforeColumn);
      String afterName = header.get(afterColumn);
      String beforeCell = row.cells().get(beforeColumn);
      String afterCell = row.cells().get(afterColumn);
      double before = table.si(row, beforeName, beforeCell, units[beforeColumn]);
      double after = table.si(row, afterName, afterCell, units[afterColumn]);
      if (!(before >= 0)) {
        throw table.error(row, beforeName, beforeCell, "stress before must be >= 0");
      }
      if (!(after > 0)) {
        throw table.error(row, afterName, afterCell, "stress after must be > 0");
      }
      if (after == before) {
        throw table.error(
            row,
            afterName,
            afterCell,
            "stress after equals the stress before: an increment must change the stress");
      }
      if (!rows.isEmpty()) {
        double previousAfter = rows.get(rows.size() - 1).after;
        if (!(Math.abs(before - previousAfter)
            <= STRESS_MATCH_TOLERANCE * Math.max(before, previousAfter))) {
          throw table.error(
              row,
              beforeName,
              beforeCell,
              Checks.format(
                  "stress before is not the stress after the previous increment (%s Pa)",
                  Checks.number(previousAfter)));
        }
      }
      String deflectionCell = deflectionColumn < 0 ? null : row.cells().get(deflectionColumn);
      double deflection =
          deflectionColumn < 0
              ? 0
              : table.si(
                  row, header.get(deflectionColumn), deflectionCell, units[deflectionColumn]);
      // The first change is the deflection itself (finite); a later one is a difference of two
      // finite values, which may leave the range of a double.
      IncrementRow previous = rows.isEmpty() ? null : rows.get(rows.size() - 1);
      double change = deflection - (previous == null ? 0 : previous.deflection);
      if (!Double.isFinite(change)) {
        throw table.error(
            row,
            header.get(deflectionColumn),
            deflectionCell,
            Checks.format(
                "the change from the apparatus deflection of increment %d (line %d, value '%s') is"
                    + " beyond the range of a double",
                rows.size(), previous.line, CsvTable.shorten(previous.deflectionCell)));
      }
      rows.add(new IncrementRow(row.line(), before, after, deflection, deflectionCell, change));
    }
    return rows;
  }

  private static int integer(CsvTable table, Row row, int column) {
    String cell = row.cells().get(column);
    if (!INTEGER.matcher(cell).matches() || Integer.parseInt(cell) < 1) {
      throw table.error(row, INCREMENT, cell, "not an increment number (a whole number >= 1)");
    }
    return Integer.parseInt(cell);
  }

  // ---------------------------------------------------------------- readings

  /**
   * The curves read, with the rows they came from: for messages about a value that the value types
   * refuse after reading.
   *
   * @param source the readings file
   * @param column the header of the third column (settlement or gauge)
   * @param curves one curve per increment
   * @param rows the rows of each increment's readings, in order
   */
  private record Readings(
      String source, String column, List<SettlementCurve> curves, List<List<Row>> rows) {

    /** An error at the row of reading j of increment i. */
    TestDataException error(int i, int j, IllegalArgumentException cause) {
      Row row = rows.get(i).get(j);
      return new TestDataException(
          source,
          row.line(),
          column,
          CsvTable.shorten(row.cells().get(2)),
          cause.getMessage(),
          cause);
    }

    /** The last row of each increment. */
    List<Row> lastRows() {
      List<Row> last = new ArrayList<>();
      for (List<Row> increment : rows) {
        last.add(increment.get(increment.size() - 1));
      }
      return last;
    }
  }

  private static Readings readCurves(
      CsvTable table, List<IncrementRow> increments, String incrementsName, Properties properties) {
    List<String> header = table.header().cells();
    long line = table.header().line();
    if (header.size() != 3) {
      throw table.error(
          table.header(),
          null,
          String.join(",", header),
          "the header needs three columns: increment, elapsed_<unit> and settlement_<unit> or"
              + " gauge_<unit>, e.g. "
              + READINGS_HEADER);
    }
    String timeName = header.get(1);
    if (!(timeName.equals(ELAPSED) || timeName.startsWith(ELAPSED + "_"))) {
      throw table.error(
          table.header(), timeName, null, "the second column must be elapsed_<time unit>");
    }
    LabUnit timeUnit = table.unitOf(timeName, ELAPSED, Quantity.TIME, line);
    String valueName = header.get(2);
    boolean gauge;
    LabUnit valueUnit;
    if (valueName.equals(SETTLEMENT) || valueName.startsWith(SETTLEMENT + "_")) {
      gauge = false;
      valueUnit = table.unitOf(valueName, SETTLEMENT, Quantity.LENGTH, line);
    } else if (valueName.equals(GAUGE) || valueName.startsWith(GAUGE + "_")) {
      gauge = true;
      valueUnit = table.unitOf(valueName, GAUGE, Quantity.LENGTH, line);
    } else {
      throw table.error(
          table.header(),
          valueName,
          null,
          "the third column must be settlement_<length unit> or gauge_<length unit>");
    }
    if (gauge && (properties.gaugeZeroMetres == null || properties.gaugeDirection == null)) {
      throw table.error(
          table.header(),
          valueName,
          null,
          "gauge readings need the properties gauge_zero_<unit> and gauge_direction");
    }
    if (!gauge && properties.gaugeRow != null) {
      throw new TestDataException(
          properties.source,
          properties.gaugeRow.line(),
          properties.gaugeRow.cells().get(0),
          null,
          "gauge properties are given but the readings are settlements (" + valueName + ")",
          null);
    }
    int n = increments.size();
    List<List<double[]>> perIncrement = new ArrayList<>();
    List<List<Row>> rowsPerIncrement = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      perIncrement.add(new ArrayList<>());
      rowsPerIncrement.add(new ArrayList<>());
    }
    int current = 0;
    for (Row row : table.rows()) {
      int number = integer(table, row, 0);
      if (number > n) {
        throw table.error(
            row,
            INCREMENT,
            row.cells().get(0),
            "no such increment: the increments file lists " + n);
      }
      if (number < current) {
        throw table.error(
            row,
            INCREMENT,
            row.cells().get(0),
            "readings out of order: the readings of increment " + current + " come before");
      }
      if (number > current + 1) {
        throw table.error(
            row, INCREMENT, row.cells().get(0), "increment " + (current + 1) + " has no readings");
      }
      current = number;
      String timeCell = row.cells().get(1);
      double t = table.si(row, timeName, timeCell, timeUnit);
      if (!(t >= 0)) {
        throw table.error(row, timeName, timeCell, "elapsed time must be >= 0");
      }
      List<Row> rows = rowsPerIncrement.get(number - 1);
      Row previous = rows.isEmpty() ? null : rows.get(rows.size() - 1);
      List<double[]> readings = perIncrement.get(number - 1);
      if (previous != null) {
        double tPrevious = readings.get(readings.size() - 1)[0];
        if (t == tPrevious) {
          throw table.error(
              row,
              timeName,
              timeCell,
              "duplicate elapsed time (also at line " + previous.line() + ")");
        }
        if (t < tPrevious) {
          throw table.error(
              row,
              timeName,
              timeCell,
              "elapsed time is before that of the previous reading (line " + previous.line() + ")");
        }
      }
      double value = table.si(row, valueName, row.cells().get(2), valueUnit);
      readings.add(new double[] {t, value});
      rows.add(row);
    }
    if (current < n) {
      throw new TestDataException(
          table.source(), 0, null, null, "increment " + (current + 1) + " has no readings", null);
    }
    List<double[]> times = new ArrayList<>();
    List<double[]> values = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      List<double[]> readings = perIncrement.get(i);
      if (readings.size() < 2) {
        throw table.error(
            rowsPerIncrement.get(i).get(readings.size() - 1),
            INCREMENT,
            String.valueOf(i + 1),
            "increment " + (i + 1) + " has 1 reading; a settlement curve needs at least 2");
      }
      double[] t = new double[readings.size()];
      double[] v = new double[readings.size()];
      for (int j = 0; j < t.length; j++) {
        t[j] = readings.get(j)[0];
        v[j] = readings.get(j)[1];
      }
      times.add(t);
      values.add(v);
    }
    // Settlement = (gauge travel from the start of the increment, or the settlement read) less the
    // change of the apparatus deflection over the increment, as GaugeConversion.curves computes
    // it; computed here reading by reading so that a value beyond the range of a double is
    // refused with the line and the value as written.
    GaugeConversion conversion =
        gauge ? GaugeConversion.of(LabUnit.METRE, properties.gaugeDirection) : null;
    double start = gauge ? properties.gaugeZeroMetres : 0;
    List<SettlementCurve> curves = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      IncrementRow increment = increments.get(i);
      double[] v = values.get(i);
      List<Row> rows = rowsPerIncrement.get(i);
      double[] settlement = new double[v.length];
      for (int j = 0; j < v.length; j++) {
        Row row = rows.get(j);
        String cell = row.cells().get(2);
        double read;
        if (gauge) {
          try {
            read = conversion.travelMetres(v[j], start);
          } catch (IllegalArgumentException e) {
            throw table.error(row, valueName, cell, e.getMessage());
          }
        } else {
          read = v[j];
        }
        settlement[j] = read - increment.deflectionChange;
        if (!Double.isFinite(settlement[j])) {
          throw table.error(
              row,
              valueName,
              cell,
              Checks.format(
                  "%s (%s m) less the change of the apparatus deflection over increment %d (%s m,"
                      + " %s line %d) is beyond the range of a double",
                  gauge ? "the gauge travel" : "the settlement",
                  Checks.number(read),
                  i + 1,
                  Checks.number(increment.deflectionChange),
                  incrementsName,
                  increment.line));
        }
      }
      if (gauge) {
        start = v[v.length - 1];
      }
      try {
        curves.add(SettlementCurve.of(times.get(i), settlement));
      } catch (IllegalArgumentException e) {
        // Not reached: every reading was checked above as SettlementCurve checks it.
        throw new TestDataException(
            table.source(),
            0,
            null,
            null,
            e.getMessage()
                + " (rows involved: the readings of increment "
                + (i + 1)
                + ", lines "
                + rows.get(0).line()
                + " to "
                + rows.get(rows.size() - 1).line()
                + ")",
            e);
      }
    }
    return new Readings(table.source(), valueName, curves, rowsPerIncrement);
  }
}
