package org.oedometry.examples.plots;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;

/**
 * Writes charts as PNG files of a fixed size, without a display, and holds the look the charts of
 * this package share (plain colours, markers and fonts of our own choosing).
 */
public final class ChartFiles {

  /** Width of every PNG written, pixels. */
  public static final int WIDTH = 900;

  /** Height of every PNG written, pixels. */
  public static final int HEIGHT = 600;

  /** Seconds in one minute, the time unit of the laboratory charts. */
  static final double SECONDS_PER_MINUTE = 60.0;

  /** Readings. */
  static final Color READINGS = new Color(40, 40, 40);

  /** A palette of plain, distinguishable colours (one per method or line). */
  static final Color[] PALETTE = {
    new Color(0, 90, 181),
    new Color(220, 50, 32),
    new Color(0, 140, 70),
    new Color(150, 60, 170),
    new Color(230, 140, 0),
    new Color(0, 150, 160),
    new Color(120, 90, 40)
  };

  /** Marked values (d0, d100, t50, ...). */
  static final Color MARKS = new Color(110, 110, 110);

  private ChartFiles() {}

  /**
   * Writes a chart as a PNG of {@value #WIDTH} by {@value #HEIGHT} pixels, creating the parent
   * folder if needed. Runs headless ({@code java.awt.headless=true}).
   *
   * @param chart the chart; not null
   * @param file where to write; not null
   * @return the file written
   * @throws IllegalArgumentException if an argument is null
   * @throws UncheckedIOException if the file cannot be written
   */
  public static Path save(JFreeChart chart, Path file) {
    if (chart == null || file == null) {
      throw new IllegalArgumentException("chart and file must not be null");
    }
    headless();
    try {
      Path parent = file.toAbsolutePath().getParent();
      if (parent != null) {
        Files.createDirectories(parent);
      }
      ChartUtils.saveChartAsPNG(file.toFile(), chart, WIDTH, HEIGHT);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write the chart " + file, e);
    }
    return file;
  }

  /** Draws without a display: must run before the first AWT call of the chart. */
  static void headless() {
    System.setProperty("java.awt.headless", "true");
  }

  /** The common look: white background, light grid, plain fonts, a subtitle if given. */
  static JFreeChart finish(JFreeChart chart, String subtitle) {
    chart.setBackgroundPaint(Color.WHITE);
    chart.getTitle().setFont(new Font(Font.SANS_SERIF, Font.BOLD, 16));
    if (subtitle != null && !subtitle.isBlank()) {
      TextTitle sub = new TextTitle(subtitle, new Font(Font.SANS_SERIF, Font.PLAIN, 11));
      sub.setPaint(Color.DARK_GRAY);
      chart.addSubtitle(sub);
    }
    if (chart.getLegend() != null) {
      chart.getLegend().setPosition(RectangleEdge.BOTTOM);
      chart.getLegend().setItemFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
    }
    return chart;
  }

  /** The look of one plot. */
  static void style(XYPlot plot) {
    plot.setBackgroundPaint(Color.WHITE);
    plot.setDomainGridlinePaint(new Color(215, 215, 215));
    plot.setRangeGridlinePaint(new Color(215, 215, 215));
    plot.setDomainGridlinesVisible(true);
    plot.setRangeGridlinesVisible(true);
    plot.setOutlinePaint(Color.GRAY);
  }

  /** A log axis with plain decimal tick labels. */
  static LogAxis logAxis(String label) {
    LogAxis axis = new LogAxis(label);
    axis.setBase(10);
    axis.setSmallestValue(1e-30);
    axis.setNumberFormatOverride(new java.text.DecimalFormat("0.###"));
    axis.setMinorTickMarksVisible(true);
    axis.setAutoRangeMinimumSize(Double.MIN_NORMAL);
    return axis;
  }

  /** A log axis with scientific tick labels (for k, c_v). */
  static LogAxis scientificLogAxis(String label) {
    LogAxis axis = new LogAxis(label);
    axis.setBase(10);
    axis.setSmallestValue(1e-30);
    axis.setNumberFormatOverride(new java.text.DecimalFormat("0.#E0"));
    axis.setMinorTickMarksVisible(true);
    axis.setAutoRangeMinimumSize(Double.MIN_NORMAL);
    return axis;
  }

  /**
   * Round tick values on a log axis over data from min to max (both &gt; 0): one tick a decade (1,
   * 10, 100, ...) when the data span at least 1.5 decades, else ticks at powers of 2 (1, 2, 4, 8,
   * ...). The range is set to the data with a margin of a factor of 1.25 either side.
   */
  static void logTicks(LogAxis axis, double min, double max) {
    double span = Math.log10(max / min);
    double unit = span >= 1.5 ? 1.0 : Math.log10(2.0);
    axis.setTickUnit(new NumberTickUnit(unit), false, false);
    axis.setAutoTickUnitSelection(false, false);
    axis.setRange(min / 1.25, max * 1.25);
  }

  /** A settlement axis, increasing downward. */
  static NumberAxis settlementAxis(String label) {
    NumberAxis axis = new NumberAxis(label);
    axis.setInverted(true);
    axis.setAutoRangeIncludesZero(false);
    return axis;
  }

  /** A horizontal marked value (on the range axis) with a label at the right. */
  static ValueMarker rangeMark(double value, String label, Color colour) {
    ValueMarker marker = new ValueMarker(value);
    marker.setPaint(colour);
    marker.setStroke(dashed(1.0f));
    marker.setLabel(label);
    marker.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
    marker.setLabelPaint(colour.darker());
    marker.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
    marker.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
    return marker;
  }

  /** A horizontal marked value with its label below the line at the left. */
  static ValueMarker rangeMarkLeft(double value, String label, Color colour) {
    ValueMarker marker = rangeMark(value, label, colour);
    marker.setLabelAnchor(RectangleAnchor.BOTTOM_LEFT);
    marker.setLabelTextAnchor(TextAnchor.TOP_LEFT);
    return marker;
  }

  /** A vertical marked value (on the domain axis) with a label at the bottom. */
  static ValueMarker domainMark(double value, String label, Color colour) {
    ValueMarker marker = new ValueMarker(value);
    marker.setPaint(colour);
    marker.setStroke(dashed(1.0f));
    marker.setLabel(label);
    marker.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
    marker.setLabelPaint(colour.darker());
    marker.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
    marker.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
    return marker;
  }

  static BasicStroke dashed(float width) {
    return new BasicStroke(
        width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f);
  }

  static BasicStroke solid(float width) {
    return new BasicStroke(width);
  }

  static Shape dot(double size) {
    return new Ellipse2D.Double(-size / 2, -size / 2, size, size);
  }

  static Shape square(double size) {
    return new Rectangle2D.Double(-size / 2, -size / 2, size, size);
  }

  static String format(String template, Object... values) {
    return String.format(Locale.ROOT, template, values);
  }

  /** Metres to millimetres. */
  static double mm(double metres) {
    return 1000.0 * metres;
  }

  /** Seconds to minutes. */
  static double minutes(double seconds) {
    return seconds / SECONDS_PER_MINUTE;
  }
}
