package org.oedometry.examples.plots;

import static org.oedometry.examples.plots.ChartFiles.format;
import static org.oedometry.examples.plots.ChartFiles.minutes;
import static org.oedometry.examples.plots.ChartFiles.mm;

import java.awt.Color;
import java.nio.file.Path;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.fitting.PlotPoint;

/**
 * The full-curve least-squares fit of one increment, in two panels over one time axis (minutes, log
 * scale): above, the readings and the fitted curve as settlement (mm, increasing downward) with d0
 * and d100 marked; below, the residuals (reading minus fit, &mu;m). The reading at t = 0 is not
 * part of the fit and is left out.
 */
public final class FullCurveChart {

  private FullCurveChart() {}

  /**
   * Builds the chart.
   *
   * @param curve the increment's readings (time s, settlement m); not null
   * @param result the fit of those readings; its residuals belong, in order, to the readings after
   *     t = 0; not null
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @return the chart
   * @throws IllegalArgumentException if an argument is null, or the residuals do not match the
   *     readings after t = 0 in number
   */
  public static JFreeChart chart(SettlementCurve curve, FullCurveResult result, String title) {
    if (curve == null || result == null || title == null) {
      throw new IllegalArgumentException("curve, result and title must not be null");
    }
    ChartFiles.headless();
    int first = curve.elapsedSeconds(0) == 0.0 ? 1 : 0;
    List<Double> residuals = result.residuals();
    if (residuals.size() != curve.size() - first) {
      throw new IllegalArgumentException(
          format(
              "residuals (%d) do not match the readings after t = 0 (%d)",
              residuals.size(), curve.size() - first));
    }
    boolean dense = curve.size() > 200;
    XYSeries readings = new XYSeries("readings", false, true);
    XYSeries residualSeries = new XYSeries("residual (reading - fit)", false, true);
    for (int i = first; i < curve.size(); i++) {
      double t = minutes(curve.elapsedSeconds(i));
      readings.add(t, mm(curve.settlementMetres(i)));
      residualSeries.add(t, 1e6 * residuals.get(i - first));
    }
    XYSeries fitted = new XYSeries("fitted curve", false, true);
    for (PlotPoint p : result.fittedCurve()) {
      fitted.add(minutes(Math.pow(10, p.x())), mm(p.y()));
    }
    XYSeriesCollection top = new XYSeriesCollection();
    top.addSeries(readings);
    top.addSeries(fitted);
    XYLineAndShapeRenderer topRenderer = new XYLineAndShapeRenderer();
    topRenderer.setSeriesLinesVisible(0, false);
    topRenderer.setSeriesShape(0, ChartFiles.dot(dense ? 2.5 : 6));
    topRenderer.setSeriesPaint(0, ChartFiles.READINGS);
    topRenderer.setSeriesShapesVisible(1, false);
    topRenderer.setSeriesPaint(1, ChartFiles.PALETTE[0]);
    topRenderer.setSeriesStroke(1, ChartFiles.solid(1.8f));
    XYPlot upper = new XYPlot(top, null, ChartFiles.settlementAxis("Settlement (mm)"), topRenderer);
    ChartFiles.style(upper);
    Color mark = ChartFiles.MARKS;
    upper.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d0()), format("d0 = %.3f mm", mm(result.d0())), mark));
    upper.addRangeMarker(
        ChartFiles.rangeMark(mm(result.d100()), format("d100 = %.3f mm", mm(result.d100())), mark));

    XYSeriesCollection bottom = new XYSeriesCollection();
    bottom.addSeries(residualSeries);
    XYLineAndShapeRenderer bottomRenderer = new XYLineAndShapeRenderer();
    bottomRenderer.setSeriesLinesVisible(0, false);
    bottomRenderer.setSeriesShape(0, ChartFiles.dot(dense ? 2.5 : 5));
    bottomRenderer.setSeriesPaint(0, ChartFiles.PALETTE[1]);
    NumberAxis residualAxis = new NumberAxis("Residual (µm)");
    residualAxis.setAutoRangeIncludesZero(true);
    XYPlot lower = new XYPlot(bottom, null, residualAxis, bottomRenderer);
    ChartFiles.style(lower);
    ValueMarker zero = new ValueMarker(0.0);
    zero.setPaint(Color.GRAY);
    lower.addRangeMarker(zero);

    LogAxis timeAxis = ChartFiles.logAxis("Elapsed time (min), log scale");
    ChartFiles.logTicks(timeAxis, top.getDomainLowerBound(false), top.getDomainUpperBound(false));
    CombinedDomainXYPlot plot = new CombinedDomainXYPlot(timeAxis);
    plot.setGap(12);
    plot.add(upper, 3);
    plot.add(lower, 1);
    double year = ClayYear.SECONDS;
    String subtitle =
        format(
            "Full-curve least squares: c_v = %.3g m²/yr (%.0f %% interval %.4g to %.4g),"
                + " d0 = %.3f mm, H_dr = %.3f mm, RMS residual %.2f µm, secondary %.4f mm per log cycle%s",
            result.cv() * year,
            100 * result.confidenceLevel(),
            result.cvLow() * year,
            result.cvHigh() * year,
            mm(result.d0()),
            mm(result.drainagePath()),
            1e6 * result.rootMeanSquareResidual(),
            mm(result.secondarySlope()),
            result.warnings().isEmpty() ? "" : "; warnings: " + Warnings.kinds(result.warnings()));
    return ChartFiles.finish(
        new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true), subtitle);
  }

  /**
   * Builds the chart and writes it as a PNG of {@value ChartFiles#WIDTH} by {@value
   * ChartFiles#HEIGHT} pixels.
   *
   * @param curve the increment's readings; not null
   * @param result the fit of those readings; not null
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @param file where to write; not null
   * @return the file written
   * @throws IllegalArgumentException if an argument is null or the residuals do not match
   * @throws java.io.UncheckedIOException if the file cannot be written
   */
  public static Path write(SettlementCurve curve, FullCurveResult result, String title, Path file) {
    return ChartFiles.save(chart(curve, result, title), file);
  }
}
