package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.text.AttributedCharacterIterator;
import java.text.CharacterIterator;
import java.util.List;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.LogTick;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.Tick;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.CompressionPoint;
import org.oedometry.fitting.CvMethod;
import org.oedometry.theory.ClayLayer;
import org.oedometry.theory.Drainage;

class ChartFilesTest {

  private static JFreeChart sample() {
    XYSeries series = new XYSeries("s");
    for (int i = 0; i < 50; i++) {
      series.add(i, Math.sin(i / 5.0));
    }
    return ChartFactory.createXYLineChart(
        "sample", "x (-)", "y (-)", new XYSeriesCollection(series));
  }

  @Test
  @DisplayName("Saves headless at 900 x 600, creating missing folders")
  void saves(@TempDir Path folder) throws IOException {
    Path file = ChartFiles.save(sample(), folder.resolve("deep/er/s.png"));
    Png.check(file);
    assertThat(System.getProperty("java.awt.headless")).isEqualTo("true");
  }

  @Test
  @DisplayName("A file that cannot be written gives an UncheckedIOException naming it")
  void unwritable(@TempDir Path folder) throws IOException {
    Path blocker = Files.writeString(folder.resolve("plain-file"), "x");
    assertThatThrownBy(() -> ChartFiles.save(sample(), blocker.resolve("s.png")))
        .isInstanceOf(UncheckedIOException.class)
        .hasMessageContaining("plain-file");
  }

  @Test
  @DisplayName("Log ticks: a decade apart over 1.5 decades or more, else powers of 2")
  void logTicks() {
    LogAxis wide = ChartFiles.logAxis("t");
    ChartFiles.logTicks(wide, 0.1, 1440);
    assertThat(wide.getTickUnit().getSize()).isEqualTo(1.0);
    LogAxis narrow = ChartFiles.logAxis("c");
    ChartFiles.logTicks(narrow, 1, 10);
    assertThat(narrow.getTickUnit().getSize()).isEqualTo(Math.log10(2));
    assertThat(narrow.getLowerBound()).isEqualTo(0.8);
  }

  /** A tick's label as plain text (a log axis gives its labels as attributed strings). */
  private static String text(Tick tick) {
    if (tick instanceof LogTick log && log.getAttributedLabel() != null) {
      AttributedCharacterIterator it = log.getAttributedLabel().getIterator();
      StringBuilder out = new StringBuilder();
      for (char c = it.first(); c != CharacterIterator.DONE; c = it.next()) {
        out.append(c);
      }
      return out.toString();
    }
    return tick.getText() == null ? "" : tick.getText();
  }

  /** The labelled ticks an axis draws along an edge of an 800 x 450 plot area. */
  private static List<ValueTick> labelled(ValueAxis axis, RectangleEdge edge) {
    BufferedImage image = new BufferedImage(900, 600, BufferedImage.TYPE_INT_RGB);
    Graphics2D g2 = image.createGraphics();
    try {
      List<? extends Tick> ticks =
          axis.refreshTicks(g2, new AxisState(), new Rectangle2D.Double(60, 20, 800, 450), edge);
      return ticks.stream()
          .filter(t -> t instanceof ValueTick && !text(t).isEmpty())
          .map(ValueTick.class::cast)
          .toList();
    } finally {
      g2.dispose();
    }
  }

  @Test
  @DisplayName(
      "Stresses near 1e-306 Pa and 1e300 Pa: each stress tick label states its own value to 1 %"
          + " (no label reads 0, none runs to hundreds of digits)")
  void logLabelsAtExtremeStresses() {
    for (double pascals : new double[] {2e-306, 1e300}) {
      CompressionCurve curve =
          CompressionCurve.of(
              1.10,
              pascals,
              List.of(
                  new CompressionPoint(2 * pascals, 1.05),
                  new CompressionPoint(4 * pascals, 1.00)));
      ValueAxis axis =
          CompressionChart.chart(curve, List.of(), "extreme").getXYPlot().getDomainAxis();
      List<ValueTick> ticks = labelled(axis, RectangleEdge.BOTTOM);
      assertThat(ticks).as("labelled ticks at %s Pa", pascals).isNotEmpty();
      for (ValueTick tick : ticks) {
        assertThat(text(tick)).hasSizeLessThan(12);
        assertThat(Double.parseDouble(text(tick)) / tick.getValue())
            .as("label %s of the tick at %s kPa", text(tick), tick.getValue())
            .isBetween(0.99, 1.01);
      }
    }
  }

  @Test
  @DisplayName(
      "One c_v point (a single increment): the c_v axis, ticked at powers of 2, still labels at"
          + " least two values (an axis with no label cannot be read)")
  void narrowLogAxisIsLabelled() {
    CvPoint point =
        new CvPoint(
            35e3,
            3 / ClayYear.SECONDS,
            CvMethod.LOG_TIME,
            java.util.Optional.of(
                org.oedometry.core.compressibility.IncrementClass.NORMALLY_CONSOLIDATED));
    ValueAxis axis = CvChart.chart(List.of(point), "one").getXYPlot().getRangeAxis();
    assertThat(labelled(axis, RectangleEdge.LEFT)).hasSizeGreaterThanOrEqualTo(2);
  }

  @Test
  @DisplayName(
      "Readings that never move give one void ratio for every point: the void ratio axis still"
          + " has distinct tick labels")
  void flatVoidRatioAxis() {
    CompressionCurve curve =
        CompressionCurve.of(
            1.0744,
            25e3,
            List.of(new CompressionPoint(50e3, 1.0744), new CompressionPoint(100e3, 1.0744)));
    NumberAxis axis =
        (NumberAxis) CompressionChart.chart(curve, List.of(), "flat").getXYPlot().getRangeAxis();
    List<String> labels =
        labelled(axis, RectangleEdge.LEFT).stream().map(ChartFilesTest::text).toList();
    assertThat(labels).hasSizeGreaterThanOrEqualTo(2).doesNotHaveDuplicates();
  }

  @Test
  @DisplayName(
      "Titles are shown on one line and cut at 200 characters with an ellipsis, never inside a"
          + " surrogate pair (a 20,000-character title would take JFreeChart minutes to wrap)")
  void titles() {
    ClayLayer layer = ClayLayer.of(6, Drainage.DOUBLE, 1e-8, 0.1);
    String shown = ForecastChart.chart(layer, 1e8, "S".repeat(20_000)).getTitle().getText();
    assertThat(shown).hasSize(ChartFiles.TITLE_LENGTH).endsWith("\u2026");
    assertThat(ChartFiles.oneLineTitle("a\nb\r\nc\u2028d\te")).isEqualTo("a b  c d e");
    String emoji = "\ud83d\ude00";
    String cut = ChartFiles.oneLineTitle("x".repeat(198) + emoji + "tail");
    assertThat(cut).isEqualTo("x".repeat(198) + "\u2026");
    assertThat(ChartFiles.oneLineTitle("x".repeat(197) + emoji + "tail"))
        .isEqualTo("x".repeat(197) + emoji + "\u2026");
  }
}
