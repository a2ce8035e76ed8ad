package org.oedometry.examples.plots;

import static org.oedometry.examples.plots.ChartFiles.format;
import static org.oedometry.examples.plots.ChartFiles.mm;

import java.nio.file.Path;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.oedometry.theory.ClayLayer;

/**
 * The field time-settlement forecast of a clay layer by Terzaghi's theory: settlement (mm,
 * increasing downward) against time since loading (Julian years), with the ultimate primary
 * settlement and the times to 50 % and 90 % consolidation marked.
 */
public final class ForecastChart {

  /** Points sampled along the curve. */
  static final int SAMPLES = 241;

  private ForecastChart() {}

  /**
   * Builds the chart.
   *
   * @param layer the clay layer; not null
   * @param horizonSeconds the time the chart ends at, s; finite, &gt; 0
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @return the chart
   * @throws IllegalArgumentException if an argument is null or the horizon is not finite and
   *     positive
   */
  public static JFreeChart chart(ClayLayer layer, double horizonSeconds, String title) {
    if (layer == null || title == null) {
      throw new IllegalArgumentException("layer and title must not be null");
    }
    if (!(horizonSeconds > 0) || horizonSeconds == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          format("horizon (%s s) must be finite and > 0", horizonSeconds));
    }
    ChartFiles.headless();
    double year = ClayYear.SECONDS;
    XYSeries curve = new XYSeries("primary consolidation settlement (Terzaghi)", false, true);
    for (int i = 0; i < SAMPLES; i++) {
      double t = horizonSeconds * i / (SAMPLES - 1);
      curve.add(t / year, mm(layer.settlementAt(t)));
    }
    XYSeriesCollection data = new XYSeriesCollection(curve);
    XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
    renderer.setSeriesPaint(0, ChartFiles.PALETTE[0]);
    renderer.setSeriesStroke(0, ChartFiles.solid(2.0f));
    NumberAxis time = new NumberAxis("Time since loading (years)");
    time.setRange(0, horizonSeconds / year);
    NumberAxis settlement = ChartFiles.settlementAxis("Settlement (mm)");
    settlement.setAutoRangeIncludesZero(true);
    settlement.setRange(0, mm(layer.ultimateSettlement()) * 1.08 + 1e-9);
    XYPlot plot = new XYPlot(data, time, settlement, renderer);
    ChartFiles.style(plot);
    plot.addRangeMarker(
        ChartFiles.rangeMarkLeft(
            mm(layer.ultimateSettlement()),
            format("ultimate %.1f mm", mm(layer.ultimateSettlement())),
            ChartFiles.MARKS));
    double t50 = layer.timeToDegree(0.5);
    double t90 = layer.timeToDegree(0.9);
    if (t50 <= horizonSeconds) {
      plot.addDomainMarker(
          ChartFiles.domainMark(t50 / year, format("t50 = %.2f yr", t50 / year), ChartFiles.MARKS));
    }
    if (t90 <= horizonSeconds) {
      plot.addDomainMarker(
          ChartFiles.domainMark(t90 / year, format("t90 = %.2f yr", t90 / year), ChartFiles.MARKS));
    }
    String subtitle =
        format(
            "%.2f m layer, %s drainage, H_dr = %.2f m, c_v = %.3g m²/yr (Julian year)",
            layer.thickness(),
            layer.drainage().name().toLowerCase(java.util.Locale.ROOT),
            layer.drainagePath(),
            layer.cv() * year);
    return ChartFiles.finish(
        new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true), subtitle);
  }

  /**
   * Builds the chart and writes it as a PNG of {@value ChartFiles#WIDTH} by {@value
   * ChartFiles#HEIGHT} pixels.
   *
   * @param layer the clay layer; not null
   * @param horizonSeconds the time the chart ends at, s; finite, &gt; 0
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @param file where to write; not null
   * @return the file written
   * @throws IllegalArgumentException if an argument is null or the horizon is out of range
   * @throws java.io.UncheckedIOException if the file cannot be written
   */
  public static Path write(ClayLayer layer, double horizonSeconds, String title, Path file) {
    return ChartFiles.save(chart(layer, horizonSeconds, title), file);
  }
}
