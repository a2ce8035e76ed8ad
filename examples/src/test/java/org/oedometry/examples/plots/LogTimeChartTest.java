package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.LogTimeResult;

class LogTimeChartTest {

  private static final LogTimeResult RESULT =
      LogTimeMethod.fit(DemoIncrement.CURVE, DemoIncrement.DRAINAGE_PATH);

  @Test
  @DisplayName("Writes a 900 x 600 PNG of the demo increment's log-time construction")
  void writesPng(@TempDir Path folder) throws IOException {
    Path file =
        LogTimeChart.write(DemoIncrement.CURVE, RESULT, "demo", folder.resolve("a/log.png"));
    assertThat(file).isEqualTo(folder.resolve("a/log.png"));
    var image = Png.check(file);
    assertThat(Png.hasColour(image, ChartFiles.PALETTE[0])).as("tangent drawn").isTrue();
    assertThat(Png.hasColour(image, ChartFiles.PALETTE[1])).as("secondary line drawn").isTrue();
  }

  @Test
  @DisplayName("Settlement downward, time in minutes (1 min = 60 s), zero reading left out")
  void coordinates() {
    JFreeChart chart = LogTimeChart.chart(DemoIncrement.CURVE, RESULT, "demo");
    XYPlot plot = chart.getXYPlot();
    assertThat(plot.getRangeAxis().isInverted()).isTrue();
    assertThat(plot.getRangeAxis().getLabel()).contains("(mm)");
    assertThat(plot.getDomainAxis().getLabel()).contains("(min)");
    XYSeriesCollection data = (XYSeriesCollection) plot.getDataset();
    // The demo's readings start with t = 0 (its zero reading), which a log axis cannot show.
    assertThat(DemoIncrement.CURVE.elapsedSeconds(0)).isZero();
    assertThat(data.getSeries(0).getItemCount()).isEqualTo(DemoIncrement.CURVE.size() - 1);
    assertThat(data.getSeries(0).getX(0).doubleValue())
        .isCloseTo(DemoIncrement.CURVE.elapsedSeconds(1) / 60, within(1e-12));
    assertThat(data.getSeries(0).getY(0).doubleValue())
        .isCloseTo(1000 * DemoIncrement.CURVE.settlementMetres(1), within(1e-12));
    // The tangent's end at x = log10(t / 1 s) is drawn at t / 60 minutes.
    var tangent = RESULT.geometry().inflectionTangent();
    assertThat(data.getSeries(1).getX(0).doubleValue())
        .isCloseTo(Math.pow(10, tangent.fromX()) / 60, within(1e-9));
    ValueMarker t50 =
        (ValueMarker) plot.getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).iterator().next();
    assertThat(t50.getValue()).isCloseTo(RESULT.t50() / 60, within(1e-12));
    assertThat(plot.getRangeMarkers(org.jfree.chart.ui.Layer.FOREGROUND)).hasSize(3);
  }

  @Test
  @DisplayName("Null arguments are refused with a message")
  void refusesNull() {
    assertThatThrownBy(() -> LogTimeChart.chart(null, RESULT, "t"))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("must not be null");
  }
}
