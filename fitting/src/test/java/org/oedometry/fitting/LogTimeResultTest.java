package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class LogTimeResultTest {

  private static LogTimeGeometry geometry() {
    StraightLine line = new StraightLine(1e-4, 0, 0, 3);
    PlotPoint p = new PlotPoint(1, 1e-4);
    return new LogTimeGeometry(
        line, p, line, p, p, List.of(new ParabolaPair(1, 1e-5, 4, 2e-5, 0)), 0, 1, 4);
  }

  @Test
  void validatesAndCopies() {
    List<FitWarning> warnings = new ArrayList<>();
    LogTimeResult r =
        new LogTimeResult(
            1e-8, 100, 0, 1e-4, 2e-4, 0, OptionalDouble.of(0.9), 0.01, 0.197, geometry(), warnings);
    warnings.add(new FitWarning(FitWarning.Kind.FEW_EARLY_READINGS, "x"));
    assertThat(r.warnings()).isEmpty();
    assertThat(r.hasWarning(FitWarning.Kind.FEW_EARLY_READINGS)).isFalse();
    assertThatThrownBy(
            () ->
                new LogTimeResult(
                    Double.NaN,
                    100,
                    0,
                    0,
                    0,
                    0,
                    OptionalDouble.empty(),
                    0.01,
                    0.197,
                    geometry(),
                    List.of()))
        .hasMessage("c_v (NaN m^2/s) must be finite and > 0");
    assertThatThrownBy(
            () ->
                new LogTimeResult(
                    1e-8,
                    100,
                    0,
                    0,
                    0,
                    0,
                    OptionalDouble.of(Double.NaN),
                    0.01,
                    0.197,
                    geometry(),
                    List.of()))
        .hasMessage("primary compression ratio (NaN ) must be finite");
    assertThatThrownBy(
            () ->
                new LogTimeResult(
                    1e-8, 100, 0, 0, 0, 0, OptionalDouble.empty(), 0.01, 0.197, null, List.of()))
        .hasMessage("geometry and warnings must not be null");
  }

  @Test
  void geometryValidation() {
    StraightLine line = new StraightLine(1, 0, 0, 1);
    PlotPoint p = new PlotPoint(0, 0);
    assertThatThrownBy(() -> new LogTimeGeometry(line, p, line, p, p, List.of(), 0, 1, 2))
        .hasMessage("log-time geometry: every part must be given");
    List<ParabolaPair> pairs = List.of(new ParabolaPair(1, 0, 4, 0, 0));
    assertThatThrownBy(() -> new LogTimeGeometry(line, p, line, p, p, pairs, -1, 1, 2))
        .hasMessage("d0 spread (-1.0 m) must be finite and >= 0");
    assertThatThrownBy(() -> new LogTimeGeometry(line, p, line, p, p, pairs, 0, 3, 3))
        .hasMessage("secondary readings from index 3 to 3: need 0 <= from < to");
  }
}
