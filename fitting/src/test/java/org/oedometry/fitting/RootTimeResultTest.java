package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class RootTimeResultTest {

  private static RootTimeGeometry geometry() {
    StraightLine line = new StraightLine(1e-5, 0, 0, 10);
    return new RootTimeGeometry(line, line, new PlotPoint(10, 1e-4), 1, 4, 1.15, 2);
  }

  @Test
  void validates() {
    RootTimeResult r =
        new RootTimeResult(
            1e-8,
            100,
            0,
            9e-5,
            1e-4,
            OptionalDouble.empty(),
            OptionalDouble.empty(),
            0.01,
            0.848,
            geometry(),
            List.of(new FitWarning(FitWarning.Kind.EARLY_PART_NOT_LINEAR, "scatter")));
    assertThat(r.hasWarning(FitWarning.Kind.EARLY_PART_NOT_LINEAR)).isTrue();
    assertThatThrownBy(
            () ->
                new RootTimeResult(
                    1e-8,
                    0,
                    0,
                    0,
                    0,
                    OptionalDouble.empty(),
                    OptionalDouble.empty(),
                    0.01,
                    0.848,
                    geometry(),
                    List.of()))
        .hasMessage("t90 (0.0 s) must be finite and > 0");
    assertThatThrownBy(
            () ->
                new RootTimeResult(
                    1e-8,
                    1,
                    0,
                    0,
                    0,
                    null,
                    OptionalDouble.empty(),
                    0.01,
                    0.848,
                    geometry(),
                    List.of()))
        .hasMessageContaining("must not be null");
  }

  @Test
  void geometryValidation() {
    StraightLine line = new StraightLine(1, 0, 0, 1);
    PlotPoint p = new PlotPoint(1, 1);
    assertThatThrownBy(() -> new RootTimeGeometry(line, line, p, 1, 3, 1.15, 1))
        .hasMessage("early line readings from index 1 to 3: need at least 3");
    assertThatThrownBy(() -> new RootTimeGeometry(line, line, p, 1, 4, 2.5, 1))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new RootTimeGeometry(line, line, p, 1, 4, 1.15, 0))
        .hasMessage("iterations (0) must be >= 1");
    assertThatThrownBy(() -> new RootTimeGeometry(null, line, p, 1, 4, 1.15, 1))
        .hasMessage("root-time geometry: every part must be given");
  }
}
