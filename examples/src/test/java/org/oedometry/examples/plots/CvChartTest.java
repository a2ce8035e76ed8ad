package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.reduction.TestReduction;
import org.oedometry.fitting.reduction.TestReport;

class CvChartTest {

  /** The demo's true c_v per increment, at the log-mean stress, for two methods (invented data). */
  private static List<CvPoint> points() {
    List<CvPoint> points = new ArrayList<>();
    var truth = DemoTestGenerator.truth();
    for (int i = 0; i < truth.size(); i++) {
      LoadIncrement inc = DemoIncrement.TEST.increments().get(i);
      double stress = Math.sqrt(inc.stressBeforePascals() * inc.stressAfterPascals());
      boolean oc = inc.stressAfterPascals() <= 80e3 || i >= 7 && i <= 10;
      Optional<IncrementClass> history =
          Optional.of(oc ? IncrementClass.RECOMPRESSION : IncrementClass.NORMALLY_CONSOLIDATED);
      double cv = truth.get(i).parameters().cv();
      points.add(new CvPoint(stress, cv, CvMethod.LOG_TIME, history));
      points.add(new CvPoint(stress, 0.9 * cv, CvMethod.ROOT_TIME, history));
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
  @DisplayName(
      "Plots kPa and m²/yr (Julian year, 31 557 600 s); NC, OC and not classed in separate series")
  void units() {
    CvPoint point =
        new CvPoint(
            50e3,
            1.0 / 31_557_600,
            CvMethod.FULL_CURVE,
            Optional.of(IncrementClass.NORMALLY_CONSOLIDATED));
    XYPlot plot = CvChart.chart(List.of(point), "one").getXYPlot();
    XYSeriesCollection data = (XYSeriesCollection) plot.getDataset();
    assertThat(data.getSeriesCount()).isEqualTo(3);
    assertThat(data.getSeries(0).getX(0).doubleValue()).isCloseTo(50.0, within(1e-12));
    assertThat(data.getSeries(0).getY(0).doubleValue()).isCloseTo(1.0, within(1e-12));
    assertThat(data.getSeries(1).getItemCount()).isZero();
    assertThat(data.getSeries(2).getItemCount()).isZero();
    LegendItemCollection legend = plot.getLegendItems();
    // The method, and the one kind of marker drawn (no hollow or pale entry without such points).
    assertThat(legend.getItemCount()).isEqualTo(2);
    assertThat(legend.get(0).getLabel()).isEqualTo(CvMethod.FULL_CURVE.label());
    assertThat(legend.get(1).getLabel()).startsWith("filled: normally consolidated");
  }

  @Test
  @DisplayName("An empty list and invalid points are refused")
  void refuses() {
    assertThatThrownBy(() -> CvChart.chart(List.of(), "t"))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new CvPoint(Double.NaN, 1e-8, CvMethod.LOG_TIME, Optional.empty()))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("stress (NaN Pa)");
    assertThatThrownBy(() -> new CvPoint(1e3, -1, CvMethod.LOG_TIME, Optional.empty()))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("c_v (-1.0 m^2/s)");
    assertThatThrownBy(() -> new CvPoint(1e3, 1e-8, CvMethod.LOG_TIME, null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("stress history");
  }

  @Test
  @DisplayName(
      "A single loading increment, 25 -> 50 kPa (invented exact Terzaghi curve): one e - log σ'"
          + " point above the seating stress gives no σ'p (a construction needs the curve on both"
          + " sides of its break; common practice, from memory), and the report says the"
          + " increment cannot be classed; so no point is drawn hollow ('overconsolidated'), every"
          + " point is in the not-classed series, and the legend says why")
  void singleIncrementIsNotClassedOnTheChart(@TempDir Path folder) throws IOException {
    var test = UnusualTests.of(UnusualTests.lab(), new double[] {25e3, 50e3}, new double[] {0.15});
    TestReport report = TestReduction.reduce(test);
    assertThat(report.preconsolidationForClasses().isPresent()).isFalse();
    assertThat(report.increments().get(0).stressHistory().isPresent()).isFalse();
    List<CvPoint> points = PlotGallery.cvPoints(report);
    assertThat(points)
        .isNotEmpty()
        .allSatisfy(p -> assertThat(p.stressHistory()).isEmpty())
        .noneMatch(CvPoint::overconsolidated);
    XYPlot plot = CvChart.chart(points, "one increment").getXYPlot();
    XYSeriesCollection data = (XYSeriesCollection) plot.getDataset();
    for (int s = 0; s < data.getSeriesCount(); s++) {
      String key = data.getSeriesKey(s).toString();
      assertThat(data.getSeries(s).getItemCount())
          .as("items in %s", key)
          .isEqualTo(key.endsWith("(not classed)") ? 1 : 0);
    }
    List<String> labels = labels(plot.getLegendItems());
    assertThat(labels).contains("pale: not classed (no σ'p found)");
    // The written chart shows markers filled with the pale tint of the method's colour, exactly,
    // and the same points drawn as classed show none.
    Color pale =
        CvChart.pale(
            ChartFiles.PALETTE[points.get(0).method().ordinal() % ChartFiles.PALETTE.length]);
    var image = Png.check(CvChart.write(points, "one increment", folder.resolve("cv.png")));
    assertThat(pixels(image, pale)).isGreaterThan(10);
    List<CvPoint> classed = new ArrayList<>();
    for (CvPoint p : points) {
      classed.add(
          new CvPoint(
              p.stress(), p.cv(), p.method(), Optional.of(IncrementClass.NORMALLY_CONSOLIDATED)));
    }
    var drawnClassed = Png.check(CvChart.write(classed, "classed", folder.resolve("nc.png")));
    assertThat(pixels(drawnClassed, pale)).isZero();
  }

  @Test
  @DisplayName(
      "Where the report classes the increments (load, unload, reload: σ'p found), every point"
          + " carries the report's class, and the legend has no not-classed entry")
  void classedIncrementsKeepTheReportsClass() {
    var test =
        UnusualTests.of(
            UnusualTests.lab(),
            new double[] {25e3, 50e3, 100e3, 200e3, 400e3, 100e3, 25e3, 100e3, 400e3, 800e3},
            new double[] {0.15, 0.45, 0.9, 0.8, -0.08, -0.06, 0.05, 0.1, 0.7});
    TestReport report = TestReduction.reduce(test);
    assertThat(report.preconsolidationForClasses().isPresent()).isTrue();
    List<CvPoint> points = PlotGallery.cvPoints(report);
    assertThat(points).isNotEmpty().allSatisfy(p -> assertThat(p.stressHistory()).isPresent());
    // Unloading is overconsolidated by definition (IncrementClass; any soil-mechanics text).
    assertThat(points)
        .filteredOn(p -> p.stressHistory().get() == IncrementClass.UNLOADING)
        .isNotEmpty()
        .allMatch(CvPoint::overconsolidated);
    List<String> labels = labels(CvChart.chart(points, "classed").getXYPlot().getLegendItems());
    assertThat(labels).noneMatch(l -> l.contains("not classed"));
  }

  private static List<String> labels(LegendItemCollection legend) {
    List<String> labels = new ArrayList<>();
    for (int i = 0; i < legend.getItemCount(); i++) {
      labels.add(legend.get(i).getLabel());
    }
    return labels;
  }

  /** Pixels of exactly this colour. */
  private static int pixels(java.awt.image.BufferedImage image, Color colour) {
    int count = 0;
    for (int y = 0; y < image.getHeight(); y++) {
      for (int x = 0; x < image.getWidth(); x++) {
        if ((image.getRGB(x, y) & 0xffffff) == (colour.getRGB() & 0xffffff)) {
          count++;
        }
      }
    }
    return count;
  }
}
