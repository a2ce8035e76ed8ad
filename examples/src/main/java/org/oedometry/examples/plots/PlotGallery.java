package org.oedometry.examples.plots;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.compressibility.BilinearVolumeMethod;
import org.oedometry.core.compressibility.CasagrandeMethod;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.core.compressibility.IncrementPermeability;
import org.oedometry.core.compressibility.PachecoSilvaMethod;
import org.oedometry.core.compressibility.Permeability;
import org.oedometry.core.compressibility.PermeabilityChangeIndex;
import org.oedometry.core.compressibility.PreconsolidationEstimate;
import org.oedometry.core.compressibility.WorkMethod;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.reduction.IncrementReport;
import org.oedometry.fitting.reduction.MethodOutcome;
import org.oedometry.fitting.reduction.TestReduction;
import org.oedometry.fitting.reduction.TestReport;
import org.oedometry.theory.ClayLayer;
import org.oedometry.theory.Drainage;

/**
 * Draws every chart of this package for one oedometer test, reducing it with the library's methods
 * directly: log-time, root-time and full-curve fits of each increment (each with the test's
 * drainage path rule, one fixed-point round where the rule needs d50), &sigma;'<sub>p</sub> by
 * every construction from the end-of-increment compression curve, m<sub>v</sub> with the increments
 * classed as the report classes them (by the first construction that found &sigma;'<sub>p</sub>;
 * where none did, the increments are not classed and the c<sub>v</sub> chart draws them as such), k
 * = c<sub>v</sub> m<sub>v</sub> &gamma;<sub>w</sub> from the full-curve c<sub>v</sub>,
 * C<sub>k</sub> over the normally consolidated increments, and a field forecast for an invented
 * layer with the c<sub>v</sub> of the last loading increment.
 *
 * <p>Run on the invented demo test: {@code mvn -B -q -pl examples -am compile exec:java
 * -Ddemo.mainClass=org.oedometry.examples.plots.PlotGallery -Dexec.args=examples/target/plots}. The
 * demo data and the forecast layer are <b>invented, for demonstration</b>; charts of real data must
 * be reviewed by a qualified engineer, and local codes and standards govern.
 */
public final class PlotGallery {

  /** Folder written when no argument is given. */
  public static final String DEFAULT_FOLDER = "examples/target/plots";

  /** Thickness of the invented forecast layer, m. */
  static final double LAYER_THICKNESS = 6.0;

  /** Ultimate primary settlement of the invented forecast layer, m. */
  static final double LAYER_SETTLEMENT = 0.180;

  private PlotGallery() {}

  /**
   * Draws the demo test's charts.
   *
   * @param args the output folder (default {@value #DEFAULT_FOLDER})
   */
  public static void main(String[] args) {
    Path folder = Path.of(args.length > 0 ? args[0] : DEFAULT_FOLDER);
    List<Path> written = write(DemoTestGenerator.generate(), "Invented demo test", folder);
    System.out.println(written.size() + " charts written to " + folder.toAbsolutePath());
  }

  /**
   * Reduces a test and writes all its charts into a folder: per increment {@code
   * increment-NN-log-time.png}, {@code -root-time.png}, {@code -full-curve.png} (NN from 01; a
   * chart whose method failed on that increment is left out), then {@code compression.png} (left
   * out when the test has no compression curve, as when its first increment unloads), {@code
   * cv.png}, {@code permeability.png} (each left out when it would have no point) and {@code
   * forecast.png}.
   *
   * @param test the test; not null
   * @param name what to call the test in chart titles (shown on one line, cut with the rest of the
   *     title at {@value ChartFiles#TITLE_LENGTH} characters); not null
   * @param folder the output folder (created if needed); not null
   * @return the files written, in the order above
   * @throws IllegalArgumentException if an argument is null
   * @throws java.io.UncheckedIOException if a file cannot be written
   */
  public static List<Path> write(OedometerTest test, String name, Path folder) {
    if (test == null || name == null || folder == null) {
      throw new IllegalArgumentException("test, name and folder must not be null");
    }
    return write(test, TestReduction.reduce(test), name, folder);
  }

