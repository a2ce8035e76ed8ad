package org.oedometry.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Hand-worked gauge examples (invented readings). */
class GaugeConversionTest {

  @Test
  @DisplayName("a falling dial in mm: 10.000 -> 9.750 is 0.25 mm of compression")
  void fallingDial() {
    GaugeConversion g =
        GaugeConversion.of(LabUnit.MILLIMETRE, GaugeDirection.DECREASES_WITH_COMPRESSION);
    assertThat(g.travelMetres(9.750, 10.000)).isCloseTo(0.25e-3, within(1e-15));
    SettlementCurve c = g.curve(new double[] {0, 60}, new double[] {10.0, 9.75}, 10.0, 0);
    assertThat(c.settlementMetres()).containsExactly(new double[] {0, 0.25e-3}, within(1e-15));
  }

  @Test
  @DisplayName("apparatus deflection is subtracted from every reading of the increment")
  void apparatusCorrection() {
    GaugeConversion g =
        GaugeConversion.of(LabUnit.MICROMETRE, GaugeDirection.INCREASES_WITH_COMPRESSION);
    // Readings 100, 150, 300 um from a start of 100 um; apparatus took 20 um of it.
    SettlementCurve c = g.curve(new double[] {0, 6, 60}, new double[] {100, 150, 300}, 100, 20e-6);
    assertThat(c.settlementMetres())
        .containsExactly(new double[] {-20e-6, 30e-6, 180e-6}, within(1e-15));
  }

  @Test
  @DisplayName("a whole test: each increment starts from the last reading of the one before")
  void chainedIncrements() {
    GaugeConversion g =
        GaugeConversion.of(LabUnit.MILLIMETRE, GaugeDirection.INCREASES_WITH_COMPRESSION);
    List<SettlementCurve> curves =
        g.curves(
            5.0,
            List.of(new double[] {0, 60}, new double[] {0, 60}, new double[] {0, 60}),
            List.of(new double[] {5.0, 5.2}, new double[] {5.2, 5.6}, new double[] {5.6, 5.5}),
            new double[] {0.01e-3, 0.03e-3, 0.015e-3});
    // By hand: increment 1: 0.2 - 0.01 = 0.19 mm; 2: 0.4 - (0.03 - 0.01) = 0.38 mm;
    // 3 (unloading, apparatus springs back 0.015 mm): -0.1 + 0.015 = -0.085 mm.
    assertThat(curves.get(0).finalSettlementMetres()).isCloseTo(0.19e-3, within(1e-15));
    assertThat(curves.get(1).finalSettlementMetres()).isCloseTo(0.38e-3, within(1e-15));
    assertThat(curves.get(2).finalSettlementMetres()).isCloseTo(-0.085e-3, within(1e-15));
    assertThat(
            g.curves(5.0, List.of(new double[] {0, 60}), List.of(new double[] {5.0, 5.2}))
                .get(0)
                .finalSettlementMetres())
        .isCloseTo(0.2e-3, within(1e-15));
  }

  @Test
  @DisplayName("bad input names the increment, index and value")
  void badInput() {
    assertThatThrownBy(() -> GaugeConversion.of(LabUnit.KILOPASCAL, GaugeDirection.values()[0]))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("gauge unit (kPa) must be a unit of length: m, mm, um");
    GaugeConversion g =
        GaugeConversion.of(LabUnit.MILLIMETRE, GaugeDirection.INCREASES_WITH_COMPRESSION);
    assertThatThrownBy(() -> g.curve(new double[] {0, 60}, new double[] {5, Double.NaN}, 5, 0))
        .hasMessage("gauge reading at index 1 (NaN mm) must be finite");
    assertThatThrownBy(
            () ->
                g.curves(
                    5,
                    List.of(new double[] {0, 60}, new double[] {0, 0}),
                    List.of(new double[] {5, 6}, new double[] {6, 7})))
        .hasMessage(
            "increment at index 1: elapsed time at index 1 (0.0 s) is not after index 0"
                + " (0.0 s)");
    assertThatThrownBy(() -> g.curves(5, List.of(), List.of()))
        .hasMessageStartingWith("need the same number (> 0) of time arrays (0)");
  }

  @Test
  @DisplayName(
      "gauge travel or a corrected settlement beyond the largest double (IEEE 754) is refused"
          + " with the readings named, not as an infinite value")
  void travelBeyondTheDoubleRange() {
    GaugeConversion g =
        GaugeConversion.of(LabUnit.METRE, GaugeDirection.INCREASES_WITH_COMPRESSION);
    assertThatThrownBy(() -> g.travelMetres(1e308, -1e308))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "gauge travel from the reference reading (-1.0E308 m) to the reading (1.0E308 m) is"
                + " beyond the range of a double");
    assertThatThrownBy(() -> g.curve(new double[] {0, 60}, new double[] {0, 1e308}, 0, -1e308))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "gauge reading at index 1 (1.0E308 m) less the apparatus deflection (-1.0E308 m) is"
                + " beyond the range of a double");
  }

  @Test
  @DisplayName(
      "apparatus deflections of 1e308 m and -1e308 m, each finite, whose change (-2e308 m) is beyond"
          + " the largest double (about 1.8e308, IEEE 754): refused naming both deflections and the"
          + " increment, never quoting an infinite value (project rule: no infinity leaves the"
          + " library)")
  void deflectionChangeBeyondTheDoubleRange() {
    GaugeConversion g =
        GaugeConversion.of(LabUnit.METRE, GaugeDirection.INCREASES_WITH_COMPRESSION);
    List<double[]> times = List.of(new double[] {0, 60}, new double[] {0, 60});
    List<double[]> readings = List.of(new double[] {0, 1e-3}, new double[] {1e-3, 2e-3});
    assertThatThrownBy(() -> g.curves(0, times, readings, new double[] {1e308, -1e308}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "increment at index 1: the change of the apparatus deflection from 1.0E308 m"
                + " (increment at index 0) to -1.0E308 m is beyond the range of a double")
        .hasMessageNotContaining("Infinity");
  }
}
