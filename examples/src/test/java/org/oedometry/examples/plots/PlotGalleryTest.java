package org.oedometry.examples.plots;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.oedometry.core.OedometerTest;
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

  static List<Object[]> unusualShapes() {
    return UnusualTests.shapes();
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("unusualShapes")
  @DisplayName(
      "Legal tests of unusual shape (invented, exact Terzaghi curves): no exception, and every"
          + " file returned is a readable 900 x 600 PNG (PNG signature, ISO/IEC 15948) with ink,"
          + " in the chosen folder, which holds nothing else")
  void unusualShapes(String shape, OedometerTest test, @TempDir Path folder) throws IOException {
    List<Path> files = PlotGallery.write(test, shape, folder);
    assertThat(files).isNotEmpty().allSatisfy(f -> assertThat(f.getParent()).isEqualTo(folder));
    for (Path file : files) {
      Png.check(file);
    }
    try (var listed = Files.list(folder)) {
      assertThat(listed.toList()).containsExactlyInAnyOrderElementsOf(files);
    }
  }

  @Test
  @DisplayName(
      "A test whose first increment unloads has no compression curve (CompressionCurve.fromTest"
          + " documents that it refuses one): compression.png is left out, as PlotGallery.write"
          + " documents, and the other charts are written")
  void firstIncrementUnloads(@TempDir Path folder) {
    List<Path> files = PlotGallery.write(UnusualTests.oneSwellingIncrement(), "swelling", folder);
    assertThat(files)
        .doesNotContain(folder.resolve("compression.png"))
        .contains(folder.resolve("increment-01-log-time.png"), folder.resolve("forecast.png"));
  }

  @Test
  @Timeout(value = 300, threadMode = Timeout.ThreadMode.SEPARATE_THREAD)
  @DisplayName(
      "A hostile test name (quotes, slashes, '..', line breaks, non-ASCII, 20,000 characters) only"
          + " reaches titles: the files keep their documented names in the chosen folder, and the"
          + " charts are drawn in seconds, not the minutes JFreeChart needs to wrap such a title")
  void hostileName(@TempDir Path folder) throws IOException {
    String name =
        "../../outside/\"quoted\" C:\\x\nsecond line\u2028\u00e9t\u00e9 \u65e5\u672c \ud83d\ude00 "
            + "S".repeat(20_000);
    OedometerTest test =
        UnusualTests.of(
            UnusualTests.lab(), new double[] {25e3, 50e3, 100e3}, new double[] {0.15, 0.45});
    List<Path> files = PlotGallery.write(test, name, folder);
    try (var listed = Files.list(folder)) {
      assertThat(listed.map(p -> p.getFileName().toString()).toList())
          .containsExactlyInAnyOrder(
              "increment-01-log-time.png",
              "increment-01-root-time.png",
              "increment-01-full-curve.png",
              "increment-02-log-time.png",
              "increment-02-root-time.png",
              "increment-02-full-curve.png",
              "compression.png",
              "cv.png",
              "permeability.png",
              "forecast.png");
    }
    assertThat(folder.getParent().resolve("outside")).doesNotExist();
    for (Path file : files) {
      Png.check(file);
    }
  }
}
