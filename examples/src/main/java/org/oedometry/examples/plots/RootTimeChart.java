package org.oedometry.examples.plots;

import static org.oedometry.examples.plots.ChartFiles.format;
import static org.oedometry.examples.plots.ChartFiles.mm;

import java.awt.Color;
import java.nio.file.Path;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.RootTimeGeometry;
import org.oedometry.fitting.RootTimeResult;
import org.oedometry.fitting.StraightLine;

/**
 * The root-time (Taylor) construction of one increment: settlement (mm, increasing downward)
 * against the square root of elapsed time (&radic;min), the straight line through the early
 * readings, the line with abscissae larger by the factor (1.15 by the published rule), their d0,
 * the 90 % point, d100 and t90 marked. The time axis ends at {@value #SHOWN_ROOT_T90_MULTIPLE}
 * &radic;t90 (or the last reading, if sooner) so that the construction fills the chart; the
 * subtitle says so. Drawn from {@link RootTimeResult#geometry()}, whose x is &radic;(t / 1 s).
 */
public final class RootTimeChart {

  /** The time axis ends at this multiple of &radic;t90 (or the last reading, if sooner). */
  public static final double SHOWN_ROOT_T90_MULTIPLE = 3.0;

  private static final double ROOT_SECONDS_PER_ROOT_MINUTE = Math.sqrt(60.0);

  private RootTimeChart() {}

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
  public static JFreeChart chart(SettlementCurve curve, RootTimeResult result, String title) {
    if (curve == null || result == null || title == null) {
      throw new IllegalArgumentException("curve, result and title must not be null");
    }
    ChartFiles.headless();
    RootTimeGeometry g = result.geometry();
    double lastRoot = rootMinutes(curve.elapsedSeconds(curve.size() - 1));
    double shownTo = Math.min(lastRoot, SHOWN_ROOT_T90_MULTIPLE * rootMinutes(result.t90()));
    XYSeries readings = new XYSeries("readings", false, true);
    int shown = 0;
    for (int i = 0; i < curve.size(); i++) {
      double x = rootMinutes(curve.elapsedSeconds(i));
      if (x <= shownTo * 1.0001) {
        readings.add(x, mm(curve.settlementMetres(i)));
        shown++;
      }
    }
    XYSeriesCollection data = new XYSeriesCollection();
    data.addSeries(readings);
    data.addSeries(line("early straight line", g.earlyLine()));
    data.addSeries(line(format("line with abscissae x %.4g", g.factor()), g.factorLine()));
    XYSeries ninety = new XYSeries("90 % point", false, true);
    ninety.add(g.ninetyPoint().x() / ROOT_SECONDS_PER_ROOT_MINUTE, mm(g.ninetyPoint().y()));
    data.addSeries(ninety);

    XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
    boolean dense = shown > 200;
    renderer.setSeriesLinesVisible(0, !dense);
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

    NumberAxis time = new NumberAxis("Square root of elapsed time (√min)");
    time.setRange(0, shownTo * 1.02);
    XYPlot plot =
        new XYPlot(
            data,
            time,
            ChartFiles.settlementAxis("Settlement since the load was applied (mm)"),
            renderer);
    ChartFiles.style(plot);
    Color mark = ChartFiles.MARKS;
    plot.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d0()), format("d0 = %.3f mm", mm(result.d0())), mark));
    plot.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d90()), format("d90 = %.3f mm", mm(result.d90())), mark));
    plot.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d100()), format("d100 = %.3f mm", mm(result.d100())), mark));
    plot.addDomainMarker(
        ChartFiles.domainMark(
            rootMinutes(result.t90()),
            format("t90 = %.2f min", result.t90() / ChartFiles.SECONDS_PER_MINUTE),
            mark));
    String subtitle =
        format(
            "Root-time construction (Taylor): c_v = %.3g m²/yr, H_dr = %.3f mm, T90 = %.6f;"
                + " time axis to %.1f min%s",
            result.cv() * ClayYear.SECONDS,
            mm(result.drainagePath()),
            result.timeFactor90(),
            shownTo * shownTo,
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
  public static Path write(SettlementCurve curve, RootTimeResult result, String title, Path file) {
    return ChartFiles.save(chart(curve, result, title), file);
  }

  private static double rootMinutes(double seconds) {
    return Math.sqrt(seconds / ChartFiles.SECONDS_PER_MINUTE);
  }

  /** A line given in (√(t/s), settlement m) as a two-point series in (√min, mm). */
  private static XYSeries line(String name, StraightLine line) {
    XYSeries series = new XYSeries(name, false, true);
    series.add(line.fromX() / ROOT_SECONDS_PER_ROOT_MINUTE, mm(line.valueAt(line.fromX())));
    series.add(line.toX() / ROOT_SECONDS_PER_ROOT_MINUTE, mm(line.valueAt(line.toX())));
    return series;
  }
}
