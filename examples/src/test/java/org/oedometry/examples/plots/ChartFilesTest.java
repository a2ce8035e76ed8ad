package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

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
}
