package org.oedometry.examples.plots;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.BiFunction;
import java.util.function.ToDoubleFunction;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.compressibility.BilinearVolumeMethod;
import org.oedometry.core.compressibility.CasagrandeMethod;
import org.oedometry.core.compressibility.Compressibility;
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
import org.oedometry.fitting.CvEstimate;
import org.oedometry.fitting.FitException;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.RootTimeMethod;
import org.oedometry.fitting.RootTimeResult;
import org.oedometry.theory.ClayLayer;
import org.oedometry.theory.Drainage;

/**
 * Draws every chart of this package for one oedometer test, reducing it with the library's methods
 * directly: log-time, root-time and full-curve fits of each increment (each with the test's
 * drainage path rule, one fixed-point round where the rule needs d50), &sigma;'<sub>p</sub> by
 * every construction from the end-of-increment compression curve, m<sub>v</sub> with the increments
 * classed by the Casagrande &sigma;'<sub>p</sub>, k = c<sub>v</sub> m<sub>v</sub>
 * &gamma;<sub>w</sub> from the full-curve c<sub>v</sub>, C<sub>k</sub> over the normally
 * consolidated increments, and a field forecast for an invented layer with the c<sub>v</sub> of the
 * last loading increment.
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
   * chart whose method failed on that increment is left out), then {@code compression.png}, {@code
   * cv.png}, {@code permeability.png} and {@code forecast.png}.
   *
   * @param test the test; not null
   * @param name what to call the test in chart titles; not null
   * @param folder the output folder (created if needed); not null
   * @return the files written, in the order above
   * @throws IllegalArgumentException if an argument is null
   * @throws java.io.UncheckedIOException if a file cannot be written
   */
  public static List<Path> write(OedometerTest test, String name, Path folder) {
    if (test == null || name == null || folder == null) {
      throw new IllegalArgumentException("test, name and folder must not be null");
    }
    List<Path> written = new ArrayList<>();
    List<IncrementFits> fits = new ArrayList<>();
    for (int i = 0; i < test.increments().size(); i++) {
      IncrementFits f = fit(test, i);
      fits.add(f);
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
      f.logTime.ifPresent(
          r ->
              written.add(
                  LogTimeChart.write(curve, r, title, folder.resolve(stem + "log-time.png"))));
      f.rootTime.ifPresent(
          r ->
              written.add(
                  RootTimeChart.write(curve, r, title, folder.resolve(stem + "root-time.png"))));
      f.fullCurve.ifPresent(
          r ->
              written.add(
                  FullCurveChart.write(curve, r, title, folder.resolve(stem + "full-curve.png"))));
    }
    CompressionCurve curve = CompressionCurve.fromTest(test);
    List<PreconsolidationEstimate> estimates = preconsolidation(curve);
    written.add(
        CompressionChart.write(
            curve,
            estimates,
            name + ": void ratio against effective stress",
            folder.resolve("compression.png")));
    double pressure =
        estimates.stream()
            .filter(e -> e.preconsolidationPressure().isPresent())
            .findFirst()
            .map(e -> e.preconsolidationPressure().getAsDouble())
            .orElse(curve.points().get(0).effectiveStress());
    List<IncrementCompressibility> compressibility = Compressibility.increments(curve, pressure);
    List<CvPoint> cvPoints = new ArrayList<>();
    List<IncrementPermeability> permeability = new ArrayList<>();
    for (int i = 0; i < fits.size(); i++) {
      IncrementCompressibility inc = compressibility.get(i);
      IncrementFits f = fits.get(i);
      for (Optional<? extends CvEstimate> estimate : List.of(f.logTime, f.rootTime, f.fullCurve)) {
        estimate.ifPresent(e -> cvPoints.add(CvPoint.of(inc, e)));
      }
      if (f.fullCurve.isPresent() && inc.mv() > 0) {
        permeability.addAll(
            Permeability.perIncrement(List.of(inc), new double[] {f.fullCurve.get().cv()}));
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
      List<IncrementPermeability> normallyConsolidated =
          permeability.stream()
              .filter(
                  k ->
                      compressibility.get(k.index()).stressHistory()
                          == IncrementClass.NORMALLY_CONSOLIDATED)
              .toList();
      written.add(
          PermeabilityChart.write(
              permeability,
              PermeabilityChangeIndex.fit(normallyConsolidated),
              name + ": void ratio against hydraulic conductivity (full-curve c_v)",
              folder.resolve("permeability.png")));
    }
    double layerCv = lastLoadingCv(test, fits).orElse(1.0 / ClayLayer.SECONDS_PER_JULIAN_YEAR);
    ClayLayer layer = ClayLayer.of(LAYER_THICKNESS, Drainage.DOUBLE, layerCv, LAYER_SETTLEMENT);
    written.add(
        ForecastChart.write(
            layer,
            layer.timeToDegree(0.99),
            "Field forecast: INVENTED 6 m clay layer, c_v of the test's last loading increment",
            folder.resolve("forecast.png")));
    return List.copyOf(written);
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

  /** The three per-increment fits; a method that failed is empty. */
  record IncrementFits(
      Optional<LogTimeResult> logTime,
      Optional<RootTimeResult> rootTime,
      Optional<FullCurveResult> fullCurve) {}

  static IncrementFits fit(OedometerTest test, int index) {
    return new IncrementFits(
        withRule(test, index, LogTimeMethod::fit, LogTimeResult::d50),
        withRule(test, index, RootTimeMethod::fit, r -> 0.5 * (r.d0() + r.d100())),
        withRule(test, index, FullCurveMethod::fit, r -> 0.5 * (r.d0() + r.d100())));
  }

  /**
   * A method's fit with the test's drainage path rule: a first fit with the start height, then, if
   * the rule needs the height at 50 % consolidation, a second with the height at that fit's d50.
   */
  static <R> Optional<R> withRule(
      OedometerTest test,
      int index,
      BiFunction<SettlementCurve, Double, R> method,
      ToDoubleFunction<R> d50) {
    SettlementCurve curve = test.increments().get(index).curve();
    double start = test.heightAtStartMetres(index);
    double end = test.heightAtEndMetres(index);
    try {
      R first = method.apply(curve, drainagePath(test, start, start, end));
      if (!test.drainagePathRule().needsFittedCurve()) {
        return Optional.of(first);
      }
      double half = start - d50.applyAsDouble(first);
      return Optional.of(method.apply(curve, drainagePath(test, start, half, end)));
    } catch (FitException | IllegalArgumentException e) {
      return Optional.empty();
    }
  }

  private static double drainagePath(OedometerTest test, double start, double half, double end) {
    return test.drainagePathRule().drainagePath(test.drainage(), start, half, end);
  }

  /** Full-curve c_v of the last increment that loads, if it was fitted. */
  private static Optional<Double> lastLoadingCv(OedometerTest test, List<IncrementFits> fits) {
    for (int i = fits.size() - 1; i >= 0; i--) {
      LoadIncrement inc = test.increments().get(i);
      if (inc.stressAfterPascals() > inc.stressBeforePascals()) {
        return fits.get(i).fullCurve.map(FullCurveResult::cv);
      }
    }
    return Optional.empty();
  }
}
