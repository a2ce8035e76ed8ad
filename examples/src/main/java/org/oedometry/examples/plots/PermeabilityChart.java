package org.oedometry.examples.plots;

import static org.oedometry.examples.plots.ChartFiles.VOID_RATIO_MINIMUM_RANGE;
import static org.oedometry.examples.plots.ChartFiles.format;

import java.nio.file.Path;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.core.compressibility.IncrementPermeability;
import org.oedometry.core.compressibility.PermeabilityChangeFit;

/**
 * Void ratio against hydraulic conductivity k (m/s, log scale), one point per increment at its mean
 * void ratio, with the fitted C<sub>k</sub> line (e against log<sub>10</sub> k) across the
 * increments it was fitted to. Filled points were part of the fit, hollow ones were not.
 */
public final class PermeabilityChart {

  private PermeabilityChart() {}

  /**
   * Builds the chart.
   *
   * @param increments k of each increment, from {@link
   *     org.oedometry.core.compressibility.Permeability}; not null, no null element, at least one
   * @param fit the C<sub>k</sub> fit, or its absence with the reason (shown in the subtitle); not
   *     null
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @return the chart
   * @throws IllegalArgumentException if an argument or element is null, or there is no increment
   */
  public static JFreeChart chart(
      List<IncrementPermeability> increments, Derived<PermeabilityChangeFit> fit, String title) {
    if (increments == null
        || fit == null
        || title == null
        || increments.stream().anyMatch(java.util.Objects::isNull)
        || increments.isEmpty()) {
      throw new IllegalArgumentException("increments (at least one), fit and title: not null");
    }
    ChartFiles.headless();
    List<Integer> fitted = fit.value().map(PermeabilityChangeFit::increments).orElse(List.of());
    XYSeries inFit = new XYSeries("increments fitted", false, true);
    XYSeries others = new XYSeries("other increments", false, true);
    double lowest = Double.POSITIVE_INFINITY;
    double highest = 0;
    for (IncrementPermeability inc : increments) {
      boolean used = fitted.contains(inc.index());
      (used ? inFit : others).add(inc.permeability(), inc.meanVoidRatio());
      if (used) {
        lowest = Math.min(lowest, inc.permeability());
        highest = Math.max(highest, inc.permeability());
      }
    }
    XYSeriesCollection data = new XYSeriesCollection();
    data.addSeries(inFit);
    data.addSeries(others);
    String subtitle;
    if (fit.value().isPresent() && highest > lowest) {
      PermeabilityChangeFit f = fit.value().get();
      XYSeries line =
          new XYSeries(
              format("C_k line: C_k = %.3f (R² = %.3f)", f.permeabilityChangeIndex(), f.rSquared()),
              false,
              true);
      for (double k : new double[] {lowest, highest}) {
        line.add(k, f.line().valueAt(Math.log10(k)));
      }
      data.addSeries(line);
      subtitle =
          format(
              "k = c_v m_v γ_w per increment; C_k = de / dlog10 k fitted to %d increments",
              f.increments().size());
    } else {
      subtitle = "k = c_v m_v γ_w per increment; no C_k line: " + fit.absenceReason();
    }
    XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
    renderer.setUseOutlinePaint(false);
    renderer.setSeriesPaint(0, ChartFiles.PALETTE[0]);
    renderer.setSeriesShape(0, ChartFiles.dot(9));
    renderer.setSeriesPaint(1, ChartFiles.PALETTE[0]);
    renderer.setSeriesShape(1, ChartFiles.dot(9));
    renderer.setSeriesShapesFilled(1, false);
    renderer.setSeriesStroke(1, ChartFiles.solid(1.5f));
    renderer.setSeriesPaint(2, ChartFiles.PALETTE[1]);
    renderer.setSeriesLinesVisible(2, true);
    renderer.setSeriesShapesVisible(2, false);
    renderer.setSeriesStroke(2, ChartFiles.solid(1.8f));
    NumberAxis voidRatio = new NumberAxis("Mean void ratio of the increment e (-)");
    voidRatio.setAutoRangeIncludesZero(false);
    voidRatio.setAutoRangeMinimumSize(VOID_RATIO_MINIMUM_RANGE);
    LogAxis kAxis = ChartFiles.scientificLogAxis("Hydraulic conductivity k (m/s), log scale");
    ChartFiles.logTicks(kAxis, data.getDomainLowerBound(false), data.getDomainUpperBound(false));
    XYPlot plot = new XYPlot(data, kAxis, voidRatio, renderer);
    ChartFiles.style(plot);
    return ChartFiles.finish(
        new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true), subtitle);
  }

  /**
   * Builds the chart and writes it as a PNG of {@value ChartFiles#WIDTH} by {@value
   * ChartFiles#HEIGHT} pixels.
   *
   * @param increments k of each increment; not null, no null element, at least one
   * @param fit the C<sub>k</sub> fit or its absence; not null
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @param file where to write; not null
   * @return the file written
   * @throws IllegalArgumentException if an argument or element is null, or there is no increment
   * @throws java.io.UncheckedIOException if the file cannot be written
   */
  public static Path write(
      List<IncrementPermeability> increments,
      Derived<PermeabilityChangeFit> fit,
      String title,
      Path file) {
    return ChartFiles.save(chart(increments, fit, title), file);
  }
}
