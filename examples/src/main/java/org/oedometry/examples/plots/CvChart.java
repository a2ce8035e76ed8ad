package org.oedometry.examples.plots;

import java.awt.Color;
import java.awt.Shape;
import java.awt.geom.Path2D;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.oedometry.fitting.CvMethod;

/**
 * c<sub>v</sub> (m<sup>2</sup>/yr, Julian year, log scale) against the increment's mid stress (kPa,
 * log scale): one colour and marker shape per method; filled markers for normally consolidated
 * increments (and those crossing &sigma;'<sub>p</sub>), hollow markers for overconsolidated ones,
 * and pale markers (filled with a light tint of the method's colour) for increments whose class is
 * not known because no &sigma;'<sub>p</sub> was found (a test of a single increment, for one). The
 * legend names the methods and the meaning of filled and hollow, and of pale where a point is drawn
 * so.
 */
public final class CvChart {

  private CvChart() {}

  /**
   * Builds the chart.
   *
   * @param points the points to draw; not null, no null element, at least one
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @return the chart
   * @throws IllegalArgumentException if an argument or element is null, or there is no point
   */
  public static JFreeChart chart(List<CvPoint> points, String title) {
    // Series of each method: 0 normally consolidated or crossing, 1 overconsolidated, 2 not known.
    if (points == null
        || title == null
        || points.stream().anyMatch(java.util.Objects::isNull)
        || points.isEmpty()) {
      throw new IllegalArgumentException("points (at least one, none null) and title: not null");
    }
    ChartFiles.headless();
    Map<CvMethod, XYSeries[]> byMethod = new EnumMap<>(CvMethod.class);
    for (CvPoint p : points) {
      XYSeries[] pair =
          byMethod.computeIfAbsent(
              p.method(),
              m ->
                  new XYSeries[] {
                    new XYSeries(m.label() + " (NC)", true, true),
                    new XYSeries(m.label() + " (OC)", true, true),
                    new XYSeries(m.label() + " (not classed)", true, true)
                  });
      int kind = p.stressHistory().isEmpty() ? 2 : p.overconsolidated() ? 1 : 0;
      pair[kind].add(p.stress() / 1000.0, p.cv() * ClayYear.SECONDS);
    }
    boolean anyNotClassed = points.stream().anyMatch(p -> p.stressHistory().isEmpty());
    XYSeriesCollection data = new XYSeriesCollection();
    XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
    renderer.setUseOutlinePaint(false);
    renderer.setUseFillPaint(true);
    LegendItemCollection legend = new LegendItemCollection();
    int series = 0;
    for (Map.Entry<CvMethod, XYSeries[]> entry : byMethod.entrySet()) {
      int index = entry.getKey().ordinal();
      Color colour = ChartFiles.PALETTE[index % ChartFiles.PALETTE.length];
      Shape shape = shape(index);
      for (int kind = 0; kind < 3; kind++) {
        data.addSeries(entry.getValue()[kind]);
        renderer.setSeriesPaint(series, colour);
        renderer.setSeriesFillPaint(series, kind == 2 ? pale(colour) : colour);
        renderer.setSeriesShape(series, shape);
        renderer.setSeriesShapesFilled(series, kind != 1);
        renderer.setSeriesStroke(series, ChartFiles.solid(1.5f));
        series++;
      }
      legend.add(new LegendItem(entry.getKey().label(), null, null, null, shape, colour));
    }
    Shape circle = ChartFiles.dot(9);
    // A legend entry for each kind of marker that is drawn.
    if (points.stream().anyMatch(p -> p.stressHistory().isPresent() && !p.overconsolidated())) {
      legend.add(
          new LegendItem(
              "filled: normally consolidated (or crossing σ'p)",
              null,
              null,
              null,
              circle,
              Color.GRAY));
    }
    if (points.stream().anyMatch(p -> p.stressHistory().isPresent() && p.overconsolidated())) {
      legend.add(outlinedDot("hollow: overconsolidated", circle, false, Color.GRAY));
    }
    if (anyNotClassed) {
      legend.add(outlinedDot("pale: not classed (no σ'p found)", circle, true, pale(Color.GRAY)));
    }
    LogAxis stressAxis = ChartFiles.logAxis("Mid-increment effective stress σ' (kPa), log scale");
    ChartFiles.logTicks(
        stressAxis, data.getDomainLowerBound(false), data.getDomainUpperBound(false));
    LogAxis cvAxis = ChartFiles.logAxis("Coefficient of consolidation c_v (m²/yr), log scale");
    ChartFiles.logTicks(cvAxis, data.getRangeLowerBound(false), data.getRangeUpperBound(false));
    XYPlot plot = new XYPlot(data, stressAxis, cvAxis, renderer);
    plot.setFixedLegendItems(legend);
    ChartFiles.style(plot);
    return ChartFiles.finish(
        new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true),
        "c_v by each method at the logarithmic mean stress of each increment (Julian year)");
  }

  /**
   * Builds the chart and writes it as a PNG of {@value ChartFiles#WIDTH} by {@value
   * ChartFiles#HEIGHT} pixels.
   *
   * @param points the points; not null, no null element, at least one
   * @param title the chart's title (shown on one line, cut at {@value ChartFiles#TITLE_LENGTH}
   *     characters); not null
   * @param file where to write; not null
   * @return the file written
   * @throws IllegalArgumentException if an argument or element is null, or there is no point
   * @throws java.io.UncheckedIOException if the file cannot be written
   */
  public static Path write(List<CvPoint> points, String title, Path file) {
    return ChartFiles.save(chart(points, title), file);
  }

  /** A light tint of a colour (a third of the way from white), for points not classed. */
  static Color pale(Color colour) {
    return new Color(
        tint(colour.getRed()), tint(colour.getGreen()), tint(colour.getBlue()), colour.getAlpha());
  }

  private static int tint(int channel) {
    return 255 - (255 - channel) / 3;
  }

  /** A marker shape per method: circle, square, up and down triangle, diamond, ... */
  private static Shape shape(int index) {
    double s = 10;
    List<Shape> shapes = new ArrayList<>();
    shapes.add(ChartFiles.dot(s));
    shapes.add(ChartFiles.square(s * 0.9));
    shapes.add(polygon(new double[] {0, s / 2, -s / 2}, new double[] {-s / 2, s / 2, s / 2}));
    shapes.add(polygon(new double[] {0, s / 2, -s / 2}, new double[] {s / 2, -s / 2, -s / 2}));
    shapes.add(polygon(new double[] {0, s / 2, 0, -s / 2}, new double[] {-s / 2, 0, s / 2, 0}));
    shapes.add(
        polygon(
            new double[] {-s / 2, s / 2, s / 2, -s / 2},
            new double[] {-s / 4, -s / 4, s / 4, s / 4}));
    shapes.add(
        polygon(
            new double[] {-s / 4, s / 4, s / 4, -s / 4},
            new double[] {-s / 2, -s / 2, s / 2, s / 2}));
    return shapes.get(index % shapes.size());
  }

  private static Shape polygon(double[] x, double[] y) {
    Path2D.Double path = new Path2D.Double();
    path.moveTo(x[0], y[0]);
    for (int i = 1; i < x.length; i++) {
      path.lineTo(x[i], y[i]);
    }
    path.closePath();
    return path;
  }

  /** A legend entry drawn as a grey-outlined dot, filled with the given paint or hollow. */
  private static LegendItem outlinedDot(String label, Shape dot, boolean filled, Color fill) {
    return new LegendItem(
        label,
        null,
        null,
        null,
        true,
        dot,
        filled,
        fill,
        true,
        Color.GRAY,
        ChartFiles.solid(1.5f),
        false,
        dot,
        ChartFiles.solid(1.5f),
        Color.GRAY);
  }
}
