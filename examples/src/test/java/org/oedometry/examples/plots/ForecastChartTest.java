package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.theory.ClayLayer;
import org.oedometry.theory.Drainage;

class ForecastChartTest {

  private static final double YEAR = 365.25 * 86_400;

  /** FACTS.md handbook example: c_v = 0.32 m^2/yr, H_dr = 1 m (2 m, double drainage). */
  private static final ClayLayer LAYER = ClayLayer.of(2.0, Drainage.DOUBLE, 0.32 / YEAR, 0.25);

  @Test
  @DisplayName("Writes a 900 x 600 PNG of the forecast")
  void writesPng(@TempDir Path folder) throws IOException {
    Png.check(ForecastChart.write(LAYER, 5 * YEAR, "layer", folder.resolve("f.png")));
  }

  @Test
  @DisplayName("t50 and t90 marks: 0.61 and 2.65 yr [published handbook example in FACTS.md]")
  void marks() {
    XYPlot plot = ForecastChart.chart(LAYER, 5 * YEAR, "layer").getXYPlot();
    java.util.List<Double> marks = new java.util.ArrayList<>();
    for (Object marker : plot.getDomainMarkers(Layer.FOREGROUND)) {
      marks.add(((ValueMarker) marker).getValue());
    }
    assertThat(marks).hasSize(2);
    assertThat(marks.get(0)).isCloseTo(0.61, within(0.005));
    assertThat(marks.get(1)).isCloseTo(2.65, within(0.005));
    // Exact: t90 = 0.848085 H_dr^2 / c_v [exact, FACTS.md].
    assertThat(marks.get(1)).isCloseTo(0.848085 / 0.32, within(1e-5));
    assertThat(plot.getRangeAxis().isInverted()).isTrue();
  }

  @Test
  @DisplayName("Curve in mm against years; at T = 1, U = 0.931260 [exact, FACTS.md]")
  void curve() {
    // Horizon at T = 1: t = H_dr^2 / c_v = 1 / 0.32 yr; the last sample is there.
    XYPlot plot = ForecastChart.chart(LAYER, YEAR / 0.32, "layer").getXYPlot();
    XYSeries series = ((XYSeriesCollection) plot.getDataset()).getSeries(0);
    int last = series.getItemCount() - 1;
    assertThat(series.getX(last).doubleValue()).isCloseTo(1 / 0.32, within(1e-9));
    assertThat(series.getY(last).doubleValue()).isCloseTo(250 * 0.931260, within(1e-3));
    assertThat(series.getY(0).doubleValue()).isZero();
  }

  @Test
  @DisplayName("A horizon that is not finite and positive is refused, naming the value")
  void refuses() {
    assertThatThrownBy(() -> ForecastChart.chart(LAYER, Double.NaN, "t"))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("horizon (NaN s)");
  }
}
