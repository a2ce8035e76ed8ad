package org.oedometry.examples.plots;

import static org.oedometry.examples.plots.ChartFiles.format;
import static org.oedometry.examples.plots.ChartFiles.minutes;
import static org.oedometry.examples.plots.ChartFiles.mm;

import java.awt.Color;
import java.nio.file.Path;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.LogTimeGeometry;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.PlotPoint;
import org.oedometry.fitting.StraightLine;

/**
 * The log-time (Casagrande) construction of one increment: the readings as settlement (mm,
 * increasing downward) against elapsed time (minutes, log scale), the tangent at the inflection
 * point, the secondary line, and d0, d50, d100 and t50 marked. The reading at t = 0 cannot lie on a
 * log axis and is left out. Drawn from {@link LogTimeResult#geometry()}, whose x is
 * log<sub>10</sub> of the time in seconds.
 */
public final class LogTimeChart {

  private LogTimeChart() {}

  /**
   * Builds the chart.
   *
   * @param curve the increment's readings (time s, settlement m); not null
   * @param result the construction on those readings; not null
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @return the chart
   * @throws IllegalArgumentException if an argument is null
   */
  public static JFreeChart chart(SettlementCurve curve, LogTimeResult result, String title) {
    if (curve == null || result == null || title == null) {
      throw new IllegalArgumentException("curve, result and title must not be null");
    }
    ChartFiles.headless();
    LogTimeGeometry g = result.geometry();
    XYSeries readings = new XYSeries("readings", false, true);
    for (int i = 0; i < curve.size(); i++) {
      double t = curve.elapsedSeconds(i);
      if (t > 0) {
        readings.add(minutes(t), mm(curve.settlementMetres(i)));
      }
    }
    XYSeriesCollection data = new XYSeriesCollection();
    data.addSeries(readings);
    data.addSeries(line("tangent at the inflection point", g.inflectionTangent()));
    data.addSeries(line("secondary (final) line", g.secondaryLine()));
    XYSeries marks = new XYSeries("inflection, 50 % and 100 % points", false, true);
    for (PlotPoint p :
        new PlotPoint[] {g.inflectionPoint(), g.halfConsolidation(), g.endOfPrimary()}) {
      marks.add(minutes(Math.pow(10, p.x())), mm(p.y()));
    }
    data.addSeries(marks);

    XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
    boolean dense = curve.size() > 200;
    renderer.setSeriesLinesVisible(0, !dense);
    renderer.setSeriesShapesVisible(0, true);
    renderer.setSeriesShape(0, ChartFiles.dot(dense ? 2.5 : 6));
    renderer.setSeriesPaint(0, ChartFiles.READINGS);
    renderer.setSeriesStroke(0, ChartFiles.solid(0.8f));
    renderer.setSeriesShapesVisible(1, false);
    renderer.setSeriesPaint(1, ChartFiles.PALETTE[0]);
    renderer.setSeriesStroke(1, ChartFiles.solid(1.6f));
    renderer.setSeriesShapesVisible(2, false);
    renderer.setSeriesPaint(2, ChartFiles.PALETTE[1]);
    renderer.setSeriesStroke(2, ChartFiles.solid(1.6f));
    renderer.setSeriesLinesVisible(3, false);
    renderer.setSeriesShape(3, ChartFiles.square(9));
    renderer.setSeriesPaint(3, ChartFiles.PALETTE[2]);

    XYPlot plot =
        new XYPlot(
            data,
            timeAxis(data),
            ChartFiles.settlementAxis("Settlement since the load was applied (mm)"),
            renderer);
    ChartFiles.style(plot);
    Color mark = ChartFiles.MARKS;
    plot.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d0()), format("d0 = %.3f mm", mm(result.d0())), mark));
    plot.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d50()), format("d50 = %.3f mm", mm(result.d50())), mark));
    plot.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d100()), format("d100 = %.3f mm", mm(result.d100())), mark));
    plot.addDomainMarker(
        ChartFiles.domainMark(
            minutes(result.t50()), format("t50 = %.2f min", minutes(result.t50())), mark));
    String subtitle =
        format(
            "Log-time construction (Casagrande): c_v = %.3g m²/yr, H_dr = %.3f mm, T50 = %.7f%s",
            result.cv() * ClayYear.SECONDS,
            mm(result.drainagePath()),
            result.timeFactor50(),
            result.warnings().isEmpty() ? "" : "; warnings: " + Warnings.kinds(result.warnings()));
    return ChartFiles.finish(
        new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true), subtitle);
  }

  /**
   * Builds the chart and writes it as a PNG of {@value ChartFiles#WIDTH} by {@value
   * ChartFiles#HEIGHT} pixels.
   *
   * @param curve the increment's readings; not null
   * @param result the construction on those readings; not null
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @param file where to write; not null
   * @return the file written
   * @throws IllegalArgumentException if an argument is null
   * @throws java.io.UncheckedIOException if the file cannot be written
   */
  public static Path write(SettlementCurve curve, LogTimeResult result, String title, Path file) {
    return ChartFiles.save(chart(curve, result, title), file);
  }

  private static org.jfree.chart.axis.LogAxis timeAxis(XYSeriesCollection data) {
    org.jfree.chart.axis.LogAxis axis = ChartFiles.logAxis("Elapsed time (min), log scale");
    ChartFiles.logTicks(axis, data.getDomainLowerBound(false), data.getDomainUpperBound(false));
    return axis;
  }

  /** A line given in (log10 t/s, settlement m) as a two-point series in (min, mm). */
  private static XYSeries line(String name, StraightLine line) {
    XYSeries series = new XYSeries(name, false, true);
    series.add(minutes(Math.pow(10, line.fromX())), mm(line.valueAt(line.fromX())));
    series.add(minutes(Math.pow(10, line.toX())), mm(line.valueAt(line.toX())));
    return series;
  }
}
