package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;

class CompressionCurveTest {

  private static final SpecimenPhases PHASES = SpecimenPhases.fromInitialVoidRatio(0.020, 1.0);

  @Test
  @DisplayName("From settlements: e = e0 - (1 + e0) dH / H0 on the selected basis (FACTS)")
  void fromDeformationsUsesTheSelectedBasis() {
    List<IncrementDeformation> incs =
        List.of(
            IncrementDeformation.of(50e3, 0.0004, 0.0003),
            IncrementDeformation.of(100e3, 0.0010, 0.0009));
    CompressionCurve end =
        CompressionCurve.fromDeformations(PHASES, 0, incs, DeformationBasis.END_OF_INCREMENT);
    CompressionCurve primary =
        CompressionCurve.fromDeformations(PHASES, 0, incs, DeformationBasis.END_OF_PRIMARY);
    // Hand arithmetic with e0 = 1, H0 = 20 mm: e = 1 - 2 dH / 0.02.
    assertThat(end.voidRatio(0)).isCloseTo(1 - 2 * 0.0004 / 0.02, within(1e-14));
    assertThat(end.voidRatio(1)).isCloseTo(1 - 2 * 0.0010 / 0.02, within(1e-14));
    assertThat(primary.voidRatio(0)).isCloseTo(1 - 2 * 0.0003 / 0.02, within(1e-14));
    assertThat(primary.voidRatio(1)).isCloseTo(1 - 2 * 0.0009 / 0.02, within(1e-14));
    assertThat(end.axialStrain(1)).isCloseTo(0.0010 / 0.020, within(1e-15));
    assertThat(end.initialVoidRatio()).isCloseTo(1.0, within(1e-15));
    assertThat(end.startStress(0)).isZero();
    assertThat(end.startVoidRatio(0)).isCloseTo(1.0, within(1e-15));
    assertThat(end.startStress(1)).isEqualTo(50e3);
  }

  private static LoadIncrement increment(double beforeKpa, double afterKpa, double finalMetres) {
    return LoadIncrement.of(
        beforeKpa * 1e3,
        afterKpa * 1e3,
        SettlementCurve.of(
            new double[] {0, 60, 86_400}, new double[] {0, 0.5 * finalMetres, finalMetres}));
  }

  @Test
  @DisplayName(
      "From a test: end-of-increment e by hand, e = e0 - (1 + e0) dH / H0 with H_s = M_s /"
          + " (G_s rho_w A) (FACTS: phase relations; invented numbers)")
  void fromTestUsesEachIncrementsFinalReading() {
    // Invented specimen: H0 = 20 mm, A = 0.005 m^2, G_s = 2.70, M_s = 0.135 kg, so by hand
    // H_s = 0.135 / (2.70 * 1000 * 0.005) = 10 mm and e0 = 20 / 10 - 1 = 1.
    Specimen specimen =
        Specimen.builder()
            .initialHeight(0.020)
            .area(0.005)
            .specificGravity(2.70)
            .dryMass(0.135)
            .build();
    OedometerTest test =
        OedometerTest.of(
            specimen,
            List.of(
                increment(10, 20, 0.0002), increment(20, 40, 0.0005), increment(40, 20, -0.0001)));
    CompressionCurve curve = CompressionCurve.fromTest(test);
    // Cumulative settlement 0.2, 0.7, 0.6 mm: e = 1 - 2 dH / 20 mm = 0.98, 0.93, 0.94.
    assertThat(curve.initialVoidRatio()).isCloseTo(1.0, within(1e-12));
    assertThat(curve.seatingStress()).isEqualTo(10e3);
    assertThat(curve.size()).isEqualTo(3);
    assertThat(curve.stress(0)).isEqualTo(20e3);
    assertThat(curve.stress(1)).isEqualTo(40e3);
    assertThat(curve.stress(2)).isEqualTo(20e3);
    assertThat(curve.voidRatio(0)).isCloseTo(0.98, within(1e-12));
    assertThat(curve.voidRatio(1)).isCloseTo(0.93, within(1e-12));
    assertThat(curve.voidRatio(2)).isCloseTo(0.94, within(1e-12));
    assertThat(curve.axialStrain(2)).isCloseTo(0.6 / 20, within(1e-12));
  }

