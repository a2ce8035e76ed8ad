package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.LoadIncrement;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.fitting.CvMethod;

class CvChartTest {

  /** The demo's true c_v per increment, at the log-mean stress, for two methods (invented data). */
  private static List<CvPoint> points() {
    List<CvPoint> points = new ArrayList<>();
    var truth = DemoTestGenerator.truth();
    for (int i = 0; i < truth.size(); i++) {
      LoadIncrement inc = DemoIncrement.TEST.increments().get(i);
      double stress = Math.sqrt(inc.stressBeforePascals() * inc.stressAfterPascals());
      boolean oc = inc.stressAfterPascals() <= 80e3 || i >= 7 && i <= 10;
      double cv = truth.get(i).parameters().cv();
      points.add(new CvPoint(stress, cv, CvMethod.LOG_TIME, oc));
      points.add(new CvPoint(stress, 0.9 * cv, CvMethod.ROOT_TIME, oc));
    }
    return points;
  }

  @Test
  @DisplayName("Writes a 900 x 600 PNG of c_v against stress")
  void writesPng(@TempDir Path folder) throws IOException {
    var image = Png.check(CvChart.write(points(), "demo", folder.resolve("cv.png")));
    assertThat(Png.hasColour(image, ChartFiles.PALETTE[CvMethod.ROOT_TIME.ordinal()])).isTrue();
  }

  @Test
  @DisplayName("Plots kPa and m²/yr (Julian year, 31 557 600 s); NC and OC in separate series")
  void units() {
    CvPoint point = new CvPoint(50e3, 1.0 / 31_557_600, CvMethod.FULL_CURVE, false);
    XYPlot plot = CvChart.chart(List.of(point), "one").getXYPlot();
    XYSeriesCollection data = (XYSeriesCollection) plot.getDataset();
    assertThat(data.getSeriesCount()).isEqualTo(2);
    assertThat(data.getSeries(0).getX(0).doubleValue()).isCloseTo(50.0, within(1e-12));
    assertThat(data.getSeries(0).getY(0).doubleValue()).isCloseTo(1.0, within(1e-12));
    assertThat(data.getSeries(1).getItemCount()).isZero();
    LegendItemCollection legend = plot.getLegendItems();
    assertThat(legend.getItemCount()).isEqualTo(3);
    assertThat(legend.get(0).getLabel()).isEqualTo(CvMethod.FULL_CURVE.label());
  }

  @Test
  @DisplayName("An empty list and invalid points are refused")
  void refuses() {
    assertThatThrownBy(() -> CvChart.chart(List.of(), "t"))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new CvPoint(Double.NaN, 1e-8, CvMethod.LOG_TIME, true))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("stress (NaN Pa)");
    assertThatThrownBy(() -> new CvPoint(1e3, -1, CvMethod.LOG_TIME, true))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("c_v (-1.0 m^2/s)");
  }
}
