package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SpecimenPhasesTest {

  // Invented specimen: H0 = 20 mm, A = 30 cm^2, dry mass 100 g, Gs = 2.70.
  private static final double H0 = 0.020;
  private static final double AREA = 0.0030;
  private static final double DRY_MASS = 0.100;
  private static final double GS = 2.70;

  @Test
  @DisplayName("H_s = M_s / (G_s rho_w A) [FACTS, phase relations; ASTM D2435]")
  void solidsHeightFromDryMass() {
    SpecimenPhases p = SpecimenPhases.fromDryMass(H0, DRY_MASS, GS, AREA);
    // Hand arithmetic: 0.1 / (2.70 * 1000 * 0.003) = 0.1 / 8.1 m.
    assertThat(p.solidsHeight()).isCloseTo(0.1 / 8.1, within(1e-15));
    assertThat(p.initialVoidRatio()).isCloseTo(0.020 * 81 - 1, within(1e-12));
  }

  @Test
  @DisplayName(
      "e = H/H_s - 1 agrees with e = e0 - (1 + e0) dH/H0 (two independent formulas, FACTS)")
  void twoVoidRatioFormulasAgree() {
    SpecimenPhases p = SpecimenPhases.fromDryMass(H0, DRY_MASS, GS, AREA);
    double e0 = p.initialVoidRatio();
    for (double dh : new double[] {0, 1e-4, 5e-4, 1.2e-3, 2.5e-3, -3e-4}) {
      double fromStrain = e0 - (1 + e0) * dh / H0;
      assertThat(p.voidRatio(dh)).isCloseTo(fromStrain, within(1e-13));
      assertThat(p.axialStrain(dh)).isCloseTo(dh / H0, within(1e-16));
    }
  }

  @Test
  @DisplayName("Saturated soil: e = w G_s [FACTS, phase relations]")
  void saturatedVoidRatio() {
    // Hand arithmetic: w = 35 %, Gs = 2.70 gives e = 0.945.
    assertThat(SpecimenPhases.saturatedVoidRatio(0.35, 2.70)).isCloseTo(0.945, within(1e-15));
  }

  @Test
  @DisplayName("Back-calculation from the final water content reproduces e_f = w_f G_s at the end")
  void backCalculatedFromFinalWaterContent() {
    double finalSettlement = 0.0031;
    SpecimenPhases p = SpecimenPhases.fromFinalWaterContent(H0, finalSettlement, 0.30, GS);
    assertThat(p.voidRatio(finalSettlement)).isCloseTo(0.30 * GS, within(1e-13));
    // Independent route: H_s = H_f / (1 + e_f), then e0 = H0 / H_s - 1.
    double hs = (H0 - finalSettlement) / (1 + 0.30 * GS);
    assertThat(p.initialVoidRatio()).isCloseTo(H0 / hs - 1, within(1e-13));
  }

  @Test
  @DisplayName("From a known e0: H_s = H0 / (1 + e0)")
  void fromInitialVoidRatio() {
    SpecimenPhases p = SpecimenPhases.fromInitialVoidRatio(H0, 1.25);
    assertThat(p.solidsHeight()).isCloseTo(0.020 / 2.25, within(1e-16));
    assertThat(p.initialVoidRatio()).isCloseTo(1.25, within(1e-14));
  }

  @Test
  @DisplayName("Bad input: messages name the field and the value")
  void badInput() {
    assertThatThrownBy(() -> SpecimenPhases.of(Double.NaN, 0.01))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("initial height (NaN m) must be finite and > 0");
    assertThatThrownBy(() -> SpecimenPhases.of(0.02, 0.03))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("height of solids (0.03 m) must be below the initial height (0.02 m)");
    assertThatThrownBy(() -> SpecimenPhases.fromDryMass(0.02, -0.1, 2.7, 0.003))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("dry mass (-0.1 kg) must be finite and > 0");
    assertThatThrownBy(() -> SpecimenPhases.fromFinalWaterContent(0.02, 0.02, 0.3, 2.7))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("final settlement (0.02 m) must be below the initial height (0.02 m)");
    assertThatThrownBy(() -> SpecimenPhases.saturatedVoidRatio(0.3, Double.POSITIVE_INFINITY))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("specific gravity (Infinity) must be finite and > 0");
    SpecimenPhases p = SpecimenPhases.of(0.02, 0.01);
    assertThatThrownBy(() -> p.voidRatio(0.01))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "settlement (0.01 m) must be below initial height minus height of solids (0.01 m)");
    assertThatThrownBy(() -> p.axialStrain(Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("settlement (NaN m) must be finite");
  }

  @Test
  @DisplayName(
      "Regression: heights whose ratio, a void ratio or a strain is beyond the double range are"
          + " refused with the numbers named, instead of returning infinity")
  void valuesBeyondTheDoubleRange() {
    assertThatThrownBy(() -> SpecimenPhases.of(1e300, 1e-10))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "initial height (1.0E300 m) over height of solids (1.0E-10 m), the initial void ratio"
                + " plus 1, is beyond the double range");
    assertThatThrownBy(() -> SpecimenPhases.of(0.02, 0.01).voidRatio(-1e307))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "void ratio after a settlement of -1.0E307 m (initial height 0.02 m, height of solids"
                + " 0.01 m) is beyond the double range");
    assertThatThrownBy(() -> SpecimenPhases.of(1e-300, 1e-301).axialStrain(1e10))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "axial strain of a settlement of 1.0E10 m over an initial height of 1.0E-300 m is"
                + " beyond the double range");
  }
}
