package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.oedometry.examples.demo.DemoTestGenerator;
import org.oedometry.fitting.LogTimeResult;

class PlotGalleryTest {

  @Test
  @DisplayName("Draws every chart of the invented demo test: 3 per increment and 4 for the test")
  void drawsAll(@TempDir Path folder) throws IOException {
    List<Path> files = PlotGallery.write(DemoTestGenerator.generate(), "demo", folder);
    // Every method fits every demo increment (12 increments, generated to suit all three).
    assertThat(files).hasSize(3 * 12 + 4);
    assertThat(files)
        .contains(
            folder.resolve("increment-01-log-time.png"),
            folder.resolve("increment-12-full-curve.png"),
            folder.resolve("compression.png"),
            folder.resolve("cv.png"),
            folder.resolve("permeability.png"),
            folder.resolve("forecast.png"));
    for (Path file : files) {
      Png.check(file);
    }
  }

  @Test
  @DisplayName("The charts' fits use the demo's drainage path rule (half the height at d50)")
  void drainageRule() {
    var test = DemoTestGenerator.generate();
    int index = 3;
    LogTimeResult fit =
        org.oedometry.fitting.reduction.TestReduction.reduce(test)
            .increments()
            .get(index)
            .logTime()
            .orElseThrow();
    // Independent: H_dr = (H_start - d50) / 2 for double drainage (ASTM D2435 practice, from
    // memory), with d50 from the first-round fit; the second round moves d50 by micrometres only.
    double expected = (test.heightAtStartMetres(index) - fit.d50()) / 2;
    assertThat(fit.drainagePath())
        .isCloseTo(expected, org.assertj.core.api.Assertions.within(2e-6));
    // And it is close to the generator's own drainage path (invented truth).
    assertThat(fit.drainagePath())
        .isCloseTo(
            DemoTestGenerator.truth().get(index).drainagePathMetres(),
            org.assertj.core.api.Assertions.within(2e-5));
  }
}