  @Test
  @DisplayName("From a test: a first increment that unloads has no curve; null is rejected")
  void fromTestRejectsAFirstUnloading() {
    Specimen specimen =
        Specimen.builder()
            .initialHeight(0.020)
            .area(0.005)
            .specificGravity(2.70)
            .dryMass(0.135)
            .build();
    OedometerTest test = OedometerTest.of(specimen, List.of(increment(20, 10, -0.0001)));
    assertThatThrownBy(() -> CompressionCurve.fromTest(test))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("effective stress at index 0 (10000.0 Pa)")
        .hasMessageContaining("seating stress (20000.0 Pa)");
    assertThatThrownBy(() -> CompressionCurve.fromTest(null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("oedometer test");
  }

  @Test
  @DisplayName("Arrays are copied in; equal curves are equal; toString is readable")
  void valueSemantics() {
    double[] s = {50e3, 100e3};
    double[] e = {0.70, 0.65};
    CompressionCurve c = CompressionCurve.of(0.75, s, e);
    s[0] = 1;
    e[0] = 9;
    assertThat(c.stress(0)).isEqualTo(50e3);
    assertThat(c.voidRatio(0)).isEqualTo(0.70);
    CompressionCurve same =
        CompressionCurve.of(0.75, new double[] {50e3, 100e3}, new double[] {0.70, 0.65});
    assertThat(c).isEqualTo(same);
    assertThat(c.hashCode()).isEqualTo(same.hashCode());
    assertThat(c.toString())
        .isEqualTo(
            "CompressionCurve[e0=0.75, seating=0.0 Pa, points=(50000.0 Pa, e=0.7), (100000.0 Pa,"
                + " e=0.65)]");
  }

  @Test
  @DisplayName("Bad input catalogue: each message names the field, the index and the value")
  void badInput() {
    assertThatThrownBy(
            () -> CompressionCurve.of(0.8, new double[] {1e3, Double.NaN}, new double[] {1, 1}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("effective stress at index 1 (NaN Pa) must be finite and > 0");
    assertThatThrownBy(() -> CompressionCurve.of(0.8, new double[] {-5e3}, new double[] {0.7}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("effective stress at index 0 (-5000.0 Pa) must be finite and > 0");
    assertThatThrownBy(() -> CompressionCurve.of(0.8, new double[] {1e3, 2e3}, new double[] {0.7}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "effective stresses has 2 values but void ratios has 1: the lengths must match");
    assertThatThrownBy(
            () -> CompressionCurve.of(0.8, new double[] {1e3, 1e3}, new double[] {0.7, 0.69}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "effective stress at index 1 (1000.0 Pa) equals index 0 (1000.0 Pa): consecutive"
                + " increments must change the stress");
    assertThatThrownBy(() -> CompressionCurve.of(0.8, new double[0], new double[0]))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("compression curve needs at least one point (0 given)");
    assertThatThrownBy(() -> CompressionCurve.of(0.8, 2e3, new double[] {1e3}, new double[] {0.7}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "effective stress at index 0 (1000.0 Pa) must exceed the seating stress (2000.0 Pa)");
    assertThatThrownBy(
            () -> CompressionCurve.of(Double.NaN, new double[] {1e3}, new double[] {0.7}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("initial void ratio (NaN) must be finite and > 0");
    assertThatThrownBy(() -> CompressionCurve.of(0.8, new double[] {1e3}, new double[] {0.0}))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("void ratio at index 0 (0.0) must be finite and > 0");
    assertThatThrownBy(
            () ->
                CompressionCurve.fromDeformations(
                    PHASES,
                    0,
                    List.of(IncrementDeformation.of(10e3, 0.0001)),
                    DeformationBasis.END_OF_PRIMARY))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("end-of-primary settlement at index 0 (stress 10000.0 Pa) is not known");
    assertThatThrownBy(
            () ->
                CompressionCurve.fromDeformations(
                    PHASES,
                    0,
                    List.of(
                        IncrementDeformation.of(10e3, 0.0001),
                        IncrementDeformation.of(20e3, 0.011)),
                    DeformationBasis.END_OF_INCREMENT))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "increment at index 1: settlement (0.011 m) must be below initial height minus"
                + " height of solids (0.01 m)");
    assertThatThrownBy(() -> IncrementDeformation.of(10e3, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("end-of-increment settlement (NaN m) must be finite");
    CompressionCurve ok = CompressionCurve.of(0.8, new double[] {1e3}, new double[] {0.7});
    assertThatThrownBy(() -> ok.voidRatio(1))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("point index 1 is outside 0..0");
  }

  @Test
  @DisplayName(
      "From a list of points: the same curve as from the two arrays; a null point is refused,"
          + " naming its index")
  void fromPointList() {
    double[] stresses = {25e3, 50e3, 100e3};
    double[] voidRatios = {0.98, 0.95, 0.87};
    CompressionCurve fromArrays = CompressionCurve.of(1.0, 5e3, stresses, voidRatios);
    CompressionCurve fromList =
        CompressionCurve.of(
            1.0,
            5e3,
            List.of(
                new CompressionPoint(25e3, 0.98),
                new CompressionPoint(50e3, 0.95),
                new CompressionPoint(100e3, 0.87)));
    assertThat(fromList.points()).isEqualTo(fromArrays.points());
    assertThat(fromList).isEqualTo(fromArrays);
    assertThatThrownBy(
            () ->
                CompressionCurve.of(
                    1.0, 5e3, java.util.Arrays.asList(new CompressionPoint(25e3, 0.98), null)))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("point at index 1 must not be null");
  }

  @Test
  @DisplayName("Every preconsolidation construction names its published source with a year")
  void everyConstructionHasItsReference() {
    for (PreconsolidationMethod m : PreconsolidationMethod.values()) {
      assertThat(m.reference()).as("%s", m).matches(".*\\b(19|20)\\d\\d\\b.*");
    }
  }
}
