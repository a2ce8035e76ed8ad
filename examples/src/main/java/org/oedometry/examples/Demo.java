package org.oedometry.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.io.CsvTables;
import org.oedometry.core.io.OedometerTestCsvReader;
import org.oedometry.core.io.TestDataException;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.examples.plots.PlotGallery;
import org.oedometry.fitting.reduction.TestReduction;
import org.oedometry.fitting.reduction.TestReport;
import org.oedometry.theory.ClayLayer;
import org.oedometry.theory.Drainage;
import org.oedometry.theory.Terzaghi;

/**
 * The demo that README's first command runs: Terzaghi's U-T table, a field time-settlement forecast
 * for an invented clay layer, and the whole reduction of the invented demo test (or of a user's
 * test in the core CSV format) with its report files and charts.
 *
 * <p>The layer is <b>invented, for demonstration</b>: 6 m of soft clay under a made-up riverside
 * warehouse floor, sand above and below (double drainage), c<sub>v</sub> = 1.5 m<sup>2</sup>/yr and
 * 180 mm of ultimate primary consolidation settlement. It is not data from any real site.
 *
 * <p>Outputs must be reviewed by a qualified engineer; local codes and standards govern.
 */
public final class Demo {

  /** The invented layer's thickness, m. */
  static final double LAYER_THICKNESS = 6.0;

  /** The invented layer's c_v, m^2/yr. */
  static final double LAYER_CV_PER_YEAR = 1.5;

  /** The invented layer's ultimate primary consolidation settlement, m. */
  static final double LAYER_ULTIMATE_SETTLEMENT = 0.180;

  /** Degrees of consolidation listed in the U-T table. */
  static final double[] TABLE_DEGREES = {
    0.10, 0.20, 0.30, 0.40, 0.50, 0.60, 0.70, 0.80, 0.90, 0.95, 0.99
  };

  /** Years after loading at which the forecast lists the settlement. */
  static final double[] FORECAST_YEARS = {0.25, 0.5, 1, 2, 3, 5, 10, 20};

  private Demo() {}

  /**
   * Runs the demo (see {@link #run(String[], PrintStream, PrintStream)}) and exits with its code
   * when that is not 0.
   *
   * @param args [output folder [folder of a test in the core CSV format]]
   */
  public static void main(String[] args) {
    int code = run(args, System.out, System.err);
    if (code != 0) {
      System.exit(code);
    }
  }

  /**
   * The demo: prints the U-T table and the field forecast, reduces a test (the invented demo test,
   * or the user's test read from a folder of the core CSV format), prints the report and writes
   * report.csv, report.json, report.ags and the charts (PNG) to the output folder.
   *
   * @param args optional: the output folder (default examples/target/demo), then the folder of a
   *     test to reduce instead of the demo test
   * @param out where the report is printed
   * @param err where a bad input file is explained, naming the file
   * @return 0 on success, 2 for a bad or unreadable input test (also when one of its three files is
   *     missing or is a folder), 3 if an output cannot be written
   */
  static int run(String[] args, PrintStream out, PrintStream err) {
    Path folder = Path.of(args.length > 0 ? args[0] : "examples/target/demo");
    OedometerTest test;
    String name;
    if (args.length > 1) {
      Path input = Path.of(args[1]);
      for (String file :
          List.of(CsvTables.PROPERTIES_FILE, CsvTables.INCREMENTS_FILE, CsvTables.READINGS_FILE)) {
        if (!Files.isRegularFile(input.resolve(file))) {
          err.println(
              "The test in "
                  + input
                  + " cannot be read: "
                  + input.resolve(file)
                  + " is not a file (missing, or a folder)");
          return 2;
        }
      }
      try {
        test = OedometerTestCsvReader.read(input);
      } catch (TestDataException e) {
        err.println("The test in " + input + " cannot be read: " + e.getMessage());
        return 2;
      } catch (IOException e) {
        err.println("The test in " + input + " cannot be read: " + e);
        return 2;
      }
      name = input.getFileName() == null ? "test" : input.getFileName().toString();
    } else {
      print(out);
      test = DemoTestGenerator.generate();
      name = "demo";
    }
    TestReport report = TestReduction.reduce(test);
    out.println();
    out.println(report.toText());
    try {
      Files.createDirectories(folder);
      Files.writeString(folder.resolve("report.csv"), report.toCsv(), StandardCharsets.UTF_8);
      Files.writeString(folder.resolve("report.json"), report.toJson(), StandardCharsets.UTF_8);
      Files.writeString(folder.resolve("report.ags"), report.toAgs4(), StandardCharsets.UTF_8);
      List<Path> charts = PlotGallery.write(test, report, name, folder);
      out.println(
          "Wrote report.csv, report.json, report.ags and "
              + charts.size()
              + " charts (PNG) to "
              + folder.toAbsolutePath());
    } catch (IOException | java.io.UncheckedIOException e) {
      err.println("Cannot write the results to " + folder.toAbsolutePath() + ": " + e);
      return 3;
    }
    return 0;
  }

  /**
   * Prints the U-T table and the forecast.
   *
   * @param out where to print
   */
  static void print(PrintStream out) {
    double year = ClayLayer.SECONDS_PER_JULIAN_YEAR;
    out.println("oedometry demo: Terzaghi's one-dimensional consolidation");
    out.println(
        "(results are for review by a qualified engineer; local codes and standards" + " govern)");
    out.println();
    out.println("Average degree of consolidation U against time factor T = c_v t / H_dr^2");
    out.println("  U (%)   T (exact)    T (published, rounded)");
    for (double degree : TABLE_DEGREES) {
      String published = "";
      if (degree == 0.5) {
        published = format("%.3f", Terzaghi.ROUNDED_TIME_FACTOR_50);
      } else if (degree == 0.9) {
        published = format("%.3f", Terzaghi.ROUNDED_TIME_FACTOR_90);
      }
      out.println(
          format("  %5.1f   %.7f    %s", 100 * degree, Terzaghi.timeFactor(degree), published)
              .stripTrailing());
    }
    out.println();

    ClayLayer layer =
        ClayLayer.of(
            LAYER_THICKNESS, Drainage.DOUBLE, LAYER_CV_PER_YEAR / year, LAYER_ULTIMATE_SETTLEMENT);
    out.println(
        "Field forecast (INVENTED layer, for demonstration only: 6 m soft clay under a"
            + " made-up riverside warehouse floor, sand above and below)");
    out.println("  " + layer);
    out.println(
        format(
            "  time to 50 %%: %.2f years; to 90 %%: %.2f years (Julian years)",
            layer.timeToDegree(0.5) / year, layer.timeToDegree(0.9) / year));
    out.println("  years    T        U (%)   settlement (mm)");
    for (double years : FORECAST_YEARS) {
      double seconds = years * year;
      out.println(
          format(
              "  %5.2f   %6.4f   %5.1f   %6.1f",
              years,
              layer.timeFactorAt(seconds),
              100 * layer.degreeAt(seconds),
              1000 * layer.settlementAt(seconds)));
    }
  }

  private static String format(String template, Object... values) {
    return String.format(Locale.ROOT, template, values);
  }
}
