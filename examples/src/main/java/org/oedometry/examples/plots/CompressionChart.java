package org.oedometry.examples.plots;

import static org.oedometry.examples.plots.ChartFiles.VOID_RATIO_MINIMUM_RANGE;
import static org.oedometry.examples.plots.ChartFiles.format;

import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.CompressionPoint;
import org.oedometry.core.compressibility.ConstructionLine;
import org.oedometry.core.compressibility.ConstructionPoint;
import org.oedometry.core.compressibility.PlotAxes;
import org.oedometry.core.compressibility.PreconsolidationEstimate;
import org.oedometry.core.compressibility.PreconsolidationMethod;

/**
 * Void ratio against effective stress (kPa, log scale) with the preconsolidation constructions
 * drawn over it. Constructions given on e &ndash; log<sub>10</sub>&sigma;' axes are drawn as they
 * are; those on log(1 + e) or ln(1 + e) axes (Onitsuka, Butterfield) are mapped back to e, so their
 * straight lines appear slightly curved; the work method's construction lives on other axes (work
 * against stress) and shows here only as its &sigma;'<sub>p</sub>. Each found &sigma;'<sub>p</sub>
 * is marked on the curve (interpolated on the first-loading branch, linear in log &sigma;') and
 * named with its value in the legend; a construction that found none is named in the subtitle with
 * its reason. A marked point whose label repeats more than three times (a smooth fit) is drawn as a
 * thin line.
 */
public final class CompressionChart {

  private static final int SAMPLES_PER_MAPPED_LINE = 24;

  private CompressionChart() {}