  /**
   * Writes every chart of a test from its reduction (the report's drainage paths and fits, so the
   * charts show exactly what the report says).
   *
   * @param test the test; not null
   * @param report its reduction; not null
   * @param name what to call the test in chart titles (shown on one line, cut with the rest of the
   *     title at {@value ChartFiles#TITLE_LENGTH} characters); not null
   * @param folder the output folder (created if needed); not null
   * @return the files written, as {@link #write(OedometerTest, String, Path)} describes
   * @throws IllegalArgumentException if an argument is null
   * @throws java.io.UncheckedIOException if a file cannot be written
   */
  public static List<Path> write(OedometerTest test, TestReport report, String name, Path folder) {
    if (test == null || report == null || name == null || folder == null) {
      throw new IllegalArgumentException("test, report, name and folder must not be null");
    }
    List<Path> written = new ArrayList<>();
    for (int i = 0; i < test.increments().size(); i++) {
      IncrementReport increment = report.increments().get(i);
      LoadIncrement inc = test.increments().get(i);
      SettlementCurve curve = inc.curve();
      String title =
          String.format(
              Locale.ROOT,
              "%s, increment %d: %.1f to %.1f kPa",
              name,
              i + 1,
              inc.stressBeforePascals() / 1000,
              inc.stressAfterPascals() / 1000);
      String stem = String.format(Locale.ROOT, "increment-%02d-", i + 1);
      increment
          .logTime()
          .ifPresent(
              r ->
                  written.add(
                      LogTimeChart.write(curve, r, title, folder.resolve(stem + "log-time.png"))));
      increment
          .rootTime()
          .ifPresent(
              r ->
                  written.add(
                      RootTimeChart.write(
                          curve, r, title, folder.resolve(stem + "root-time.png"))));
      fullCurve(increment)
          .ifPresent(
              r ->
                  written.add(
                      FullCurveChart.write(
                          curve, r, title, folder.resolve(stem + "full-curve.png"))));
    }
    Optional<CompressionCurve> curve =
        report.compressionCurve().value().or(() -> endOfIncrementCurve(test));
    curve.ifPresent(
        c ->
            written.add(
                CompressionChart.write(
                    c,
                    report.preconsolidation(),
                    name + ": void ratio against effective stress",
                    folder.resolve("compression.png"))));
    List<CvPoint> cvPoints = cvPoints(report);
    List<IncrementPermeability> permeability = new ArrayList<>();
    List<IncrementPermeability> normallyConsolidated = new ArrayList<>();
    for (IncrementReport increment : report.increments()) {
      if (increment.compressibility().value().isEmpty()) {
        continue;
      }
      IncrementCompressibility compressibility = increment.compressibility().value().get();
      if (increment.preferredCv().isPresent() && compressibility.mv() > 0) {
        List<IncrementPermeability> k =
            Permeability.perIncrement(
                List.of(compressibility), new double[] {increment.preferredCv().getAsDouble()});
        permeability.addAll(k);
        if (increment.stressHistory().value().orElse(null)
            == IncrementClass.NORMALLY_CONSOLIDATED) {
          normallyConsolidated.addAll(k);
        }
      }
    }
    if (!cvPoints.isEmpty()) {
      written.add(
          CvChart.write(
              cvPoints,
              name + ": coefficient of consolidation against stress",
              folder.resolve("cv.png")));
    }
    if (!permeability.isEmpty()) {
      written.add(
          PermeabilityChart.write(
              permeability,
              PermeabilityChangeIndex.fit(normallyConsolidated),
              name + ": void ratio against hydraulic conductivity (the report's c_v)",
              folder.resolve("permeability.png")));
    }
    double layerCv = lastLoadingCv(report).orElse(1.0 / ClayLayer.SECONDS_PER_JULIAN_YEAR);
    ClayLayer layer = ClayLayer.of(LAYER_THICKNESS, Drainage.DOUBLE, layerCv, LAYER_SETTLEMENT);
    written.add(
        ForecastChart.write(
            layer,
            layer.timeToDegree(0.99),
            "Field forecast: INVENTED 6 m clay layer, c_v of the test's last loading increment",
            folder.resolve("forecast.png")));
    return List.copyOf(written);
  }

  /**
   * The points of the c_v chart: every method's c_v of every increment that has a compressibility,
   * classed as the report classes the increment (not classed where the report found no σ'_p).
   */
  static List<CvPoint> cvPoints(TestReport report) {
    List<CvPoint> points = new ArrayList<>();
    for (IncrementReport increment : report.increments()) {
      if (increment.compressibility().value().isEmpty()) {
        continue;
      }
      for (MethodOutcome outcome : increment.methods()) {
        outcome.estimate().ifPresent(e -> points.add(CvPoint.of(increment, e)));
      }
    }
    return points;
  }

  /** σ'_p by every construction the library offers, in a fixed order. */
  static List<PreconsolidationEstimate> preconsolidation(CompressionCurve curve) {
    return List.of(
        CasagrandeMethod.estimate(curve),
        PachecoSilvaMethod.estimate(curve),
        WorkMethod.estimate(curve),
        BilinearVolumeMethod.butterfield(curve),
        BilinearVolumeMethod.onitsuka(curve));
  }

  /**
   * The end-of-increment compression curve, or none where the test does not admit one (its first
   * increment unloads, so no point lies above the seating stress).
   */
  private static Optional<CompressionCurve> endOfIncrementCurve(OedometerTest test) {
    try {
      return Optional.of(CompressionCurve.fromTest(test));
    } catch (IllegalArgumentException e) {
      return Optional.empty();
    }
  }

  /** The full-curve fit of an increment, if the report has one. */
  static Optional<FullCurveResult> fullCurve(IncrementReport increment) {
    return increment
        .estimate(CvMethod.FULL_CURVE)
        .filter(FullCurveResult.class::isInstance)
        .map(FullCurveResult.class::cast);
  }

  /** The report's c_v of the last increment that loads, if it has one. */
  private static Optional<Double> lastLoadingCv(TestReport report) {
    for (int i = report.increments().size() - 1; i >= 0; i--) {
      IncrementReport increment = report.increments().get(i);
      if (increment.stressAfterPascals() > increment.stressBeforePascals()) {
        return increment.preferredCv().isPresent()
            ? Optional.of(increment.preferredCv().getAsDouble())
            : Optional.empty();
      }
    }
    return Optional.empty();
  }
}
