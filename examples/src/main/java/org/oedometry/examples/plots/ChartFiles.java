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

  /**
   * Smallest span of a void ratio axis: points that all share one void ratio (readings that never
   * move) would otherwise get a span of 10<sup>-8</sup> whose tick labels all read the same.
   */
  static final double VOID_RATIO_MINIMUM_RANGE = 1e-3;

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

  /** Tick labels: {@code 0.###} from 0.001 to a million, {@code 0.###E0} outside (and for 0). */
  static final class PlainOrScientific extends java.text.NumberFormat {

    private static final long serialVersionUID = 1L;

    private final java.text.DecimalFormat plain =
        new java.text.DecimalFormat(
            "0.###", java.text.DecimalFormatSymbols.getInstance(Locale.ROOT));

    private final java.text.DecimalFormat scientific =
        new java.text.DecimalFormat(
            "0.###E0", java.text.DecimalFormatSymbols.getInstance(Locale.ROOT));

    @Override
    public StringBuffer format(
        double number, StringBuffer toAppendTo, java.text.FieldPosition pos) {
      double size = Math.abs(number);
      boolean usePlain = size >= 1e-3 && size < 1e6;
      return (usePlain ? plain : scientific).format(number, toAppendTo, pos);
    }

    @Override
    public StringBuffer format(long number, StringBuffer toAppendTo, java.text.FieldPosition pos) {
      return format((double) number, toAppendTo, pos);
    }

    @Override
    public Number parse(String source, java.text.ParsePosition parsePosition) {
      return scientific.parse(source, parsePosition);
    }
  }

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

  /**
   * Longest title shown, characters: a longer title is cut there and ends with an ellipsis
   * (JFreeChart breaks a long word into lines one character at a time, so a title of tens of
   * thousands of characters takes minutes to draw and leaves no room for the plot).
   */
  public static final int TITLE_LENGTH = 200;

  /**
   * The title as shown: on one line (line breaks and other control characters, and the Unicode line
   * and paragraph separators, each become a space) and at most {@value #TITLE_LENGTH} characters
   * (cut with an ellipsis, never inside a surrogate pair).
   *
   * @param title the title; not null
   * @return the title shown
   */
  static String oneLineTitle(String title) {
    StringBuilder out = new StringBuilder(Math.min(title.length(), TITLE_LENGTH));
    for (int i = 0; i < title.length(); i++) {
      char c = title.charAt(i);
      boolean breaks = Character.isISOControl(c) || c == '\u2028' || c == '\u2029';
      out.append(breaks ? ' ' : c);
    }
    if (out.length() > TITLE_LENGTH) {
      int end = TITLE_LENGTH - 1;
      if (Character.isHighSurrogate(out.charAt(end - 1))) {
        end--;
      }
      out.setLength(end);
      out.append('\u2026');
    }
    return out.toString();
  }

  /**
   * The common look: white background, light grid, plain fonts, the title on one line and at most
   * {@value #TITLE_LENGTH} characters ({@link #oneLineTitle}), a subtitle if given.
   */
  static JFreeChart finish(JFreeChart chart, String subtitle) {
    chart.setTitle(oneLineTitle(chart.getTitle().getText()));
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

  /**
   * A log axis with plain decimal tick labels ({@code 0.###}) from 0.001 up to a million, and
   * scientific ones ({@code 0.###E0}) outside that span, so that no label reads 0 or runs to
   * hundreds of digits.
   */
  static LogAxis logAxis(String label) {
    LogAxis axis = new LogAxis(label);
    axis.setBase(10);
    axis.setSmallestValue(1e-30);
    axis.setNumberFormatOverride(new PlainOrScientific());
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
   * ...). The range is set to the data with a margin of a factor of 1.25 either side; with powers
   * of 2 it is widened further, where needed, to a factor of 1.05 beyond the power of 2 at or below
   * min and the one at or above max, so that at least two ticks are labelled even when the data
   * span less than a factor of 2.
   */
  static void logTicks(LogAxis axis, double min, double max) {
    double span = Math.log10(max / min);
    boolean decades = span >= 1.5;
    double unit = decades ? 1.0 : Math.log10(2.0);
    axis.setTickUnit(new NumberTickUnit(unit), false, false);
    axis.setAutoTickUnitSelection(false, false);
    double lower = min / 1.25;
    double upper = max * 1.25;
    if (!decades) {
      double below = Math.pow(2, Math.floor(Math.log(min) / Math.log(2)));
      double above = Math.pow(2, Math.ceil(Math.log(max) / Math.log(2)));
      if (below > 0) {
        lower = Math.min(lower, below / 1.05);
      }
      if (above < Double.POSITIVE_INFINITY) {
        upper = Math.max(upper, above * 1.05);
      }
    }
    axis.setRange(lower, upper);
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