  /**
   * Builds the chart.
   *
   * @param curve the compression curve (stresses Pa, void ratios); not null
   * @param estimates the preconsolidation constructions on that curve, in the order to draw; not
   *     null, no null element (may be empty)
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @return the chart
   * @throws IllegalArgumentException if an argument or element is null
   */
  public static JFreeChart chart(
      CompressionCurve curve, List<PreconsolidationEstimate> estimates, String title) {
    if (curve == null
        || estimates == null
        || title == null
        || estimates.stream().anyMatch(java.util.Objects::isNull)) {
      throw new IllegalArgumentException("curve, estimates (and each estimate), title: not null");
    }
    ChartFiles.headless();
    XYSeriesCollection lines = new XYSeriesCollection();
    XYSeriesCollection marks = new XYSeriesCollection();
    XYSeries test = new XYSeries("end-of-increment points, in the order applied", false, true);
    if (curve.seatingStress() > 0) {
      test.add(kilopascals(curve.seatingStress()), curve.initialVoidRatio());
    }
    for (CompressionPoint p : curve.points()) {
      test.add(kilopascals(p.effectiveStress()), p.voidRatio());
    }
    marks.addSeries(test);
    List<String> missing = new ArrayList<>();
    List<Color> colours = new ArrayList<>();
    int colour = 0;
    for (PreconsolidationEstimate estimate : estimates) {
      if (estimate.preconsolidationPressure().isEmpty()) {
        missing.add(name(estimate.method()) + ": " + estimate.absenceReason());
        continue;
      }
      double pressure = estimate.preconsolidationPressure().getAsDouble();
      String label = format("%s: σ'p = %.1f kPa", name(estimate.method()), kilopascals(pressure));
      XYSeries construction = new XYSeries(label, false, true);
      drawConstruction(estimate, construction);
      lines.addSeries(construction);
      XYSeries found = new XYSeries(label + " (point)", false, true);
      OptionalDouble e = firstLoadingVoidRatio(curve, pressure);
      if (e.isPresent()) {
        found.add(kilopascals(pressure), e.getAsDouble());
      }
      marks.addSeries(found);
      colours.add(ChartFiles.PALETTE[colour++ % ChartFiles.PALETTE.length]);
    }

    XYLineAndShapeRenderer markRenderer = new XYLineAndShapeRenderer();
    markRenderer.setSeriesPaint(0, ChartFiles.READINGS);
    markRenderer.setSeriesShape(0, ChartFiles.dot(8));
    markRenderer.setSeriesStroke(0, ChartFiles.solid(1.0f));
    XYLineAndShapeRenderer lineRenderer = new XYLineAndShapeRenderer(true, false);
    for (int i = 0; i < colours.size(); i++) {
      lineRenderer.setSeriesPaint(i, colours.get(i));
      lineRenderer.setSeriesStroke(i, ChartFiles.solid(1.4f));
      markRenderer.setSeriesPaint(i + 1, colours.get(i));
      markRenderer.setSeriesLinesVisible(i + 1, false);
      markRenderer.setSeriesShape(i + 1, ChartFiles.square(10));
      markRenderer.setSeriesVisibleInLegend(i + 1, false);
    }
    NumberAxis voidRatio = new NumberAxis("Void ratio e (-)");
    voidRatio.setAutoRangeIncludesZero(false);
    voidRatio.setAutoRangeMinimumSize(VOID_RATIO_MINIMUM_RANGE);
    LogAxis stressAxis = ChartFiles.logAxis("Vertical effective stress σ' (kPa), log scale");
    ChartFiles.logTicks(
        stressAxis, marks.getDomainLowerBound(false), marks.getDomainUpperBound(false));
    XYPlot plot = new XYPlot(marks, stressAxis, voidRatio, markRenderer);
    plot.setDataset(1, lines);
    plot.setRenderer(1, lineRenderer);
    ChartFiles.style(plot);
    String subtitle =
        "Preconsolidation pressure by each construction"
            + (missing.isEmpty() ? "" : "; none found by " + String.join("; ", missing));
    return ChartFiles.finish(
        new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true), subtitle);
  }

  /**
   * Builds the chart and writes it as a PNG of {@value ChartFiles#WIDTH} by {@value
   * ChartFiles#HEIGHT} pixels.
   *
   * @param curve the compression curve; not null
   * @param estimates the preconsolidation constructions; not null, no null element
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @param file where to write; not null
   * @return the file written
   * @throws IllegalArgumentException if an argument or element is null
   * @throws java.io.UncheckedIOException if the file cannot be written
   */
  public static Path write(
      CompressionCurve curve, List<PreconsolidationEstimate> estimates, String title, Path file) {
    return ChartFiles.save(chart(curve, estimates, title), file);
  }

  /** A plain name of each construction, for the legend. */
  static String name(PreconsolidationMethod method) {
    return switch (method) {
      case CASAGRANDE -> "Casagrande";
      case PACHECO_SILVA -> "Pacheco Silva";
      case BUTTERFIELD -> "Butterfield";
      case ONITSUKA -> "Onitsuka et al.";
      case BECKER_WORK -> "Becker et al. (work)";
    };
  }

  /** Lines and repeated-label points of a construction, in (kPa, e), gaps between pieces. */
  private static void drawConstruction(PreconsolidationEstimate estimate, XYSeries out) {
    PlotAxes axes = estimate.axes();
    if (axes == PlotAxes.STRESS_WORK) {
      return;
    }
    for (ConstructionLine line : estimate.lines()) {
      for (int k = 0; k <= SAMPLES_PER_MAPPED_LINE; k++) {
        double f = (double) k / SAMPLES_PER_MAPPED_LINE;
        double x = line.x1() + f * (line.x2() - line.x1());
        double y = line.y1() + f * (line.y2() - line.y1());
        out.add(toKilopascals(axes, x), toVoidRatio(axes, y));
      }
      out.add(toKilopascals(axes, line.x2()), null);
    }
    Map<String, List<ConstructionPoint>> byLabel = new LinkedHashMap<>();
    for (ConstructionPoint p : estimate.points()) {
      byLabel.computeIfAbsent(p.label(), key -> new ArrayList<>()).add(p);
    }
    for (List<ConstructionPoint> group : byLabel.values()) {
      if (group.size() > 3) {
        for (ConstructionPoint p : group) {
          out.add(toKilopascals(axes, p.x()), toVoidRatio(axes, p.y()));
        }
        out.add(toKilopascals(axes, group.get(group.size() - 1).x()), null);
      }
    }
  }

  private static double toKilopascals(PlotAxes axes, double x) {
    return switch (axes) {
      case LN_STRESS_LN_ONE_PLUS_VOID_RATIO -> kilopascals(Math.exp(x));
      case STRESS_WORK -> kilopascals(x);
      default -> kilopascals(Math.pow(10, x));
    };
  }

  private static double toVoidRatio(PlotAxes axes, double y) {
    return switch (axes) {
      case LOG10_STRESS_LOG10_ONE_PLUS_VOID_RATIO -> Math.pow(10, y) - 1;
      case LN_STRESS_LN_ONE_PLUS_VOID_RATIO -> Math.exp(y) - 1;
      default -> y;
    };
  }

  /** e at a stress on the first-loading branch, linear in log stress; empty outside it. */
  static OptionalDouble firstLoadingVoidRatio(CompressionCurve curve, double stress) {
    List<double[]> branch = new ArrayList<>();
    if (curve.seatingStress() > 0) {
      branch.add(new double[] {curve.seatingStress(), curve.initialVoidRatio()});
    }
    for (CompressionPoint p : curve.points()) {
      if (!branch.isEmpty() && p.effectiveStress() <= branch.get(branch.size() - 1)[0]) {
        break;
      }
      branch.add(new double[] {p.effectiveStress(), p.voidRatio()});
    }
    for (int i = 1; i < branch.size(); i++) {
      double[] a = branch.get(i - 1);
      double[] b = branch.get(i);
      if (stress >= a[0] && stress <= b[0]) {
        double f = Math.log(stress / a[0]) / Math.log(b[0] / a[0]);
        return OptionalDouble.of(a[1] + f * (b[1] - a[1]));
      }
    }
    return OptionalDouble.empty();
  }

  private static double kilopascals(double pascals) {
    return pascals / 1000.0;
  }
}
