package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.fitting.RootTimeMethod;
import org.oedometry.fitting.RootTimeResult;

class RootTimeChartTest {

  private static final RootTimeResult RESULT =
      RootTimeMethod.fit(DemoIncrement.CURVE, DemoIncrement.DRAINAGE_PATH);

  @Test
  @DisplayName("Writes a 900 x 600 PNG of the demo increment's root-time construction")
  void writesPng(@TempDir Path folder) throws IOException {
    var image =
        Png.check(
            RootTimeChart.write(DemoIncrement.CURVE, RESULT, "demo", folder.resolve("r.png")));
    assertThat(Png.hasColour(image, ChartFiles.PALETTE[1])).as("factor line drawn").isTrue();
  }

  @Test
  @DisplayName("x = √(t / 1 min) = √(t / 1 s) / √60; t90 marked; axis ends at 3 √t90")
  void coordinates() {
    XYPlot plot = RootTimeChart.chart(DemoIncrement.CURVE, RESULT, "demo").getXYPlot();
    assertThat(plot.getRangeAxis().isInverted()).isTrue();
    XYSeriesCollection data = (XYSeriesCollection) plot.getDataset();
    var ninety = RESULT.geometry().ninetyPoint();
    assertThat(data.getSeries(3).getX(0).doubleValue())
        .isCloseTo(ninety.x() / Math.sqrt(60), within(1e-12));
    ValueMarker t90 = (ValueMarker) plot.getDomainMarkers(Layer.FOREGROUND).iterator().next();
    assertThat(t90.getValue()).isCloseTo(Math.sqrt(RESULT.t90() / 60), within(1e-12));
    double end =
        Math.min(
            Math.sqrt(DemoIncrement.CURVE.durationSeconds() / 60),
            3 * Math.sqrt(RESULT.t90() / 60));
    assertThat(plot.getDomainAxis().getUpperBound()).isCloseTo(1.02 * end, within(1e-9));
    // The factor line starts at d0 on the axis t = 0 (Taylor's construction).
    assertThat(data.getSeries(2).getY(0).doubleValue()).isCloseTo(1000 * RESULT.d0(), within(1e-9));
  }

  @Test
  @DisplayName("Null arguments are refused with a message")
  void refusesNull() {
    assertThatThrownBy(() -> RootTimeChart.chart(DemoIncrement.CURVE, null, "t"))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("must not be null");
  }
}
