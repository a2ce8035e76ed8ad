package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.CompressionPoint;
import org.oedometry.core.compressibility.PreconsolidationEstimate;

class CompressionChartTest {

  private static final CompressionCurve CURVE = CompressionCurve.fromTest(DemoIncrement.TEST);

  private static final List<PreconsolidationEstimate> ESTIMATES =
      PlotGallery.preconsolidation(CURVE);

  @Test
  @DisplayName("Writes a 900 x 600 PNG of e - log σ' with every construction")
  void writesPng(@TempDir Path folder) throws IOException {
    Png.check(CompressionChart.write(CURVE, ESTIMATES, "demo", folder.resolve("e.png")));
  }

  @Test
  @DisplayName("One legend series per construction found, named with its σ'p in kPa")
  void legend() {
    XYPlot plot = CompressionChart.chart(CURVE, ESTIMATES, "demo").getXYPlot();
    XYSeriesCollection lines = (XYSeriesCollection) plot.getDataset(1);
    long found = ESTIMATES.stream().filter(e -> e.preconsolidationPressure().isPresent()).count();
    assertThat(lines.getSeriesCount()).isEqualTo((int) found);
    PreconsolidationEstimate first = ESTIMATES.get(0);
    assertThat(lines.getSeries(0).getKey().toString())
        .contains(
            String.format(
                java.util.Locale.ROOT,
                "%.1f kPa",
                first.preconsolidationPressure().getAsDouble() / 1000));
    // The test's points, seating state first, in kPa.
    XYSeriesCollection marks = (XYSeriesCollection) plot.getDataset(0);
    assertThat(marks.getSeries(0).getItemCount()).isEqualTo(CURVE.size() + 1);
    assertThat(marks.getSeries(0).getX(0).doubleValue())
        .isCloseTo(CURVE.seatingStress() / 1000, within(1e-12));
  }

  @Test
  @DisplayName("σ'p is placed on the first-loading branch by interpolation linear in log σ'")
  void interpolation() {
    // Hand arithmetic: between (10 kPa, 1.0) and (100 kPa, 0.8) the log-mean 31.62 kPa is halfway.
    CompressionCurve curve =
        CompressionCurve.of(
            1.1,
            5e3,
            List.of(
                new CompressionPoint(10e3, 1.0),
                new CompressionPoint(100e3, 0.8),
                new CompressionPoint(50e3, 0.82)));
    assertThat(CompressionChart.firstLoadingVoidRatio(curve, Math.sqrt(10e3 * 100e3)).getAsDouble())
        .isCloseTo(0.9, within(1e-12));
    assertThat(CompressionChart.firstLoadingVoidRatio(curve, 200e3)).isEmpty();
  }
}
