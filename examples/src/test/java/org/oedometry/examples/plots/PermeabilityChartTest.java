package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.compressibility.Compressibility;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.Derived;
import org.oedometry.core.compressibility.IncrementPermeability;
import org.oedometry.core.compressibility.Permeability;
import org.oedometry.core.compressibility.PermeabilityChangeIndex;
import org.oedometry.examples.demo.DemoTestGenerator;

class PermeabilityChartTest {

  /** k of every demo increment from its true c_v (invented data) and its m_v. */
  private static List<IncrementPermeability> demo() {
    CompressionCurve curve = CompressionCurve.fromTest(DemoIncrement.TEST);
    var increments = Compressibility.increments(curve, 80e3);
    double[] cv =
        DemoTestGenerator.truth().stream().mapToDouble(t -> t.parameters().cv()).toArray();
    return Permeability.perIncrement(increments, cv);
  }

  @Test
  @DisplayName("Writes a 900 x 600 PNG of e - log k with the C_k line")
  void writesPng(@TempDir Path folder) throws IOException {
    List<IncrementPermeability> all = demo();
    var fit = PermeabilityChangeIndex.fit(all.subList(4, 7));
    var image = Png.check(PermeabilityChart.write(all, fit, "demo", folder.resolve("k.png")));
    assertThat(Png.hasColour(image, ChartFiles.PALETTE[1])).as("C_k line drawn").isTrue();
  }

  @Test
  @DisplayName("The C_k line has slope C_k per log10 cycle of k (de / dlog10 k, Mesri et al.)")
  void line() {
    // Two invented points one decade of k apart and 0.5 apart in e: C_k = 0.5 by hand.
    List<IncrementPermeability> points = new ArrayList<>();
    points.add(new IncrementPermeability(0, 1.5, 1e-8, 1e-6, 1e-9));
    points.add(new IncrementPermeability(1, 1.0, 1e-8, 1e-7, 1e-10));
    var fit = PermeabilityChangeIndex.fit(points);
    XYPlot plot = PermeabilityChart.chart(points, fit, "two").getXYPlot();
    XYSeriesCollection data = (XYSeriesCollection) plot.getDataset();
    var line = data.getSeries(2);
    double slope =
        (line.getY(1).doubleValue() - line.getY(0).doubleValue())
            / (Math.log10(line.getX(1).doubleValue()) - Math.log10(line.getX(0).doubleValue()));
    assertThat(slope).isCloseTo(0.5, within(1e-9));
    assertThat(line.getKey().toString()).contains("C_k = 0.500");
  }

  @Test
  @DisplayName("Without a fit the chart still draws the points and says why there is no line")
  void withoutFit(@TempDir Path folder) throws IOException {
    List<IncrementPermeability> all = demo();
    Derived<org.oedometry.core.compressibility.PermeabilityChangeFit> none =
        PermeabilityChangeIndex.fit(all.subList(0, 1));
    assertThat(none.isPresent()).isFalse();
    var chart = PermeabilityChart.chart(all, none, "demo");
    assertThat(((XYSeriesCollection) chart.getXYPlot().getDataset()).getSeriesCount()).isEqualTo(2);
    assertThat(chart.getSubtitle(1).toString()).isNotNull();
    Png.check(PermeabilityChart.write(all, none, "demo", folder.resolve("k.png")));
  }
}
