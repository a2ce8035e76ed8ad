package org.oedometry.examples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.BiFunction;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.examples.plots.PlotGallery;
import org.oedometry.fitting.AsaokaMethod;
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.EarlySlopeMethod;
import org.oedometry.fitting.FitException;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.InflectionPointMethod;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.RectangularHyperbolaMethod;
import org.oedometry.fitting.RootTimeMethod;
import org.oedometry.theory.ClayLayer;
import org.oedometry.theory.Drainage;
import org.oedometry.theory.Terzaghi;

/**
 * The demo that README's first command runs: Terzaghi's U-T table and a field time-settlement
 * forecast for an invented clay layer.
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
   * Prints the demo to standard output and writes the charts of the demo test.
   *
   * @param args optional: the folder for the charts (default examples/target/demo)
   * @throws IOException if a chart cannot be written
   */
  public static void main(String[] args) throws IOException {
    print(System.out);
    Path folder = Path.of(args.length > 0 ? args[0] : "examples/target/demo");
    List<Path> charts = PlotGallery.write(DemoTestGenerator.generate(), "demo", folder);
    System.out.println();
    System.out.println(
        "Wrote "
            + charts.size()
            + " charts (PNG) of the invented demo test to "
            + folder.toAbsolutePath());
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
    out.println();
    printMethods(out, DemoTestGenerator.generate());
  }

  /** The per-increment methods, in the order of the table's columns. */
  static final List<BiFunction<SettlementCurve, Double, CvEstimate>> METHODS =
      List.of(
          LogTimeMethod::fit,
          RootTimeMethod::fit,
          FullCurveMethod::fit,
          InflectionPointMethod::fit,
          RectangularHyperbolaMethod::fit,
          EarlySlopeMethod::fit,
          AsaokaMethod::fit);

  /**
   * Prints c_v of every increment of a test by every method, in m^2/yr, with the drainage path from
   * the mean height of the increment (double drainage: half of it); "-" where a method finds no
   * honest value, "*" after a value that carries warnings.
   *
   * @param out where to print
   * @param test the test
   */
  static void printMethods(PrintStream out, OedometerTest test) {
    double year = ClayLayer.SECONDS_PER_JULIAN_YEAR;
    out.println("c_v (m^2/yr) of the INVENTED demo test (" + test.identifiers() + ")");
    out.println(
        "  drainage path: "
            + test.drainage().name().toLowerCase(Locale.ROOT)
            + " drainage, from the mean height of each increment; '-' no honest value, '*' value"
            + " with warnings");
    out.println(
        "  incr  stress (kPa)   H_dr (mm)   log-time  root-time full-curve inflection  hyperbola"
            + " early-slope   Asaoka");
    for (int j = 0; j < test.increments().size(); j++) {
      LoadIncrement increment = test.increments().get(j);
      double path =
          test.drainage()
              .drainagePath((test.heightAtStartMetres(j) + test.heightAtEndMetres(j)) / 2);
      StringBuilder row =
          new StringBuilder(
              format(
                  "  %4d  %5.0f -> %5.0f  %8.3f ",
                  j + 1,
                  increment.stressBeforePascals() / 1000,
                  increment.stressAfterPascals() / 1000,
                  path * 1000));
      for (BiFunction<SettlementCurve, Double, CvEstimate> method : METHODS) {
        String cell;
        try {
          CvEstimate estimate = method.apply(increment.curve(), path);
          cell = format("%.3g%s", estimate.cv() * year, estimate.warnings().isEmpty() ? "" : "*");
        } catch (FitException e) {
          cell = "-";
        }
        row.append(format(" %10s", cell));
      }
      out.println(row.toString().stripTrailing());
    }
  }

  private static String format(String template, Object... values) {
    return String.format(Locale.ROOT, template, values);
  }
}
